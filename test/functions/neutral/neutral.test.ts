import { describe, expect, it } from 'vitest';
import { polarDeg, rect } from '../../../src/core/phasor';
import { specByName } from '../../../src/functions';
import { expectClose, expectPhasorClose } from '../../helpers';
import { call, col, expectMessage, ph } from '../sets/_cells';

const IBAL = col('100∠0', '100∠-120', '100∠120');

describe('PHZ.NEUTRAL', () => {
  it('normal use: one range of three — a balanced set gives 0', () => {
    expect(call('NEUTRAL', [col('10∠0', '10∠-120', '10∠120')])).toEqual([['0']]);
  });
  it('three separate currents, and Alexander & Sadiku Example 12.13 (from memory): In = 10.06 A', () => {
    expectPhasorClose(ph(call('NEUTRAL', [[['20∠0']], [['10∠-120']], [['10∠120']]])[0][0]), rect(10));
    const i = call('STARLOAD', call('BALANCED', 100, 'negative', 0, 15), col(15, '10+j5', '6-j8'), 0, null, null, 15);
    const n = ph(call('NEUTRAL', [[[i[0][0]]], [[i[1][0]]], [[i[2][0]]]])[0][0]);
    expectClose(n.abs(), 10.06, 1e-3);
  });
  it('range input: a three-column schedule gives one neutral current per row; three columns work too', () => {
    const grid = [['12∠0', '8∠-120', '10∠120'], ['5∠0', '5∠-120', '']];
    const r = call('NEUTRAL', [grid]);
    expectPhasorClose(ph(r[0][0]), rect(12).add(polarDeg(8, -120)).add(polarDeg(10, 120)), 1e-5);
    expectPhasorClose(ph(r[1][0]), polarDeg(5, -60), 1e-5);
    const cols = call('NEUTRAL', [col('12∠0', '5∠0'), col('8∠-120', '5∠-120'), col('10∠120', '')]);
    expect(cols).toEqual(r);
  });
  it('blank cell: a phase with no current', () => {
    expectPhasorClose(ph(call('NEUTRAL', [col('10∠0', '', '10∠120')])[0][0]), polarDeg(10, 60), 1e-5);
  });
  it('wrong type: text that is not a current', () => {
    expectMessage(() => call('NEUTRAL', [col('10∠0', 'abc', '10∠120')]), /currents, row 2/);
    expectMessage(() => call('NEUTRAL', [col('10 A∠0', '230 V∠-120', '10∠120')]), /currents, row 2/);
  });
  it('wrong count: two currents, two arguments, unequal columns', () => {
    expectMessage(() => call('NEUTRAL', [col('10∠0', '10∠-120')]), /currents holds 2 values but needs three/);
    expectMessage(() => call('NEUTRAL', [[['1']], [['2']]]), /give one range of three values, or three separate values/);
    expectMessage(() => call('NEUTRAL', [col(1, 2), col(1, 2, 3), col(1)]), /different numbers of rows/);
  });
  it('details say why there is no digits argument', () => {
    expect(specByName.NEUTRAL.details).toMatch(/takes no digits argument/);
  });
});

describe('PHZ.NEUTRAL120', () => {
  it('normal use: √(Ia² + Ib² + Ic² − IaIb − IbIc − IcIa)', () => {
    expectClose(call('NEUTRAL120', 30, 18, 25)[0][0] as number, Math.sqrt(30 ** 2 + 18 ** 2 + 25 ** 2 - 30 * 18 - 18 * 25 - 25 * 30));
  });
  it('equals |NEUTRAL| for currents 120° apart at one power factor', () => {
    const n = ph(call('NEUTRAL', [[['30∠-20']], [['18∠-140']], [['25∠100']]])[0][0]);
    expectClose(call('NEUTRAL120', '30∠-20', '18∠-140', '25∠100')[0][0] as number, n.abs(), 1e-5);
  });
  it('range input: columns give one result per row; one range of three', () => {
    expect(call('NEUTRAL120', col(20, 40), col(10, 40), col(10, 40))).toEqual([[10], [0]]);
    expect(call('NEUTRAL120', col(30, 20, 20))).toEqual([[10]]);
  });
  it('blank cell is 0 A: one loaded phase gives its own current', () => {
    expect(call('NEUTRAL120', 40, [['']], [[null]])).toEqual([[40]]);
  });
  it('wrong type and domain: text, a negative magnitude', () => {
    expectMessage(() => call('NEUTRAL120', 'lots', 1, 1), /i1/);
    expectMessage(() => call('NEUTRAL120', 10, -4, 3), /i2 is -4 A/);
  });
  it('wrong count: unequal columns', () => {
    expectMessage(() => call('NEUTRAL120', col(1, 2), col(1, 2, 3), 1), /different numbers of rows/);
  });
  it('its description says it is valid only for 120° spacing at equal power factor', () => {
    expect(specByName.NEUTRAL120.details).toMatch(/Valid only when the three currents are 120° apart and at the same power factor/);
  });
});

