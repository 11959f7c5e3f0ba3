/**
 * Identities of three-phase circuits as fast-check properties, on random passive networks
 * (resistance ≥ 0.1 Ω, so nothing resonates) and random supplies.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { polarDeg, rect, magnitude, ZERO, type Phasor } from '../../../src/core/phasor';
import {
  balancedSet,
  deltaToStar,
  fromSequence,
  lineVoltages,
  magUnbalance,
  solveDelta,
  solveStar,
  starVoltages,
  toSequence,
  vuf,
  type Neutral,
  type Triple,
} from '../../../src/core/threephase';
import { referenceDelta, referenceStar } from './reference';

const near = (a: Phasor, b: { re: number; im: number }, scale: number, rel = 1e-9): boolean => Math.hypot(a.re - b.re, a.im - b.im) <= rel * scale;

const phasor = (lo: number, hi: number) => fc.tuple(fc.double({ min: lo, max: hi, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true })).map(([m, a]) => polarDeg(m, a));
const triple = <T>(g: fc.Arbitrary<T>) => fc.tuple(g, g, g) as fc.Arbitrary<Triple<T>>;
const impedance = fc.tuple(fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true })).map(([r, x]) => rect(r, x));
const lineZ = fc.tuple(fc.double({ min: 0.01, max: 2, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true })).map(([r, x]) => rect(r, x));
/**
 * A physical supply: positive sequence 50–1000 V with up to 50 % negative and zero sequence
 * (degenerate "supplies" with all phases equal leave line voltages of rounding size, where
 * mathjs's LU solve rounds values below its epsilon to zero and stops being a reference).
 */
const supply = fc
  .tuple(phasor(50, 1000), fc.double({ min: 0, max: 0.5, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }))
  .map(([pos, kn, an, k0, a0]) => fromSequence(polarDeg(k0 * magnitude(pos), a0), pos, polarDeg(kn * magnitude(pos), an)));
const neutral: fc.Arbitrary<Neutral> = fc.oneof(
  fc.constant<Neutral>({ kind: 'solid' }),
  fc.constant<Neutral>({ kind: 'open' }),
  lineZ.map((z): Neutral => ({ kind: 'impedance', z })),
);

const sum3 = (t: Triple<Phasor>): Phasor => t[0].add(t[1]).add(t[2]);
const iScale = (t: Triple<Phasor>): number => magnitude(t[0]) + magnitude(t[1]) + magnitude(t[2]);
/**
 * Rounding noise scales with the inputs, not with the results (equal EMFs on a floating
 * star point give currents of exactly 0): current scale Σ|E|·Σ|1/(Z + ZL)|.
 */
const starScale = (e: Triple<Phasor>, z: Triple<Phasor>, zl: Triple<Phasor>): number =>
  iScale(e) * (1 / magnitude(z[0].add(zl[0])) + 1 / magnitude(z[1].add(zl[1])) + 1 / magnitude(z[2].add(zl[2])));

describe('star load identities', () => {
  it('Kirchhoff: the line currents sum to the neutral current, which is V_N’N/Z_N (0 without a neutral)', () => {
    fc.assert(
      fc.property(supply, triple(impedance), triple(lineZ), neutral, (e, z, zl, n) => {
        const s = solveStar({ sources: e, loads: z, lines: zl, neutral: n });
        const scale = starScale(e, z, zl);
        expect(near(sum3(s.currents), s.neutralCurrent, scale)).toBe(true);
        const branch = n.kind === 'impedance' ? s.shift.div(n.z) : ZERO;
        if (n.kind !== 'solid') expect(near(s.neutralCurrent, branch, scale)).toBe(true);
      }),
    );
  });
  it('power balance: source power = load power + line losses + neutral loss', () => {
    fc.assert(
      fc.property(supply, triple(impedance), triple(lineZ), neutral, (e, z, zl, n) => {
        const s = solveStar({ sources: e, loads: z, lines: zl, neutral: n });
        // source power computed here, from the EMFs and the returned currents
        const src = e[0].mul(s.currents[0].conjugate()).add(e[1].mul(s.currents[1].conjugate())).add(e[2].mul(s.currents[2].conjugate()));
        const losses = s.totalLoadPower.add(s.linePower).add(s.neutralPower);
        expect(near(src, losses, iScale(e) * starScale(e, z, zl), 1e-9)).toBe(true);
      }),
    );
  });
  it('a balanced load on a balanced supply draws no neutral current, and the currents have zero VUF', () => {
    fc.assert(
      fc.property(phasor(50, 1000), impedance, lineZ, neutral, fc.constantFrom('positive' as const, 'negative' as const), (e1, z, zl, n, seq) => {
        const s = solveStar({ sources: balancedSet(e1, seq), loads: [z, z, z], lines: [zl, zl, zl], neutral: n });
        expect(magnitude(s.neutralCurrent)).toBe(0);
        expect(magnitude(s.shift)).toBe(0);
        const [, pos, negSeq] = toSequence(s.currents);
        const u = seq === 'positive' ? magnitude(negSeq) / magnitude(pos) : magnitude(pos) / magnitude(negSeq);
        expect(u).toBe(0);
      }),
    );
  });
  it('matches the mathjs reference solution (different formulation, generic LU solve)', () => {
    fc.assert(
      fc.property(supply, triple(impedance), triple(lineZ), neutral, (e, z, zl, n) => {
        const s = solveStar({ sources: e, loads: z, lines: zl, neutral: n });
        const ref = referenceStar([...e], [...z], [...zl], n.kind === 'impedance' ? n.z : n.kind);
        const scale = starScale(e, z, zl);
        for (let k = 0; k < 3; k++) expect(near(s.currents[k], ref.currents[k], scale, 1e-8)).toBe(true);
        expect(near(s.shift, ref.shift, magnitude(e[0]) + magnitude(e[1]) + magnitude(e[2]), 1e-8)).toBe(true);
      }),
    );
  });
});

