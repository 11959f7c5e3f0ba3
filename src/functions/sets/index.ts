import type { FunctionSpec } from '../spec';
import { BALANCED } from './balanced';
import { LINEVOLTS } from './linevolts';
import { STARVOLTS } from './starvolts';
import { LINESET } from './lineset';
import { DELTATOSTAR } from './deltatostar';
import { STARTODELTA } from './startodelta';

/** The functions of group "sets", in reference order. */
export const setsFunctions: FunctionSpec[] = [BALANCED, LINEVOLTS, STARVOLTS, LINESET, DELTATOSTAR, STARTODELTA];
