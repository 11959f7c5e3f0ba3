/**
 * Star (wye) load fed from a star source: exact solution by Millman's theorem with the
 * line and neutral admittances.
 *
 * Circuit: source phase k (EMF E_k from the source neutral N) → line impedance ZL_k →
 * load impedance Z_k → load star point N'. N' is joined to N through the neutral: solid
 * (0 Ω), an impedance Z_N, or open (three-wire, N' floats).
 *
 * With branch admittances Y_k = 1/(Z_k + ZL_k) and Y_N = 1/Z_N, KCL at N' gives
 *   V_N'N = Σ E_k·Y_k / (Σ Y_k + Y_N)          (Millman)
 * and I_k = (E_k − V_N'N)·Y_k, I_N = Σ I_k (flowing from N' to N). Limits are solved
 * exactly rather than approximated: a 0 Ω branch pins N' to that branch's EMF, an open
 * branch has Y = 0.
 *
 * Stiff networks (impedances many orders of magnitude apart, as when 1e9 Ω stands for an
 * open and 1e-9 Ω for a short) keep their digits: E_k − V_N'N is never formed as a
 * difference of two nearly equal potentials but as the algebraically equal
 *   E_k − V_N'N = (E_k·Y_N + Σ_j (E_k − E_j)·Y_j) / (Σ Y_j + Y_N),
 * which needs only differences of the source EMFs; the current of an impedant neutral is
 * V_N'N·Y_N and that of an open neutral exactly 0, not the sum of the line currents.
 */
import { PhzError } from '../errors';
import { ZERO, magnitudeOf, rect, type Phasor } from '../phasor';
import { threePhaseMessages as M } from '../messages/threephase';
import { ZERO_REL, isOpen, type Impedance, type Triple } from './types';

/** The neutral connection between load star point and source neutral. */
export type Neutral = { readonly kind: 'solid' } | { readonly kind: 'impedance'; readonly z: Phasor } | { readonly kind: 'open' };

export interface StarInput {
  /** Source phase EMFs E1, E2, E3 (line-to-neutral). */
  readonly sources: Triple<Phasor>;
  /** Load impedances Z1, Z2, Z3; `OPEN` for a disconnected phase. */
  readonly loads: Triple<Impedance>;
  /** Line impedances ZL1, ZL2, ZL3 (0 for none). */
  readonly lines: Triple<Phasor>;
  readonly neutral: Neutral;
}

export interface StarSolution {
  /** Line currents I1, I2, I3 (source → load). */
  readonly currents: Triple<Phasor>;
  /** Voltages across the load impedances (load terminal to N'). */
  readonly loadVoltages: Triple<Phasor>;
  /** Load complex powers S_k = V_k·I_k*. */
  readonly loadPowers: Triple<Phasor>;
  /** Neutral current from N' to N (= I1 + I2 + I3). */
  readonly neutralCurrent: Phasor;
  /** Star-point shift V_N'N. */
  readonly shift: Phasor;
  /** Total load complex power. */
  readonly totalLoadPower: Phasor;
  /** Power delivered by the source, Σ E_k·I_k*. */
  readonly sourcePower: Phasor;
  /** Losses in the line impedances, Σ |I_k|²·ZL_k. */
  readonly linePower: Phasor;
  /** Loss in the neutral impedance, |I_N|²·Z_N. */
  readonly neutralPower: Phasor;
}

const PHASE_WHAT = (k: number, hasLine: boolean): string => (hasLine ? `load + line impedance of phase ${k}` : `the load impedance of phase ${k}`);

/** Branch kinds, kept as numbers so the solve runs on plain doubles (it is on the hot path). */
const OPEN_B = 0;
const SHORT_B = 1;
const ADMIT_B = 2;

/**
 * Solves a star load; throws PhzError for short circuits, all-open loads and resonance
 * (`resonance` is the message, so the delta solver can word it for its own network).
 */
