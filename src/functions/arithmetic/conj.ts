import { defineFunction } from '../spec';
import { phasorColumn, readDigits, readPhasors } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Complex conjugate of each phasor. */
export const CONJ = defineFunction({
  name: 'CONJ',
  group: 'arithmetic',
  summary: 'Complex conjugate of each phasor (the angle changes sign), as in S = V·I*.',
  params: [phasorParam('z', 'Phasors'), DIGITS],
  result: 'Polar text, one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [{ formula: '=PHZ.CONJ("12∠-36.87")', result: [['12∠36.87°']] }],
  implementation: (z, digits) => phasorColumn(readPhasors(z, 'z').map((p) => p.conjugate()), readDigits(digits)),
});
