import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg, type Phasor } from '../../../src/core/phasor';
import { OPEN, balancedSet, deltaToStar, lineVoltages, solveDelta, solveStar, type Triple } from '../../../src/core/threephase';
import { expectClose, expectPhasorClose, expectPhzError } from '../../helpers';
import { referenceDelta } from './reference';
import { bigDelta } from './bigref';

const V400: Triple<Phasor> = lineVoltages(balancedSet(polarDeg(400 / Math.sqrt(3), -30)));

describe('solveDelta — published examples', () => {
  it('unbalanced delta of resistors on a balanced supply: |I1|² = V²(1/R12² + 1/R31² + 1/(R12·R31)) (law of cosines on branch currents 120° apart; common practice)', () => {
    const [r12, r23, r31] = [40, 80, 25];
    const s = solveDelta({ lineVoltages: V400, loads: [rect(r12), rect(r23), rect(r31)], lines: null });
    const mag = (a: number, b: number): number => 400 * Math.sqrt(1 / a ** 2 + 1 / b ** 2 + 1 / (a * b));
    expectClose(magnitude(s.lineCurrents[0]), mag(r12, r31));
    expectClose(magnitude(s.lineCurrents[1]), mag(r23, r12));
    expectClose(magnitude(s.lineCurrents[2]), mag(r31, r23));
    expectClose(s.branchPowers[0].re + s.branchPowers[1].re + s.branchPowers[2].re, 400 ** 2 * (1 / r12 + 1 / r23 + 1 / r31));
  });
  it('bissoy.com MCQ 327965: Z_RY = 20∠30° Ω on 400 V (V_RY = 400∠0°, RYB) carries I_RY = 17.32 − j10 A', () => {
    const s = solveDelta({ lineVoltages: V400, loads: [polarDeg(20, 30), polarDeg(40, 60), polarDeg(10, -90)], lines: null });
    expectClose(s.branchCurrents[0].re, 17.32, 1e-3);
    expectClose(s.branchCurrents[0].im, -10, 1e-9);
  });
  it('Steinmetz balancing: R across lines 1–2 with −j√3R (capacitor) across 2–3 and +j√3R (inductor) across 3–1 draws balanced unity-power-factor line currents (Gyugyi, Otto & Putman, IEEE Trans. PAS-97, 1978, ideal load compensation; from memory)', () => {
    const r = 40;
    const s = solveDelta({ lineVoltages: V400, loads: [rect(r), rect(0, -Math.sqrt(3) * r), rect(0, Math.sqrt(3) * r)], lines: null });
    // the star set behind V12 = 400∠0° has phase 1 at −30°; the resistor's power V²/R = 3E²/R is drawn as
    // balanced currents in phase with it: I_k = E_k/R
    const e = balancedSet(polarDeg(400 / Math.sqrt(3), -30));
    for (let k = 0; k < 3; k++) expectPhasorClose(s.lineCurrents[k], e[k].div(r));
  });
});

