/**
 * The task pane's view of the preview workbook: the same `WorkbookPort` the Excel
 * adapter implements, here against the preview grid and its engine.
 */
import type { SelectionBlock } from '../taskpane/plot/model';
import type {
  ActiveCell,
  InsertResult,
  PhasorChartRequest,
  PhasorChartResult,
  PlotRange,
  PlotSupport,
  SelectionChange,
  SheetWriteResult,
  WorkbookPort,
} from '../taskpane/port';
import type { SheetPlan } from '../taskpane/sheets/plan';
import { a1 } from './address';
import { writePlanToWorkbook } from './sheets';
import { rawToText } from './grid';
import type { Grid } from './grid';
import type { PreviewPlotPort } from './plot-port';
import type { Workbook } from './workbook';

export class PreviewPort implements WorkbookPort {
  readonly hostName = 'Preview';

  constructor(
    private readonly grid: Grid,
    private readonly workbook: Workbook,
    /** The phasor plot's reading, events and charts (plot-port.ts). */
    private readonly plot: PreviewPlotPort,
  ) {}

  plotSupport(): PlotSupport {
    return this.plot.plotSupport();
  }

  readSelection(maxCells: number, range?: PlotRange): Promise<SelectionBlock> {
    return this.plot.readSelection(maxCells, range);
  }

  watchSelection(listener: (why: SelectionChange) => void): Promise<() => Promise<void>> {
    return this.plot.watchSelection(listener);
  }

  insertPhasorChart(request: PhasorChartRequest): Promise<PhasorChartResult> {
    return this.plot.insertPhasorChart(request);
  }

  async getActiveCell(): Promise<ActiveCell> {
    const pos = this.grid.activeCell;
    const sheet = this.grid.sheetName;
    return { sheet, address: a1(pos), formula: rawToText(this.workbook.raw(sheet, pos.row, pos.col)) };
  }

  /** Checks the active cell and writes in one synchronous step: nothing can come between. */
  async insertIntoEmptyActiveCell(formula: string): Promise<InsertResult> {
    if (!formula.startsWith('=')) throw new Error(`a formula starts with "=": got "${formula.slice(0, 40)}"`);
    const pos = this.grid.activeCell;
    const sheet = this.grid.sheetName;
    const { written } = this.workbook.setCellIfEmpty(sheet, pos.row, pos.col, formula, 'Insert function');
    if (written) this.grid.say(`Inserted into ${a1(pos)} from the reference.`);
    return { sheet, address: a1(pos), written };
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
}