export function solveStar(input: StarInput, resonance: string = M.resonance): StarSolution {
  const { sources: e, loads, lines, neutral } = input;
  if (isOpen(loads[0]) && isOpen(loads[1]) && isOpen(loads[2])) throw new PhzError(M.allOpen('load impedances'));

  // branch admittances Y_k = 1/(Z_k + ZL_k), on plain doubles
  const kind = [OPEN_B, OPEN_B, OPEN_B];
  const yr = [0, 0, 0];
  const yi = [0, 0, 0];
  for (let k = 0; k < 3; k++) {
    const z = loads[k];
    if (isOpen(z)) continue;
    const zr = z.re + lines[k].re;
    const zi = z.im + lines[k].im;
    const m2 = zr * zr + zi * zi;
    const scale = magnitudeOf(z.re, z.im) + magnitudeOf(lines[k].re, lines[k].im);
    if (m2 === 0 || Math.sqrt(m2) <= ZERO_REL * scale) {
      kind[k] = SHORT_B;
    } else {
      kind[k] = ADMIT_B;
      yr[k] = zr / m2;
      yi[k] = -zi / m2;
    }
  }
  let nKind = OPEN_B;
  let ynr = 0;
  let yni = 0;
  if (neutral.kind === 'solid' || (neutral.kind === 'impedance' && neutral.z.re === 0 && neutral.z.im === 0)) {
    nKind = SHORT_B;
  } else if (neutral.kind === 'impedance') {
    nKind = ADMIT_B;
    const m2 = neutral.z.re * neutral.z.re + neutral.z.im * neutral.z.im;
    ynr = neutral.z.re / m2;
    yni = -neutral.z.im / m2;
  }

  let first = -1;
  let second = -1;
  for (let k = 0; k < 3; k++) {
    if (kind[k] !== SHORT_B) continue;
    if (first < 0) first = k;
    else if (second < 0) second = k;
  }
  if (first >= 0) {
    const hasLine = lines.some((z) => z.re !== 0 || z.im !== 0);
    if (nKind === SHORT_B) throw new PhzError(M.sourceShortNeutral(first + 1, PHASE_WHAT(first + 1, hasLine)));
    if (second >= 0) {
      throw new PhzError(M.sourceShortLines(first + 1, second + 1, hasLine ? 'the load + line impedances' : 'the load impedances'));
    }
  }

  const er = [e[0].re, e[1].re, e[2].re];
  const ei = [e[0].im, e[1].im, e[2].im];
  const eMax = Math.max(magnitudeOf(er[0], ei[0]), magnitudeOf(er[1], ei[1]), magnitudeOf(er[2], ei[2]));
  // star-point shift V = V_N'N, and u_k = E_k − V, the voltage across branch k (line + load)
  let vr = 0;
  let vi = 0;
  const ur = [0, 0, 0];
  const ui = [0, 0, 0];
  if (nKind === SHORT_B) {
    // solid neutral: V = 0
    for (let k = 0; k < 3; k++) {
      ur[k] = er[k];
      ui[k] = ei[k];
    }
  } else if (first >= 0) {
    // a 0 Ω branch pins the star point to its EMF; the others see exact differences of EMFs
    vr = er[first];
    vi = ei[first];
    for (let k = 0; k < 3; k++) {
      const dr = er[k] - vr;
      const di = ei[k] - vi;
      // a difference below 1e-12 of the EMFs is rounding noise: that branch carries nothing
      if (k === first || magnitudeOf(dr, di) <= ZERO_REL * eMax) continue;
      ur[k] = dr;
      ui[k] = di;
    }
  } else {
    let nr = 0;
    let ni = 0;
    let dr = ynr;
    let di = yni;
    let scale = magnitudeOf(ynr, yni);
    let nScale = 0;
    for (let k = 0; k < 3; k++) {
      if (kind[k] !== ADMIT_B) continue;
      nr += er[k] * yr[k] - ei[k] * yi[k];
      ni += er[k] * yi[k] + ei[k] * yr[k];
      dr += yr[k];
      di += yi[k];
      const y = magnitudeOf(yr[k], yi[k]);
      scale += y;
      nScale += magnitudeOf(er[k], ei[k]) * y;
    }
    const d2 = dr * dr + di * di;
    if (d2 === 0 || Math.sqrt(d2) <= ZERO_REL * scale) throw new PhzError(resonance);
    // a balanced set on a balanced load leaves Σ E_k·Y_k as rounding noise of a³ = 1 in
    // binary: below 1e-12 of its terms it is 0 (judged on the sum itself, not on V against
    // the EMFs, so a stiff neutral's small but real shift is kept)
    const balanced = magnitudeOf(nr, ni) <= ZERO_REL * nScale;
    if (!balanced) {
      vr = (nr * dr + ni * di) / d2;
      vi = (ni * dr - nr * di) / d2;
    }
    for (let k = 0; k < 3; k++) {
      if (balanced) {
        ur[k] = er[k];
        ui[k] = ei[k];
        continue;
      }
      // u_k = E_k − V = (E_k·Y_N + Σ_j (E_k − E_j)·Y_j) / D: built from differences of the EMFs,
      // never from E_k and V, which agree to every digit when branch k is far stiffer than
      // the rest (a 1e-9 Ω phase beside 1e9 Ω ones); the two forms are equal algebraically
      let pr = er[k] * ynr - ei[k] * yni;
      let pi = er[k] * yni + ei[k] * ynr;
      let size = magnitudeOf(er[k], ei[k]) * magnitudeOf(ynr, yni);
      for (let j = 0; j < 3; j++) {
        if (j === k || kind[j] !== ADMIT_B) continue;
        const xr = er[k] - er[j];
        const xi = ei[k] - ei[j];
        pr += xr * yr[j] - xi * yi[j];
        pi += xr * yi[j] + xi * yr[j];
        size += magnitudeOf(xr, xi) * magnitudeOf(yr[j], yi[j]);
      }
      // below 1e-12 of its terms the sum is rounding noise (equal EMFs on a floating star point)
      if (magnitudeOf(pr, pi) <= ZERO_REL * size) continue;
      ur[k] = (pr * dr + pi * di) / d2;
      ui[k] = (pi * dr - pr * di) / d2;
    }
  }

  // line currents I_k = u_k·Y_k
  const ir = [0, 0, 0];
  const ii = [0, 0, 0];
  for (let k = 0; k < 3; k++) {
    if (kind[k] !== ADMIT_B) continue;
    ir[k] = ur[k] * yr[k] - ui[k] * yi[k];
    ii[k] = ur[k] * yi[k] + ui[k] * yr[k];
  }
  // neutral flow N' → N: V·Y_N through an impedance (not the sum of the line currents, which
  // cancels when the loads are far stiffer than the neutral), none when open
  const fr = nKind === ADMIT_B ? vr * ynr - vi * yni : 0;
  const fi = nKind === ADMIT_B ? vr * yni + vi * ynr : 0;
  if (first >= 0) {
    // KCL at N': the pinned branch carries what the others and the neutral do not
    let or = 0;
    let oi = 0;
    for (let k = 0; k < 3; k++) {
      if (k === first) continue;
      or += ir[k];
      oi += ii[k];
    }
    ir[first] = fr - or;
    ii[first] = fi - oi;
  }

  let inr = fr;
  let ini = fi;
  if (nKind === SHORT_B) {
    inr = ir[0] + ir[1] + ir[2];
    ini = ii[0] + ii[1] + ii[2];
    const iScale = magnitudeOf(ir[0], ii[0]) + magnitudeOf(ir[1], ii[1]) + magnitudeOf(ir[2], ii[2]);
    if (magnitudeOf(inr, ini) <= ZERO_REL * iScale) {
      inr = 0;
      ini = 0;
    }
  }

  const currents: Phasor[] = [];
  const voltages: Phasor[] = [];
  const powers: Phasor[] = [];
  let tr = 0;
  let ti = 0;
  let sr = 0;
  let si = 0;
  let lr = 0;
  let li = 0;
  for (let k = 0; k < 3; k++) {
    const z = loads[k];
    // the voltage across the load impedance; an open load has the whole E_k − V across it
    let wr: number;
    let wi: number;
    if (isOpen(z)) {
      wr = ur[k];
      wi = ui[k];
    } else {
      wr = ir[k] * z.re - ii[k] * z.im;
      wi = ir[k] * z.im + ii[k] * z.re;
    }
    // S = U·I*
    const pr = wr * ir[k] + wi * ii[k];
    const pi = wi * ir[k] - wr * ii[k];
    currents.push(rect(ir[k], ii[k]));
    voltages.push(rect(wr, wi));
    powers.push(rect(pr, pi));
    tr += pr;
    ti += pi;
    sr += er[k] * ir[k] + ei[k] * ii[k];
    si += ei[k] * ir[k] - er[k] * ii[k];
    const i2 = ir[k] * ir[k] + ii[k] * ii[k];
    lr += lines[k].re * i2;
    li += lines[k].im * i2;
  }
  const in2 = inr * inr + ini * ini;
  const zn = neutral.kind === 'impedance' ? neutral.z : ZERO;
  return {
    currents: [currents[0], currents[1], currents[2]],
    loadVoltages: [voltages[0], voltages[1], voltages[2]],
    loadPowers: [powers[0], powers[1], powers[2]],
    neutralCurrent: rect(inr, ini),
    shift: rect(vr, vi),
    totalLoadPower: rect(tr, ti),
    sourcePower: rect(sr, si),
    linePower: rect(lr, li),
    neutralPower: nKind === ADMIT_B ? rect(zn.re * in2, zn.im * in2) : ZERO,
  };
}
