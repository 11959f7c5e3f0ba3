import { loadCurrent } from '../../core/threephase';
import { defineFunction } from '../spec';
import { phasorColumn, readDigits, readPhasors, zipWith } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Current drawn by a load of given complex power. */
export const LOADCURRENT = defineFunction({
  name: 'LOADCURRENT',
  group: 'loads',
  summary: 'Current a load of complex power S draws at voltage V: I = (S / V)*, row by row.',
  details:
    'From S = V·I*. Give the voltage across the load (line-to-neutral for a star phase, line-to-line for a delta ' +
    'branch) and that load’s own S; VA and V give A. With COMPLEXPOWER this turns a panel schedule of kW and power ' +
    'factor into phase currents. A power in var is reactive power: "40 kvar" and "j40 kvar" are both S = j40 000 VA; ' +
    'a power in W is real; give a complex power in VA ("8+j6 kVA").',
  params: [phasorParam('voltage', 'Voltages across the loads (not 0)'), phasorParam('power', 'Complex powers S = P + jQ'), DIGITS],
  result: 'Polar text, one row per pair.',
  errors: ['A zero voltage, a blank cell, text that is not a phasor, or different counts give #VALUE!.'],
  examples: [
    { formula: '=PHZ.LOADCURRENT("230∠0", "8000+j6000")', result: [['43.4783∠-36.8699°']] },
    { formula: '=PHZ.LOADCURRENT("230∠-120", PHZ.COMPLEXPOWER(4600, 1))', result: [['20∠-120°']] },
  ],
  implementation: (voltage, power, digits) => {
    const d = readDigits(digits);
    const vs = readPhasors(voltage, 'voltage', { expect: 'voltage' });
    const ss = readPhasors(power, 'power', { expect: 'power' });
    const many = vs.length > 1;
    return phasorColumn(
      zipWith(vs.map((v, i) => [v, i] as const), 'voltage', ss, 'power', ([v, i], s) => loadCurrent(v, s, many ? `voltage, row ${i + 1}` : 'voltage')),
      d,
    );
  },
});
