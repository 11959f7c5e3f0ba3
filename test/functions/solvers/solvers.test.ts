import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg } from '../../../src/core/phasor';
import { expectClose, expectPhasorClose } from '../../helpers';
import { call, col, expectMessage, ph } from '../sets/_cells';
import { referenceDelta, referenceStar } from '../../core/threephase/reference';

const E = col('230∠0', '230∠-120', '230∠120');
const V = col('400∠0', '400∠-120', '400∠120');

describe('PHZ.STARLOAD', () => {
  it('normal use: solid neutral, 4×3 table of currents, load voltages, powers; row 4 neutral, shift, total', () => {
    const t = call('STARLOAD', E, col(23, 46, 23), null, null, null, 15);
    expect(t.length).toBe(4);
    expect(t.every((row) => row.length === 3)).toBe(true);
    expectPhasorClose(ph(t[0][0]), rect(10));
    expectPhasorClose(ph(t[1][1]), polarDeg(230, -120));
    expectPhasorClose(ph(t[2][2]), rect(2300));
    expectPhasorClose(ph(t[3][0]), polarDeg(5, 60));
    expect(t[3][1]).toBe('0');
    expectPhasorClose(ph(t[3][2]), rect(5750));
  });
  it('Alexander & Sadiku, Fundamentals of Electric Circuits, Example 12.13 (from memory): acb 100 V, 15, 10 + j5, 6 − j8 Ω, 4-wire → In = 10.06 A', () => {
    const t = call('STARLOAD', call('BALANCED', 100, 'negative', 0, 15), col(15, '10+j5', '6-j8'), 0, null, null, 15);
    expectClose(magnitude(ph(t[0][0])), 6.67, 1e-3);
    expectClose(angleDeg(ph(t[1][0])), 93.44, 1e-3);
    expectClose(magnitude(ph(t[3][0])), 10.06, 1e-3);
  });
  it('phase-sequence indicator (capacitor + two lamps, X_C = R, no neutral): lamp voltages ≈ 1.5 and 0.4 × 230 V (from memory)', () => {
    const t = call('STARLOAD', E, col('-j1000', 1000, 1000), 'open', null, null, 15);
    expectClose(magnitude(ph(t[1][1])) / 230, 1.5, 0.01);
    expectClose(magnitude(ph(t[2][1])) / 230, 0.4, 0.01);
  });
  it('range input: impedances as two numeric columns (real, imaginary) and a row of voltages; one impedance for all', () => {
    const a = call('STARLOAD', [['230∠0', '230∠-120', '230∠120']], [[12, 5], [20, 0], [8, -6]], 'open', null, null, 15);
    const b = call('STARLOAD', E, col('12+j5', 20, '8-j6'), 'open', null, null, 15);
    for (let r = 0; r < 4; r++) for (let c = 0; c < 3; c++) if (a[r][c] !== '0') expectPhasorClose(ph(a[r][c]), ph(b[r][c]), 1e-13);
    const bal = call('STARLOAD', E, '10+j5');
    expect(bal[3][0]).toBe('0');
  });
  it('line impedance: one for all lines or three; impedant neutral; matches the mathjs reference', () => {
    const z = [rect(12, 5), rect(20, 0), rect(8, -6)];
    const zl = [rect(0.15, 0.08), rect(0.15, 0.08), rect(0.15, 0.08)];
    const ref = referenceStar([polarDeg(230, 0), polarDeg(230, -120), polarDeg(230, 120)], z, zl, rect(0.5, 0.2));
    const t1 = call('STARLOAD', E, col('12+j5', 20, '8-j6'), '0.5+j0.2', '0.15+j0.08', null, 15);
    const t3 = call('STARLOAD', E, col('12+j5', 20, '8-j6'), '0.5+j0.2', col('0.15+j0.08', '0.15+j0.08', '0.15+j0.08'), null, 15);
    for (let k = 0; k < 3; k++) {
      expectPhasorClose(ph(t1[k][0]), ref.currents[k], 1e-12);
      expectPhasorClose(ph(t3[k][0]), ref.currents[k], 1e-12);
    }
    expectPhasorClose(ph(t1[3][1]), ref.shift, 1e-12);
  });
  it('stiff network (issue 8 §6): 1e-9 Ω beside two 1e9 Ω phases, open neutral → I1 = 1.9053e-5∠0° A and no neutral current (by hand: I1 = −(I2 + I3) = 3·6351 V/1e9 Ω)', () => {
    const t = call('STARLOAD', call('BALANCED', 6351), col('1e-9', '1e9', '1e9'), 'open');
    expect(t[0][0]).toBe('0.000019053∠0°');
    expect(t[3][0]).toBe('0');
    const t15 = call('STARLOAD', call('BALANCED', 6351), col('1e-9', '1e9', '1e9'), 'open', null, null, 15);
    expectPhasorClose(ph(t15[0][0]), rect((3 * 6351) / 1e9), 1e-12);
  });
  it('labels TRUE adds a header row and a label column (5×4)', () => {
    const t = call('STARLOAD', E, col(23, 46, 23), null, null, true);
    expect(t.length).toBe(5);
    expect(t[0]).toEqual(['', 'current', 'voltage', 'complex power']);
    expect(t.map((row) => row[0])).toEqual(['', 'phase 1', 'phase 2', 'phase 3', "neutral: I_N, V_N'N, total S"]);
  });
  it('an "open" load phase and the word "solid" for the neutral', () => {
    const t = call('STARLOAD', E, col(10, 'open', 10), 'solid');
    expect(t[1][0]).toBe('0');
    expect(t[1][2]).toBe('0');
  });
  it('blank cell: a blank voltage or impedance is an error naming it', () => {
    expectMessage(() => call('STARLOAD', col('230∠0', '', '230∠120'), col(1, 2, 3)), /phase_voltages, row 2 is blank/);
    expectMessage(() => call('STARLOAD', E, col(1, null, 3)), /impedances, row 2 is blank/);
  });
  it('neutral: only a left-out argument means a solid neutral; a blank cell is an error asking for 0, an impedance or "open"', () => {
    const solid = call('STARLOAD', E, col(23, 46, 23), 0);
    // the host passes null for a left-out argument (undefined when the call is shorter)
    expect(call('STARLOAD', E, col(23, 46, 23), null)).toEqual(solid);
    expect(call('STARLOAD', E, col(23, 46, 23))).toEqual(solid);
    expect(call('STARLOAD', E, col(23, 46, 23), 'solid')).toEqual(solid);
    // a referenced blank cell arrives as [[null]] or [[""]]; whitespace-only text is blank too
    for (const blank of [[[null]], [['']], [['  ']], [[null], [null]]]) {
      expectMessage(() => call('STARLOAD', E, col(23, 46, 23), blank), /^neutral refers to a blank cell: give 0 for a solid neutral, an impedance .* or "open" for no neutral/);
    }
  });
  it('wrong type: an unknown neutral word, a current where an impedance belongs, non-boolean labels', () => {
    expectMessage(() => call('STARLOAD', E, col(1, 2, 3), 'floating'), /neutral is "floating"/);
    expectMessage(() => call('STARLOAD', E, col(1, '2 A', 3)), /impedances, row 2/);
    expectMessage(() => call('STARLOAD', E, col(1, 2, 3), null, null, 'yes'), /labels must be TRUE or FALSE/);
    expectMessage(() => call('STARLOAD', E, col(1, 2, 3), null, 'open'), /line is "open": only load impedances may be open/);
  });
  it('wrong count: two impedances for three phases; two line impedances; two voltages', () => {
    expectMessage(() => call('STARLOAD', E, col(10, 20)), /impedances holds 2 values: give one load impedance for all three phases, or three/);
    expectMessage(() => call('STARLOAD', E, col(10, 20, 30), null, col(1, 2)), /line holds 2 values/);
    expectMessage(() => call('STARLOAD', col('230', '230∠-120'), col(10, 20, 30)), /phase_voltages holds 2 values but needs three/);
  });
  it('domain errors: a zero impedance shorting a source, two shorted phases, all open, resonance', () => {
    expectMessage(() => call('STARLOAD', E, col(10, 0, 10)), /source phase 2 is short-circuited/);
    expectMessage(() => call('STARLOAD', E, col(0, 0, 10), 'open'), /lines 1 and 2 of the source are short-circuited/);
    expectMessage(() => call('STARLOAD', E, col('open', 'open', 'open')), /all three load impedances are "open"/);
    expectMessage(() => call('STARLOAD', E, col('j10', '-j10', 'open'), 'open'), /series resonance/);
  });
});

