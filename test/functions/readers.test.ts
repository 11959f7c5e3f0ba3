import { describe, it, expect } from 'vitest';
import {
  readPhasors,
  readPhasor,
  readSomePhasors,
  readRepeatedPhasors,
  readNumber,
  readNumbers,
  readDigits,
  readChoice,
  readBoolean,
  zipWith,
  isBlank,
  asMatrix,
  OneQuantity,
} from '../../src/functions/readers';
import { expectPhasorClose, expectPhzError } from '../helpers';

describe('readPhasors: shapes of DESIGN §3', () => {
  it('reads one text cell', () => {
    const [z] = readPhasors([['7+j5']], 'z');
    expectPhasorClose(z, { re: 7, im: 5 });
  });
  it('reads a scalar as one cell', () => {
    expect(readPhasors('7+j5', 'z')).toHaveLength(1);
    expect(readPhasors(5, 'z')[0].re).toBe(5);
  });
  it('reads a number as a real phasor', () => {
    expectPhasorClose(readPhasors([[7.5]], 'z')[0], { re: 7.5, im: 0 });
  });
  it('reads two numeric columns row by row as real/imaginary pairs', () => {
    const zs = readPhasors([[4, 2], [1, -3], [0, 5]], 'z');
    expect(zs.map((z) => [z.re, z.im])).toEqual([[4, 2], [1, -3], [0, 5]]);
  });
  it('reads one row of two numbers as a pair', () => {
    expect(readPhasors([[3, 4]], 'z').map((z) => [z.re, z.im])).toEqual([[3, 4]]);
  });
  it('reads a column of text cell by cell', () => {
    expect(readPhasors([['1'], ['j'], ['2∠90']], 'z')).toHaveLength(3);
  });
  it('reads two columns holding text cell by cell, row by row', () => {
    const zs = readPhasors([['1', 'j2'], [3, '4']], 'z');
    expect(zs.map((z) => [z.re, z.im])).toEqual([[1, 0], [0, 2], [3, 0], [4, 0]]);
  });
  it('reads three numeric columns cell by cell', () => {
    expect(readPhasors([[1, 2, 3]], 'z').map((z) => z.re)).toEqual([1, 2, 3]);
  });
  it('skips blanks (null, "", whitespace) when asked, in cells and in pair rows', () => {
    expect(readPhasors([['1'], [null], [''], ['  '], ['2']], 'z', { blanks: 'skip' })).toHaveLength(2);
    expect(readPhasors([[1, 2], [null, null], [3, 4]], 'z', { blanks: 'skip' })).toHaveLength(2);
  });
  it('names the blank cell when a phasor is required', () => {
    expect(expectPhzError(() => readPhasors([['1'], [null]], 'impedances')).message).toBe(
      'impedances, row 2 is blank: a phasor is required here; enter a value such as 230∠0 or 7+j5',
    );
    expect(expectPhzError(() => readPhasors([['1', 'x', '2']], 'z')).message).toMatch(/^z, value 2: cannot read "x"/);
    expect(expectPhzError(() => readPhasors([['1', '2', '3'], ['4', '', '6']], 'z')).message).toMatch(/^z, row 2 column 2 is blank/);
  });
  it('refuses half a pair', () => {
    expect(expectPhzError(() => readPhasors([[1, 2], [3, null]], 'z')).message).toBe(
      'row 2 of z has one part of a real/imaginary pair but not the other: enter 0 for a zero part',
    );
  });
  it('refuses booleans, error values and other objects with the cell named', () => {
    expect(expectPhzError(() => readPhasors([[true]], 'z')).message).toMatch(/^z is TRUE\/FALSE/);
    // Excel.ValueErrorCellValue (the JSON of a #VALUE! cell); more shapes in cellvalues.test.ts
    expect(expectPhzError(() => readPhasors([[{ type: 'Error', errorType: 'Value', basicValue: '#VALUE!', basicType: 'Error' }]], 'z')).message).toBe(
      'z holds the error #VALUE!: fix the cell it comes from first',
    );
    expect(expectPhzError(() => readPhasors([[Symbol.iterator as unknown]], 'z')).message).toMatch(/neither a number nor text/);
    expect(expectPhzError(() => readPhasors([[Infinity]], 'z')).message).toMatch(/not a finite number/);
  });
  it('passes the expected quantity to the parser', () => {
    expect(expectPhzError(() => readPhasors([['230 V']], 'impedance', { expect: 'impedance' })).message).toMatch(
      /^impedance: "230 V" is a voltage/,
    );
  });
});

