/**
 * Argument readers: what the host passes → phasors, numbers, choices; and phasors →
 * what the host shows. Shapes, blanks, counting and broadcasting are handled here,
 * once, so each function body stays a plain computation.
 *
 * Shape rules (DESIGN §3): a range with exactly two numeric columns is read row by row
 * as (real, imaginary) pairs; every other range is read cell by cell, row by row.
 * `null`, `undefined` and `""` are blank cells.
 *
 * Cells holding Excel data types arrive as objects (cellvalues.ts): `asMatrix` and the
 * scalar readers turn numbers, text and TRUE/FALSE with properties into their plain
 * value, so every shape rule above sees them as plain cells; an entity carrying a phasor
 * is read as that phasor; errors and other objects are refused with a message naming
 * what the cell holds.
 */
import { PhzError, isPhzError } from '../core/errors';
import { readerMessages as M } from '../core/messages';
import { QUANTITY_OF, parseNumberText, parsePhasor, type ParseOptions, type Quantity, type UnitSeen, type UnitSymbol } from '../core/parse';
import { polar, polarDeg, rect, type Phasor } from '../core/phasor';
import { valueMessages } from '../core/messages/values';
import { describeObject, errorName, isEntity, phasorProperties, plainCell, plainRows } from './cellvalues';
import { formatPolar, formatRect, DEFAULT_DIGITS } from '../core/format';
import type { HostCell, HostResult } from './spec';

export interface PhasorReadOptions {
  /** `skip` (sums, lists) or `error` (default: every phasor is required). */
  readonly blanks?: 'skip' | 'error';
  /** The quantity a unit word must name, if one is given. */
  readonly expect?: Quantity;
  /** The values of one sum: every unit given must name the same quantity. */
  readonly same?: OneQuantity;
}

/**
 * Checks that the values of one sum (ADD's values, SUB's a and b) name one quantity:
 * 10 A + 5 V has no meaning. A value without a unit fits any quantity, and W, var and VA
 * are all power (40 kW + 30 kvar is the complex power 40 + j30 kVA). One per call.
 */
export class OneQuantity {
  /** The parser writes each value's unit here. */
  readonly seen: UnitSeen = { unit: null };
  private first: { quantity: Quantity; at: string; text: string } | undefined;

  /** Parser options that report the unit here (made once per argument, not per cell). */
  parseOptions(expect: Quantity | undefined): ParseOptions {
    return expect ? { expect, seen: this.seen } : { seen: this.seen };
  }

  /**
   * Called once an argument is read. The parser writes a unit only for a text that has one,
   * so a column of plain text costs one test here; when some value carried a unit, every
   * text value is read again, in order, and its unit compared with the first one seen.
   */
  verify(name: string, m: unknown[][], parse: ParseOptions | undefined): void {
    if (this.seen.unit === null) return;
    for (let r = 0; r < m.length; r++) {
      for (let c = 0; c < m[r].length; c++) {
        const v = m[r][c];
        if (typeof v !== 'string' || isBlank(v)) continue;
        this.seen.unit = null;
        parsePhasor(v, parse);
        const unit = this.seen.unit as UnitSymbol | null;
        if (unit === null) continue;
        const quantity = QUANTITY_OF[unit];
        if (this.first === undefined) this.first = { quantity, at: cellName(name, m, r, c), text: v };
        else if (this.first.quantity !== quantity) {
          throw new PhzError(M.mixedQuantities(cellName(name, m, r, c), v, quantity, this.first.at, this.first.text, this.first.quantity));
        }
      }
    }
    this.seen.unit = null;
  }
}

/** The parser options for one argument: no object when there is nothing to ask. */
function parseOptionsFor(options: PhasorReadOptions): ParseOptions | undefined {
  if (options.same) return options.same.parseOptions(options.expect);
  return options.expect ? { expect: options.expect } : undefined;
}

/** The default options, shared: no object is made per call on the hot path. */
const NO_OPTIONS = Object.freeze({});

/** True for a blank cell. Whitespace-only text counts as blank too. */
export function isBlank(v: unknown): boolean {
  if (v === null || v === undefined || v === '') return true;
  if (typeof v === 'string') return v.trim() === '';
  return false;
}

