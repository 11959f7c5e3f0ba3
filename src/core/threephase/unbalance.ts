/**
 * Unbalance factors, in percent.
 *
 * - VUF (IEC 61000-4-30; the IEC Electropedia term "voltage unbalance factor"): |V−|/|V+|·100.
 *   IEEE Std 1159 defines voltage unbalance by the same sequence ratio (from memory).
 * - ZERO: |V0|/|V+|·100 (zero-sequence unbalance, phase quantities).
 * - LVUR (NEMA MG 1, "percent unbalance"): the maximum deviation of the three line-voltage
 *   magnitudes from their average, over the average.
 * - PVUR (phase voltage unbalance rate, IEEE Std 112, test procedure for polyphase induction
 *   motors and generators — from memory): the same on phase magnitudes. Von Jouanne and
 *   Banerjee, "Assessment of Voltage Unbalance", IEEE Trans. Power Delivery 16(4), 2001,
 *   discuss these definitions side by side.
 * - MAG (IEC 61000-4-30, the magnitude-only formula for three-wire systems):
 *   u2 = √((1 − √(3 − 6β)) / (1 + √(3 − 6β)))·100, β = ΣU⁴/(ΣU²)².
 */
import { PhzError } from '../errors';
import { magnitude, type Phasor } from '../phasor';
import { threePhaseMessages as M } from '../messages/threephase';
import { toSequence } from './sequences';
import type { Triple } from './types';

export type UnbalanceMethod = 'VUF' | 'ZERO' | 'LVUR' | 'PVUR' | 'MAG';

/** |negative|/|positive|·100. */
export function vuf(p: Triple<Phasor>, name = 'values'): number {
  const [, pos, neg] = toSequence(p);
  const d = magnitude(pos);
  if (d === 0) throw new PhzError(M.zeroPositive(name));
  return (100 * magnitude(neg)) / d;
}

/** |zero|/|positive|·100. */
export function zeroUnbalance(p: Triple<Phasor>, name = 'values'): number {
  const [zero, pos] = toSequence(p);
  const d = magnitude(pos);
  if (d === 0) throw new PhzError(M.zeroPositive(name));
  return (100 * magnitude(zero)) / d;
}

/** Maximum deviation from the average over the average, ·100 (LVUR and PVUR). */
export function maxDeviation(m: Triple<number>, name = 'values'): number {
  const mean = (m[0] + m[1] + m[2]) / 3;
  if (mean === 0) throw new PhzError(M.zeroMean(name));
  const dev = Math.max(Math.abs(m[0] - mean), Math.abs(m[1] - mean), Math.abs(m[2] - mean));
  return (100 * dev) / mean;
}

/**
 * The IEC 61000-4-30 magnitude formula, evaluated without cancellation: with
 * d = 6β − 2 = 2·Σ_{i<j}(Ui² − Uj²)²/(ΣU²)² (an exact rearrangement), 3 − 6β = 1 − d and
 * u2 = √d / (1 + √(1 − d)). d > 1 means the magnitudes cannot close a triangle.
 */
export function magUnbalance(m: Triple<number>, name = 'values'): number {
  const [a, b, c] = [m[0] * m[0], m[1] * m[1], m[2] * m[2]];
  const s = a + b + c;
  if (s === 0) throw new PhzError(M.zeroMean(name));
  const d = (2 * ((a - b) ** 2 + (b - c) ** 2 + (c - a) ** 2)) / (s * s);
  if (d > 1 + 1e-12) throw new PhzError(M.notTriangle(name));
  const root = Math.sqrt(Math.max(0, 1 - d));
  return (100 * Math.sqrt(d)) / (1 + root);
}

/**
 * NEMA MG 1 derating curve for polyphase induction motors (MG 1 Part 14, "Effects of
 * unbalanced voltages", Figure 14-1 — figure number from memory), as tabulated points read
 * from the curve.
 * Points: Engineering ToolBox, "Voltage Imbalance – Derating Factor in Polyphase Motors"
 * (0, 0.5, 1.5 … 5 %), plus 1 % → 1.00 where the published curve leaves 1.0 (from memory
 * of the figure). Linear interpolation between points.
 */
export const NEMA_DERATE_CURVE: ReadonlyArray<readonly [number, number]> = [
  [0, 1.0],
  [0.5, 1.0],
  [1, 1.0],
  [1.5, 0.97],
  [2, 0.95],
  [2.5, 0.93],
  [3, 0.89],
  [3.5, 0.85],
  [4, 0.82],
  [4.5, 0.78],
  [5, 0.76],
];

/** Derating factor for a voltage unbalance in percent (0–5 %); above 5 % an #N/A error. */
export function motorDerate(pct: number): number {
  if (!(pct >= 0)) throw new PhzError(M.derateNegative(pct));
  if (pct > 5) throw new PhzError(M.derateAbove(pct), 'notAvailable');
  const pts = NEMA_DERATE_CURVE;
  for (let i = 1; i < pts.length; i++) {
    const [x1, y1] = pts[i];
    if (pct <= x1) {
      const [x0, y0] = pts[i - 1];
      return y0 + ((y1 - y0) * (pct - x0)) / (x1 - x0);
    }
  }
  return pts[pts.length - 1][1];
}
