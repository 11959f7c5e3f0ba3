/**
 * Independent reference solutions with mathjs (registry library `mathjs`, complex numbers
 * and `lusolve`), formulated differently from the project's solvers so the two cannot
 * share a mistake:
 * - star: nodal analysis with the load-terminal potentials AND the star point as
 *   unknowns (4 equations), line impedances as separate branches (not Millman);
 * - delta: nodal analysis of the three corners fed by an arbitrary star source with the
 *   given line voltages (E1 = 0, E2 = −V12, E3 = V31), not the zero-sequence-free set.
 * Both need non-zero line impedances (every branch an admittance).
 */
import * as math from 'mathjs';
import type { Complex as MComplex } from 'mathjs';

export type C = { re: number; im: number };
const c = (z: C): MComplex => math.complex(z.re, z.im);
const out = (z: MComplex): C => ({ re: z.re, im: z.im });
const inv = (z: C): MComplex => math.divide(1, c(z)) as MComplex;

function solve(a: MComplex[][], b: MComplex[]): MComplex[] {
  const x = math.lusolve(a, b) as unknown as MComplex[][];
  return x.map((row) => row[0]);
}

export interface RefStar {
  currents: C[];
  neutralCurrent: C;
  shift: C;
  loadVoltages: C[];
}

/**
 * Star load: unknowns U1, U2, U3 (load terminals) and V (star point), all from the source
 * neutral. neutral: a non-zero impedance, 'solid' or 'open'.
 */
export function referenceStar(e: C[], z: C[], zl: C[], neutral: C | 'solid' | 'open'): RefStar {
  const zero = math.complex(0, 0);
  const yl = zl.map(inv);
  const yz = z.map(inv);
  const n = neutral === 'solid' ? 3 : 4;
  const a: MComplex[][] = Array.from({ length: n }, () => new Array<MComplex>(n).fill(zero));
  const b: MComplex[] = new Array<MComplex>(n).fill(zero);
  const addA = (r: number, col: number, v: MComplex): void => {
    a[r][col] = math.add(a[r][col], v) as MComplex;
  };
  for (let k = 0; k < 3; k++) {
    // terminal k: (U_k − E_k)·YL_k + (U_k − V)·Y_k = 0
    addA(k, k, math.add(yl[k], yz[k]) as MComplex);
    b[k] = math.multiply(c(e[k]), yl[k]) as MComplex;
    if (n === 4) {
      addA(k, 3, math.unaryMinus(yz[k]) as MComplex);
      // star point: Σ (V − U_k)·Y_k + V·Y_N = 0
      addA(3, k, math.unaryMinus(yz[k]) as MComplex);
      addA(3, 3, yz[k]);
    }
  }
  if (n === 4 && neutral !== 'open' && neutral !== 'solid') addA(3, 3, inv(neutral));
  const x = solve(a, b);
  const v = n === 4 ? x[3] : zero;
  const currents = [0, 1, 2].map((k) => math.multiply(math.subtract(x[k], v), yz[k]) as MComplex);
  const iN = math.add(math.add(currents[0], currents[1]), currents[2]) as MComplex;
  return {
    currents: currents.map(out),
    neutralCurrent: out(iN),
    shift: out(v),
    loadVoltages: [0, 1, 2].map((k) => out(math.subtract(x[k], v) as MComplex)),
  };
}

export interface RefDelta {
  lineCurrents: C[];
  branchCurrents: C[];
}

/** Delta load with line impedances (all non-zero), branches Z12, Z23, Z31 (all non-zero). */
export function referenceDelta(vLine: C[], z: C[], zl: C[]): RefDelta {
  const zero = math.complex(0, 0);
  // any source with these line voltages: E1 = 0, E2 = E1 − V12, E3 = E1 + V31
  const e = [zero, math.unaryMinus(c(vLine[0])) as MComplex, c(vLine[2])];
  const yl = zl.map(inv);
  const yb = z.map(inv);
  const ends = [
    [0, 1],
    [1, 2],
    [2, 0],
  ];
  const a: MComplex[][] = Array.from({ length: 3 }, () => new Array<MComplex>(3).fill(zero));
  const b: MComplex[] = e.map((ek, k) => math.multiply(ek, yl[k]) as MComplex);
  for (let k = 0; k < 3; k++) a[k][k] = yl[k];
  ends.forEach(([p, q], br) => {
    a[p][p] = math.add(a[p][p], yb[br]) as MComplex;
    a[q][q] = math.add(a[q][q], yb[br]) as MComplex;
    a[p][q] = math.subtract(a[p][q], yb[br]) as MComplex;
    a[q][p] = math.subtract(a[q][p], yb[br]) as MComplex;
  });
  const u = solve(a, b);
  return {
    lineCurrents: [0, 1, 2].map((k) => out(math.multiply(math.subtract(e[k], u[k]), yl[k]) as MComplex)),
    branchCurrents: ends.map(([p, q], br) => out(math.multiply(math.subtract(u[p], u[q]), yb[br]) as MComplex)),
  };
}
