import type { FunctionSpec } from '../spec';
import { ADD } from './add';
import { ADDFULL } from './addfull';
import { SUB } from './sub';
import { MUL } from './mul';
import { MULFULL } from './mulfull';
import { DIV } from './div';
import { CONJ } from './conj';
import { INV } from './inv';
import { PARALLEL } from './parallel';
import { PARALLELFULL } from './parallelfull';
import { ROTATE } from './rotate';

/** The functions of group "arithmetic", in reference order. */
export const arithmeticFunctions: FunctionSpec[] = [ADD, ADDFULL, SUB, MUL, MULFULL, DIV, CONJ, INV, PARALLEL, PARALLELFULL, ROTATE];
