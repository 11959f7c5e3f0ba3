// MAG, ANGLE, RE, IM, SPLIT: numbers at full precision. Reference: mathjs 15 complex numbers
// (abs, arg, re, im of its own parse of the same value).
import { describe, it, expect } from 'vitest';
import * as math from 'mathjs';
import { functions } from '../../../src/functions';
import { expectClose, expectPhzError } from '../../helpers';

const { MAG, ANGLE, REAL, IMAG, SPLIT } = functions;
const n = (r: unknown[][]) => r.map((row) => row[0] as number);

describe('PHZ.MAG', () => {
  it('gives |z| at full precision, agreeing with mathjs', () => {
    expectClose(n(MAG([['24.5413-j9.2778']]))[0], math.abs(math.complex('24.5413-9.2778i')), 1e-15);
  });
  it('reads pair blocks and ranges', () => {
    expect(n(MAG([[6, 8], [5, 12]]))).toEqual([10, 13]);
    const [a, b] = n(MAG([['3+j4'], ['230∠-120']]));
    expectClose(a, 5);
    expectClose(b, 230, 1e-15);
  });
  it('refuses blank, wrong type and bad text', () => {
    expect(expectPhzError(() => MAG([['']])).message).toMatch(/is blank/);
    expect(expectPhzError(() => MAG([[false]])).message).toMatch(/TRUE\/FALSE/);
    expect(expectPhzError(() => MAG([['∠30']])).message).toMatch(/number was expected/);
  });
});

describe('PHZ.ANGLE', () => {
  it('gives degrees in (−180, 180], agreeing with mathjs arg', () => {
    expectClose(n(ANGLE([['-1-j1']]))[0], -135, 1e-14);
    expect(n(ANGLE([['-2']]))[0]).toBe(180);
    expect(n(ANGLE([['0']]))[0]).toBe(0);
    expectClose(n(ANGLE([['4-j7']]))[0], (math.arg(math.complex(4, -7)) * 180) / Math.PI, 1e-14);
  });
  it('gives radians with "rad" and refuses unknown units', () => {
    expectClose(n(ANGLE([['j']], 'rad'))[0], Math.PI / 2, 1e-15);
    expect(expectPhzError(() => ANGLE([['j']], 'turns')).message).toMatch(/^unit is "turns"/);
  });
  it('reads a range and refuses blanks', () => {
    expect(n(ANGLE([['1∠10'], ['1∠-170']])).map(Math.round)).toEqual([10, -170]);
    expect(expectPhzError(() => ANGLE([[null]])).message).toMatch(/is blank/);
  });
});

describe('PHZ.REAL and PHZ.IMAG', () => {
  it('give the parts at full precision, agreeing with mathjs', () => {
    const ref = math.complex({ r: 230, phi: (-120 * Math.PI) / 180 });
    expectClose(n(REAL([['230∠-120']]))[0], ref.re, 1e-14);
    expectClose(n(IMAG([['230∠-120']]))[0], ref.im, 1e-14);
  });
  it('give exact zeros at multiples of 90°', () => {
    expect(n(REAL([['10∠90']]))).toEqual([0]);
    expect(n(IMAG([['10∠180']]))).toEqual([0]);
  });
  it('read ranges and refuse blanks and wrong types', () => {
    expect(n(REAL([[1, 2], [3, 4]]))).toEqual([1, 3]);
    expect(n(IMAG([[1, 2], [3, 4]]))).toEqual([2, 4]);
    expect(expectPhzError(() => REAL([[null]])).message).toMatch(/is blank/);
    expect(expectPhzError(() => IMAG([[true]])).message).toMatch(/TRUE\/FALSE/);
  });
});

describe('PHZ.SPLIT', () => {
  it('splits into real/imaginary columns or magnitude/degrees', () => {
    expect(SPLIT([['3-j4']])).toEqual([[3, -4]]);
    expect(SPLIT([['j2'], ['-5']], 'polar')).toEqual([[2, 90], [5, 180]]);
  });
  it('agrees with mathjs in polar form', () => {
    const [[m, a]] = SPLIT([['-7+j2']], 'POLAR') as number[][];
    const ref = math.complex(-7, 2);
    expectClose(m, math.abs(ref), 1e-15);
    expectClose(a, (math.arg(ref) * 180) / Math.PI, 1e-14);
  });
  it('refuses unknown forms and blanks', () => {
    expect(expectPhzError(() => SPLIT([['1']], 'cartesian')).message).toMatch(/^form is "cartesian"/);
    expect(expectPhzError(() => SPLIT([['1'], [null]])).message).toMatch(/row 2 is blank/);
  });
});
