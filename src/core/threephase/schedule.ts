/**
 * Panel schedules: a list of circuits (connection, complex power, non-linear share) on a
 * three-phase four-wire supply → line currents, neutral current (fundamental and rms with
 * harmonics), per-line powers, the NFPA 70 220.61 maximum unbalanced load and the current
 * unbalance.
 *
 * Model (every load taken at the supply voltages, no voltage drop; S = V·I*):
 * - line to neutral on phase k: I = (S / E_k)*, out of line k and back in the neutral;
 * - line to line p-q: I = (S / V_pq)* with V_pq = E_p − E_q, out of line p and into line q
 *   — the exact phasor contribution, whose power E_p·I* − E_q·I* = V_pq·I* is S;
 * - three-phase: a balanced positive-sequence set of currents, I1 = (S / (3·V₁))*, I2 = a²·I1,
 *   I3 = a·I1, where V₁ = (E1 + a·E2 + a²·E3)/3 is the positive-sequence supply voltage (E1
 *   on a balanced supply, so S/3 per phase at its phase voltage). The set sums to zero, so a
 *   three-phase circuit puts nothing into the neutral, and its power Σ E_k·I_k* = 3·V₁·I1* is
 *   S exactly, on any supply (common practice: three-phase equipment is a three-wire load
 *   drawing balanced currents).
 * Circuits are summed per connection (seven groups) before dividing by the voltage: the same
 * currents as circuit by circuit, since I = (S/V)* is linear in S.
 *
 * Harmonics follow the model of `neutralRms`: the non-linear part of a circuit on phase k
 * draws, at order h, p_h/100 of its fundamental current at h × the angle of E_k, so the
 * harmonic currents of the non-linear circuits of one phase add arithmetically. Only
 * line-to-neutral circuits put harmonic current into the neutral: the harmonics of
 * line-to-line and three-phase (three-wire) circuits flow out of one line and back in
 * another, and their triplens do not flow in the neutral (common practice).
 */
import { PhzError } from '../errors';
import { A2_OP, A_OP, NOISE_REL, ZERO, angleDeg, magnitudeOf, polarDegParts, rect, type Phasor } from '../phasor';
import { feederMessages as M } from '../messages/feeders';
import type { Triple } from './types';
import type { Harmonic } from './neutral';

/** Where a circuit is connected: phase indexes 0–2 stand for lines 1–3. */
export type Connection =
  | { readonly kind: 'ln'; readonly phase: 0 | 1 | 2 }
  | { readonly kind: 'll'; readonly from: 0 | 1 | 2; readonly to: 0 | 1 | 2 }
  | { readonly kind: '3p' };

/** The seven connection groups, in this order: L1, L2, L3 (to neutral), L1-L2, L2-L3, L3-L1, 3P. */
export const GROUP_NAMES = ['L1', 'L2', 'L3', 'L1-L2', 'L2-L3', 'L3-L1', '3P'] as const;
export type GroupName = (typeof GROUP_NAMES)[number];

/** The group index (0–6) of a connection. */
export function groupOf(c: Connection): number {
  if (c.kind === 'ln') return c.phase;
  if (c.kind === '3p') return 6;
  return 3 + c.from;
}

/** The canonical spelling of a connection (`L1`, `L2-L3`, `3P` …). */
export function connectionName(c: Connection): GroupName {
  return GROUP_NAMES[groupOf(c)];
}

const LN: readonly Connection[] = [
  { kind: 'ln', phase: 0 },
  { kind: 'ln', phase: 1 },
  { kind: 'ln', phase: 2 },
];
const LL: readonly Connection[] = [
  { kind: 'll', from: 0, to: 1 },
  { kind: 'll', from: 1, to: 2 },
  { kind: 'll', from: 2, to: 0 },
];
const THREE: Connection = { kind: '3p' };

/** Words of a three-phase circuit (upper case, spaces removed). */
const THREE_WORDS = new Set(['3P', '3PH', '3Φ', '3Ø', '3PHASE', 'TP']);

