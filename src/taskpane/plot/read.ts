/**
 * Reading a selection for the plot: cells → labelled groups of phasors, with the cells
 * that could not be read listed (blanks skipped). Every text goes through the core's one
 * parser; every other cell through the function layer's readers, so the plot reads what
 * the PHZ functions read and explains a cell with the same message.
 *
 * Shapes (DESIGN §3, as the functions read them):
 * - a text column to the left of the phasors gives the row labels, a header row above
 *   them the column labels (as in the labelled STARLOAD / DELTALOAD tables);
 * - a column of unit words at the right (`A`, `V`, `kV`, `Ω`, `–`) gives each row's unit;
 * - exactly two numeric columns are (real, imaginary) pairs, one phasor per row;
 * - otherwise every cell is one phasor (text in any notation, or a number).
 *
 * Scales: one group (one magnitude scale) per column unless the block is one row, a unit
 * column is given, or the row labels name quantities and the column labels do not
 * (a row of L1, L2, L3 per quantity, as in the demo sheet); `scaleMode` overrides that.
 */
import { isPhzError } from '../../core/errors';
import { plotMessages, readerMessages } from '../../core/messages';
import { parsePhasorWithQuantity } from '../../core/parse';
import { isBlank, isPairBlock, readPhasors } from '../../functions/readers';
import { a1 } from '../a1';
import type { PlotData, PlotGroup, PlotPhasor, ScaleMode, SelectionBlock, SelectionCell, UnreadableCell } from './model';
import { isNoUnitMark, unitFromLabel, unitOfQuantity, unitToken } from './units';

/** The reader's limits; the pane says them when a selection is over. */
export const PLOT_LIMITS = {
  /** Cells read from the used part of a selection. */
  maxCells: 4000,
  /** Phasors drawn at once. */
  maxPhasors: 1000,
} as const;

type Cell =
  | { readonly kind: 'blank' }
  | { readonly kind: 'phasor'; readonly re: number; readonly im: number; readonly unit: string }
  /** Text the parser refused: a label where labels may be, an unreadable cell elsewhere. */
  | { readonly kind: 'text'; readonly text: string; readonly message: string }
  | { readonly kind: 'other'; readonly value: SelectionCell };

/** Short label-like tokens that the parser would also read (`I1` is j·1, `j2` is j·2). */
const LABEL_TOKEN = /^[A-Za-z][A-Za-z_]*\d*$/;

function classify(v: SelectionCell): Cell {
  if (isBlank(v)) return { kind: 'blank' };
  if (typeof v === 'number') return Number.isFinite(v) ? { kind: 'phasor', re: v, im: 0, unit: '' } : { kind: 'other', value: v };
  if (typeof v === 'string') {
    try {
      const { phasor, quantity } = parsePhasorWithQuantity(v);
      return { kind: 'phasor', re: phasor.re, im: phasor.im, unit: quantity ? unitOfQuantity(quantity) : '' };
    } catch (e) {
      if (isPhzError(e)) return { kind: 'text', text: v, message: e.message };
      throw e;
    }
  }
  return { kind: 'other', value: v };
}

/** The readers' message for a cell that is neither text nor a number (TRUE, #VALUE!, …). */
function otherMessage(v: SelectionCell, at: string): string {
  try {
    readPhasors([[v]], at);
  } catch (e) {
    if (isPhzError(e)) return e.message;
    throw e;
  }
  return readerMessages.unsupported(at);
}

function labelText(v: SelectionCell): string {
  return typeof v === 'string' ? v.trim().replace(/\s+/g, ' ') : '';
}

/** Whether a line of cells can be labels: no number, some text, every text a label (not a phasor). */
function isLabelLine(cells: readonly Cell[], values: readonly SelectionCell[]): boolean {
  let texts = 0;
  for (let i = 0; i < cells.length; i++) {
    const c = cells[i];
    if (c.kind === 'blank') continue;
    if (c.kind === 'text') {
      texts++;
      continue;
    }
    // text the parser reads but that looks like a name: I1, Ia, j2, In
    if (c.kind === 'phasor' && typeof values[i] === 'string' && LABEL_TOKEN.test((values[i] as string).trim())) {
      texts++;
      continue;
    }
    return false;
  }
  return texts > 0;
}

