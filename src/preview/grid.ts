/**
 * The preview grid: a sheet of cells a person can work in, over the workbook model.
 *
 * Only the cells in view are in the page (virtual scrolling): a sheet of a million rows
 * costs the same to show as one of ten. Every row has the same height, so where a row sits
 * is arithmetic; columns have their own widths, added up once per change. The scrolled
 * area covers the used part of the sheet and some room after it, and grows as the person
 * scrolls on, to the end of the sheet (as spreadsheets do); the name box, Ctrl+arrows and
 * Ctrl+End reach any cell at once.
 *
 * Every cell element carries its address (`data-cell="B2"`), the formula bar is an
 * input labelled "Formula", so scripts and screen readers drive it the same way.
 */
import { CellType } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import { a1, columnName, inRect, parseRectA1, rectA1, rectOf } from './address';
import type { CellPos, Rect } from './address';
import { isDisplayError, MAX_COLUMNS, MAX_ROWS } from './engine';
import type { DisplayValue } from './engine';
import { displayText, errorMessage, formatNumber, isPhasorText } from './format';
import type { Workbook } from './workbook';

type EditMode = 'enter' | 'edit';

interface Clip {
  readonly sheet: string;
  readonly rect: Rect;
  readonly text: string;
}

/** Height of every row and of the column headings, in CSS pixels (22 + a 1 px line). */
export const ROW_PX = 23;
const HEAD_PX = 23;
/** Width of the row headings: room for 1048576. */
const ROW_HEAD_PX = 60;
const MIN_COL_PX = 72;
const MAX_COL_PX = 280;
const CHAR_PX = 7.9;
/** Rows read to size a column to its content. */
const FIT_ROWS = 200;
/** Columns sized to content (the rest get the minimum width unless a width was set). */
const FIT_COLUMNS = 128;
/** Room kept after the used part of the sheet, and the step the scrolled area grows by. */
const ROW_ROOM = 200;
const COL_ROOM = 8;
const MIN_COLS_SHOWN = 26;
/** Rows and columns drawn beyond the view on each side, so a quick scroll shows no gap. */
const OVERSCAN_ROWS = 6;
const OVERSCAN_COLS = 2;
/** Characters ↔ pixels for column widths set in characters (worked sheets, .xlsx). */
export const charsToPx = (chars: number) => Math.round(Math.min(2 * MAX_COL_PX, Math.max(24, 16 + chars * CHAR_PX)));
export const pxToChars = (px: number) => Math.max(1, Math.round(((px - 16) / CHAR_PX) * 10) / 10);

function el<K extends keyof HTMLElementTagNameMap>(doc: Document, tag: K, className?: string, text?: string): HTMLElementTagNameMap[K] {
  const e = doc.createElement(tag);
  if (className) e.className = className;
  if (text !== undefined) e.textContent = text;
  return e;
}

/** Raw content as the person would type it again. */
export function rawToText(raw: RawCellContent): string {
  if (raw === null || raw === undefined) return '';
  if (typeof raw === 'boolean') return raw ? 'TRUE' : 'FALSE';
  if (raw instanceof Date) return raw.toISOString();
  return String(raw);
}

/** Tab-separated text of a block (what other programs understand on paste). */
function toTsv(rows: string[][]): string {
  return rows.map((r) => r.join('\t')).join('\n');
}

export function fromTsv(text: string): string[][] {
  const lines = text.replace(/\r\n?/g, '\n').replace(/\n$/, '').split('\n');
  return lines.map((l) => l.split('\t'));
}

interface CellEl extends HTMLDivElement {
  /** What was painted last (text, classes, title), to skip unchanged writes. */
  painted?: string;
}

export class Grid {
  readonly element: HTMLElement;
  /** The formula bar row; the page adds its workbook buttons here. */
  readonly bar: HTMLElement;
  private readonly doc: Document;

  private sheet: string;
  private anchor: CellPos = { row: 0, col: 0 };
  private focusPos: CellPos = { row: 0, col: 0 };

  /** Rows and columns the scrolled area covers now. */
  private extentRows = ROW_ROOM;
  private extentCols = MIN_COLS_SHOWN;
  /** How far the person has scrolled the area out (it only grows while a sheet is shown). */
  private grownRows = 0;
  private grownCols = 0;
  /** Column widths in px and their left edges (colX[c]), for columns 0…extentCols. */
  private colPx: number[] = [];
  private colX: number[] = [0];
  /** Widths sized to content, by sheet, until the workbook changes. */
  private fitted = new Map<string, number[]>();

  /** Cells in the page, by `row,col`; elements scrolled out go back to the pool. */
  private readonly rendered = new Map<string, CellEl>();
  private readonly pool: CellEl[] = [];
  private readonly colHeads = new Map<number, HTMLDivElement>();
  private readonly rowHeads = new Map<number, HTMLDivElement>();
  private view: Rect = { top: 0, left: 0, bottom: -1, right: -1 };
  private frame = 0;

  private editing: { mode: EditMode; source: 'cell' | 'bar'; original: string } | null = null;
  private dragging = false;
  private resizing: { col: number; startX: number; startPx: number } | null = null;
  private clip: Clip | null = null;
  private pasteHandled = false;
  private note = '';
  private readonly selectionListeners = new Set<() => void>();
  private readonly repaintListeners = new Set<() => void>();
  private overlay: HTMLDivElement | null = null;

  // Parts of the UI.
  private readonly nameBox: HTMLInputElement;
  private readonly formulaBar: HTMLInputElement;
  private readonly undoButton: HTMLButtonElement;
  private readonly redoButton: HTMLButtonElement;
  private readonly scroller: HTMLDivElement;
  private readonly canvas: HTMLDivElement;
  private readonly colHeadStrip: HTMLDivElement;
  private readonly rowHeadStrip: HTMLDivElement;
  private readonly body: HTMLDivElement;
  private readonly editor: HTMLInputElement;
  private readonly tabs: HTMLDivElement;
  private readonly status: HTMLDivElement;

