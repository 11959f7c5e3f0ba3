import { rect } from '../../core/phasor';
import { defineFunction } from '../spec';
import { readDigits, readNumbers, zipWith, phasorColumn } from '../readers';
import { DIGITS } from '../params';

/** Makes phasors from columns of real and imaginary parts. */
export const FROMRECT = defineFunction({
  name: 'FROMRECT',
  group: 'values',
  summary: 'Makes phasors from real and imaginary parts (columns, row by row).',
  params: [
    { name: 'real', type: 'matrix', description: 'Real parts: a number or a column of numbers.' },
    { name: 'imag', type: 'matrix', description: 'Imaginary parts: a number or a column of numbers.' },
    DIGITS,
  ],
  result: 'Polar text, one row per real/imaginary pair (a single value is used for every row).',
  errors: ['A blank or non-numeric cell, or columns of different lengths, give #VALUE!.'],
  examples: [
    { formula: '=PHZ.FROMRECT(3, 4)', result: [['5∠53.1301°']] },
    { formula: '=PHZ.FROMRECT({1;0}, {0;-2})', result: [['1∠0°'], ['2∠-90°']] },
  ],
  implementation: (real, imag, digits) => {
    const d = readDigits(digits);
    const zs = zipWith(readNumbers(real, 'real'), 'real', readNumbers(imag, 'imag'), 'imag', (a, b) => rect(a, b));
    return phasorColumn(zs, d);
  },
});
