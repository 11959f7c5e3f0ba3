import type { FunctionSpec } from '../spec';
import { SCHEDULE } from './schedule';
import { LOADPOWER } from './loadpower';
import { VOLTDROP } from './voltdrop';

/** The functions of group "feeders", in reference order. */
export const feedersFunctions: FunctionSpec[] = [SCHEDULE, LOADPOWER, VOLTDROP];
