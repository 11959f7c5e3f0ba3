/**
 * Opening and saving the preview workbook as an .xlsx file, through ExcelJS (loaded only
 * when a file is opened or saved, as a chunk of its own).
 *
 * Saved: every sheet with its values and formulas (PHZ formulas as written; they calculate
 * in Excel once the add-in is loaded) with the results the preview computed as cached
 * values, spilled results as array formulas over their area, sheet names, column widths,
 * names scoped to a sheet, and the look of each cell role (inputs amber, titles large,
 * headings ruled…). Opening reads the same back: a role comes back from its look, so a
 * file saved here opens with the same roles, and a file from elsewhere opens with values,
 * formulas, widths and names. A file that cannot be read changes nothing and says why.
 */
import type * as ExcelJSTypes from 'exceljs';
import type { RawCellContent } from 'hyperformula';
import { workbookMessages as M } from '../core/messages';
import { a1, columnName, parseRectA1 } from './address';
import type { SerializedName } from './engine';
import { isDisplayError, MAX_COLUMNS, MAX_ROWS } from './values';
import type { DisplayValue } from './values';
import type { CellStyle, SheetDocument, WorkbookDocument } from './workbook';

type ExcelJSModule = typeof ExcelJSTypes;

/** Files larger than this are not opened (the page would hold several copies while reading). */
export const MAX_FILE_MB = 50;

let loaded: Promise<ExcelJSModule> | undefined;

/** ExcelJS's browser build (no polyfills, nothing evaluated at run time), loaded once on first use. */
export function loadExcelJs(): Promise<ExcelJSModule> {
  loaded ??= import(/* webpackChunkName: "preview-xlsx" */ 'exceljs/dist/exceljs.bare.min.js').then(
    (m: { default?: ExcelJSModule } & ExcelJSModule) => m.default ?? m,
  );
  return loaded;
}

/** How each role looks in the file; the look is read back as the role (each is distinct). */
const LOOKS: Record<CellStyle, { font?: Partial<ExcelJSTypes.Font>; fill?: string; ruled?: boolean }> = {
  title: { font: { bold: true, size: 15 } },
  subtitle: { font: { size: 11, color: { argb: 'FF5B6670' } } },
  note: { font: { italic: true, color: { argb: 'FF5B6670' } } },
  heading: { font: { bold: true }, ruled: true },
  header: { font: { bold: true }, fill: 'FFEEF1EE' },
  input: { font: { color: { argb: 'FF5A3B00' } }, fill: 'FFFBF0D4' },
  scenario: { font: { italic: true, color: { argb: 'FF5A3B00' } }, fill: 'FFFBF0D4' },
  verdict: { font: { bold: true, color: { argb: 'FF1B6B3A' } } },
  caution: { font: { color: { argb: 'FF7A4A00' } } },
  chart: { font: { italic: true }, fill: 'FFF6F7FB' },
  formulaText: { font: { name: 'Consolas', color: { argb: 'FF5B6670' } } },
  symbol: { font: { bold: true } },
  label: { font: { color: { argb: 'FF1D2733' } } },
};

/** A look as one comparable text: bold, italic, size, colour, font name, fill, rule below. */
function lookKey(font: Partial<ExcelJSTypes.Font> | undefined, fill: string | undefined, ruled: boolean): string {
  return [font?.bold ? 'b' : '', font?.italic ? 'i' : '', font?.size && font.size !== 11 ? `s${font.size}` : '', font?.color?.argb ?? '', font?.name === 'Consolas' ? 'mono' : '', fill ?? '', ruled ? 'r' : ''].join('|');
}

const ROLE_OF_LOOK = new Map<string, CellStyle>(
  (Object.entries(LOOKS) as [CellStyle, (typeof LOOKS)[CellStyle]][]).map(([style, look]) => [lookKey(look.font, look.fill, look.ruled === true), style]),
);

/** The characters of a column width in the file for a width in pixels (Excel's default font, common practice). */
export function pixelsToFileWidth(px: number): number {
  return Math.round(((px - 5) / 7) * 100) / 100;
}

