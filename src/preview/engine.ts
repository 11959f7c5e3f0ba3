/**
 * The preview's formula engine: HyperFormula with the whole PHZ registry registered
 * through the generic adapter (`./adapter`). Used by the preview workbook in the
 * browser and by node tests (`evaluateFormula`).
 */
import { DetailedCellError, HyperFormula } from 'hyperformula';
import type { CellValue, RawCellContent, SimpleCellAddress } from 'hyperformula';
import { clipMiddle, workbookMessages as M } from '../core/messages';
import { functions as registryFunctions, specs as registrySpecs } from '../functions';
import { registerRegistry, spillingFormulas, takePendingResizes } from './adapter';
import { checkFormula, hasDoubledQuote } from './formula-guard';
import { indexDependencyGraph } from './graph-index';
import { MAX_COLUMNS, MAX_ROWS } from './values';
import type { DisplayValue } from './values';
import { quickenParsing } from './parse-cache';
import type { Registry } from './adapter';

export { NAMESPACE, functionId, createPhzPlugin } from './adapter';
export type { Registry } from './adapter';

/** The project registry, as the adapter takes it. */
export const defaultRegistry: Registry = { specs: registrySpecs, functions: registryFunctions };

/** HyperFormula's licence for GPL v3 use (the preview is a development tool). */
export const LICENSE_KEY = 'gpl-v3';

export { isDisplayError, MAX_COLUMNS, MAX_ROWS } from './values';
export type { DisplayError, DisplayValue } from './values';

/** Cells a written block needs before building the engine again is considered (`PhzEngine.setContents`). */
export const BULK_CELLS = 10_000;

/** Longest message a cell shows (tooltip, status line); longer ones are cut in the middle. */
export const MESSAGE_LIMIT = 300;

/**
 * The engine rounds a value it hands out to `precisionRounding` places after its leading
 * digit by multiplying with 10^(14 − exponent), which overflows for numbers below about
 * 1e-294: 1e-300 came out as NaN. The rounding is patched (once, on its class) to hand such
 * a number out unrounded; `toDisplay` then keeps 15 figures of it.
 */
function keepTinyNumbers(hf: HyperFormula): void {
  const exporter = (hf as unknown as { _exporter?: object })._exporter;
  const proto = exporter ? (Object.getPrototypeOf(exporter) as { cellValueRounding?: (v: number) => number }) : undefined;
  const round = proto?.cellValueRounding;
  if (!proto || typeof round !== 'function') return;
  proto.cellValueRounding = function (this: unknown, value: number): number {
    const rounded = round.call(this, value);
    return Number.isFinite(rounded) ? rounded : value;
  };
}

/**
 * Engine value → display value. Numbers keep 15 significant figures, as Excel keeps them;
 * a value that is not finite becomes an error.
 */
export function toDisplay(v: CellValue): DisplayValue {
  if (v instanceof DetailedCellError) return { error: v.value, message: clipMiddle(v.message ?? '', MESSAGE_LIMIT) };
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) return { error: '#NUM!', message: M.notFiniteValue };
    return v === 0 ? 0 : Number(v.toPrecision(15));
  }
  return v as DisplayValue;
}

let graphPatched = false;

const parseDateTimeDefault = HyperFormula.defaultConfig.parseDateTime;

/** The text `quickDateTime` looked at last, and whether it may be a date or time. */
let lastDateText = '';
let lastMayBeDate = true;

/**
 * The engine tries its date and time formats (DD/MM/YYYY, hh:mm …) on every text it is
 * given, each format with a call of its own; text with other characters than digits,
 * separators and AM/PM (every phasor: `230∠-120`, `5+j2`) cannot be one, so it is turned
 * away at once, and the verdict on the text is kept for the formats that follow. Saves a few
 * percent of a large paste of phasor text.
 */
function quickDateTime(...args: Parameters<typeof parseDateTimeDefault>): ReturnType<typeof parseDateTimeDefault> {
  const text = args[0];
  if (text !== lastDateText) {
    lastDateText = text;
    lastMayBeDate = /^[\d\s/.:\-apmAPM]*$/.test(text);
  }
  return lastMayBeDate ? parseDateTimeDefault(...args) : undefined;
}

