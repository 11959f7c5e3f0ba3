// Properties of the parser, formatter and arithmetic, checked with fast-check.
// Independent reference for arithmetic: mathjs 15 complex numbers.
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import * as math from 'mathjs';
import { parsePhasor } from '../../src/core/parse';
import { formatPolar, formatRect } from '../../src/core/format';
import { NOISE_REL, rect } from '../../src/core/phasor';
import { isPhzError } from '../../src/core/errors';
import { readPhasors } from '../../src/functions/readers';
import { functions } from '../../src/functions';

const finite = fc.double({ min: -1e12, max: 1e12, noNaN: true, noDefaultInfinity: true });
const phasor = fc.tuple(finite, finite).map(([re, im]) => rect(re, im));

function relErr(a: { re: number; im: number }, b: { re: number; im: number }): number {
  const scale = Math.hypot(b.re, b.im);
  const err = Math.hypot(a.re - b.re, a.im - b.im);
  return scale === 0 ? err : err / scale;
}

describe('format at 15 digits, then parse, returns the value', () => {
  it('polar form, within 1e-12 relative', () => {
    fc.assert(
      fc.property(phasor, (z) => {
        expect(relErr(parsePhasor(formatPolar(z, 15)), z)).toBeLessThanOrEqual(1e-12);
      }),
      { numRuns: 2000 },
    );
  });
  it('rectangular form, within 1e-12 relative', () => {
    fc.assert(
      fc.property(phasor, (z) => {
        expect(relErr(parsePhasor(formatRect(z, 15)), z)).toBeLessThanOrEqual(1e-12);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('no input makes a reader throw anything but the project error', () => {
  const notation = fc.stringMatching(/^[0-9 .,+\-−jJiIeE^()∠<@°radegkKmMVAWΩohs]{0,14}$/);
  const anyCell = fc.oneof(
    fc.string(),
    notation,
    fc.double(),
    fc.boolean(),
    fc.constant(null),
    fc.constant(undefined),
    fc.constant(''),
    fc.object(),
  );
  it('readPhasors on arbitrary cells and ranges', () => {
    fc.assert(
      fc.property(fc.array(fc.array(anyCell, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 3 }), (m) => {
        try {
          const zs = readPhasors(m, 'z', { blanks: 'skip' });
          for (const z of zs) expect(Number.isFinite(z.re) && Number.isFinite(z.im)).toBe(true);
        } catch (e) {
          expect(isPhzError(e), String(e)).toBe(true);
        }
      }),
      { numRuns: 3000 },
    );
  });
  it('every registry function on arbitrary scalar arguments', () => {
    const names = Object.keys(functions);
    fc.assert(
      fc.property(fc.constantFrom(...names), fc.array(anyCell, { maxLength: 4 }), (name, args) => {
        try {
          const r = functions[name](...args.map((a) => [[a]]));
          for (const row of r) for (const c of row) if (typeof c === 'number') expect(Number.isFinite(c)).toBe(true);
        } catch (e) {
          expect(isPhzError(e), `${name}: ${String(e)}`).toBe(true);
        }
      }),
      { numRuns: 2000 },
    );
  });
});

describe('arithmetic agrees with mathjs complex arithmetic', () => {
  // subnormal parts (below 1e-300) are no engineering quantity and underflow differently
  // in each library's division, so they are taken as 0
  const part = fc.double({ min: -1e6, max: 1e6, noNaN: true }).map((x) => (Math.abs(x) < 1e-300 ? 0 : x));
  const value = fc.tuple(part, part);
  const nonZero = value.filter(([a, b]) => Math.hypot(a, b) > 1e-6);
  const text = ([a, b]: [number, number]) => formatRect(rect(a, b), 15);
  const read = (r: unknown[][]) => parsePhasor(r[0][0] as string);
  it('DIV, SUB and MUL through text in and text out (15 digits; MULFULL for the product)', () => {
    fc.assert(
      fc.property(value, nonZero, (x, y) => {
        const mx = math.complex(x[0], x[1]);
        const my = math.complex(y[0], y[1]);
        const tx = [[text(x)]];
        const ty = [[text(y)]];
        // 15-figure text rounds each part to 5e-15 of the magnitude, and a part below NOISE_REL
        // (1e-12) of its magnitude is written as 0: the two operands and the result can each
        // carry that, so a quotient or product is good to 3·NOISE_REL plus rounding
        const bound = 3 * NOISE_REL + 1e-13;
        expect(relErr(read(functions.DIV(tx, ty, 15)), math.divide(mx, my) as math.Complex)).toBeLessThanOrEqual(bound);
        expect(relErr(read(functions.MULFULL([tx, ty])), math.multiply(mx, my) as math.Complex)).toBeLessThanOrEqual(bound);
        // at MUL's 6 figures the rounding of magnitude and angle together can reach about 1e-5
        expect(relErr(read(functions.MUL([tx, ty])), math.multiply(mx, my) as math.Complex)).toBeLessThanOrEqual(1.1e-5);
        const diff = math.subtract(mx, my) as math.Complex;
        // a difference that cancels to below 1e-12 of its operands is shown as 0
        const scale = Math.hypot(x[0], x[1]) + Math.hypot(y[0], y[1]);
        const got = read(functions.SUB(tx, ty, 15));
        expect(Math.hypot(got.re - diff.re, got.im - diff.im)).toBeLessThanOrEqual(1e-12 * scale + 1e-12 * Math.hypot(diff.re, diff.im));
      }),
      { numRuns: 1000 },
    );
  });
  it('PARALLEL and PARALLELFULL of two branches equal mathjs product over sum', () => {
    fc.assert(
      fc.property(nonZero, nonZero, (x, y) => {
        const mx = math.complex(x[0], x[1]);
        const my = math.complex(y[0], y[1]);
        const sum = math.add(mx, my) as math.Complex;
        fc.pre(math.abs(sum) > 1e-6 * (math.abs(mx) + math.abs(my)));
        const ref = math.divide(math.multiply(mx, my), sum) as math.Complex;
        const got = read(functions.PARALLEL([[[text(x)]], [[text(y)]]]));
        expect(relErr(got, ref)).toBeLessThanOrEqual(1.1e-5);
        // 15-figure inputs and result: the admittances' cancellation amplifies the inputs' error
        // by (|x| + |y|) / |x + y|. That error is the 15-figure rounding and, for a part below
        // NOISE_REL (1e-12) of its magnitude, the formatter's rule that shows it as 0 (e.g.
        // -404.2 - j4.04e-10 is written -404.2), so the bound carries NOISE_REL too.
        const full = read(functions.PARALLELFULL([[[text(x)]], [[text(y)]]]));
        const amplified = (math.abs(mx) + math.abs(my)) / math.abs(sum);
        expect(relErr(full, ref)).toBeLessThanOrEqual(NOISE_REL + (NOISE_REL + 1e-13) * amplified);
      }),
      { numRuns: 1000 },
    );
  });
});
