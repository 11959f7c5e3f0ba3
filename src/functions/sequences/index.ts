import type { FunctionSpec } from '../spec';
import { SEQUENCE } from './sequence';
import { FROMSEQUENCE } from './fromsequence';

/** The functions of group "sequences", in reference order. */
export const sequencesFunctions: FunctionSpec[] = [SEQUENCE, FROMSEQUENCE];
