/**
 * Shared types of the three-phase core. Phases are numbered 1, 2, 3 and stored in that
 * order; delta branches are stored as 12, 23, 31.
 */
import { NOISE_REL, magnitudeOf, type Phasor } from '../phasor';

/** Three values, one per phase (1, 2, 3) or per delta branch (12, 23, 31). */
export type Triple<T> = readonly [T, T, T];

/** A branch that is not connected: infinite impedance, zero admittance. */
export const OPEN = 'open' as const;
export type Open = typeof OPEN;

/** An impedance that may also be an open circuit. */
export type Impedance = Phasor | Open;

export function isOpen(z: Impedance): z is Open {
  return z === OPEN;
}

/** The relative size below which a sum of impedances counts as exactly zero: the project's one noise rule. */
export const ZERO_REL = NOISE_REL;

/** True when z is 0, or is within ZERO_REL of `scale` (the size of what produced it). */
export function isZeroish(z: Phasor, scale = 0): boolean {
  const m = magnitudeOf(z.re, z.im);
  return m === 0 || m <= ZERO_REL * scale;
}
