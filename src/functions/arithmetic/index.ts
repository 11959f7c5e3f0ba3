import type { FunctionSpec } from '../spec';
import { ADD } from './add';
import { SUB } from './sub';
import { MUL } from './mul';
import { DIV } from './div';
import { CONJ } from './conj';
import { INV } from './inv';
import { PARALLEL } from './parallel';
import { ROTATE } from './rotate';

/** The functions of group "arithmetic", in reference order. */
export const arithmeticFunctions: FunctionSpec[] = [ADD, SUB, MUL, DIV, CONJ, INV, PARALLEL, ROTATE];
