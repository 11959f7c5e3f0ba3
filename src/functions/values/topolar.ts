import { defineFunction } from '../spec';
import { readDigits, readPhasors, phasorColumn } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Shows phasors in polar form, magnitude∠angle°. */
export const TOPOLAR = defineFunction({
  name: 'TOPOLAR',
  group: 'values',
  summary: 'Shows phasors in polar form, magnitude∠angle° (angle in degrees, −180 to 180).',
  details:
    'Reads every notation of the phasor arguments (see Writing phasors). ' +
    'A cell may also hold an Excel data type: a number, text or TRUE/FALSE with properties counts as its value, and an entity whose properties are real and imag (or magnitude and angle in degrees) counts as that phasor.',
  params: [phasorParam('z', 'Phasors in any notation'), DIGITS],
  result: 'Polar text, e.g. 26.2365∠-20.709°; one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [
    { formula: '=PHZ.TOPOLAR("24.5413-j9.2778")', result: [['26.2365∠-20.709°']] },
    { formula: '=PHZ.TOPOLAR("3+j4", 3)', result: [['5∠53.1°']] },
  ],
  implementation: (z, digits) => phasorColumn(readPhasors(z, 'z'), readDigits(digits), 'polar'),
});
