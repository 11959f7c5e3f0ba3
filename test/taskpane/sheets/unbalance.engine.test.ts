/**
 * Supply-unbalance worked sheet written into the preview engine. References: mathjs
 * complex arithmetic and its matrix product for the Fortescue transform; the closed set
 * from magnitudes by coordinates (the third side from two circle equations), not the
 * sheet's angle route; the NEMA derating from the core's curve. Published example: NEMA MG 1.
 */
import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import type { Complex as MComplex } from 'mathjs';
import { motorDerate } from '../../../src/core/threephase';
import { demoValues, type FieldValue } from '../../../src/taskpane/sheets/calculation';
import { COL } from '../../../src/taskpane/sheets/plan';
import { magnitudesOnly, unbalance } from '../../../src/taskpane/sheets/unbalance';
import { abs, add, cx, div, expectChecksPass, expectExistingUntouched, expectStepsMatch, polar, sub, write, type Expected, type Written } from './harness';

const BR = ['12', '23', '31'] as const;
type Values = Record<string, FieldValue>;

function reference(v: Values): Record<string, Expected> {
  const ref: Record<string, Expected> = {};
  let closed: MComplex[];
  if (magnitudesOnly(v)) {
    const [a, b, c] = BR.map((br) => Number(v[`V${br}`]));
    // V12 = (a, 0); V23 = (x, y) with |V23| = b and |V12 + V23| = c; y < 0 for 1→2→3
    const x = (c * c - b * b - a * a) / (2 * a);
    const y = -Math.sqrt(b * b - x * x);
    const v12 = math.complex(a, 0);
    const v23 = math.complex(x, y);
    closed = [v12, v23, math.unaryMinus(add(v12, v23)) as MComplex];
    const deg = (z: MComplex) => (Math.atan2(z.im, z.re) * 180) / Math.PI;
    ref.C_12 = 180 + deg(v23);
    ref.A_23 = (deg(closed[2]) + 360) % 360 - (180 + deg(v23));
  } else {
    const m = BR.map((br) => cx(v[`V${br}`]));
    const v0 = div(add(...m), 3);
    ref.V_0 = v0;
    closed = m.map((z) => sub(z, v0));
  }
  const u = closed.map(abs);
  BR.forEach((br, i) => {
    ref[`U_${br}`] = u[i];
    ref[`Vc_${br}`] = closed[i];
  });
  const a = polar(1, 120);
  const a2 = polar(1, 240);
  const fortescue = math.matrix([
    [1, 1, 1],
    [1, a, a2],
    [1, a2, a],
  ]);
  const seq = math.divide(math.multiply(fortescue, math.matrix(closed)), 3) as math.Matrix;
  const [, pos, neg] = (seq.toArray() as MComplex[]).map((z) => math.complex(z));
  ref.V_pos = pos;
  ref.V_neg = neg;
  ref.VUF_pct = (abs(neg) / abs(pos)) * 100;
  const avg = (u[0] + u[1] + u[2]) / 3;
  ref.U_avg = avg;
  ref.LVUR_pct = (Math.max(...u.map((x) => Math.abs(x - avg))) / avg) * 100;
  const e = [0, 1, 2].map((i) => div(sub(closed[i], closed[(i + 2) % 3]), 3));
  e.forEach((z, i) => (ref[`E_${i + 1}`] = z));
  const em = e.map(abs);
  const eavg = (em[0] + em[1] + em[2]) / 3;
  ref.PVUR_pct = (Math.max(...em.map((x) => Math.abs(x - eavg))) / eavg) * 100;
  const s2 = u.reduce((s, x) => s + x * x, 0);
  const beta = u.reduce((s, x) => s + x ** 4, 0) / (s2 * s2);
  ref.beta_U = beta;
  const r = Math.sqrt(3 - 6 * beta);
  ref.IEC_u2 = Math.sqrt((1 - r) / (1 + r)) * 100;
  ref.k_derate = (ref.LVUR_pct as number) > 5 ? 'none: operation above 5 % not recommended' : motorDerate(ref.LVUR_pct as number);
  return ref;
}

function verdicts(w: Written): string[] {
  return w.plan.cells.filter((c) => c.role === 'verdict' && c.col === COL.block).map((c) => String(w.display(c.row, c.col)));
}

describe('worked sheet: supply unbalance check, in the preview engine', () => {
  const demo = demoValues(unbalance);

  it('writes the demo (magnitudes only): every step equals the reference, every check passes', () => {
    expect(magnitudesOnly(demo)).toBe(true);
    const w = write(unbalance, demo);
    expectStepsMatch(w, reference(demo));
    expectChecksPass(w);
    expectExistingUntouched(w);
  });

  it('phasor route: measured phasors, closed by removing V0; VUF unchanged by it', () => {
    // closes to 6 figures: V31 = −(V12 + V23)
    const v: Values = { V12: '405∠30.2', V23: '398∠-91.1', V31: '393.632∠150.438' };
    const w = write(unbalance, v);
    expectStepsMatch(w, reference(v));
    expectChecksPass(w);
  });

  it('states the result against the limits: VUF over 2 % and LVUR over 1 % in the demo', () => {
    const w = write(unbalance, demo);
    const ref = reference(demo);
    expect(ref.VUF_pct as number).toBeGreaterThan(2);
    expect(verdicts(w)).toEqual(['EXCEEDS 2 %', 'ABOVE 1 %: derate motors by the factor above']);
  });

  // NEMA MG 1, Part 14 ("Effects of unbalanced voltages on the performance of polyphase
  // induction motors"), example (from memory): line voltages 460, 467 and 450 V average
  // 459 V; the largest deviation is 9 V, so the percent unbalance is 100 × 9/459 = 1.96 %.
  it('published example: NEMA MG 1, 460/467/450 V gives 1.96 % unbalance', () => {
    const v: Values = { V12: 460, V23: 467, V31: 450 };
    const w = write(unbalance, v);
    expect(w.value('U_avg')).toBe(459);
    expect(Number((w.value('LVUR_pct') as number).toFixed(2))).toBe(1.96);
    const ref = reference(v);
    expectStepsMatch(w, ref);
    expectChecksPass(w);
    // its VUF is above 2 %: the phase angles of magnitudes this far apart do the rest
    expect(verdicts(w)).toEqual([(ref.VUF_pct as number) <= 2 ? 'within 2 %' : 'EXCEEDS 2 %', 'ABOVE 1 %: derate motors by the factor above']);
  });

  it('recalculates every step when the readings change; a balanced supply shows no unbalance', () => {
    const w = write(unbalance, demo);
    for (const br of BR) w.setInput(`V${br}`, 400);
    const v: Values = { V12: 400, V23: 400, V31: 400 };
    // unbalance factors of a balanced set are rounding noise: compared to 1e-9 %
    expectStepsMatch(w, reference(v), 1e-9, { '%': 1 });
    expect(w.value('VUF_pct') as number).toBeLessThan(1e-9);
    expect(verdicts(w)).toEqual(['within 2 %', 'within 1 %: no derating']);
    w.setInput('V23', 412);
    expectStepsMatch(w, reference({ ...v, V23: 412 }));
    expectChecksPass(w);
  });
});
