import { PhzError } from '../../core/errors';
import { valueMessages as M } from '../../core/messages';
import type { Phasor } from '../../core/phasor';
import { defineFunction } from '../spec';
import { phasorColumn, readDigits, readPhasors, zipWith } from '../readers';
import { DIGITS, phasorParam } from '../params';

// complex.js reads two numbers faster than a value object (no type checks on the argument)
const divide = (x: Phasor, y: Phasor): Phasor => x.div(y.re, y.im);

/** Quotient a / b, row by row. */
export const DIV = defineFunction({
  name: 'DIV',
  group: 'arithmetic',
  summary: 'Quotient a / b, row by row (a single value is used for every row), e.g. I = V / Z.',
  params: [phasorParam('a', 'Dividends'), phasorParam('b', 'Divisors (not 0)'), DIGITS],
  result: 'Polar text, one row per pair.',
  errors: ['A zero divisor, blank cells, text that is not a phasor, or different counts give #VALUE!.'],
  examples: [{ formula: '=PHZ.DIV("230∠-120", "8+j6")', result: [['23∠-156.87°']] }],
  implementation: (a, b, digits) => {
    const d = readDigits(digits);
    const bs = readPhasors(b, 'b');
    for (let i = 0; i < bs.length; i++) {
      if (bs[i].re === 0 && bs[i].im === 0) throw new PhzError(M.divideByZero(bs.length > 1 ? `b, row ${i + 1}` : 'b'));
    }
    return phasorColumn(zipWith(readPhasors(a, 'a'), 'a', bs, 'b', divide), d);
  },
});
