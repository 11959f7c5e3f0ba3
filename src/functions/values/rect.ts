import { defineFunction } from '../spec';
import { readDigits, readPhasors, phasorColumn } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Shows phasors in rectangular form, real±j·imaginary. */
export const RECT = defineFunction({
  name: 'RECT',
  group: 'values',
  summary: 'Shows phasors in rectangular form, real±j·imaginary.',
  details: 'Both parts are rounded at the decimal place that gives the larger part `digits` significant figures.',
  params: [phasorParam('z', 'Phasors in any notation'), DIGITS],
  result: 'Rectangular text, e.g. 47.5498-j34.0565; one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [
    { formula: '=PHZ.RECT("58.5∠-35.6")', result: [['47.5664-j34.0542']] },
    { formula: '=PHZ.RECT("230∠-120", 4)', result: [['-115-j199.2']] },
  ],
  implementation: (z, digits) => phasorColumn(readPhasors(z, 'z'), readDigits(digits), 'rect'),
});
