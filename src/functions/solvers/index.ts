import type { FunctionSpec } from '../spec';
import { STARLOAD } from './starload';
import { DELTALOAD } from './deltaload';
import { STARLOSSES } from './starlosses';
import { DELTALOSSES } from './deltalosses';

/** The functions of group "solvers", in reference order. */
export const solversFunctions: FunctionSpec[] = [STARLOAD, STARLOSSES, DELTALOAD, DELTALOSSES];
