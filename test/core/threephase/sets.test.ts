import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import fc from 'fast-check';
import { polarDeg, rect, magnitude, angleDeg, type Phasor } from '../../../src/core/phasor';
import { parsePhasor } from '../../../src/core/parse';
import { formatPolar } from '../../../src/core/format';
import {
  OPEN,
  balancedSet,
  closeLineSet,
  deltaToStar,
  fromSequence,
  lineSetFromMagnitudes,
  lineVoltages,
  magUnbalance,
  starToDelta,
  starVoltages,
  toSequence,
  vuf,
  type Triple,
} from '../../../src/core/threephase';
import { expectClose, expectPhasorClose, expectPhzError } from '../../helpers';

describe('balancedSet', () => {
  it('positive sequence puts phase 2 at −120° and phase 3 at +120°', () => {
    const [v1, v2, v3] = balancedSet(polarDeg(230, 0));
    expectPhasorClose(v1, polarDeg(230, 0));
    expectPhasorClose(v2, polarDeg(230, -120));
    expectPhasorClose(v3, polarDeg(230, 120));
  });
  it('negative sequence swaps phases 2 and 3, from any phase-1 angle', () => {
    const [v1, v2, v3] = balancedSet(polarDeg(400, 30), 'negative');
    expectPhasorClose(v1, polarDeg(400, 30));
    expectPhasorClose(v2, polarDeg(400, 150));
    expectPhasorClose(v3, polarDeg(400, -90));
  });
});

describe('lineVoltages and starVoltages', () => {
  it('a balanced 230 V set has 398.37 V line voltages leading by 30° (√3·230∠30°, common practice)', () => {
    const [v12, v23, v31] = lineVoltages(balancedSet(polarDeg(230, 0)));
    expectClose(magnitude(v12), 230 * Math.sqrt(3));
    expectClose(angleDeg(v12), 30);
    expectClose(angleDeg(v23), -90);
    expectClose(angleDeg(v31), 150);
  });
  it('IEC 60038:2009 Table 1: the 230/400 V system — 400 V line voltages give 230.94 V phase voltages', () => {
    // IEC 60038 lists 230/400 V; the ratio is √3 (400/√3 = 230.94 V rounds to the nominal 230 V)
    const e = starVoltages(balancedSet(polarDeg(400, 30)));
    expectClose(magnitude(e[0]), 400 / Math.sqrt(3));
    expect(Math.abs(angleDeg(e[0]))).toBeLessThan(1e-12);
  });
  it('starVoltages returns the set whose phasors sum to zero, with the same line voltages', () => {
    const line = lineVoltages([polarDeg(240, 5), polarDeg(225, -118), polarDeg(231, 124)]);
    const e = starVoltages(line);
    const back = lineVoltages(e);
    for (let k = 0; k < 3; k++) expectPhasorClose(back[k], line[k]);
    expect(magnitude(e[0].add(e[1]).add(e[2]))).toBeLessThan(1e-12 * 240);
  });
  it('rejects line voltages that do not close within 1 % (KVL), naming the argument, the residual and what to check', () => {
    const err = expectPhzError(() => starVoltages([polarDeg(400, 30), polarDeg(400, -90), polarDeg(400, 140)]));
    // residual 400∠150° − 400∠140° = 69.72∠55°, 17.4 % of 400 V (by hand: 2·400·sin 5° = 69.724)
    expect(err.message).toMatch(/^line_set does not close: V12 \+ V23 \+ V31 = 69\.72∠55°, 17\.4 % of their mean magnitude/);
    expect(err.message).toMatch(/order V12, V23, V31/);
    expect(err.message.length).toBeLessThanOrEqual(255); // Excel on Mac cuts messages near 255 characters
  });
});

