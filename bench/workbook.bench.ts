/**
 * The preview as a workbook (issue 12): what a person waits for, through the same Workbook
 * model the grid uses. A paste of 40,000 rows × 3 columns (a dividend, a divisor and a
 * PHZ.DIV per row whose digits argument is a common input in E1; varied realistic inputs from
 * bench/inputs.ts), an edit of E1 that recalculates every row, the undo of that edit, the
 * undo of the whole paste, and the reload of such a workbook from its kept copy. Each action
 * is timed once, cold, in a fresh process, as a person meets it; figures are printed, never
 * asserted. Target: at most 1 s for any single action (the issue's own).
 */
import type { RawCellContent } from 'hyperformula';
import { PhzEngine } from '../src/preview/engine';
import { Workbook } from '../src/preview/workbook';
import { divCases } from './inputs';

export const PASTE_ROWS = 40_000;

function block(): RawCellContent[][] {
  return divCases(PASTE_ROWS, 7).map((c, i) => [c.rectI, c.divisorI, `=PHZ.DIV(A${i + 1},B${i + 1},$E$1)`]);
}

function book(): Workbook {
  const wb = new Workbook(new PhzEngine({ sheets: { Sheet1: [[null, null, null, null, 6]] } }));
  return wb;
}

function ms(f: () => void): number {
  const t0 = process.hrtime.bigint();
  f();
  return Number(process.hrtime.bigint() - t0) / 1e6;
}

function check(wb: Workbook): void {
  const shown = wb.engine.display({ sheet: 0, row: PASTE_ROWS - 1, col: 2 });
  if (typeof shown !== 'string' || !shown.includes('∠')) throw new Error(`unexpected result ${JSON.stringify(shown)}`);
}

export const workbookCases = {
  wbPaste: () => {
    const wb = book();
    const rows = block();
    const t = ms(() => wb.setBlock('Sheet1', 0, 0, rows, 'Paste'));
    check(wb);
    return t;
  },
  wbEdit: () => {
    const wb = book();
    wb.setBlock('Sheet1', 0, 0, block(), 'Paste');
    const t = ms(() => wb.setCell('Sheet1', 0, 4, 5));
    check(wb);
    return t;
  },
  wbUndoEdit: () => {
    const wb = book();
    wb.setBlock('Sheet1', 0, 0, block(), 'Paste');
    wb.setCell('Sheet1', 0, 4, 5);
    const t = ms(() => wb.undo());
    check(wb);
    return t;
  },
  wbUndoPaste: () => {
    const wb = book();
    wb.setBlock('Sheet1', 0, 0, block(), 'Paste');
    const t = ms(() => wb.undo());
    if (wb.engine.display({ sheet: 0, row: PASTE_ROWS - 1, col: 2 }) !== null) throw new Error('undo left the paste');
    return t;
  },
  wbSaveCopy: () => {
    const wb = book();
    wb.setBlock('Sheet1', 0, 0, block(), 'Paste');
    return ms(() => structuredClone(wb.toDocument()));
  },
  wbReload: () => {
    const wb = book();
    wb.setBlock('Sheet1', 0, 0, block(), 'Paste');
    const doc = structuredClone(wb.toDocument());
    const fresh = new Workbook(new PhzEngine());
    const t = ms(() => fresh.load(doc));
    check(fresh);
    return t;
  },
};