describe('single, some and repeated phasors', () => {
  it('readPhasor wants exactly one', () => {
    expect(readPhasor([['2']], 'z').re).toBe(2);
    expect(expectPhzError(() => readPhasor([['1'], ['2']], 'z')).message).toMatch(/must be one phasor but holds 2/);
    expect(expectPhzError(() => readPhasor([[null]], 'z')).message).toMatch(/is blank/);
  });
  it('readSomePhasors refuses an all-blank range', () => {
    expect(expectPhzError(() => readSomePhasors([[null], ['']], 'z')).message).toMatch(/holds no phasor/);
  });
  it('readRepeatedPhasors flattens every value given, names them z1, z2 …', () => {
    expect(readRepeatedPhasors([[['1']], [['2'], ['3']], [[4, 5]]], 'z')).toHaveLength(4);
    expect(expectPhzError(() => readRepeatedPhasors([[['1']], [['bad']]], 'z')).message).toMatch(/^z2: cannot read "bad"/);
    expect(expectPhzError(() => readRepeatedPhasors([[[null]]], 'z')).message).toMatch(/holds no phasor/);
  });
});

describe('OneQuantity: the values of one sum name one quantity', () => {
  it('refuses a current added to a voltage, naming both values', () => {
    const same = new OneQuantity();
    expect(expectPhzError(() => readRepeatedPhasors([[['10 A']], [['5 V']]], 'z', { same })).message).toBe(
      'z2 ("5 V") is a voltage but z1 ("10 A") is a current: the values of one sum must be one quantity; check the units',
    );
  });
  it('lets values without a unit join any quantity, and W, var and VA add as powers', () => {
    expect(readRepeatedPhasors([[['10 A'], [4], ['3+j1']], [['2 A']]], 'z', { same: new OneQuantity() })).toHaveLength(4);
    const s = readRepeatedPhasors([[['40 kW']], [['30 kvar']], [['1+j1 kVA']]], 'z', { same: new OneQuantity() });
    expect(s.map((z) => [z.re, z.im])).toEqual([[40000, 0], [0, 30000], [1000, 1000]]);
  });
  it('checks across arguments when one checker is shared', () => {
    const same = new OneQuantity();
    readPhasors([['10 A']], 'a', { same });
    expect(expectPhzError(() => readPhasors([['5 Ω'], ['2 V']], 'b', { same })).message).toMatch(/^b, row 1 \("5 Ω"\) is an impedance but a \("10 A"\) is a current/);
  });
});

describe('numbers, digits, choices and booleans', () => {
  it('readNumber accepts numbers and numeric text, applies defaults and ranges', () => {
    expect(readNumber(3, 'n')).toBe(3);
    expect(readNumber(' 2.5 ', 'n')).toBe(2.5);
    expect(readNumber('2,5', 'n')).toBe(2.5);
    expect(readNumber(null, 'n', { default: 7 })).toBe(7);
    expect(readNumber([[4]], 'n')).toBe(4);
    expect(expectPhzError(() => readNumber('abc', 'power_factor')).message).toBe(
      'power_factor must be a number but is the text "abc": give a plain number',
    );
    expect(expectPhzError(() => readNumber(0, 'pf', { min: 0, minExclusive: true, max: 1 })).message).toBe(
      'pf is 0 but must be above 0 and at most 1',
    );
    expect(expectPhzError(() => readNumber(null, 'n')).message).toMatch(/is blank: a number is required/);
    expect(expectPhzError(() => readNumber([[1, 2]], 'n')).message).toMatch(/a range of several cells/);
  });
  it('readNumber reads a decimal comma by the parser\'s rule, and names both readings of an ambiguous one', () => {
    expect(readNumber('0,85', 'power_factor')).toBe(0.85);
    expect(readNumber('-0,125', 'n')).toBe(-0.125);
    expect(expectPhzError(() => readNumber('1,000', 'design_current')).message).toBe(
      'design_current: cannot read "1,000": with a thousands separator it is 1000, with a decimal comma 1.000; write it as one of these',
    );
  });
  it('readNumber takes a unit word only where the argument names its quantity', () => {
    expect(readNumber('4 kW', 'real_power', { units: ['W'] })).toBe(4000);
    expect(readNumber('2,5 kW', 'real_power', { units: ['W'] })).toBe(2500);
    expect(readNumber(' 32 A', 'design_current', { units: ['A'] })).toBe(32);
    expect(readNumber('4000', 'real_power', { units: ['W'] })).toBe(4000);
    expect(expectPhzError(() => readNumber('40 kvar', 'real_power', { units: ['W'] })).message).toBe(
      'real_power is "40 kvar", a reactive power in var, but takes a real power in W: give it in W or as a plain number',
    );
    expect(expectPhzError(() => readNumber('4 kVA', 'real_power', { units: ['W'] })).message).toMatch(
      /^real_power is "4 kVA", a complex or apparent power in VA, but takes a real power in W/,
    );
    expect(readNumber('11 kV', 'magnitude', { units: ['V', 'A'] })).toBe(11000);
    expect(expectPhzError(() => readNumber('5 Ω', 'magnitude', { units: ['V', 'A'] })).message).toBe(
      'magnitude is "5 Ω", an impedance in Ω, but takes a voltage in V or a current in A: give it in V or A or as a plain number',
    );
    expect(expectPhzError(() => readNumber('0.8 W', 'power_factor')).message).toBe(
      'power_factor is "0.8 W", a real power in W, but takes a plain number: give it without a unit',
    );
    expect(expectPhzError(() => readNumber('4+j3 kW', 'real_power', { units: ['W'] })).message).toBe(
      'real_power must be a number but is the text "4+j3 kW": give a number, with or without a unit (W)',
    );
  });
  it('readNumbers reads a column and names the bad cell', () => {
    expect(readNumbers([[1], [2], [3]], 'angle')).toEqual([1, 2, 3]);
    expect(expectPhzError(() => readNumbers([[1], ['x']], 'angle')).message).toMatch(/^angle, row 2 must be a number/);
    expect(expectPhzError(() => readNumbers([[1], [null]], 'angle')).message).toMatch(/^angle, row 2 is blank/);
  });
  it('readDigits is 1–15, whole, default 6', () => {
    expect(readDigits(null)).toBe(6);
    expect(readDigits(undefined)).toBe(6);
    expect(readDigits(15)).toBe(15);
    expect(expectPhzError(() => readDigits(16)).message).toBe('digits is 16 but must be at least 1 and at most 15');
    expect(expectPhzError(() => readDigits(2.5)).message).toBe('digits is 2.5 but must be a whole number');
  });
  it('readChoice is case-insensitive and lists the choices', () => {
    expect(readChoice('RAD', 'unit', ['deg', 'rad'], 'deg')).toBe('rad');
    expect(readChoice(null, 'unit', ['deg', 'rad'], 'deg')).toBe('deg');
    expect(expectPhzError(() => readChoice('grad', 'unit', ['deg', 'rad'], 'deg')).message).toBe(
      'unit is "grad", which is not one of "deg", "rad": use one of those (any case)',
    );
  });
  it('readBoolean accepts TRUE/FALSE, 1/0 and the words', () => {
    expect(readBoolean(true, 'b', false)).toBe(true);
    expect(readBoolean(0, 'b', true)).toBe(false);
    expect(readBoolean('True', 'b', false)).toBe(true);
    expect(readBoolean(null, 'b', true)).toBe(true);
    expect(expectPhzError(() => readBoolean('yes', 'leading', false)).message).toBe('leading must be TRUE or FALSE but is the text "yes"');
  });
});

