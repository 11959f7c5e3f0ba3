/**
 * What the phasor plot works on, independent of any host: the cells of a selection in,
 * groups of labelled phasors out. Pure data; no DOM, no Office.
 */

/** One cell as a host hands it over: a value, `null` for blank, or an error value. */
export type SelectionCell = number | string | boolean | null | { readonly error: string };

/** A block of cells read from a sheet (the used part of the selection). */
export interface SelectionBlock {
  readonly sheet: string;
  /** Zero-based row and column of `values[0][0]` on the sheet. */
  readonly top: number;
  readonly left: number;
  /** Row by row. Empty when the selection holds nothing, or more cells than the reader's limit. */
  readonly values: readonly (readonly SelectionCell[])[];
  /** The selection as the person made it, A1 without the sheet (e.g. `A21:D22`). */
  readonly selected: string;
  /** Cells in the used part of the selection; above the reader's limit `values` is left empty. */
  readonly cellCount: number;
}

/** How phasors share magnitude scales. `auto` decides from the labels (see `read.ts`). */
export type ScaleMode = 'auto' | 'columns' | 'rows' | 'one';

/** One phasor to draw. Parts are in the group's base unit (kV text is read as V). */
export interface PlotPhasor {
  /** Shown beside the arrow, in the tooltip and in the data table. */
  readonly label: string;
  /** A1 address of the cell it came from (`B22`), or of the pair (`B5:C5`). */
  readonly cell: string;
  readonly re: number;
  readonly im: number;
  /** Index into `PlotData.groups`. */
  readonly group: number;
  /** Position within its group (0-based): picks its colour and marker. */
  readonly index: number;
}

/** A set of phasors sharing one magnitude scale (one column, one row, or all). */
export interface PlotGroup {
  /** e.g. `Phase current`, `current`, `Column B`. */
  readonly name: string;
  /** Unit symbol when a label or unit word says it (`A`, `V`, `Ω`, `S`, `VA`); `''` otherwise. */
  readonly unit: string;
}

/** A cell in the phasor block that could not be read, with the parser's own message. */
export interface UnreadableCell {
  readonly cell: string;
  readonly message: string;
}

export interface PlotData {
  /** `Sub-board!A21:D22` */
  readonly source: string;
  readonly sheet: string;
  readonly groups: readonly PlotGroup[];
  readonly phasors: readonly PlotPhasor[];
  readonly unreadable: readonly UnreadableCell[];
  /** How the groups were formed (after `auto` was decided). */
  readonly scaleMode: Exclude<ScaleMode, 'auto'>;
}
