/**
 * The panel-schedule worked sheet written into the preview engine: every step against an
 * independent mathjs computation (loads read by the test's own pattern, not the project's
 * readers), every check passing, recalculation when an input changes on the sheet, and the
 * NFPA 70 Annex D5(b) example at 208Y/120 V.
 */
import { describe, expect, it } from 'vitest';
import type { Complex as MComplex } from 'mathjs';
import { demoValues, type FieldValue } from '../../../src/taskpane/sheets/calculation';
import { CIRCUITS, SCHEDULE_ORDERS, panelSchedule } from '../../../src/taskpane/sheets/panel-schedule';
import { ZERO, abs, add, arg, conj, cx, div, expectChecksPass, expectExistingUntouched, expectStepsMatch, mul, polar, sub, write, type Expected } from './harness';

const K = [1, 2, 3] as const;
const C = Array.from({ length: CIRCUITS }, (_, i) => i + 1);
type Values = Record<string, FieldValue>;
const A = polar(1, 120);

/** A load cell as the test reads it: number → W; "1.6 kW", "2.4 kVA", "900 VA". */
function load(v: FieldValue): { value: number; apparent: boolean } | null {
  if (v === '') return null;
  if (typeof v === 'number') return { value: v, apparent: false };
  const m = /^([\d.]+)\s*(k?)(W|VA)$/.exec(v.trim());
  if (!m) throw new Error(`test reads no load from ${v}`);
  return { value: Number(m[1]) * (m[2] === 'k' ? 1000 : 1), apparent: m[3] === 'VA' };
}

/** S of a circuit: W is P, VA is |S|; "0.97 lead" turns Q negative. */
function power(l: { value: number; apparent: boolean }, pfCell: FieldValue): MComplex {
  const pf = typeof pfCell === 'number' ? pfCell : Number(pfCell.replace(/lead/, '').trim());
  const lead = typeof pfCell === 'string' && /lead/.test(pfCell);
  const s = l.apparent ? l.value : l.value / pf;
  return polar(s, ((lead ? -1 : 1) * Math.acos(pf) * 180) / Math.PI);
}

function reference(v: Values): Record<string, Expected> {
  const e = K.map((k) => cx(v[`E${k}`]));
  const ref: Record<string, Expected> = {};
  const sc = C.map((c) => {
    const l = load(v[`load${c}`]);
    return l === null ? ZERO : power(l, v[`pf${c}`]);
  });
  C.forEach((c) => (ref[`S_c${c}`] = sc[c - 1]));
  const on = (word: string): number[] => C.filter((c) => v[`con${c}`] === word).map((c) => c - 1);
  const group = (word: string): MComplex => add(...on(word).map((i) => sc[i]));
  const words = { S_1N: 'L1', S_2N: 'L2', S_3N: 'L3', S_12: 'L1-L2', S_23: 'L2-L3', S_31: 'L3-L1', S_3P: '3P' } as const;
  for (const [name, word] of Object.entries(words)) ref[name] = group(word);
  const v12 = sub(e[0], e[1]);
  const v23 = sub(e[1], e[2]);
  const v31 = sub(e[2], e[0]);
  const vPos = div(add(e[0], mul(A, e[1]), mul(mul(A, A), e[2])), 3);
  Object.assign(ref, { V_12: v12, V_23: v23, V_31: v31, V_pos: vPos });
  const cur = (s: MComplex, u: MComplex): MComplex => conj(div(s, u));
  const i1n = cur(ref.S_1N as MComplex, e[0]);
  const i2n = cur(ref.S_2N as MComplex, e[1]);
  const i3n = cur(ref.S_3N as MComplex, e[2]);
  const i12 = cur(ref.S_12 as MComplex, v12);
  const i23 = cur(ref.S_23 as MComplex, v23);
  const i31 = cur(ref.S_31 as MComplex, v31);
  const i3p = cur(div(ref.S_3P as MComplex, 3), vPos);
  Object.assign(ref, { I_1N: i1n, I_2N: i2n, I_3N: i3n, I_12: i12, I_23: i23, I_31: i31, I_3P: i3p });
  const lines = [add(i1n, i12, mul(i31, -1), i3p), add(i2n, i23, mul(i12, -1), mul(mul(A, A), i3p)), add(i3n, i31, mul(i23, -1), mul(A, i3p))];
  const iN = add(i1n, i2n, i3n);
  K.forEach((k, n) => {
    ref[`I_${k}`] = lines[n];
    ref[`S_L${k}`] = mul(e[n], conj(lines[n]));
    ref[`L_${k}N`] = on(`L${k}`).reduce((s, i) => s + abs(sc[i]), 0) / abs(e[n]);
    ref[`I_nl${k}`] = on(`L${k}`).reduce((s, i) => s + Number(v[`nl${i + 1}`]) * abs(sc[i]), 0) / abs(e[n]);
  });
  ref.I_N = iN;
  ref.S_total = add(...sc);
  ref.S_lines = add(ref.S_L1 as MComplex, ref.S_L2 as MComplex, ref.S_L3 as MComplex);
  ref.L_max = Math.max(ref.L_1N as number, ref.L_2N as number, ref.L_3N as number);
  const mags = lines.map(abs);
  const mean = (mags[0] + mags[1] + mags[2]) / 3;
  ref.I_mean = mean;
  ref.u_I = (100 * Math.max(...mags.map((m) => Math.abs(m - mean)))) / mean;
  let sumSq = abs(iN) ** 2;
  for (const h of SCHEDULE_ORDERS) {
    const p = Number(v[`k${h}`]) / 100;
    const comp = add(...K.map((_, n) => polar(p * (ref[`I_nl${n + 1}`] as number), ((h * arg(e[n]) * 180) / Math.PI) % 360)));
    ref[`I_N${h}`] = comp;
    sumSq += abs(comp) ** 2;
  }
  ref.IN_rms = Math.sqrt(sumSq);
  const zf = cx(v.Zf);
  const len = Number(v.Lf);
  K.forEach((k, n) => {
    const dv = mul(mul(zf, len), add(lines[n], iN));
    ref[`dV_${k}`] = dv;
    ref[`du_${k}`] = (100 * (abs(e[n]) - abs(sub(e[n], dv)))) / abs(e[n]);
  });
  const lMax = ref.L_max as number;
  ref.L_neutral = Math.min(lMax, 200) + 0.7 * Math.max(lMax - 200, 0);
  ref.IN_size = Math.max(ref.L_neutral as number, ref.IN_rms as number);
  return ref;
}

