/**
 * Readers shared by the panel-schedule and voltage-drop functions: the supply, schedule
 * columns (one cell per circuit), loads with their unit words, power factors with the word
 * `lead`, and fractions or percentages. They build on the shared readers, so notations,
 * decimal commas, data-type cells and messages stay the same everywhere.
 * Not a function: this module holds no spec.
 */
import { PhzError } from '../../core/errors';
import { feederMessages as M } from '../../core/messages/feeders';
import { readerMessages as R } from '../../core/messages';
import { parseNumberText, type UnitSeen } from '../../core/parse';
import type { Phasor } from '../../core/phasor';
import { balancedSet, parseConnection, groupOf, type Connection, type ScheduleCircuit, type Triple } from '../../core/threephase';
import { describeObject, errorName } from '../cellvalues';
import { asMatrix, cellName, isBlank, readPhasors } from '../readers';

/** The supply: one phase voltage (a balanced set at 0°, −120°, +120° from it) or three. */
export function readSupply(arg: unknown, name = 'supply'): Triple<Phasor> {
  const zs = readPhasors(arg, name, { expect: 'voltage' });
  if (zs.length === 1) return balancedSet(zs[0]);
  if (zs.length !== 3) throw new PhzError(M.supplyCount(zs.length));
  return [zs[0], zs[1], zs[2]];
}

/** Where a cell sits, for messages: text, or a function that makes it only when a message needs it. */
export type At = string | (() => string);
const where = (at: At): string => (typeof at === 'string' ? at : at());

/** One schedule column: its cells in order and where each sits, for messages. */
export interface Column {
  readonly cells: readonly unknown[];
  at(i: number): string;
}

/** A column or row of cells (a single cell counts as a column of one); a block is refused. */
export function scheduleColumn(arg: unknown, name: string): Column {
  const m = asMatrix(arg);
  const rows = m.length;
  const cols = m[0]?.length ?? 0;
  if (rows > 1 && cols > 1) throw new PhzError(M.notColumn(name, rows, cols));
  const cells = rows === 1 ? m[0] : m.map((r) => r[0]);
  return { cells, at: (i) => (rows === 1 ? cellName(name, m, 0, i) : cellName(name, m, i, 0)) };
}

/** A cell that is neither number nor text: an error names itself, anything else is described. */
function refuse(v: unknown, at: At, text: (got: string) => string): PhzError {
  if (typeof v === 'object' && v !== null) {
    const error = errorName(v);
    return new PhzError(error === undefined ? text(describeObject(v)) : R.errorValue(where(at), error));
  }
  return new PhzError(text(typeof v === 'boolean' ? (v ? 'TRUE' : 'FALSE') : String(v)));
}

/** A number in text with an optional unit word (the parser's rules: prefixes, decimal comma); NaN when not one. */
function numberText(text: string, at: At, seen: UnitSeen): number {
  try {
    return parseNumberText(text, seen);
  } catch (e) {
    throw new PhzError(R.inCell(where(at), (e as Error).message));
  }
}

export interface LoadReading {
  readonly value: number;
  /** True for VA (apparent power), false for W (real power). */
  readonly apparent: boolean;
}

/** A load cell: a number is W; text may carry W, kW, VA, kVA (any SI prefix). Blank → null. */
export function readLoad(v: unknown, at: At): LoadReading | null {
  if (isBlank(v)) return null;
  let value: number;
  let apparent = false;
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new PhzError(R.notFinite(where(at)));
    value = v;
  } else if (typeof v === 'string') {
    const seen: UnitSeen = { unit: null };
    value = numberText(v.trim(), at, seen);
    if (Number.isNaN(value)) throw new PhzError(M.loadText(where(at), v.trim()));
    if (seen.unit !== null && seen.unit !== 'W' && seen.unit !== 'VA') throw new PhzError(M.loadUnit(where(at), v.trim(), seen.unit));
    apparent = seen.unit === 'VA';
  } else {
    throw refuse(v, at, (got) => M.loadText(where(at), got));
  }
  if (value < 0) throw new PhzError(M.loadNegative(where(at), value));
  return { value, apparent };
}

export interface PowerFactorReading {
  readonly pf: number;
  readonly leading: boolean;
}

const PF_WORD = /^(.*?)\s*(lagging|lag|inductive|ind|leading|lead|capacitive|cap)\s*$/i;

/**
 * A power factor: a number in (0, 1], lagging; text may add `lag`/`lagging` or
 * `lead`/`leading` (also `ind`/`inductive` and `cap`/`capacitive`). A negative value is
 * refused, never read as leading. Blank → null.
 */
export function readPowerFactor(v: unknown, at: At): PowerFactorReading | null {
  if (isBlank(v)) return null;
  let pf: number;
  let leading = false;
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new PhzError(R.notFinite(where(at)));
    pf = v;
  } else if (typeof v === 'string') {
    const t = v.trim();
    const word = PF_WORD.exec(t);
    const num = word ? word[1] : t;
    if (word) leading = /^(lead|cap)/i.test(word[2]);
    const seen: UnitSeen = { unit: null };
    pf = num === '' ? NaN : numberText(num, at, seen);
    if (Number.isNaN(pf) || seen.unit !== null) throw new PhzError(M.powerFactorText(where(at), t));
  } else {
    throw refuse(v, at, (got) => M.powerFactorText(where(at), got));
  }
  if (pf < 0) throw new PhzError(M.powerFactorNegative(where(at), pf));
  if (!(pf > 0 && pf <= 1)) throw new PhzError(M.powerFactorRange(where(at), pf));
  return { pf, leading };
}

