/**
 * The preview grid: a sheet of cells a person can work in, over the workbook model.
 *
 * Every cell element carries its address (`data-cell="B2"`), the formula bar is an
 * input labelled "Formula", so scripts and screen readers drive it the same way.
 */
import { CellType } from 'hyperformula';
import type { RawCellContent } from 'hyperformula';
import { a1, columnName, inRect, parseRectA1, rectA1, rectOf } from './address';
import type { CellPos, Rect } from './address';
import { isDisplayError } from './engine';
import type { DisplayValue } from './engine';
import { displayText, errorMessage, formatNumber, isPhasorText } from './format';
import type { Workbook } from './workbook';

export interface GridOptions {
  readonly rows?: number;
  readonly cols?: number;
}

type EditMode = 'enter' | 'edit';

interface Clip {
  readonly sheet: string;
  readonly rect: Rect;
  readonly text: string;
}

const MIN_COL_PX = 72;
const MAX_COL_PX = 280;
const CHAR_PX = 7.9;
const ROW_HEAD_PX = 46;

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

function fromTsv(text: string): string[][] {
  const lines = text.replace(/\r\n?/g, '\n').replace(/\n$/, '').split('\n');
  return lines.map((l) => l.split('\t'));
}

export class Grid {
  readonly element: HTMLElement;
  private readonly doc: Document;
  private readonly rows: number;
  private readonly cols: number;

  private sheet: string;
  private anchor: CellPos = { row: 0, col: 0 };
  private focusPos: CellPos = { row: 0, col: 0 };
  private cells: HTMLTableCellElement[][] = [];
  private colEls: HTMLTableColElement[] = [];
  private colHeads: HTMLTableCellElement[] = [];
  private rowHeads: HTMLTableCellElement[] = [];
  private paintedRows = 0;
  private paintedCols = 0;

  private editing: { mode: EditMode; source: 'cell' | 'bar'; original: string } | null = null;
  private dragging = false;
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
  private readonly table: HTMLTableElement;
  private readonly editor: HTMLInputElement;
  private readonly tabs: HTMLDivElement;
  private readonly status: HTMLDivElement;

