/**
 * A quicker way into the formula engine's parse cache for formulas that differ only in
 * where they stand (a column of `=PHZ.DIV(A1,B1,$E$1)`, `=PHZ.DIV(A2,B2,$E$1)`, …).
 *
 * HyperFormula 3.5.0 caches a parsed formula by a hash of its tokens with every cell
 * reference made relative to the formula's cell, so such a column is parsed once; but to
 * find the hash it runs its full lexer over every formula. For a paste or a reload of
 * 40,000 rows that is about a sixth of the engine's work. The engine's `parse` is wrapped
 * here (once, on its class): a formula is first read by a small scanner that writes each
 * cell reference relative to the formula's cell; formulas with the same relative text get
 * the engine's own result for the first of them (its syntax tree and dependencies are
 * relative, so they hold for every cell; the engine's own cache shares them the same way).
 *
 * The scanner only answers where its reading cannot differ from the engine's lexer
 * (`LexerConfig.mjs`, `CellReferenceMatcher.mjs`): any formula holding a sheet reference, a
 * quote mark, a backslash, `#`, `?`, a character outside ASCII, a column or row range, a
 * range whose two ends are not both relative or both absolute in each direction (the
 * engine orders such ends by their place), a name with digits that is not a cell reference,
 * OFFSET or HYPERLINK (the engine treats both specially) goes to the engine as before.
 * Results with parse errors are never kept.
 *
 * The engine is pinned (package.json); test/preview/parse-cache.test.ts compares the
 * engine's results with and without the wrapper over formulas of every kind above.
 */
import type { HyperFormula } from 'hyperformula';

interface ParseResult {
  readonly ast: unknown;
  readonly errors: readonly unknown[];
  readonly hasVolatileFunction: boolean;
  readonly hasStructuralChangeFunction: boolean;
  readonly dependencies: readonly unknown[];
}
interface ParserInternals {
  parse(text: string, address: { sheet: number; row: number; col: number }): ParseResult;
  lexerConfig?: { maxColumns?: number; maxRows?: number };
}

/** Kept results per parser (one parser per engine). */
const kept = new WeakMap<object, Map<string, ParseResult>>();
const patched = new WeakSet<object>();
/** The engine's own `parse`, per wrapped class (for tests that compare the two). */
const originals = new WeakMap<object, ParserInternals['parse']>();
/** Relative texts one engine keeps at most (each a formula of another shape). */
const KEPT_SHAPES = 50_000;

const NUMBER = /^[0-9]*\.?[0-9]*[eE]?$/;
const LETTERS = /^[A-Za-z_.]+$/;

/** Characters of a name, a number or a cell reference: A–Z a–z 0–9 _ . $ (by code). */
const NAME_CHAR = new Uint8Array(128);
for (let c = 0; c < 128; c++) {
  const ch = String.fromCharCode(c);
  if (/[A-Za-z0-9_.$]/.test(ch)) NAME_CHAR[c] = 1;
}

/** True when white space and then `(` follow position `j`. */
function bracketAfterSpace(text: string, j: number): boolean {
  let k = j;
  while (k < text.length && /\s/.test(text[k])) k++;
  return k > j && text[k] === '(';
}

function isLetterCode(c: number): boolean {
  return (c >= 65 && c <= 90) || (c >= 97 && c <= 122);
}

/**
 * Reads `text[i, j)` as a cell reference (`$?` 1–3 letters `$?` a row from 1 without a
 * leading 0): its column, row (both from 0) and which are absolute; `undefined` otherwise.
 */
function readReference(text: string, i: number, j: number): { col: number; row: number; absCol: boolean; absRow: boolean } | undefined {
  let p = i;
  const absCol = text.charCodeAt(p) === 36; /* $ */
  if (absCol) p++;
  let col = 0;
  const lettersFrom = p;
  while (p < j && isLetterCode(text.charCodeAt(p))) col = col * 26 + ((text.charCodeAt(p++) | 32) - 96);
  if (p === lettersFrom || p - lettersFrom > 3) return undefined;
  const absRow = text.charCodeAt(p) === 36;
  if (absRow) p++;
  const digitsFrom = p;
  if (p >= j || text.charCodeAt(p) === 48 /* 0 */) return undefined;
  let row = 0;
  while (p < j) {
    const c = text.charCodeAt(p++);
    if (c < 48 || c > 57) return undefined;
    row = row * 10 + (c - 48);
  }
  if (p - digitsFrom > 7) return undefined;
  return { col: col - 1, row: row - 1, absCol, absRow };
}

/**
 * The formula with each cell reference written relative to (`row`, `col`), or `undefined`
 * when the engine might read the text another way than this scanner does.
 *
 * @example relativeText('=PHZ.DIV(A2,B2,$E$1)', 1, 2, 16384, 1048576) // '=PHZ.DIV(\u0001c-2r0\u0001,\u0001c-1r0\u0001,\u0001C4R0\u0001)'
 */