describe('PHZ.DELTALOAD', () => {
  it('normal use: 3×4 table — line current, branch current, branch voltage, branch power', () => {
    const t = call('DELTALOAD', V, col(40, 80, 40), null, null, 15);
    expect(t.length).toBe(3);
    expect(t.every((row) => row.length === 4)).toBe(true);
    expectPhasorClose(ph(t[0][0]), polarDeg(10 * Math.sqrt(3), -30));
    expectPhasorClose(ph(t[0][1]), rect(10));
    expectPhasorClose(ph(t[1][2]), polarDeg(400, -120));
    expectPhasorClose(ph(t[2][3]), rect(4000));
  });
  it('bissoy.com MCQ 327965: Z_RY = 20∠30° Ω on 400 V → I_RY = 17.32 − j10 A', () => {
    const t = call('DELTALOAD', V, col('20∠30', '40∠60', '10∠-90'), null, null, 15);
    expectClose(ph(t[0][1]).re, 17.32, 1e-3);
    expectClose(ph(t[0][1]).im, -10, 1e-12);
  });
  it('Steinmetz balancing (Gyugyi et al. 1978, from memory): 40 Ω, −j69.28 Ω, +j69.28 Ω draw balanced currents of 400/(√3·40) A', () => {
    const x = Math.sqrt(3) * 40;
    const t = call('DELTALOAD', V, col(40, `-j${x}`, `j${x}`), null, null, 15);
    for (let k = 0; k < 3; k++) expectClose(magnitude(ph(t[k][0])), 400 / (Math.sqrt(3) * 40), 1e-12);
  });
  it('range input: branch impedances as real/imaginary columns; a row of line voltages; one impedance for all', () => {
    const a = call('DELTALOAD', [['400∠0', '400∠-120', '400∠120']], [[30, 12], [45, -20], [25, 5]], null, null, 15);
    const b = call('DELTALOAD', V, col('30+j12', '45-j20', '25+j5'), null, null, 15);
    expect(a).toEqual(b);
    const bal = call('DELTALOAD', V, '30+j12', null, null, 15);
    expectClose(magnitude(ph(bal[0][0])), Math.sqrt(3) * (400 / magnitude(rect(30, 12))), 1e-12);
  });
  it('line impedances: solved exactly, equal to the mathjs reference', () => {
    const z = [rect(30, 12), rect(45, -20), rect(25, 5)];
    const zl = [rect(0.3, 0.2), rect(0.3, 0.2), rect(0.3, 0.2)];
    const ref = referenceDelta([polarDeg(400, 0), polarDeg(400, -120), polarDeg(400, 120)], z, zl);
    const t = call('DELTALOAD', V, col('30+j12', '45-j20', '25+j5'), '0.3+j0.2', null, 15);
    for (let k = 0; k < 3; k++) {
      expectPhasorClose(ph(t[k][0]), ref.lineCurrents[k], 1e-12);
      expectPhasorClose(ph(t[k][1]), ref.branchCurrents[k], 1e-12);
    }
  });
  it('line voltages rounded to 4 figures (LINEVOLTS(…, 4)) are accepted: the residual is removed, a third from each', () => {
    const phases = col('231∠0', '226∠-121', '229∠119');
    const z = col('30+j12', '45-j20', '25+j5');
    const rounded = call('LINEVOLTS', phases, 4);
    const t = call('DELTALOAD', rounded, z, null, null, 15);
    // reference: the exact line voltages of the same phases, V12 = V1 − V2 … (mathjs), each branch I = V/Z
    const v = ['231∠0', '226∠-121', '229∠119'].map((s) => {
      const [m, a] = s.split('∠').map(Number);
      return math.complex({ r: m, phi: (a * Math.PI) / 180 });
    });
    const zs = [math.complex(30, 12), math.complex(45, -20), math.complex(25, 5)];
    for (let k = 0; k < 3; k++) {
      const ib = math.divide(math.subtract(v[k], v[(k + 1) % 3]), zs[k]) as math.Complex;
      expectPhasorClose(ph(t[k][1]), ib, 1e-3); // 4 figures in, about 1e-3 out
    }
    // the branch voltages are the rounded set less a third of its residual: they close
    const vb = t.map((row) => ph(row[2]));
    expect(magnitude(vb[0].add(vb[1]).add(vb[2]))).toBeLessThan(1e-12 * 400);
    // with line impedances too
    const tl = call('DELTALOAD', rounded, z, '0.2+j0.1', null, 15);
    expect(tl.length).toBe(3);
  });
  it('stiff network (issue 8 §6): a balanced 1e7 Ω delta behind 1e-6 Ω lines draws three equal line currents, √3·V/Z (common practice)', () => {
    const t = call('DELTALOAD', call('LINEVOLTS', call('BALANCED', 230)), '1e7', '1e-6', null, 15);
    const m = t.map((row) => magnitude(ph(row[0])));
    expect(Math.abs(m[1] / m[0] - 1)).toBeLessThanOrEqual(1e-12);
    expect(Math.abs(m[2] / m[0] - 1)).toBeLessThanOrEqual(1e-12);
    expectClose(m[0], (Math.sqrt(3) * 398.372) / 1e7, 1e-12);
  });
  it('labels TRUE adds a header and a label column (4×5); an "open" branch', () => {
    const t = call('DELTALOAD', V, col(40, 'open', 40), null, true);
    expect(t[0]).toEqual(['', 'line current', 'branch current', 'branch voltage', 'branch power']);
    expect(t[2][0]).toBe('line 2, branch 23');
    expect(t[2][2]).toBe('0');
  });
  it('blank cell, wrong type', () => {
    expectMessage(() => call('DELTALOAD', col('400', null, '400∠120'), col(1, 2, 3)), /line_voltages, row 2 is blank/);
    expectMessage(() => call('DELTALOAD', V, col(1, 'x', 3)), /impedances, row 2/);
  });
  it('wrong count: two branch impedances', () => {
    expectMessage(() => call('DELTALOAD', V, col(10, 20)), /impedances holds 2 values: give one branch impedance/);
  });
  it('domain errors: a 0 Ω branch shorting the supply, all open, voltages that do not close', () => {
    expectMessage(() => call('DELTALOAD', V, col(10, 0, 10)), /branch 23 is 0 Ω with no line impedance, so lines 2 and 3 of the supply are short-circuited/);
    expectMessage(() => call('DELTALOAD', V, col('open', 'open', 'open')), /all three branch impedances are "open"/);
    expectMessage(() => call('DELTALOAD', col('400∠0', '400∠-120', '400∠100'), col(1, 2, 3)), /line_voltages does not close/);
  });
});
