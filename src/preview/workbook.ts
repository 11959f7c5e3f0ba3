/**
 * The preview workbook model: sheets and cells over the engine, what the engine does not
 * hold (styles, column widths, charts), undo/redo, and the whole workbook as a document
 * (to keep it in the browser and to save it as a file).
 *
 * Undo is kept here rather than in the engine because the engine re-enters formulas
 * whose spill size changed (see `PhzEngine.settle`); recording what the person changed
 * keeps undo exact whatever the engine does afterwards. A step that changes a block of
 * cells (typing, paste, clear) keeps the block before and after as two rectangles and
 * writes each back in one engine call, so undoing a paste of 40,000 rows costs one write,
 * not 40,000.
 */
import type { RawCellContent, SimpleCellAddress } from 'hyperformula';
import { workbookMessages as M } from '../core/messages';
import type { ChartPlan } from '../taskpane/plot/chart-plan';
import type { PhzEngine, SerializedName } from './engine';
import { MAX_COLUMNS, MAX_ROWS } from './engine';
import { columnName } from './address';
import type { CellPos, Rect } from './address';

/**
 * Presentation hints (the engine holds no formatting): `title`, `note`, `heading` for text;
 * the rest are the roles of a worked sheet (`input` marks a value to edit, `verdict` a
 * pass/fail cell, `chart` the place kept for a chart …).
 */
export type CellStyle =
  | 'title'
  | 'note'
  | 'heading'
  | 'subtitle'
  | 'header'
  | 'input'
  | 'scenario'
  | 'verdict'
  | 'caution'
  | 'chart'
  | 'formulaText'
  | 'symbol'
  | 'label';

export const CELL_STYLES: readonly CellStyle[] = [
  'title',
  'note',
  'heading',
  'subtitle',
  'header',
  'input',
  'scenario',
  'verdict',
  'caution',
  'chart',
  'formulaText',
  'symbol',
  'label',
];

/** A whole new sheet at once: cells from A1, styles, and names scoped to the sheet. */
export interface SheetContent {
  readonly name: string;
  /** Raw contents from A1 (`null` for empty). */
  readonly rows: RawCellContent[][];
  readonly styles?: ReadonlyArray<{ readonly row: number; readonly col: number; readonly style: CellStyle }>;
  /** Names scoped to the new sheet, each referring to one of its cells. */
  readonly names?: ReadonlyArray<{ readonly name: string; readonly row: number; readonly col: number }>;
  /** Column widths in characters from column A (the grid sizes the others to fit). */
  readonly columnWidths?: readonly number[];
}

/** A linked phasor chart over the grid (drawn by chart-overlay.ts, kept with the workbook). */
export interface PreviewChart {
  readonly name: string;
  /** The sheet the chart sits on, and its top-left cell there. */
  readonly sheet: string;
  readonly at: CellPos;
  readonly plan: ChartPlan;
}

/** One sheet of a workbook document. */
export interface SheetDocument {
  readonly name: string;
  /** Raw contents from A1, as typed (formulas as text); rows may be shorter than others. */
  readonly rows: RawCellContent[][];
  /** `[row, col, style]`. */
  readonly styles: ReadonlyArray<readonly [number, number, CellStyle]>;
  /** Column widths in characters from column A; 0 for a column sized to fit. */
  readonly widths: readonly number[];
}

/** Everything a workbook holds, as plain data (structured-clone and JSON safe). */
export interface WorkbookDocument {
  readonly format: 'starpoint-preview-workbook';
  readonly version: 1;
  readonly sheets: readonly SheetDocument[];
  readonly names: readonly SerializedName[];
  readonly charts: readonly PreviewChart[];
}

interface BlockChange {
  readonly kind: 'cells';
  readonly sheet: string;
  readonly top: number;
  readonly left: number;
  readonly before: RawCellContent[][];
  readonly after: RawCellContent[][];
  readonly label: string;
}

type Edit =
  | BlockChange
  | { readonly kind: 'addSheet'; readonly sheet: string; readonly label: string }
  | { readonly kind: 'newSheet'; readonly content: SheetContent; readonly label: string }
  | { readonly kind: 'width'; readonly sheet: string; readonly col: number; readonly before: number; readonly after: number; readonly label: string }
  | { readonly kind: 'document'; readonly before: WorkbookDocument; readonly after: WorkbookDocument; readonly label: string };

export type ChangeListener = () => void;
/** A block of raw contents written to a sheet (typing, paste, clear, undo of those). */
export type CellsListener = (sheet: string, top: number, left: number, rows: RawCellContent[][]) => void;

