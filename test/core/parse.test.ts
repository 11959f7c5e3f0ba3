import { describe, it, expect } from 'vitest';
import { parsePhasor, parsePhasorWithQuantity, parseNumberText, type UnitSymbol } from '../../src/core/parse';
import { expectPhasorClose, expectPhzError } from '../helpers';

const c30 = Math.cos(Math.PI / 6);
const r = (re: number, im: number) => ({ re, im });
const pd = (m: number, deg: number) => r(m * Math.cos((deg * Math.PI) / 180), m * Math.sin((deg * Math.PI) / 180));

// Every notation of DESIGN §3, with the value it stands for.
describe('parsePhasor reads every notation', () => {
  it.each([
    // rectangular
    ['7+j5', r(7, 5)],
    ['7+5j', r(7, 5)],
    ['7+5i', r(7, 5)],
    ['7+J5', r(7, 5)],
    ['7+5I', r(7, 5)],
    ['7 - j 5', r(7, -5)],
    ['  7  -  5 j  ', r(7, -5)],
    ['-j3', r(0, -3)],
    ['j', r(0, 1)],
    ['-j', r(0, -1)],
    ['+j', r(0, 1)],
    ['j2+4', r(4, 2)],
    ['2.5e-3+j1e-2', r(0.0025, 0.01)],
    ['1E3-j2E+2', r(1000, -200)],
    ['.5+j.25', r(0.5, 0.25)],
    ['5.', r(5, 0)],
    ['\u22125\u2212j2', r(-5, -2)],
    ['4+-j2', r(4, -2)],
    ['4+j-2', r(4, -2)],
    ['-7', r(-7, 0)],
    ['0', r(0, 0)],
    // polar, degrees by default
    ['230∠-120', pd(230, -120)],
    ['230∠-120°', pd(230, -120)],
    ['230 ∠ -120 °', pd(230, -120)],
    ['230<-120', pd(230, -120)],
    ['230@-120', pd(230, -120)],
    ['230∠\u2212120', pd(230, -120)],
    ['230∠30deg', pd(230, 30)],
    ['1∠0.5rad', r(Math.cos(0.5), Math.sin(0.5))],
    ['1∠0.5 RAD', r(Math.cos(0.5), Math.sin(0.5))],
    ['10∠90', r(0, 10)],
    ['10∠-90', r(0, -10)],
    ['10∠180', r(-10, 0)],
    ['10∠270', r(0, -10)],
    // exponential
    ['230e^(j30)', r(230 * c30, 115)],
    ['230e^(-j30°)', r(230 * c30, -115)],
    ['230 E^( j 30 )', r(230 * c30, 115)],
    ['2e^(j0.5rad)', r(2 * Math.cos(0.5), 2 * Math.sin(0.5))],
    ['e^(j90)', r(0, 1)],
    ['1.5e2e^(j90)', r(0, 150)],
    // decimal comma
    ['7,5+j2,25', r(7.5, 2.25)],
    ['230,5∠-120', pd(230.5, -120)],
    ['0,25', r(0.25, 0)],
    // units with SI prefix: the prefix scales, the word is checked
    ['11 kV∠0', r(11000, 0)],
    ['11kV∠30', pd(11000, 30)],
    ['7+j5 Ω', r(7, 5)],
    ['7+j5 \u2126', r(7, 5)],
    ['7+j5 ohm', r(7, 5)],
    ['7+j5 Ohms', r(7, 5)],
    ['250 mΩ', r(0.25, 0)],
    ['250mohm', r(0.25, 0)],
    ['230 V', r(230, 0)],
    ['5 A∠-30', pd(5, -30)],
    ['230∠-120° V', pd(230, -120)],
    ['12 µA', r(12e-6, 0)],
    ['12 uA', r(12e-6, 0)],
    ['3 MVA', r(3e6, 0)],
    ['3 mVA', r(3e-3, 0)],
    ['40+j30 kVA', r(40000, 30000)],
    ['2 MW', r(2e6, 0)],
    ['5 mS', r(0.005, 0)],
    ['2 kΩ e^(j45)', pd(2000, 45)],
  ])('%s', (text, expected) => {
    expectPhasorClose(parsePhasor(text), expected, 1e-12);
  });

  it('gives exact parts at multiples of 90° so RE and IM show clean zeros', () => {
    const z = parsePhasor('10∠90');
    expect(z.re).toBe(0);
    expect(z.im).toBe(10);
  });
});

