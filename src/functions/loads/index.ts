import type { FunctionSpec } from '../spec';
import { CURRENT } from './current';
import { COMPLEXPOWER } from './complexpower';
import { LOADCURRENT } from './loadcurrent';
import { VIPOWER } from './vipower';
import { POWERFACTOR } from './powerfactor';

/** The functions of group "loads", in reference order. */
export const loadsFunctions: FunctionSpec[] = [CURRENT, COMPLEXPOWER, LOADCURRENT, VIPOWER, POWERFACTOR];
