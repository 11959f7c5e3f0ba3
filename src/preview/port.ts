/**
 * The task pane's view of the preview workbook: the same `WorkbookPort` the Excel
 * adapter implements, here against the preview grid and its engine.
 */
import type { ActiveCell, WorkbookPort } from '../taskpane/port';
import { a1 } from './address';
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
}