export type ConnectionReading = { readonly ok: true; readonly connection: Connection } | { readonly ok: false; readonly repeated: boolean };

/**
 * Reads a connection as a schedule writes it, in any case and with spaces anywhere:
 * line to neutral `1`, `L1`, `A` (also `L1-N`, `AN`); line to line `1-2`, `12`, `L1-L2`,
 * `L1/L2`, `AB` (either order: a load between two lines is the same load whichever line is
 * named first); three-phase `3P`, `3PH`, `3Φ`, `TP`, `123`, `1-2-3`, `L1L2L3`, `ABC`.
 * Numbers read as their digits (12 is lines 1-2).
 */
export function parseConnection(text: string | number): ConnectionReading {
  const key = typeof text === 'string' ? text : String(text);
  const known = READINGS.get(key);
  if (known !== undefined) return known;
  const r = readConnectionText(key);
  // schedules repeat a few spellings: remember them (the readings are immutable)
  if (READINGS.size >= 4096) READINGS.clear();
  READINGS.set(key, r);
  return r;
}

const READINGS = new Map<string, ConnectionReading>();

function readConnectionText(text: string): ConnectionReading {
  let t = text.toUpperCase().replace(/[\s\u00a0]+/g, '').replace(/[\u2010-\u2015\u2212]/g, '-');
  if (THREE_WORDS.has(t)) return { ok: true, connection: THREE };
  // a trailing neutral: L1-N, AN, 1N
  const withNeutral = /^(.+?)-?N$/.exec(t);
  if (withNeutral) t = withNeutral[1];
  const tokens: number[] = [];
  let i = 0;
  while (i < t.length) {
    const ch = t[i];
    if (ch === '-' || ch === '/') {
      // separators only between lines
      if (i === 0 || i === t.length - 1 || t[i + 1] === '-' || t[i + 1] === '/') return { ok: false, repeated: false };
      i++;
      continue;
    }
    if (ch === 'L' && i + 1 < t.length && '123'.includes(t[i + 1])) {
      tokens.push(Number(t[i + 1]) - 1);
      i += 2;
      continue;
    }
    if ('123'.includes(ch)) tokens.push(Number(ch) - 1);
    else if ('ABC'.includes(ch)) tokens.push(ch.charCodeAt(0) - 65);
    else return { ok: false, repeated: false };
    i++;
  }
  if (withNeutral && tokens.length !== 1) return { ok: false, repeated: false };
  const distinct = new Set(tokens).size;
  if (distinct !== tokens.length) return { ok: false, repeated: true };
  if (tokens.length === 1) return { ok: true, connection: LN[tokens[0]] };
  if (tokens.length === 2) {
    const [p, q] = tokens;
    // the pair in the order 1-2, 2-3, 3-1
    const from = (q - p + 3) % 3 === 1 ? p : q;
    return { ok: true, connection: LL[from] };
  }
  if (tokens.length === 3) return { ok: true, connection: THREE };
  return { ok: false, repeated: false };
}

/** One circuit of a schedule: its group (0–6, see GROUP_NAMES), complex power after demand, non-linear share. */
export interface ScheduleCircuit {
  readonly group: number;
  /** S = P + jQ in VA (demand factor applied). */
  readonly re: number;
  readonly im: number;
  /** Share of the load that is non-linear, 0 to 1. */
  readonly nonlinear: number;
  /** Where the circuit sits, for messages (`connections, row 7`); made only when a message needs it. */
  readonly at: () => string;
}