/** Formula texts the engine failed on after they passed the checks (bounded). */
const failedFormulas = new Set<string>();

/** Why a formula text is kept as text instead of being given to the engine, or undefined. */
function refusal(text: string): string | undefined {
  if (failedFormulas.has(text)) return M.formulaTooComplex;
  const check = checkFormula(text);
  return check.refused;
}

/**
 * What the engine is given for what a person typed: a formula over the limits is kept as
 * text (with the engine's leading apostrophe), so the cell keeps it and shows why; `1E-3`
 * is written `1e-3`.
 */
export function prepareContent(raw: RawCellContent): RawCellContent {
  if (typeof raw !== 'string' || raw.charCodeAt(0) !== 61 /* = */ || raw.length < 2) return raw;
  if (failedFormulas.has(raw)) return `'${raw}`;
  const check = checkFormula(raw);
  return check.refused !== undefined ? `'${raw}` : check.formula;
}

function prepareRows(rows: RawCellContent[][]): RawCellContent[][] {
  return rows.map((row) => row.map(prepareContent));
}

function isStackOverflow(e: unknown): boolean {
  return e instanceof RangeError && /call stack/i.test(e.message);
}

/**
 * The engine knows TRUE and FALSE only as functions (`TRUE()`); spreadsheet users
 * write them bare (`=PHZ.COMPLEXPOWER(8000, 0.8, TRUE)`), so both names are defined.
 */
const LOGICAL_NAMES = [
  { name: 'TRUE', expression: '=TRUE()' },
  { name: 'FALSE', expression: '=FALSE()' },
];

/** A name as the engine holds it: `expression` is a formula (`='Sheet 1'!$B$5`); `scope` a sheet, or none for the workbook. */
export interface SerializedName {
  readonly name: string;
  readonly expression: string;
  readonly scope?: string;
}

export interface EngineOptions {
  readonly registry?: Registry;
  /** Initial sheets by name, rows of raw contents (numbers, text, `=formulas`). */
  readonly sheets?: Record<string, RawCellContent[][]>;
}

/**
 * A workbook engine. Every change goes through `change`, which lets the engine settle
 * spill areas whose size followed a change of inputs.
 */
export class PhzEngine {
  /** The engine itself (none yet for an engine made empty and not used: see `hf`). */
  private current: HyperFormula | undefined;
  private readonly config: Record<string, unknown>;

  constructor(options: EngineOptions = {}) {
    registerRegistry(options.registry ?? defaultRegistry);
    // Excel keeps 15 significant figures of a number; the engine's default hands out 11
    // (precisionRounding 10), which would make PHZ.REAL(…, 15) look like 11 figures. Its
    // rounding also snaps sums that cancel to 0, as Excel does (smartRounding).
    const config = {
      licenseKey: LICENSE_KEY,
      undoLimit: 0,
      useArrayArithmetic: true,
      precisionRounding: 14,
      maxRows: MAX_ROWS,
      maxColumns: MAX_COLUMNS,
      parseDateTime: quickDateTime,
    };
    this.config = config;
    if (!graphPatched) {
      // the patch goes on the graph's class, so engines built from sheets get it from the start
      const probe = HyperFormula.buildEmpty({ licenseKey: LICENSE_KEY });
      indexDependencyGraph(probe);
      quickenParsing(probe);
      keepTinyNumbers(probe);
      probe.destroy();
      graphPatched = true;
    }
    const sheets = Object.fromEntries(Object.entries(options.sheets ?? {}).map(([name, rows]) => [name, prepareRows(rows)]));
    if (Object.keys(sheets).length > 0) {
      this.current = HyperFormula.buildFromSheets(sheets, config, LOGICAL_NAMES);
      this.settle();
    }
  }

  /**
   * The engine itself; `rebuild` puts a new one in its place. An engine made empty builds
   * its empty engine when first used, so a page that loads a kept workbook into it at once
   * (main.ts) does not build one to throw away.
   */
  get hf(): HyperFormula {
    return (this.current ??= HyperFormula.buildEmpty(this.config, LOGICAL_NAMES));
  }

