/**
 * The preview workbook model: sheets and cells over the engine, with undo/redo.
 *
 * Undo is kept here rather than in the engine because the engine re-enters formulas
 * whose spill size changed (see `PhzEngine.settle`); recording what the person
 * changed, cell by cell, keeps undo exact whatever the engine does afterwards.
 */
import type { RawCellContent, SimpleCellAddress } from 'hyperformula';
import type { PhzEngine } from './engine';
import { columnName } from './address';
import type { Rect } from './address';

interface CellChange {
  readonly row: number;
  readonly col: number;
  readonly before: RawCellContent;
  readonly after: RawCellContent;
}

type Edit =
  | { readonly kind: 'cells'; readonly sheet: string; readonly changes: readonly CellChange[]; readonly label: string }
  | { readonly kind: 'addSheet'; readonly sheet: string; readonly label: string }
  | { readonly kind: 'newSheet'; readonly content: SheetContent; readonly label: string };

export type ChangeListener = () => void;

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

/** A sheet name as a formula reference: quoted, inner apostrophes doubled. */
export function quoteSheet(name: string): string {
  return `'${name.replace(/'/g, "''")}'`;
}

const UNDO_LIMIT = 200;


function sameContent(a: RawCellContent, b: RawCellContent): boolean {
  const norm = (v: RawCellContent) => (v === undefined || v === '' ? null : v);
  return norm(a) === norm(b);
}

export class Workbook {
  private readonly undoStack: Edit[] = [];
  private readonly redoStack: Edit[] = [];
  private readonly listeners = new Set<ChangeListener>();
  private readonly styles = new Map<string, CellStyle>();
  private readonly widths = new Map<string, readonly number[]>();

  constructor(readonly engine: PhzEngine) {}

  get hf() {
    return this.engine.hf;
  }

  onChange(listener: ChangeListener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private notify(): void {
    for (const l of this.listeners) l();
  }

  /** Marks a cell as a title, note or heading (how it looks, not what it holds). */
  setStyle(sheet: string, row: number, col: number, style: CellStyle): void {
    this.styles.set(`${sheet}!${row},${col}`, style);
  }

  styleOf(sheet: string, row: number, col: number): CellStyle | undefined {
    return this.styles.get(`${sheet}!${row},${col}`);
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

  private record(edit: Edit): void {
    this.undoStack.push(edit);
    if (this.undoStack.length > UNDO_LIMIT) this.undoStack.shift();
    this.redoStack.length = 0;
  }

  /**
   * Applies `mutate` and records, for every cell of `area`, what it held before and
   * after, as one undoable step.
   */
  private recordCells(sheet: string, area: Rect, label: string, mutate: () => void): void {
    const id = this.sheetId(sheet);
    const before: RawCellContent[][] = [];
    for (let r = area.top; r <= area.bottom; r++) {
      const row: RawCellContent[] = [];
      for (let c = area.left; c <= area.right; c++) row.push(this.engine.rawContent({ sheet: id, row: r, col: c }));
      before.push(row);
    }
    mutate();
    const changes: CellChange[] = [];
    for (let r = area.top; r <= area.bottom; r++) {
      for (let c = area.left; c <= area.right; c++) {
        const after = this.engine.rawContent({ sheet: id, row: r, col: c });
        const was = before[r - area.top][c - area.left];
        if (!sameContent(was, after)) changes.push({ row: r, col: c, before: was, after });
      }
    }
    if (changes.length > 0) this.record({ kind: 'cells', sheet, changes, label });
    this.notify();
  }

  /** Writes a block of raw contents (text as typed: numbers, text, `=formulas`). */
  setBlock(sheet: string, top: number, left: number, rows: RawCellContent[][], label = 'Edit'): void {
    if (rows.length === 0) return;
    const width = rows.reduce((w, r) => Math.max(w, r.length), 0);
    const padded = rows.map((r) => [...r, ...Array<RawCellContent>(width - r.length).fill(null)]);
    const area: Rect = { top, left, bottom: top + rows.length - 1, right: left + width - 1 };
    this.recordCells(sheet, area, label, () => this.engine.setContents(this.address(sheet, top, left), padded));
  }

  setCell(sheet: string, row: number, col: number, content: RawCellContent, label = 'Edit'): void {
    this.setBlock(sheet, row, col, [[content]], label);
  }

  /** Empties the cells of `area` that hold content (cells showing a spill are left alone). */
  clear(sheet: string, area: Rect): void {
    const id = this.sheetId(sheet);
    // Decide before the batch: the engine answers no content queries inside one.
    const targets: SimpleCellAddress[] = [];
    for (let r = area.top; r <= area.bottom; r++) {
      for (let c = area.left; c <= area.right; c++) {
        const at = { sheet: id, row: r, col: c };
        if (this.engine.rawContent(at) !== null) targets.push(at);
      }
    }
    this.recordCells(sheet, area, 'Clear', () =>
      this.engine.change((hf) => {
        for (const at of targets) hf.setCellContents(at, [[null]]);
      }),
    );
  }

  /**
   * Copies `source` to the block starting at `target`, formulas with their relative
   * references moved (the engine's own copy/paste does the reference arithmetic).
   */
  copyBlock(fromSheet: string, source: Rect, toSheet: string, top: number, left: number): void {
    const fromId = this.sheetId(fromSheet);
    const toId = this.sheetId(toSheet);
    const area: Rect = {
      top,
      left,
      bottom: top + (source.bottom - source.top),
      right: left + (source.right - source.left),
    };
    this.recordCells(toSheet, area, 'Paste', () => {
      const hf = this.hf;
      hf.copy({ start: { sheet: fromId, row: source.top, col: source.left }, end: { sheet: fromId, row: source.bottom, col: source.right } });
      hf.paste({ sheet: toId, row: top, col: left });
      this.engine.settle();
    });
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
      if (content.rows.length > 0) hf.setCellContents({ sheet: id, row: 0, col: 0 }, content.rows);
    });
    for (const s of content.styles ?? []) this.setStyle(content.name, s.row, s.col, s.style);
    if (content.columnWidths) this.widths.set(content.name, content.columnWidths);
  }

