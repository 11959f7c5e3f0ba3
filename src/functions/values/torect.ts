import { defineFunction } from '../spec';
import { readDigits, readPhasors, phasorColumn } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Shows phasors in rectangular form, real±j·imaginary. */
export const TORECT = defineFunction({
  name: 'TORECT',
  group: 'values',
  summary: 'Shows phasors in rectangular form, real±j·imaginary.',
  details:
    'Both parts are rounded at the decimal place that gives the larger part `digits` significant figures. ' +
    'A cell may also hold an Excel data type: a number, text or TRUE/FALSE with properties counts as its value, and an entity whose properties are real and imag (or magnitude and angle in degrees) counts as that phasor.',
  params: [phasorParam('z', 'Phasors in any notation'), DIGITS],
  result: 'Rectangular text, e.g. 24.5413-j9.2778; one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [
    { formula: '=PHZ.TORECT("26.2365∠-20.709")', result: [['24.5413-j9.2778']] },
    { formula: '=PHZ.TORECT("230∠-120", 4)', result: [['-115-j199.2']] },
  ],
  implementation: (z, digits) => phasorColumn(readPhasors(z, 'z'), readDigits(digits), 'rect'),
});