  constructor(
    root: HTMLElement,
    private readonly workbook: Workbook,
  ) {
    this.doc = root.ownerDocument;
    this.sheet = workbook.sheetNames()[0];
    const d = this.doc;

    this.element = el(d, 'section', 'pv-book');
    this.element.setAttribute('aria-label', 'Workbook');

    // Formula bar row: name box, labelled formula input, undo/redo, legend.
    const bar = el(d, 'div', 'pv-bar');
    this.bar = bar;
    const nameLabel = el(d, 'label', 'pv-visually-hidden', 'Cell address');
    nameLabel.htmlFor = 'pv-namebox';
    this.nameBox = el(d, 'input', 'pv-namebox');
    this.nameBox.id = 'pv-namebox';
    this.nameBox.setAttribute('aria-label', 'Name box: address of the selected cell');
    this.nameBox.autocomplete = 'off';
    this.nameBox.spellcheck = false;
    const formulaLabel = el(d, 'label', 'pv-formula-label', 'Formula');
    formulaLabel.htmlFor = 'pv-formula';
    this.formulaBar = el(d, 'input', 'pv-formula');
    this.formulaBar.id = 'pv-formula';
    this.formulaBar.setAttribute('aria-label', 'Formula');
    this.formulaBar.autocomplete = 'off';
    this.formulaBar.spellcheck = false;
    this.undoButton = el(d, 'button', 'pv-button', 'Undo');
    this.undoButton.type = 'button';
    this.undoButton.title = 'Undo (Ctrl+Z)';
    this.redoButton = el(d, 'button', 'pv-button', 'Redo');
    this.redoButton.type = 'button';
    this.redoButton.title = 'Redo (Ctrl+Y)';
    bar.append(nameLabel, this.nameBox, formulaLabel, this.formulaBar, this.undoButton, this.redoButton);

    const legend = el(d, 'div', 'pv-legend');
    legend.setAttribute('aria-label', 'Cell styles');
    for (const [cls, text] of [
      ['k-input', 'Input'],
      ['k-formula', 'Formula'],
      ['k-spill', 'Spilled result'],
      ['k-error', 'Error'],
    ] as const) {
      const item = el(d, 'span', 'pv-legend-item');
      item.append(el(d, 'span', `pv-swatch ${cls}`), d.createTextNode(text));
      legend.append(item);
    }

    // The sheet: a scrolled canvas as large as the area; headings stick to its edges.
    this.scroller = el(d, 'div', 'pv-scroll');
    this.scroller.tabIndex = 0;
    // Only the cells in view exist, placed by position rather than in rows, so they carry no
    // grid roles; the name box, the formula bar and the status line (read aloud) say where
    // the selection is and what the cell holds.
    this.scroller.setAttribute('role', 'region');
    this.scroller.setAttribute('aria-label', 'Sheet: arrow keys move, type to enter, F2 edits');
    this.canvas = el(d, 'div', 'pv-canvas');
    this.colHeadStrip = el(d, 'div', 'pv-colheads');
    const corner = el(d, 'div', 'pv-corner');
    corner.setAttribute('aria-label', 'Select all');
    corner.style.width = `${ROW_HEAD_PX}px`;
    this.colHeadStrip.append(corner);
    this.rowHeadStrip = el(d, 'div', 'pv-rowheads');
    this.rowHeadStrip.style.width = `${ROW_HEAD_PX}px`;
    this.body = el(d, 'div', 'pv-body');
    this.body.style.left = `${ROW_HEAD_PX}px`;
    this.body.style.top = `${HEAD_PX}px`;
    this.editor = el(d, 'input', 'pv-editor');
    this.editor.setAttribute('aria-label', 'Cell editor');
    this.editor.autocomplete = 'off';
    this.editor.spellcheck = false;
    this.editor.hidden = true;
    this.body.append(this.editor);
    this.canvas.append(this.colHeadStrip, this.rowHeadStrip, this.body);
    this.scroller.append(this.canvas);

    this.tabs = el(d, 'div', 'pv-tabs');
    this.tabs.setAttribute('role', 'tablist');
    this.tabs.setAttribute('aria-label', 'Sheets');

    this.status = el(d, 'div', 'pv-status');
    this.status.setAttribute('role', 'status');
    this.status.setAttribute('aria-live', 'polite');

    this.element.append(bar, legend, this.scroller, this.tabs, this.status);
    root.append(this.element);

    this.wire();
    this.workbook.onChange(() => {
      this.fitted.clear();
      this.refresh();
    });
    this.workbook.onNotice((message) => this.say(message));
    this.renderTabs();
    this.refresh();
  }

  // ---------------------------------------------------------------- public API

  get sheetName(): string {
    return this.sheet;
  }

  /** The active cell (top-left of what the person selected last, where typing goes). */
  get activeCell(): CellPos {
    return { ...this.anchor };
  }

  get selection(): Rect {
    return rectOf(this.anchor, this.focusPos);
  }

  onSelectionChange(listener: () => void): () => void {
    this.selectionListeners.add(listener);
    return () => this.selectionListeners.delete(listener);
  }

  focus(): void {
    this.scroller.focus({ preventScroll: true });
  }

  /** Widths of the shown sheet's columns from A, in CSS pixels, as drawn (for saving a file). */
  columnPixels(sheet: string, count: number): number[] {
    const fitted = this.fittedWidths(sheet);
    const asked = this.workbook.columnWidths(sheet);
    return Array.from({ length: count }, (_, c) => (asked[c] ? charsToPx(asked[c]) : (fitted[c] ?? MIN_COL_PX)));
  }

  // ------------------------------------------------- overlay hook (charts over the grid)
  // The hook src/preview/chart-overlay.ts uses: overlayLayer, cellBox, onRepaint, sheetName.

  /** A layer over the cells that scrolls with them; overlays position their elements in it. */
  get overlayLayer(): HTMLElement {
    if (!this.overlay) {
      this.overlay = el(this.doc, 'div', 'pv-overlay');
      this.body.append(this.overlay);
    }
    return this.overlay;
  }

  /** Where a cell of the shown sheet sits in `overlayLayer`, in CSS pixels (any cell, drawn or not). */
  cellBox(pos: CellPos): { left: number; top: number; width: number; height: number } {
    const row = Math.max(0, Math.min(MAX_ROWS - 1, pos.row));
    const col = Math.max(0, Math.min(MAX_COLUMNS - 1, pos.col));
    this.ensureExtent(row, col);
    return { left: this.colX[col], top: row * ROW_PX, width: this.colPx[col], height: ROW_PX };
  }

  /** Calls `listener` after every repaint (values, column widths, another sheet shown). */
  onRepaint(listener: () => void): () => void {
    this.repaintListeners.add(listener);
    return () => this.repaintListeners.delete(listener);
  }

