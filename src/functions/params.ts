/** Parameter specs shared by many functions, so their wording is the same everywhere. */
import type { ParamSpec } from './spec';

export const DIGITS: ParamSpec = {
  name: 'digits',
  type: 'scalar',
  optional: true,
  description: 'Significant figures of the text result, 1 to 15 (default 6).',
};

/** A phasor argument: one cell, a range of cells, or two numeric columns (real, imaginary). */
export function phasorParam(name: string, what: string): ParamSpec {
  return {
    name,
    type: 'matrix',
    description: `${what}: text such as 230∠-120 or 7+j5, numbers, or two numeric columns (real, imaginary).`,
  };
}

/** A repeating phasor argument: z1, z2, … each a cell, a range or a pair block. */
export function repeatParam(name: string, what: string): ParamSpec {
  return {
    name,
    type: 'repeat',
    description: `${what}: one or more cells, ranges or values (blanks are skipped).`,
  };
}

/**
 * What a number read from a phasor is worth: the phasor as given, so a chained result
 * carries only the figures its text shows (the functions that split phasors into numbers
 * say so in their details).
 */
export const READS_TEXT_NOTE =
  'The number is as precise as the phasor it reads: exact for a value you type, but another function’s text result ' +
  'holds only the significant figures it shows (6 unless asked for more), and the number has those figures only. ' +
  'For a chained result ask that function for 15 digits first (or use its …FULL twin), e.g. PHZ.REAL(PHZ.DIV(V, Z, 15)).';

export const PHASOR_RESULT_NOTE = 'Polar text (magnitude∠angle°); one phasor per row when several are given.';
