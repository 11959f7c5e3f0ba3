/**
 * What the task pane needs from the workbook it sits beside. One adapter per host
 * (Excel in ports/excel.ts, the local preview in src/preview); the pane only talks to
 * this interface, so it never touches Office globals and runs unchanged in the preview.
 * Later features extend it (writing worked sheets, reading a selection to plot).
 */
import type { SelectionBlock } from './plot/model';
import type { SheetPlan } from './sheets/plan';

export interface ActiveCell {
  /** Name of the worksheet holding the active cell, e.g. `Sub-board`. */
  readonly sheet: string;
  /** A1 address without the sheet, e.g. `B2`. */
  readonly address: string;
  /** The cell's formula, or its constant value as text; `''` when the cell is empty. */
  readonly formula: string;
}

/** What inserting into the active cell did. */
export interface InsertResult {
  /** Where: sheet and A1 address of the active cell. */
  readonly sheet: string;
  readonly address: string;
  /** True when the formula was written; false when the cell was not empty. */
  readonly written: boolean;
}

/**
 * A phasor chart that stays linked to cells (the phasor plot's "Insert as chart", also used
 * by worked sheets). Shared contract between the plot and the worked-sheet builder.
 */
export interface PhasorChartRequest {
  /** Chart title, e.g. `Phase currents`. */
  readonly title: string;
  /** The worksheet whose cells hold the phasors. */
  readonly sheet: string;
  /**
   * One entry per phasor: its label and the A1 address (no sheet part) of the cell holding it,
   * or of a one-row pair of cells holding its real and imaginary parts (`B5:C5`).
   */
  readonly phasors: ReadonlyArray<{
    readonly label: string;
    readonly cell: string;
    /** Phasors of one group share one magnitude scale (e.g. `V`, `A`); default: one group. */
    readonly group?: string;
  }>;
  /**
   * Top-left cell (A1, on `sheet`) of a free area where the chart and its helper cells may go;
   * left out: the adapter finds free space. Never over cells the user owns.
   */
  readonly anchor?: string;
  /**
   * Top-left cell (A1, on `sheet`) for the chart itself, e.g. a place a worked sheet keeps for
   * it; left out: beside the helper cells at `anchor`, or right of the sheet's used cells.
   */
  readonly chartCell?: string;
}

/** What a chart insertion did, for the status line. */
export interface PhasorChartResult {
  /** Sheet and range of the helper cells written, e.g. `Sheet1!H2:K8`. */
  readonly helperRange: string;
  /** The chart's name in the workbook. */
  readonly chartName: string;
}

/** What a host can do for the phasor plot; each missing capability is said in words. */
export interface PlotSupport {
  /** Why the selection cannot be read at all, or null. */
  readonly read: string | null;
  /** Why the plot cannot follow recalculation (it still follows the selection), or null. */
  readonly recalc: string | null;
  /** Why "Insert as chart" is not available, or null. */
  readonly chart: string | null;
}

/** A block of cells by sheet and A1 address (no sheet part), e.g. `Sub-board`, `A21:D22`. */
export interface PlotRange {
  readonly sheet: string;
  readonly address: string;
}

/** Why the plot should read the selection again. */
export type SelectionChange = 'selection' | 'values';

/** The phasor plot's needs (issue 10): the selection, its changes, and linked charts. */
export interface PlotPort {
  /** Requirement sets checked at runtime, in words for the pane. */
  plotSupport(): PlotSupport;
  /**
   * Reads the used part of the selection (or of `range`, a block the plot keeps while the
   * person works elsewhere): values and where they sit. Over `maxCells` cells the values are
   * left out (`cellCount` says how many there were).
   */
  readSelection(maxCells: number, range?: PlotRange): Promise<SelectionBlock>;
  /**
   * Calls `listener` when the selection moves or the workbook recalculates, until the
   * returned function is called.
   */
  watchSelection(listener: (why: SelectionChange) => void): Promise<() => Promise<void>>;
  /**
   * Places a chart that stays linked to the cells: helper cells with PHZ formulas (on a new
   * sheet, or at `request.anchor` when that area is empty) and a chart over them. Never
   * writes over a cell that holds anything.
   */
  insertPhasorChart(request: PhasorChartRequest): Promise<PhasorChartResult>;
}

/** What writing a worked sheet did, for the status line. */
export interface SheetWriteResult {
  /** The new sheet's name (it is now the active sheet). */
  readonly sheet: string;
  /** Cells written (constants and formulas). */
  readonly cells: number;
  /** Names defined, all scoped to the new sheet. */
  readonly names: number;
}

export interface WorkbookPort extends PlotPort {
  /** Shown to the user, e.g. `Excel` or `Preview`. */
  readonly hostName: string;
  /** The active cell: the one with focus, also when a range is selected. */
  getActiveCell(): Promise<ActiveCell>;
  /**
   * Writes a formula (starting with `=`) into the active cell only if that cell is empty,
   * checking and writing in one go (nothing typed in between is overwritten); results may
   * spill. Says what happened: written, or what the cell holds.
   */
  insertIntoEmptyActiveCell(formula: string): Promise<InsertResult>;
  /**
   * Worked sheets: writes `plan` to a NEW sheet (a free, valid name made from
   * `plan.sheetName`), never over an existing sheet or cell, with its names scoped to that
   * sheet, and activates it. Hosts without it cannot write sheets.
   */
  writeSheetPlan?(plan: SheetPlan): Promise<SheetWriteResult>;
  /** Why this host cannot write worked sheets (e.g. a missing requirement set), or null when it can. */
  sheetWritingBlocked?(): string | null;
}