  /** Shows `name` (its tab becomes active). */
  showSheet(name: string): void {
    if (!this.workbook.sheetNames().includes(name)) return;
    if (this.editing) this.commitEdit();
    this.sheet = name;
    this.note = '';
    this.anchor = { row: 0, col: 0 };
    this.focusPos = { row: 0, col: 0 };
    this.grownRows = 0;
    this.grownCols = 0;
    this.renderTabs();
    this.scroller.scrollTo(0, 0);
    this.refresh();
    for (const l of this.selectionListeners) l();
  }

  select(pos: CellPos, extend = false): void {
    const clamped = { row: Math.max(0, Math.min(MAX_ROWS - 1, pos.row)), col: Math.max(0, Math.min(MAX_COLUMNS - 1, pos.col)) };
    if (extend) this.focusPos = clamped;
    else {
      this.anchor = clamped;
      this.focusPos = clamped;
    }
    this.note = '';
    this.scrollToCell(this.focusPos);
    this.paintSelection();
    for (const l of this.selectionListeners) l();
  }

  /** A short message in the status line, until the selection moves. */
  say(message: string): void {
    this.note = message;
    this.renderStatus();
  }

  // ------------------------------------------------------------------ geometry

  private fittedWidths(sheet: string): number[] {
    let widths = this.fitted.get(sheet);
    if (widths) return widths;
    widths = [];
    if (this.workbook.sheetNames().includes(sheet)) {
      const hf = this.workbook.hf;
      const engine = this.workbook.engine;
      const id = this.workbook.sheetId(sheet);
      const dims = hf.getSheetDimensions(id);
      const rows = Math.min(FIT_ROWS, dims.height);
      const cols = Math.min(FIT_COLUMNS, dims.width);
      const chars = new Array<number>(cols).fill(0);
      for (let r = 0; r < rows; r++) {
        for (let c = 0; c < cols; c++) {
          const at = { sheet: id, row: r, col: c };
          if (hf.getCellType(at) === CellType.EMPTY) continue;
          const text = displayText(engine.display(at));
          // Titles and notes that run on over empty cells do not widen their column.
          const label = typeof engine.display(at) === 'string' && !isPhasorText(text);
          if (label && (c + 1 >= dims.width || hf.getCellType({ sheet: id, row: r, col: c + 1 }) === CellType.EMPTY)) continue;
          chars[c] = Math.max(chars[c], text.length);
        }
      }
      widths = chars.map((n) => Math.round(Math.min(MAX_COL_PX, Math.max(MIN_COL_PX, 16 + n * CHAR_PX))));
    }
    this.fitted.set(sheet, widths);
    return widths;
  }

  /** Widens the scrolled area so it holds `row`, `col` and some room after them. */
  private ensureExtent(row: number, col: number): void {
    if (row < this.extentRows - 1 && col < this.extentCols - 1) return;
    this.grownRows = Math.max(this.grownRows, row + 1);
    this.grownCols = Math.max(this.grownCols, col + 1);
    this.layout();
  }

  /** Column widths, positions and the size of the scrolled area. */
  private layout(): void {
    const used = this.workbook.used(this.sheet);
    const sel = this.selection;
    const viewRows = Math.ceil(this.scroller.clientHeight / ROW_PX) + 1;
    this.extentRows = Math.min(MAX_ROWS, Math.max(used.height, sel.bottom + 1, this.grownRows, viewRows) + ROW_ROOM);
    this.extentCols = Math.min(MAX_COLUMNS, Math.max(MIN_COLS_SHOWN, used.width + COL_ROOM, sel.right + 1 + COL_ROOM, this.grownCols + COL_ROOM));
    const fitted = this.fittedWidths(this.sheet);
    const asked = this.workbook.columnWidths(this.sheet);
    this.colPx = new Array<number>(this.extentCols);
    this.colX = new Array<number>(this.extentCols + 1);
    this.colX[0] = 0;
    for (let c = 0; c < this.extentCols; c++) {
      const px = asked[c] ? charsToPx(asked[c]) : (fitted[c] ?? MIN_COL_PX);
      this.colPx[c] = px;
      this.colX[c + 1] = this.colX[c] + px;
    }
    const width = this.colX[this.extentCols];
    const height = this.extentRows * ROW_PX;
    this.canvas.style.width = `${ROW_HEAD_PX + width}px`;
    this.canvas.style.height = `${HEAD_PX + height}px`;
    this.colHeadStrip.style.width = `${ROW_HEAD_PX + width}px`;
    this.rowHeadStrip.style.height = `${height}px`;
    this.body.style.width = `${width}px`;
    this.body.style.height = `${height}px`;
  }

