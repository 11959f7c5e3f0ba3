import { polarDeg } from '../../core/phasor';
import { defineFunction } from '../spec';
import { phasorColumn, readDigits, readNumbers, readPhasors, zipWith } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Turns phasors by an angle in degrees (counter-clockwise positive). */
export const ROTATE = defineFunction({
  name: 'ROTATE',
  group: 'arithmetic',
  summary: 'Turns phasors by an angle in degrees (positive counter-clockwise): z·1∠θ. Rotating by 120° applies the operator a.',
  params: [phasorParam('z', 'Phasors'), { name: 'degrees', type: 'matrix', description: 'Angle to turn by, in degrees: a number or a column.' }, DIGITS],
  result: 'Polar text, one row per phasor/angle pair (a single value is used for every row).',
  errors: ['Blank cells, text that is not a phasor, a non-numeric angle or different counts give #VALUE!.'],
  examples: [{ formula: '=PHZ.ROTATE("230∠0", {-120;120})', result: [['230∠-120°'], ['230∠120°']] }],
  implementation: (z, degrees, digits) => {
    const d = readDigits(digits);
    const turns = readNumbers(degrees, 'degrees').map((a) => polarDeg(1, a));
    return phasorColumn(zipWith(readPhasors(z, 'z'), 'z', turns, 'degrees', (p, r) => p.mul(r)), d);
  },
});
