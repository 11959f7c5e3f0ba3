/**
 * Neutral-with-harmonics worked sheet written into the preview engine. References: mathjs
 * complex arithmetic for the neutral components (each phase's harmonic at h × its supply
 * voltage angle); the core's IEC 60364-5-52 Annex E table and NFPA 70 220.61 rule for the
 * sizing steps. Published example: IEC 60364-5-52 Annex E.
 */
import { describe, expect, it } from 'vitest';
import { neutralDemand, sizingCurrent } from '../../../src/core/threephase';
import { demoValues, type FieldValue } from '../../../src/taskpane/sheets/calculation';
import { ORDERS, neutralHarmonics } from '../../../src/taskpane/sheets/neutral-harmonics';
import { abs, add, arg, cx, expectChecksPass, expectExistingUntouched, expectStepsMatch, polar, write, type Expected } from './harness';

const K = [1, 2, 3] as const;
type Values = Record<string, FieldValue>;

function reference(v: Values): Record<string, Expected> {
  const i = K.map((k) => cx(v[`I${k}`]));
  const e = K.map((k) => cx(v[`E${k}`]));
  const ref: Record<string, Expected> = { I_N1: add(...i) };
  let sumSq = abs(ref.I_N1 as never) ** 2;
  let distortion = 1;
  for (const h of ORDERS) {
    const p = Number(v[`k${h}`]) / 100;
    const component = add(...K.map((_, n) => polar(p * abs(i[n]), (h * arg(e[n]) * 180) / Math.PI)));
    ref[`I_N${h}`] = component;
    sumSq += abs(component) ** 2;
    distortion += p * p;
  }
  ref.IN_rms = Math.sqrt(sumSq);
  const rms = i.map((z) => abs(z) * Math.sqrt(distortion));
  K.forEach((k, n) => (ref[`Irms_${k}`] = rms[n]));
  const ib = Math.max(...rms);
  ref.I_B = ib;
  ref.IN_ratio = (ref.IN_rms as number) / ib;
  const size = sizingCurrent(ib, Number(v.k3));
  ref.k_E = size.factor;
  ref.basis_E = size.basis;
  ref.I_basis = size.current * size.factor;
  ref.I_size = size.current;
  ref.L_neutral = neutralDemand(Number(v.Lu), Number(v.Lnl));
  return ref;
}

describe('worked sheet: neutral with harmonics and sizing, in the preview engine', () => {
  const demo = demoValues(neutralHarmonics);

  it('writes the demo: every step equals the reference, every check passes, nothing else touched', () => {
    const w = write(neutralHarmonics, demo);
    expectStepsMatch(w, reference(demo));
    expectChecksPass(w);
    expectExistingUntouched(w);
  });

  it('on a balanced supply the triplens add arithmetically and the others cancel', () => {
    const w = write(neutralHarmonics, demo);
    for (const h of ORDERS) {
      const sum = K.reduce((s, k) => s + (Number(demo[`k${h}`]) / 100) * abs(cx(demo[`I${k}`])), 0);
      const got = abs(w.value(`I_N${h}`) as never);
      if (h % 3 === 0) expect(Math.abs(got - sum) / sum).toBeLessThan(1e-12);
      else expect(got).toBeLessThan(sum);
    }
  });

  // IEC 60364-5-52:2009, Annex E, example (from memory): a three-phase circuit with a design
  // load of 39 A on four-core cable. With 20 % third harmonic the factor is 0.86 and the cable
  // is chosen for 39/0.86 = 45 A; with 40 % it is chosen on the neutral current
  // 39 × 0.4 × 3 = 46.8 A, for 46.8/0.86 = 54.4 A; with 50 % on 39 × 0.5 × 3 A, factor 1.
  it.each([
    [20, 45.3, 0.86, 'phase'],
    [40, 54.4, 0.86, 'neutral'],
    [50, 39 * 0.5 * 3, 1, 'neutral'],
  ] as const)('published example: IEC 60364-5-52 Annex E, IB = 39 A with %i percent third harmonic (published %s A)', (k3, published, factor, basis) => {
    // phase currents whose rms (fundamental and third only) is exactly 39 A
    const fundamental = 39 / Math.sqrt(1 + (k3 / 100) ** 2);
    const v: Values = { ...demo, I1: `${fundamental}∠0`, I2: `${fundamental}∠-120`, I3: `${fundamental}∠120`, k3 };
    for (const h of ORDERS) if (h !== 3) v[`k${h}`] = 0;
    const w = write(neutralHarmonics, v);
    expect(Math.abs((w.value('I_B') as number) - 39)).toBeLessThan(1e-9);
    expect(Math.abs((w.value('I_size') as number) - published)).toBeLessThanOrEqual(0.05);
    expect(w.value('k_E')).toBe(factor);
    expect(w.value('basis_E')).toBe(basis);
    expectStepsMatch(w, reference(v));
    expectChecksPass(w);
  });

  it('recalculates every step when the currents, voltages and harmonic table change', () => {
    const w = write(neutralHarmonics, demo);
    const v: Values = { ...demo, I1: '95∠-30', I2: '120∠-160', I3: '60∠80', E2: '229∠-121', k3: 48, k5: 22, k9: 11, Lu: 340, Lnl: 12 };
    for (const f of ['I1', 'I2', 'I3', 'E2', 'k3', 'k5', 'k9', 'Lu', 'Lnl']) w.setInput(f, v[f]);
    expectStepsMatch(w, reference(v));
    expectChecksPass(w);
    expect(w.value('basis_E')).toBe('neutral');
  });
});
