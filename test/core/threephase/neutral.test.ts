import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import { angleRad, polarDeg, magnitude, rect } from '../../../src/core/phasor';
import { balancedSet, neutral120, neutralDemand, neutralRms, sizingCurrent } from '../../../src/core/threephase';
import { expectClose, expectPhzError } from '../../helpers';

const I100 = balancedSet(polarDeg(100, -25));

describe('neutral120', () => {
  it('equals the magnitude of the phasor sum for currents 120° apart at one power factor', () => {
    const i = [polarDeg(30, -20), polarDeg(18, -140), polarDeg(25, 100)];
    expectClose(neutral120(30, 18, 25), magnitude(i[0].add(i[1]).add(i[2])));
  });
  it('is 0 when balanced and the phase current when only one phase is loaded', () => {
    expect(neutral120(40, 40, 40)).toBe(0);
    expectClose(neutral120(40, 0, 0), 40);
  });
});

describe('neutralRms', () => {
  it('Mike Holt newsletter "Voltage Drop and Nonlinear Loads" (2007): third harmonic ≈ 1/3 of the fundamental on balanced phases → neutral ≈ the phase current', () => {
    const r = neutralRms(I100, [{ order: 3, percent: [100 / 3, 100 / 3, 100 / 3] }]);
    expectClose(r.rms, 100, 1e-12);
  });
  it('Mike Holt forum (2023 NEC 310.15(E)(3) thread): 10 % distortion, all triplen, on a balanced set → neutral 30 % of the line current', () => {
    expectClose(neutralRms(I100, [{ order: 3, percent: [10, 10, 10] }]).rms, 30, 1e-12);
  });
  it('non-triplen harmonics of a balanced set cancel; triplens add; rms is the root-sum-square', () => {
    const r = neutralRms(I100, [
      { order: 3, percent: [30, 30, 30] },
      { order: 5, percent: [20, 20, 20] },
      { order: 7, percent: [14, 14, 14] },
      { order: 9, percent: [8, 8, 8] },
    ]);
    expect(r.byOrder.find(([h]) => h === 5)?.[1]).toBe(0);
    expect(r.byOrder.find(([h]) => h === 7)?.[1]).toBe(0);
    expectClose(r.rms, Math.hypot(90, 24));
  });
  it('unbalanced contents: each phase’s harmonic is at h × its phase-voltage angle (0°, −120°, +120° by default)', () => {
    const i = [polarDeg(50, 10), polarDeg(40, -115), polarDeg(30, 128)] as const;
    const r = neutralRms(i, [{ order: 3, percent: [20, 30, 10] }]);
    // balanced supply: 3 × 0°, 3 × −120°, 3 × 120° are all 0°, so the third harmonics add arithmetically
    expectClose(r.byOrder[0][1], 10 + 12 + 3);
    expectClose(r.rms, Math.hypot(magnitude(i[0].add(i[1]).add(i[2])), 25));
  });
  // The independent review's case (issue 8 §1): phases at pf 0.95, 1.0 and 0.8 with 40 % third harmonic.
  const MIXED_PF = [polarDeg(20, -18.19), polarDeg(20, -120), polarDeg(20, 83.13)] as const;
  it('phases at different power factors: the third harmonics still add in the neutral (IEC 60364-5-52:2009 Annex E basis, 3 × h × I)', () => {
    const r = neutralRms(MIXED_PF, [{ order: 3, percent: [40, 40, 40] }]);
    // IEC 60364-5-52 Annex E takes the neutral current as 3 × the third-harmonic content × the line current
    // (the clause E.52 examples, from memory): 3 × 0.40 × 20 A = 24 A, whatever the displacement power factors
    expectClose(r.byOrder[0][1], 3 * 0.4 * 20, 1e-12);
    // fundamental: the phasor sum, computed here with mathjs (an independent complex library)
    const fund = math.abs(
      math.add(math.add(math.complex({ r: 20, phi: (-18.19 * Math.PI) / 180 }), math.complex({ r: 20, phi: (-120 * Math.PI) / 180 })), math.complex({ r: 20, phi: (83.13 * Math.PI) / 180 })) as math.Complex,
    ) as unknown as number;
    expectClose(r.rms, Math.hypot(fund, 24), 1e-12);
    expectClose(r.rms, 26.8243, 1e-5); // √(11.98² + 24²) ≈ 26.82 A, the review's figure
  });
  it('equals the rms of the summed waveforms sampled over one cycle (time-domain check, independent of the phasor sums)', () => {
    const harmonics = [
      { order: 3, percent: [40, 35, 45] as const },
      { order: 5, percent: [20, 25, 15] as const },
      { order: 9, percent: [8, 6, 10] as const },
    ];
    const v = [polarDeg(231, 0), polarDeg(226, -121), polarDeg(229, 119)] as const;
    const r = neutralRms(MIXED_PF, harmonics, v);
    // i_N(t) = Σ_k √2·|I_k|·cos(ωt + θ_k) + Σ_h Σ_k √2·p/100·|I_k|·cos(h(ωt + φ_k)), φ_k the phase-voltage angles;
    // N equally spaced samples of a trigonometric polynomial of degree < N/2 give its mean square exactly
    const n = 4096;
    let sumSq = 0;
    for (let s = 0; s < n; s++) {
      const wt = (2 * Math.PI * s) / n;
      let iN = 0;
      for (let k = 0; k < 3; k++) {
        const mag = magnitude(MIXED_PF[k]);
        iN += Math.SQRT2 * mag * Math.cos(wt + angleRad(MIXED_PF[k]));
        for (const h of harmonics) iN += Math.SQRT2 * (h.percent[k] / 100) * mag * Math.cos(h.order * (wt + angleRad(v[k])));
      }
      sumSq += iN * iN;
    }
    expectClose(r.rms, Math.sqrt(sumSq / n), 1e-12);
  });
  it('supply voltages given: only their angles count (a 10 V and a 400 V set at the same angles agree)', () => {
    const h = [{ order: 3, percent: [30, 30, 30] as const }];
    const a = neutralRms(MIXED_PF, h, [polarDeg(10, 5), polarDeg(10, -118), polarDeg(10, 121)]);
    const b = neutralRms(MIXED_PF, h, [polarDeg(400, 5), polarDeg(400, -118), polarDeg(400, 121)]);
    expectClose(a.rms, b.rms, 1e-14);
    // third harmonics at 15°, −354°, 363°: 6 A each, computed by hand with mathjs
    const third = math.abs(
      math.add(math.add(math.complex({ r: 6, phi: (15 * Math.PI) / 180 }), math.complex({ r: 6, phi: (-354 * Math.PI) / 180 })), math.complex({ r: 6, phi: (363 * Math.PI) / 180 })) as math.Complex,
    ) as unknown as number;
    expectClose(a.byOrder[0][1], third, 1e-12);
  });
  it('rejects a 0 V supply phase (its angle is undefined)', () => {
    const err = expectPhzError(() => neutralRms(MIXED_PF, [{ order: 3, percent: [30, 30, 30] }], [polarDeg(230, 0), rect(0), polarDeg(230, 120)]));
    expect(err.message).toMatch(/phase_voltages, phase 2 is 0 V/);
  });
});