  /**
   * Replaces everything the engine holds by `sheets` (in this order) and `names`, built in
   * one go (much faster than writing the cells into the sheets one block at a time).
   */
  rebuild(sheets: ReadonlyArray<{ readonly name: string; readonly rows: RawCellContent[][] }>, names: readonly SerializedName[]): void {
    const order = sheets.map((s) => s.name);
    const named = [
      ...LOGICAL_NAMES,
      ...names.map((n) => ({ name: n.name, expression: n.expression, ...(n.scope === undefined ? {} : { scope: order.indexOf(n.scope) }) })),
    ];
    const data: Record<string, RawCellContent[][]> = {};
    for (const s of sheets) data[s.name] = prepareRows(s.rows.length > 0 ? s.rows : [[]]);
    let next: HyperFormula | undefined;
    try {
      next = HyperFormula.buildFromSheets(data, this.config, named);
      // object keys that look like numbers come first in JS: then the order is built again
      if (next.getSheetNames().join('\u0000') !== order.join('\u0000')) {
        next.destroy();
        next = undefined;
      }
    } catch (e) {
      next?.destroy();
      next = undefined;
      if (!isStackOverflow(e)) throw e;
    }
    if (!next) {
      next = HyperFormula.buildEmpty(this.config, LOGICAL_NAMES);
      for (const name of order) next.addSheet(name);
      const old = this.current;
      this.current = next;
      old?.destroy();
      for (const n of names) this.hf.addNamedExpression(n.name, n.expression, n.scope === undefined ? undefined : this.hf.getSheetId(n.scope));
      for (const s of sheets) if (s.rows.length > 0) this.writeCells({ sheet: this.hf.getSheetId(s.name) ?? 0, row: 0, col: 0 }, s.rows);
      return;
    }
    const old = this.current;
    this.current = next;
    old?.destroy();
    this.settle();
  }

  /** Names the engine holds (the workbook's own TRUE and FALSE left out). */
  names(): SerializedName[] {
    const out: SerializedName[] = [];
    for (const n of this.hf.getAllNamedExpressionsSerialized()) {
      if (n.scope === undefined && LOGICAL_NAMES.some((l) => l.name === n.name)) continue;
      const scope = n.scope === undefined ? undefined : this.hf.getSheetName(n.scope);
      out.push({ name: n.name, expression: String(n.expression), ...(scope === undefined ? {} : { scope }) });
    }
    return out;
  }

  /**
   * Re-enters formulas whose result no longer fits the area the engine reserved for it
   * (the engine fixes a spill size when a formula is entered). Bounded, because a
   * re-entered formula can change the inputs of another.
   */
  settle(): void {
    this.reviveBlockedSpills();
    for (let round = 0; round < 8; round++) {
      const pending = takePendingResizes(this.hf);
      if (pending.length === 0) return;
      this.reenter(pending);
    }
    takePendingResizes(this.hf);
  }

  private reenter(addresses: readonly SimpleCellAddress[]): void {
    this.hf.batch(() => {
      for (const address of addresses) {
        const formula = this.hf.getCellFormula(address);
        if (formula !== undefined) this.hf.setCellContents(address, [[formula]]);
      }
    });
  }

  /**
   * A spill blocked by a cell shows #SPILL!, and the engine does not look again when
   * that cell is emptied; so every change re-enters the blocked PHZ formulas whose
   * area has become free.
   */
  private reviveBlockedSpills(): void {
    const blocked = spillingFormulas(this.hf).filter((at) => {
      if (!this.hf.doesSheetExist(this.hf.getSheetName(at.sheet) ?? '')) return false;
      const v = this.hf.getCellValue(at);
      return v instanceof DetailedCellError && v.value === '#SPILL!' && this.hf.getCellFormula(at) !== undefined;
    });
    if (blocked.length > 0) this.reenter(blocked);
  }

  /** Runs `fn` as one batch of engine operations, then settles spills. */
  change<T>(fn: (hf: HyperFormula) => T): T {
    let result!: T;
    this.hf.batch(() => {
      result = fn(this.hf);
    });
    this.settle();
    return result;
  }