describe('PHZ.NEUTRALRMS', () => {
  it('Mike Holt newsletter (2007, "Voltage Drop and Nonlinear Loads"): third harmonic ≈ 1/3 of the fundamental → neutral ≈ phase current', () => {
    expectClose(call('NEUTRALRMS', IBAL, [[3, 100 / 3]])[0][0] as number, 100, 1e-12);
  });
  it('normal use: triplens add, others cancel, root-sum-square', () => {
    expectClose(call('NEUTRALRMS', IBAL, [[3, 30], [5, 20], [7, 14], [9, 8]])[0][0] as number, Math.hypot(90, 24), 1e-12);
  });
  it('range input: per-phase contents [order, p1, p2, p3]; blank rows are skipped', () => {
    const a = call('NEUTRALRMS', IBAL, [[3, 10, 20, 30], ['', '', '', '']])[0][0] as number;
    expectClose(a, 60, 1e-12);
  });
  it('blank cell: a blank current is an error; an empty harmonics table leaves the fundamental sum', () => {
    expectMessage(() => call('NEUTRALRMS', col('100', '', '100∠120'), [[3, 10]]), /currents, row 2 is blank/);
    expectClose(call('NEUTRALRMS', col('100∠0', '50∠-120', '100∠120'), [['', '']])[0][0] as number, 50, 1e-12);
  });
  it('wrong type: text order, a 3-column table', () => {
    expectMessage(() => call('NEUTRALRMS', IBAL, [['third', 30]]), /harmonics, row 1 column 1 must be a number/);
    expectMessage(() => call('NEUTRALRMS', IBAL, [[3, 30, 30]]), /harmonics has 3 columns/);
  });
  it('wrong count: two currents', () => {
    expectMessage(() => call('NEUTRALRMS', col('100', '100∠-120'), [[3, 30]]), /currents holds 2 values but needs three/);
  });
  it.each([
    [[[1, 30]], /harmonic order 1 is not allowed/],
    [[[2.5, 30]], /harmonic order 2.5 is not allowed/],
    [[[3, -5]], /harmonic content -5 % is below 0/],
    [[[3, 5], [3, 6]], /order 3 appears in more than one row/],
  ])('domain error %#', (table, msg) => {
    expectMessage(() => call('NEUTRALRMS', IBAL, table), msg);
  });
  it('phases at different power factors (issue 8 §1): 40 % third harmonic gives 3 × 0.4 × 20 A = 24 A in the neutral (IEC 60364-5-52:2009 Annex E basis)', () => {
    const i = col('20∠-18.19', '20∠-120', '20∠83.13');
    // fundamental sum 11.9809 A (phasor sum, mathjs-checked in the core test); √(11.9809² + 24²)
    expectClose(call('NEUTRALRMS', i, [[3, 40]])[0][0] as number, Math.hypot(11.980942576853790, 24), 1e-12);
  });
  it('documented example: phase 3 at pf 0.5 lagging — fundamental sum 40 A and 3 × 0.25 × 40 A = 30 A of third harmonic give 50 A (IEC 60364-5-52 Annex E basis)', () => {
    // 40∠0 + 40∠−120 + 40∠60 = 40∠0 (by hand); √(40² + 30²) = 50
    expectClose(call('NEUTRALRMS', col('40∠0', '40∠-120', '40∠60'), [[3, 25]])[0][0] as number, 50, 1e-12);
  });
  it('phase_voltages: the supply the harmonics are referred to; a balanced set equals leaving it out, a range or pair block works', () => {
    const i = col('20∠-18.19', '20∠-120', '20∠83.13');
    const h = [[3, 40, 30, 20], [5, 10, 10, 10]];
    const omitted = call('NEUTRALRMS', i, h)[0][0] as number;
    expectClose(call('NEUTRALRMS', i, h, col('230∠0', '230∠-120', '230∠120'))[0][0] as number, omitted, 1e-14);
    expectClose(call('NEUTRALRMS', i, h, [['400∠0', '400∠-120', '400∠120']])[0][0] as number, omitted, 1e-14);
    // the third harmonics of a supply with phase 2 at −124°: 8 A ∠0°, 6 A ∠−372°, 4 A ∠360° (mathjs-free: by hand)
    const skew = call('NEUTRALRMS', i, [[3, 40, 30, 20]], col('230∠0', '226∠-124', '229∠120'))[0][0] as number;
    const re = 8 + 6 * Math.cos((-372 * Math.PI) / 180) + 4;
    const im = 6 * Math.sin((-372 * Math.PI) / 180);
    expectClose(skew, Math.hypot(11.980942576853790, Math.hypot(re, im)), 1e-9);
  });
  it('phase_voltages: a blank, a 0 V phase, two values or a current are errors naming it', () => {
    const i = col('20∠-18.19', '20∠-120', '20∠83.13');
    expectMessage(() => call('NEUTRALRMS', i, [[3, 40]], col('230', '', '230∠120')), /phase_voltages, row 2 is blank/);
    expectMessage(() => call('NEUTRALRMS', i, [[3, 40]], col('230', 0, '230∠120')), /phase_voltages, phase 2 is 0 V/);
    expectMessage(() => call('NEUTRALRMS', i, [[3, 40]], col('230', '230∠-120')), /phase_voltages holds 2 values but needs three/);
    expectMessage(() => call('NEUTRALRMS', i, [[3, 40]], col('230', '10 A', '230∠120')), /phase_voltages, row 2/);
  });
  it('carries the sizing cautions', () => {
    expect(specByName.NEUTRALRMS.cautions?.join(' ')).toMatch(/competent, licensed person/);
  });
});

