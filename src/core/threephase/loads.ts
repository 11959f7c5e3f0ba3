/**
 * Single-phase load relations on phasors (per phase of a three-phase load).
 *
 * Complex power is S = V·I* (common practice): an inductive load absorbs positive reactive
 * power, so a lagging power factor gives Q > 0.
 */
import { PhzError } from '../errors';
import { magnitude, rect, type Phasor } from '../phasor';
import { threePhaseMessages as M } from '../messages/threephase';

/** I = V / Z. Throws for Z = 0 (a short circuit). `where` names Z in the message. */
export function current(v: Phasor, z: Phasor, where = 'impedance'): Phasor {
  if (z.re === 0 && z.im === 0) throw new PhzError(M.zeroImpedance(where));
  return v.div(z);
}

/**
 * S = P + jQ from real power and power factor: Q = P·tan(acos pf), positive (lagging,
 * inductive) unless `leading`. pf must be in (0, 1]. tan(acos pf) is computed as
 * √(1 − pf²)/pf, exact at pf = 1.
 */
export function complexPowerFromPf(p: number, pf: number, leading: boolean, where = 'power_factor'): Phasor {
  if (!(pf > 0 && pf <= 1)) throw new PhzError(M.powerFactor(where, pf));
  const q = (p * Math.sqrt((1 - pf) * (1 + pf))) / pf;
  return rect(p, leading ? -q : q);
}

/** I = (S / V)*, the current a load of complex power S draws at voltage V. */
export function loadCurrent(v: Phasor, s: Phasor, where = 'voltage'): Phasor {
  if (v.re === 0 && v.im === 0) throw new PhzError(M.zeroVoltage(where));
  return s.div(v).conjugate();
}

/** S = V·I*. */
export function complexPower(v: Phasor, i: Phasor): Phasor {
  return v.mul(i.conjugate());
}

/** Power factor P/|S| (negative when real power flows the other way). */
export function powerFactor(s: Phasor, where = 'power'): number {
  const m = magnitude(s);
  if (m === 0) throw new PhzError(M.zeroPower(where));
  return s.re / m;
}
