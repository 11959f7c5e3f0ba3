/**
 * Argument helpers shared by the three-phase groups (sets, loads, solvers, neutral,
 * sequences, unbalance): three-phase sets, impedances that may be "open", one-or-three
 * line impedances, the neutral word, and per-row phase triples. They build on the shared
 * readers, so notations, pair blocks and messages stay the same everywhere.
 * Not a function: this module holds no spec.
 */
import { PhzError } from '../../core/errors';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import { ZERO, type Phasor } from '../../core/phasor';
import { formatPolar } from '../../core/format';
import type { Quantity } from '../../core/parse';
import { OPEN, isOpen, type Impedance, type Neutral, type Triple } from '../../core/threephase';
import { asMatrix, cellName, isBlank, isPairBlock, phasorColumn, readPhasor, readPhasors } from '../readers';

export { cellName, isPairBlock };
import type { HostCell, HostResult } from '../spec';

/** True when an argument was left out of the call (the host passes null or nothing). */
export function isAbsent(arg: unknown): boolean {
  return arg === null || arg === undefined;
}

/** True when an argument was omitted or is blank (every cell blank). */
export function isOmitted(arg: unknown): boolean {
  if (arg === null || arg === undefined) return true;
  const m = asMatrix(arg);
  return m.every((row) => row.every(isBlank));
}

function isOpenText(v: unknown): boolean {
  return typeof v === 'string' && v.trim().toLowerCase() === 'open';
}

/** Exactly three phasors (blanks are errors); `expect` checks a unit word, if one is given. */
export function readTriple(arg: unknown, name: string, what: string, expect?: Quantity): Triple<Phasor> {
  const zs = readPhasors(arg, name, expect ? { expect } : {});
  if (zs.length !== 3) throw new PhzError(M.needThree(name, zs.length, what));
  return [zs[0], zs[1], zs[2]];
}

/**
 * Three phasors given as one range of three in `first` (the others omitted), or as three
 * single values.
 */
export function readTripleArgs(first: unknown, second: unknown, third: unknown, names: Triple<string>, what: string): Triple<Phasor> {
  if (isAbsent(second) && isAbsent(third)) return readTriple(first, names[0], what);
  if (isAbsent(second) || isAbsent(third)) throw new PhzError(M.oneOrThreeArgs(names.join(', '), 2));
  return [readPhasor(first, names[0]), readPhasor(second, names[1]), readPhasor(third, names[2])];
}

/**
 * Impedances, cell by cell, where the word "open" (any case) is an open circuit when
 * `allowOpen`. Without any "open" cell the shared reader is used unchanged (so two numeric
 * columns are real/imaginary pairs).
 */
export function readImpedances(arg: unknown, name: string, allowOpen: boolean): Impedance[] {
  const m = asMatrix(arg);
  if (!m.some((row) => row.some(isOpenText))) return readPhasors(arg, name, { expect: 'impedance' });
  const out: Impedance[] = [];
  for (let r = 0; r < m.length; r++) {
    for (let c = 0; c < m[r].length; c++) {
      const v = m[r][c];
      const at = cellName(name, m, r, c);
      if (isOpenText(v)) {
        if (!allowOpen) throw new PhzError(M.openNotAllowed(at));
        out.push(OPEN);
      } else {
        out.push(...readPhasors([[v]], at, { expect: 'impedance' }));
      }
    }
  }
  return out;
}

/** Three impedances, or one used for all three phases. */
export function readImpedanceSet(arg: unknown, name: string, allowOpen: boolean, what: string): Triple<Impedance> {
  const zs = readImpedances(arg, name, allowOpen);
  if (zs.length === 1) return [zs[0], zs[0], zs[0]];
  if (zs.length !== 3) throw new PhzError(M.oneOrThree(name, zs.length, what));
  return [zs[0], zs[1], zs[2]];
}

/** Optional line impedances: omitted/blank → none (0 Ω), one → every line, or three. */
export function readLineImpedances(arg: unknown, name = 'line'): Triple<Phasor> | null {
  if (isOmitted(arg)) return null;
  const zs = readImpedanceSet(arg, name, false, 'line impedance') as Triple<Phasor>;
  return zs;
}

/**
 * The STARLOAD neutral: left out, 0 or "solid" → solid; "open" → none; an impedance →
 * impedant. A reference to a blank cell is an error, never a silent solid neutral: the
 * host passes null for a left-out argument but [[null]] or [[""]] for a blank cell.
 */
export function readNeutral(arg: unknown): Neutral {
  if (isAbsent(arg)) return { kind: 'solid' };
  if (isOmitted(arg)) throw new PhzError(M.neutralBlank);
  const m = asMatrix(arg);
  if (m.length === 1 && m[0].length === 1 && typeof m[0][0] === 'string') {
    const t = m[0][0].trim().toLowerCase();
    if (t === 'open') return { kind: 'open' };
    if (t === 'solid') return { kind: 'solid' };
    if (/^[a-z]+$/.test(t) && t !== 'j' && t !== 'i') throw new PhzError(M.neutralWord(m[0][0]));
  }
  const zs = readPhasors(arg, 'neutral', { expect: 'impedance' });
  if (zs.length !== 1) throw new PhzError(M.neutralWord(`${zs.length} values`));
  const z = zs[0];
  return z.re === 0 && z.im === 0 ? { kind: 'solid' } : { kind: 'impedance', z };
}