/** A share from 0 to 1: a number, or text with % (40 % → 0.4). Blank → null. */
export function readFraction(v: unknown, at: At, what: string): number | null {
  if (isBlank(v)) return null;
  let x: number;
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new PhzError(R.notFinite(where(at)));
    x = v;
  } else if (typeof v === 'string') {
    const t = v.trim();
    const percent = /^(.*?)\s*%$/.exec(t);
    const seen: UnitSeen = { unit: null };
    const n = numberText(percent ? percent[1] : t, at, seen);
    if (Number.isNaN(n) || seen.unit !== null) throw new PhzError(M.fractionText(where(at), t, what));
    x = percent ? n / 100 : n;
  } else {
    throw refuse(v, at, (got) => M.fractionText(where(at), got, what));
  }
  if (!(x >= 0 && x <= 1)) throw new PhzError(M.fraction(where(at), x, what));
  return x;
}

/** S = P + jQ of a load at a power factor: from W (S = P/pf) or from VA (P = S·pf). */
export function loadPower(load: LoadReading, pf: PowerFactorReading, demand = 1): { re: number; im: number } {
  const sin = Math.sqrt((1 - pf.pf) * (1 + pf.pf));
  const s = (load.apparent ? load.value : load.value / pf.pf) * demand;
  const p = load.apparent ? load.value * pf.pf * demand : load.value * demand;
  const q = s * sin;
  return { re: p, im: pf.leading ? -q : q };
}

/** A column that is one value for every circuit or one per circuit. */
function pick(col: Column | null, n: number, name: string, counts: Array<[string, number]>): ((i: number) => { v: unknown; at: At }) | null {
  if (col === null) return null;
  const len = col.cells.length;
  if (len !== 1 && len !== n) {
    counts.push([name, len]);
    return null;
  }
  return (i) => (len === 1 ? { v: col.cells[0], at: () => col.at(0) } : { v: col.cells[i], at: () => col.at(i) });
}

export interface ScheduleColumns {
  readonly connections: Column;
  readonly loads: Column;
  readonly powerFactors: Column;
  readonly nonlinear: Column | null;
  readonly demand: Column | null;
}

export interface ReadSchedule {
  readonly circuits: ScheduleCircuit[];
  /** The first loaded circuit with a non-linear share above 0, for messages. */
  readonly firstNonlinear: string | null;
}

/**
 * Reads the circuits: a row whose load is blank or 0 is a spare way and is skipped whatever
 * its other cells hold; every loaded row needs a connection and a power factor.
 */
export function readCircuits(cols: ScheduleColumns): ReadSchedule {
  const n = cols.connections.cells.length;
  const counts: Array<[string, number]> = [];
  if (cols.loads.cells.length !== n) counts.push(['loads', cols.loads.cells.length]);
  const pf = pick(cols.powerFactors, n, 'power_factors', counts);
  const nl = pick(cols.nonlinear, n, 'nonlinear', counts);
  const dm = pick(cols.demand, n, 'demand', counts);
  if (counts.length > 0) {
    throw new PhzError(M.rowCounts([['connections', n] as [string, number], ...counts].map(([k, c]) => `${k}: ${c}`).join(', ')));
  }
  const circuits: ScheduleCircuit[] = [];
  let firstNonlinear: string | null = null;
  for (let i = 0; i < n; i++) {
    const load = readLoad(cols.loads.cells[i], () => cols.loads.at(i));
    if (load === null || load.value === 0) continue;
    const at = (): string => cols.connections.at(i);
    const connection = readConnection(cols.connections.cells[i], at);
    const p = (pf as (i: number) => { v: unknown; at: At })(i);
    const factor = readPowerFactor(p.v, p.at);
    if (factor === null) throw new PhzError(M.powerFactorBlank(where(p.at)));
    let share = 0;
    if (nl) {
      const c = nl(i);
      share = readFraction(c.v, c.at, 'a non-linear share') ?? 0;
      if (share > 0 && firstNonlinear === null) firstNonlinear = where(c.at);
    }
    let d = 1;
    if (dm) {
      const c = dm(i);
      d = readFraction(c.v, c.at, 'a demand factor') ?? 1;
    }
    const s = loadPower(load, factor, d);
    circuits.push({ group: groupOf(connection), re: s.re, im: s.im, nonlinear: share, at });
  }
  return { circuits, firstNonlinear };
}

/** One connection cell; blank or unknown is an error naming it. */
export function readConnection(v: unknown, at: At): Connection {
  if (isBlank(v)) throw new PhzError(M.connectionBlank(where(at)));
  if (typeof v !== 'string' && typeof v !== 'number') throw refuse(v, at, (got) => M.connection(where(at), got));
  const r = parseConnection(v);
  if (r.ok) return r.connection;
  const text = String(v).trim();
  throw new PhzError(r.repeated ? M.connectionRepeated(where(at), text) : M.connection(where(at), text));
}
