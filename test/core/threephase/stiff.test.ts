/**
 * Stiff networks (issue 8 §6): impedances that differ by up to 18 orders of magnitude, as
 * users write them when they stand in 1e9 Ω for an open and 1e-6 Ω for a short. Every
 * current and voltage must agree with a 60-digit nodal solution (decimal.js, ./bigref) to
 * 1e-9 of its own magnitude. Quantities that vanish in a balanced network (the neutral
 * current, the star-point shift) are held to 1e-9 of the larger of their own size and 1e-13
 * of the network's scale, since a balanced set in binary leaves rounding noise that the
 * solvers take as exactly 0; other quantities get a floor of 1e-30 of the scale, which only
 * absorbs the reference's own residue where a quantity is exactly 0 (an open phase).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { magnitude, polarDeg, rect, type Phasor } from '../../../src/core/phasor';
import { OPEN, balancedSet, fromSequence, isOpen, lineVoltages, solveDelta, solveStar, type Impedance, type Neutral, type Triple } from '../../../src/core/threephase';
import { bigDelta, bigStar, type C } from './bigref';

const abs = (z: C): number => Math.hypot(z.re, z.im);
const err = (a: C, b: C): number => Math.hypot(a.re - b.re, a.im - b.im);
/** Relative error of `a` against the reference `b`, with an absolute floor for vanishing quantities. */
const relErr = (a: C, b: C, floor = 0): number => {
  const d = err(a, b);
  return d === 0 ? 0 : d / Math.max(abs(b), floor);
};

/** Impedances 10^−9 … 10^9 Ω (ratios up to 1e18), angles within ±80°; the two ends come up often. */
const exponent = fc.oneof(fc.constantFrom(-9, 9, -6, 6), fc.noBias(fc.integer({ min: -9000, max: 9000 }).map((x) => x / 1000)));
const impedance = fc.tuple(exponent, fc.noBias(fc.integer({ min: -80, max: 80 }))).map(([u, a]) => polarDeg(10 ** u, a));
const triple = <T>(g: fc.Arbitrary<T>) => fc.tuple(g, g, g) as fc.Arbitrary<Triple<T>>;
/** Load impedances, now and then "open" (at least one stays connected). */
const loadSet = triple(fc.oneof({ weight: 6, arbitrary: impedance }, { weight: 1, arbitrary: fc.constant(OPEN) })).filter((t) => !t.every(isOpen)) as fc.Arbitrary<Triple<Impedance>>;
/** A physical supply: 50 V … 50 kV positive sequence with up to 30 % negative and zero sequence. */
const supply = fc
  .tuple(fc.noBias(fc.integer({ min: 50, max: 50000 })), fc.noBias(fc.integer({ min: -180, max: 180 })), fc.noBias(fc.integer({ min: 0, max: 30 })), fc.noBias(fc.integer({ min: -180, max: 180 })), fc.noBias(fc.integer({ min: 0, max: 30 })), fc.noBias(fc.integer({ min: -180, max: 180 })))
  .map(([m, a, kn, an, k0, a0]) => fromSequence(polarDeg((k0 / 100) * m, a0), polarDeg(m, a), polarDeg((kn / 100) * m, an)));
const neutral: fc.Arbitrary<Neutral> = fc.oneof(
  fc.constant<Neutral>({ kind: 'solid' }),
  fc.constant<Neutral>({ kind: 'open' }),
  impedance.map((z): Neutral => ({ kind: 'impedance', z })),
);
const RUNS = { seed: 8, numRuns: 300 };
const sumAbs = (t: readonly C[]): number => t.reduce((s, z) => s + abs(z), 0);

/** Worst relative errors seen by the properties below (one run of the file). */
export const worst = { starCurrent: 0, starLoadVoltage: 0, starNeutral: 0, starShift: 0, deltaLine: 0, deltaBranch: 0, deltaBranchVoltage: 0 };