  /**
   * Sets a block of raw contents with its top-left at `at` (formulas checked first, see
   * `prepareContent`). Should the engine still fail on a formula (its call stack), the
   * block is written again with the formulas that fail kept as text, so nothing typed is
   * lost and the page goes on.
   *
   * A large block written into a workbook that holds little else (a paste of 40,000 rows,
   * its undo) is written by building the engine again from everything it holds with the
   * block in place: the engine's build from sheets costs about half of what writing the
   * same cells one by one does (a paste of 40,000 rows of PHZ.DIV: ~0.75 s against ~1.1 s in
   * node). The engine object (`hf`) is then a new one, as after `rebuild`: never keep it
   * across a write.
   */
  setContents(at: SimpleCellAddress, contents: RawCellContent[][]): void {
    const sheets = this.sheetsWithBlock(at, contents);
    if (sheets) this.rebuild(sheets, this.names());
    else this.writeCells(at, contents);
  }

  /**
   * Everything the engine holds with `contents` written at `at`, when building that is the
   * quicker way to write the block; otherwise `undefined`. It is when the block has at least
   * `BULK_CELLS` cells and the rest of the workbook (outside the block) holds at most half as
   * many filled cells. The rest is read only when its used area is at most four times the
   * block, so a small block in a large workbook costs nothing here.
   */
  private sheetsWithBlock(at: SimpleCellAddress, contents: RawCellContent[][]): { name: string; rows: RawCellContent[][] }[] | undefined {
    const height = contents.length;
    const width = contents.reduce((w, row) => Math.max(w, row.length), 0);
    const cells = height * width;
    if (cells < BULK_CELLS) return undefined;
    const inBlock = (id: number, r: number, c: number) => id === at.sheet && r >= at.row && r < at.row + height && c >= at.col && c < at.col + width;
    const sheets = this.hf.getSheetNames().map((name) => ({ name, id: this.hf.getSheetId(name) ?? -1 }));
    let area = 0;
    for (const { id } of sheets) {
      const dims = this.hf.getSheetDimensions(id);
      area += dims.width * dims.height;
    }
    if (area > 4 * cells + cells) return undefined;
    let filled = 0;
    const out: { name: string; rows: RawCellContent[][] }[] = [];
    for (const { name, id } of sheets) {
      const dims = this.hf.getSheetDimensions(id);
      const rows: RawCellContent[][] = [];
      for (let r = 0; r < dims.height; r++) {
        const row = new Array<RawCellContent>(dims.width).fill(null);
        for (let c = 0; c < dims.width; c++) {
          if (inBlock(id, r, c)) continue;
          const v = this.rawContent({ sheet: id, row: r, col: c });
          if (v === null || v === '') continue;
          row[c] = v;
          if (++filled * 2 > cells) return undefined;
        }
        rows.push(row);
      }
      if (id === at.sheet) {
        for (let r = 0; r < height; r++) {
          while (rows.length <= at.row + r) rows.push([]);
          const target = rows[at.row + r];
          while (target.length < at.col) target.push(null);
          const source = contents[r];
          for (let c = 0; c < width; c++) target[at.col + c] = source[c] ?? null;
        }
      }
      out.push({ name, rows });
    }
    return out;
  }

  /** Writes the cells into the engine as it is (see `setContents`). */
  private writeCells(at: SimpleCellAddress, contents: RawCellContent[][]): void {
    const prepared = prepareRows(contents);
    try {
      this.change((hf) => hf.setCellContents(at, prepared));
    } catch (e) {
      if (!isStackOverflow(e)) throw e;
      this.writeAvoidingFailures(at, prepared);
    }
  }

  private writeAvoidingFailures(at: SimpleCellAddress, rows: RawCellContent[][]): void {
    const safe = rows.map((row) => row.map((v) => (typeof v === 'string' && v.startsWith('=') ? null : v)));
    this.change((hf) => hf.setCellContents(at, safe));
    rows.forEach((row, r) =>
      row.forEach((v, c) => {
        if (typeof v !== 'string' || !v.startsWith('=')) return;
        const cell = { sheet: at.sheet, row: at.row + r, col: at.col + c };
        try {
          this.change((hf) => hf.setCellContents(cell, [[v]]));
        } catch (e) {
          if (!isStackOverflow(e)) throw e;
          if (failedFormulas.size > 1000) failedFormulas.clear();
          failedFormulas.add(v);
          this.change((hf) => hf.setCellContents(cell, [[`'${v}`]]));
        }
      }),
    );
  }

