/**
 * Symmetrical components (Fortescue), referred to phase 1, with a = 1∠120° and the
 * positive sequence 1→2→3 (phase 2 lags phase 1 by 120°):
 *   V0 = (V1 + V2 + V3)/3,  V+ = (V1 + a·V2 + a²·V3)/3,  V− = (V1 + a²·V2 + a·V3)/3
 *   V1 = V0 + V+ + V−,  V2 = V0 + a²·V+ + a·V−,  V3 = V0 + a·V+ + a²·V−
 * (Fortescue, "Method of symmetrical co-ordinates applied to the solution of polyphase
 * networks", AIEE Trans. 37, 1918; the matrix form of Grainger & Stevenson, Power System
 * Analysis, 1994, ch. 11).
 */
import { A2_OP, A_OP, magnitude, snapToZero, type Phasor } from '../phasor';
import type { Triple } from './types';

/** Zero, positive and negative sequence components of a phase set. */
export function toSequence(p: Triple<Phasor>): Triple<Phasor> {
  const [v1, v2, v3] = p;
  // components below 1e-12 of the phase magnitudes are rounding noise of a³ = 1 in binary
  const scale = magnitude(v1) + magnitude(v2) + magnitude(v3);
  const zero = v1.add(v2).add(v3).div(3);
  const pos = v1.add(A_OP.mul(v2)).add(A2_OP.mul(v3)).div(3);
  const neg = v1.add(A2_OP.mul(v2)).add(A_OP.mul(v3)).div(3);
  return [snapToZero(zero, scale), snapToZero(pos, scale), snapToZero(neg, scale)];
}

/** Phase set from zero, positive and negative sequence components. */
export function fromSequence(zero: Phasor, pos: Phasor, neg: Phasor): Triple<Phasor> {
  const scale = magnitude(zero) + magnitude(pos) + magnitude(neg);
  return [
    snapToZero(zero.add(pos).add(neg), scale),
    snapToZero(zero.add(A2_OP.mul(pos)).add(A_OP.mul(neg)), scale),
    snapToZero(zero.add(A_OP.mul(pos)).add(A2_OP.mul(neg)), scale),
  ];
}
