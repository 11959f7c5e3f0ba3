/**
 * Phasor values. A phasor is an immutable complex.js value: every arithmetic method
 * returns a new value, so a phasor never changes after it is made. Angles are radians
 * inside the core; degrees appear only at the edges, in names that say so.
 */
import Complex from 'complex.js';
import { PhzError } from './errors';

export type Phasor = Complex;

const DEG = Math.PI / 180;

/** Phasor from rectangular parts. */
export function rect(re: number, im = 0): Phasor {
  return new Complex(re, im);
}

/** Phasor from magnitude and angle in radians. */
export function polar(magnitude: number, angleRad: number): Phasor {
  return new Complex(magnitude * Math.cos(angleRad), magnitude * Math.sin(angleRad));
}

/**
 * cos and sin at every multiple of 15°, as the correctly rounded doubles of the exact
 * values (√3/2, √2/2, (√6 ± √2)/4 …). Angles such as ±120° and ±30° are everywhere in
 * three-phase work, and Math.cos(2π/3) is not exactly −0.5.
 */
const R3 = Math.sqrt(3) / 2;
const R2 = Math.SQRT1_2;
const C15 = (Math.sqrt(6) + Math.sqrt(2)) / 4;
const S15 = (Math.sqrt(6) - Math.sqrt(2)) / 4;
/** cos(k·15°) for k = 0 … 23, built from the first quadrant by symmetry. */
const COS24: readonly number[] = (() => {
  const q = [1, C15, R3, R2, 0.5, S15];
  const out: number[] = [];
  for (let k = 0; k < 24; k++) {
    const r = k % 6;
    const quadrant = Math.floor(k / 6);
    const v = quadrant === 0 ? q[r] : quadrant === 1 ? (r === 0 ? 0 : -q[6 - r]) : quadrant === 2 ? -q[r] : r === 0 ? 0 : q[6 - r];
    out.push(v);
  }
  return out;
})();

/** Writes the parts of magnitude∠angle° into `out`: exact cos/sin at multiples of 15°. */
export function polarDegParts(magnitude: number, angleDeg: number, out: { re: number; im: number }): void {
  const steps = angleDeg / 15;
  if (steps === (steps | 0)) {
    let k = steps % 24;
    if (k < 0) k += 24;
    // sin(θ) = cos(θ − 90°) = cos((k − 6)·15°)
    const ks = k >= 6 ? k - 6 : k + 18;
    out.re = magnitude * COS24[k];
    out.im = magnitude * COS24[ks];
    return;
  }
  const r = angleDeg * DEG;
  out.re = magnitude * Math.cos(r);
  out.im = magnitude * Math.sin(r);
}

const scratch = { re: 0, im: 0 };

/** Phasor from magnitude and angle in degrees: exact cos/sin at multiples of 15°. */
export function polarDeg(magnitude: number, angleDeg: number): Phasor {
  polarDegParts(magnitude, angleDeg, scratch);
  return rect(scratch.re, scratch.im);
}

export const ZERO: Phasor = rect(0, 0);
export const ONE: Phasor = rect(1, 0);
/** The operator a = 1∠120°. */
export const A_OP: Phasor = rect(-0.5, Math.sqrt(3) / 2);
/** a² = 1∠240° = 1∠−120°. */
export const A2_OP: Phasor = rect(-0.5, -Math.sqrt(3) / 2);

export function degToRad(deg: number): number {
  return deg * DEG;
}
export function radToDeg(rad: number): number {
  return rad / DEG;
}

/**
 * The one rounding-noise rule of the project: a quantity below NOISE_REL of the size of
 * what produced it (the operands of a sum, the magnitude of a phasor, the scale of a
 * network) is rounding noise in binary and is taken as exactly 0 (common practice).
 */
export const NOISE_REL = 1e-12;

/** |re + j·im|: a square root where the squares cannot overflow or underflow, else hypot. */
export function magnitudeOf(re: number, im: number): number {
  const m = Math.sqrt(re * re + im * im);
  return m > 1e-150 && m < 1e150 ? m : Math.hypot(re, im);
}

/** Magnitude |z|. */
export function magnitude(z: Phasor): number {
  return magnitudeOf(z.re, z.im);
}

/** Angle in degrees in (−180, 180]; 0 for the zero phasor. */
export function angleDeg(z: Phasor): number {
  if (z.re === 0 && z.im === 0) return 0;
  const d = Math.atan2(z.im, z.re) / DEG;
  return d === -180 ? 180 : d;
}

/** Angle in radians in (−π, π]; 0 for the zero phasor. */
export function angleRad(z: Phasor): number {
  if (z.re === 0 && z.im === 0) return 0;
  const r = Math.atan2(z.im, z.re);
  return r === -Math.PI ? Math.PI : r;
}

export function isFinitePhasor(z: Phasor): boolean {
  return Number.isFinite(z.re) && Number.isFinite(z.im);
}

/**
 * Guard every computed phasor: a non-finite result is an error, never a value.
 * `what` names the quantity for the message.
 */
export function finite(z: Phasor, what: string): Phasor {
  if (!isFinitePhasor(z)) {
    throw new PhzError(`${what} is not finite (a division by zero or an overflow): check for a zero impedance, an open circuit or a zero voltage in the inputs.`);
  }
  return z;
}

/**
 * Phasor sum with cancellation snapped to zero: when the sum is below NOISE_REL of the sum of
 * the magnitudes added, it is rounding noise (a balanced set adds to exactly 0, but
 * cos/sin of 120° are not exact in binary) and the result is 0.
 */
export function sumOf(zs: readonly Phasor[]): Phasor {
  let re = 0;
  let im = 0;
  let scale = 0;
  for (let i = 0; i < zs.length; i++) {
    const z = zs[i];
    re += z.re;
    im += z.im;
    // |re| + |im| bounds |z| within a factor √2: enough for a noise scale, and cheap
    scale += Math.abs(z.re) + Math.abs(z.im);
  }
  return snapToZero(rect(re, im), scale);
}

/** `z`, or exactly 0 when |z| is within NOISE_REL of `scale` (the size of what produced it). */
export function snapToZero(z: Phasor, scale: number): Phasor {
  return magnitudeOf(z.re, z.im) <= NOISE_REL * scale ? ZERO : z;
}