/** A sheet name as a formula reference: quoted, inner apostrophes doubled. */
export function quoteSheet(name: string): string {
  return `'${name.replace(/'/g, "''")}'`;
}

/** Steps the undo history keeps. */
export const UNDO_LIMIT = 100;
/** Cells the undo history keeps in all (before and after of every step); older steps go first. */
export const UNDO_CELL_BUDGET = 4_000_000;

function sameContent(a: RawCellContent, b: RawCellContent): boolean {
  const norm = (v: RawCellContent) => (v === undefined || v === '' ? null : v);
  return norm(a) === norm(b);
}

function cellsOf(edit: Edit): number {
  if (edit.kind === 'cells') return 2 * edit.before.length * (edit.before[0]?.length ?? 0);
  if (edit.kind === 'document') return edit.before.sheets.reduce((n, s) => n + s.rows.length * (s.rows[0]?.length ?? 0), 0) * 2;
  return 1;
}

function blankBlock(height: number, width: number): RawCellContent[][] {
  return Array.from({ length: height }, () => new Array<RawCellContent>(width).fill(null));
}

export class Workbook {
  private readonly undoStack: Edit[] = [];
  private readonly redoStack: Edit[] = [];
  private undoCells = 0;
  /** Counts changes (every notice to listeners, every style set), so a snapshot knows whether it is still current. */
  private revision = 0;
  private readonly listeners = new Set<ChangeListener>();
  private readonly noticeListeners = new Set<(message: string) => void>();
  private readonly cellListeners = new Set<CellsListener>();
  private styles = new Map<string, Map<string, CellStyle>>();
  private widths = new Map<string, number[]>();
  /** Linked charts, in the order they were inserted (chart-overlay.ts draws them). */
  readonly charts: PreviewChart[] = [];

  constructor(readonly engine: PhzEngine) {}

  get hf() {
    return this.engine.hf;
  }