describe('solveDelta — cases', () => {
  it('without line impedances, branch k sees its line voltage and KCL gives the line currents', () => {
    const s = solveDelta({ lineVoltages: V400, loads: [rect(40), rect(80), rect(40)], lines: null });
    expectPhasorClose(s.branchCurrents[0], polarDeg(10, 0));
    expectPhasorClose(s.lineCurrents[0], polarDeg(10 * Math.sqrt(3), -30));
    expectPhasorClose(s.lineCurrents[1], s.branchCurrents[1].sub(s.branchCurrents[0]));
    expectClose(angleDeg(s.lineCurrents[2]), angleDeg(s.branchCurrents[2].sub(s.branchCurrents[1])));
  });
  it('an open branch carries nothing and still has its line voltage across it (open delta)', () => {
    const s = solveDelta({ lineVoltages: V400, loads: [rect(40), OPEN, rect(40)], lines: null });
    expect(magnitude(s.branchCurrents[1])).toBe(0);
    expectPhasorClose(s.branchVoltages[1], V400[1]);
  });
  it('with line impedances it matches the mathjs reference (nodal solve from a different source set)', () => {
    const v = lineVoltages([polarDeg(240, 3), polarDeg(226, -117), polarDeg(234, 121)]);
    const z = [rect(30, 12), rect(45, -20), rect(25, 5)];
    const zl = [rect(0.3, 0.2), rect(0.25, 0.15), rect(0.4, 0.1)];
    const s = solveDelta({ lineVoltages: v, loads: [z[0], z[1], z[2]], lines: [zl[0], zl[1], zl[2]] });
    const ref = referenceDelta([...v], z, zl);
    for (let k = 0; k < 3; k++) {
      expectPhasorClose(s.lineCurrents[k], ref.lineCurrents[k], 1e-10);
      expectPhasorClose(s.branchCurrents[k], ref.branchCurrents[k], 1e-10);
    }
  });
  it('with line impedances it equals STARLOAD(…, "open") on the Kennelly star equivalent', () => {
    const z = [rect(30, 12), rect(45, -20), rect(25, 5)] as const;
    const zl: Triple<Phasor> = [rect(0.3, 0.2), rect(0.3, 0.2), rect(0.3, 0.2)];
    const d = solveDelta({ lineVoltages: V400, loads: z, lines: zl });
    const st = solveStar({ sources: balancedSet(polarDeg(400 / Math.sqrt(3), -30)), loads: deltaToStar(...z), lines: zl, neutral: { kind: 'open' } });
    for (let k = 0; k < 3; k++) expectPhasorClose(d.lineCurrents[k], st.currents[k], 1e-10);
  });
  it('a 0 Ω branch behind line impedances is a fault limited by the lines, solved exactly', () => {
    const zl: Triple<Phasor> = [rect(0.5, 0.5), rect(0.5, 0.5), rect(0.5, 0.5)];
    const s = solveDelta({ lineVoltages: V400, loads: [rect(0), rect(40), rect(40)], lines: zl });
    // corners 1 and 2 are one node: the bolted line-to-line fault current ≈ V12/(ZL1 + ZL2) plus the load share
    expect(magnitude(s.branchVoltages[0])).toBe(0);
    expect(magnitude(s.lineCurrents[0])).toBeGreaterThan(0.9 * 400 / magnitude(zl[0].add(zl[1])));
    const kcl = s.lineCurrents[0].add(s.lineCurrents[1]).add(s.lineCurrents[2]);
    expect(magnitude(kcl)).toBeLessThan(1e-9 * magnitude(s.lineCurrents[0]));
  });
  it('power balance with line impedances: supply power = branch powers + line losses', () => {
    const zl: Triple<Phasor> = [rect(0.3, 0.2), rect(0.2, 0.1), rect(0.4, 0.3)];
    const s = solveDelta({ lineVoltages: V400, loads: [rect(30, 12), rect(45, -20), OPEN], lines: zl });
    const load = s.branchPowers[0].add(s.branchPowers[1]).add(s.branchPowers[2]);
    expectPhasorClose(s.sourcePower, load.add(s.linePower), 1e-10);
  });
});

