/**
 * Delta load given its line-to-line supply voltages, exact with or without line
 * impedances.
 *
 * Without line impedances each branch sees its line voltage: I_kl = V_kl / Z_kl, and the
 * line currents follow from KCL at the delta corners: I1 = I12 − I31, I2 = I23 − I12,
 * I3 = I31 − I23.
 *
 * With line impedances the supply is represented by the star set with the same line
 * voltages and no zero sequence (a three-wire delta draws no zero-sequence current, so
 * that part of the source cannot matter). The line currents are those of the star
 * equivalent of the delta (Kennelly) on a three-wire star solve, which forms them from
 * differences of the supply EMFs and so keeps its digits in stiff networks (1e9 Ω beside
 * 1e-6 Ω). Each branch current then comes from whichever of two exact relations has the
 * smaller rounding bound for that branch:
 *   the divider around the delta  I12 = (Z31·I1 − Z23·I2)/(Z12 + Z23 + Z31)  (KCL + KVL), or
 *   Ohm's law on the corner voltage  I12 = (V12 − ZL1·I1 + ZL2·I2)/Z12,
 * so a current is never taken from two nearly equal potentials. A delta with two open
 * branches is one series circuit; a delta whose impedances nearly sum to zero (no star
 * equivalent) is solved by modified nodal analysis of the three corners, with one unknown
 * current and one constraint row per 0 Ω element.
 */
import { PhzError } from '../errors';
import { ONE, ZERO, magnitude, snapToZero, type Phasor } from '../phasor';
import { threePhaseMessages as M } from '../messages/threephase';
import { closeLineSet, deltaToStar, starOfClosedLineSet } from './sets';
import { solveStar } from './star';
import { solveLinear } from './linear';
import { isOpen, isZeroish, type Impedance, type Triple } from './types';

export interface DeltaInput {
  /** Supply line-to-line voltages V12, V23, V31. */
  readonly lineVoltages: Triple<Phasor>;
  /** Branch impedances Z12, Z23, Z31; `OPEN` for a missing branch. */
  readonly loads: Triple<Impedance>;
  /** Line impedances ZL1, ZL2, ZL3, or null for none. */
  readonly lines: Triple<Phasor> | null;
}

export interface DeltaSolution {
  /** Line currents I1, I2, I3 (supply → load). */
  readonly lineCurrents: Triple<Phasor>;
  /** Branch currents I12, I23, I31 (from the first-named corner to the second). */
  readonly branchCurrents: Triple<Phasor>;
  /** Voltages across the branch impedances (V at corner k − V at corner l). */
  readonly branchVoltages: Triple<Phasor>;
  /** Branch complex powers S_kl = V_kl·I_kl*. */
  readonly branchPowers: Triple<Phasor>;
  /** Power delivered by the supply (star equivalent), Σ E_k·I_k*. */
  readonly sourcePower: Phasor;
  /** Losses in the line impedances, Σ |I_k|²·ZL_k. */
  readonly linePower: Phasor;
}

const BRANCH = ['12', '23', '31'] as const;
/** Corners of branch b: 12 → (0, 1), 23 → (1, 2), 31 → (2, 0). */
const ENDS: ReadonlyArray<readonly [number, number]> = [
  [0, 1],
  [1, 2],
  [2, 0],
];

/** Solves a delta load; throws PhzError for supply short circuits, all-open loads and resonance. */
export function solveDelta(input: DeltaInput): DeltaSolution {
  const { loads } = input;
  const vLine = closeLineSet(input.lineVoltages, 'line_voltages');
  if (isOpen(loads[0]) && isOpen(loads[1]) && isOpen(loads[2])) throw new PhzError(M.allOpen('branch impedances'));
  const lines = input.lines;
  const noLines = lines === null || lines.every((z) => z.re === 0 && z.im === 0);
  return noLines ? direct(vLine, loads) : nodal(vLine, loads, lines as Triple<Phasor>);
}