describe('element-wise pairing and broadcasting', () => {
  it('pairs equal counts and broadcasts a single value', () => {
    expect(zipWith([1, 2, 3], 'a', [10], 'b', (x, y) => x + y)).toEqual([11, 12, 13]);
    expect(zipWith([1], 'a', [10, 20], 'b', (x, y) => x + y)).toEqual([11, 21]);
    expect(zipWith([1, 2], 'a', [10, 20], 'b', (x, y) => x * y)).toEqual([10, 40]);
  });
  it('refuses unequal counts, naming both', () => {
    expect(expectPhzError(() => zipWith([1, 2], 'a', [1, 2, 3], 'b', (x, y) => x + y)).message).toBe(
      'the arguments hold different numbers of values (a: 2, b: 3): give equal counts, or a single value to use for every row',
    );
  });
});

describe('blank and matrix helpers', () => {
  it.each([[null, true], [undefined, true], ['', true], [' ', true], [0, false], ['0', false], [false, false]])('isBlank(%j) = %j', (v, b) => {
    expect(isBlank(v)).toBe(b);
  });
  it('asMatrix wraps scalars and flat lists', () => {
    expect(asMatrix(3)).toEqual([[3]]);
    expect(asMatrix([1, 2])).toEqual([[1, 2]]);
    expect(asMatrix([[1], [2]])).toEqual([[1], [2]]);
  });
});

describe('unit and comma messages stay short enough for Excel on Mac (it cuts near 255 characters)', () => {
  const long = '1,250+j2,500 Ω' + ' '.repeat(80);
  it.each([
    () => readPhasors([['1', '2', '3'], ['4', '5', `1,250+j2,500${' '.repeat(70)}`]], 'impedances'),
    () => readPhasors([['1'], [long]], 'supply_voltages'),
    () => readRepeatedPhasors([[['10 A' + ' '.repeat(90)]], [['5 V' + ' '.repeat(90)]]], 'z', { same: new OneQuantity() }),
    () => readNumber('40 kvar' + ' '.repeat(90), 'real_power', { units: ['W'] }),
    () => readPhasors([['1', '2', `40+j30${' '.repeat(90)}kvar`]], 'power'),
  ])('case %#', (f) => {
    const m = expectPhzError(f).message;
    expect(m.length).toBeLessThanOrEqual(255);
  });
});