/**
 * Any host argument as rows of plain cells: a scalar becomes 1×1, a flat list one row, and
 * a data-type cell holding a number, text or TRUE/FALSE becomes that value (`plainCell`).
 * Without such objects the argument's own rows are returned, not a copy.
 */
export function asMatrix(arg: unknown): unknown[][] {
  if (Array.isArray(arg)) {
    if (arg.length === 0) return [];
    return plainRows(Array.isArray(arg[0]) ? (arg as unknown[][]) : [arg]);
  }
  return [[typeof arg === 'object' && arg !== null ? plainCell(arg) : arg]];
}

/** Where a cell sits, for messages: "name", "name, row 2", "name, value 3", "name, row 1 column 2". */
export function cellName(name: string, m: unknown[][], r: number, c: number): string {
  const cells = m.length * (m[0]?.length ?? 0);
  if (cells <= 1) return name;
  if (m.length === 1) return `${name}, value ${c + 1}`;
  if ((m[0]?.length ?? 0) === 1) return `${name}, row ${r + 1}`;
  return `${name}, row ${r + 1} column ${c + 1}`;
}

/** One cell (known not blank) → phasor; `at` names the cell and is only built on an error. */
function cellPhasor(v: unknown, name: string, m: unknown[][], r: number, col: number, parse: ParseOptions | undefined): Phasor {
  if (typeof v === 'string') {
    try {
      return parsePhasor(v, parse);
    } catch (e) {
      if (isPhzError(e)) throw new PhzError(M.inCell(cellName(name, m, r, col), e.message), e.code);
      throw e;
    }
  }
  return otherCellPhasor(v, cellName(name, m, r, col));
}

/** A cell that is not text: a finite number, an entity carrying a phasor, or an error naming the cell. */
function otherCellPhasor(v: unknown, at: string): Phasor {
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new PhzError(M.notFinite(at));
    return rect(v, 0);
  }
  if (typeof v === 'boolean') throw new PhzError(M.boolean(at));
  if (typeof v === 'object' && v !== null && !Array.isArray(v)) return objectPhasor(v, at);
  throw new PhzError(M.unsupported(at));
}

/** The PhzError for a data-type object where `what` was expected: an error names itself. */
function refusal(v: object, at: string, expected: (got: string) => string): PhzError {
  const error = errorName(v);
  return new PhzError(error === undefined ? expected(describeObject(v)) : M.errorValue(at, error));
}

/** A number inside an entity property (a number, numeric text, or a number data type). */
function propertyNumber(v: unknown, at: string): number {
  const n = toNumber(v, at);
  if (n === null) throw new PhzError(M.numberRequired(at));
  return n;
}

/** A data-type object as a phasor: an entity whose properties carry one; anything else is refused. */
function objectPhasor(v: object, at: string): Phasor {
  if (!isEntity(v)) throw refusal(v, at, (got) => M.dataType(at, got));
  const p = phasorProperties(v);
  const what = describeObject(v);
  switch (p.kind) {
    case 'rect':
      return rect(propertyNumber(p.re, M.property(at, p.names[0])), propertyNumber(p.im, M.property(at, p.names[1])));
    case 'polar': {
      const magAt = M.property(at, p.names[0]);
      const m = propertyNumber(p.magnitude, magAt);
      if (m < 0) throw new PhzError(valueMessages.negativeMagnitude(magAt, m));
      const a = propertyNumber(p.angle, M.property(at, p.names[1]));
      return p.radians ? polar(m, a) : polarDeg(m, a);
    }
    case 'half':
      throw new PhzError(M.entityHalf(at, what, p.has, p.missing));
    default:
      throw new PhzError(M.entityNoPhasor(at, what));
  }
}

/** Two columns of numbers (blanks allowed, at least one number): read as real/imaginary pairs. */
export function isPairBlock(m: unknown[][]): boolean {
  if (m.length === 0 || m[0].length !== 2) return false;
  let numbers = 0;
  for (const row of m) {
    for (let c = 0; c < 2; c++) {
      const v = row[c];
      if (typeof v === 'number') numbers++;
      else if (!isBlank(v)) return false;
    }
  }
  return numbers > 0;
}