  onChange(listener: ChangeListener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** Things to tell the person that are not an error (the undo history let a step go). */
  onNotice(listener: (message: string) => void): () => void {
    this.noticeListeners.add(listener);
    return () => this.noticeListeners.delete(listener);
  }

  /** Every block of cells written (for the journal that keeps typing across a reload). */
  onCells(listener: CellsListener): () => void {
    this.cellListeners.add(listener);
    return () => this.cellListeners.delete(listener);
  }

  private wrote(sheet: string, top: number, left: number, rows: RawCellContent[][]): void {
    for (const l of this.cellListeners) l(sheet, top, left, rows);
  }

  private notify(): void {
    this.revision++;
    for (const l of this.listeners) l();
  }

  /**
   * The whole workbook as a document, with the revision it was taken at, to hand to
   * `replaceWith` later: taken while a file is read, it spares the page that work when the
   * file replaces the workbook (and is taken again if anything changed meanwhile).
   */
  snapshot(): { readonly doc: WorkbookDocument; readonly revision: number } {
    return { doc: this.toDocument(), revision: this.revision };
  }

  /** Marks a cell as a title, note or heading (how it looks, not what it holds). */
  setStyle(sheet: string, row: number, col: number, style: CellStyle): void {
    this.revision++;
    let map = this.styles.get(sheet);
    if (!map) this.styles.set(sheet, (map = new Map()));
    map.set(`${row},${col}`, style);
  }

  styleOf(sheet: string, row: number, col: number): CellStyle | undefined {
    return this.styles.get(sheet)?.get(`${row},${col}`);
  }

  sheetNames(): string[] {
    return this.hf.getSheetNames();
  }

  sheetId(name: string): number {
    const id = this.hf.getSheetId(name);
    if (id === undefined) throw new Error(`no sheet named ${name}`);
    return id;
  }

  address(sheet: string, row: number, col: number): SimpleCellAddress {
    return { sheet: this.sheetId(sheet), row, col };
  }

  /** Raw content (formula or typed value) of one cell. */
  raw(sheet: string, row: number, col: number): RawCellContent {
    return this.engine.rawContent(this.address(sheet, row, col));
  }

  /** The used part of a sheet: rows and columns from A1 to its last filled cell. */
  used(sheet: string): { height: number; width: number } {
    return this.hf.getSheetDimensions(this.sheetId(sheet));
  }

  /** Raw contents of a block; cells beyond the used part are read as empty without asking. */
  readBlock(sheet: string, area: Rect): RawCellContent[][] {
    const id = this.sheetId(sheet);
    const dims = this.hf.getSheetDimensions(id);
    const out = blankBlock(area.bottom - area.top + 1, area.right - area.left + 1);
    const bottom = Math.min(area.bottom, dims.height - 1);
    const right = Math.min(area.right, dims.width - 1);
    for (let r = area.top; r <= bottom; r++) {
      const row = out[r - area.top];
      for (let c = area.left; c <= right; c++) row[c - area.left] = this.engine.rawContent({ sheet: id, row: r, col: c });
    }
    return out;
  }

  private record(edit: Edit): void {
    this.undoStack.push(edit);
    this.undoCells += cellsOf(edit);
    this.redoStack.length = 0;
    let dropped = 0;
    while (this.undoStack.length > 1 && (this.undoStack.length > UNDO_LIMIT || this.undoCells > UNDO_CELL_BUDGET)) {
      this.undoCells -= cellsOf(this.undoStack.shift()!);
      dropped++;
    }
    if (dropped > 0) for (const l of this.noticeListeners) l(M.undoDropped(UNDO_LIMIT));
  }

  private checkFits(top: number, left: number, height: number, width: number): void {
    if (top + height > MAX_ROWS || left + width > MAX_COLUMNS) {
      throw new Error(M.sheetFull(top + height, left + width, MAX_ROWS, columnName(MAX_COLUMNS - 1)));
    }
  }

  /** Writes `after` as one step, if it changes anything. */
  private writeBlock(sheet: string, top: number, left: number, after: RawCellContent[][], label: string): void {
    const height = after.length;
    const width = after[0]?.length ?? 0;
    if (height === 0 || width === 0) return;
    this.checkFits(top, left, height, width);
    const before = this.readBlock(sheet, { top, left, bottom: top + height - 1, right: left + width - 1 });
    if (before.every((row, r) => row.every((v, c) => sameContent(v, after[r][c])))) return;
    this.engine.setContents(this.address(sheet, top, left), after);
    this.record({ kind: 'cells', sheet, top, left, before, after, label });
    this.wrote(sheet, top, left, after);
    this.notify();
  }

  /**
   * Writes a block of raw contents (text as typed: numbers, text, `=formulas`) as one
   * undoable step. Throws, writing nothing, when the block would run off the sheet.
   */
  setBlock(sheet: string, top: number, left: number, rows: RawCellContent[][], label = 'Edit'): void {
    if (rows.length === 0) return;
    const width = rows.reduce((w, r) => Math.max(w, r.length), 0);
    const padded = rows.map((r) => (r.length === width ? r : [...r, ...new Array<RawCellContent>(width - r.length).fill(null)]));
    this.writeBlock(sheet, top, left, padded, label);
  }

  setCell(sheet: string, row: number, col: number, content: RawCellContent, label = 'Edit'): void {
    this.setBlock(sheet, row, col, [[content]], label);
  }

  /**
   * Writes `content` into the cell only when it is empty (no content, not part of a spill),
   * in one step; returns what the cell held instead when it was not empty.
   */
  setCellIfEmpty(sheet: string, row: number, col: number, content: RawCellContent, label = 'Edit'): { written: boolean; held: string } {
    const at = this.address(sheet, row, col);
    const held = this.engine.rawContent(at);
    if (held !== null && held !== '') return { written: false, held: String(held) };
    if (this.hf.isCellPartOfArray(at)) return { written: false, held: 'part of a spilled result' };
    this.setCell(sheet, row, col, content, label);
    return { written: true, held: '' };
  }

  /** Empties the cells of `area` (its used part), as one undoable step. */
  clear(sheet: string, area: Rect): void {
    const dims = this.used(sheet);
    const bottom = Math.min(area.bottom, dims.height - 1);
    const right = Math.min(area.right, dims.width - 1);
    if (bottom < area.top || right < area.left) return;
    this.writeBlock(sheet, area.top, area.left, blankBlock(bottom - area.top + 1, right - area.left + 1), 'Clear');
  }

  /**
   * Copies `source` to the block starting at `target`, formulas with their relative
   * references moved (the engine's own copy/paste does the reference arithmetic).
   */
  copyBlock(fromSheet: string, source: Rect, toSheet: string, top: number, left: number): void {
    const fromId = this.sheetId(fromSheet);
    const toId = this.sheetId(toSheet);
    const height = source.bottom - source.top + 1;
    const width = source.right - source.left + 1;
    this.checkFits(top, left, height, width);
    const area: Rect = { top, left, bottom: top + height - 1, right: left + width - 1 };
    const before = this.readBlock(toSheet, area);
    const hf = this.hf;
    hf.copy({ start: { sheet: fromId, row: source.top, col: source.left }, end: { sheet: fromId, row: source.bottom, col: source.right } });
    hf.paste({ sheet: toId, row: top, col: left });
    this.engine.settle();
    const after = this.readBlock(toSheet, area);
    for (let r = 0; r < height; r++) {
      for (let c = 0; c < width; c++) {
        const style = this.styleOf(fromSheet, source.top + r, source.left + c);
        if (style) this.setStyle(toSheet, top + r, left + c, style);
      }
    }
    if (!before.every((row, r) => row.every((v, c) => sameContent(v, after[r][c])))) {
      this.record({ kind: 'cells', sheet: toSheet, top, left, before, after, label: 'Paste' });
      this.wrote(toSheet, top, left, after);
    }
    this.notify();
  }

  /** Adds a sheet (a fresh name when `name` is taken or not given); returns its name. */
  addSheet(name?: string): string {
    let candidate = name?.trim() || `Sheet${this.sheetNames().length + 1}`;
    for (let i = 2; this.hf.doesSheetExist(candidate); i++) candidate = `${name?.trim() || 'Sheet'}${name ? ` (${i})` : i}`;
    this.engine.change((hf) => hf.addSheet(candidate));
    this.record({ kind: 'addSheet', sheet: candidate, label: 'Add sheet' });
    this.notify();
    return candidate;
  }

  /**
   * Adds a sheet named `content.name` (which must be free) with its cells, styles and
   * sheet-scoped names (engine named expressions), as one undoable step. Names are
   * defined before the cells are written, so formulas that use them resolve at once.
   */
  addSheetWith(content: SheetContent, label = 'Add sheet'): void {
    if (this.hf.doesSheetExist(content.name)) throw new Error(`a sheet named ${content.name} already exists`);
    this.writeNewSheet(content);
    this.record({ kind: 'newSheet', content, label });
    this.notify();
  }

  private writeNewSheet(content: SheetContent): void {
    this.engine.change((hf) => {
      hf.addSheet(content.name);
      const id = this.sheetId(content.name);
      for (const n of content.names ?? []) {
        hf.addNamedExpression(n.name, `=${quoteSheet(content.name)}!$${columnName(n.col)}$${n.row + 1}`, id);
      }
    });
    if (content.rows.length > 0) this.engine.setContents({ sheet: this.sheetId(content.name), row: 0, col: 0 }, content.rows);
    for (const s of content.styles ?? []) this.setStyle(content.name, s.row, s.col, s.style);
    if (content.columnWidths) this.widths.set(content.name, [...content.columnWidths]);
  }

  private removeSheet(name: string): void {
    this.engine.change((hf) => hf.removeSheet(this.sheetId(name)));
    this.styles.delete(name);
    this.widths.delete(name);
  }

  /** Column widths in characters a sheet asked for (from column A; 0 or missing: sized to fit). */
  columnWidths(sheet: string): readonly number[] {
    return this.widths.get(sheet) ?? [];
  }

  /** Sets one column's width in characters (0: sized to fit), as an undoable step. */
  setColumnWidth(sheet: string, col: number, chars: number): void {
    const before = this.widths.get(sheet)?.[col] ?? 0;
    const after = Math.max(0, Math.round(chars * 10) / 10);
    if (before === after) return;
    this.putWidth(sheet, col, after);
    this.record({ kind: 'width', sheet, col, before, after, label: 'Column width' });
    this.notify();
  }

  private putWidth(sheet: string, col: number, chars: number): void {
    const list = this.widths.get(sheet) ?? [];
    while (list.length <= col) list.push(0);
    list[col] = chars;
    this.widths.set(sheet, list);
  }

  /** Names scoped to `sheet`. */
  sheetNamesDefined(sheet: string): string[] {
    return this.hf.listNamedExpressions(this.sheetId(sheet));
  }

  // ------------------------------------------------------------------ charts

  addChart(chart: PreviewChart): void {
    this.charts.push(chart);
    this.notify();
  }

  removeChart(name: string): void {
    const i = this.charts.findIndex((c) => c.name === name);
    if (i < 0) return;
    this.charts.splice(i, 1);
    this.notify();
  }

  // ------------------------------------------------------------ whole documents

  /** Everything the workbook holds, as plain data. */
  toDocument(): WorkbookDocument {
    const sheets = this.sheetNames().map((name): SheetDocument => {
      const id = this.sheetId(name);
      const dims = this.hf.getSheetDimensions(id);
      const rows: RawCellContent[][] = [];
      for (let r = 0; r < dims.height; r++) {
        const row: RawCellContent[] = [];
        let last = -1;
        for (let c = 0; c < dims.width; c++) {
          const v = this.engine.rawContent({ sheet: id, row: r, col: c });
          row.push(v);
          if (v !== null && v !== '') last = c;
        }
        row.length = last + 1;
        rows.push(row);
      }
      const styles: [number, number, CellStyle][] = [];
      for (const [key, style] of this.styles.get(name) ?? []) {
        const [r, c] = key.split(',').map(Number);
        styles.push([r, c, style]);
      }
      return { name, rows, styles, widths: [...(this.widths.get(name) ?? [])] };
    });
    return {
      format: 'starpoint-preview-workbook',
      version: 1,
      sheets,
      names: this.engine.names(),
      charts: this.charts.map((c) => ({ ...c })),
    };
  }

  /** Replaces everything by `doc` (no undo step; see `replaceWith`). */
  load(doc: WorkbookDocument): void {
    const sheets = doc.sheets.length > 0 ? doc.sheets : [{ name: 'Sheet1', rows: [], styles: [], widths: [] }];
    this.engine.rebuild(
      sheets.map((s) => ({ name: s.name, rows: s.rows })),
      doc.names,
    );
    this.styles = new Map();
    this.widths = new Map();
    for (const s of sheets) {
      for (const [r, c, style] of s.styles) this.setStyle(s.name, r, c, style);
      if (s.widths.length > 0) this.widths.set(s.name, [...s.widths]);
    }
    this.charts.splice(0, this.charts.length, ...doc.charts.filter((c) => this.hf.doesSheetExist(c.sheet)));
    this.notify();
  }

  /**
   * Replaces everything by `doc` as one undoable step (opening a file, a new workbook).
   * `earlier`: a `snapshot` of this workbook, used for the undo step when nothing changed
   * since it was taken.
   */
  replaceWith(doc: WorkbookDocument, label: string, earlier?: { readonly doc: WorkbookDocument; readonly revision: number }): void {
    const before = earlier?.revision === this.revision ? earlier.doc : this.toDocument();
    this.load(doc);
    this.record({ kind: 'document', before, after: doc, label });
    this.notify();
  }

  /** Forgets every undo and redo step (after restoring a kept workbook). */
  clearHistory(): void {
    this.undoStack.length = 0;
    this.redoStack.length = 0;
    this.undoCells = 0;
    this.notify();
  }

  // ------------------------------------------------------------------ undo

  canUndo(): boolean {
    return this.undoStack.length > 0;
  }

  canRedo(): boolean {
    return this.redoStack.length > 0;
  }

  private apply(edit: Edit, direction: 'undo' | 'redo'): void {
    switch (edit.kind) {
      case 'document':
        this.load(direction === 'undo' ? edit.before : edit.after);
        return;
      case 'newSheet':
        if (direction === 'undo') this.removeSheet(edit.content.name);
        else this.writeNewSheet(edit.content);
        return;
      case 'addSheet':
        if (direction === 'undo') this.removeSheet(edit.sheet);
        else this.engine.change((hf) => hf.addSheet(edit.sheet));
        return;
      case 'width':
        this.putWidth(edit.sheet, edit.col, direction === 'undo' ? edit.before : edit.after);
        return;
      case 'cells': {
        const rows = direction === 'undo' ? edit.before : edit.after;
        this.engine.setContents(this.address(edit.sheet, edit.top, edit.left), rows);
        this.wrote(edit.sheet, edit.top, edit.left, rows);
        return;
      }
    }
  }

  /** Undoes the last step; returns its label, or `undefined` when there is none. */
  undo(): string | undefined {
    const edit = this.undoStack.pop();
    if (!edit) return undefined;
    this.undoCells -= cellsOf(edit);
    this.apply(edit, 'undo');
    this.redoStack.push(edit);
    this.notify();
    return edit.label;
  }

  redo(): string | undefined {
    const edit = this.redoStack.pop();
    if (!edit) return undefined;
    this.apply(edit, 'redo');
    this.undoStack.push(edit);
    this.undoCells += cellsOf(edit);
    this.notify();
    return edit.label;
  }
}
