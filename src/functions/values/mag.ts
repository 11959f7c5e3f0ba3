import { magnitude } from '../../core/phasor';
import { defineFunction } from '../spec';
import { column, readPhasors } from '../readers';
import { READS_TEXT_NOTE, phasorParam } from '../params';

/** Magnitude |z| of each phasor. */
export const MAG = defineFunction({
  name: 'MAG',
  group: 'values',
  summary: 'Magnitude |z| of each phasor, as a number.',
  details: READS_TEXT_NOTE,
  params: [phasorParam('z', 'Phasors in any notation')],
  result: 'Numbers in the phasor’s own unit (V, A, Ω …); one row per phasor.',
  errors: ['A blank cell or text that is not a phasor gives #VALUE! naming the cell.'],
  examples: [
    { formula: '=PHZ.MAG("3+j4")', result: [[5]] },
    { formula: '=PHZ.MAG({6,8;5,12})', result: [[10], [13]] },
  ],
  implementation: (z) => column(readPhasors(z, 'z').map(magnitude)),
});
