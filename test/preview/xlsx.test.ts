/**
 * The .xlsx round trip: the demo workbook and two worked sheets (scoped names, roles,
 * widths) are saved with ExcelJS and opened again; every cell must hold the same content,
 * show the same result, and keep its role; names keep their sheet scope; widths come back.
 * A file that cannot be read gives a message saying why. The file itself is also read with
 * ExcelJS directly, to check what Excel would find in it (formulas, cached results, fills).
 */
import * as ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { specs } from '../../src/functions';
import { loadDemo } from '../../src/preview/demo';
import { PhzEngine } from '../../src/preview/engine';
import { charsToPx } from '../../src/preview/grid';
import { writePlanToWorkbook } from '../../src/preview/sheets';
import { FileError, readXlsx, saveXlsx } from '../../src/preview/xlsx';
import { Workbook } from '../../src/preview/workbook';
import type { WorkbookDocument } from '../../src/preview/workbook';
import { calculations } from '../../src/taskpane/sheets/calculations';
import { demoValues } from '../../src/taskpane/sheets/calculation';

function demoBook(): Workbook {
  const engine = new PhzEngine();
  const report = loadDemo(engine, specs);
  const wb = new Workbook(engine);
  for (const s of report.styles) wb.setStyle(s.sheet, s.row, s.col, s.style);
  for (const calc of calculations.slice(0, 2)) writePlanToWorkbook(wb, calc.plan(demoValues(calc), { scenario: 'Round trip', date: '2026-12-02' }));
  // a second worked sheet of the same calculation: the same names, each scoped to its sheet
  writePlanToWorkbook(wb, calculations[0].plan(demoValues(calculations[0]), { scenario: 'Twice', date: '2026-12-02' }));
  wb.setCell('Sub-board', 120, 3, 1e-300);
  wb.setCell('Sub-board', 121, 3, "'=not a formula");
  return wb;
}

async function save(wb: Workbook): Promise<ArrayBuffer> {
  const doc = wb.toDocument();
  return saveXlsx({
    doc,
    valueAt: (sheet, row, col) => wb.engine.display({ sheet: wb.sheetId(sheet), row, col }),
    spillAt: (sheet, row, col) => wb.engine.spillSize({ sheet: wb.sheetId(sheet), row, col }),
    widthsPx: (sheet, count) => Array.from({ length: count }, (_, c) => (wb.columnWidths(sheet)[c] ? charsToPx(wb.columnWidths(sheet)[c]) : 84)),
  });
}

function cellsOf(wb: Workbook, sheet: string) {
  const id = wb.sheetId(sheet);
  const dims = wb.used(sheet);
  const out: { at: string; raw: unknown; shown: unknown; style: unknown }[] = [];
  for (let r = 0; r < dims.height; r++) {
    for (let c = 0; c < dims.width; c++) {
      out.push({ at: `${r},${c}`, raw: wb.raw(sheet, r, c), shown: wb.engine.display({ sheet: id, row: r, col: c }), style: wb.styleOf(sheet, r, c) });
    }
  }
  return out;
}

describe('.xlsx round trip', async () => {
  const before = demoBook();
  const file = await save(before);
  const { doc, cells } = await readXlsx(file, 'round-trip.xlsx');
  const after = new Workbook(new PhzEngine());
  after.load(doc);

  it('keeps the sheets and their order', () => {
    expect(after.sheetNames()).toEqual(before.sheetNames());
    expect(cells).toBeGreaterThan(500);
  });

  it.each(before.sheetNames())('sheet %s: every cell holds the same content, shows the same result and keeps its role', (sheet) => {
    expect(cellsOf(after, sheet)).toEqual(cellsOf(before, sheet));
  });

  it('keeps names with their sheet scope', () => {
    for (const sheet of before.sheetNames()) expect(after.sheetNamesDefined(sheet).sort(), sheet).toEqual(before.sheetNamesDefined(sheet).sort());
    const scoped = before.sheetNames().filter((s) => before.sheetNamesDefined(s).length > 0);
    expect(scoped.length).toBeGreaterThanOrEqual(3);
  });

  it('keeps the column widths a sheet asked for (to a tenth of a character)', () => {
    for (const sheet of before.sheetNames()) {
      const want = before.columnWidths(sheet);
      const got = after.columnWidths(sheet);
      want.forEach((w, c) => {
        if (w) expect(Math.abs(got[c] - w), `${sheet} column ${c}`).toBeLessThanOrEqual(0.15);
      });
    }
  });

  it('saves again to the same cells (a second round trip changes nothing)', async () => {
    const again = await readXlsx(await save(after), 'again.xlsx');
    const strip = (d: WorkbookDocument) => d.sheets.map((s) => ({ name: s.name, rows: s.rows, styles: [...s.styles].sort() }));
    expect(strip(again.doc)).toEqual(strip(doc));
  });

  it('writes what Excel reads: PHZ formulas, cached results, spills as array formulas, input fills', async () => {
    const x = new ExcelJS.Workbook();
    await x.xlsx.load(file);
    const ws = x.getWorksheet('Sub-board')!;
    const id = before.sheetId('Sub-board');
    let formulas = 0;
    let arrays = 0;
    let inputs = 0;
    ws.eachRow((row, r) =>
      row.eachCell((cell, c) => {
        const v = cell.value as ExcelJS.CellFormulaValue & { shareType?: string };
        if (v && typeof v === 'object' && 'formula' in v && v.formula) {
          formulas++;
          expect(`=${v.formula}`).toBe(before.raw('Sub-board', r - 1, c - 1));
          const shown = before.engine.display({ sheet: id, row: r - 1, col: c - 1 });
          if (typeof shown === 'number' || (typeof shown === 'string' && shown !== '')) expect(v.result).toBe(shown);
          if (v.shareType === 'array') arrays++;
        }
      }),
    );
    expect(formulas).toBeGreaterThan(20);
    expect(arrays).toBeGreaterThan(0);
    const worked = x.worksheets.find((w) => w.name.startsWith(calculations[0].plan(demoValues(calculations[0]), { scenario: '', date: '2026-12-02' }).sheetName.slice(0, 10)))!;
    worked.eachRow((row) =>
      row.eachCell((cell) => {
        if ((cell.fill as ExcelJS.FillPattern | undefined)?.fgColor?.argb === 'FFFBF0D4') inputs++;
      }),
    );
    expect(inputs).toBeGreaterThan(3);
  });
});

describe('files that cannot be opened', () => {
  it('says a file that is not a zip package is not an .xlsx workbook', async () => {
    const text = new TextEncoder().encode('Phase,Current\nL1,12').buffer as ArrayBuffer;
    await expect(readXlsx(text, 'loads.csv')).rejects.toThrow(FileError);
    await expect(readXlsx(text, 'loads.csv')).rejects.toThrow(/loads\.csv is not an \.xlsx workbook .* nothing was changed/);
  });

  it('says why a damaged .xlsx cannot be read', async () => {
    const good = new Uint8Array(await save(new Workbook(new PhzEngine({ sheets: { S: [[1, '=A1*2']] } }))));
    const cut = good.slice(0, Math.floor(good.length / 2)).buffer as ArrayBuffer;
    await expect(readXlsx(cut, 'cut.xlsx')).rejects.toThrow(/cut\.xlsx could not be read \(.+\): nothing was changed/);
  });

  it('refuses a file over the size limit before reading it', async () => {
    const big = new ArrayBuffer(51 * 1024 * 1024);
    await expect(readXlsx(big, 'huge.xlsx')).rejects.toThrow(/huge\.xlsx is 51\.0 MB; the preview opens files up to 50 MB/);
  });
});
