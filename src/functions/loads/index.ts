import type { FunctionSpec } from '../spec';

/** The functions of group "loads", in reference order. */
export const loadsFunctions: FunctionSpec[] = [];