describe('solveDelta — routes with line impedances', () => {
  const zl: Triple<Phasor> = [rect(0.5, 0.2), rect(0.4, 0.3), rect(0.6, 0.1)];
  const v = lineVoltages([polarDeg(240, 3), polarDeg(226, -117), polarDeg(234, 121)]);
  it.each([
    ['a resonant delta (Z12 + Z23 + Z31 = 0: no star equivalent, nodal route)', [rect(0, 10), rect(0, 10), rect(0, -20)]],
    ['a delta within 1e-6 of resonance (nodal route)', [rect(0, 10), rect(0, 10), rect(0, -20.000001)]],
    ['a delta near resonance (star-equivalent route)', [rect(0, 10), rect(0, 10), rect(0, -20.01)]],
    ['a delta with a 0 Ω branch', [rect(0), rect(30, 12), rect(25, 5)]],
  ] as const)('%s matches the 60-digit nodal reference', (_, z) => {
    const s = solveDelta({ lineVoltages: v, loads: [...z] as unknown as Triple<Phasor>, lines: zl });
    const ref = bigDelta([...v], z.map((x) => (x.re === 0 && x.im === 0 ? rect(1e-40) : x)), [...zl]);
    for (let k = 0; k < 3; k++) {
      expectPhasorClose(s.lineCurrents[k], ref.lineCurrents[k], 1e-9);
      expectPhasorClose(s.branchCurrents[k], ref.branchCurrents[k], 1e-9);
    }
  });
  it('one open branch: the other two carry the line currents at the corners they share with it; the gap sees the KVL remainder', () => {
    const s = solveDelta({ lineVoltages: v, loads: [rect(30, 12), OPEN, rect(25, 5)], lines: zl });
    const ref = bigDelta([...v], [rect(30, 12), 'open', rect(25, 5)], [...zl]);
    for (let k = 0; k < 3; k++) {
      expectPhasorClose(s.lineCurrents[k], ref.lineCurrents[k], 1e-12);
      if (k !== 1) expectPhasorClose(s.branchCurrents[k], ref.branchCurrents[k], 1e-12);
      expectPhasorClose(s.branchVoltages[k], ref.branchVoltages[k], 1e-12);
    }
    expect(magnitude(s.branchCurrents[1])).toBe(0);
  });
  it('two open branches: one series circuit, I = V12/(Z12 + ZL1 + ZL2) by Ohm’s law', () => {
    const z = rect(30, 12);
    const s = solveDelta({ lineVoltages: v, loads: [z, OPEN, OPEN], lines: zl });
    const i = v[0].div(z.add(zl[0]).add(zl[1]));
    expectPhasorClose(s.branchCurrents[0], i, 1e-14);
    expectPhasorClose(s.lineCurrents[0], i, 1e-14);
    expectPhasorClose(s.lineCurrents[1], i.neg(), 1e-14);
    expect(magnitude(s.lineCurrents[2])).toBe(0);
    const ref = bigDelta([...v], [z, 'open', 'open'], [...zl]);
    for (let k = 0; k < 3; k++) expectPhasorClose(s.branchVoltages[k], ref.branchVoltages[k], 1e-12);
  });
});

describe('solveDelta — bad networks', () => {
  const zl: Triple<Phasor> = [rect(0), rect(0), rect(0.5)];
  it.each([
    ['a 0 Ω branch with no line impedance', () => solveDelta({ lineVoltages: V400, loads: [rect(10), rect(0), rect(10)], lines: null }), /branch 23 is 0 Ω with no line impedance/],
    ['a 0 Ω branch between two lines of 0 Ω', () => solveDelta({ lineVoltages: V400, loads: [rect(0), rect(10), rect(10)], lines: zl }), /lines 1 and 2 of the supply are joined through 0 Ω/],
    ['all branches open', () => solveDelta({ lineVoltages: V400, loads: [OPEN, OPEN, OPEN], lines: null }), /all three branch impedances are "open"/],
    ['line voltages that do not close', () => solveDelta({ lineVoltages: [polarDeg(400, 0), polarDeg(400, -120), polarDeg(400, 100)], loads: [rect(10), rect(10), rect(10)], lines: null }), /line_voltages does not close/],
    ['a resonant network', () => solveDelta({ lineVoltages: V400, loads: [rect(0, -2), OPEN, OPEN], lines: [rect(0, 1), rect(0, 1), rect(0, 1)] }), /resonate/],
  ])('rejects %s', (_, f, msg) => {
    expect(expectPhzError(f).message).toMatch(msg);
  });
});
