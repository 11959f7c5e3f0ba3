import type { FunctionSpec } from '../spec';
import { UNBALANCE } from './unbalance';
import { MOTORDERATE } from './motorderate';

/** The functions of group "unbalance", in reference order. */
export const unbalanceFunctions: FunctionSpec[] = [UNBALANCE, MOTORDERATE];