export function fileWidthToChars(width: number): number {
  // the preview's own character width (grid.ts: 16 px padding + 7.9 px a character)
  return Math.max(1, Math.round((((width * 7 + 5) - 16) / 7.9) * 10) / 10);
}

/** Excel's rules for a sheet name: 31 characters, none of : \ / ? * [ ], not blank. */
function fileSheetName(name: string, taken: Set<string>): string {
  let base = name.replace(/[:\\/?*[\]]/g, '_').replace(/^'+|'+$/g, '').slice(0, 31).trim() || 'Sheet';
  let candidate = base;
  for (let i = 2; taken.has(candidate.toLowerCase()); i++) {
    const suffix = ` (${i})`;
    base = base.slice(0, 31 - suffix.length);
    candidate = `${base}${suffix}`;
  }
  taken.add(candidate.toLowerCase());
  return candidate;
}

/** What a formula cell showed, as a cached result in the file. */
function cachedResult(v: DisplayValue): ExcelJSTypes.CellFormulaValue['result'] {
  if (v === null || v === undefined) return undefined;
  if (isDisplayError(v)) return { error: v.error as ExcelJSTypes.CellErrorValue['error'] };
  return v;
}

export interface SaveInput {
  readonly doc: WorkbookDocument;
  /** What a cell shows (the engine's value), for cached results. */
  readonly valueAt: (sheet: string, row: number, col: number) => DisplayValue;
  /** The block a formula fills, when it spills (height × width), else 1 × 1. */
  readonly spillAt: (sheet: string, row: number, col: number) => { height: number; width: number };
  /** Column widths in pixels as drawn, from column A. */
  readonly widthsPx: (sheet: string, count: number) => number[];
}

/**
 * What writing the file needs, as plain data (it goes to the file worker as it is): the
 * document and, per sheet in its order, what its formula cells and the cells of their spills
 * show, keyed `row,col`, the blocks formulas fill when larger than one cell, `[height, width]`,
 * and the column widths in pixels.
 */
export interface SaveData {
  readonly doc: WorkbookDocument;
  readonly sheets: ReadonlyArray<{
    readonly shown: Map<string, DisplayValue>;
    readonly spills: Map<string, readonly [number, number]>;
    readonly widthsPx: readonly number[];
  }>;
}

/** Reads from the workbook what the file needs besides the document (in the page, with the engine). */
export function prepareSave(input: SaveInput): SaveData {
  const sheets = input.doc.sheets.map((sheet) => {
    const shown = new Map<string, DisplayValue>();
    const spills = new Map<string, readonly [number, number]>();
    const width = sheet.rows.reduce((w, r) => Math.max(w, r.length), 0);
    sheet.rows.forEach((row, r) => {
      row.forEach((raw, c) => {
        if (typeof raw !== 'string' || !raw.startsWith('=')) return;
        shown.set(`${r},${c}`, input.valueAt(sheet.name, r, c));
        const size = input.spillAt(sheet.name, r, c);
        if (size.height === 1 && size.width === 1) return;
        spills.set(`${r},${c}`, [size.height, size.width]);
        for (let dr = 0; dr < size.height; dr++) {
          for (let dc = 0; dc < size.width; dc++) if (dr > 0 || dc > 0) shown.set(`${r + dr},${c + dc}`, input.valueAt(sheet.name, r + dr, c + dc));
        }
      });
    });
    return { shown, spills, widthsPx: input.widthsPx(sheet.name, Math.max(width, sheet.widths.length)) };
  });
  return { doc: input.doc, sheets };
}

/** Names scoped to a sheet, as the file keeps them (ExcelJS's own name list has no scope). */
interface FileName {
  readonly name: string;
  readonly ranges: string[];
  readonly localSheetId?: number;
}

/**
 * ExcelJS keeps a workbook's names without their sheet scope (its name list is keyed by name
 * alone), though its file reader and writer carry the scope (`localSheetId`). This hooks
 * the workbook's `model`, which the writer reads and the reader sets, to give the writer
 * `write` and to hand the names read, scopes included, to `read`.
 */
