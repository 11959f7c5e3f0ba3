import type { FunctionSpec } from '../spec';
import { POLAR } from './polar';
import { RECT } from './rect';
import { FROMPOLAR } from './frompolar';
import { FROMRECT } from './fromrect';
import { MAG } from './mag';
import { ANGLE } from './angle';
import { RE } from './re';
import { IM } from './im';
import { SPLIT } from './split';

/** The functions of group "values", in reference order. */
export const valuesFunctions: FunctionSpec[] = [POLAR, RECT, FROMPOLAR, FROMRECT, MAG, ANGLE, RE, IM, SPLIT];