function direct(v: Triple<Phasor>, loads: Triple<Impedance>): DeltaSolution {
  const ib: Phasor[] = [];
  for (let b = 0; b < 3; b++) {
    const z = loads[b];
    if (isOpen(z)) {
      ib.push(ZERO);
      continue;
    }
    if (z.re === 0 && z.im === 0) throw new PhzError(M.deltaBranchShort(BRANCH[b], ENDS[b][0] + 1, ENDS[b][1] + 1));
    ib.push(v[b].div(z));
  }
  return finish(v, ib, [ib[0].sub(ib[2]), ib[1].sub(ib[0]), ib[2].sub(ib[1])], starOfClosedLineSet(v), null, true);
}

/** Union–find over the six nodes: supply terminals S1..S3 (0–2) and load corners A1..A3 (3–5). */
function shortGroups(lineShort: readonly boolean[], branchShort: readonly boolean[]): number[] {
  const parent = [0, 1, 2, 3, 4, 5];
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x])));
  const join = (x: number, y: number): void => {
    parent[find(x)] = find(y);
  };
  for (let k = 0; k < 3; k++) if (lineShort[k]) join(k, 3 + k);
  for (let b = 0; b < 3; b++) if (branchShort[b]) join(3 + ENDS[b][0], 3 + ENDS[b][1]);
  return parent.map((_, x) => find(x));
}

/** A delta whose branch impedances sum to less than this share of their sizes has no usable star equivalent. */
const NEAR_RESONANT_REL = 1e-6;

function nodal(v: Triple<Phasor>, loads: Triple<Impedance>, lines: Triple<Phasor>): DeltaSolution {
  const e = starOfClosedLineSet(v);
  const lineShort = lines.map((z) => z.re === 0 && z.im === 0);
  const branchShort = loads.map((z) => !isOpen(z) && z.re === 0 && z.im === 0);
  const g = shortGroups(lineShort, branchShort);
  for (let k = 0; k < 3; k++) {
    for (let l = k + 1; l < 3; l++) {
      if (g[k] === g[l]) throw new PhzError(M.deltaSupplyShort(k + 1, l + 1));
    }
  }
  const open = loads.map(isOpen);
  const nOpen = open.filter(Boolean).length;
  if (nOpen === 2) return singleBranch(v, e, loads, lines, open.indexOf(false));
  if (nOpen === 0) {
    const z = loads as Triple<Phasor>;
    const sum = z[0].add(z[1]).add(z[2]);
    if (magnitude(sum) <= NEAR_RESONANT_REL * (magnitude(z[0]) + magnitude(z[1]) + magnitude(z[2]))) {
      return nodalMna(v, e, loads, lines, lineShort, branchShort);
    }
  }
  return viaStar(v, e, loads, lines);
}

/** Branch b joins corners ENDS[b]; the branch at its first corner before it, and at its second corner after it. */
const PREV = [2, 0, 1];
const NEXT = [1, 2, 0];

/**
 * Line currents from the star equivalent (three-wire star solve), branch currents by the
 * better-conditioned of two exact relations, branch voltages from Ohm's law (or, for an
 * open branch, by the better of two KVL paths).
 */
