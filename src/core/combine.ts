/**
 * Products and parallel combinations of many phasors (the sum is `sumOf` in ./phasor),
 * shared by the functions whose values repeat and their 15-figure twins.
 */
import { PhzError } from './errors';
import { NOISE_REL, ONE, ZERO, magnitude, type Phasor } from './phasor';
import { valueMessages as M } from './messages/values';

/** z1·z2·…·zn. */
export function productOf(zs: readonly Phasor[]): Phasor {
  let p = ONE;
  for (const z of zs) p = p.mul(z);
  return p;
}

/**
 * Impedances in parallel, 1 / Σ(1/Zk). A 0 Ω branch shorts the group (result 0).
 * Admittances that cancel to rounding noise are a resonance: no finite impedance exists,
 * which is an error rather than a huge number.
 */
export function parallelOf(zs: readonly Phasor[]): Phasor {
  if (zs.some((p) => p.re === 0 && p.im === 0)) return ZERO;
  let y = ZERO;
  let scale = 0;
  for (const z of zs) {
    y = y.add(z.inverse());
    scale = Math.max(scale, 1 / magnitude(z));
  }
  if (magnitude(y) <= NOISE_REL * scale) throw new PhzError(M.resonance);
  return y.inverse();
}
