import type { FunctionSpec } from '../spec';

/** The functions of group "sequences", in reference order. */
export const sequencesFunctions: FunctionSpec[] = [];
