import { defineFunction } from '../spec';
import { column, readPhasors } from '../readers';
import { READS_TEXT_NOTE, phasorParam } from '../params';

/** Imaginary part of each phasor. */
export const IMAG = defineFunction({
  name: 'IMAG',
  group: 'values',
  summary: 'Imaginary part of each phasor (reactance of an impedance, reactive power of a complex power).',
  details: READS_TEXT_NOTE,
  params: [phasorParam('z', 'Phasors in any notation')],
  result: 'Numbers; one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [{ formula: '=PHZ.IMAG("7-j5")', result: [[-5]] }],
  implementation: (z) => column(readPhasors(z, 'z').map((p) => p.im)),
});
