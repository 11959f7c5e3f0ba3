import type { FunctionSpec } from '../spec';

/** The functions of group "sets", in reference order. */
export const setsFunctions: FunctionSpec[] = [];
