/** The WorkbookPort for Excel, on the Office.js workbook API. */
import type { ActiveCell, InsertResult, SheetWriteResult, WorkbookPort } from '../port';
import type { CellRole, SheetPlan } from '../sheets/plan';
import { cellA1, columnLetter, planGrid, uniqueSheetName } from '../sheets/plan';
import { excelPlotPort } from './excel-plot';

/** Strips the sheet part of an Excel address: `'My sheet'!B2` → `B2`. */
export function localAddress(address: string): string {
  const bang = address.lastIndexOf('!');
  return bang >= 0 ? address.slice(bang + 1) : address;
}

/**
 * Requirement sets worked sheets need: ExcelApi 1.4 for names scoped to a worksheet
 * (`worksheet.names.add`); it also covers worksheets.add, range formulas and formats (1.1)
 * and column widths (1.2).
 */
export const SHEET_REQUIREMENTS: ReadonlyArray<readonly [string, string]> = [['ExcelApi', '1.4']];

/** How each role of a plan looks in Excel (roles left out keep Excel's default look). */
interface RoleFormat {
  readonly fill?: string;
  readonly color?: string;
  readonly bold?: boolean;
  readonly italic?: boolean;
  readonly size?: number;
  readonly font?: string;
  readonly bottomBorder?: boolean;
}
const INPUT_FILL = '#FBF0D4';
const ROLE_FORMAT: Partial<Record<CellRole, RoleFormat>> = {
  title: { bold: true, size: 14 },
  subtitle: { italic: true, color: '#55656D' },
  note: { italic: true, color: '#55656D' },
  heading: { bold: true, size: 12, bottomBorder: true },
  header: { bold: true, fill: '#EEF1EE' },
  input: { fill: INPUT_FILL, color: '#6B4A00' },
  scenario: { fill: INPUT_FILL, color: '#6B4A00' },
  symbol: { bold: true },
  verdict: { bold: true },
  caution: { color: '#7A4A00' },
  chart: { italic: true, color: '#55656D' },
  formulaText: { font: 'Consolas', color: '#55656D' },
};

/** Runs of cells of one role on one row: [row, first col, last col, role]. */
function roleRuns(plan: SheetPlan): Array<readonly [number, number, number, CellRole]> {
  const byRow = new Map<number, Array<{ col: number; role: CellRole }>>();
  for (const c of plan.cells) {
    if (!ROLE_FORMAT[c.role]) continue;
    let row = byRow.get(c.row);
    if (!row) byRow.set(c.row, (row = []));
    row.push({ col: c.col, role: c.role });
  }
  const runs: Array<readonly [number, number, number, CellRole]> = [];
  for (const [r, cells] of byRow) {
    cells.sort((a, b) => a.col - b.col);
    let start = cells[0];
    let last = cells[0];
    for (let i = 1; i <= cells.length; i++) {
      const c = cells[i];
      if (c && c.role === start.role && c.col === last.col + 1) {
        last = c;
        continue;
      }
      runs.push([r, start.col, last.col, start.role]);
      if (c) start = last = c;
    }
  }
  return runs;
}

/** Points per character of column width (Excel's default font: 8.43 characters ≈ 48 pt, common practice). */
const POINTS_PER_CHAR = 5.7;