describe('closeLineSet: line voltages that do not quite close', () => {
  const sum = (t: readonly Phasor[]): Phasor => t[0].add(t[1]).add(t[2]);
  /** The expected correction, with mathjs: each value minus a third of the sum (the zero-sequence part). */
  const mathjsClosed = (t: readonly Phasor[]): Array<{ re: number; im: number }> => {
    const c = t.map((z) => math.complex(z.re, z.im));
    const third = math.divide(math.add(math.add(c[0], c[1]), c[2]), 3) as math.Complex;
    return c.map((z) => math.subtract(z, third) as math.Complex);
  };
  it.each([
    ['LINEVOLTS of 231∠0, 226∠−121, 229∠119 V rounded to 4 figures', ['397.8∠29.15', '394∠-90.78', '396.4∠149.6']],
    ['meter readings at 0.1° resolution', ['401.2∠30.0', '398.7∠-90.4', '399.5∠149.8']],
  ])('accepts %s and removes the residual, a third from each (the zero sequence)', (_, texts) => {
    const line = texts.map((t) => parsePhasor(t)) as unknown as Triple<Phasor>;
    expect(magnitude(sum(line))).toBeGreaterThan(1e-4 * 400); // refused before: more than 0.01 % of the largest
    const closed = closeLineSet(line, 'line_voltages');
    const want = mathjsClosed(line);
    for (let k = 0; k < 3; k++) expectPhasorClose(closed[k], want[k], 1e-14);
    expect(magnitude(sum(closed))).toBeLessThan(1e-12 * 400);
    // the negative- and positive-sequence parts are untouched (only the zero sequence goes)
    const [, p0, n0] = toSequence(line);
    const [z1, p1, n1] = toSequence(closed);
    expect(magnitude(z1)).toBe(0);
    expectPhasorClose(p1, p0, 1e-14);
    expectPhasorClose(n1, n0, 1e-13);
  });
  it('leaves a set that closes to rounding noise exactly as given', () => {
    const line = lineVoltages([polarDeg(240, 5), polarDeg(225, -118), polarDeg(231, 124)]);
    const closed = closeLineSet(line, 'line_set');
    for (let k = 0; k < 3; k++) expect(closed[k]).toBe(line[k]);
  });
  it('accepts a residual of 1 % of the mean magnitude and refuses one just above', () => {
    const base = balancedSet(polarDeg(400, 30));
    const off = (pct: number): Triple<Phasor> => [base[0].add(polarDeg((pct / 100) * 400, 77)), base[1], base[2]];
    expect(magnitude(sum(closeLineSet(off(0.999), 'line_set')))).toBeLessThan(1e-12 * 400);
    expect(expectPhzError(() => closeLineSet(off(1.05), 'line_set')).message).toMatch(/does not close/);
  });
  it('STARVOLTS(LINEVOLTS(x) at 4 figures) is accepted for random supplies (seeded property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 50, max: 50000, noNaN: true }), fc.double({ min: 0, max: 0.3, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }), (m, kn, an, a1) => {
        const x = fromSequence(rect(0), polarDeg(m, a1), polarDeg(kn * m, an));
        const rounded = lineVoltages(x).map((z) => parsePhasor(formatPolar(z, 4))) as unknown as Triple<Phasor>;
        const e = starVoltages(rounded);
        // 4 figures: each value within 5e-4 relative, so the phase set within 1e-3 of the largest
        for (let k = 0; k < 3; k++) expect(magnitude(e[k].sub(x[k]))).toBeLessThanOrEqual(1e-3 * m * (1 + kn));
      }),
      { seed: 8, numRuns: 300 },
    );
  });
});

describe('lineSetFromMagnitudes: a closed line-voltage set from three measured magnitudes', () => {
  const mjs = (z: Phasor) => math.complex(z.re, z.im);
  it('equal magnitudes give the balanced set with V12 at 30° (pairs with phase voltages at 0°, −120°, +120°)', () => {
    const [v12, v23, v31] = lineSetFromMagnitudes([400, 400, 400]);
    expectPhasorClose(v12, polarDeg(400, 30), 1e-15);
    expectPhasorClose(v23, polarDeg(400, -90), 1e-15);
    expectPhasorClose(v31, polarDeg(400, 150), 1e-15);
  });
  it('the 3-4-5 right triangle (converse of Pythagoras, Euclid I.48): V12 ⟂ V23, V31 at 30° + 180° − atan(4/3)', () => {
    const [v12, v23, v31] = lineSetFromMagnitudes([300, 400, 500]);
    expectPhasorClose(v12, polarDeg(300, 30), 1e-15);
    expectPhasorClose(v23, polarDeg(400, -60), 1e-15); // a right angle between V12 and V23
    expectPhasorClose(v31, polarDeg(500, 210 - (Math.atan2(4, 3) * 180) / Math.PI), 1e-15);
  });
  it('law of cosines with mathjs: the angle between V12 and V23 is 180° − acos((a² + b² − c²)/2ab); the set closes and keeps the magnitudes', () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 50000, noNaN: true }), fc.double({ min: 0.5, max: 1.5, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }), (a, kb, t, ang) => {
        const b = kb * a;
        // c anywhere between |a − b| and a + b, clear of the degenerate ends
        const c = Math.abs(a - b) + (0.001 + 0.998 * t) * (a + b - Math.abs(a - b));
        const v = lineSetFromMagnitudes([a, b, c], ang);
        const z = v.map(mjs);
        const gamma = math.acos(math.divide(math.subtract(math.add(math.square(a), math.square(b)), math.square(c)), 2 * a * b) as number) as number;
        const turn = math.subtract(math.pi, gamma) as number; // V23 lags V12 by the exterior angle
        const want23 = math.multiply(math.divide(z[0], a), math.complex({ r: b, phi: -turn })) as math.Complex;
        expectPhasorClose(v[1], want23, 1e-9);
        expect(math.abs(math.add(math.add(z[0], z[1]), z[2]) as math.Complex) as unknown as number).toBeLessThanOrEqual(1e-12 * (a + b + c));
        expectClose(magnitude(v[0]), a, 1e-14);
        expectClose(magnitude(v[1]), b, 1e-14);
        expectClose(magnitude(v[2]), c, 1e-12);
        expectPhasorClose(v[0], polarDeg(a, ang), 1e-14);
      }),
      { seed: 8, numRuns: 300 },
    );
  });
  it('positive sequence: VUF of the set equals the IEC 61000-4-30 magnitude-only formula (below 100 %)', () => {
    const m: Triple<number> = [402, 395, 385];
    const v = lineSetFromMagnitudes(m);
    expectClose(vuf(v), magUnbalance(m), 1e-9);
    expect(vuf(v)).toBeLessThan(100);
  });
  it('a degenerate triangle (one magnitude the sum of the others) is collinear and closes', () => {
    const [v12, v23, v31] = lineSetFromMagnitudes([400, 200, 200]);
    expectPhasorClose(v12, polarDeg(400, 30), 1e-15);
    expectPhasorClose(v23, polarDeg(200, -150), 1e-15);
    expectPhasorClose(v31, polarDeg(200, -150), 1e-15);
  });
  it.each([
    [[400, 100, 200], /magnitudes: V12 = 400 exceeds V23 \+ V31 = 300, so the three cannot close a triangle/],
    [[100, 400, 200], /magnitudes: V23 = 400 exceeds V12 \+ V31 = 300/],
    [[400, 0, 395], /magnitudes: V23 is 0/],
    [[400, -395, 395], /magnitudes: V23 is -395: a magnitude cannot be negative/],
  ] as const)('refuses %j with a clear message', (m, msg) => {
    const err = expectPhzError(() => lineSetFromMagnitudes(m as unknown as Triple<number>));
    expect(err.message).toMatch(msg);
    expect(err.message.length).toBeLessThanOrEqual(255);
  });
});

