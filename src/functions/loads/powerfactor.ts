import { powerFactor } from '../../core/threephase';
import { defineFunction } from '../spec';
import { column, readPhasors } from '../readers';
import { phasorParam } from '../params';

/** Power factor of a complex power. */
export const POWERFACTOR = defineFunction({
  name: 'POWERFACTOR',
  group: 'loads',
  summary: 'Power factor P/|S| of complex powers, as numbers.',
  details:
    'The displacement power factor of the fundamental: cos of the angle of S. It does not say leading or lagging — ' +
    'the sign of Q (PHZ.IMAG) does: positive lagging, negative leading. Negative when real power flows back.',
  params: [phasorParam('power', 'Complex powers S = P + jQ (not 0)')],
  result: 'Numbers, one row per value.',
  errors: ['A zero power (no power factor exists), a blank cell or text that is not a phasor gives #VALUE!.'],
  examples: [
    { formula: '=PHZ.POWERFACTOR("8000+j6000")', result: [[0.8]] },
    { formula: '=PHZ.POWERFACTOR({"3+j4";"5"})', result: [[0.6], [1]] },
  ],
  implementation: (power) => {
    const ss = readPhasors(power, 'power', { expect: 'power' });
    return column(ss.map((s, i) => powerFactor(s, ss.length > 1 ? `power, row ${i + 1}` : 'power')));
  },
});
