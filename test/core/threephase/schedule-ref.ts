/**
 * Independent references for panel schedules with mathjs (registry library `mathjs`,
 * complex numbers and `lusolve`), formulated differently from the project's aggregation so
 * the two cannot share a mistake:
 * - `circuitByCircuit`: each circuit's own current from its own voltage, S taken from the
 *   load, pf and demand as numbers, added into the lines through an incidence table (no
 *   grouping, no shared reader);
 * - `nodalSchedule`: every circuit as a constant admittance Y = S* / |V|² between its nodes
 *   (a three-phase circuit as a three-wire star of three equal admittances with its own
 *   floating star point), the internal star points solved by nodal analysis, the line and
 *   neutral currents read from the injections at the supply nodes. On a balanced supply it
 *   draws exactly the scheduled powers.
 * Also a random schedule generator that writes loads, power factors and connections the
 * several ways schedules write them, with a seeded generator so a failure can be replayed.
 */
import * as math from 'mathjs';
import type { Complex as MComplex } from 'mathjs';

export type C = { re: number; im: number };
const cx = (z: C): MComplex => math.complex(z.re, z.im);

/** Lines 0–2; 3 is the neutral. */
export type RefConnection = { kind: 'ln'; phase: number } | { kind: 'll'; from: number; to: number } | { kind: '3p' };

export interface RefCircuit {
  readonly connection: RefConnection;
  /** Load in W (apparent false) or VA (apparent true). */
  readonly load: number;
  readonly apparent: boolean;
  readonly pf: number;
  readonly leading: boolean;
  readonly nonlinear: number;
  readonly demand: number;
}

/** S = P + jQ of a circuit, from its numbers (P from W directly; from VA as S·pf). */
export function refPower(c: RefCircuit): MComplex {
  const phi = Math.acos(c.pf);
  const s = (c.apparent ? c.load : c.load / c.pf) * c.demand;
  return math.complex({ r: s, phi: c.leading ? -phi : phi }) as MComplex;
}

export interface RefResult {
  lines: MComplex[];
  neutral: MComplex;
  linePowers: MComplex[];
  total: MComplex;
  /** Σ|S| / |E_k| of the line-to-neutral circuits of each phase. */
  lnLoad: number[];
  /** Σ nonlinear·|I| of the line-to-neutral circuits of each phase. */
  nonlinearCurrent: number[];
}

const A = math.complex({ r: 1, phi: (2 * Math.PI) / 3 }) as MComplex;

/** Circuit by circuit: the documented model, one current per circuit. */
export function circuitByCircuit(supply: C[], circuits: readonly RefCircuit[]): RefResult {
  const e = supply.map(cx);
  const zero = math.complex(0, 0);
  const lines: MComplex[] = [zero, zero, zero];
  let neutral: MComplex = zero;
  let total: MComplex = zero;
  const lnLoad = [0, 0, 0];
  const nonlinearCurrent = [0, 0, 0];
  const addTo = (k: number, i: MComplex): void => {
    lines[k] = math.add(lines[k], i) as MComplex;
  };
  // V+ = (E1 + a·E2 + a²·E3)/3
  const vPos = math.divide(math.add(math.add(e[0], math.multiply(A, e[1])), math.multiply(math.multiply(A, A), e[2])), 3) as MComplex;
  for (const c of circuits) {
    const s = refPower(c);
    total = math.add(total, s) as MComplex;
    const conn = c.connection;
    if (conn.kind === 'ln') {
      const i = math.conj(math.divide(s, e[conn.phase]) as MComplex) as MComplex;
      addTo(conn.phase, i);
      neutral = math.add(neutral, i) as MComplex;
      lnLoad[conn.phase] += (math.abs(s) as unknown as number) / (math.abs(e[conn.phase]) as unknown as number);
      nonlinearCurrent[conn.phase] += c.nonlinear * (math.abs(i) as unknown as number);
    } else if (conn.kind === 'll') {
      const v = math.subtract(e[conn.from], e[conn.to]) as MComplex;
      const i = math.conj(math.divide(s, v) as MComplex) as MComplex;
      addTo(conn.from, i);
      addTo(conn.to, math.unaryMinus(i) as MComplex);
    } else {
      const i1 = math.conj(math.divide(math.divide(s, 3) as MComplex, vPos) as MComplex) as MComplex;
      addTo(0, i1);
      addTo(1, math.multiply(math.multiply(A, A), i1) as MComplex);
      addTo(2, math.multiply(A, i1) as MComplex);
    }
  }
  const linePowers = [0, 1, 2].map((k) => math.multiply(e[k], math.conj(lines[k])) as MComplex);
  return { lines, neutral, linePowers, total, lnLoad, nonlinearCurrent };
}

