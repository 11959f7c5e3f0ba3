/**
 * The task pane's view of the preview workbook: the same `WorkbookPort` the Excel
 * adapter implements, here against the preview grid and its engine.
 */
import type { ActiveCell, SelectionValues, SheetWriteResult, WorkbookPort } from '../taskpane/port';
import type { SheetPlan } from '../taskpane/sheets/plan';
import { a1, rectA1 } from './address';
import { isDisplayError } from './engine';
import { writePlanToWorkbook } from './sheets';
import { rawToText } from './grid';
import type { Grid } from './grid';
import type { Workbook } from './workbook';

export class PreviewPort implements WorkbookPort {
  readonly hostName = 'Preview';

  constructor(
    private readonly grid: Grid,
    private readonly workbook: Workbook,
  ) {}

  async getActiveCell(): Promise<ActiveCell> {
    const pos = this.grid.activeCell;
    const sheet = this.grid.sheetName;
    return { sheet, address: a1(pos), formula: rawToText(this.workbook.raw(sheet, pos.row, pos.col)) };
  }

  async setActiveCellFormula(formula: string): Promise<void> {
    if (!formula.startsWith('=')) throw new Error(`a formula starts with "=": got "${formula}"`);
    const pos = this.grid.activeCell;
    const sheet = this.grid.sheetName;
    this.workbook.setCell(sheet, pos.row, pos.col, formula, 'Insert function');
    this.grid.say(`Inserted into ${a1(pos)} from the reference.`);
  }

  sheetWritingBlocked(): string | null {
    return null;
  }

  /** Writes the plan to a new sheet (one undoable step) and shows it. */
  async writeSheetPlan(plan: SheetPlan): Promise<SheetWriteResult> {
    const result = writePlanToWorkbook(this.workbook, plan);
    this.grid.showSheet(result.sheet);
    this.grid.say(`Worked sheet written by the pane: ${plan.title}. Amber cells are inputs; Ctrl+Z removes the sheet.`);
    return result;
  }

  async readSelection(): Promise<SelectionValues> {
    const sel = this.grid.selection;
    const sheet = this.grid.sheetName;
    const id = this.workbook.sheetId(sheet);
    const values: (string | number | boolean | null)[][] = [];
    for (let r = sel.top; r <= sel.bottom; r++) {
      const row: (string | number | boolean | null)[] = [];
      for (let c = sel.left; c <= sel.right; c++) {
        const v = this.workbook.engine.display({ sheet: id, row: r, col: c });
        row.push(isDisplayError(v) ? null : v);
      }
      values.push(row);
    }
    return { sheet, address: rectA1(sel), values };
  }
}
