import type { FunctionSpec } from '../spec';

/** The functions of group "solvers", in reference order. */
export const solversFunctions: FunctionSpec[] = [];
