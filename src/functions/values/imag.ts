import { defineFunction } from '../spec';
import { column, readPhasors } from '../readers';
import { phasorParam } from '../params';

/** Imaginary part of each phasor, full precision. */
export const IMAG = defineFunction({
  name: 'IMAG',
  group: 'values',
  summary: 'Imaginary part of each phasor (reactance of an impedance, reactive power of a complex power).',
  params: [phasorParam('z', 'Phasors in any notation')],
  result: 'Numbers at full precision; one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [{ formula: '=PHZ.IMAG("7-j5")', result: [[-5]] }],
  implementation: (z) => column(readPhasors(z, 'z').map((p) => p.im)),
});
