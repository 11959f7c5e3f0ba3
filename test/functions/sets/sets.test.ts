import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg } from '../../../src/core/phasor';
import { expectClose, expectPhasorClose } from '../../helpers';
import { call, col, expectMessage, ph, phs } from './_cells';

const E = col('230∠0', '230∠-120', '230∠120');

describe('PHZ.BALANCED', () => {
  it('normal use: 230 V positive sequence', () => {
    const r = phs(call('BALANCED', 230, null, null, 15));
    expectPhasorClose(r[0], polarDeg(230, 0));
    expectPhasorClose(r[1], polarDeg(230, -120));
    expectPhasorClose(r[2], polarDeg(230, 120));
  });
  it('negative sequence and a phase-1 angle, words in any case', () => {
    const r = phs(call('BALANCED', 400, 'NEGATIVE', 30, 15));
    expectPhasorClose(r[1], polarDeg(400, 150));
  });
  it('range input: a 1×1 range for the magnitude is accepted', () => {
    expectPhasorClose(ph(call('BALANCED', [[230]], [['positive']], [[0]], 15)[2][0]), polarDeg(230, 120));
  });
  it('blank optional arguments take their defaults; a blank magnitude is an error', () => {
    expectPhasorClose(ph(call('BALANCED', 230, '', '', 15)[1][0]), polarDeg(230, -120));
    expectMessage(() => call('BALANCED', null), /magnitude is blank/);
  });
  it('wrong type: text magnitude, unknown sequence word', () => {
    expectMessage(() => call('BALANCED', 'abc'), /magnitude must be a number/);
    expectMessage(() => call('BALANCED', 230, 'reverse'), /sequence is "reverse", which is not one of "positive", "negative"/);
  });
  it('wrong count: more arguments than the function takes', () => {
    expectMessage(() => call('BALANCED', 230, 'positive', 0, 6, 1), /takes at most 4 arguments/);
  });
  it('domain error: a negative magnitude', () => {
    expectMessage(() => call('BALANCED', -230), /magnitude is -230: give a magnitude of 0 or more/);
  });
  it('IEC 60038:2009 Table 1 (230/400 V system): BALANCED(230) has line voltages of 400 V to within 0.5 % (√3·230 = 398.4 V)', () => {
    const l = phs(call('LINEVOLTS', call('BALANCED', 230, null, null, 15), 15));
    expectClose(magnitude(l[0]), 400, 0.005);
  });
});

describe('PHZ.LINEVOLTS', () => {
  it('normal use: V12 = V1 − V2 leads V1 by 30° and is √3 larger (common practice)', () => {
    const r = phs(call('LINEVOLTS', E, 15));
    expectClose(magnitude(r[0]), 230 * Math.sqrt(3));
    expectClose(angleDeg(r[0]), 30);
    expectClose(angleDeg(r[1]), -90);
  });
  it('range input: a row of three, and two numeric columns of real/imaginary parts', () => {
    expectPhasorClose(ph(call('LINEVOLTS', [['230∠0', '230∠-120', '230∠120']], 15)[0][0]), polarDeg(230 * Math.sqrt(3), 30));
    const pairs = [[230, 0], [-115, -199.18584287042088], [-115, 199.18584287042088]];
    expectPhasorClose(ph(call('LINEVOLTS', pairs, 15)[2][0]), polarDeg(230 * Math.sqrt(3), 150), 1e-12);
  });
  it('blank cell: an error naming the row', () => {
    expectMessage(() => call('LINEVOLTS', col('230∠0', '', '230∠120')), /phase_set, row 2 is blank/);
  });
  it('wrong type: text that is not a phasor, TRUE', () => {
    expectMessage(() => call('LINEVOLTS', col('230∠0', 'abc', '230∠120')), /phase_set, row 2/);
    expectMessage(() => call('LINEVOLTS', col('230∠0', true, '230∠120')), /TRUE\/FALSE, not a phasor/);
  });
  it('wrong count: two values', () => {
    expectMessage(() => call('LINEVOLTS', col('230∠0', '230∠-120')), /phase_set holds 2 values but needs three/);
  });
  it('domain: a zero set gives zero line voltages, shown as 0', () => {
    expect(call('LINEVOLTS', col(0, 0, 0))).toEqual([['0'], ['0'], ['0']]);
  });
});