export interface ScheduleResult {
  /** Line currents I1, I2, I3 (supply → board), fundamental. */
  readonly lineCurrents: Triple<Phasor>;
  /** Complex power through each line referred to the neutral, S_k = E_k·I_k* (their sum is the board's power). */
  readonly linePowers: Triple<Phasor>;
  /** Neutral current at the fundamental, from the board to the source (= I1 + I2 + I3). */
  readonly neutral: Phasor;
  /** rms neutral current with the harmonics of the line-to-neutral non-linear circuits. */
  readonly neutralRms: number;
  /** Neutral current of each harmonic order given: [order, magnitude]. */
  readonly byOrder: ReadonlyArray<readonly [number, number]>;
  /** Calculated line-to-neutral load of each phase, A: Σ |S| / |E_k| over its line-to-neutral circuits. */
  readonly lineToNeutralLoad: Triple<number>;
  /** The largest of them: the maximum unbalanced load of NFPA 70 220.61. */
  readonly maxUnbalanced: number;
  /** Current unbalance, %: the largest deviation of |I_k| from their mean, over the mean. */
  readonly unbalancePct: number;
  /** Total complex power of the circuits, Σ S. */
  readonly totalPower: Phasor;
  /** Complex power of each group (GROUP_NAMES order). */
  readonly groupPowers: readonly Phasor[];
  /** Current of each group: line-to-neutral and line-to-line currents, and I1 of the three-phase set. */
  readonly groupCurrents: readonly Phasor[];
}

const GROUP_VOLTAGE = ['E1', 'E2', 'E3', 'V12 = E1 − E2', 'V23 = E2 − E3', 'V31 = E3 − E1', 'the positive-sequence voltage'];

/** `z`, or exactly 0 when its magnitude is within NOISE_REL of `scale`. */
function snap(re: number, im: number, scale: number): Phasor {
  return magnitudeOf(re, im) <= NOISE_REL * scale ? ZERO : rect(re, im);
}

/** A part below NOISE_REL of the magnitude is rounding noise: exactly 0 (a resistive load's Q). */
function snapParts(z: Phasor): Phasor {
  const m = magnitudeOf(z.re, z.im);
  const re = Math.abs(z.re) <= NOISE_REL * m ? 0 : z.re;
  const im = Math.abs(z.im) <= NOISE_REL * m ? 0 : z.im;
  return re === z.re && im === z.im ? z : rect(re, im);
}

/**
 * Aggregates a schedule. `supply`: phase voltages E1, E2, E3 (line to neutral). Throws
 * PhzError when the schedule holds no load, or a loaded group sits across 0 V.
 */