/** A line of unit words (blanks and `–` allowed, at least one unit). */
function unitLine(values: readonly SelectionCell[]): string[] | undefined {
  let units = 0;
  const out: string[] = [];
  for (const v of values) {
    if (isBlank(v)) {
      out.push('');
      continue;
    }
    if (typeof v !== 'string') return undefined;
    const u = unitToken(v);
    if (u !== undefined) {
      units++;
      out.push(u);
    } else if (isNoUnitMark(v)) out.push('');
    else return undefined;
  }
  return units > 0 ? out : undefined;
}

function empty(block: SelectionBlock, source: string): PlotData {
  return { source, sheet: block.sheet, groups: [], phasors: [], unreadable: [], scaleMode: 'columns' };
}

/** The unit the phasors of a line agree on from their own unit words (`11 kV∠0`), or `''`. */
function commonUnit(cells: readonly Cell[]): string {
  let unit = '';
  for (const c of cells) {
    if (c.kind !== 'phasor' || c.unit === '') continue;
    if (unit === '') unit = c.unit;
    else if (unit !== c.unit) return '';
  }
  return unit;
}

/**
 * Reads the phasors of a selection. `scaleMode` `auto` decides how phasors share scales
 * (see the module comment); the others force one group per column, per row, or one in all.
 *
 * @example readSelection({ sheet: 'S', top: 0, left: 0, selected: 'A1:B2', cellCount: 4,
 *   values: [['Phase current', 'L1'], ['', '10∠-30']] }) // one group "L1"... see tests
 */
