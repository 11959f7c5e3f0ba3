import { PhzError } from '../../core/errors';
import { valueMessages as M } from '../../core/messages';
import { defineFunction } from '../spec';
import { phasorColumn, readDigits, readPhasors } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Reciprocal 1/z of each phasor. */
export const INV = defineFunction({
  name: 'INV',
  group: 'arithmetic',
  summary: 'Reciprocal 1/z of each phasor, e.g. the admittance Y = 1/Z of an impedance.',
  params: [phasorParam('z', 'Phasors (not 0)'), DIGITS],
  result: 'Polar text, one row per phasor (an impedance in Ω gives an admittance in S).',
  errors: ['A zero value (no reciprocal), a blank cell or text that is not a phasor gives #VALUE!.'],
  examples: [{ formula: '=PHZ.INV("8+j6")', result: [['0.1∠-36.8699°']] }],
  implementation: (z, digits) => {
    const d = readDigits(digits);
    const zs = readPhasors(z, 'z');
    return phasorColumn(
      zs.map((p, i) => {
        if (p.re === 0 && p.im === 0) throw new PhzError(M.inverseOfZero(zs.length > 1 ? `z, row ${i + 1}` : 'z'));
        return p.inverse();
      }),
      d,
    );
  },
});