function viaStar(v: Triple<Phasor>, e: Triple<Phasor>, loads: Triple<Impedance>, lines: Triple<Phasor>): DeltaSolution {
  const arms = deltaToStar(loads[0], loads[1], loads[2]);
  const star = solveStar({ sources: e, loads: arms, lines, neutral: { kind: 'open' } }, M.networkSingular);
  const il = star.currents;
  const openB = loads.findIndex(isOpen);
  const zsum = openB < 0 ? (loads[0] as Phasor).add(loads[1] as Phasor).add(loads[2] as Phasor) : ZERO;
  const zsumMag = magnitude(zsum);
  const ib: Phasor[] = [];
  for (let b = 0; b < 3; b++) {
    const [p, q] = ENDS[b];
    const z = loads[b];
    if (isOpen(z)) {
      ib.push(ZERO);
      continue;
    }
    if (openB >= 0) {
      // the only branch at the corner it shares with the open branch carries that line's current
      ib.push(ENDS[openB][0] === p || ENDS[openB][1] === p ? il[p] : il[q].neg());
      continue;
    }
    const zPrev = loads[PREV[b]] as Phasor;
    const zNext = loads[NEXT[b]] as Phasor;
    // divider: I_pq = (Z_prev·I_p − Z_next·I_q) / ΣZ
    const boundA = (magnitude(zPrev) * magnitude(il[p]) + magnitude(zNext) * magnitude(il[q])) / zsumMag;
    // Ohm: I_pq = (V_pq − ZL_p·I_p + ZL_q·I_q) / Z_pq
    const zMag = magnitude(z);
    const boundB = zMag === 0 ? Infinity : (magnitude(v[b]) + magnitude(lines[p]) * magnitude(il[p]) + magnitude(lines[q]) * magnitude(il[q])) / zMag;
    if (boundA <= boundB) ib.push(zPrev.mul(il[p]).sub(zNext.mul(il[q])).div(zsum));
    else ib.push(v[b].sub(lines[p].mul(il[p])).add(lines[q].mul(il[q])).div(z));
  }
  const vb: Phasor[] = ib.map((i, b) => (isOpen(loads[b]) ? ZERO : (loads[b] as Phasor).mul(i)));
  if (openB >= 0) {
    // across the gap: the supply path V − ZL_p·I_p + ZL_q·I_q, or KVL round the delta −(V_other1 + V_other2)
    const [p, q] = ENDS[openB];
    const o1 = vb[NEXT[openB]];
    const o2 = vb[PREV[openB]];
    const viaLines = v[openB].sub(lines[p].mul(il[p])).add(lines[q].mul(il[q]));
    const boundLines = magnitude(v[openB]) + magnitude(lines[p].mul(il[p])) + magnitude(lines[q].mul(il[q]));
    const boundLoop = magnitude(o1) + magnitude(o2);
    vb[openB] = boundLoop <= boundLines ? o1.add(o2).neg() : viaLines;
  }
  return finish([vb[0], vb[1], vb[2]], ib, il, e, lines, false);
}

/** Two branches open: the remaining branch b in series with its two lines. */
function singleBranch(v: Triple<Phasor>, e: Triple<Phasor>, loads: Triple<Impedance>, lines: Triple<Phasor>, b: number): DeltaSolution {
  const [p, q] = ENDS[b];
  const z = loads[b] as Phasor;
  const loop = z.add(lines[p]).add(lines[q]);
  if (isZeroish(loop, magnitude(z) + magnitude(lines[p]) + magnitude(lines[q]))) throw new PhzError(M.networkSingular);
  const i = v[b].div(loop);
  const ib: Phasor[] = [ZERO, ZERO, ZERO];
  const il: Phasor[] = [ZERO, ZERO, ZERO];
  ib[b] = i;
  il[p] = i;
  il[q] = i.neg();
  const vb: Phasor[] = [0, 1, 2].map((x) => {
    if (x === b) return z.mul(i);
    // across an open branch: the supply path from its first corner to its second
    const [r, t] = ENDS[x];
    return v[x].sub(lines[r].mul(il[r])).add(lines[t].mul(il[t]));
  });
  return finish([vb[0], vb[1], vb[2]], ib, il, e, lines, false);
}

