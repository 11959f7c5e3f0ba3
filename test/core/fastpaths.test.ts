// The fast paths must give exactly what the general code gives, on every input they take.
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { parsePhasor, parseGeneral } from '../../src/core/parse';
import { fastParse } from '../../src/core/fastparse';
import { formatNumber, slowDigits } from '../../src/core/format';

const digitsText = fc.stringMatching(/^(\d{1,9}(\.\d{0,8})?|\.\d{1,8})$/);
const sign = fc.constantFrom('', '-', '+');
const sp = fc.constantFrom('', ' ', '  ');

describe('fast parser agrees bit for bit with the general scanner', () => {
  const rectText = fc
    .tuple(sign, digitsText, sp, fc.constantFrom('+', '-'), sp, fc.constantFrom('j', 'J', 'i'), digitsText, fc.boolean())
    .map(([s, a, s1, op, s2, j, b, suffix]) => (suffix ? `${s}${a}${s1}${op}${s2}${b}${j}` : `${s}${a}${s1}${op}${s2}${j}${b}`));
  const polarText = fc
    .tuple(digitsText, sp, fc.constantFrom('∠', '<', '@'), sp, sign, digitsText, fc.constantFrom('', '°'))
    .map(([m, s1, mark, s2, sg, a, deg]) => `${m}${s1}${mark}${s2}${sg}${a}${deg}`);
  it.each([
    ['rectangular', rectText],
    ['polar', polarText],
    ['plain numbers', fc.tuple(sign, digitsText).map(([s, a]) => s + a)],
  ])('%s', (_, gen) => {
    fc.assert(
      fc.property(gen, (text) => {
        const general = parseGeneral(text);
        const z = parsePhasor(text);
        expect([z.re, z.im]).toEqual([general.re, general.im]);
      }),
      { numRuns: 3000 },
    );
  });
  it('hands every other notation to the general scanner', () => {
    for (const t of ['1e3+j2', '4,5+j2', '11 kV∠0', '230e^(j30)', '−5', '1∠0.5rad', 'j2+4']) {
      expect(fastParse(t), t).toBe(false);
    }
  });
});

describe('fast number formatting agrees with toPrecision rounding', () => {
  it('on doubles of every scale, at every digits setting', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 1, max: 15 }), (x, d) => {
        expect(formatNumber(x, d)).toBe(slowDigits(x, d));
      }),
      { numRuns: 20000 },
    );
  });
  it('on short decimals near rounding ties', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999999 }), fc.integer({ min: 0, max: 8 }), fc.integer({ min: 1, max: 6 }), (n, k, d) => {
        const x = (n + 0.5) / 10 ** k;
        expect(formatNumber(x, d)).toBe(slowDigits(x, d));
        expect(formatNumber(-x, d)).toBe(slowDigits(-x, d));
      }),
      { numRuns: 20000 },
    );
  });
});

describe('fast number formatting at powers of ten and small magnitudes', () => {
  it('agrees with toPrecision at and next to every power of ten in its range', () => {
    for (let p = -6; p < 15; p++) {
      const x = Number(`1e${p}`);
      for (const y of [x, x * (1 + Number.EPSILON), x * (1 - Number.EPSILON), x * 0.9999999, x * 1.0000001]) {
        for (let d = 1; d <= 15; d++) expect(formatNumber(y, d), `${y} at ${d}`).toBe(slowDigits(y, d));
      }
    }
  });
  it('agrees with toPrecision between 1e-6 and 1', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1, noNaN: true }), fc.integer({ min: 1, max: 15 }), (x, d) => {
        expect(formatNumber(x, d)).toBe(slowDigits(x, d));
      }),
      { numRuns: 20000 },
    );
  });
});