export const excelPort: WorkbookPort = {
  hostName: 'Excel',
  ...excelPlotPort,

  getActiveCell(): Promise<ActiveCell> {
    return Excel.run(async (context) => {
      const cell = context.workbook.getActiveCell();
      cell.load('address,formulas,worksheet/name');
      await context.sync();
      const formula = cell.formulas[0]?.[0];
      return {
        sheet: cell.worksheet.name,
        address: localAddress(cell.address),
        formula: formula === undefined || formula === null ? '' : String(formula),
      };
    });
  },

  /**
   * One Excel.run, two round trips: the first reads the active cell (its formulas and
   * whether it belongs to a spill), the second writes only when it was empty. Nothing
   * runs between the check and the write on the pane's side.
   */
  insertIntoEmptyActiveCell(formula: string): Promise<InsertResult> {
    if (!formula.startsWith('=')) return Promise.reject(new Error(`a formula starts with "=": got "${formula.slice(0, 40)}"`));
    return Excel.run(async (context) => {
      const cell = context.workbook.getActiveCell();
      cell.load('address,formulas,values,worksheet/name');
      await context.sync();
      const held = cell.formulas[0]?.[0];
      const shown = cell.values[0]?.[0];
      const result = { sheet: cell.worksheet.name, address: localAddress(cell.address) };
      // a cell showing part of a spilled result has no formula of its own but a value
      if ((held !== undefined && held !== null && held !== '') || (shown !== undefined && shown !== null && shown !== '')) {
        return { ...result, written: false };
      }
      cell.formulas = [[formula]];
      await context.sync();
      return { ...result, written: true };
    });
  },

  sheetWritingBlocked(): string | null {
    const requirements = typeof Office === 'undefined' ? undefined : Office.context?.requirements;
    if (!requirements) return 'Office.js could not tell which Excel features this host has.';
    const missing = SHEET_REQUIREMENTS.filter(([set, version]) => !requirements.isSetSupported(set, version));
    if (missing.length === 0) return null;
    return `this version of Excel lacks ${missing.map(([s, v]) => `${s} ${v}`).join(', ')} (names scoped to a worksheet). Use a current Excel (Microsoft 365, Excel 2016 or later, or Excel on the web).`;
  },

  /**
   * Two round trips whatever the plan's size: the first reads the sheet names (to pick a
   * free one), the second adds the sheet and writes every cell, format, name and column
   * width, and activates the sheet. Nothing else in the workbook is touched.
   */
  writeSheetPlan(plan: SheetPlan): Promise<SheetWriteResult> {
    const blocked = excelPort.sheetWritingBlocked?.() ?? null;
    if (blocked) return Promise.reject(new Error(blocked));
    return Excel.run(async (context) => {
      const sheets = context.workbook.worksheets;
      sheets.load('items/name');
      await context.sync();
      const name = uniqueSheetName(
        plan.sheetName,
        sheets.items.map((s) => s.name),
      );
      const sheet = sheets.add(name);
      // Names first, so the formulas that use them resolve as they are written.
      for (const n of plan.names) sheet.names.add(n.name, sheet.getRange(cellA1(n.row, n.col)), n.comment);
      const grid = planGrid(plan);
      const whole = sheet.getRange(`A1:${cellA1(grid.length - 1, grid[0].length - 1)}`);
      // null in a 2-D array leaves that cell as it is (Microsoft's "Blank and null values in
      // Excel add-ins"): empty on the new sheet, so the one-call functions' spills have room
      whole.formulas = grid as unknown as string[][];
      for (const [row, first, last, role] of roleRuns(plan)) {
        const f = ROLE_FORMAT[role]!;
        const range = sheet.getRange(`${cellA1(row, first)}:${cellA1(row, last)}`);
        if (f.fill) range.format.fill.color = f.fill;
        if (f.color) range.format.font.color = f.color;
        if (f.bold) range.format.font.bold = true;
        if (f.italic) range.format.font.italic = true;
        if (f.size) range.format.font.size = f.size;
        if (f.font) range.format.font.name = f.font;
        if (f.bottomBorder) range.format.borders.getItem('EdgeBottom').style = 'Continuous';
      }
      const area = plan.chartArea;
      sheet.getRange(`${cellA1(area.top + 3, area.left)}:${cellA1(area.bottom, area.right)}`).format.fill.color = '#F6F7FB';
      plan.columnWidths.forEach((chars, c) => {
        const letter = columnLetter(c);
        sheet.getRange(`${letter}:${letter}`).format.columnWidth = Math.round(chars * POINTS_PER_CHAR);
      });
      sheet.activate();
      await context.sync();
      return { sheet: name, cells: plan.cells.length, names: plan.names.length };
    });
  },
};
