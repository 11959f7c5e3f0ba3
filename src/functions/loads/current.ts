import { current } from '../../core/threephase';
import { defineFunction } from '../spec';
import { phasorColumn, readDigits, readPhasors, zipWith } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Current through an impedance, I = V / Z. */
export const CURRENT = defineFunction({
  name: 'CURRENT',
  group: 'loads',
  summary: 'Current through an impedance, I = V / Z, row by row (a single value is used for every row).',
  details: 'Ohm’s law on phasors. Units are whatever you give consistently: volts and ohms give amperes.',
  params: [phasorParam('voltage', 'Voltages across the impedances'), phasorParam('impedance', 'Impedances (not 0)'), DIGITS],
  result: 'Polar text, one row per pair.',
  errors: ['A 0 Ω impedance (a short circuit), a blank cell, text that is not a phasor, or different counts give #VALUE!.'],
  examples: [
    { formula: '=PHZ.CURRENT("230∠0", "8+j6")', result: [['23∠-36.8699°']] },
    { formula: '=PHZ.CURRENT({"230∠0";"230∠-120";"230∠120"}, "46")', result: [['5∠0°'], ['5∠-120°'], ['5∠120°']] },
  ],
  implementation: (voltage, impedance, digits) => {
    const d = readDigits(digits);
    const zs = readPhasors(impedance, 'impedance', { expect: 'impedance' });
    const vs = readPhasors(voltage, 'voltage', { expect: 'voltage' });
    const many = zs.length > 1;
    return phasorColumn(
      zipWith(vs, 'voltage', zs.map((z, i) => [z, i] as const), 'impedance', (v, [z, i]) => current(v, z, many ? `impedance, row ${i + 1}` : 'impedance')),
      d,
    );
  },
});
