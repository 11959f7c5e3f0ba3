/**
 * Three-phase sets and star/delta equivalents.
 *
 * Conventions: positive sequence 1→2→3 with phase 2 at −120° and phase 3 at +120° from
 * phase 1; operator a = 1∠120°. Line voltages V12 = V1 − V2, V23 = V2 − V3, V31 = V3 − V1.
 */
import { PhzError } from '../errors';
import { A2_OP, A_OP, NOISE_REL, ZERO, magnitude, polarDeg, radToDeg, type Phasor } from '../phasor';
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

/**
 * The largest closure residual |V12 + V23 + V31| accepted, relative to the mean line-voltage
 * magnitude: typed values at 4 figures leave about 0.1 %, meter readings at 0.1° resolution
 * about 0.7 %; a set that misses by more is not one supply's line voltages.
 */
export const LINE_CLOSE_REL = 0.01;

/**
 * Line voltages that close. Line-to-line voltages of any three-wire point sum to zero
 * (Kirchhoff's voltage law around the three lines), so a residual s = V12 + V23 + V31 up to
 * LINE_CLOSE_REL of the mean magnitude is rounding of typed or metered values, and is
 * removed by taking s/3 from each value: that drops the zero-sequence part, which line
 * voltages cannot have, and leaves the positive- and negative-sequence parts as given.
 * A residual below the noise rule returns the set unchanged; above the limit, an error
 * with the residual and what to check.
 */
export function closeLineSet(line: Triple<Phasor>, name: string): Triple<Phasor> {
  const sum = line[0].add(line[1]).add(line[2]);
  const total = magnitude(line[0]) + magnitude(line[1]) + magnitude(line[2]);
  const r = magnitude(sum);
  if (r <= NOISE_REL * total) return line;
  const mean = total / 3;
  if (r > LINE_CLOSE_REL * mean) {
    throw new PhzError(M.kvl(name, formatPolar(sum, 4), formatPercent((100 * r) / mean)));
  }
  const third = sum.div(3);
  return [line[0].sub(third), line[1].sub(third), line[2].sub(third)];
}

function formatPercent(p: number): string {
  return p >= 1000 ? p.toExponential(2) : String(Number(p.toPrecision(3)));
}

/**
 * The star (phase) set with the given line voltages and no zero-sequence part:
 * V1 = (V12 − V31)/3, V2 = (V23 − V12)/3, V3 = (V31 − V23)/3. The line set must close
 * (closeLineSet); its zero-sequence residual cancels in these differences.
 */
export function starVoltages(line: Triple<Phasor>, name = 'line_set'): Triple<Phasor> {
  return starOfClosedLineSet(closeLineSet(line, name));
}

/**
 * Interior angle (radians) of a triangle with sides x, y, z, opposite z. Kahan's
 * formulation ("Miscalculating Area and Angles of a Needle-like Triangle", 2014, §3), accurate
 * for needle-like and degenerate triangles where acos of the law of cosines loses its digits;
 * NaN when the sides cannot close (the caller checks that first).
 */
function angleOpposite(z: number, x: number, y: number): number {
  const a = Math.max(x, y);
  const b = Math.min(x, y);
  let mu: number;
  if (b >= z) mu = z - (a - b);
  else mu = b - (a - z);
  mu = Math.max(mu, 0);
  const num = (a - b + z) * mu;
  const den = (a + (b + z)) * (a - z + b);
  return 2 * Math.atan(Math.sqrt(num / den));
}

/**
 * The closed line-voltage set with the measured magnitudes |V12|, |V23|, |V31| (the
 * triangle of the law of cosines), positive sequence (V23 lags V12), V12 at `angleDeg`
 * (30° by default, so the set is LINEVOLTS of phase voltages at 0°, −120°, +120°). With γ
 * the triangle's angle between V12 and V23 and β the angle opposite V23:
 * V23 = |V23|∠(θ − 180° + γ), V31 = |V31|∠(θ + 180° − β). Magnitudes must be above 0 and
 * close a triangle (none exceeds the sum of the other two, within rounding); a degenerate
 * triangle gives a collinear set.
 */
export function lineSetFromMagnitudes(m: Triple<number>, angleDeg = 30, name = 'magnitudes'): Triple<Phasor> {
  const labels = ['V12', 'V23', 'V31'] as const;
  for (let k = 0; k < 3; k++) {
    if (m[k] < 0) throw new PhzError(M.negativeMagnitudeValue(`${name}: ${labels[k]}`, m[k]));
    if (m[k] === 0) throw new PhzError(M.lineSetZero(name, labels[k]));
  }
  for (let k = 0; k < 3; k++) {
    const others = m[(k + 1) % 3] + m[(k + 2) % 3];
    if (m[k] > others * (1 + NOISE_REL)) {
      const names = [labels[(k + 1) % 3], labels[(k + 2) % 3]].sort();
      throw new PhzError(M.lineSetNotTriangle(name, labels[k], names.join(' + '), m[k], Number(others.toPrecision(12))));
    }
  }
  const [a, b, c] = m;
  const gamma = radToDeg(angleOpposite(c, a, b));
  const beta = radToDeg(angleOpposite(b, c, a));
  return [polarDeg(a, angleDeg % 360), polarDeg(b, (angleDeg - 180 + gamma) % 360), polarDeg(c, (angleDeg + 180 - beta) % 360)];
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