describe('sizingCurrent (IEC 60364-5-52:2009 Annex E, Table E.52.1)', () => {
  it.each([
    // IEC 60364-5-52:2009 Annex E worked example, design load 39 A in a four-core cable (from memory)
    ['IEC 60364-5-52 Annex E example, 39 A with 20 % third harmonic → 39/0.86 = 45 A on the line current (from memory)', 39, 20, 45.35, 0.86, 'phase'],
    ['IEC 60364-5-52 Annex E example, 39 A with 40 % → neutral 46.8 A, /0.86 = 54.4 A (from memory)', 39, 40, 54.42, 0.86, 'neutral'],
    ['IEC 60364-5-52 Annex E example, 39 A with 50 % → neutral 58.5 A, factor 1 (from memory)', 39, 50, 58.5, 1, 'neutral'],
    ['BS 7671:2008+A1:2011 Table 4Aa (same rule), pangonilo.com case 1: 25 A with 32 % → 25/0.86 = 29 A', 25, 32, 29.07, 0.86, 'phase'],
  ] as const)('%s', (_, ib, h, current, factor, basis) => {
    const r = sizingCurrent(ib, h);
    expectClose(r.current, current, 0.001);
    expect(r.factor).toBe(factor);
    expect(r.basis).toBe(basis);
  });
  it.each([
    [15, 1, 'phase', 100],
    [15.0001, 0.86, 'phase', 100 / 0.86],
    [33, 0.86, 'phase', 100 / 0.86],
    [33.0001, 0.86, 'neutral', (3 * 33.0001) / 0.86],
    [45, 0.86, 'neutral', 135 / 0.86],
    [45.0001, 1, 'neutral', 135.0003],
  ] as const)('band edge %s %%: factor %s on %s current', (h, factor, basis, current) => {
    const r = sizingCurrent(100, h);
    expect(r.factor).toBe(factor);
    expect(r.basis).toBe(basis);
    expectClose(r.current, current);
  });
  it('rejects a negative percentage or current', () => {
    expect(expectPhzError(() => sizingCurrent(10, -1)).message).toMatch(/third_harmonic_pct is -1 %/);
    expect(expectPhzError(() => sizingCurrent(-10, 5)).message).toMatch(/design_current is -10 A/);
  });
});

describe('neutralDemand (NFPA 70 Art. 220.61)', () => {
  it.each([
    ['EC&M Code Quiz (2005 NEC 220.61(B)(2)): 475 A neutral load → 392.5 A', 475, 0, 392.5],
    ['NFPA 70 Art. 220.61(B)(1) applied by hand: 200 A + 0.7 × 60 A = 242 A', 260, 0, 242],
    ['EC&M Code Quiz 69 (2005 NEC 220.61(C)): 475 A of nonlinear load → 475 A, no reduction', 0, 475, 475],
    ['up to 200 A is taken at 100 %', 180, 0, 180],
    ['the nonlinear part adds at 100 % to the reduced linear part', 300, 50, 200 + 70 + 50],
  ] as const)('%s', (_, lin, nl, want) => {
    expectClose(neutralDemand(lin, nl), want);
  });
  it('rejects negative loads', () => {
    expect(expectPhzError(() => neutralDemand(-5, 0)).message).toMatch(/unbalanced_load is -5 A/);
    expect(expectPhzError(() => neutralDemand(5, -1)).message).toMatch(/nonlinear_load is -1 A/);
  });
});