function scopedNames(wb: ExcelJSTypes.Workbook, write?: FileName[], read?: (names: FileName[]) => void): void {
  let proto: object | null = Object.getPrototypeOf(wb) as object | null;
  let descriptor: PropertyDescriptor | undefined;
  while (proto && !(descriptor = Object.getOwnPropertyDescriptor(proto, 'model'))) proto = Object.getPrototypeOf(proto) as object | null;
  if (!descriptor?.get || !descriptor.set) return;
  const { get, set } = descriptor;
  Object.defineProperty(wb, 'model', {
    configurable: true,
    get() {
      const model = get.call(wb) as { definedNames: FileName[] };
      if (write) model.definedNames = write;
      return model;
    },
    set(value: { definedNames?: FileName[] }) {
      read?.((value.definedNames ?? []).map((n) => ({ ...n, ranges: [...n.ranges] })));
      set.call(wb, value);
    },
  });
}

/** Builds the .xlsx file of a workbook document (in the page; the page itself uses the file worker, xlsx-client.ts). */
export function saveXlsx(input: SaveInput): Promise<ArrayBuffer> {
  return buildXlsx(prepareSave(input));
}

/** Builds the .xlsx file from what `prepareSave` read (in the file worker, or in the page). */
export async function buildXlsx(data: SaveData): Promise<ArrayBuffer> {
  const ExcelJS = await loadExcelJs();
  const { doc } = data;
  const taken = new Set<string>();
  const fileNames = new Map<string, string>();
  for (const s of doc.sheets) fileNames.set(s.name, fileSheetName(s.name, taken));
  const names: FileName[] = doc.names
    .filter((n) => n.scope === undefined || fileNames.has(n.scope))
    .map((n) => ({
      name: n.name,
      ranges: [n.expression.replace(/^=/, '')],
      ...(n.scope === undefined ? {} : { localSheetId: doc.sheets.findIndex((s) => s.name === n.scope) }),
    }));
  const wb = new ExcelJS.Workbook();
  scopedNames(wb, names);
  wb.creator = 'Starpoint preview';
  wb.calcProperties.fullCalcOnLoad = true;
  doc.sheets.forEach((sheet, i) => {
    const ws = wb.addWorksheet(fileNames.get(sheet.name)!);
    writeSheet(ws, sheet, data.sheets[i]);
  });
  // deflate level 1: for 40,000 rows ~0.3 s quicker than the default level 6, the file ~15 % larger
  const written = (await wb.xlsx.writeBuffer({ zip: { compression: 'DEFLATE', compressionOptions: { level: 1 } } } as never)) as ArrayBuffer | Uint8Array;
  // ExcelJS gives a Buffer (a Uint8Array) in the browser: the bytes as an ArrayBuffer of their
  // own, which the worker can hand over without a copy
  if (written instanceof ArrayBuffer) return written;
  const { buffer, byteOffset, byteLength } = written;
  return byteOffset === 0 && byteLength === buffer.byteLength && buffer instanceof ArrayBuffer ? buffer : (buffer.slice(byteOffset, byteOffset + byteLength) as ArrayBuffer);
}

