/**
 * The quicker way into the engine's parse cache (src/preview/parse-cache.ts): for every
 * formula, at every place, the wrapped parser must give what the engine's own parser gives
 * there (syntax tree, dependencies, flags), whether the result is found or freshly read.
 * The formulas mix every kind the scanner takes and every kind it must leave to the
 * engine: references with and without $, ranges, reversed ranges with mixed ends, column and
 * row ranges, sheet references, names with and without digits, lower-case references,
 * functions whose names hold digits, text holding references, OFFSET, numbers with exponents.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MAX_COLUMNS, MAX_ROWS, PhzEngine } from '../../src/preview/engine';
import { engineParse, parsingIsQuickened, relativeText, wrappedParse } from '../../src/preview/parse-cache';

function engine(): PhzEngine {
  const e = new PhzEngine({ sheets: { S: [[1, 2, 3]], 'Other sheet': [[4]] } });
  e.hf.addNamedExpression('Rate', '=S!$A$1');
  return e;
}

/** Parses `text` at each place, wrapped and not, and compares. */
function same(e: PhzEngine, text: string, places: ReadonlyArray<readonly [number, number]>): void {
  for (const [row, col] of places) {
    const at = { sheet: 0, row, col };
    const wrapped = wrappedParse(e.hf, text, at);
    const own = engineParse(e.hf, text, at);
    expect(wrapped.errors, `${text} at row ${row + 1}, column ${col + 1}`).toEqual(own.errors);
    expect(wrapped.ast, `${text} at row ${row + 1}, column ${col + 1}`).toEqual(own.ast);
    expect(wrapped.dependencies, `${text} at row ${row + 1}, column ${col + 1}`).toEqual(own.dependencies);
    expect(wrapped.hasVolatileFunction).toBe(own.hasVolatileFunction);
    expect(wrapped.hasStructuralChangeFunction).toBe(own.hasStructuralChangeFunction);
  }
}

const PLACES = [
  [0, 0],
  [5, 3],
  [4, 2],
  [39_999, 2],
  [1_048_575, 16_383],
  [7, 0],
] as const;

describe('parse cache', () => {
  it('is in place', () => {
    expect(parsingIsQuickened(engine().hf)).toBe(true);
  });

  it.each([
    '=PHZ.DIV(A1,B1,$E$1)',
    '=PHZ.DIV(a1, b1, $e$1)',
    '=A1+B$2*$C3-$D$4/2^2%',
    '=SUM(A1:B3)',
    '=SUM($A$1:$B$3)',
    '=SUM(A$1:B$3)',
    '=SUM(B3:A1)',
    '=SUM($A$10:A1)',
    '=SUM(A1:$B$2)',
    '=SUM(A:A)',
    '=SUM(1:2)',
    '=S!A1+\'Other sheet\'!A1',
    '=Rate*2',
    '=Rate2*2',
    '=LOG10(A1)+ATAN2(A1,B1)',
    '=LOG10 (A1)',
    '=A1 (B1)',
    '="A1"&B1',
    '="a\\"b"&A1&"c"',
    '=OFFSET(A1,1,1)',
    '=HYPERLINK("x",A1)',
    '=1e-3*A1+.5+2.',
    '=TRUE+FALSE()',
    '=XFD1048576+XFE1',
    '=A0+A01',
    '={1,2;3,4}',
    '=#N/A',
    '=PHZ.ADD("230∠-120", A1:A3)',
    '=IF(A1>1,"yes","no")',
    '=A1:B2',
    '=SUM(A1:B)',
    '=(A1',
    '=PHZ.MAG("3+j4")',
  ])('%s gives what the engine gives, at every place', (text) => {
    const e = engine();
    same(e, text, PLACES);
    same(e, text, [...PLACES].reverse());
  });

  it('gives the engine’s result for formulas built at random, wherever they stand', () => {
    const ref = fc
      .tuple(fc.boolean(), fc.constantFrom('A', 'B', 'E', 'AA', 'xfd', 'ZZZ', 'b'), fc.boolean(), fc.constantFrom(1, 2, 9, 40_000, 1_048_576, 1_048_577, 0))
      .map(([ac, c, ar, r]) => `${ac ? '$' : ''}${c}${ar ? '$' : ''}${r}`);
    const token = fc.oneof(
      ref,
      fc.tuple(ref, ref).map(([a, b]) => `${a}:${b}`),
      fc.constantFrom('A:B', '1:3', 'S!A1', "'Other sheet'!B2", 'Rate', 'Rate2', 'TRUE', '1.5e3', '"A1"', '"x\\"A1"', '2', 'OFFSET(A1,1,0)', ' '),
    );
    const formula = fc.array(token, { minLength: 1, maxLength: 5 }).chain((tokens) =>
      fc.constantFrom('PHZ.ADD', 'SUM', 'LOG10', '').map((f) => (f ? `=${f}(${tokens.join(',')})` : `=${tokens.join('+')}`)),
    );
    const place = fc.tuple(fc.integer({ min: 0, max: MAX_ROWS - 1 }), fc.integer({ min: 0, max: MAX_COLUMNS - 1 }));
    const e = engine();
    fc.assert(
      fc.property(formula, fc.array(place, { minLength: 2, maxLength: 4 }), (text, places) => {
        same(e, text, places);
      }),
      { numRuns: 400 },
    );
  });

  it('writes references relative to the cell, and leaves to the engine what it cannot read alike', () => {
    expect(relativeText('=PHZ.DIV(A2,B2,$E$1)', 1, 2, MAX_COLUMNS, MAX_ROWS)).toBe(relativeText('=PHZ.DIV(A3,B3,$E$1)', 2, 2, MAX_COLUMNS, MAX_ROWS));
    expect(relativeText('=PHZ.DIV(A2,B2,$E$1)', 1, 2, MAX_COLUMNS, MAX_ROWS)).not.toBe(relativeText('=PHZ.DIV(A2,B2,$E$2)', 1, 2, MAX_COLUMNS, MAX_ROWS));
    expect(relativeText('=A1', 0, 0, MAX_COLUMNS, MAX_ROWS)).not.toBe(relativeText('=$A1', 0, 0, MAX_COLUMNS, MAX_ROWS));
    for (const text of ["=S!A1", '=SUM(A:A)', '=SUM($A$10:A1)', '=Rate2', '=OFFSET(A1,1,0)', '="a\\"b"', '=XFE1', '=A1 (2)', '="∠"&Vφ']) {
      expect(relativeText(text, 5, 5, MAX_COLUMNS, MAX_ROWS), text).toBeUndefined();
    }
  });

  it('keeps a column of formulas computing as before (values at both ends after a paste)', () => {
    const e = new PhzEngine({ sheets: { S: [[null, null, null, null, 6]] } });
    const rows = Array.from({ length: 500 }, (_, i) => [i + 1, 2, `=A${i + 1}*B${i + 1}+$E$1`]);
    e.setContents({ sheet: 0, row: 0, col: 0 }, rows);
    // plain arithmetic: (i+1)·2 + 6
    expect(e.display({ sheet: 0, row: 0, col: 2 })).toBe(8);
    expect(e.display({ sheet: 0, row: 499, col: 2 })).toBe(1006);
    e.setContents({ sheet: 0, row: 0, col: 4 }, [[1]]);
    expect(e.display({ sheet: 0, row: 499, col: 2 })).toBe(1001);
  });
});
