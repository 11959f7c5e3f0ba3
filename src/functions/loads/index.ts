import type { FunctionSpec } from '../spec';
import { CURRENT } from './current';
import { COMPLEXPOWER } from './complexpower';
import { LOADCURRENT } from './loadcurrent';
import { POWER } from './power';
import { PF } from './pf';

/** The functions of group "loads", in reference order. */
export const loadsFunctions: FunctionSpec[] = [CURRENT, COMPLEXPOWER, LOADCURRENT, POWER, PF];