describe('delta load identities', () => {
  const lineSet = supply.map((e) => lineVoltages(e));
  it('DELTALOAD equals STARLOAD(…, "open") on the DELTATOSTAR impedances, with or without line impedances', () => {
    fc.assert(
      fc.property(lineSet, triple(impedance), fc.option(triple(lineZ), { nil: null }), (v, z, zl) => {
        const d = solveDelta({ lineVoltages: v, loads: z, lines: zl });
        const s = solveStar({ sources: starVoltages(v), loads: deltaToStar(z[0], z[1], z[2]), lines: zl ?? [ZERO, ZERO, ZERO], neutral: { kind: 'open' } });
        const scale = iScale(d.lineCurrents);
        for (let k = 0; k < 3; k++) expect(near(d.lineCurrents[k], s.currents[k], scale, 1e-8)).toBe(true);
      }),
    );
  });
  it('Kirchhoff at the corners and power balance', () => {
    fc.assert(
      fc.property(lineSet, triple(impedance), triple(lineZ), (v, z, zl) => {
        const d = solveDelta({ lineVoltages: v, loads: z, lines: zl });
        const ib = d.branchCurrents;
        const scale = iScale(d.lineCurrents) + iScale(ib);
        expect(near(d.lineCurrents[0], ib[0].sub(ib[2]), scale)).toBe(true);
        expect(near(d.lineCurrents[1], ib[1].sub(ib[0]), scale)).toBe(true);
        expect(near(d.lineCurrents[2], ib[2].sub(ib[1]), scale)).toBe(true);
        const load = sum3(d.branchPowers);
        expect(near(d.sourcePower, load.add(d.linePower), magnitude(d.sourcePower))).toBe(true);
      }),
    );
  });
  it('matches the mathjs reference solution', () => {
    fc.assert(
      fc.property(lineSet, triple(impedance), triple(lineZ), (v, z, zl) => {
        const d = solveDelta({ lineVoltages: v, loads: z, lines: zl });
        const ref = referenceDelta([...v], [...z], [...zl]);
        const scale = iScale(d.lineCurrents);
        for (let k = 0; k < 3; k++) {
          expect(near(d.lineCurrents[k], ref.lineCurrents[k], scale, 1e-8)).toBe(true);
          expect(near(d.branchCurrents[k], ref.branchCurrents[k], iScale(d.branchCurrents), 1e-8)).toBe(true);
        }
      }),
    );
  });
});

describe('sets, sequences and unbalance identities', () => {
  it('FROMSEQCOMP(SEQCOMP(x)) = x', () => {
    fc.assert(
      fc.property(triple(phasor(0, 1000)), (x) => {
        const [a, b, c] = toSequence(x);
        const y = fromSequence(a, b, c);
        for (let k = 0; k < 3; k++) expect(near(y[k], x[k], iScale(x) + 1e-300, 1e-12)).toBe(true);
      }),
    );
  });
  it('STARVOLTS(LINEVOLTS(x)) = x for sets without zero sequence', () => {
    fc.assert(
      fc.property(phasor(1, 1000), phasor(0, 1000), (pos, neg) => {
        const x = fromSequence(ZERO, pos, neg);
        const y = starVoltages(lineVoltages(x));
        for (let k = 0; k < 3; k++) expect(near(y[k], x[k], iScale(x), 1e-12)).toBe(true);
      }),
    );
  });
  it('the MAG method equals VUF on the same line voltages (IEC 61000-4-30)', () => {
    fc.assert(
      fc.property(phasor(1, 1000), phasor(0, 1000), phasor(0, 1000), (pos, negRaw, zero) => {
        // keep |V−| below |V+| so the set is a physical positive-sequence supply
        const neg = negRaw.mul(0.999 * Math.min(1, magnitude(pos) / Math.max(magnitude(negRaw), 1e-300)));
        const l = lineVoltages(fromSequence(zero, pos, neg));
        const mags: Triple<number> = [magnitude(l[0]), magnitude(l[1]), magnitude(l[2])];
        const a = magUnbalance(mags);
        const b = vuf(l);
        // The magnitude formula subtracts nearly equal numbers when the unbalance is small:
        // 1 − √(3 − 6β) ≈ 2(u/100)², so a few ulps there move u (percent) by about
        // ulps × du/d(1 − √(3 − 6β)) ≈ ulps × 2500/u. The tolerance is that conditioning.
        const conditioning = 2500 / Math.max(b, 1e-9);
        expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * b + 64 * Number.EPSILON * conditioning);
      }),
    );
  });
});
