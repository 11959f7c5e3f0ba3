import type { FunctionSpec } from '../spec';
import { STARLOAD } from './starload';
import { DELTALOAD } from './deltaload';

/** The functions of group "solvers", in reference order. */
export const solversFunctions: FunctionSpec[] = [STARLOAD, DELTALOAD];
