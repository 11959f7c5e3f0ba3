import type { FunctionSpec } from '../spec';

/** The functions of group "neutral", in reference order. */
export const neutralFunctions: FunctionSpec[] = [];