describe('PHZ.STARVOLTS', () => {
  it('normal use and the IEC 60038 230/400 V pair: 400 V line voltages → 230.94 V phases at 0, −120, 120', () => {
    const r = phs(call('STARVOLTS', col('400∠30', '400∠-90', '400∠150'), 15));
    expectPhasorClose(r[0], polarDeg(400 / Math.sqrt(3), 0), 1e-12);
    expectPhasorClose(r[2], polarDeg(400 / Math.sqrt(3), 120), 1e-12);
  });
  it('range input: line voltages with units and a row layout', () => {
    const r = phs(call('STARVOLTS', [['0.4 kV∠30', '0.4 kV∠-90', '0.4 kV∠150']], 15));
    expectClose(magnitude(r[1]), 400 / Math.sqrt(3));
  });
  it('blank cell and wrong type', () => {
    expectMessage(() => call('STARVOLTS', col('400∠30', null, '400∠150')), /line_set, row 2 is blank/);
    expectMessage(() => call('STARVOLTS', col('400∠30', '4 A', '400∠150')), /line_set, row 2/);
  });
  it('wrong count: four values', () => {
    expectMessage(() => call('STARVOLTS', col(1, 2, 3, 4)), /line_set holds 4 values but needs three/);
  });
  it('domain error: line voltages that do not sum to zero', () => {
    expectMessage(() => call('STARVOLTS', col('400∠30', '400∠-90', '400∠140')), /line_set does not close/);
  });
  it('meter readings at 0.1° resolution that miss closing by 0.7 % are accepted: the result is the zero-sequence-free set (mathjs)', () => {
    const texts = ['401.2∠30.0', '398.7∠-90.4', '399.5∠149.8'];
    const r = phs(call('STARVOLTS', col(...texts), 15));
    // V1 = (V12 − V31)/3 and so on, computed with mathjs from the readings as typed
    const v = texts.map((t) => {
      const [m, a] = t.split('∠').map(Number);
      return math.complex({ r: m, phi: (a * Math.PI) / 180 });
    });
    const want = [0, 1, 2].map((k) => math.divide(math.subtract(v[k], v[(k + 2) % 3]), 3) as math.Complex);
    for (let k = 0; k < 3; k++) expectPhasorClose(r[k], want[k], 1e-13);
  });
  it('accepts LINEVOLTS output shown at 4 figures', () => {
    const r = phs(call('STARVOLTS', call('LINEVOLTS', col('231∠0', '226∠-121', '229∠119'), 4), 15));
    const exact = phs(call('STARVOLTS', call('LINEVOLTS', col('231∠0', '226∠-121', '229∠119'), 15), 15));
    for (let k = 0; k < 3; k++) expectPhasorClose(r[k], exact[k], 1e-3);
  });
  it('inverts LINEVOLTS for an unbalanced set without zero sequence', () => {
    const x = [polarDeg(240, 2), polarDeg(221, -117), rect(0)];
    const zero = x[0].add(x[1]).add(x[2]).div(3);
    const y = x.map((z) => z.sub(zero));
    const r = phs(call('STARVOLTS', call('LINEVOLTS', col(...y.map((z) => `${z.re}+j${z.im}`)), 15), 15));
    for (let k = 0; k < 3; k++) expectPhasorClose(r[k], y[k], 1e-12);
  });
});