export function readSelection(block: SelectionBlock, scaleMode: ScaleMode = 'auto'): PlotData {
  const source = `${block.sheet}!${block.selected}`;
  const values = block.values;
  const rows = values.length;
  const cols = values.reduce((w, r) => Math.max(w, r.length), 0);
  if (rows === 0 || cols === 0) return empty(block, source);
  const at = (r: number, c: number) => a1(block.top + r, block.left + c);
  const value = (r: number, c: number): SelectionCell => values[r]?.[c] ?? null;
  const cells: Cell[][] = [];
  for (let r = 0; r < rows; r++) {
    const line: Cell[] = [];
    for (let c = 0; c < cols; c++) line.push(classify(value(r, c)));
    cells.push(line);
  }

  // Label column and header row: only where phasors lie beside or below them.
  const firstCol = cells.map((line) => line[0]);
  const firstColValues = values.map((line) => line[0] ?? null);
  const hasLabelCol = cols >= 2 && isLabelLine(firstCol, firstColValues);
  const labelCols = hasLabelCol ? 1 : 0;
  const hasHeader = rows >= 2 && isLabelLine(cells[0].slice(labelCols), Array.from({ length: cols - labelCols }, (_, c) => value(0, c + labelCols)));
  const headerRows = hasHeader ? 1 : 0;
  // A unit column at the right (not the only column left for phasors).
  let unitCol: string[] | undefined;
  if (cols - labelCols >= 2) unitCol = unitLine(values.slice(headerRows).map((line) => line[cols - 1] ?? null));
  const lastCol = unitCol ? cols - 2 : cols - 1;

  const dataRows: number[] = [];
  for (let r = headerRows; r < rows; r++) dataRows.push(r);
  const dataCols: number[] = [];
  for (let c = labelCols; c <= lastCol; c++) dataCols.push(c);
  if (dataRows.length === 0 || dataCols.length === 0) return empty(block, source);

  const rowLabel = (r: number) => (hasLabelCol ? labelText(value(r, 0)) : '');
  const colLabel = (c: number) => (hasHeader ? labelText(value(0, c)) : '');
  const unreadable: UnreadableCell[] = [];
  const groups: PlotGroup[] = [];
  const phasors: PlotPhasor[] = [];

  // Two numeric columns: (real, imaginary) pairs, one phasor per row, one scale.
  const block2 = dataRows.map((r) => dataCols.map((c) => value(r, c)));
  if (dataCols.length === 2 && isPairBlock(block2 as unknown[][])) {
    const header = [colLabel(dataCols[0]), colLabel(dataCols[1])].filter(Boolean).join(' / ');
    const corner = hasHeader && hasLabelCol ? labelText(value(0, 0)) : '';
    const name = corner || header || `Pairs in ${at(dataRows[0], dataCols[0]).replace(/\d+$/, '')}:${at(dataRows[0], dataCols[1]).replace(/\d+$/, '')}`;
    const unit = unitFromLabel(corner) || unitFromLabel(header) || (unitCol ? commonUnitOf(dataRows.map((r) => unitCol[r - headerRows])) : '');
    groups.push({ name, unit });
    for (const r of dataRows) {
      const a = value(r, dataCols[0]);
      const b = value(r, dataCols[1]);
      if (isBlank(a) && isBlank(b)) continue;
      const cell = `${at(r, dataCols[0])}:${at(r, dataCols[1])}`;
      if (isBlank(a) || isBlank(b)) {
        unreadable.push({ cell, message: plotMessages.halfPair(cell) });
        continue;
      }
      phasors.push({ label: rowLabel(r) || cell, cell, re: a as number, im: b as number, group: 0, index: phasors.length });
    }
    return { source, sheet: block.sheet, groups, phasors, unreadable, scaleMode: 'one' };
  }

  // Cell by cell. List what cannot be read.
  for (const r of dataRows) {
    for (const c of dataCols) {
      const cell = cells[r][c];
      if (cell.kind === 'text') unreadable.push({ cell: at(r, c), message: readerMessages.inCell(at(r, c), cell.message) });
      else if (cell.kind === 'other') unreadable.push({ cell: at(r, c), message: otherMessage(value(r, c), at(r, c)) });
    }
  }

  const rowsSayQuantity = hasLabelCol && dataRows.some((r) => unitFromLabel(rowLabel(r)) !== '');
  const colsSayQuantity = hasHeader && dataCols.some((c) => unitFromLabel(colLabel(c)) !== '');
  let mode: Exclude<ScaleMode, 'auto'>;
  if (scaleMode !== 'auto') mode = scaleMode;
  else if (dataCols.length === 1) mode = 'columns';
  else if (dataRows.length === 1 || unitCol) mode = 'rows';
  else if (rowsSayQuantity && !colsSayQuantity) mode = 'rows';
  else mode = 'columns';

  type Line = { name: string; unit: string; cells: Array<{ r: number; c: number }> };
  const lines: Line[] = [];
  if (mode === 'columns') {
    for (const c of dataCols) {
      const name = colLabel(c) || `Column ${at(0, c).replace(/\d+$/, '')}`;
      const members = dataRows.map((r) => ({ r, c }));
      lines.push({ name, unit: unitFromLabel(colLabel(c)) || commonUnit(members.map((m) => cells[m.r][m.c])), cells: members });
    }
  } else if (mode === 'rows') {
    for (const r of dataRows) {
      const name = rowLabel(r) || `Row ${block.top + r + 1}`;
      const members = dataCols.map((c) => ({ r, c }));
      const fromCol = unitCol ? unitCol[r - headerRows] : '';
      lines.push({ name, unit: fromCol || unitFromLabel(rowLabel(r)) || commonUnit(members.map((m) => cells[m.r][m.c])), cells: members });
    }
  } else {
    const members = dataRows.flatMap((r) => dataCols.map((c) => ({ r, c })));
    const corner = hasHeader && hasLabelCol ? labelText(value(0, 0)) : '';
    const units = new Set(
      [...dataCols.map((c) => unitFromLabel(colLabel(c))), ...dataRows.map((r) => (unitCol ? unitCol[r - headerRows] : unitFromLabel(rowLabel(r))))].filter(Boolean),
    );
    const unit = units.size === 1 ? [...units][0] : units.size === 0 ? commonUnit(members.map((m) => cells[m.r][m.c])) : '';
    lines.push({ name: corner || 'All phasors', unit, cells: members });
  }

  const kept = lines.filter((l) => l.cells.some(({ r, c }) => cells[r][c].kind === 'phasor'));
  const several = kept.length > 1;
  kept.forEach((line, g) => {
    groups.push({ name: line.name, unit: line.unit });
    let index = 0;
    for (const { r, c } of line.cells) {
      const cell = cells[r][c];
      if (cell.kind !== 'phasor') continue;
      // The label from the other axis (row label for a column group, header for a row group).
      const cross = mode === 'columns' ? rowLabel(r) : mode === 'rows' ? colLabel(c) : [rowLabel(r), colLabel(c)].filter(Boolean).join(' ');
      let label = cross || at(r, c);
      if (cross && several) label = `${cross} (${line.unit || line.name})`;
      phasors.push({ label, cell: at(r, c), re: cell.re, im: cell.im, group: g, index: index++ });
    }
  });
  return { source, sheet: block.sheet, groups, phasors, unreadable, scaleMode: mode };
}

function commonUnitOf(units: readonly string[]): string {
  const set = new Set(units.filter(Boolean));
  return set.size === 1 ? [...set][0] : '';
}