describe('parsePhasor refuses malformed text with what was read, where it stopped and a valid form', () => {
  it.each([
    ['', /empty/],
    ['   ', /empty/],
    ['7+k5', /stopped at "k5" \(character 3\)/],
    ['abc', /stopped at "abc" \(character 1\)/],
    ['230∠', /stopped at the end.*angle/],
    ['230∠abc', /angle/],
    ['3+j4+5', /stopped at "\+5"/],
    ['3+j4j', /stopped at "j"/],
    ['4j+2j', /two imaginary parts/],
    ['4+5', /two real parts/],
    ['e^(30)', /e\^\(j30\)/],
    ['230e^(j30', /closing "\)"/],
    ['2 kΩ∠30 V', /one unit/],
    ['5 furlongs', /not part of a phasor or a known unit/],
    ['4.5,2', /mixes a decimal comma and a decimal point/],
    ['1,000', /with a thousands separator it is 1000, with a decimal comma 1/],
    ['1e400', /too large/],
    ['Infinity', /stopped at "nfinity"/],
    ['NaN', /number was expected/],
    ['--4', /number was expected/],
  ])('%j', (text, pattern) => {
    const err = expectPhzError(() => parsePhasor(text));
    expect(err.message).toMatch(pattern);
    // every message shows a valid form to copy
    if (!/separator|one decimal|too large/.test(err.message)) expect(err.message).toMatch(/7\+j5, 230∠-120/);
  });

  it('checks the unit word against the quantity the argument expects', () => {
    expect(parsePhasor('7+j5 Ω', { expect: 'impedance' }).re).toBe(7);
    expect(parsePhasor('7+j5', { expect: 'impedance' }).re).toBe(7);
    const err = expectPhzError(() => parsePhasor('230 V', { expect: 'impedance' }));
    expect(err.message).toBe('"230 V" is a voltage but an impedance is expected here; give it in Ω or without a unit');
  });
});

describe('angles at multiples of 15° are exact', () => {
  it.each([
    ['230∠-120', -115, -115 * Math.sqrt(3)],
    ['230∠120', -115, 115 * Math.sqrt(3)],
    ['10∠30', 5 * Math.sqrt(3), 5],
    ['10∠-150', -5 * Math.sqrt(3), -5],
    ['2∠45', Math.SQRT2, Math.SQRT2],
    ['1∠-240', -0.5, Math.sqrt(3) / 2],
    ['1∠390', Math.sqrt(3) / 2, 0.5],
  ])('%s', (text, re, im) => {
    const z = parsePhasor(text);
    // cos 120° = −0.5 exactly (common practice): the real part has no rounding tail
    expect(z.re).toBeCloseTo(re, 13);
    expect(z.im).toBeCloseTo(im, 12);
  });
  it('230∠-120 has a real part of exactly -115', () => {
    expect(parsePhasor('230∠-120').re).toBe(-115);
  });
  // Math.cos/sin carry their own rounding (about 1e-15 at |angle| ≈ 10 rad), so the
  // comparison allows a few units in the last place.
  it('agrees with cos/sin at the 15° steps to the last few bits', () => {
    for (let k = -48; k <= 48; k++) {
      const z = parsePhasor(`1∠${k * 15}`);
      const a = (k * 15 * Math.PI) / 180;
      expect(Math.abs(z.re - Math.cos(a))).toBeLessThan(4e-15);
      expect(Math.abs(z.im - Math.sin(a))).toBeLessThan(4e-15);
    }
  });
});

describe('parsePhasorWithQuantity says which quantity a unit word names', () => {
  it.each([
    ['11 kV∠0', 'voltage', pd(11000, 0)],
    ['7+j5 Ω', 'impedance', r(7, 5)],
    ['250 mΩ', 'impedance', r(0.25, 0)],
    ['12 A∠-30', 'current', pd(12, -30)],
    ['2.3 kVA∠36.87', 'power', pd(2300, 36.87)],
    ['230∠-120', null, pd(230, -120)],
    ['7+j5', null, r(7, 5)],
  ] as const)('%s → %s', (text, quantity, value) => {
    const got = parsePhasorWithQuantity(text);
    expect(got.quantity).toBe(quantity);
    // same value as the one parser gives (and as the notation stands for)
    expectPhasorClose(got.phasor, value);
    expectPhasorClose(got.phasor, parsePhasor(text), 0);
  });

  it('gives the parser its own message for text it cannot read', () => {
    const err = expectPhzError(() => parsePhasorWithQuantity('12 furlongs'));
    expect(err.message).toMatch(/^cannot read "12 furlongs" as a phasor/);
  });
});

