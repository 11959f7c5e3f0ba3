import { ONE } from '../../core/phasor';
import { defineFunction } from '../spec';
import { phasorColumn, readRepeatedPhasors } from '../readers';
import { repeatParam } from '../params';

/** Product of every value given. */
export const MUL = defineFunction({
  name: 'MUL',
  group: 'arithmetic',
  summary: 'Product of every value given (cells, ranges, pairs); blanks are skipped. E.g. V = I·Z.',
  details: 'The repeating argument must come last, so MUL takes no digits argument (6 significant figures).',
  params: [repeatParam('z1', 'Phasors to multiply')],
  result: 'One phasor, polar text.',
  errors: ['Text that is not a phasor gives #VALUE! naming the argument and cell; all blanks give #VALUE!.'],
  examples: [{ formula: '=PHZ.MUL("10∠-30", "4+j3")', result: [['50∠6.8699°']] }],
  implementation: (z) => phasorColumn([readRepeatedPhasors(z, 'z').reduce((acc, p) => acc.mul(p), ONE)], 6),
});
