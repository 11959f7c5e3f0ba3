import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg } from '../../../src/core/phasor';
import { balancedSet, fromSequence, toSequence } from '../../../src/core/threephase';
import { expectClose, expectPhasorClose } from '../../helpers';

describe('toSequence', () => {
  it('Grainger & Stevenson, Power System Analysis (1994), Example 11.1 — line c open, Ia = 10∠0°, Ib = 10∠180° (from memory)', () => {
    // book: Ia0 = 0, Ia1 = 5 − j2.89 = 5.78∠−30° A, Ia2 = 5 + j2.89 = 5.78∠30° A — it rounds the parts
    // first (|5 − j2.89| = 5.775); the exact magnitude is 10/√3 = 5.7735
    const [i0, i1, i2] = toSequence([polarDeg(10, 0), polarDeg(10, 180), rect(0)]);
    expect(magnitude(i0)).toBe(0);
    expectClose(i1.re, 5, 1e-12);
    expectClose(i1.im, -2.89, 2e-3);
    expectClose(magnitude(i1), 5.78, 2e-3);
    expectClose(angleDeg(i1), -30);
    expectClose(magnitude(i2), 5.78, 2e-3);
    expectClose(angleDeg(i2), 30);
    expectPhasorClose(i1, polarDeg(10 / Math.sqrt(3), -30));
  });
  it('Grainger & Stevenson, Example 11.1 (from memory): the phase-b and phase-c components are the phase-a ones rotated, Ib1 = 5.78∠−150°, Ic1 = 5.78∠90°, Ib2 = 5.78∠150°, Ic2 = 5.78∠−90°', () => {
    const [, i1, i2] = toSequence([polarDeg(10, 0), polarDeg(10, 180), rect(0)]);
    const b1 = balancedSet(i1)[1];
    const c1 = balancedSet(i1)[2];
    const b2 = balancedSet(i2, 'negative')[1];
    const c2 = balancedSet(i2, 'negative')[2];
    expectClose(angleDeg(b1), -150);
    expectClose(angleDeg(c1), 90);
    expectClose(angleDeg(b2), 150);
    expectClose(angleDeg(c2), -90);
  });
  it('Glover, Sarma & Overbye, Power System Analysis and Design, Example 8.1 — a balanced 277 V abc set has only a positive sequence (from memory)', () => {
    const [v0, v1, v2] = toSequence(balancedSet(polarDeg(277, 0)));
    expect(magnitude(v0)).toBe(0);
    expectPhasorClose(v1, polarDeg(277, 0));
    expect(magnitude(v2)).toBe(0);
  });
  it('a negative-sequence set has only a negative sequence; equal phasors only a zero sequence', () => {
    const [n0, n1, n2] = toSequence(balancedSet(polarDeg(100, 20), 'negative'));
    expect(magnitude(n0) + magnitude(n1)).toBe(0);
    expectPhasorClose(n2, polarDeg(100, 20));
    const [z0, z1, z2] = toSequence([rect(3, 4), rect(3, 4), rect(3, 4)]);
    expectPhasorClose(z0, rect(3, 4));
    expect(magnitude(z1) + magnitude(z2)).toBe(0);
  });
});

describe('fromSequence', () => {
  it('rebuilds the phases: V1 = V0 + V+ + V−, V2 = V0 + a²V+ + aV−, V3 = V0 + aV+ + a²V−', () => {
    const [p1, p2, p3] = fromSequence(rect(10), rect(100), rect(0));
    expectPhasorClose(p1, rect(110));
    expectPhasorClose(p2, rect(10).add(polarDeg(100, -120)));
    expectPhasorClose(p3, rect(10).add(polarDeg(100, 120)));
  });
  it('inverts toSequence', () => {
    const x = [polarDeg(231, 3), polarDeg(219, -125), polarDeg(240, 117)] as const;
    const [a, b, c] = toSequence(x);
    const y = fromSequence(a, b, c);
    for (let k = 0; k < 3; k++) expectPhasorClose(y[k], x[k], 1e-12);
  });
});