describe('PHZ.LINESET', () => {
  it('normal use: equal magnitudes give the balanced line set with V12 at 30°, which STARVOLTS turns into phases at 0°, −120°, +120°', () => {
    const r = phs(call('LINESET', col(400, 400, 400), null, 15));
    expectPhasorClose(r[0], polarDeg(400, 30), 1e-15);
    expectPhasorClose(r[1], polarDeg(400, -90), 1e-15);
    expectPhasorClose(r[2], polarDeg(400, 150), 1e-15);
    const e = phs(call('STARVOLTS', call('LINESET', col(400, 400, 400), null, 15), 15));
    expectPhasorClose(e[0], polarDeg(400 / Math.sqrt(3), 0), 1e-14);
  });
  it('the 3-4-5 right triangle (Euclid I.48; law of cosines: cos γ = (9 + 16 − 25)/24 = 0): V23 is 90° behind V12', () => {
    const r = phs(call('LINESET', col(300, 400, 500), 0, 15));
    expectPhasorClose(r[1], polarDeg(400, -90), 1e-15);
    // V31 = −(V12 + V23), with mathjs
    const v31 = math.unaryMinus(math.add(math.complex(300, 0), math.complex(0, -400))) as math.Complex;
    expectPhasorClose(r[2], v31, 1e-14);
  });
  it('meter magnitudes 402, 395, 385 V: the set closes, DELTALOAD takes it, and its VUF equals the IEC 61000-4-30 magnitude formula', () => {
    const set = call('LINESET', col(402, 395, 385), null, 15);
    const r = phs(set);
    expect(magnitude(r[0].add(r[1]).add(r[2]))).toBeLessThan(1e-12 * 400);
    expectClose(call('UNBALANCE', set)[0][0] as number, call('UNBALANCE', col(402, 395, 385), 'MAG')[0][0] as number, 1e-12);
    expect(call('DELTALOAD', set, 40, '0.1').length).toBe(3);
  });
  it('range input: a row of three, numeric text, and an angle from a 1×1 range', () => {
    const r = phs(call('LINESET', [[402, '395', 385]], [[0]], 15));
    expectClose(magnitude(r[1]), 395, 1e-14);
    expectClose(angleDeg(r[0]), 0);
  });
  it('unit words: magnitudes in V or kV are read, a current is refused', () => {
    const r = phs(call('LINESET', col('0.402 kV', '395 V', 385), 0, 15));
    expectClose(magnitude(r[0]), 402, 1e-14);
    expectClose(magnitude(r[1]), 395, 1e-14);
    expectMessage(() => call('LINESET', col(400, '5 A', 400)), /magnitudes, row 2/);
  });
  it('blank cell: a blank magnitude is an error; a blank angle is the default 30°', () => {
    expectMessage(() => call('LINESET', col(400, null, 400)), /magnitudes, row 2 is blank/);
    expectClose(angleDeg(ph(call('LINESET', col(400, 400, 400), '', 15)[0][0])), 30);
  });
  it('wrong type: a phasor text, TRUE', () => {
    expectMessage(() => call('LINESET', col(400, '400∠-120', 400)), /magnitudes, row 2/);
    expectMessage(() => call('LINESET', col(400, 400, 400), true), /angle/);
  });
  it('wrong count: two magnitudes, four magnitudes', () => {
    expectMessage(() => call('LINESET', col(400, 400)), /magnitudes holds 2 values but needs three/);
    expectMessage(() => call('LINESET', col(400, 400, 400, 400)), /magnitudes holds 4 values but needs three/);
  });
  it('domain errors: no triangle, a zero, a negative magnitude', () => {
    expectMessage(() => call('LINESET', col(400, 100, 200)), /V12 = 400 exceeds V23 \+ V31 = 300, so the three cannot close a triangle/);
    expectMessage(() => call('LINESET', col(400, 0, 400)), /magnitudes: V23 is 0/);
    expectMessage(() => call('LINESET', col(-400, 400, 400)), /magnitudes: V12 is -400: a magnitude cannot be negative/);
  });
});