function writeSheet(ws: ExcelJSTypes.Worksheet, sheet: SheetDocument, extra: SaveData['sheets'][number]): void {
  extra.widthsPx.forEach((p, c) => {
    ws.getColumn(c + 1).width = pixelsToFileWidth(p);
  });
  // one style object for every cell without a role: ExcelJS works out a cell's style once per
  // object (it keeps them in a WeakMap), where each cell's own empty object costs it a render
  const plain: Partial<ExcelJSTypes.Style> = {};
  sheet.rows.forEach((row, r) => {
    // the row's own style too (ExcelJS keeps one per row; its typings leave it out)
    if (row.length > 0) (ws.getRow(r + 1) as unknown as { style: Partial<ExcelJSTypes.Style> }).style = plain;
    row.forEach((raw, c) => {
      if (raw === null || raw === undefined || raw === '') return;
      const cell = ws.getCell(r + 1, c + 1);
      cell.style = plain;
      if (typeof raw === 'string' && raw.startsWith('=')) {
        const result = cachedResult(extra.shown.get(`${r},${c}`) ?? null);
        const size = extra.spills.get(`${r},${c}`);
        if (size) {
          const [height, width] = size;
          const ref = `${a1({ row: r, col: c })}:${a1({ row: r + height - 1, col: c + width - 1 })}`;
          cell.value = { formula: raw.slice(1), result, shareType: 'array', ref } as ExcelJSTypes.CellFormulaValue;
          for (let dr = 0; dr < height; dr++) {
            for (let dc = 0; dc < width; dc++) {
              if (dr === 0 && dc === 0) continue;
              const v = cachedResult(extra.shown.get(`${r + dr},${c + dc}`) ?? null);
              if (v !== undefined) ws.getCell(r + dr + 1, c + dc + 1).value = v as ExcelJSTypes.CellValue;
            }
          }
        } else {
          cell.value = { formula: raw.slice(1), result } as ExcelJSTypes.CellFormulaValue;
        }
      } else if (typeof raw === 'string' && raw.startsWith("'")) {
        cell.value = raw.slice(1);
      } else {
        cell.value = raw as ExcelJSTypes.CellValue;
      }
    });
  });
  const roleStyles = new Map<CellStyle, Partial<ExcelJSTypes.Style>>();
  for (const [r, c, style] of sheet.styles) {
    let shared = roleStyles.get(style);
    if (!shared) {
      const look = LOOKS[style];
      shared = {
        ...(look.font ? { font: { ...look.font } } : {}),
        ...(look.fill ? { fill: { type: 'pattern', pattern: 'solid', fgColor: { argb: look.fill } } } : {}),
        ...(look.ruled ? { border: { bottom: { style: 'thin', color: { argb: 'FF9AA3AB' } } } } : {}),
      };
      roleStyles.set(style, shared);
    }
    ws.getCell(r + 1, c + 1).style = shared;
  }
}

/** The error a file that cannot be opened gives: its message says why; nothing was changed. */
export class FileError extends Error {}

/** Reads an .xlsx file into a workbook document; throws `FileError` with the reason. */
export async function readXlsx(data: ArrayBuffer, fileName: string): Promise<{ doc: WorkbookDocument; cells: number; skipped: number }> {
  if (data.byteLength > MAX_FILE_MB * 1024 * 1024) throw new FileError(M.fileTooLarge(fileName, data.byteLength / 1024 / 1024, MAX_FILE_MB));
  const head = new Uint8Array(data, 0, Math.min(4, data.byteLength));
  if (head.length < 4 || head[0] !== 0x50 || head[1] !== 0x4b || head[2] !== 0x03 || head[3] !== 0x04) throw new FileError(M.fileNotXlsx(fileName));
  const ExcelJS = await loadExcelJs();
  let scoped: FileName[] = [];
  const wb = new ExcelJS.Workbook();
  scopedNames(wb, undefined, (read) => (scoped = read));
  try {
    await wb.xlsx.load(data);
  } catch (e) {
    throw new FileError(M.fileUnreadable(fileName, e instanceof Error ? e.message : String(e)));
  }
  const worksheets = wb.worksheets;
  if (worksheets.length === 0) throw new FileError(M.fileNoSheets(fileName));
  let cells = 0;
  let skipped = 0;
  const sheets: SheetDocument[] = [];
  for (const ws of worksheets) {
    const read = readSheet(ws, fileName);
    cells += read.cells;
    skipped += read.skipped;
    sheets.push(read.sheet);
  }
  const names: SerializedName[] = [];
  for (const n of scoped) {
    if (n.name.startsWith('_xlnm.') || n.ranges.length === 0) continue;
    const scope = n.localSheetId === undefined ? undefined : worksheets[n.localSheetId]?.name;
    names.push({ name: n.name, expression: `=${n.ranges.join(',')}`, ...(scope === undefined ? {} : { scope }) });
  }
  return { doc: { format: 'starpoint-preview-workbook', version: 1, sheets, names, charts: [] }, cells, skipped };
}