  /** Column widths in characters a sheet asked for (from column A), or none. */
  columnWidths(sheet: string): readonly number[] {
    return this.widths.get(sheet) ?? [];
  }

  /** Names scoped to `sheet`. */
  sheetNamesDefined(sheet: string): string[] {
    return this.hf.listNamedExpressions(this.sheetId(sheet));
  }

  canUndo(): boolean {
    return this.undoStack.length > 0;
  }

  canRedo(): boolean {
    return this.redoStack.length > 0;
  }

  private apply(edit: Edit, direction: 'undo' | 'redo'): void {
    if (edit.kind === 'newSheet') {
      if (direction === 'undo') this.engine.change((hf) => hf.removeSheet(this.sheetId(edit.content.name)));
      else this.writeNewSheet(edit.content);
      return;
    }
    if (edit.kind === 'addSheet') {
      if (direction === 'undo') this.engine.change((hf) => hf.removeSheet(this.sheetId(edit.sheet)));
      else this.engine.change((hf) => hf.addSheet(edit.sheet));
      return;
    }
    const id = this.sheetId(edit.sheet);
    const writes: { at: SimpleCellAddress; content: RawCellContent }[] = [];
    for (const ch of edit.changes) {
      const want = direction === 'undo' ? ch.before : ch.after;
      const at = { sheet: id, row: ch.row, col: ch.col };
      if (!sameContent(this.engine.rawContent(at), want)) writes.push({ at, content: want });
    }
    this.engine.change((hf) => {
      for (const w of writes) hf.setCellContents(w.at, [[w.content]]);
    });
  }

  /** Undoes the last step; returns its label, or `undefined` when there is none. */
  undo(): string | undefined {
    const edit = this.undoStack.pop();
    if (!edit) return undefined;
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
    this.notify();
    return edit.label;
  }
}
