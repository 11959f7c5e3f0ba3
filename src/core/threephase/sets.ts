/**
 * Three-phase sets and star/delta equivalents.
 *
 * Conventions: positive sequence 1→2→3 with phase 2 at −120° and phase 3 at +120° from
 * phase 1; operator a = 1∠120°. Line voltages V12 = V1 − V2, V23 = V2 − V3, V31 = V3 − V1.
 */
import { PhzError } from '../errors';
import { A2_OP, A_OP, ZERO, magnitude, type Phasor } from '../phasor';
import { formatPolar } from '../format';
import { threePhaseMessages as M } from '../messages/threephase';
import { OPEN, isOpen, isZeroish, type Impedance, type Triple } from './types';

export type SequenceWord = 'positive' | 'negative';

/**
 * A balanced set whose phase 1 is `first`: positive sequence (1, a², a)·first, i.e.
 * phase 2 lags by 120°; negative sequence (1, a, a²)·first.
 */
export function balancedSet(first: Phasor, sequence: SequenceWord = 'positive'): Triple<Phasor> {
  return sequence === 'positive' ? [first, first.mul(A2_OP), first.mul(A_OP)] : [first, first.mul(A_OP), first.mul(A2_OP)];
}

/** Line-to-line voltages V12, V23, V31 of a set of phase (line-to-neutral) voltages. */
export function lineVoltages(phase: Triple<Phasor>): Triple<Phasor> {
  return [phase[0].sub(phase[1]), phase[1].sub(phase[2]), phase[2].sub(phase[0])];
}

/** Relative KVL tolerance for line voltages typed or pasted at 6 significant figures. */
export const KVL_REL = 1e-4;

/**
 * Checks V12 + V23 + V31 = 0 within KVL_REL of the largest magnitude; every real set of
 * line-to-line voltages closes (Kirchhoff's voltage law around the three lines).
 */
export function checkLineSet(line: Triple<Phasor>, name: string): void {
  const sum = line[0].add(line[1]).add(line[2]);
  const scale = Math.max(magnitude(line[0]), magnitude(line[1]), magnitude(line[2]));
  if (magnitude(sum) > KVL_REL * scale) {
    throw new PhzError(M.kvl(name, formatPolar(sum, 4)));
  }
}

/**
 * The star (phase) set with the given line voltages and no zero-sequence part:
 * V1 = (V12 − V31)/3, V2 = (V23 − V12)/3, V3 = (V31 − V23)/3. Throws when the line set
 * does not close.
 */
export function starVoltages(line: Triple<Phasor>, name = 'line_set'): Triple<Phasor> {
  checkLineSet(line, name);
  const [v12, v23, v31] = line;
  return [v12.sub(v31).div(3), v23.sub(v12).div(3), v31.sub(v23).div(3)];
}

/** Star set from line voltages without the closure check (inputs known to close). */
export function starOfClosedLineSet(line: Triple<Phasor>): Triple<Phasor> {
  const [v12, v23, v31] = line;
  return [v12.sub(v31).div(3), v23.sub(v12).div(3), v31.sub(v23).div(3)];
}

/**
 * Delta → star (Kennelly): Z1 = Z12·Z31/ΣZ, Z2 = Z23·Z12/ΣZ, Z3 = Z31·Z23/ΣZ.
 * One open branch is allowed (an open delta, "V" connection): in admittance form
 * Z1 = Y23/D, Z2 = Y31/D, Z3 = Y12/D with D = Y12·Y23 + Y23·Y31 + Y31·Y12, which stays
 * finite (with branch 23 open: Z1 = 0, Z2 = Z12, Z3 = Z31).
 */
export function deltaToStar(z12: Impedance, z23: Impedance, z31: Impedance): Triple<Phasor> {
  const opens = [isOpen(z12), isOpen(z23), isOpen(z31)];
  const nOpen = opens.filter(Boolean).length;
  if (nOpen === 3) throw new PhzError(M.deltaAllOpen);
  if (nOpen === 2) {
    throw new PhzError(M.deltaTwoOpen(['12', '23', '31'].filter((_, k) => opens[k]).join(' and ')));
  }
  if (nOpen === 1) return openDeltaStar(z12, z23, z31);
  const a = z12 as Phasor;
  const b = z23 as Phasor;
  const c = z31 as Phasor;
  const sum = a.add(b).add(c);
  if (isZeroish(sum, magnitude(a) + magnitude(b) + magnitude(c))) throw new PhzError(M.deltaResonant);
  return [a.mul(c).div(sum), b.mul(a).div(sum), c.mul(b).div(sum)];
}

/**
 * Star equivalent of a delta with exactly one open branch: the Kennelly formula in the
 * limit as that branch's impedance → ∞ (equal to the admittance form with its Y = 0).
 * The arm opposite the open branch is 0 and the other two arms are the closed branches.
 */
function openDeltaStar(z12: Impedance, z23: Impedance, z31: Impedance): Triple<Phasor> {
  const closed = (z: Impedance): Phasor => (isOpen(z) ? ZERO : z);
  if (isOpen(z23)) return [ZERO, closed(z12), closed(z31)];
  if (isOpen(z31)) return [closed(z12), ZERO, closed(z23)];
  return [closed(z31), closed(z23), ZERO];
}

/**
 * Star → delta: Z12 = (Z1Z2 + Z2Z3 + Z3Z1)/Z3, Z23 = …/Z1, Z31 = …/Z2. A 0 Ω arm gives an
 * open delta branch (returned as OPEN); two 0 Ω arms have no unique delta.
 */
export function starToDelta(z1: Phasor, z2: Phasor, z3: Phasor): Triple<Impedance> {
  const zero = [z1, z2, z3].map((z) => z.re === 0 && z.im === 0);
  const nZero = zero.filter(Boolean).length;
  if (nZero >= 2) {
    throw new PhzError(M.starTwoZero(['Z1', 'Z2', 'Z3'].filter((_, k) => zero[k]).join(' and ')));
  }
  const p = z1.mul(z2).add(z2.mul(z3)).add(z3.mul(z1));
  const scale = magnitude(z1) * magnitude(z2) + magnitude(z2) * magnitude(z3) + magnitude(z3) * magnitude(z1);
  if (isZeroish(p, scale)) throw new PhzError(M.starZeroSum);
  const over = (z: Phasor, isZero: boolean): Impedance => (isZero ? OPEN : p.div(z));
  return [over(z3, zero[2]), over(z1, zero[0]), over(z2, zero[1])];
}