export function relativeText(text: string, row: number, col: number, maxColumns: number, maxRows: number): string | undefined {
  let out = '';
  let lastRefFlags = -1;
  let rangeOpen = false;
  for (let i = 0; i < text.length; ) {
    const code = text.charCodeAt(i);
    // 33 ! 35 # 39 ' 63 ? 91 [ 92 \ 93 ]
    if (code > 127 || code === 33 || code === 35 || code === 39 || code === 63 || code === 91 || code === 92 || code === 93) return undefined;
    if (code === 34 /* " */) {
      const end = text.indexOf('"', i + 1);
      if (end < 0) return undefined;
      const literal = text.slice(i, end + 1);
      // the engine reads a backslash in text as an escape (`"a\"b"` is one text)
      if (literal.includes('\\')) return undefined;
      out += literal;
      i = end + 1;
      if (rangeOpen) return undefined;
      continue;
    }
    if (NAME_CHAR[code] === 1) {
      let j = i + 1;
      while (j < text.length && NAME_CHAR[text.charCodeAt(j)] === 1) j++;
      if (text.charCodeAt(j) === 40 /* ( */) {
        const upper = text.slice(i, j).toUpperCase();
        if (upper === 'OFFSET' || upper === 'HYPERLINK' || rangeOpen) return undefined;
        out += text.slice(i, j);
        i = j;
        continue;
      }
      // a name or reference, white space, then a bracket: left to the engine
      if (bracketAfterSpace(text, j)) return undefined;
      const ref = readReference(text, i, j);
      if (ref) {
        if (ref.col >= maxColumns || ref.row >= maxRows) return undefined;
        const flags = (ref.absCol ? 1 : 0) + (ref.absRow ? 2 : 0);
        if (rangeOpen && flags !== lastRefFlags) return undefined;
        rangeOpen = false;
        lastRefFlags = flags;
        out += `\u0001${ref.absCol ? `C${ref.col}` : `c${ref.col - col}`}${ref.absRow ? `R${ref.row}` : `r${ref.row - row}`}\u0001`;
        if (text.charCodeAt(j) === 58 /* : */) {
          rangeOpen = true;
          out += ':';
          j++;
        }
      } else {
        const run = text.slice(i, j);
        if (!(NUMBER.test(run) || LETTERS.test(run)) || rangeOpen || run.toUpperCase().includes('OFFSET')) return undefined;
        out += run;
      }
      i = j;
      continue;
    }
    if (code === 58 /* : */ || rangeOpen) return undefined;
    out += text[i];
    i++;
  }
  return rangeOpen ? undefined : out;
}

/** Wraps the parser of `hf`'s engine class (once for all engines). Leaves it alone if it is not the expected shape. */
export function quickenParsing(hf: HyperFormula): void {
  const parser = (hf as unknown as { _parser?: ParserInternals })._parser;
  if (!parser || typeof parser.parse !== 'function') return;
  const proto = Object.getPrototypeOf(parser) as ParserInternals;
  if (patched.has(proto) || typeof proto.parse !== 'function') return;
  const original = proto.parse;
  proto.parse = function (this: ParserInternals, text, address) {
    const maxColumns = this.lexerConfig?.maxColumns;
    const maxRows = this.lexerConfig?.maxRows;
    if (typeof text !== 'string' || maxColumns === undefined || maxRows === undefined) return original.call(this, text, address);
    const key = relativeText(text, address.row, address.col, maxColumns, maxRows);
    if (key === undefined) return original.call(this, text, address);
    let map = kept.get(this);
    if (!map) kept.set(this, (map = new Map()));
    const hit = map.get(key);
    if (hit) return hit;
    const result = original.call(this, text, address);
    if (result.errors.length === 0) {
      if (map.size >= KEPT_SHAPES) map.clear();
      map.set(key, result);
    }
    return result;
  };
  patched.add(proto);
  originals.set(proto, original);
}

/** True once the engine's parser has the wrapper (for tests). */
export function parsingIsQuickened(hf: HyperFormula): boolean {
  const parser = (hf as unknown as { _parser?: object })._parser;
  return parser !== undefined && patched.has(Object.getPrototypeOf(parser) as object);
}

/**
 * What the engine's own `parse` (without the wrapper) gives for `text` at `address`; for
 * tests that compare the two.
 */
export function engineParse(hf: HyperFormula, text: string, address: { sheet: number; row: number; col: number }): ParseResult {
  const parser = (hf as unknown as { _parser: ParserInternals })._parser;
  const original = originals.get(Object.getPrototypeOf(parser) as object) ?? parser.parse;
  return original.call(parser, text, address);
}

/** What the engine's parser, wrapped, gives (the kept result when there is one). */
export function wrappedParse(hf: HyperFormula, text: string, address: { sheet: number; row: number; col: number }): ParseResult {
  return (hf as unknown as { _parser: ParserInternals })._parser.parse(text, address);
}