describe('stiff networks: star load', () => {
  it('the review’s case: 1e-9 Ω beside two 1e9 Ω phases on an open neutral draws I1 = 1.9053e-5∠0° A and no neutral current', () => {
    const e = balancedSet(polarDeg(6351, 0));
    const z: Triple<Phasor> = [rect(1e-9), rect(1e9), rect(1e9)];
    const s = solveStar({ sources: e, loads: z, lines: [rect(0), rect(0), rect(0)], neutral: { kind: 'open' } });
    // by hand: phases 2 and 3 carry (E2 − E1)/1e9 and (E3 − E1)/1e9, and I1 = −(I2 + I3) = 3·6351/1e9 ∠0°
    expect(Math.abs(s.currents[0].re - 3 * 6351e-9)).toBeLessThanOrEqual(1e-12 * 3 * 6351e-9);
    expect(Math.abs(s.currents[0].im)).toBeLessThanOrEqual(1e-12 * 3 * 6351e-9);
    expect(magnitude(s.neutralCurrent)).toBe(0);
    const ref = bigStar([...e], [...z], [rect(1e-30), rect(1e-30), rect(1e-30)], 'open');
    for (let k = 0; k < 3; k++) expect(relErr(s.currents[k], ref.currents[k])).toBeLessThanOrEqual(1e-12);
  });

  it('agrees with the 60-digit nodal solution to 1e-9 for impedance ratios up to 1e18 (seeded property)', () => {
    fc.assert(
      fc.property(supply, loadSet, triple(impedance), neutral, (e, z, zl, n) => {
        const s = solveStar({ sources: e, loads: z, lines: zl, neutral: n });
        const r = bigStar([...e], [...z], [...zl], n.kind === 'impedance' ? n.z : n.kind);
        const iScale = sumAbs(r.currents);
        const eScale = Math.max(...e.map(magnitude));
        // the largest current the network could carry: Σ|E| over each branch's impedance
        const natural = z.reduce((acc, zk, k) => (isOpen(zk) ? acc : acc + (3 * eScale) / magnitude(zk.add(zl[k]))), 0);
        for (let k = 0; k < 3; k++) {
          // the 1e-30 floor only absorbs the 60-digit reference's own residue where a current is exactly 0
          const a = relErr(s.currents[k], r.currents[k], 1e-30 * natural);
          const b = relErr(s.loadVoltages[k], r.loadVoltages[k], 1e-30 * eScale);
          worst.starCurrent = Math.max(worst.starCurrent, a);
          worst.starLoadVoltage = Math.max(worst.starLoadVoltage, b);
          expect(a).toBeLessThanOrEqual(1e-9);
          expect(b).toBeLessThanOrEqual(1e-9);
        }
        if (n.kind === 'open') expect(magnitude(s.neutralCurrent)).toBe(0);
        const eN = relErr(s.neutralCurrent, r.neutralCurrent, Math.max(1e-13 * iScale, 1e-30 * natural));
        const eV = relErr(s.shift, r.shift, 1e-13 * eScale);
        worst.starNeutral = Math.max(worst.starNeutral, eN);
        worst.starShift = Math.max(worst.starShift, eV);
        expect(eN).toBeLessThanOrEqual(1e-9);
        expect(eV).toBeLessThanOrEqual(1e-9);
      }),
      RUNS,
    );
  });
});

describe('stiff networks: delta load', () => {
  it('the review’s case: a balanced 1e7 Ω delta behind 1e-6 Ω lines draws three equal line currents √3·398.372/1e7 A', () => {
    const v = lineVoltages(balancedSet(polarDeg(230, 0)));
    const d = solveDelta({ lineVoltages: v, loads: [rect(1e7), rect(1e7), rect(1e7)], lines: [rect(1e-6), rect(1e-6), rect(1e-6)] });
    const ref = bigDelta([...v], [rect(1e7), rect(1e7), rect(1e7)], [rect(1e-6), rect(1e-6), rect(1e-6)]);
    for (let k = 0; k < 3; k++) {
      expect(relErr(d.lineCurrents[k], ref.lineCurrents[k])).toBeLessThanOrEqual(1e-12);
      expect(Math.abs(magnitude(d.lineCurrents[k]) / magnitude(d.lineCurrents[0]) - 1)).toBeLessThanOrEqual(1e-12);
    }
    // balanced: |I_line| = √3·|V_line|/|Z| to within the 1e-13 the line impedances take (common practice)
    expect(Math.abs(magnitude(d.lineCurrents[0]) / ((Math.sqrt(3) * 230 * Math.sqrt(3)) / 1e7) - 1)).toBeLessThanOrEqual(1e-12);
  });

  it('agrees with the 60-digit nodal solution to 1e-9 for impedance ratios up to 1e18 (seeded property)', () => {
    fc.assert(
      fc.property(supply, loadSet, triple(impedance), (e, z, zl) => {
        const v = lineVoltages(e);
        const d = solveDelta({ lineVoltages: v, loads: z, lines: zl });
        const r = bigDelta([...v], [...z], [...zl]);
        const iScale = sumAbs(r.lineCurrents) + sumAbs(r.branchCurrents);
        const vScale = sumAbs(v);
        for (let k = 0; k < 3; k++) {
          const a = relErr(d.lineCurrents[k], r.lineCurrents[k], 1e-30 * iScale);
          const b = relErr(d.branchCurrents[k], r.branchCurrents[k], 1e-30 * iScale);
          const c = relErr(d.branchVoltages[k], r.branchVoltages[k], 1e-30 * vScale);
          worst.deltaLine = Math.max(worst.deltaLine, a);
          worst.deltaBranch = Math.max(worst.deltaBranch, b);
          worst.deltaBranchVoltage = Math.max(worst.deltaBranchVoltage, c);
          expect(a).toBeLessThanOrEqual(1e-9);
          expect(b).toBeLessThanOrEqual(1e-9);
          expect(c).toBeLessThanOrEqual(1e-9);
        }
      }),
      RUNS,
    );
  });
});
