import type { FunctionSpec } from '../spec';
import { NEUTRAL } from './neutral';
import { NEUTRALFULL } from './neutralfull';
import { NEUTRAL120 } from './neutral120';
import { NEUTRALRMS } from './neutralrms';
import { SIZINGCURRENT } from './sizingcurrent';
import { NEUTRALDEMAND } from './neutraldemand';

/** The functions of group "neutral", in reference order. */
export const neutralFunctions: FunctionSpec[] = [NEUTRAL, NEUTRALFULL, NEUTRAL120, NEUTRALRMS, SIZINGCURRENT, NEUTRALDEMAND];