/**
 * Nodal analysis: supply nodes L1, L2, L3 at E_k and N at 0; one internal node per
 * three-phase circuit. Each circuit is an admittance Y = conj(S) / |V|² (its voltage from the
 * supply); the internal nodes are solved from Y_uu·V_u = −Y_uk·V_k, the injections at the
 * supply nodes give the line currents (and minus the neutral's injection the neutral current).
 */
export function nodalSchedule(supply: C[], circuits: readonly RefCircuit[]): { lines: MComplex[]; neutral: MComplex } {
  const e = supply.map(cx);
  const zero = math.complex(0, 0);
  const nInternal = circuits.filter((c) => c.connection.kind === '3p').length;
  const n = 4 + nInternal;
  const y: MComplex[][] = Array.from({ length: n }, () => new Array<MComplex>(n).fill(zero));
  const branch = (p: number, q: number, adm: MComplex): void => {
    y[p][p] = math.add(y[p][p], adm) as MComplex;
    y[q][q] = math.add(y[q][q], adm) as MComplex;
    y[p][q] = math.subtract(y[p][q], adm) as MComplex;
    y[q][p] = math.subtract(y[q][p], adm) as MComplex;
  };
  const voltage = [e[0], e[1], e[2], zero];
  let internal = 4;
  for (const c of circuits) {
    const s = refPower(c);
    const conn = c.connection;
    if (conn.kind === 'ln') {
      const m = math.abs(e[conn.phase]) as unknown as number;
      branch(conn.phase, 3, math.divide(math.conj(s), m * m) as MComplex);
    } else if (conn.kind === 'll') {
      const m = math.abs(math.subtract(e[conn.from], e[conn.to])) as unknown as number;
      branch(conn.from, conn.to, math.divide(math.conj(s), m * m) as MComplex);
    } else {
      // three arms, each taking S/3 at the phase voltage of a balanced supply
      const m = math.abs(e[0]) as unknown as number;
      const adm = math.divide(math.conj(math.divide(s, 3) as MComplex), m * m) as MComplex;
      for (let k = 0; k < 3; k++) branch(k, internal, adm);
      internal++;
    }
  }
  let vu: MComplex[] = [];
  if (nInternal > 0) {
    const yuu = y.slice(4).map((row) => row.slice(4));
    const rhs = y.slice(4).map((row) => math.unaryMinus(row.slice(0, 4).reduce<MComplex>((acc, v, k) => math.add(acc, math.multiply(v, voltage[k])) as MComplex, zero)) as MComplex);
    vu = (math.lusolve(yuu, rhs) as unknown as MComplex[][]).map((r) => r[0]);
  }
  const all = [...voltage, ...vu];
  const injection = (k: number): MComplex => y[k].reduce<MComplex>((acc, v, j) => math.add(acc, math.multiply(v, all[j])) as MComplex, zero);
  return { lines: [injection(0), injection(1), injection(2)], neutral: math.unaryMinus(injection(3)) as MComplex };
}