// Reactive power is measured in var and is the imaginary part of S = P + jQ; real power is
// measured in W; complex and apparent power in VA (IEC 60050-131, IEV 131-11-39 to -44,
// from memory). A unit that changed the meaning of a value would be a silent error.
describe('units of power keep their meaning', () => {
  it.each([
    ['40 kvar', r(0, 40000)],
    ['j40 kvar', r(0, 40000)],
    ['40j kvar', r(0, 40000)],
    ['-40 kvar', r(0, -40000)],
    ['-j40 kvar', r(0, -40000)],
    ['40 kVAr', r(0, 40000)],
    ['1,5 Mvar', r(0, 1.5e6)],
    ['40∠90 kvar', r(0, 40000)],
    ['0 var', r(0, 0)],
    ['40 kW', r(40000, 0)],
    ['-2,5 kW', r(-2500, 0)],
    ['40+j30 kVA', r(40000, 30000)],
    ['50 kVA∠36.87', pd(50000, 36.87)],
    ['3 MVA', r(3e6, 0)],
  ])('%s', (text, expected) => {
    expectPhasorClose(parsePhasor(text), expected, 1e-12);
  });

  it.each(['40+j30 kvar', '40∠30 kvar', '5e^(j10) var'])('refuses the complex value %j in var, pointing to VA', (text) => {
    expect(expectPhzError(() => parsePhasor(text)).message).toMatch(/var is reactive power alone .*write it in VA/);
  });
  it.each(['40+j30 kW', 'j40 kW', '40∠30 kW', '-j2 MW'])('refuses the non-real value %j in W, pointing to VA', (text) => {
    expect(expectPhzError(() => parsePhasor(text)).message).toMatch(/W is real power alone.*write it in VA/);
  });
  it('still checks the quantity of a power unit against the argument', () => {
    expect(expectPhzError(() => parsePhasor('40 kvar', { expect: 'voltage' })).message).toMatch(/is a power but a voltage is expected/);
  });
  it('reports the unit it read, when asked, and leaves the record alone for text without one', () => {
    const seen: { unit: UnitSymbol | null } = { unit: null };
    for (const text of ['8+j6', '230∠-120', '1e3+j2', '0,5']) {
      parsePhasor(text, { seen });
      expect(seen.unit, text).toBeNull();
    }
    for (const [text, unit] of [['40 kvar', 'var'], ['4 kW', 'W'], ['4+j3 kVA', 'VA'], ['7+j5 ohm', 'Ω'], ['11 kV∠0', 'V'], ['5 mS', 'S'], ['5 A', 'A']] as const) {
      seen.unit = null;
      parsePhasor(text, { seen });
      expect(seen.unit, text).toBe(unit);
    }
  });
});

describe('decimal comma', () => {
  // A thousands-grouped number has one to three leading digits, the first not 0, then groups of
  // exactly three (common practice): a comma after a leading 0, after four or more digits, or
  // before other than three digits is a decimal comma.
  it.each([
    ['0,125', r(0.125, 0)],
    ['-0,125', r(-0.125, 0)],
    ['\u22120,125', r(-0.125, 0)],
    ['+0,125', r(0.125, 0)],
    ['0,045 Ω', r(0.045, 0)],
    ['0,045Ω', r(0.045, 0)],
    ['0,250+j0,080', r(0.25, 0.08)],
    ['0,250-j0,080', r(0.25, -0.08)],
    ['j0,125', r(0, 0.125)],
    ['0,125∠-30', pd(0.125, -30)],
    ['230∠-120,25', pd(230, -120.25)],
    ['1234,567', r(1234.567, 0)],
    ['1,250+j2,5', r(1.25, 2.5)],
    ['7,5+j2,25', r(7.5, 2.25)],
  ])('%s', (text, expected) => {
    expectPhasorClose(parsePhasor(text), expected, 1e-15);
  });

  it('names both readings of a truly ambiguous comma and how to write each', () => {
    expect(expectPhzError(() => parsePhasor('1,250')).message).toBe(
      'cannot read "1,250": with a thousands separator it is 1250, with a decimal comma 1.250; write it as one of these',
    );
    expect(expectPhzError(() => parsePhasor('1,250+j2,500 Ω')).message).toBe(
      'cannot read "1,250+j2,500 Ω": with thousands separators it is 1250+j2500 Ω, with decimal commas 1.250+j2.500 Ω; write it as one of these',
    );
  });
  it('refuses thousands separators where no decimal reading exists, saying how to write the number', () => {
    expect(expectPhzError(() => parsePhasor('1,000,000')).message).toBe(
      'cannot read "1,000,000": thousands separators are not read; write it as 1000000',
    );
  });
});

describe('parseNumberText: one number with an optional unit, for numeric arguments', () => {
  it.each([
    ['4 kW', 4000, 'W'],
    ['4kW', 4000, 'W'],
    ['-2,5 kvar', -2500, 'var'],
    ['0,8', 0.8, null],
    ['1e3', 1000, null],
    [' 32 A ', 32, 'A'],
    ['11 kV', 11000, 'V'],
  ] as const)('%j', (text, value, unit) => {
    const seen: { unit: UnitSymbol | null } = { unit: null };
    expect(parseNumberText(text, seen)).toBe(value);
    expect(seen.unit).toBe(unit);
  });
  it.each(['4+j3', '4∠30', 'four', '4 furlongs', '4 kW kW', '', 'j4'])('is NaN for %j, which is not one number', (text) => {
    expect(parseNumberText(text, { unit: null })).toBeNaN();
  });
  it('applies the decimal comma rule', () => {
    expect(expectPhzError(() => parseNumberText('1,000', { unit: null })).message).toMatch(/with a thousands separator it is 1000, with a decimal comma 1\.000;/);
  });
});
