import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg } from '../../../src/core/phasor';
import { OPEN, balancedSet, deltaToStar, lineVoltages, starToDelta, starVoltages } from '../../../src/core/threephase';
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
  it('rejects line voltages that do not close (KVL), naming the argument', () => {
    const err = expectPhzError(() => starVoltages([polarDeg(400, 30), polarDeg(400, -90), polarDeg(400, 140)]));
    expect(err.message).toMatch(/line_set does not sum to zero/);
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