/**
 * Reads every phasor of one argument, in row order. With `blanks: 'skip'` blank cells
 * are passed over; otherwise a blank is an error naming the cell.
 */
export function readPhasors(arg: unknown, name: string, options: PhasorReadOptions = NO_OPTIONS): Phasor[] {
  // the most common call: one text cell, read before any shape or data-type handling
  if (Array.isArray(arg) && arg.length === 1) {
    const row: unknown = arg[0];
    if (Array.isArray(row) && row.length === 1 && typeof row[0] === 'string' && row[0] !== '') {
      const parse = parseOptionsFor(options);
      const z = cellPhasor(row[0], name, arg as unknown[][], 0, 0, parse);
      if (options.same) options.same.verify(name, arg as unknown[][], parse);
      return [z];
    }
  }
  const m = asMatrix(arg);
  const skip = options.blanks === 'skip';
  const out: Phasor[] = [];
  if (isPairBlock(m)) {
    for (let r = 0; r < m.length; r++) {
      const a = m[r][0];
      const b = m[r][1];
      const blankA = isBlank(a);
      const blankB = isBlank(b);
      if (blankA && blankB) {
        if (skip) continue;
        throw new PhzError(M.blankRequired(`${name}, row ${r + 1}`));
      }
      if (blankA || blankB) throw new PhzError(M.halfPair(name, r + 1));
      const re = a as number;
      const im = b as number;
      if (!Number.isFinite(re) || !Number.isFinite(im)) throw new PhzError(M.notFinite(`${name}, row ${r + 1}`));
      out.push(rect(re, im));
    }
    return out;
  }
  const parse = parseOptionsFor(options);
  for (let r = 0; r < m.length; r++) {
    const row = m[r];
    for (let c = 0; c < row.length; c++) {
      const v = row[c];
      if (isBlank(v)) {
        if (skip) continue;
        throw new PhzError(M.blankRequired(cellName(name, m, r, c)));
      }
      out.push(cellPhasor(v, name, m, r, c, parse));
    }
  }
  if (options.same) options.same.verify(name, m, parse);
  return out;
}

/** Reads at least one phasor (blanks skipped); an all-blank argument is an error. */
export function readSomePhasors(arg: unknown, name: string, options: PhasorReadOptions = NO_OPTIONS): Phasor[] {
  const out = readPhasors(arg, name, { ...options, blanks: 'skip' });
  if (out.length === 0) throw new PhzError(M.noPhasors(name));
  return out;
}

/** Reads exactly one phasor. */
export function readPhasor(arg: unknown, name: string, options: PhasorReadOptions = NO_OPTIONS): Phasor {
  const out = readPhasors(arg, name, options);
  if (out.length !== 1) throw new PhzError(out.length === 0 ? M.blankRequired(name) : M.notOne(name, out.length));
  return out[0];
}

/**
 * Reads a repeating argument (ONE array of every value given, each a matrix) as one
 * list of phasors, blanks skipped. `name` is the parameter's name, e.g. `z`: values are
 * named z1, z2, … in messages.
 */
export function readRepeatedPhasors(arg: unknown, name: string, options: PhasorReadOptions = NO_OPTIONS): Phasor[] {
  const groups = Array.isArray(arg) ? (arg as unknown[]) : [arg];
  // a caller that passes one matrix instead of a list of matrices
  const list = groups.length > 0 && Array.isArray(groups[0]) && !Array.isArray((groups[0] as unknown[])[0]) ? [groups] : groups;
  const out: Phasor[] = [];
  list.forEach((g, k) => {
    for (const z of readPhasors(g, `${name}${k + 1}`, { ...options, blanks: 'skip' })) out.push(z);
  });
  if (out.length === 0) throw new PhzError(M.noPhasors(name));
  return out;
}

function describe(v: unknown): string {
  if (typeof v === 'string') return `the text "${v.length > 40 ? v.slice(0, 37) + '…' : v}"`;
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (Array.isArray(v)) return 'a range';
  if (typeof v === 'object' && v !== null) return describeObject(v);
  return String(v);
}

