import { sumOf } from '../../core/phasor';
import { defineFunction, type HostResult } from '../spec';
import { OneQuantity, phasorColumn, readRepeatedPhasors } from '../readers';
import { repeatParam } from '../params';

/** The sum of the repeating argument's values as polar text of `digits` figures (ADD and ADDFULL). */
export function addValues(z: unknown, digits: number): HostResult {
  return phasorColumn([sumOf(readRepeatedPhasors(z, 'z', { same: new OneQuantity() }))], digits);
}

/** Phasor sum of every value given. */
export const ADD = defineFunction({
  name: 'ADD',
  group: 'arithmetic',
  summary: 'Phasor sum of every value given (cells, ranges, pairs); blanks are skipped.',
  details:
    'Use it for Kirchhoff’s current law at a node, e.g. the neutral current as the sum of the line currents. ' +
    'Values with units must name one quantity (10 A + 5 V is refused); W, var and VA are all power, so ' +
    '"40 kW" + "30 kvar" is 40+j30 kVA. The repeating argument must come last, so ADD takes no digits argument ' +
    'and shows 6 significant figures; PHZ.ADDFULL(z1, …) takes the same values and shows 15, for a chain whose ' +
    'later steps need the figures (PHZ.REAL or PHZ.IMAG of a 6-figure result has those 6 figures only).',
  params: [repeatParam('z1', 'Phasors to add')],
  result: 'One phasor, polar text.',
  errors: [
    'Text that is not a phasor, values whose units name different quantities, or all blanks give #VALUE! naming the argument and cell.',
  ],
  examples: [
    { formula: '=PHZ.ADD("10∠0", "10∠-120", "10∠120")', result: [['0']] },
    { formula: '=PHZ.ADD("7+j5", "1-j6", 3)', result: [['11.0454∠-5.19443°']] },
  ],
  fullTwin: 'ADDFULL',
  implementation: (z) => addValues(z, 6),
});
