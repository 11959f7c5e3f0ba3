import { parallelOf } from '../../core/combine';
import { defineFunction, type HostResult } from '../spec';
import { phasorColumn, readRepeatedPhasors } from '../readers';
import { repeatParam } from '../params';

/** The parallel impedance of the repeating argument's values as polar text of `digits` figures. */
export function parallelValues(z: unknown, digits: number): HostResult {
  return phasorColumn([parallelOf(readRepeatedPhasors(z, 'z', { expect: 'impedance' }))], digits);
}

/** Impedance of branches in parallel, 1 / Σ(1/Zk). */
export const PARALLEL = defineFunction({
  name: 'PARALLEL',
  group: 'arithmetic',
  summary: 'Impedance of branches in parallel, 1 / Σ(1/Zk); blanks are skipped.',
  details:
    'A 0 Ω branch shorts the group, so the result is 0. Branches whose admittances cancel (a resonant L–C pair) ' +
    'have no finite parallel impedance and give #VALUE!. The branches are impedances: a value in S is refused rather ' +
    'than read as ohms. No digits argument (the repeating argument must come last): 6 significant figures; ' +
    'PHZ.PARALLELFULL(z1, …) takes the same values and shows 15, for a chain whose later steps need the figures.',
  params: [repeatParam('z1', 'Branch impedances')],
  result: 'One impedance, polar text.',
  errors: ['Resonant branches (admittances sum to 0), text that is not a phasor, a unit other than Ω, or all blanks give #VALUE!.'],
  examples: [
    { formula: '=PHZ.PARALLEL("6", "3")', result: [['2∠0°']] },
    { formula: '=PHZ.PARALLEL("10", "j10")', result: [['7.07107∠45°']] },
  ],
  fullTwin: 'PARALLELFULL',
  implementation: (z) => parallelValues(z, 6),
});
