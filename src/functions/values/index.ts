import type { FunctionSpec } from '../spec';
import { TOPOLAR } from './topolar';
import { TORECT } from './torect';
import { FROMPOLAR } from './frompolar';
import { FROMRECT } from './fromrect';
import { MAG } from './mag';
import { ANGLE } from './angle';
import { REAL } from './real';
import { IMAG } from './imag';
import { SPLIT } from './split';

/** The functions of group "values", in reference order. */
export const valuesFunctions: FunctionSpec[] = [TOPOLAR, TORECT, FROMPOLAR, FROMRECT, MAG, ANGLE, REAL, IMAG, SPLIT];
