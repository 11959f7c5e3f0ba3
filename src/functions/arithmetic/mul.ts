import { productOf } from '../../core/combine';
import { defineFunction, type HostResult } from '../spec';
import { phasorColumn, readRepeatedPhasors } from '../readers';
import { repeatParam } from '../params';

/** The product of the repeating argument's values as polar text of `digits` figures (MUL and MULFULL). */
export function mulValues(z: unknown, digits: number): HostResult {
  return phasorColumn([productOf(readRepeatedPhasors(z, 'z'))], digits);
}

/** Product of every value given. */
export const MUL = defineFunction({
  name: 'MUL',
  group: 'arithmetic',
  summary: 'Product of every value given (cells, ranges, pairs); blanks are skipped. E.g. V = I·Z.',
  details:
    'The repeating argument must come last, so MUL takes no digits argument and shows 6 significant figures; ' +
    'PHZ.MULFULL(z1, …) takes the same values and shows 15, for a chain whose later steps need the figures.',
  params: [repeatParam('z1', 'Phasors to multiply')],
  result: 'One phasor, polar text.',
  errors: ['Text that is not a phasor gives #VALUE! naming the argument and cell; all blanks give #VALUE!.'],
  examples: [{ formula: '=PHZ.MUL("10∠-30", "4+j3")', result: [['50∠6.8699°']] }],
  fullTwin: 'MULFULL',
  implementation: (z) => mulValues(z, 6),
});
