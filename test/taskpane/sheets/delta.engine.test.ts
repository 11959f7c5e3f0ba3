/**
 * Delta-load worked sheet written into the preview engine. References: line and branch
 * currents from a nodal solve of the three corners with mathjs `lusolve` (fed by a source
 * other than the sheet's star equivalent: E1 = 0, E2 = −V12, E3 = V31; see
 * test/core/threephase/reference.ts) when every line has an impedance, and from the
 * textbook relations I12 = V12/Z12, I1 = I12 − I31 without lines; every other step with
 * mathjs complex arithmetic. No published worked example of an unbalanced delta with line
 * impedances was at hand: mathjs only.
 */
import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import type { Complex as MComplex } from 'mathjs';
import { demoValues, type FieldValue } from '../../../src/taskpane/sheets/calculation';
import { delta } from '../../../src/taskpane/sheets/delta';
import { referenceDelta } from '../../core/threephase/reference';
import { abs, add, conj, cx, div, expectChecksPass, expectExistingUntouched, expectStepsMatch, mul, sub, write, type Expected } from './harness';

const K = [1, 2, 3] as const;
const BR = ['12', '23', '31'] as const;
const ENDS = [
  [0, 1],
  [1, 2],
  [2, 0],
] as const;
type Values = Record<string, FieldValue>;
const cxOf = (z: { re: number; im: number } | number): MComplex => (typeof z === 'number' ? math.complex(z, 0) : math.complex(z.re ?? 0, z.im ?? 0));

function reference(v: Values): Record<string, Expected> {
  const vl = BR.map((b) => cx(v[`V${b}`]));
  // the closed set the sheet works on: the measured set less a third of its sum each
  const third = div(add(...vl), 3);
  const closed = vl.map((x) => sub(x, third));
  const z = BR.map((b) => cx(v[`Z${b}`]));
  const zl = K.map((k) => cx(v[`ZL${k}`]));
  const e = K.map((_, i) => div(sub(vl[i], vl[(i + 2) % 3]), 3));
  const zSum = add(...z);
  const zy = [div(mul(z[0], z[2]), zSum), div(mul(z[1], z[0]), zSum), div(mul(z[2], z[1]), zSum)];
  const zt = K.map((_, i) => add(zy[i], zl[i]));
  const y = zt.map((t) => div(1, t));
  const j = K.map((_, i) => mul(e[i], y[i]));
  const jSum = add(...j);
  const ySum = add(...y);
  let il: MComplex[];
  let ib: MComplex[];
  if (zl.every((l) => abs(l) > 0)) {
    const nodal = referenceDelta(
      closed.map((x) => ({ re: x.re, im: x.im })),
      z.map((x) => ({ re: x.re, im: x.im })),
      zl.map((x) => ({ re: x.re, im: x.im })),
    );
    il = nodal.lineCurrents.map(cxOf);
    ib = nodal.branchCurrents.map(cxOf);
  } else {
    ib = BR.map((_, i) => div(closed[i], z[i]));
    il = K.map((_, i) => sub(ib[i], ib[(i + 2) % 3]));
  }
  const u = K.map((_, i) => sub(e[i], mul(il[i], zl[i])));
  const vb = ENDS.map(([p, q]) => sub(u[p], u[q]));
  const sb = BR.map((_, i) => mul(vb[i], conj(ib[i])));
  const ref: Record<string, Expected> = {
    Z_sum: zSum,
    J_sum: jSum,
    Y_sum: ySum,
    V_N: div(jSum, ySum),
    S_load: add(...sb),
    S_lines: add(...K.map((_, i) => mul(zl[i], abs(il[i]) ** 2))),
    S_source: add(...K.map((_, i) => mul(e[i], conj(il[i])))),
  };
  K.forEach((k, i) => {
    ref[`E_${k}`] = e[i];
    ref[`Z_Y${k}`] = zy[i];
    ref[`Zt_${k}`] = zt[i];
    ref[`Y_${k}`] = y[i];
    ref[`J_${k}`] = j[i];
    ref[`I_${k}`] = il[i];
    ref[`U_${k}`] = u[i];
  });
  BR.forEach((b, i) => {
    ref[`Vb_${b}`] = vb[i];
    ref[`I_${b}`] = ib[i];
    ref[`S_${b}`] = sb[i];
  });
  return ref;
}

describe('worked sheet: delta load, in the preview engine', () => {
  const demo = demoValues(delta);

  it('writes the demo: every step equals the mathjs nodal reference, every check passes, nothing else touched', () => {
    const w = write(delta, demo);
    expectStepsMatch(w, reference(demo));
    expectChecksPass(w);
    expectExistingUntouched(w);
  });

  it('without line impedances the branches see the (closed) line voltages', () => {
    const v = { ...demo, ZL1: '0', ZL2: '0', ZL3: '0' };
    const w = write(delta, v);
    expectStepsMatch(w, reference(v));
    expectChecksPass(w);
    const ref = reference(v);
    for (const b of BR) expect(abs(sub(w.value(`Vb_${b}`) as MComplex, ref[`Vb_${b}`] as MComplex))).toBeLessThan(1e-9 * 400);
  });

  it('recalculates every step when the inputs change', () => {
    const w = write(delta, demo);
    const before = Object.fromEntries(w.plan.steps.map((s) => [s.name, String(w.value(s.name))]));
    const v: Values = { ...demo, V12: '415∠30', V23: '415∠-90', V31: '415∠150', Z12: '44+j10', Z23: '33-j4', Z31: '61+j22', ZL1: '0.2+j0.1', ZL2: '0.25+j0.1', ZL3: '0.18+j0.09' };
    for (const f of ['V12', 'V23', 'V31', 'Z12', 'Z23', 'Z31', 'ZL1', 'ZL2', 'ZL3']) w.setInput(f, v[f]);
    expectStepsMatch(w, reference(v));
    expectChecksPass(w);
    const moved = w.plan.steps.filter((s) => String(w.value(s.name)) !== before[s.name]);
    expect(moved.map((s) => s.name)).toEqual(w.plan.steps.map((s) => s.name));
  });

  it('a set of line voltages that does not close fails its check, and says so', () => {
    const w = write(delta, { ...demo, V31: '380∠150' });
    const closes = w.plan.checks.find((c) => c.label.includes('close'))!;
    expect(w.display(closes.row, 6)).toBe('FAIL');
  });
});
