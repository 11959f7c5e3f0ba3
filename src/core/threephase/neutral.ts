/**
 * Neutral current: phasor sum, the magnitude-only estimate, rms with harmonics, and the
 * sizing rules of IEC 60364-5-52 Annex E and NFPA 70 Art. 220.61.
 */
import { PhzError } from '../errors';
import { NOISE_REL, angleDeg, magnitude, polarDegParts, type Phasor } from '../phasor';
import { threePhaseMessages as M } from '../messages/threephase';
import type { Triple } from './types';

/**
 * Estimate of the neutral current from the three phase-current magnitudes:
 * √(Ia² + Ib² + Ic² − Ia·Ib − Ib·Ic − Ic·Ia). Exact only for currents 120° apart at equal
 * power factor (then the phasor sum has exactly this magnitude); written as
 * √(((Ia−Ib)² + (Ib−Ic)² + (Ic−Ia)²)/2), which is never negative.
 */
export function neutral120(a: number, b: number, c: number): number {
  return Math.sqrt(((a - b) ** 2 + (b - c) ** 2 + (c - a) ** 2) / 2);
}

/** One harmonic order with its content per phase in percent of that phase's fundamental. */
export interface Harmonic {
  readonly order: number;
  readonly percent: Triple<number>;
}

export interface NeutralRmsResult {
  /** rms neutral current, √(Σ_h |I_N,h|²) including the fundamental. */
  readonly rms: number;
  /** Neutral current phasor at the fundamental. */
  readonly fundamental: Phasor;
  /** Magnitude of the neutral current at each harmonic order, in input order. */
  readonly byOrder: ReadonlyArray<readonly [number, number]>;
}

/** Angles of the balanced positive-sequence supply, degrees: the default reference of the harmonics. */
export const BALANCED_ANGLES_DEG: Triple<number> = [0, -120, 120];

/**
 * rms neutral current of three phase currents given as fundamental phasors plus harmonic
 * contents. Phase k's harmonic h has magnitude p_k,h/100·|I_k| and angle h·φ_k, where φ_k
 * is the angle of phase k's supply voltage (0°, −120°, +120° unless the voltages are given).
 *
 * Why the voltage and not the fundamental current: the harmonic currents of a non-linear
 * load (rectifier, switch-mode supply) are drawn in step with the voltage waveform that
 * feeds it, whatever the displacement of its fundamental (a rectifier's 3rd harmonic sits
 * at 3 × its phase-voltage angle, plus a phase lag of its own that is the same on every
 * phase for like loads, so it cannot change the magnitudes of the sums; common practice).
 * Referred to the voltage, the triplens (3, 9, 15 …) of a balanced supply are in phase and add
 * arithmetically — the most the neutral can carry for those magnitudes, the 3 × h × I basis
 * of IEC 60364-5-52 Annex E. Referring them to h × the fundamental-current angle instead
 * would let phases at different power factors partly cancel in the neutral, which they do
 * not in practice: the unsafe side. The rms of the sum of components at different
 * frequencies is the root-sum-square of their rms values (Parseval).
 *
 * `voltages`: the supply phase voltages (only their angles are used), or null for a
 * balanced positive-sequence supply. Throws for a 0 V phase (no angle).
 */
export function neutralRms(currents: Triple<Phasor>, harmonics: readonly Harmonic[], voltages: Triple<Phasor> | null = null, name = 'phase_voltages'): NeutralRmsResult {
  let phi: Triple<number> = BALANCED_ANGLES_DEG;
  if (voltages) {
    voltages.forEach((v, k) => {
      if (v.re === 0 && v.im === 0) throw new PhzError(M.zeroVoltageAngle(name, k + 1));
    });
    phi = [angleDeg(voltages[0]), angleDeg(voltages[1]), angleDeg(voltages[2])];
  }
  const fundamental = currents[0].add(currents[1]).add(currents[2]);
  const scale = magnitude(currents[0]) + magnitude(currents[1]) + magnitude(currents[2]);
  const snap = (x: number): number => (x <= NOISE_REL * scale ? 0 : x);
  const f = snap(magnitude(fundamental));
  let sumSq = f * f;
  const byOrder: Array<readonly [number, number]> = [];
  const part = { re: 0, im: 0 };
  for (const h of harmonics) {
    let re = 0;
    let im = 0;
    for (let k = 0; k < 3; k++) {
      // h·φ reduced to one turn first (exact in binary), so multiples of 15° stay exact
      polarDegParts((h.percent[k] / 100) * magnitude(currents[k]), (h.order * phi[k]) % 360, part);
      re += part.re;
      im += part.im;
    }
    const m = snap(Math.hypot(re, im));
    byOrder.push([h.order, m]);
    sumSq += m * m;
  }
  return { rms: Math.sqrt(sumSq), fundamental: f === 0 ? fundamental.mul(0) : fundamental, byOrder };
}

export type SizingBasis = 'phase' | 'neutral';

export interface SizingResult {
  /** The current the cable's tabulated current-carrying capacity must meet. */
  readonly current: number;
  /** The reduction factor of Table E.52.1. */
  readonly factor: number;
  /** Whether size selection is based on the line or the neutral current. */
  readonly basis: SizingBasis;
}

/**
 * IEC 60364-5-52:2009 Annex E, Table E.52.1 (four- and five-core cables with four
 * cores carrying current): third-harmonic content of the line current
 *   0–15 %: factor 1.0, size on the line current;
 *   >15–33 %: 0.86 on the line current;
 *   >33–45 %: 0.86 on the neutral current 3·(h/100)·I_B;
 *   >45 %: 1.0 on the neutral current.
 * The current to size for is the basis current divided by the factor.
 */
export function sizingCurrent(designCurrent: number, thirdPct: number): SizingResult {
  if (!(designCurrent >= 0)) throw new PhzError(M.negativeCurrent('design_current', designCurrent));
  if (!(thirdPct >= 0)) throw new PhzError(M.negativePercent('third_harmonic_pct', thirdPct));
  const neutral = (3 * thirdPct * designCurrent) / 100;
  if (thirdPct <= 15) return { current: designCurrent, factor: 1, basis: 'phase' };
  if (thirdPct <= 33) return { current: designCurrent / 0.86, factor: 0.86, basis: 'phase' };
  if (thirdPct <= 45) return { current: neutral / 0.86, factor: 0.86, basis: 'neutral' };
  return { current: neutral, factor: 1, basis: 'neutral' };
}

/**
 * Feeder or service neutral load per NFPA 70 (National Electrical Code) Art. 220.61:
 * the maximum unbalanced load, with (B)(2) the portion of the linear unbalanced load in
 * excess of 200 A taken at 70 %, and (C)(2) no reduction for the portion consisting of
 * nonlinear loads supplied from a 4-wire wye-connected three-phase system. Reading of the
 * 2023 edition (the same numbering since the 2005 reorganisation, from memory).
 */
export function neutralDemand(linear: number, nonlinear: number): number {
  if (!(linear >= 0)) throw new PhzError(M.negativeLoad('unbalanced_load', linear));
  if (!(nonlinear >= 0)) throw new PhzError(M.negativeLoad('nonlinear_load', nonlinear));
  return Math.min(linear, 200) + 0.7 * Math.max(linear - 200, 0) + nonlinear;
}