/** One argument as a list of entries (a cell, or a real/imaginary row of a pair block). */
function entries(arg: unknown, name: string, allowGrid: boolean): { cells: unknown[][][]; names: string[]; grid: boolean } {
  const m = asMatrix(arg);
  const rows = m.length;
  const cols = m[0]?.length ?? 0;
  if (isPairBlock(m)) return { cells: m.map((row) => [row]), names: m.map((_, r) => (rows === 1 ? name : `${name}, row ${r + 1}`)), grid: false };
  if (rows === 1 || cols === 1) {
    const cells: unknown[][][] = [];
    const names: string[] = [];
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < m[r].length; c++) {
        cells.push([[m[r][c]]]);
        names.push(cellName(name, m, r, c));
      }
    }
    return { cells, names, grid: false };
  }
  if (allowGrid) return { cells: [], names: [], grid: true };
  throw new PhzError(M.notLine(name));
}

/** Reads one entry: a phasor, or null when blank. */
function entryPhasor(cell: unknown[][], name: string, expect?: Quantity): Phasor | null {
  const zs = readPhasors(cell, name, expect ? { blanks: 'skip', expect } : { blanks: 'skip' });
  return zs.length === 0 ? null : zs[0];
}

/**
 * Phase values per row, for functions of three phase quantities that also work down
 * columns: `groups` is the repeating argument or [i1, i2, i3].
 * - one argument: a row or column of three (one result), or a grid with three columns
 *   (one result per row);
 * - three arguments: three single values, or three equal-length columns (a single value is
 *   used for every row).
 * A blank cell is a phase carrying nothing (null).
 */
export function phaseRows(groups: readonly unknown[], names: Triple<string>, single: string, expect?: Quantity): Array<Triple<Phasor | null>> {
  const given = groups.filter((g, k) => k === 0 || !isAbsent(g));
  if (given.length === 1) {
    const m = asMatrix(given[0]);
    const e = entries(given[0], single, true);
    if (e.grid) {
      if ((m[0]?.length ?? 0) !== 3) throw new PhzError(M.needThree(single, m[0]?.length ?? 0, 'three columns, one per phase'));
      return m.map((row, r) => {
        const at = (c: number): string => `${single}, row ${r + 1} column ${c + 1}`;
        return [entryPhasor([[row[0]]], at(0), expect), entryPhasor([[row[1]]], at(1), expect), entryPhasor([[row[2]]], at(2), expect)];
      });
    }
    if (e.cells.length !== 3) throw new PhzError(M.needThree(single, e.cells.length, 'one per phase; leave a cell blank for a phase with nothing on it'));
    return [[entryPhasor(e.cells[0], e.names[0], expect), entryPhasor(e.cells[1], e.names[1], expect), entryPhasor(e.cells[2], e.names[2], expect)]];
  }
  if (groups.length !== 3 || given.length !== 3) throw new PhzError(M.oneOrThreeArgs(names.join(', '), given.length));
  const cols = groups.map((g, k) => entries(g, names[k], false));
  const lens = cols.map((c) => c.cells.length);
  let n = 1;
  for (const len of lens) if (len !== 1) n = len;
  if (lens.some((len) => len !== 1 && len !== n)) throw new PhzError(M.rowsMismatch(names.map((nm, k) => `${nm}: ${lens[k]}`).join(', ')));
  const out: Array<Triple<Phasor | null>> = [];
  for (let i = 0; i < n; i++) {
    const pick = (k: number): Phasor | null => {
      const c = cols[k];
      const j = c.cells.length === 1 ? 0 : i;
      return entryPhasor(c.cells[j], c.names[j], expect);
    };
    out.push([pick(0), pick(1), pick(2)]);
  }
  return out;
}

/**
 * The repeating argument as a list of argument values. The host passes ONE array of
 * matrices; a caller passing a single matrix (rows of cells) is accepted too.
 */
export function repeatGroups(arg: unknown): unknown[] {
  if (!Array.isArray(arg)) return [arg];
  if (arg.length > 0 && Array.isArray(arg[0]) && !Array.isArray((arg[0] as unknown[])[0])) return [arg];
  return arg as unknown[];
}

/** Blank phases as zero. */
export function orZero(t: Triple<Phasor | null>): Triple<Phasor> {
  return [t[0] ?? ZERO, t[1] ?? ZERO, t[2] ?? ZERO];
}

/** A three-phase set as a 3×1 column of polar text. */
export function setColumn(zs: Triple<Phasor>, digits: number): HostResult {
  return phasorColumn(zs, digits);
}

/** An impedance as a cell: polar text, or "open". */
export function impedanceCell(z: Impedance, digits: number): HostCell {
  return isOpen(z) ? OPEN : formatPolar(z, digits);
}

/** True when every cell of the argument is a plain number and it is not a pair block. */
export function isPlainNumbers(arg: unknown): boolean {
  const m = asMatrix(arg);
  if (isPairBlock(m)) return false;
  let any = false;
  for (const row of m) {
    for (const v of row) {
      if (typeof v === 'number') any = true;
      else if (!isBlank(v)) return false;
    }
  }
  return any;
}
