import type { FunctionSpec } from '../spec';
import { SEQCOMP } from './seqcomp';
import { FROMSEQCOMP } from './fromseqcomp';

/** The functions of group "sequences", in reference order. */
export const sequencesFunctions: FunctionSpec[] = [SEQCOMP, FROMSEQCOMP];