  constructor(
    root: HTMLElement,
    private readonly workbook: Workbook,
    options: GridOptions = {},
  ) {
    this.doc = root.ownerDocument;
    this.rows = options.rows ?? 200;
    this.cols = options.cols ?? 26;
    this.sheet = workbook.sheetNames()[0];
    const d = this.doc;

    this.element = el(d, 'section', 'pv-book');
    this.element.setAttribute('aria-label', 'Workbook');

    // Formula bar row: name box, labelled formula input, undo/redo, legend.
    const bar = el(d, 'div', 'pv-bar');
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

    // The sheet itself.
    this.scroller = el(d, 'div', 'pv-scroll');
    this.scroller.tabIndex = 0;
    this.canvas = el(d, 'div', 'pv-canvas');
    this.table = el(d, 'table', 'pv-cells');
    this.editor = el(d, 'input', 'pv-editor');
    this.editor.setAttribute('aria-label', 'Cell editor');
    this.editor.autocomplete = 'off';
    this.editor.spellcheck = false;
    this.editor.hidden = true;
    this.canvas.append(this.table, this.editor);
    this.scroller.append(this.canvas);

    this.tabs = el(d, 'div', 'pv-tabs');
    this.tabs.setAttribute('role', 'tablist');
    this.tabs.setAttribute('aria-label', 'Sheets');

    this.status = el(d, 'div', 'pv-status');
    this.status.setAttribute('role', 'status');
    this.status.setAttribute('aria-live', 'polite');

    this.element.append(bar, legend, this.scroller, this.tabs, this.status);
    root.append(this.element);

    this.buildTable();
    this.wire();
    this.workbook.onChange(() => this.refresh());
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

  // ------------------------------------------------- overlay hook (charts over the grid)
  // The hook src/preview/chart-overlay.ts uses; a reworked grid keeps these three members.

  /** A layer over the cells that scrolls with them; overlays position their elements in it. */
  get overlayLayer(): HTMLElement {
    if (!this.overlay) {
      this.overlay = el(this.doc, 'div', 'pv-overlay');
      this.canvas.append(this.overlay);
    }
    return this.overlay;
  }

  /** Where a cell of the shown sheet sits in `overlayLayer`, in CSS pixels. */
  cellBox(pos: CellPos): { left: number; top: number; width: number; height: number } {
    const row = Math.max(0, Math.min(this.rows - 1, pos.row));
    const col = Math.max(0, Math.min(this.cols - 1, pos.col));
    const td = this.cells[row][col];
    return { left: td.offsetLeft, top: td.offsetTop, width: td.offsetWidth, height: td.offsetHeight };
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
    this.paintedRows = this.rows;
    this.paintedCols = this.cols;
    this.renderTabs();
    this.refresh();
    this.scroller.scrollTo(0, 0);
  }

  select(pos: CellPos, extend = false): void {
    const clamped = { row: Math.max(0, Math.min(this.rows - 1, pos.row)), col: Math.max(0, Math.min(this.cols - 1, pos.col)) };
    if (extend) this.focusPos = clamped;
    else {
      this.anchor = clamped;
      this.focusPos = clamped;
    }
    this.note = '';
    this.paintSelection();
    this.cells[this.focusPos.row]?.[this.focusPos.col]?.scrollIntoView({ block: 'nearest', inline: 'nearest' });
    for (const l of this.selectionListeners) l();
  }

  /** A short message in the status line, until the selection moves. */
  say(message: string): void {
    this.note = message;
    this.renderStatus();
  }

  // ------------------------------------------------------------------ building

  private buildTable(): void {
    const d = this.doc;
    const colgroup = el(d, 'colgroup');
    const headCol = el(d, 'col', 'pv-col-head');
    colgroup.append(headCol);
    this.colEls = [];
    for (let c = 0; c < this.cols; c++) {
      const col = el(d, 'col');
      col.style.width = `${MIN_COL_PX + 12}px`;
      colgroup.append(col);
      this.colEls.push(col);
    }
    const thead = el(d, 'thead');
    const hr = el(d, 'tr');
    const corner = el(d, 'th', 'pv-corner');
    corner.setAttribute('aria-label', 'Select all');
    hr.append(corner);
    this.colHeads = [];
    for (let c = 0; c < this.cols; c++) {
      const th = el(d, 'th', 'pv-colhead', columnName(c));
      th.scope = 'col';
      th.dataset.col = String(c);
      hr.append(th);
      this.colHeads.push(th);
    }
    thead.append(hr);
    const tbody = el(d, 'tbody');
    this.cells = [];
    this.rowHeads = [];
    for (let r = 0; r < this.rows; r++) {
      const tr = el(d, 'tr');
      const th = el(d, 'th', 'pv-rowhead', String(r + 1));
      th.scope = 'row';
      th.dataset.row = String(r);
      tr.append(th);
      this.rowHeads.push(th);
      const rowCells: HTMLTableCellElement[] = [];
      for (let c = 0; c < this.cols; c++) {
        const td = el(d, 'td');
        td.dataset.cell = a1({ row: r, col: c });
        td.dataset.row = String(r);
        td.dataset.col = String(c);
        tr.append(td);
        rowCells.push(td);
      }
      tbody.append(tr);
      this.cells.push(rowCells);
    }
    this.table.append(colgroup, thead, tbody);
    this.paintedRows = this.rows;
    this.paintedCols = this.cols;
  }

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

  // ----------------------------------------------------------------- painting

  /** Repaints values, styles and column widths of the shown sheet. */
  refresh(): void {
    const names = this.workbook.sheetNames();
    if (!names.includes(this.sheet)) {
      this.sheet = names[0];
      this.paintedRows = this.rows;
      this.paintedCols = this.cols;
    }
    if (this.tabs.childElementCount !== names.length + 1 || names.some((n, i) => (this.tabs.children[i] as HTMLElement).dataset.sheet !== n)) {
      this.renderTabs();
    }
    const engine = this.workbook.engine;
    const hf = this.workbook.hf;
    const sheetId = this.workbook.sheetId(this.sheet);
    const dims = hf.getSheetDimensions(sheetId);
    const h = Math.min(this.rows, dims.height);
    const w = Math.min(this.cols, dims.width);
    const widths = new Array<number>(this.cols).fill(0);

    // Spill outlines: the block each array formula fills.
    const spills: Rect[] = [];
    for (let r = 0; r < h; r++) {
      for (let c = 0; c < w; c++) {
        const at = { sheet: sheetId, row: r, col: c };
        if (hf.getCellType(at) === CellType.ARRAYFORMULA) {
          const size = engine.spillSize(at);
          if (size.width > 1 || size.height > 1) spills.push({ top: r, left: c, bottom: r + size.height - 1, right: c + size.width - 1 });
        }
      }
    }

    const rowsToPaint = Math.max(h, this.paintedRows);
    const colsToPaint = Math.max(w, this.paintedCols);
    for (let r = 0; r < rowsToPaint && r < this.rows; r++) {
      for (let c = 0; c < colsToPaint && c < this.cols; c++) {
        const td = this.cells[r][c];
        if (r >= h || c >= w) {
          this.paintCell(td, null, CellType.EMPTY, '');
          continue;
        }
        const at = { sheet: sheetId, row: r, col: c };
        const value = engine.display(at);
        const type = hf.getCellType(at);
        const text = displayText(value);
        this.paintCell(td, value, type, text);
        const runsOn = td.classList.contains('k-label') && (c + 1 >= w || hf.getCellType({ sheet: sheetId, row: r, col: c + 1 }) === CellType.EMPTY);
        td.classList.toggle('runs-on', runsOn);
        const style = this.workbook.styleOf(this.sheet, r, c);
        if (style) td.classList.add(`s-${style}`);
        // a styled label (a step number, a symbol such as J1 that also reads as a phasor) is no input
        if (style && style !== 'input' && style !== 'scenario') td.classList.remove('k-input');
        // a verdict that fails or exceeds a limit is shown as an alarm
        if (style === 'verdict') td.classList.toggle('is-alarm', /^(FAIL|EXCEEDS|ABOVE|OVER)/.test(text));
        const edges = spills.find((s) => inRect(s, r, c));
        td.classList.toggle('sp-t', !!edges && edges.top === r);
        td.classList.toggle('sp-b', !!edges && edges.bottom === r);
        td.classList.toggle('sp-l', !!edges && edges.left === c);
        td.classList.toggle('sp-r', !!edges && edges.right === c);
        // Titles and notes that run on over empty cells do not widen their column.
        if (!runsOn) widths[c] = Math.max(widths[c], text.length);
      }
    }
    this.paintedRows = h;
    this.paintedCols = w;

    let total = ROW_HEAD_PX;
    const asked = this.workbook.columnWidths(this.sheet);
    for (let c = 0; c < this.cols; c++) {
      const chars = asked[c] ?? widths[c];
      const px = Math.round(Math.min(asked[c] ? 2 * MAX_COL_PX : MAX_COL_PX, Math.max(asked[c] ? 24 : MIN_COL_PX, 16 + chars * CHAR_PX)));
      total += px;
      const want = `${px}px`;
      if (this.colEls[c].style.width !== want) this.colEls[c].style.width = want;
    }
    // A fixed table layout needs the table's own width; the columns then keep theirs.
    this.table.style.width = `${total}px`;
    this.undoButton.disabled = !this.workbook.canUndo();
    this.redoButton.disabled = !this.workbook.canRedo();
    this.paintSelection();
    for (const l of this.repaintListeners) l();
  }

  private paintCell(td: HTMLTableCellElement, value: DisplayValue, type: CellType, text: string): void {
    if (td.textContent !== text) td.textContent = text;
    const error = isDisplayError(value);
    const kind =
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
    const align = typeof value === 'number' ? 'a-num' : typeof value === 'boolean' || error ? 'a-mid' : '';
    const cls = [kind, align, type === CellType.ARRAYFORMULA ? 'k-anchor' : ''].filter(Boolean).join(' ');
    td.className = cls;
    let title = '';
    if (error) title = errorMessage(value);
    else if (typeof value === 'number' && formatNumber(value) !== String(value)) title = String(value);
    else if (kind !== 'k-label' && text.length * CHAR_PX + 16 > MAX_COL_PX) title = text;
    if (title) td.title = title;
    else td.removeAttribute('title');
  }

  private paintSelection(): void {
    const sel = this.selection;
    for (const td of this.table.querySelectorAll('td.sel, td.active, td.copied')) {
      td.classList.remove('sel', 'active', 'copied', 'cp-t', 'cp-b', 'cp-l', 'cp-r');
      td.removeAttribute('aria-selected');
    }
    for (const th of this.table.querySelectorAll('th.hl')) th.classList.remove('hl');
    for (let r = sel.top; r <= sel.bottom; r++) {
      this.rowHeads[r]?.classList.add('hl');
      for (let c = sel.left; c <= sel.right; c++) this.cells[r]?.[c]?.classList.add('sel');
    }
    for (let c = sel.left; c <= sel.right; c++) this.colHeads[c]?.classList.add('hl');
    const active = this.cells[this.anchor.row]?.[this.anchor.col];
    if (active) {
      active.classList.add('active');
      active.setAttribute('aria-selected', 'true');
    }
    if (this.clip && this.clip.sheet === this.sheet) {
      const k = this.clip.rect;
      for (let r = k.top; r <= k.bottom; r++) {
        for (let c = k.left; c <= k.right; c++) {
          const td = this.cells[r]?.[c];
          if (!td) continue;
          td.classList.add('copied');
          if (r === k.top) td.classList.add('cp-t');
          if (r === k.bottom) td.classList.add('cp-b');
          if (c === k.left) td.classList.add('cp-l');
          if (c === k.right) td.classList.add('cp-r');
        }
      }
    }
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
      else if (value !== null) text = `${addr}: input.`;
      else text = `${addr}: empty.`;
    }
    if (sel.top !== sel.bottom || sel.left !== sel.right) {
      const n = (sel.bottom - sel.top + 1) * (sel.right - sel.left + 1);
      text = `${rectA1(sel)} selected (${n} cells). ${text}`;
    }
    if (this.note) text = `${text} — ${this.note}`;
    this.status.textContent = text;
    this.status.classList.toggle('is-error', isDisplayError(value));
  }

