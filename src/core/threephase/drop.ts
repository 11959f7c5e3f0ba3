/**
 * Voltage drop along a circuit or feeder: the exact phasor drop beside the usual
 * approximation of IEC 60364-5-52 Annex G,
 *   u = b·(R·cos φ + X·sin φ)·L·I_B,   Δu = 100·u / U0,
 * with b = 2 for a single-phase circuit (out and back) and b = 1 for a balanced three-phase
 * one (the drop of one phase), R and X per unit length of one conductor (Annex G writes
 * R = ρ1·L/S and X = λ·L).
 *
 * Exact, for a load drawing current |I| at power factor cos φ of its own terminal voltage,
 * from a supply held at the nominal voltage: with the load-end voltage U_r as the reference,
 * the drop along the conductors is the phasor D = Z·I∠−φ (Z the impedance of the path), and
 * |U_s| = |U_r + D| gives
 *   |U_r| = √(|U_s|² − Im(D)²) − Re(D),   drop = |U_s| − |U_r|.
 * Re(D) = |I|·(R cos φ + X sin φ) is exactly the approximation; the exact drop adds
 * |U_s| − √(|U_s|² − Im(D)²) ≈ Im(D)²/(2|U_s|), the second-order term of short-line
 * regulation (common practice).
 *
 * Four-wire with the actual neutral current: each phase k, fed at E_k and carrying I_k (on the
 * supply's angle reference) with I_N = I1 + I2 + I3 returning in the neutral, sees
 *   D_k = L·(z·I_k + z_N·I_N),   U_k = E_k − D_k,   drop_k = |E_k| − |U_k|,
 * and the approximation of each phase is Annex G's b = 1 form with φ_k the angle from E_k
 * to I_k — which leaves the neutral out, so the two columns show what the neutral adds.
 */
import { PhzError } from '../errors';
import { angleRad, magnitude, rect, type Phasor } from '../phasor';
import { feederMessages as M } from '../messages/feeders';
import type { Triple } from './types';

export type DropSystem = '1P' | '3P' | '3P4W';

export interface DropRow {
  /** The phasor drop: 1P across the loop, 3P line-to-line (referred to the load-end voltage); 3P4W per phase on the supply's reference. */
  readonly phasor: Phasor;
  /** |U_s| − |U_r| in volts (1P: circuit voltage; 3P: line to line; 3P4W: line to neutral). */
  readonly volts: number;
  readonly percent: number;
  /** The Annex G approximation in the same volts. */
  readonly approxVolts: number;
  readonly approxPercent: number;
}

/** |U_s| − |U_r| for a path drop D referred to U_r, with |U_s| given; throws when no load-end voltage exists. */
function exactDrop(us: number, d: Phasor, where: string, nominal: string): number {
  const im2 = d.im * d.im;
  const rest = us * us - im2;
  const ur = rest > 0 ? Math.sqrt(rest) - d.re : -1;
  if (!(ur > 0)) throw new PhzError(M.dropTooLarge(where, `${Number(magnitude(d).toPrecision(4))} V`, nominal));
  // us − (√(us² − im²) − re), with the difference of the square root formed without cancellation
  return d.re + im2 / (us + Math.sqrt(rest));
}

/**
 * Single-phase two-wire (b = 2 when the return conductor matches) or balanced three-phase
 * (b = 1 per phase, √3 in line-to-line volts). `current` is the load current magnitude,
 * `pf` cos φ in (0, 1], `leading` for a capacitive load; `z` and `zReturn` per unit length,
 * `length` in the same unit; `nominal` the circuit voltage (1P) or line-to-line (3P).
 */
export function dropSinglePath(system: '1P' | '3P', current: number, pf: number, leading: boolean, z: Phasor, zReturn: Phasor, length: number, nominal: number): DropRow {
  const sin = Math.sqrt((1 - pf) * (1 + pf));
  const i = rect(current * pf, leading ? current * sin : -current * sin);
  const path = system === '1P' ? z.add(zReturn).mul(length) : z.mul(length);
  const d = path.mul(i);
  const k = system === '1P' ? 1 : Math.sqrt(3);
  const us = nominal / k;
  const drop = exactDrop(us, d, 'current', `${nominal} V`);
  return {
    phasor: d.mul(k),
    volts: k * drop,
    percent: (100 * drop) / us,
    approxVolts: k * d.re,
    approxPercent: (100 * d.re) / us,
  };
}

/**
 * Three-phase four-wire with the actual neutral current: one row per phase. `supply` the
 * phase voltages E1, E2, E3; `currents` I1, I2, I3 on the same angle reference.
 */
export function dropFourWire(supply: Triple<Phasor>, currents: Triple<Phasor>, z: Phasor, zNeutral: Phasor, length: number): DropRow[] {
  const iN = currents[0].add(currents[1]).add(currents[2]);
  const vN = zNeutral.mul(iN).mul(length);
  return [0, 1, 2].map((k) => {
    const e = supply[k];
    const em = magnitude(e);
    if (em === 0) throw new PhzError(M.dropVoltageZero(`voltage, phase ${k + 1}`));
    const line = z.mul(currents[k]).mul(length);
    const d = line.add(vN);
    const u = e.sub(d);
    // |E| − |U| = (|E|² − |U|²)/(|E| + |U|) = (2·Re(E·D*) − |D|²)/(|E| + |U|): no cancellation of nearly equal magnitudes
    const volts = (2 * (e.re * d.re + e.im * d.im) - (d.re * d.re + d.im * d.im)) / (em + magnitude(u));
    // Annex G, b = 1: |I|·L·(R cos φ + X sin φ) = Re(z·L·I·e^(−j∠E)), φ from E_k to I_k
    const ref = angleRad(e);
    const approx = line.re * Math.cos(ref) + line.im * Math.sin(ref);
    return { phasor: d, volts, percent: (100 * volts) / em, approxVolts: approx, approxPercent: (100 * approx) / em };
  });
}