describe('PHZ.SIZINGCURRENT', () => {
  it('IEC 60364-5-52:2009 Annex E worked example (from memory): 39 A at 20 % → 45 A; 40 % → 54.4 A; 50 % → 58.5 A', () => {
    const a = call('SIZINGCURRENT', 39, 20)[0];
    expectClose(a[0] as number, 39 / 0.86);
    expect(a.slice(1)).toEqual([0.86, 'phase']);
    expectClose(call('SIZINGCURRENT', 39, 40)[0][0] as number, 54.42, 1e-3);
    expect(call('SIZINGCURRENT', 39, 50)[0]).toEqual([58.5, 1, 'neutral']);
  });
  it('BS 7671 Table 4Aa (the same rule; pangonilo.com case 1): 25 A at 32 % → 29 A', () => {
    expectClose(call('SIZINGCURRENT', 25, 32)[0][0] as number, 29.07, 1e-3);
  });
  it('normal use below 15 %: the design current itself, factor 1, phase basis', () => {
    expect(call('SIZINGCURRENT', 63, 10)).toEqual([[63, 1, 'phase']]);
  });
  it('range input: 1×1 ranges are accepted', () => {
    expect(call('SIZINGCURRENT', [[63]], [[10]])).toEqual([[63, 1, 'phase']]);
  });
  it('blank cell, wrong type, wrong count', () => {
    expectMessage(() => call('SIZINGCURRENT', null, 10), /design_current is blank/);
    expectMessage(() => call('SIZINGCURRENT', 63, 'lots'), /third_harmonic_pct must be a number/);
    expectMessage(() => call('SIZINGCURRENT', col(1, 2), 10), /design_current must be a number but is a range/);
  });
  it('domain error: negative percentage', () => {
    expectMessage(() => call('SIZINGCURRENT', 63, -2), /third_harmonic_pct is -2 %/);
  });
  it('carries the sizing cautions', () => {
    expect(specByName.SIZINGCURRENT.cautions?.join(' ')).toMatch(/locally adopted wiring rules/);
  });
});

describe('PHZ.NEUTRALDEMAND', () => {
  it('EC&M Code Quiz (2005 NEC 220.61(B)(2)): 475 A → 392.5 A', () => {
    expectClose(call('NEUTRALDEMAND', 475)[0][0] as number, 392.5);
  });
  it('EC&M Code Quiz 69 (220.61(C)): 475 A of nonlinear load on a 4-wire wye → 475 A', () => {
    expectClose(call('NEUTRALDEMAND', 0, 475)[0][0] as number, 475);
  });
  it('NFPA 70 Art. 220.61(B)(1) applied by hand: 200 A at 100 % + 60 A at 70 % = 242 A; normal use with both parts', () => {
    expectClose(call('NEUTRALDEMAND', 260)[0][0] as number, 242);
    expectClose(call('NEUTRALDEMAND', 300, 50)[0][0] as number, 320);
  });
  it('range input and blank: a 1×1 range; a blank nonlinear part is 0; a blank load is an error', () => {
    expectClose(call('NEUTRALDEMAND', [[150]], [['']])[0][0] as number, 150);
    expectMessage(() => call('NEUTRALDEMAND', ''), /unbalanced_load is blank/);
  });
  it('wrong type and count', () => {
    expectMessage(() => call('NEUTRALDEMAND', 'big'), /unbalanced_load must be a number/);
    expectMessage(() => call('NEUTRALDEMAND', 1, 2, 3), /takes at most 2 arguments/);
  });
  it('domain error: a negative load', () => {
    expectMessage(() => call('NEUTRALDEMAND', 100, -1), /nonlinear_load is -1 A/);
  });
  it('states the NFPA 70 edition it reads', () => {
    expect(specByName.NEUTRALDEMAND.details).toMatch(/2023 edition/);
  });
});