  /** The column whose span holds `x` (body coordinates). */
  private colAt(x: number): number {
    let lo = 0;
    let hi = this.extentCols - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.colX[mid] <= x) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  }

  /** Rows and columns in view (body coordinates of the scroller's visible part). */
  private visible(): Rect {
    const s = this.scroller;
    const top = Math.max(0, Math.floor(s.scrollTop / ROW_PX));
    const bottom = Math.min(this.extentRows - 1, Math.floor((s.scrollTop + Math.max(0, s.clientHeight - HEAD_PX)) / ROW_PX));
    const left = this.colAt(s.scrollLeft);
    const right = this.colAt(s.scrollLeft + Math.max(0, s.clientWidth - ROW_HEAD_PX));
    return { top, left, bottom, right };
  }

  private scrollToCell(pos: CellPos): void {
    this.ensureExtent(pos.row, pos.col);
    const s = this.scroller;
    const viewH = s.clientHeight - HEAD_PX;
    const viewW = s.clientWidth - ROW_HEAD_PX;
    const y = pos.row * ROW_PX;
    const x = this.colX[pos.col];
    const w = this.colPx[pos.col];
    let top = s.scrollTop;
    let left = s.scrollLeft;
    if (y < top) top = y;
    else if (y + ROW_PX > top + viewH) top = y + ROW_PX - viewH;
    if (x < left || w > viewW) left = x;
    else if (x + w > left + viewW) left = x + w - viewW;
    if (top !== s.scrollTop || left !== s.scrollLeft) {
      s.scrollTo(left, top);
      this.renderWindow(false);
    }
  }

  // ----------------------------------------------------------------- painting

  private renderTabs(): void {
    const d = this.doc;
    const names = this.workbook.sheetNames();
    if (!names.includes(this.sheet)) this.sheet = names[0];
    const buttons = names.map((name) => {
      const b = el(d, 'button', 'pv-tab', name);
      b.type = 'button';
      b.setAttribute('role', 'tab');
      b.setAttribute('aria-selected', String(name === this.sheet));
      b.dataset.sheet = name;
      b.addEventListener('click', () => {
        this.showSheet(name);
        this.focus();
      });
      return b;
    });
    const add = el(d, 'button', 'pv-tab-add', '+ Sheet');
    add.type = 'button';
    add.setAttribute('aria-label', 'Add sheet');
    add.addEventListener('click', () => {
      const name = this.workbook.addSheet();
      this.showSheet(name);
      this.say(`Added sheet ${name}.`);
      this.focus();
    });
    this.tabs.replaceChildren(...buttons, add);
  }

  /** Repaints values, styles and column widths of the shown sheet. */
  refresh(): void {
    const names = this.workbook.sheetNames();
    if (!names.includes(this.sheet)) {
      this.sheet = names[0];
      this.anchor = { row: 0, col: 0 };
      this.focusPos = { row: 0, col: 0 };
    }
    if (this.tabs.childElementCount !== names.length + 1 || names.some((n, i) => (this.tabs.children[i] as HTMLElement).dataset.sheet !== n || (this.tabs.children[i] as HTMLElement).getAttribute('aria-selected') !== String(n === this.sheet))) {
      this.renderTabs();
    }
    this.layout();
    this.renderWindow(true);
    this.undoButton.disabled = !this.workbook.canUndo();
    this.redoButton.disabled = !this.workbook.canRedo();
    this.paintSelection();
    for (const l of this.repaintListeners) l();
  }

  /** Puts the cells in view into the page; `all` repaints those already there too. */
  private renderWindow(all: boolean): void {
    const v = this.visible();
    const want: Rect = {
      top: Math.max(0, v.top - OVERSCAN_ROWS),
      bottom: Math.min(this.extentRows - 1, v.bottom + OVERSCAN_ROWS),
      left: Math.max(0, v.left - OVERSCAN_COLS),
      right: Math.min(this.extentCols - 1, v.right + OVERSCAN_COLS),
    };
    const old = this.view;
    const same = want.top === old.top && want.bottom === old.bottom && want.left === old.left && want.right === old.right;
    if (same && !all) return;
    this.view = want;
    // cells that left the view go back to the pool
    for (const [key, cell] of this.rendered) {
      const [r, c] = key.split(',').map(Number);
      if (!inRect(want, r, c)) {
        cell.remove();
        this.rendered.delete(key);
        this.pool.push(cell);
      }
    }
    const d = this.doc;
    const fresh: CellEl[] = [];
    const painter = this.painter();
    for (let r = want.top; r <= want.bottom; r++) {
      for (let c = want.left; c <= want.right; c++) {
        const key = `${r},${c}`;
        let cell = this.rendered.get(key);
        const isNew = !cell;
        if (!cell) {
          cell = this.pool.pop() ?? (el(d, 'div') as CellEl);
          cell.painted = undefined;
          cell.dataset.cell = a1({ row: r, col: c });
          cell.dataset.row = String(r);
          cell.dataset.col = String(c);
          this.rendered.set(key, cell);
          fresh.push(cell);
        }
        const st = cell.style;
        const left = `${this.colX[c]}px`;
        const width = `${this.colPx[c]}px`;
        const top = `${r * ROW_PX}px`;
        if (st.left !== left) st.left = left;
        if (st.width !== width) st.width = width;
        if (st.top !== top) st.top = top;
        if (isNew || all) painter(cell, r, c);
      }
    }
    if (fresh.length > 0) this.body.append(...fresh);
    this.renderHeads(want);
    if (!all) this.paintSelection(false);
  }

  private renderHeads(want: Rect): void {
    const d = this.doc;
    const sel = this.selection;
    for (const [c, head] of this.colHeads) {
      if (c < want.left || c > want.right) {
        head.remove();
        this.colHeads.delete(c);
      }
    }
    for (let c = want.left; c <= want.right; c++) {
      let head = this.colHeads.get(c);
      if (!head) {
        head = el(d, 'div', 'pv-colhead', columnName(c));
        head.dataset.col = String(c);
        head.append(el(d, 'span', 'pv-resize'));
        this.colHeads.set(c, head);
        this.colHeadStrip.append(head);
      }
      head.style.left = `${ROW_HEAD_PX + this.colX[c]}px`;
      head.style.width = `${this.colPx[c]}px`;
      head.classList.toggle('hl', c >= sel.left && c <= sel.right);
    }
    for (const [r, head] of this.rowHeads) {
      if (r < want.top || r > want.bottom) {
        head.remove();
        this.rowHeads.delete(r);
      }
    }
    for (let r = want.top; r <= want.bottom; r++) {
      let head = this.rowHeads.get(r);
      if (!head) {
        head = el(d, 'div', 'pv-rowhead', String(r + 1));
        head.dataset.row = String(r);
        head.style.top = `${r * ROW_PX}px`;
        this.rowHeads.set(r, head);
        this.rowHeadStrip.append(head);
      }
      head.classList.toggle('hl', r >= sel.top && r <= sel.bottom);
    }
  }

  /** A function that paints one cell of the shown sheet (spill areas found once per pass). */
  private painter(): (cell: CellEl, r: number, c: number) => void {
    const engine = this.workbook.engine;
    const hf = this.workbook.hf;
    const sheetId = this.workbook.sheetId(this.sheet);
    const dims = hf.getSheetDimensions(sheetId);
    const spills = new Map<string, Rect>();
    const spillOf = (at: { sheet: number; row: number; col: number }, type: CellType): Rect | undefined => {
      const anchor = type === CellType.ARRAYFORMULA ? at : engine.spillAnchor(at);
      if (!anchor) return undefined;
      const key = `${anchor.row},${anchor.col}`;
      let rect = spills.get(key);
      if (!rect) {
        const size = engine.spillSize(anchor);
        rect = { top: anchor.row, left: anchor.col, bottom: anchor.row + size.height - 1, right: anchor.col + size.width - 1 };
        spills.set(key, rect);
      }
      return rect;
    };
    return (cell, r, c) => {
      if (r >= dims.height || c >= dims.width) {
        this.paintCell(cell, null, CellType.EMPTY, '', '', undefined);
        return;
      }
      const at = { sheet: sheetId, row: r, col: c };
      const type = hf.getCellType(at);
      if (type === CellType.EMPTY) {
        this.paintCell(cell, null, type, '', '', undefined);
        return;
      }
      const value = engine.display(at);
      const text = displayText(value);
      const style = this.workbook.styleOf(this.sheet, r, c);
      const extra: string[] = [];
      if (style) extra.push(`s-${style}`);
      if (style === 'verdict' && /^(FAIL|EXCEEDS|ABOVE|OVER)/.test(text)) extra.push('is-alarm');
      if (type === CellType.ARRAY || type === CellType.ARRAYFORMULA) {
        const s = spillOf(at, type);
        if (s && (s.bottom > s.top || s.right > s.left)) {
          if (s.top === r) extra.push('sp-t');
          if (s.bottom === r) extra.push('sp-b');
          if (s.left === c) extra.push('sp-l');
          if (s.right === c) extra.push('sp-r');
        }
      }
      const runsOn = c + 1 >= dims.width || hf.getCellType({ sheet: sheetId, row: r, col: c + 1 }) === CellType.EMPTY;
      this.paintCell(cell, value, type, text, extra.join(' '), style, runsOn);
    };
  }

  private paintCell(cell: CellEl, value: DisplayValue, type: CellType, text: string, extra: string, style: string | undefined, runsOn = false): void {
    const error = isDisplayError(value);
    let kind =
      type === CellType.EMPTY
        ? ''
        : error
          ? 'k-error'
          : type === CellType.ARRAY
            ? 'k-spill'
            : type === CellType.FORMULA || type === CellType.ARRAYFORMULA
              ? 'k-formula'
              : value === null
                ? ''
                : typeof value === 'string' && !isPhasorText(value)
                  ? 'k-label'
                  : 'k-input';
    // a styled label (a step number, a symbol such as J1 that also reads as a phasor) is no input
    if (kind === 'k-input' && style && style !== 'input' && style !== 'scenario') kind = '';
    const align = typeof value === 'number' ? 'a-num' : typeof value === 'boolean' || error ? 'a-mid' : '';
    const cls = ['pv-cell', kind, align, type === CellType.ARRAYFORMULA ? 'k-anchor' : '', kind === 'k-label' && runsOn ? 'runs-on' : '', extra].filter(Boolean).join(' ');
    let title = '';
    if (error) title = errorMessage(value);
    else if (typeof value === 'number' && formatNumber(value) !== String(value)) title = String(value);
    else if (kind !== 'k-label' && text.length * CHAR_PX + 16 > MAX_COL_PX) title = text;
    const signature = `${cls}\u0000${text}\u0000${title}`;
    if (cell.painted === signature) return;
    cell.painted = signature;
    cell.textContent = text;
    cell.className = cls;
    if (title) cell.title = title;
    else cell.removeAttribute('title');
  }

  private paintSelection(withStatus = true): void {
    const sel = this.selection;
    const k = this.clip && this.clip.sheet === this.sheet ? this.clip.rect : undefined;
    for (const [key, cell] of this.rendered) {
      const comma = key.indexOf(',');
      const r = Number(key.slice(0, comma));
      const c = Number(key.slice(comma + 1));
      const inSel = inRect(sel, r, c);
      const active = r === this.anchor.row && c === this.anchor.col;
      const copied = k !== undefined && inRect(k, r, c);
      const list = cell.classList;
      list.toggle('sel', inSel);
      list.toggle('active', active);
      list.toggle('copied', copied);
      list.toggle('cp-t', copied && r === k!.top);
      list.toggle('cp-b', copied && r === k!.bottom);
      list.toggle('cp-l', copied && c === k!.left);
      list.toggle('cp-r', copied && c === k!.right);
    }
    for (const [c, head] of this.colHeads) head.classList.toggle('hl', c >= sel.left && c <= sel.right);
    for (const [r, head] of this.rowHeads) head.classList.toggle('hl', r >= sel.top && r <= sel.bottom);
    if (!withStatus) return;
    this.nameBox.value = rectA1(sel);
    if (!this.editing) this.formulaBar.value = rawToText(this.workbook.raw(this.sheet, this.anchor.row, this.anchor.col));
    this.renderStatus();
  }

  private renderStatus(): void {
    const sel = this.selection;
    const at = { sheet: this.workbook.sheetId(this.sheet), row: this.anchor.row, col: this.anchor.col };
    const engine = this.workbook.engine;
    const value = engine.display(at);
    const addr = a1(this.anchor);
    let text: string;
    if (isDisplayError(value)) {
      text = `${addr}: ${value.error} ${errorMessage(value)}`;
    } else {
      const anchor = engine.spillAnchor(at);
      const type = this.workbook.hf.getCellType(at);
      if (anchor) text = `${addr} shows part of the result spilled from ${a1(anchor)}.`;
      else if (type === CellType.ARRAYFORMULA) {
        const size = engine.spillSize(at);
        const spill = rectA1({ top: at.row, left: at.col, bottom: at.row + size.height - 1, right: at.col + size.width - 1 });
        text = `${addr}: formula; its result spills over ${spill}.`;
      } else if (type === CellType.FORMULA) text = `${addr}: formula.`;
      else if (typeof value === 'string' && !isPhasorText(value)) text = `${addr}: text.`;
      else if (typeof value === 'number' && formatNumber(value) !== String(value)) text = `${addr}: input; exactly ${String(value)}.`;
      else if (value !== null) text = `${addr}: input.`;
      else text = `${addr}: empty.`;
    }
    if (sel.top !== sel.bottom || sel.left !== sel.right) {
      const n = (sel.bottom - sel.top + 1) * (sel.right - sel.left + 1);
      text = `${rectA1(sel)} selected (${n.toLocaleString('en-US')} cells). ${text}`;
    }
    if (this.note) text = `${text} — ${this.note}`;
    this.status.textContent = text;
    this.status.classList.toggle('is-error', isDisplayError(value));
  }

  // ----------------------------------------------------------------- editing

  private cellElement(pos: CellPos): CellEl | undefined {
    return this.rendered.get(`${pos.row},${pos.col}`);
  }

  private startEdit(initial: string | null, mode: EditMode): void {
    if (this.editing) return;
    const raw = rawToText(this.workbook.raw(this.sheet, this.anchor.row, this.anchor.col));
    const text = initial ?? raw;
    this.editing = { mode, source: 'cell', original: raw };
    this.scrollToCell(this.anchor);
    const box = this.cellBox(this.anchor);
    this.editor.hidden = false;
    this.editor.style.left = `${box.left}px`;
    this.editor.style.top = `${box.top}px`;
    this.editor.style.height = `${box.height}px`;
    this.editor.value = text;
    this.formulaBar.value = text;
    this.fitEditor();
    this.editor.focus({ preventScroll: true });
    this.editor.setSelectionRange(text.length, text.length);
    this.say(mode === 'enter' ? 'Typing: Enter or Tab keeps it, Escape cancels.' : 'Editing: Enter keeps it, Escape cancels.');
  }

  /** The editor grows with what is typed, so a long formula stays visible. */
  private fitEditor(): void {
    const box = this.cellBox(this.anchor);
    const room = this.scroller.scrollLeft + this.scroller.clientWidth - ROW_HEAD_PX - box.left;
    const want = Math.max(box.width, (Math.min(this.editor.value.length, 400) + 2) * CHAR_PX);
    this.editor.style.width = `${Math.round(Math.min(want, Math.max(room, box.width)))}px`;
  }

  private endEdit(): void {
    this.editing = null;
    this.editor.hidden = true;
    this.note = '';
  }

  /** Writes what was typed into the active cell. */
  private commitEdit(text?: string): void {
    if (!this.editing) return;
    const source = this.editing.source;
    const value = text ?? (source === 'bar' ? this.formulaBar.value : this.editor.value);
    const original = this.editing.original;
    this.endEdit();
    if (value !== original) {
      this.write(() => this.workbook.setCell(this.sheet, this.anchor.row, this.anchor.col, value === '' ? null : value, 'Edit'));
    } else {
      this.paintSelection();
    }
  }

  /** Runs a change of the workbook; what goes wrong is said in the status line, never thrown at the page. */
  private write(change: () => void): boolean {
    try {
      change();
      return true;
    } catch (e) {
      console.warn('preview: a change was not made', e);
      this.say(`Nothing was changed: ${e instanceof Error ? e.message : String(e)}`);
      return false;
    }
  }

  private cancelEdit(): void {
    if (!this.editing) return;
    this.endEdit();
    this.paintSelection();
    this.focus();
  }

  private move(dr: number, dc: number, extend = false): void {
    const from = extend ? this.focusPos : this.anchor;
    this.select({ row: from.row + dr, col: from.col + dc }, extend);
  }

  /** Jump to the edge of the data block (Ctrl+arrow), or to the end of the sheet. */
  private jump(dr: number, dc: number, extend: boolean): void {
    const id = this.workbook.sheetId(this.sheet);
    const dims = this.workbook.used(this.sheet);
    const filled = (r: number, c: number) => r < dims.height && c < dims.width && this.workbook.hf.getCellType({ sheet: id, row: r, col: c }) !== CellType.EMPTY;
    let { row, col } = extend ? this.focusPos : this.anchor;
    const inside = (r: number, c: number) => r >= 0 && c >= 0 && r < MAX_ROWS && c < MAX_COLUMNS;
    const startFilled = filled(row, col) && inside(row + dr, col + dc) && filled(row + dr, col + dc);
    if (startFilled) {
      while (inside(row + dr, col + dc) && filled(row + dr, col + dc)) {
        row += dr;
        col += dc;
      }
    } else {
      do {
        row += dr;
        col += dc;
        // past the used part nothing is filled: straight to the sheet's edge
        if ((dr > 0 && row >= dims.height) || (dc > 0 && col >= dims.width)) {
          row = dr > 0 ? MAX_ROWS - 1 : row;
          col = dc > 0 ? MAX_COLUMNS - 1 : col;
          break;
        }
      } while (inside(row + dr, col + dc) && !filled(row, col));
    }
    this.select({ row: Math.max(0, row), col: Math.max(0, col) }, extend);
  }

  // ----------------------------------------------------------- clipboard

  /** The selection as tab-separated text of what the cells show (its used part). */
  private selectionTsv(): string {
    const sel = this.selection;
    const dims = this.workbook.used(this.sheet);
    const id = this.workbook.sheetId(this.sheet);
    const rows: string[][] = [];
    for (let r = sel.top; r <= Math.min(sel.bottom, dims.height - 1); r++) {
      const row: string[] = [];
      for (let c = sel.left; c <= Math.min(sel.right, dims.width - 1); c++) row.push(displayText(this.workbook.engine.display({ sheet: id, row: r, col: c })));
      rows.push(row);
    }
    return toTsv(rows);
  }

  private copy(): void {
    const sel = this.selection;
    const dims = this.workbook.used(this.sheet);
    // a whole column or row copies its used part
    const rect = { ...sel, bottom: Math.max(sel.top, Math.min(sel.bottom, dims.height - 1)), right: Math.max(sel.left, Math.min(sel.right, dims.width - 1)) };
    this.clip = { sheet: this.sheet, rect, text: this.selectionTsv() };
    this.paintSelection();
    this.say(`Copied ${rectA1(this.clip.rect)}. Select a cell and press Ctrl+V to paste.`);
  }

  private pasteInternal(): void {
    if (!this.clip) return;
    const k = this.clip.rect;
    if (this.write(() => this.workbook.copyBlock(this.clip!.sheet, k, this.sheet, this.anchor.row, this.anchor.col))) {
      this.say(`Pasted ${rectA1(k)} at ${a1(this.anchor)}; relative references moved with it.`);
    }
  }

  private pasteText(text: string): void {
    const rows = fromTsv(text).map((r) => r.map((v) => (v === '' ? null : v)));
    if (rows.length === 0) return;
    const width = rows.reduce((w, r) => Math.max(w, r.length), 0);
    if (this.write(() => this.workbook.setBlock(this.sheet, this.anchor.row, this.anchor.col, rows, 'Paste'))) {
      const end = a1({ row: this.anchor.row + rows.length - 1, col: this.anchor.col + width - 1 });
      this.say(`Pasted ${rows.length.toLocaleString('en-US')}×${width} cells of text into ${a1(this.anchor)}:${end}. Ctrl+Z undoes it.`);
    }
  }

  // ----------------------------------------------------------------- events

  private cellFromEvent(e: Event): CellPos | undefined {
    const target = e.target as HTMLElement | null;
    const cell = target?.closest?.('.pv-cell[data-cell]') as HTMLElement | null;
    if (!cell) return undefined;
    return { row: Number(cell.dataset.row), col: Number(cell.dataset.col) };
  }

  private wire(): void {
    const s = this.scroller;

    s.addEventListener(
      'scroll',
      () => {
        if (this.frame) return;
        this.frame = requestAnimationFrame(() => {
          this.frame = 0;
          // scrolled near the end: the area grows, up to the end of the sheet
          const v = this.visible();
          if (v.bottom >= this.extentRows - 2 && this.extentRows < MAX_ROWS) {
            // a tenth more each time (at least 1,000 rows), so far rows come within a few scrolls
            this.grownRows = Math.max(this.grownRows, this.extentRows + Math.max(5 * ROW_ROOM, Math.round(this.extentRows / 10)));
            this.layout();
          }
          if (v.right >= this.extentCols - 1 && this.extentCols < MAX_COLUMNS) {
            this.grownCols = Math.max(this.grownCols, this.extentCols + COL_ROOM);
            this.layout();
          }
          this.renderWindow(false);
        });
      },
      { passive: true },
    );
    const resize = new (this.doc.defaultView?.ResizeObserver ?? ResizeObserver)(() => {
      this.layout();
      this.renderWindow(false);
    });
    resize.observe(s);

    s.addEventListener('mousedown', (e) => {
      if (e.button !== 0 || e.target === this.editor) return;
      const target = e.target as HTMLElement;
      if (target.closest('.pv-overlay')) return;
      const grip = target.closest('.pv-resize') as HTMLElement | null;
      const colHead = target.closest('.pv-colhead') as HTMLElement | null;
      const rowHead = target.closest('.pv-rowhead') as HTMLElement | null;
      if (this.editing) this.commitEdit();
      if (grip && colHead) {
        const col = Number(colHead.dataset.col);
        this.resizing = { col, startX: e.clientX, startPx: this.colPx[col] };
      } else if (colHead) {
        const c = Number(colHead.dataset.col);
        this.anchor = { row: 0, col: c };
        this.focusPos = { row: MAX_ROWS - 1, col: c };
        this.afterSelect();
      } else if (rowHead) {
        const r = Number(rowHead.dataset.row);
        this.anchor = { row: r, col: 0 };
        this.focusPos = { row: r, col: MAX_COLUMNS - 1 };
        this.afterSelect();
      } else if (target.closest('.pv-corner')) {
        this.selectAll();
      } else {
        const pos = this.cellFromEvent(e);
        if (!pos) return;
        this.select(pos, e.shiftKey);
        this.dragging = true;
      }
      e.preventDefault();
      this.focus();
    });
    s.addEventListener('mouseover', (e) => {
      if (!this.dragging) return;
      const pos = this.cellFromEvent(e);
      if (pos && (pos.row !== this.focusPos.row || pos.col !== this.focusPos.col)) this.select(pos, true);
    });
    this.doc.addEventListener('mousemove', (e) => {
      if (!this.resizing) return;
      const { col, startX, startPx } = this.resizing;
      const px = Math.max(24, startPx + e.clientX - startX);
      const head = this.colHeads.get(col);
      if (head) head.style.width = `${px}px`;
    });
    this.doc.addEventListener('mouseup', (e) => {
      this.dragging = false;
      if (this.resizing) {
        const { col, startX, startPx } = this.resizing;
        this.resizing = null;
        const px = Math.max(24, startPx + e.clientX - startX);
        if (Math.abs(px - startPx) >= 2) this.workbook.setColumnWidth(this.sheet, col, pxToChars(px));
        else this.refresh();
      }
    });
    s.addEventListener('dblclick', (e) => {
      const target = e.target as HTMLElement;
      const grip = target.closest('.pv-resize');
      const colHead = target.closest('.pv-colhead') as HTMLElement | null;
      if (grip && colHead) {
        // double-click on the edge: size the column to fit again
        this.workbook.setColumnWidth(this.sheet, Number(colHead.dataset.col), 0);
        return;
      }
      const pos = this.cellFromEvent(e);
      if (!pos) return;
      this.select(pos);
      this.startEdit(null, 'edit');
    });

    s.addEventListener('keydown', (e) => {
      if (e.target !== s) return;
      this.onGridKey(e);
    });

    this.editor.addEventListener('keydown', (e) => this.onEditorKey(e, 'cell'));
    this.editor.addEventListener('input', () => {
      this.formulaBar.value = this.editor.value;
      this.fitEditor();
    });
    this.editor.addEventListener('blur', () => {
      // Clicking elsewhere keeps what was typed (the grid's mousedown commits first).
      if (this.editing?.source === 'cell') this.commitEdit();
    });

    this.formulaBar.addEventListener('focus', () => {
      if (this.editing) return;
      const raw = rawToText(this.workbook.raw(this.sheet, this.anchor.row, this.anchor.col));
      this.editing = { mode: 'edit', source: 'bar', original: raw };
    });
    this.formulaBar.addEventListener('keydown', (e) => this.onEditorKey(e, 'bar'));
    this.formulaBar.addEventListener('blur', () => {
      if (this.editing?.source === 'bar') this.commitEdit();
    });

    this.nameBox.addEventListener('keydown', (e) => {
      if (e.key === 'Enter') {
        e.preventDefault();
        this.goTo(this.nameBox.value);
      } else if (e.key === 'Escape') {
        e.preventDefault();
        this.paintSelection();
        this.focus();
      }
    });

    this.undoButton.addEventListener('click', () => this.undo());
    this.redoButton.addEventListener('click', () => this.redo());

    // Clipboard: the browser's copy/paste events carry text to and from other programs;
    // within the grid, formulas are pasted with their references moved.
    this.doc.addEventListener('copy', (e) => {
      if (this.doc.activeElement !== s) return;
      this.copy();
      e.clipboardData?.setData('text/plain', this.clip?.text ?? '');
      e.preventDefault();
    });
    this.doc.addEventListener('paste', (e) => {
      if (this.doc.activeElement !== s) return;
      e.preventDefault();
      this.pasteHandled = true;
      const text = e.clipboardData?.getData('text/plain') ?? '';
      if (this.clip && (text === '' || text === this.clip.text)) this.pasteInternal();
      else if (text !== '') this.pasteText(text);
    });
  }

  /** After the selection was set directly (whole rows, columns, all): paint and tell. */
  private afterSelect(): void {
    this.note = '';
    this.paintSelection();
    for (const l of this.selectionListeners) l();
  }

  private selectAll(): void {
    this.anchor = { row: 0, col: 0 };
    this.focusPos = { row: MAX_ROWS - 1, col: MAX_COLUMNS - 1 };
    this.afterSelect();
  }

  /** Goes to an address typed in the name box (`B7`, `A1:C3`, `Sheet2!B2`). */
  private goTo(text: string): void {
    let target = text.trim();
    const bang = target.lastIndexOf('!');
    if (bang > 0) {
      const sheet = target.slice(0, bang).replace(/^'|'$/g, '').replace(/''/g, "'");
      if (!this.workbook.sheetNames().includes(sheet)) {
        this.say(`There is no sheet named ${sheet}.`);
        return;
      }
      if (sheet !== this.sheet) this.showSheet(sheet);
      target = target.slice(bang + 1);
    }
    const rect = parseRectA1(target);
    if (!rect || rect.bottom >= MAX_ROWS || rect.right >= MAX_COLUMNS) {
      this.say(`“${text.slice(0, 40)}” is not a cell address on this sheet (A1 to ${a1({ row: MAX_ROWS - 1, col: MAX_COLUMNS - 1 })}).`);
      return;
    }
    this.select({ row: rect.top, col: rect.left });
    if (rect.bottom !== rect.top || rect.right !== rect.left) this.select({ row: rect.bottom, col: rect.right }, true);
    this.focus();
  }

  private undo(): void {
    let label: string | undefined;
    if (this.write(() => (label = this.workbook.undo()))) this.say(label ? `Undid: ${label}.` : 'Nothing to undo.');
  }

  private redo(): void {
    let label: string | undefined;
    if (this.write(() => (label = this.workbook.redo()))) this.say(label ? `Redid: ${label}.` : 'Nothing to redo.');
  }

  private pageRows(): number {
    return Math.max(1, Math.floor((this.scroller.clientHeight - HEAD_PX) / ROW_PX) - 1);
  }

  private onGridKey(e: KeyboardEvent): void {
    const ctrl = e.ctrlKey || e.metaKey;
    const key = e.key;
    const arrows: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
    if (key in arrows) {
      const [dr, dc] = arrows[key];
      if (ctrl) this.jump(dr, dc, e.shiftKey);
      else this.move(dr, dc, e.shiftKey);
      e.preventDefault();
      return;
    }
    if (ctrl) {
      const k = key.toLowerCase();
      if (k === 'z' && !e.shiftKey) {
        e.preventDefault();
        this.undo();
      } else if (k === 'y' || (k === 'z' && e.shiftKey)) {
        e.preventDefault();
        this.redo();
      } else if (k === 'a') {
        e.preventDefault();
        this.selectAll();
      } else if (k === 'c') {
        // The copy event follows and carries the text to the system clipboard; copying
        // here as well keeps Ctrl+C working where that event is not delivered.
        this.copy();
      } else if (k === 'v') {
        this.pasteHandled = false;
        // Where no paste event arrives (no clipboard access), paste the grid's own copy.
        setTimeout(() => {
          if (!this.pasteHandled) this.pasteInternal();
        }, 60);
      } else if (key === 'Home') {
        e.preventDefault();
        this.select({ row: 0, col: 0 }, e.shiftKey);
      } else if (key === 'End') {
        e.preventDefault();
        const dims = this.workbook.used(this.sheet);
        this.select({ row: Math.max(0, dims.height - 1), col: Math.max(0, dims.width - 1) }, e.shiftKey);
      }
      return;
    }
    switch (key) {
      case 'Enter':
        e.preventDefault();
        this.move(e.shiftKey ? -1 : 1, 0);
        return;
      case 'Tab':
        e.preventDefault();
        this.move(0, e.shiftKey ? -1 : 1);
        return;
      case 'F2':
        e.preventDefault();
        this.startEdit(null, 'edit');
        return;
      case 'Delete': {
        e.preventDefault();
        const sel = this.selection;
        this.write(() => this.workbook.clear(this.sheet, sel));
        return;
      }
      case 'Backspace':
        e.preventDefault();
        this.startEdit('', 'enter');
        return;
      case 'Escape':
        if (this.clip) {
          this.clip = null;
          this.paintSelection();
        }
        return;
      case 'Home':
        e.preventDefault();
        this.select({ row: this.anchor.row, col: 0 }, e.shiftKey);
        return;
      case 'PageDown':
      case 'PageUp':
        e.preventDefault();
        this.move(key === 'PageDown' ? this.pageRows() : -this.pageRows(), 0, e.shiftKey);
        return;
      default:
        if (key.length === 1 && !e.altKey) {
          e.preventDefault();
          this.startEdit(key, 'enter');
        }
    }
  }

  private onEditorKey(e: KeyboardEvent, source: 'cell' | 'bar'): void {
    if (source === 'bar' && !this.editing) {
      const raw = rawToText(this.workbook.raw(this.sheet, this.anchor.row, this.anchor.col));
      this.editing = { mode: 'edit', source: 'bar', original: raw };
    }
    const key = e.key;
    if (key === 'Enter' || key === 'Tab') {
      e.preventDefault();
      this.commitEdit();
      if (key === 'Enter') this.move(e.shiftKey ? -1 : 1, 0);
      else this.move(0, e.shiftKey ? -1 : 1);
      this.focus();
      return;
    }
    if (key === 'Escape') {
      e.preventDefault();
      if (source === 'bar') this.formulaBar.value = this.editing?.original ?? '';
      this.cancelEdit();
      return;
    }
    if (source === 'cell' && this.editing?.mode === 'enter' && key.startsWith('Arrow') && !e.shiftKey) {
      e.preventDefault();
      this.commitEdit();
      const d: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
      this.move(...d[key]);
      this.focus();
      return;
    }
    if (source === 'cell' && key === 'F2' && this.editing) {
      e.preventDefault();
      this.editing.mode = this.editing.mode === 'enter' ? 'edit' : 'enter';
    }
  }
}