export function aggregateSchedule(supply: Triple<Phasor>, circuits: readonly ScheduleCircuit[], harmonics: readonly Harmonic[]): ScheduleResult {
  // per group: Σ S (re, im), Σ |S| of the circuits, Σ nonlinear·|S|, and the first circuit (for messages)
  const sr = [0, 0, 0, 0, 0, 0, 0];
  const si = [0, 0, 0, 0, 0, 0, 0];
  const sAbs = [0, 0, 0, 0, 0, 0, 0];
  const nlAbs = [0, 0, 0];
  const first: Array<(() => string) | undefined> = new Array<(() => string) | undefined>(7);
  let loaded = false;
  for (let c = 0; c < circuits.length; c++) {
    const x = circuits[c];
    const m = magnitudeOf(x.re, x.im);
    if (m === 0) continue;
    loaded = true;
    const g = x.group;
    sr[g] += x.re;
    si[g] += x.im;
    sAbs[g] += m;
    if (g < 3) nlAbs[g] += x.nonlinear * m;
    if (first[g] === undefined) first[g] = x.at;
  }
  if (!loaded) throw new PhzError(M.noLoad);

  const [e1, e2, e3] = supply;
  const vPos = e1.add(e2.mul(A_OP)).add(e3.mul(A2_OP)).div(3);
  const across: Phasor[] = [e1, e2, e3, e1.sub(e2), e2.sub(e3), e3.sub(e1), vPos];
  const groupPowers: Phasor[] = [];
  const groupCurrents: Phasor[] = [];
  for (let g = 0; g < 7; g++) {
    const s = rect(sr[g], si[g]);
    groupPowers.push(s);
    if (first[g] === undefined) {
      groupCurrents.push(ZERO);
      continue;
    }
    const v = across[g];
    // a voltage below 1e-12 of the supply is rounding noise of a difference: 0 V
    const vScale = g < 3 ? 0 : magnitudeOf(supply[0].re, supply[0].im) + magnitudeOf(supply[1].re, supply[1].im) + magnitudeOf(supply[2].re, supply[2].im);
    const vm = magnitudeOf(v.re, v.im);
    if (vm === 0 || vm <= NOISE_REL * vScale) throw new PhzError(M.zeroSupply((first[g] as () => string)(), GROUP_VOLTAGE[g]));
    // I = (S/V)*; the three-phase set carries S/3 per phase
    groupCurrents.push((g === 6 ? s.div(3) : s).div(v).conjugate());
  }
  const [i1n, i2n, i3n, i12, i23, i31, i3p] = groupCurrents;
  const lineTerms: Phasor[][] = [
    [i1n, i12, i31.neg(), i3p],
    [i2n, i23, i12.neg(), i3p.mul(A2_OP)],
    [i3n, i31, i23.neg(), i3p.mul(A_OP)],
  ];
  const lines = lineTerms.map((terms) => {
    let re = 0;
    let im = 0;
    let scale = 0;
    for (const z of terms) {
      re += z.re;
      im += z.im;
      scale += magnitudeOf(z.re, z.im);
    }
    return snap(re, im, scale);
  });
  const neutral = snap(i1n.re + i2n.re + i3n.re, i1n.im + i2n.im + i3n.im, magnitudeOf(i1n.re, i1n.im) + magnitudeOf(i2n.re, i2n.im) + magnitudeOf(i3n.re, i3n.im));
  const linePowers = lines.map((i, k) => snapParts(supply[k].mul(i.conjugate())));

  // harmonics of the non-linear line-to-neutral circuits, referred to the supply-voltage angles
  const phi = [angleDeg(e1), angleDeg(e2), angleDeg(e3)];
  const nlCurrent = [0, 1, 2].map((k) => (nlAbs[k] === 0 ? 0 : nlAbs[k] / magnitudeOf(supply[k].re, supply[k].im)));
  const nf = magnitudeOf(neutral.re, neutral.im);
  let sumSq = nf * nf;
  const byOrder: Array<readonly [number, number]> = [];
  const part = { re: 0, im: 0 };
  for (const h of harmonics) {
    let re = 0;
    let im = 0;
    let scale = 0;
    for (let k = 0; k < 3; k++) {
      const m = (h.percent[k] / 100) * nlCurrent[k];
      if (m === 0) continue;
      // h·φ reduced to one turn first (exact in binary), so multiples of 15° stay exact
      polarDegParts(m, (h.order * phi[k]) % 360, part);
      re += part.re;
      im += part.im;
      scale += m;
    }
    const mag = magnitudeOf(re, im) <= NOISE_REL * scale ? 0 : magnitudeOf(re, im);
    byOrder.push([h.order, mag]);
    sumSq += mag * mag;
  }

  const lineToNeutralLoad: Triple<number> = [0, 1, 2].map((k) => (sAbs[k] === 0 ? 0 : sAbs[k] / magnitudeOf(supply[k].re, supply[k].im))) as unknown as Triple<number>;
  const mags = lines.map((z) => magnitudeOf(z.re, z.im));
  const mean = (mags[0] + mags[1] + mags[2]) / 3;
  const dev = Math.max(Math.abs(mags[0] - mean), Math.abs(mags[1] - mean), Math.abs(mags[2] - mean));
  const unbalancePct = mean === 0 || dev <= NOISE_REL * mean ? 0 : (100 * dev) / mean;

  let tr = 0;
  let ti = 0;
  for (let g = 0; g < 7; g++) {
    tr += sr[g];
    ti += si[g];
  }
  return {
    lineCurrents: [lines[0], lines[1], lines[2]],
    linePowers: [linePowers[0], linePowers[1], linePowers[2]],
    neutral,
    neutralRms: Math.sqrt(sumSq),
    byOrder,
    lineToNeutralLoad,
    maxUnbalanced: Math.max(...lineToNeutralLoad),
    unbalancePct,
    totalPower: rect(tr, ti),
    groupPowers,
    groupCurrents,
  };
}
