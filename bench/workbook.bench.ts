/**
 * The preview as a workbook (issue 12): what a person waits for, through the same Workbook
 * model the grid uses. A paste of 40,000 rows × 3 columns (a dividend, a divisor and a
 * PHZ.DIV per row whose digits argument is a common input in E1; varied realistic inputs from
 * bench/inputs.ts), an edit of E1 that recalculates every row, the undo of that edit, the
 * undo and redo of the whole paste, the reload of such a workbook from its kept copy, and
 * saving it as .xlsx and opening that file again. Saving and opening come in their two
 * parts: what the page does (reading the workbook for the file; building the engine from the
 * file's document) and what the file worker does meanwhile, the grid usable (ExcelJS writing
 * or reading the file). Each action is timed once, cold, in a fresh process, as a person meets
 * it; figures are printed, never asserted. Target: at most 1 s for any single action (the
 * issue's own).
 */
import type { RawCellContent } from 'hyperformula';
import { PhzEngine } from '../src/preview/engine';
import { Workbook } from '../src/preview/workbook';
import { buildXlsx, prepareSave, readXlsx } from '../src/preview/xlsx';
import type { SaveData } from '../src/preview/xlsx';
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

async function msAsync(f: () => Promise<unknown>): Promise<number> {
  const t0 = process.hrtime.bigint();
  await f();
  return Number(process.hrtime.bigint() - t0) / 1e6;
}

/** What the page reads from the workbook for the file (as main.ts does; widths as drawn by default). */
function saveData(wb: Workbook): SaveData {
  return prepareSave({
    doc: wb.toDocument(),
    valueAt: (sheet, row, col) => wb.engine.display({ sheet: wb.sheetId(sheet), row, col }),
    spillAt: (sheet, row, col) => wb.engine.spillSize({ sheet: wb.sheetId(sheet), row, col }),
    widthsPx: (_, count) => new Array<number>(count).fill(84),
  });
}

function pasted(): Workbook {
  const wb = book();
  wb.setBlock('Sheet1', 0, 0, block(), 'Paste');
  return wb;
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
    const wb = pasted();
    const t = ms(() => wb.undo());
    if (wb.engine.display({ sheet: 0, row: PASTE_ROWS - 1, col: 2 }) !== null) throw new Error('undo left the paste');
    return t;
  },
  wbRedoPaste: () => {
    const wb = pasted();
    wb.undo();
    const t = ms(() => wb.redo());
    check(wb);
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
  wbSavePage: () => {
    const wb = pasted();
    return ms(() => saveData(wb));
  },
  wbSaveWorker: async () => {
    const data = saveData(pasted());
    return msAsync(() => buildXlsx(data));
  },
  wbOpenWorker: async () => {
    const bytes = await buildXlsx(saveData(pasted()));
    return msAsync(() => readXlsx(bytes, 'bench.xlsx'));
  },
  wbOpenPage: async () => {
    const wb = pasted();
    const read = await readXlsx(await buildXlsx(saveData(wb)), 'bench.xlsx');
    // the page replaces its workbook (the same 40,000 rows) by the file's, as one undoable step
    const t = ms(() => wb.replaceWith(read.doc, 'Open bench.xlsx'));
    check(wb);
    return t;
  },
};
