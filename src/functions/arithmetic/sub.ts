import { sumOf } from '../../core/phasor';
import { defineFunction } from '../spec';
import { OneQuantity, phasorColumn, readDigits, readPhasors, zipWith } from '../readers';
import { DIGITS, phasorParam } from '../params';

/** Difference a − b, row by row. */
export const SUB = defineFunction({
  name: 'SUB',
  group: 'arithmetic',
  summary: 'Difference a − b, row by row (a single value is used for every row), e.g. a line voltage from two phase voltages.',
  details:
    'With units, a and b must be one quantity (a current minus a voltage is refused); a value without a unit fits any, ' +
    'and W, var and VA are all power. A difference that cancels to rounding noise of the operands is exactly 0.',
  params: [phasorParam('a', 'Phasors to subtract from'), phasorParam('b', 'Phasors to subtract'), DIGITS],
  result: 'Polar text, one row per pair.',
  errors: ['Blank cells, text that is not a phasor, units of different quantities, or different counts (other than 1) give #VALUE!.'],
  examples: [{ formula: '=PHZ.SUB("230∠0", "230∠-120")', result: [['398.372∠30°']] }],
  implementation: (a, b, digits) => {
    const same = new OneQuantity();
    return phasorColumn(zipWith(readPhasors(a, 'a', { same }), 'a', readPhasors(b, 'b', { same }), 'b', (x, y) => sumOf([x, y.neg()])), readDigits(digits));
  },
});