/** A 1×1 range as its one cell, and a data-type object as its plain value (other values unchanged). */
function oneCell(v: unknown): unknown {
  if (Array.isArray(v)) {
    const m = asMatrix(v);
    return m.length === 1 && m[0].length === 1 ? m[0][0] : v;
  }
  return typeof v === 'object' && v !== null ? plainCell(v) : v;
}

/**
 * One scalar → number. Numeric text ("6", "0,8", and "4 kW" where `units` allows) is
 * accepted; a 1×1 range and a number data type are unwrapped.
 */
function toNumber(v: unknown, at: string, units?: readonly UnitSymbol[]): number | null {
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new PhzError(M.notFinite(at));
    return v;
  }
  v = oneCell(v);
  if (Array.isArray(v)) throw new PhzError(M.numberExpected(at, 'a range of several cells'));
  if (isBlank(v)) return null;
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new PhzError(M.notFinite(at));
    return v;
  }
  if (typeof v === 'string') return textNumber(v, at, units);
  if (typeof v === 'object' && v !== null) throw refusal(v, at, (got) => M.numberExpected(at, got));
  throw new PhzError(M.numberExpected(at, describe(v)));
}

/**
 * Numeric text: a plain decimal at once; otherwise the parser's number reading, with its
 * decimal-comma rule and an optional unit, which must be one of `units` (the quantity the
 * argument names). A unit is refused where the argument names none.
 */
function textNumber(v: string, at: string, units: readonly UnitSymbol[] | undefined): number {
  const t = v.trim();
  if (/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) {
    const n = Number(t);
    if (Number.isFinite(n)) return n;
  }
  const seen: UnitSeen = { unit: null };
  let n: number;
  try {
    n = parseNumberText(t, seen);
  } catch (e) {
    if (isPhzError(e)) throw new PhzError(M.inCell(at, e.message), e.code);
    throw e;
  }
  if (Number.isNaN(n)) throw new PhzError(units ? M.numberWithUnitExpected(at, describe(v), units) : M.numberExpected(at, describe(v)));
  if (seen.unit !== null && !units?.includes(seen.unit)) throw new PhzError(M.unitRefused(at, t, seen.unit, units ?? []));
  return n;
}

export interface NumberReadOptions {
  /** Used when the argument is omitted or blank; without it a blank is an error. */
  readonly default?: number;
  readonly min?: number;
  readonly max?: number;
  /** The minimum itself is not allowed (e.g. power factor > 0). */
  readonly minExclusive?: boolean;
  readonly integer?: boolean;
  /** Unit words the argument accepts (the quantity it names, e.g. ['W'] for a real power); none when left out. */
  readonly units?: readonly UnitSymbol[];
}

function checkNumber(n: number, at: string, o: NumberReadOptions): number {
  if (o.integer && !Number.isInteger(n)) throw new PhzError(M.wholeNumber(at, n));
  const low = o.min !== undefined && (o.minExclusive ? n <= o.min : n < o.min);
  const high = o.max !== undefined && n > o.max;
  if (low || high) {
    const lo = o.min === undefined ? '' : o.minExclusive ? `above ${o.min}` : `at least ${o.min}`;
    const hi = o.max === undefined ? '' : `at most ${o.max}`;
    throw new PhzError(M.outOfRange(at, n, [lo, hi].filter(Boolean).join(' and ')));
  }
  return n;
}

/** Reads one number. */
export function readNumber(v: unknown, name: string, options: NumberReadOptions = NO_OPTIONS): number {
  const n = toNumber(v, name, options.units);
  if (n === null) {
    if (options.default !== undefined) return options.default;
    throw new PhzError(M.numberRequired(name));
  }
  return checkNumber(n, name, options);
}

