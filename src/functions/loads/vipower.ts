import { complexPower } from '../../core/threephase';
import { defineFunction } from '../spec';
import { phasorColumn, readDigits, readPhasors, zipWith } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Complex power S = V·I*. */
export const VIPOWER = defineFunction({
  name: 'VIPOWER',
  group: 'loads',
  summary: 'Complex power S = V·I*, row by row: real part P (W), imaginary part Q (var, positive when inductive).',
  details:
    'With V in volts and I in amperes, S is in VA. P and Q are PHZ.REAL and PHZ.IMAG of S; ask for 15 digits when ' +
    'you take them, PHZ.REAL(PHZ.VIPOWER(V, I, 15)), since the 6-figure text gives them to 6 figures only.',
  params: [phasorParam('voltage', 'Voltages across the loads'), phasorParam('current', 'Currents into the loads'), DIGITS],
  result: 'Polar text, one row per pair.',
  errors: ['A blank cell, text that is not a phasor, or different counts give #VALUE!.'],
  examples: [
    { formula: '=PHZ.VIPOWER("230∠0", "10∠-36.8699")', result: [['2300∠36.8699°']] },
    { formula: '=PHZ.VIPOWER({"230∠0";"230∠-120"}, {"10∠0";"5∠-180"})', result: [['2300∠0°'], ['1150∠60°']] },
  ],
  implementation: (voltage, current, digits) => {
    const d = readDigits(digits);
    return phasorColumn(
      zipWith(readPhasors(voltage, 'voltage', { expect: 'voltage' }), 'voltage', readPhasors(current, 'current', { expect: 'current' }), 'current', complexPower),
      d,
    );
  },
});