  /** What the cell shows. */
  display(at: SimpleCellAddress): DisplayValue {
    const v = this.hf.getCellValue(at);
    if (typeof v === 'string') {
      if (v.charCodeAt(0) === 61 /* = */) {
        const why = refusal(v);
        if (why !== undefined && this.hf.getCellFormula(at) === undefined) return { error: '#ERROR!', message: why };
      }
      return v;
    }
    if (v instanceof DetailedCellError && v.value === '#ERROR!') {
      const formula = this.hf.getCellFormula(at);
      if (formula !== undefined && hasDoubledQuote(formula)) return { error: v.value, message: M.doubledQuote };
      if (formula !== undefined && /^Parsing error/i.test(v.message ?? '')) return { error: v.value, message: M.unreadable(v.message ?? '') };
    }
    return toDisplay(v);
  }

  /**
   * What a person typed into the cell: the formula, or the raw value; `null` for an
   * empty cell and for cells that only show part of a spilled result.
   */
  rawContent(at: SimpleCellAddress): RawCellContent {
    const formula = this.hf.getCellFormula(at);
    if (formula !== undefined) return formula;
    if (this.hf.isCellPartOfArray(at)) return null;
    const raw = this.hf.getCellSerialized(at);
    // a formula kept as text (see `prepareContent`) is given back as typed
    if (typeof raw === 'string' && raw.startsWith("'=") && refusal(raw.slice(1)) !== undefined) return raw.slice(1);
    return raw === undefined ? null : raw;
  }

  /** The engine's vertex for a cell (internal; used only for spill geometry). */
  private vertexAt(at: SimpleCellAddress): { width?: number; height?: number; cellAddress?: SimpleCellAddress } | undefined {
    const graph = (this.hf as unknown as { dependencyGraph: { getCell(a: SimpleCellAddress): unknown } }).dependencyGraph;
    return graph.getCell(at) as { width?: number; height?: number; cellAddress?: SimpleCellAddress } | undefined;
  }

  /** The block a formula at `at` fills (1×1 for a scalar result). */
  spillSize(at: SimpleCellAddress): { width: number; height: number } {
    // asked first: most formulas fill one cell, and reading a formula writes its text again
    if (!this.hf.isCellPartOfArray(at) || this.hf.getCellFormula(at) === undefined) return { width: 1, height: 1 };
    const vertex = this.vertexAt(at);
    return { width: vertex?.width ?? 1, height: vertex?.height ?? 1 };
  }

  /**
   * The anchor of the spill `at` belongs to, when `at` shows part of another cell's
   * result; `undefined` otherwise.
   */
  spillAnchor(at: SimpleCellAddress): SimpleCellAddress | undefined {
    if (!this.hf.isCellPartOfArray(at) || this.hf.getCellFormula(at) !== undefined) return undefined;
    const a = this.vertexAt(at)?.cellAddress;
    return a ? { sheet: a.sheet, row: a.row, col: a.col } : undefined;
  }
}

/**
 * Evaluates one formula as a cell of a workbook would show it, spill included.
 *
 * @param formula A formula starting with `=`, e.g. `=PHZ.DIV("230∠-120","10∠30")`.
 * @param sheetData Optional rows of raw contents put at A1 of the same sheet, so the
 *   formula can refer to them (`=PHZ.ADD(A1:A3)`).
 * @returns The cells the formula fills, as rows: values, or `{ error, message }`.
 * @example evaluateFormula('=PHZ.MAG("3+j4")') // [[5]]
 */
export function evaluateFormula(formula: string, sheetData: RawCellContent[][] = [], registry: Registry = defaultRegistry): DisplayValue[][] {
  const engine = new PhzEngine({ registry, sheets: { Sheet1: sheetData.length > 0 ? sheetData : [[]] } });
  const sheet = engine.hf.getSheetId('Sheet1') ?? 0;
  const at = { sheet, row: sheetData.length + 1, col: 0 };
  engine.setContents(at, [[formula]]);
  const { width, height } = engine.spillSize(at);
  const rows: DisplayValue[][] = [];
  for (let r = 0; r < height; r++) {
    const row: DisplayValue[] = [];
    for (let c = 0; c < width; c++) row.push(engine.display({ sheet, row: at.row + r, col: at.col + c }));
    rows.push(row);
  }
  engine.hf.destroy();
  return rows;
}
