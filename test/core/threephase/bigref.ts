/**
 * High-precision reference solutions for stiff networks: complex arithmetic on decimal.js
 * numbers at 60 significant digits (registry library `decimal.js`), and nodal analysis
 * solved by Gaussian elimination with partial pivoting — a different formulation from the
 * project's solvers (no Millman sum, no star–delta conversion), in arithmetic that keeps
 * 40 digits after the 18 orders of magnitude an impedance ratio of 1e18 can cancel.
 * - star: unknowns U1, U2, U3 (load terminals) and V (star point) from the source
 *   neutral; every line impedance a branch of its own (must be non-zero);
 * - delta: unknowns U1, U2, U3 (corners), fed by a source with the given line voltages
 *   (E1 = 0, E2 = −V12, E3 = V31); line and branch impedances non-zero.
 */
import Decimal from 'decimal.js';

const D = Decimal.clone({ precision: 60 });
type Dec = InstanceType<typeof D>;

export type C = { re: number; im: number };

class DC {
  constructor(
    readonly re: Dec,
    readonly im: Dec,
  ) {}
  static of(z: C): DC {
    return new DC(new D(z.re), new D(z.im));
  }
  static zero(): DC {
    return new DC(new D(0), new D(0));
  }
  add(o: DC): DC {
    return new DC(this.re.plus(o.re), this.im.plus(o.im));
  }
  sub(o: DC): DC {
    return new DC(this.re.minus(o.re), this.im.minus(o.im));
  }
  mul(o: DC): DC {
    return new DC(this.re.times(o.re).minus(this.im.times(o.im)), this.re.times(o.im).plus(this.im.times(o.re)));
  }
  div(o: DC): DC {
    const d = o.re.times(o.re).plus(o.im.times(o.im));
    return new DC(this.re.times(o.re).plus(this.im.times(o.im)).div(d), this.im.times(o.re).minus(this.re.times(o.im)).div(d));
  }
  neg(): DC {
    return new DC(this.re.neg(), this.im.neg());
  }
  inv(): DC {
    return new DC(new D(1), new D(0)).div(this);
  }
  abs2(): Dec {
    return this.re.times(this.re).plus(this.im.times(this.im));
  }
  toC(): C {
    return { re: this.re.toNumber(), im: this.im.toNumber() };
  }
}

function solve(aIn: DC[][], bIn: DC[]): DC[] {
  const n = bIn.length;
  const a = aIn.map((r) => r.slice());
  const b = bIn.slice();
  for (let col = 0; col < n; col++) {
    let p = col;
    for (let r = col + 1; r < n; r++) if (a[r][col].abs2().gt(a[p][col].abs2())) p = r;
    [a[p], a[col]] = [a[col], a[p]];
    [b[p], b[col]] = [b[col], b[p]];
    for (let r = col + 1; r < n; r++) {
      const f = a[r][col].div(a[col][col]);
      for (let c = col; c < n; c++) a[r][c] = a[r][c].sub(f.mul(a[col][c]));
      b[r] = b[r].sub(f.mul(b[col]));
    }
  }
  const x: DC[] = new Array<DC>(n);
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r];
    for (let c = r + 1; c < n; c++) s = s.sub(a[r][c].mul(x[c]));
    x[r] = s.div(a[r][r]);
  }
  return x;
}

export interface BigStar {
  currents: C[];
  loadVoltages: C[];
  neutralCurrent: C;
  shift: C;
}

/** Admittance of an impedance, 0 for 'open'. */
const admit = (x: C | 'open'): DC => (x === 'open' ? DC.zero() : DC.of(x).inv());

/** Star load with non-zero line impedances, loads 'open' or non-zero; neutral 'solid', 'open' or a non-zero impedance. */
export function bigStar(e: readonly C[], z: ReadonlyArray<C | 'open'>, zl: readonly C[], neutral: C | 'solid' | 'open'): BigStar {
  const E = e.map(DC.of);
  const yl = zl.map((x) => DC.of(x).inv());
  const yz = z.map(admit);
  const n = neutral === 'solid' ? 3 : 4;
  const a: DC[][] = Array.from({ length: n }, () => Array.from({ length: n }, () => DC.zero()));
  const b: DC[] = Array.from({ length: n }, () => DC.zero());
  for (let k = 0; k < 3; k++) {
    // terminal k: (U_k − E_k)·YL_k + (U_k − V)·Y_k = 0
    a[k][k] = yl[k].add(yz[k]);
    b[k] = E[k].mul(yl[k]);
    if (n === 4) {
      a[k][3] = yz[k].neg();
      // star point: Σ (V − U_k)·Y_k + V·Y_N = 0
      a[3][k] = yz[k].neg();
      a[3][3] = a[3][3].add(yz[k]);
    }
  }
  if (n === 4 && neutral !== 'open' && neutral !== 'solid') a[3][3] = a[3][3].add(DC.of(neutral).inv());
  const x = solve(a, b);
  const v = n === 4 ? x[3] : DC.zero();
  const currents = [0, 1, 2].map((k) => x[k].sub(v).mul(yz[k]));
  const iN = neutral === 'open' ? DC.zero() : neutral === 'solid' ? currents[0].add(currents[1]).add(currents[2]) : v.mul(DC.of(neutral).inv());
  return {
    currents: currents.map((i) => i.toC()),
    // an open load has the whole terminal-to-star-point voltage across it
    loadVoltages: [0, 1, 2].map((k) => x[k].sub(v).toC()),
    neutralCurrent: iN.toC(),
    shift: v.toC(),
  };
}

export interface BigDelta {
  lineCurrents: C[];
  branchCurrents: C[];
  branchVoltages: C[];
}

/** Delta load with non-zero line impedances and branch impedances Z12, Z23, Z31 ('open' or non-zero). */
export function bigDelta(vLine: readonly C[], z: ReadonlyArray<C | 'open'>, zl: readonly C[]): BigDelta {
  const V = vLine.map(DC.of);
  const e = [DC.zero(), V[0].neg(), V[2]];
  const yl = zl.map((x) => DC.of(x).inv());
  const yb = z.map(admit);
  const ends = [
    [0, 1],
    [1, 2],
    [2, 0],
  ] as const;
  const a: DC[][] = Array.from({ length: 3 }, () => Array.from({ length: 3 }, () => DC.zero()));
  const b = e.map((ek, k) => ek.mul(yl[k]));
  for (let k = 0; k < 3; k++) a[k][k] = yl[k];
  ends.forEach(([p, q], br) => {
    a[p][p] = a[p][p].add(yb[br]);
    a[q][q] = a[q][q].add(yb[br]);
    a[p][q] = a[p][q].sub(yb[br]);
    a[q][p] = a[q][p].sub(yb[br]);
  });
  const u = solve(a, b);
  return {
    lineCurrents: [0, 1, 2].map((k) => e[k].sub(u[k]).mul(yl[k]).toC()),
    branchCurrents: ends.map(([p, q], br) => u[p].sub(u[q]).mul(yb[br]).toC()),
    branchVoltages: ends.map(([p, q]) => u[p].sub(u[q]).toC()),
  };
}
