import type { FunctionSpec } from '../spec';

/** The functions of group "unbalance", in reference order. */
export const unbalanceFunctions: FunctionSpec[] = [];