/** mulberry32: a small seeded generator, so a failing schedule can be replayed from its seed. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const LN_SPELLINGS = [
  ['1', 'L1', 'A', 'l1', 'a', 'L1-N', 'AN', ' L 1 '],
  ['2', 'L2', 'B', 'b', 'L2-N', 'BN'],
  ['3', 'L3', 'C', 'c', 'l3', 'CN'],
];
const LL_SPELLINGS = [
  ['1-2', 'L1-L2', 'AB', '12', 'L1/L2', 'ba', '2-1', 'L2–L1'],
  ['2-3', 'L2-L3', 'BC', '23', 'cb', '3-2'],
  ['3-1', 'L3-L1', 'CA', '31', 'AC', '1-3', 'l1-l3'],
];
const THREE_SPELLINGS = ['3P', '3p', '123', 'ABC', 'abc', '1-2-3', 'L1L2L3', '3PH', 'TP'];

export interface RandomSchedule {
  /** The cells a schedule would hold. */
  readonly connections: unknown[][];
  readonly loads: unknown[][];
  readonly powerFactors: unknown[][];
  readonly nonlinear: unknown[][];
  readonly demand: unknown[][];
  /** The same circuits as numbers (spare ways left out). */
  readonly circuits: RefCircuit[];
}

/** A random schedule of `n` ways: every connection kind and spelling, W/kW/VA/kVA, lagging and leading, some spares. */
export function randomSchedule(n: number, rnd: () => number): RandomSchedule {
  const pickOf = <T>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)];
  const out: RandomSchedule = { connections: [], loads: [], powerFactors: [], nonlinear: [], demand: [], circuits: [] };
  for (let i = 0; i < n; i++) {
    const kind = rnd();
    let connection: RefConnection;
    let spelling: string | number;
    if (kind < 0.55) {
      const p = Math.floor(rnd() * 3);
      connection = { kind: 'ln', phase: p };
      spelling = rnd() < 0.15 ? p + 1 : pickOf(LN_SPELLINGS[p]);
    } else if (kind < 0.8) {
      const b = Math.floor(rnd() * 3);
      connection = { kind: 'll', from: b, to: (b + 1) % 3 };
      spelling = pickOf(LL_SPELLINGS[b]);
    } else {
      connection = { kind: '3p' };
      spelling = rnd() < 0.1 ? 123 : pickOf(THREE_SPELLINGS);
    }
    if (rnd() < 0.06) {
      // a spare way: blank or 0 load, nothing else needed
      out.connections.push([spelling]);
      out.loads.push([rnd() < 0.5 ? null : 0]);
      out.powerFactors.push([null]);
      out.nonlinear.push([null]);
      out.demand.push([null]);
      continue;
    }
    const watts = Math.round((100 + rnd() * 14900) * 10) / 10;
    const apparent = rnd() < 0.4;
    const form = rnd();
    const load = form < 0.25 ? (apparent ? `${watts} VA` : watts) : form < 0.7 ? `${watts / 1000} k${apparent ? 'VA' : 'W'}` : `${watts}${apparent ? 'VA' : 'W'}`;
    const pf = Math.round((0.5 + rnd() * 0.5) * 1000) / 1000;
    const leading = rnd() < 0.2;
    const pfCell = leading ? pickOf([`${pf} lead`, `${pf} leading`, `${pf}cap`, `${pf} LEAD`]) : rnd() < 0.3 ? pickOf([`${pf} lag`, `${pf} ind`, `${pf} lagging`]) : pf;
    const nl = rnd() < 0.5 ? 0 : Math.round(rnd() * 100) / 100;
    const nlCell = rnd() < 0.3 ? `${Math.round(nl * 100)} %` : nl;
    const dm = rnd() < 0.6 ? 1 : Math.round((0.2 + rnd() * 0.8) * 100) / 100;
    const dmCell = rnd() < 0.3 ? `${Math.round(dm * 100)}%` : dm;
    out.connections.push([spelling]);
    out.loads.push([load]);
    out.powerFactors.push([pfCell]);
    out.nonlinear.push([nlCell]);
    out.demand.push([dmCell]);
    out.circuits.push({
      connection,
      load: watts,
      apparent,
      pf,
      leading,
      nonlinear: typeof nlCell === 'string' ? Math.round(nl * 100) / 100 : nl,
      demand: typeof dmCell === 'string' ? Math.round(dm * 100) / 100 : dm,
    });
  }
  return out;
}
