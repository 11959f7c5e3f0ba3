import { defineFunction } from '../spec';
import { column, readPhasors } from '../readers';
import { READS_TEXT_NOTE, phasorParam } from '../params';

/** Real part of each phasor. */
export const REAL = defineFunction({
  name: 'REAL',
  group: 'values',
  summary: 'Real part of each phasor (resistance of an impedance, active power of a complex power).',
  details: READS_TEXT_NOTE,
  params: [phasorParam('z', 'Phasors in any notation')],
  result: 'Numbers; one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [{ formula: '=PHZ.REAL("7-j5")', result: [[7]] },
    { formula: '=PHZ.REAL("10∠90")', result: [[0]] }],
  implementation: (z) => column(readPhasors(z, 'z').map((p) => p.re)),
});