/** Reads every number of a range, in row order (blanks are errors unless `skipBlanks`). */
export function readNumbers(arg: unknown, name: string, options: NumberReadOptions & { skipBlanks?: boolean } = NO_OPTIONS): number[] {
  const m = asMatrix(arg);
  const out: number[] = [];
  for (let r = 0; r < m.length; r++) {
    for (let c = 0; c < m[r].length; c++) {
      const at = cellName(name, m, r, c);
      const n = toNumber(m[r][c], at, options.units);
      if (n === null) {
        if (options.skipBlanks) continue;
        throw new PhzError(M.numberRequired(at));
      }
      out.push(checkNumber(n, at, options));
    }
  }
  if (out.length === 0) throw new PhzError(M.numberRequired(name));
  return out;
}

/** The optional `digits` argument: 1–15 significant figures, default 6. */
export function readDigits(v: unknown): number {
  if (v === null || v === undefined) return DEFAULT_DIGITS;
  return readNumber(v, 'digits', { default: DEFAULT_DIGITS, min: 1, max: 15, integer: true });
}

/** Reads one of a fixed set of words, case-insensitive; blank or omitted gives `fallback`. */
export function readChoice<T extends string>(v: unknown, name: string, choices: readonly T[], fallback: T): T {
  v = oneCell(v);
  if (isBlank(v)) return fallback;
  if (typeof v === 'string') {
    const t = v.trim().toLowerCase();
    for (const c of choices) if (c.toLowerCase() === t) return c;
  }
  if (typeof v === 'object' && v !== null && !Array.isArray(v)) throw refusal(v, name, (got) => M.choiceNotText(name, got, choices));
  throw new PhzError(M.choice(name, typeof v === 'string' ? v : describe(v), choices));
}

/** Reads TRUE/FALSE (also 1/0 and the words true/false); blank gives `fallback`. */
export function readBoolean(v: unknown, name: string, fallback: boolean): boolean {
  v = oneCell(v);
  if (isBlank(v)) return fallback;
  if (typeof v === 'boolean') return v;
  if (v === 1 || v === 0) return v === 1;
  if (typeof v === 'string') {
    const t = v.trim().toLowerCase();
    if (t === 'true') return true;
    if (t === 'false') return false;
  }
  if (typeof v === 'object' && v !== null && !Array.isArray(v)) throw refusal(v, name, (got) => M.booleanExpected(name, got));
  throw new PhzError(M.booleanExpected(name, describe(v)));
}

/**
 * Element-wise count of several lists: equal counts, or 1 (broadcast to every row).
 * Returns the common count.
 */
export function broadcastCount(lists: ReadonlyArray<readonly [string, number]>): number {
  let n = 1;
  for (const [, len] of lists) if (len !== 1) n = n === 1 ? len : n;
  for (const [, len] of lists) {
    if (len !== 1 && len !== n) throw new PhzError(M.counts(lists.map(([name, k]) => `${name}: ${k}`).join(', ')));
  }
  return n;
}

/** Applies `f` row by row over two lists with broadcasting. */
export function zipWith<A, B, R>(a: readonly A[], nameA: string, b: readonly B[], nameB: string, f: (x: A, y: B) => R): R[] {
  const n =
    a.length === b.length || b.length === 1
      ? a.length
      : a.length === 1
        ? b.length
        : broadcastCount([
            [nameA, a.length],
            [nameB, b.length],
          ]);
  const out: R[] = new Array(n);
  for (let i = 0; i < n; i++) out[i] = f(a.length === 1 ? a[0] : a[i], b.length === 1 ? b[0] : b[i]);
  return out;
}

/** A list of cells as an n×1 column. */
export function column(cells: readonly HostCell[]): HostResult {
  const out: HostResult = new Array(cells.length);
  for (let i = 0; i < cells.length; i++) out[i] = [cells[i]];
  return out;
}

/** Phasors as an n×1 column of polar (default) or rectangular text. */
export function phasorColumn(zs: readonly Phasor[], digits: number, form: 'polar' | 'rect' = 'polar'): HostResult {
  const out: HostResult = new Array(zs.length);
  // direct calls (not through a variable) so the formatter can be inlined
  if (form === 'polar') for (let i = 0; i < zs.length; i++) out[i] = [formatPolar(zs[i], digits)];
  else for (let i = 0; i < zs.length; i++) out[i] = [formatRect(zs[i], digits)];
  return out;
}