describe('worked sheet: panel schedule, in the preview engine', () => {
  const demo = demoValues(panelSchedule);

  it('the pane writes connections in their canonical spelling and keeps loads and leading power factors as typed', () => {
    expect(C.map((c) => demo[`con${c}`])).toEqual(['L1', 'L2', 'L3', 'L1', 'L2', 'L3', 'L1-L2', 'L2-L3', '3P', '3P', 'L1', 'L3']);
    expect(demo.load2).toBe('2.4 kVA');
    expect(demo.pf3).toBe('0.97 lead');
    expect(demo.pf1).toBe(0.95);
    expect(demo.nl2).toBe(0.8);
    expect(demo.load12).toBe('');
  });

  it('writes the demo: every step equals the mathjs reference, every check passes, nothing else touched', () => {
    const w = write(panelSchedule, demo);
    expectStepsMatch(w, reference(demo), 1e-9, { '%': 1e-6 });
    expectChecksPass(w);
    expectExistingUntouched(w);
  });

  it('recalculates when a connection, a load or the supply changes on the sheet', () => {
    const w = write(panelSchedule, demo);
    w.setInput('con5', 'L1-L2');
    w.setInput('load12', '3.3 kW');
    w.setInput('pf12', '0.9 lead');
    w.setInput('E2', '226∠-121');
    const changed: Values = { ...demo, con5: 'L1-L2', load12: '3.3 kW', pf12: '0.9 lead', E2: '226∠-121' };
    expectStepsMatch(w, reference(changed), 1e-9, { '%': 1e-6 });
    expectChecksPass(w);
  });

  it('a connection typed on the sheet in another spelling falls in no group, and the power balance says so', () => {
    const w = write(panelSchedule, demo);
    w.setInput('con2', 'B');
    const balance = w.plan.checks.find((c) => /Power balance/.test(c.label))!;
    expect(w.display(balance.row, 6)).toBe('FAIL');
  });

  it('NFPA 70 (2023) Annex D, Example D5(b), 208Y/120 V dwelling unit on two legs: 16.2 A line-to-neutral load per leg (published), line current below the published arithmetic 87.8 A', () => {
    const v: Values = { ...demo };
    const e = 208 / Math.sqrt(3);
    v.E1 = `${e}∠0`;
    v.E2 = `${e}∠-120`;
    v.E3 = `${e}∠120`;
    C.forEach((c) => {
      v[`con${c}`] = '';
      v[`load${c}`] = '';
      v[`pf${c}`] = '';
      v[`nl${c}`] = 0;
    });
    Object.assign(v, { con1: 'L1', load1: '1941 VA', pf1: 1, con2: 'L2', load2: '1941 VA', pf2: 1, con3: 'L1-L2', load3: '14900 VA', pf3: 1 });
    const w = write(panelSchedule, v);
    expectStepsMatch(w, reference(v), 1e-9, { '%': 1e-6 });
    expectChecksPass(w);
    expect(Math.abs((w.value('L_max') as number) - 16.2)).toBeLessThan(0.05);
    const i1 = abs(w.value('I_1') as MComplex);
    expect(i1).toBeLessThan(87.8);
    expect(Math.abs(i1 - 86.0)).toBeLessThan(0.05);
    // 220.61(B) leaves a load under 200 A as it is
    expect(w.value('L_neutral')).toBe(w.value('L_max'));
  });
});