describe('deltaToStar (Kennelly) and starToDelta', () => {
  it('Alexander & Sadiku, Fundamentals of Electric Circuits, Example 2.15: Δ of 10, 15, 25 Ω → Y of 5, 3, 7.5 Ω (from memory)', () => {
    // each corner's arm = product of its two adjacent branches / 50 Ω
    const [z1, z2, z3] = deltaToStar(rect(10), rect(15), rect(25));
    expectPhasorClose(z1, rect(5)); // 10·25/50
    expectPhasorClose(z2, rect(3)); // 15·10/50
    expectPhasorClose(z3, rect(7.5)); // 25·15/50
  });
  it('a balanced delta becomes a star of one third (Z_Y = Z_Δ/3, common practice)', () => {
    const z = rect(12, 9);
    for (const arm of deltaToStar(z, z, z)) expectPhasorClose(arm, z.div(3));
  });
  it('starToDelta inverts deltaToStar for complex impedances', () => {
    const d = [rect(10, 4), rect(3, -8), rect(6, 1)] as const;
    const y = deltaToStar(...d);
    const back = starToDelta(y[0], y[1], y[2]);
    for (let k = 0; k < 3; k++) expectPhasorClose(back[k] as ReturnType<typeof rect>, d[k]);
  });
  it('an open delta branch gives a 0 Ω arm opposite it and the closed branches as the other arms', () => {
    const [z1, z2, z3] = deltaToStar(rect(20, 5), OPEN, rect(8, -3));
    expect(magnitude(z1)).toBe(0);
    expectPhasorClose(z2, rect(20, 5));
    expectPhasorClose(z3, rect(8, -3));
  });
  it('the open-branch result is the limit of Kennelly as the branch grows without bound', () => {
    const big = deltaToStar(rect(20, 5), rect(1e9, 0), rect(8, -3));
    const open = deltaToStar(rect(20, 5), OPEN, rect(8, -3));
    for (let k = 1; k < 3; k++) expectPhasorClose(big[k], open[k], 1e-6);
  });
  it('a 0 Ω star arm gives an open delta branch opposite it', () => {
    const d = starToDelta(rect(4, 3), rect(0), rect(4, 3));
    expect(d[2]).toBe(OPEN); // Z31 is opposite arm 2
    expectPhasorClose(d[0] as ReturnType<typeof rect>, rect(4, 3));
    expectPhasorClose(d[1] as ReturnType<typeof rect>, rect(4, 3));
  });
  it.each([
    ['two open branches', () => deltaToStar(OPEN, OPEN, rect(5)), /branches 12 and 23 are open/],
    ['three open branches', () => deltaToStar(OPEN, OPEN, OPEN), /all three delta branches/],
    ['a resonant delta (ΣZ = 0)', () => deltaToStar(rect(0, 10), rect(0, -5), rect(0, -5)), /add up to 0 Ω/],
    ['two 0 Ω star arms', () => starToDelta(rect(0), rect(0), rect(5)), /Z1 and Z2 are both 0 Ω/],
    ['a star with Z1Z2 + Z2Z3 + Z3Z1 = 0', () => starToDelta(rect(0, 1), rect(0, 1), rect(0, -0.5)), /Z1·Z2 \+ Z2·Z3 \+ Z3·Z1 = 0/],
  ])('rejects %s', (_, f, msg) => {
    expect(expectPhzError(f).message).toMatch(msg);
  });
});