  // ----------------------------------------------------------------- editing

  private startEdit(initial: string | null, mode: EditMode): void {
    if (this.editing) return;
    const raw = rawToText(this.workbook.raw(this.sheet, this.anchor.row, this.anchor.col));
    const text = initial ?? raw;
    this.editing = { mode, source: 'cell', original: raw };
    const td = this.cells[this.anchor.row][this.anchor.col];
    td.scrollIntoView({ block: 'nearest', inline: 'nearest' });
    this.editor.hidden = false;
    this.editor.style.left = `${td.offsetLeft}px`;
    this.editor.style.top = `${td.offsetTop}px`;
    this.editor.style.height = `${td.offsetHeight}px`;
    this.editor.value = text;
    this.formulaBar.value = text;
    this.fitEditor();
    this.editor.focus({ preventScroll: true });
    this.editor.setSelectionRange(text.length, text.length);
    this.say(mode === 'enter' ? 'Typing: Enter or Tab keeps it, Escape cancels.' : 'Editing: Enter keeps it, Escape cancels.');
  }

  /** The editor grows with what is typed, so a long formula stays visible. */
  private fitEditor(): void {
    const td = this.cells[this.anchor.row][this.anchor.col];
    const room = this.canvas.offsetWidth - td.offsetLeft;
    const want = Math.max(td.offsetWidth, (this.editor.value.length + 2) * CHAR_PX);
    this.editor.style.width = `${Math.round(Math.min(want, Math.max(room, td.offsetWidth)))}px`;
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
      this.workbook.setCell(this.sheet, this.anchor.row, this.anchor.col, value === '' ? null : value, 'Edit');
    } else {
      this.paintSelection();
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

  /** Jump to the edge of the data block (Ctrl+arrow). */
  private jump(dr: number, dc: number, extend: boolean): void {
    const id = this.workbook.sheetId(this.sheet);
    const filled = (r: number, c: number) => this.workbook.hf.getCellType({ sheet: id, row: r, col: c }) !== CellType.EMPTY;
    let { row, col } = extend ? this.focusPos : this.anchor;
    const inside = (r: number, c: number) => r >= 0 && c >= 0 && r < this.rows && c < this.cols;
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
      } while (inside(row + dr, col + dc) && !filled(row, col));
    }
    this.select({ row, col }, extend);
  }

  // ----------------------------------------------------------- clipboard

  private selectionTsv(): string {
    const sel = this.selection;
    const rows: string[][] = [];
    for (let r = sel.top; r <= sel.bottom; r++) {
      const row: string[] = [];
      for (let c = sel.left; c <= sel.right; c++) row.push(this.cells[r][c].textContent ?? '');
      rows.push(row);
    }
    return toTsv(rows);
  }

  private copy(): void {
    this.clip = { sheet: this.sheet, rect: this.selection, text: this.selectionTsv() };
    this.paintSelection();
    this.say(`Copied ${rectA1(this.clip.rect)}. Select a cell and press Ctrl+V to paste.`);
  }

  private pasteInternal(): void {
    if (!this.clip) return;
    try {
      this.workbook.copyBlock(this.clip.sheet, this.clip.rect, this.sheet, this.anchor.row, this.anchor.col);
      const k = this.clip.rect;
      this.say(`Pasted ${rectA1(k)} at ${a1(this.anchor)}; relative references moved with it.`);
    } catch (e) {
      this.say(`Could not paste here: ${e instanceof Error ? e.message : String(e)}`);
    }
  }

  private pasteText(text: string): void {
    const rows = fromTsv(text).map((r) => r.map((v) => (v === '' ? null : v)));
    if (rows.length === 0) return;
    this.workbook.setBlock(this.sheet, this.anchor.row, this.anchor.col, rows, 'Paste');
    this.say(`Pasted ${rows.length}×${rows[0].length} cells of text at ${a1(this.anchor)}.`);
  }

  // ----------------------------------------------------------------- events

  private cellFromEvent(e: Event): CellPos | undefined {
    const target = e.target as HTMLElement | null;
    const td = target?.closest?.('td[data-cell]') as HTMLElement | null;
    if (!td) return undefined;
    return { row: Number(td.dataset.row), col: Number(td.dataset.col) };
  }

  private wire(): void {
    const s = this.scroller;

    s.addEventListener('mousedown', (e) => {
      if (e.button !== 0 || e.target === this.editor) return;
      const target = e.target as HTMLElement;
      const colHead = target.closest('th.pv-colhead') as HTMLElement | null;
      const rowHead = target.closest('th.pv-rowhead') as HTMLElement | null;
      if (this.editing) this.commitEdit();
      if (colHead) {
        const c = Number(colHead.dataset.col);
        this.select({ row: 0, col: c });
        this.select({ row: this.rows - 1, col: c }, true);
      } else if (rowHead) {
        const r = Number(rowHead.dataset.row);
        this.select({ row: r, col: 0 });
        this.select({ row: r, col: this.cols - 1 }, true);
      } else if (target.closest('th.pv-corner')) {
        this.select({ row: 0, col: 0 });
        this.select({ row: this.rows - 1, col: this.cols - 1 }, true);
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
    this.doc.addEventListener('mouseup', () => {
      this.dragging = false;
    });
    s.addEventListener('dblclick', (e) => {
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

  /** Goes to an address typed in the name box (`B7`, `A1:C3`, `Sheet2!B2`). */
  private goTo(text: string): void {
    let target = text.trim();
    const bang = target.lastIndexOf('!');
    if (bang > 0) {
      const sheet = target.slice(0, bang).replace(/^'|'$/g, '');
      if (!this.workbook.sheetNames().includes(sheet)) {
        this.say(`There is no sheet named ${sheet}.`);
        return;
      }
      if (sheet !== this.sheet) this.showSheet(sheet);
      target = target.slice(bang + 1);
    }
    const rect = parseRectA1(target);
    if (!rect || rect.bottom >= this.rows || rect.right >= this.cols) {
      this.say(`“${text}” is not a cell address on this sheet (A1 to ${a1({ row: this.rows - 1, col: this.cols - 1 })}).`);
      return;
    }
    this.select({ row: rect.top, col: rect.left });
    if (rect.bottom !== rect.top || rect.right !== rect.left) this.select({ row: rect.bottom, col: rect.right }, true);
    this.focus();
  }

  private undo(): void {
    const label = this.workbook.undo();
    this.say(label ? `Undid: ${label}.` : 'Nothing to undo.');
  }

  private redo(): void {
    const label = this.workbook.redo();
    this.say(label ? `Redid: ${label}.` : 'Nothing to redo.');
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
        this.select({ row: 0, col: 0 });
        this.select({ row: this.rows - 1, col: this.cols - 1 }, true);
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
        this.select({ row: 0, col: 0 });
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
      case 'Delete':
        e.preventDefault();
        this.workbook.clear(this.sheet, this.selection);
        return;
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
        this.move(key === 'PageDown' ? 20 : -20, 0, e.shiftKey);
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