describe('PHZ.DELTATOSTAR', () => {
  it('Alexander & Sadiku, Fundamentals of Electric Circuits, Example 2.15: Δ 10, 15, 25 Ω → Y 5, 3, 7.5 Ω (from memory)', () => {
    const r = phs(call('DELTATOSTAR', 10, 15, 25, 15));
    expectPhasorClose(r[0], rect(5));
    expectPhasorClose(r[1], rect(3));
    expectPhasorClose(r[2], rect(7.5));
  });
  it('range input: one range of three, and text with a unit', () => {
    const r = phs(call('DELTATOSTAR', col('30+j15 Ω', '30+j15', '30+j15'), null, null, 15));
    expectPhasorClose(r[1], rect(10, 5));
  });
  it('an "open" branch (open delta): the arm opposite it is 0', () => {
    expect(call('DELTATOSTAR', col(30, 30, 'open'))).toEqual([['30∠0°'], ['0'], ['30∠0°']]);
  });
  it('blank cell, wrong type, wrong count', () => {
    expectMessage(() => call('DELTATOSTAR', col(10, '', 25)), /z12, row 2 is blank/);
    expectMessage(() => call('DELTATOSTAR', 10, 'x', 25), /z23/);
    expectMessage(() => call('DELTATOSTAR', col(10, 15)), /z12 holds 2 values but needs three/);
    expectMessage(() => call('DELTATOSTAR', 10, 15), /give one range of three values, or three separate values/);
  });
  it('domain errors: two open branches, a resonant delta', () => {
    expectMessage(() => call('DELTATOSTAR', col('open', 'OPEN', 5)), /branches 12 and 23 are open/);
    expectMessage(() => call('DELTATOSTAR', 'j10', '-j5', '-j5'), /add up to 0 Ω/);
  });
});

describe('PHZ.STARTODELTA', () => {
  it('normal use: the inverse of Alexander & Sadiku Example 2.15 (from memory): Y 5, 3, 7.5 Ω → Δ 10, 15, 25 Ω', () => {
    const r = phs(call('STARTODELTA', 5, 3, 7.5, 15));
    expectPhasorClose(r[0], rect(10));
    expectPhasorClose(r[1], rect(15));
    expectPhasorClose(r[2], rect(25));
  });
  it('range input: a balanced star of 4 + j3 Ω becomes a delta of 12 + j9 Ω (Z_Δ = 3·Z_Y, common practice)', () => {
    for (const z of phs(call('STARTODELTA', [['4+j3', '4+j3', '4+j3']], null, null, 15))) expectPhasorClose(z, rect(12, 9));
  });
  it('a 0 Ω arm gives "open" opposite it, which DELTATOSTAR reads back', () => {
    const d = call('STARTODELTA', col('4+j3', 0, '4+j3'), null, null, 15);
    expect(d[2][0]).toBe('open');
    const y = phs(call('DELTATOSTAR', d, null, null, 15));
    expectPhasorClose(y[0], rect(4, 3));
    expect(magnitude(y[1])).toBe(0);
  });
  it('blank cell, wrong type, wrong count', () => {
    expectMessage(() => call('STARTODELTA', col(5, null, 7)), /z1, row 2 is blank/);
    expectMessage(() => call('STARTODELTA', col(5, 'open', 7)), /z1, row 2/);
    expectMessage(() => call('STARTODELTA', col(5, 3)), /z1 holds 2 values but needs three/);
  });
  it('domain errors: two 0 Ω arms; arms with Z1Z2 + Z2Z3 + Z3Z1 = 0', () => {
    expectMessage(() => call('STARTODELTA', 0, 0, 5), /Z1 and Z2 are both 0 Ω/);
    expectMessage(() => call('STARTODELTA', 'j1', 'j1', '-j0.5'), /Z1·Z2 \+ Z2·Z3 \+ Z3·Z1 = 0/);
  });
});
