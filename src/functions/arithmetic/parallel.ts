import { PhzError } from '../../core/errors';
import { valueMessages as M } from '../../core/messages';
import { NOISE_REL, ZERO, magnitude } from '../../core/phasor';
import { defineFunction } from '../spec';
import { phasorColumn, readRepeatedPhasors } from '../readers';
import { repeatParam } from '../params';

/** Impedance of branches in parallel, 1 / Σ(1/Zk). */
export const PARALLEL = defineFunction({
  name: 'PARALLEL',
  group: 'arithmetic',
  summary: 'Impedance of branches in parallel, 1 / Σ(1/Zk); blanks are skipped.',
  details:
    'A 0 Ω branch shorts the group, so the result is 0. Branches whose admittances cancel (a resonant L–C pair) ' +
    'have no finite parallel impedance and give #VALUE!. The branches are impedances: a value in S is refused rather ' +
    'than read as ohms. No digits argument (the repeating argument must come last).',
  params: [repeatParam('z1', 'Branch impedances')],
  result: 'One impedance, polar text.',
  errors: ['Resonant branches (admittances sum to 0), text that is not a phasor, a unit other than Ω, or all blanks give #VALUE!.'],
  examples: [
    { formula: '=PHZ.PARALLEL("6", "3")', result: [['2∠0°']] },
    { formula: '=PHZ.PARALLEL("10", "j10")', result: [['7.07107∠45°']] },
  ],
  implementation: (z) => {
    const zs = readRepeatedPhasors(z, 'z', { expect: 'impedance' });
    if (zs.some((p) => p.re === 0 && p.im === 0)) return phasorColumn([ZERO], 6);
    const y = zs.reduce((acc, p) => acc.add(p.inverse()), ZERO);
    // relative test: admittances that cancel to rounding noise are a resonance, not a huge impedance
    const scale = zs.reduce((m, p) => Math.max(m, 1 / magnitude(p)), 0);
    if (magnitude(y) <= NOISE_REL * scale) throw new PhzError(M.resonance);
    return phasorColumn([y.inverse()], 6);
  },
});
