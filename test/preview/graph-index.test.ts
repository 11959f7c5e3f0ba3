/**
 * The dependency-graph index (src/preview/graph-index.ts): with one cell read by thousands
 * of formulas, results must be the same as without it — checked against plain arithmetic
 * in this test (complex division by hand, the textbook formula (a+jb)/(c+jd) =
 * ((ac+bd) + j(bc−ad))/(c²+d²), common practice) — across a paste, an edit of the shared
 * cell, undo of the paste, and removing and re-adding single dependents.
 */
import { describe, expect, it } from 'vitest';
import { parsePhasor } from '../../src/core/parse';
import { PhzEngine } from '../../src/preview/engine';
import { graphIsIndexed } from '../../src/preview/graph-index';
import { Workbook } from '../../src/preview/workbook';
import { expectClose } from '../helpers';

const N = 3000;

function setup() {
  const wb = new Workbook(new PhzEngine({ sheets: { S: [[null, null, null, 2]] } }));
  const rows = Array.from({ length: N }, (_, i) => [`${10 + (i % 17)}+j${i % 5}`, `=PHZ.DIV(A${i + 1},PHZ.MUL($D$1,"${1 + (i % 3)}+j1"))`]);
  wb.setBlock('S', 0, 0, rows, 'Paste');
  return wb;
}

/** (re + j im) / (k·((1+i%3) + j1)) by hand. */
function expected(i: number, k: number): { re: number; im: number } {
  const [a, b] = [10 + (i % 17), i % 5];
  const [c, d] = [k * (1 + (i % 3)), k];
  const den = c * c + d * d;
  return { re: (a * c + b * d) / den, im: (b * c - a * d) / den };
}

function shown(wb: Workbook, row: number): { re: number; im: number } {
  const v = wb.engine.display({ sheet: 0, row, col: 1 });
  if (typeof v !== 'string') throw new Error(`row ${row + 1} shows ${JSON.stringify(v)}`);
  const z = parsePhasor(v);
  return { re: z.re, im: z.im };
}

/** Within the 6 significant figures the cells show, relative to the magnitude (a part may be near 0). */
function near(got: { re: number; im: number }, want: { re: number; im: number }, where: string): void {
  const size = Math.hypot(want.re, want.im);
  expectClose(Math.hypot(got.re, got.im), size, 1e-5);
  expect(Math.abs(got.re - want.re), where).toBeLessThanOrEqual(2e-5 * size);
  expect(Math.abs(got.im - want.im), where).toBeLessThanOrEqual(2e-5 * size);
}

function check(wb: Workbook, k: number): void {
  for (const i of [0, 1, 2, 17, N / 2, N - 2, N - 1]) {
    const want = expected(i, k);
    const got = shown(wb, i);
    near(got, want, `row ${i + 1}`);
  }
}

describe('one cell read by thousands of formulas', () => {
  it('indexes the engine’s graph', () => {
    expect(graphIsIndexed(new PhzEngine().hf)).toBe(true);
  });

  it('gives every row its result after the paste, and after the shared cell changes', () => {
    const wb = setup();
    check(wb, 2);
    wb.setCell('S', 0, 3, 3);
    check(wb, 3);
    wb.undo();
    check(wb, 2);
  });

  it('stops updating rows whose formulas were undone, and updates them again after redo', () => {
    const wb = setup();
    wb.undo();
    expect(wb.engine.display({ sheet: 0, row: N - 1, col: 1 })).toBe(null);
    wb.redo();
    check(wb, 2);
    wb.setCell('S', 0, 3, 4);
    check(wb, 4);
    wb.undo();
    wb.undo();
    wb.setCell('S', 0, 3, 6);
    expect(wb.engine.display({ sheet: 0, row: N - 1, col: 1 })).toBe(null);
  });

  it('removes and re-adds single dependents in the middle', () => {
    const wb = setup();
    wb.clear('S', { top: 100, left: 1, bottom: 100, right: 1 });
    wb.setCell('S', 0, 3, 5);
    expect(wb.engine.display({ sheet: 0, row: 100, col: 1 })).toBe(null);
    check(wb, 5);
    wb.setCell('S', 100, 1, '=PHZ.DIV(A101,PHZ.MUL($D$1,"2+j1"))');
    near(shown(wb, 100), expected(100, 5), 'row 101');
    wb.setCell('S', 0, 3, 1);
    check(wb, 1);
  });
});