/** Excel's serial day number of a date (the 1900 system; dates come from ExcelJS as UTC). */
function serialDay(d: Date): number {
  return (d.getTime() - Date.UTC(1899, 11, 30)) / 86_400_000;
}

function readSheet(ws: ExcelJSTypes.Worksheet, fileName: string): { sheet: SheetDocument; cells: number; skipped: number } {
  if (ws.rowCount > MAX_ROWS || ws.columnCount > MAX_COLUMNS) throw new FileError(M.fileTooBig(fileName, ws.name, ws.rowCount, ws.columnCount, MAX_ROWS, MAX_COLUMNS));
  const rows: RawCellContent[][] = [];
  const styles: [number, number, CellStyle][] = [];
  const insideArrays: { top: number; left: number; bottom: number; right: number }[] = [];
  let cells = 0;
  let skipped = 0;
  ws.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    const r = rowNumber - 1;
    // empty cells too: a heading rule or an input fill may sit on an empty cell
    row.eachCell({ includeEmpty: true }, (cell, colNumber) => {
      const c = colNumber - 1;
      const style = ROLE_OF_LOOK.get(lookKey(cell.font, (cell.fill as ExcelJSTypes.FillPattern | undefined)?.fgColor?.argb, cell.border?.bottom?.style === 'thin'));
      if (style) styles.push([r, c, style]);
      if (cell.note) skipped++;
      const content = cellContent(cell);
      if (content === null) return;
      if (typeof content === 'object' && 'array' in content) {
        const ref = parseRectA1(content.array);
        if (ref) insideArrays.push(ref);
        put(rows, r, c, content.formula);
      } else put(rows, r, c, content);
      cells++;
    });
  });
  // the cells of an array formula's area hold its cached values: the formula fills them again
  for (const area of insideArrays) {
    for (let r = area.top; r <= area.bottom; r++) {
      for (let c = area.left; c <= area.right; c++) {
        if ((r !== area.top || c !== area.left) && rows[r]?.[c] !== undefined) rows[r][c] = null;
      }
    }
  }
  skipped += (ws.getImages?.() ?? []).length;
  const widths: number[] = [];
  for (let c = 1; c <= Math.min(ws.columnCount, 1024); c++) {
    const w = ws.getColumn(c).width;
    widths.push(w ? fileWidthToChars(w) : 0);
  }
  while (widths.length > 0 && widths[widths.length - 1] === 0) widths.pop();
  return { sheet: { name: ws.name, rows, styles, widths }, cells, skipped };
}

function put(rows: RawCellContent[][], r: number, c: number, v: RawCellContent): void {
  while (rows.length <= r) rows.push([]);
  const row = rows[r];
  while (row.length < c) row.push(null);
  row[c] = v;
}

/** Excel's prefixes for functions newer than the file format (`_xlfn.CONCAT`). */
function plainFormula(formula: string): string {
  return `=${formula.replace(/_xlfn\.|_xlws\./g, '')}`;
}

function cellContent(cell: ExcelJSTypes.Cell): RawCellContent | { formula: string; array: string } {
  const v = cell.value;
  if (v === null || v === undefined) return null;
  if (typeof v === 'number' || typeof v === 'boolean') return v;
  if (typeof v === 'string') return v.startsWith('=') ? `'${v}` : v;
  if (v instanceof Date) return serialDay(v);
  if (typeof v === 'object') {
    const o = v as unknown as Record<string, unknown>;
    if ('formula' in o || 'sharedFormula' in o) {
      const formula = cell.formula;
      if (!formula) return null;
      if (o.shareType === 'array' && typeof o.ref === 'string') return { formula: plainFormula(formula), array: o.ref };
      return plainFormula(formula);
    }
    if (Array.isArray(o.richText)) return (o.richText as { text: string }[]).map((t) => t.text).join('');
    if (typeof o.text === 'string') return o.text;
    if (typeof o.error === 'string') return o.error;
  }
  return String(v);
}

/** Column letters for messages and tests. */
export { columnName };
