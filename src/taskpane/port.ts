/**
 * What the task pane needs from the workbook it sits beside. One adapter per host
 * (Excel in ports/excel.ts, the local preview in src/preview); the pane only talks to
 * this interface, so it never touches Office globals and runs unchanged in the preview.
 * Later features extend it (writing worked sheets, reading a selection to plot).
 */
export interface ActiveCell {
  /** Name of the worksheet holding the active cell, e.g. `Sub-board`. */
  readonly sheet: string;
  /** A1 address without the sheet, e.g. `B2`. */
  readonly address: string;
  /** The cell's formula, or its constant value as text; `''` when the cell is empty. */
  readonly formula: string;
}

export interface WorkbookPort {
  /** Shown to the user, e.g. `Excel` or `Preview`. */
  readonly hostName: string;
  /** The active cell: the one with focus, also when a range is selected. */
  getActiveCell(): Promise<ActiveCell>;
  /** Writes a formula (starting with `=`) into the active cell; results may spill. */
  setActiveCellFormula(formula: string): Promise<void>;
}