/** Modified nodal analysis of the three corners (the route for a delta with no star equivalent). */
function nodalMna(v: Triple<Phasor>, e: Triple<Phasor>, loads: Triple<Impedance>, lines: Triple<Phasor>, lineShort: readonly boolean[], branchShort: readonly boolean[]): DeltaSolution {

  // unknowns: U1, U2, U3 (corner potentials from the source neutral), then one current per 0 Ω element
  const shortsList: Array<{ kind: 'line'; k: number } | { kind: 'branch'; b: number }> = [];
  for (let k = 0; k < 3; k++) if (lineShort[k]) shortsList.push({ kind: 'line', k });
  for (let b = 0; b < 3; b++) if (branchShort[b]) shortsList.push({ kind: 'branch', b });
  const n = 3 + shortsList.length;
  const a: Phasor[][] = Array.from({ length: n }, () => new Array<Phasor>(n).fill(ZERO));
  const rhs: Phasor[] = new Array<Phasor>(n).fill(ZERO);
  const add = (r: number, c: number, z: Phasor): void => {
    a[r][c] = a[r][c].add(z);
  };

  const yLine: Phasor[] = lines.map((z, k) => (lineShort[k] ? ZERO : ONE.div(z)));
  const yBranch: Phasor[] = loads.map((z, b) => (isOpen(z) || branchShort[b] ? ZERO : ONE.div(z)));
  for (let k = 0; k < 3; k++) {
    if (!lineShort[k]) {
      // current leaving corner k towards the supply: (U_k − E_k)·Y
      add(k, k, yLine[k]);
      rhs[k] = rhs[k].add(e[k].mul(yLine[k]));
    }
  }
  for (let b = 0; b < 3; b++) {
    const [p, q] = ENDS[b];
    const y = yBranch[b];
    if (y.re === 0 && y.im === 0) continue;
    add(p, p, y);
    add(q, q, y);
    add(p, q, y.neg());
    add(q, p, y.neg());
  }
  shortsList.forEach((s, j) => {
    const col = 3 + j;
    if (s.kind === 'line') {
      // current j flows from the supply into corner k; constraint U_k = E_k
      add(s.k, col, ONE.neg());
      add(col, s.k, ONE);
      rhs[col] = e[s.k];
    } else {
      // current j flows from corner p to corner q; constraint U_p − U_q = 0
      const [p, q] = ENDS[s.b];
      add(p, col, ONE);
      add(q, col, ONE.neg());
      add(col, p, ONE);
      add(col, q, ONE.neg());
    }
  });

  const x = solveLinear(a, rhs);
  if (x === null) throw new PhzError(M.networkSingular);
  const u = [x[0], x[1], x[2]];
  const shortCurrent = (pred: (s: (typeof shortsList)[number]) => boolean): Phasor => x[3 + shortsList.findIndex(pred)];

  const ib: Phasor[] = [];
  for (let b = 0; b < 3; b++) {
    const [p, q] = ENDS[b];
    if (isOpen(loads[b])) ib.push(ZERO);
    else if (branchShort[b]) ib.push(shortCurrent((s) => s.kind === 'branch' && s.b === b));
    else ib.push(u[p].sub(u[q]).mul(yBranch[b]));
  }
  const il: Phasor[] = [];
  for (let k = 0; k < 3; k++) {
    il.push(lineShort[k] ? shortCurrent((s) => s.kind === 'line' && s.k === k) : e[k].sub(u[k]).mul(yLine[k]));
  }
  // a 0 Ω branch leaves only rounding noise across it
  const vScale = magnitude(v[0]) + magnitude(v[1]) + magnitude(v[2]);
  const across = (p: number, q: number): Phasor => snapToZero(u[p].sub(u[q]), vScale);
  const vb: Triple<Phasor> = [across(0, 1), across(1, 2), across(2, 0)];
  return finish(vb, ib, il, e, lines, true);
}

function finish(vb: Triple<Phasor>, ib: readonly Phasor[], il: readonly Phasor[], e: Triple<Phasor>, lines: Triple<Phasor> | null, cleanLines: boolean): DeltaSolution {
  const sb = [0, 1, 2].map((b) => vb[b].mul(ib[b].conjugate()));
  let source = ZERO;
  let lineLoss = ZERO;
  for (let k = 0; k < 3; k++) {
    source = source.add(e[k].mul(il[k].conjugate()));
    if (lines) lineLoss = lineLoss.add(lines[k].mul(il[k].re * il[k].re + il[k].im * il[k].im));
  }
  const scale = magnitude(ib[0]) + magnitude(ib[1]) + magnitude(ib[2]);
  // line currents formed as differences of branch currents: below 1e-12 of them, rounding noise
  const clean = (z: Phasor): Phasor => (cleanLines && isZeroish(z, scale) ? ZERO : z);
  return {
    lineCurrents: [clean(il[0]), clean(il[1]), clean(il[2])],
    branchCurrents: [ib[0], ib[1], ib[2]],
    branchVoltages: vb,
    branchPowers: [sb[0], sb[1], sb[2]],
    sourcePower: source,
    linePower: lineLoss,
  };
}
