// ADD, SUB, MUL, DIV, CONJ, INV, PARALLEL, ROTATE. Reference: mathjs 15 complex arithmetic
// on its own parse of the same values (math.complex), and textbook circuit facts named below.
import { describe, it, expect } from 'vitest';
import * as math from 'mathjs';
import { functions } from '../../../src/functions';
import { expectClose, expectPhasorClose, expectPhzError, readResult } from '../../helpers';

const { ADD, SUB, MUL, DIV, CONJ, INV, PARALLEL, ROTATE } = functions;
const one = (r: unknown[][]) => readResult(r[0][0] as string);
const col = (r: unknown[][]) => r.map((row) => readResult(row[0] as string));

describe('PHZ.ADD', () => {
  it('adds every value given, agreeing with mathjs', () => {
    const ref = math.add(math.add(math.complex('7+5i'), math.complex('1-6i')), math.complex(3, 0));
    expectPhasorClose(one(ADD([[['7+j5']], [['1-j6']], [[3]]])), ref as math.Complex, 1e-5);
  });
  it('adds a balanced set to exactly 0 (Kirchhoff at a balanced star point, common practice)', () => {
    expect(ADD([[['10∠0'], ['10∠-120'], ['10∠120']]])).toEqual([['0']]);
  });
  it('reads ranges, pair blocks and skips blanks', () => {
    expectPhasorClose(one(ADD([[[1, 2], [3, 4]], [['j'], [null], ['']]])), { re: 4, im: 7 }, 1e-6);
  });
  it('refuses bad text naming which value, and all-blank input', () => {
    expect(expectPhzError(() => ADD([[['1']], [['x']]])).message).toMatch(/^z2: cannot read "x"/);
    expect(expectPhzError(() => ADD([[[null]]])).message).toMatch(/holds no phasor/);
    expect(expectPhzError(() => ADD([[[true]]])).message).toMatch(/TRUE\/FALSE/);
  });
});

describe('PHZ.SUB', () => {
  it('gives the line voltage V12 = V1 − V2 = √3·V∠30° of a balanced set (IEC 60038: 230/400 V)', () => {
    const v12 = one(SUB([['230∠0']], [['230∠-120']], 15));
    expectClose(v12.abs(), 230 * Math.sqrt(3), 1e-14);
    expectClose((v12.arg() * 180) / Math.PI, 30, 1e-13);
  });
  it('works row by row and broadcasts, agreeing with mathjs', () => {
    const r = col(SUB([['5+j5'], ['2']], [['1+j1']], 15));
    expectPhasorClose(r[0], math.subtract(math.complex(5, 5), math.complex(1, 1)) as math.Complex, 1e-14);
    expectPhasorClose(r[1], math.subtract(math.complex(2, 0), math.complex(1, 1)) as math.Complex, 1e-14);
  });
  it('gives exactly 0 for equal values', () => {
    expect(SUB([['230∠-120']], [['230∠-120']])).toEqual([['0']]);
  });
  it('refuses unequal counts, blanks and wrong types', () => {
    expect(expectPhzError(() => SUB([['1'], ['2']], [['1'], ['2'], ['3']])).message).toMatch(/a: 2, b: 3/);
    expect(expectPhzError(() => SUB([[null]], [['1']])).message).toMatch(/^a is blank/);
    expect(expectPhzError(() => SUB([['1']], [[false]])).message).toMatch(/^b is TRUE/);
  });
});

describe('PHZ.MUL', () => {
  it('multiplies every value given, agreeing with mathjs', () => {
    const ref = math.multiply(math.complex({ r: 10, phi: -Math.PI / 6 }), math.complex(4, 3)) as math.Complex;
    expectPhasorClose(one(MUL([[['10∠-30']], [['4+j3']]])), ref, 1e-5);
  });
  it('V = I·Z with a range of factors; a^3 = 1 for the operator a = 1∠120° (common practice)', () => {
    expectPhasorClose(one(MUL([[['1∠120'], ['1∠120'], ['1∠120']]])), { re: 1, im: 0 }, 1e-5);
  });
  it('refuses bad input', () => {
    expect(expectPhzError(() => MUL([[['2']], [['2 furlongs']]])).message).toMatch(/^z2: cannot read/);
  });
});

describe('PHZ.DIV', () => {
  it('gives I = V/Z, agreeing with mathjs', () => {
    const ref = math.divide(math.complex({ r: 230, phi: (-120 * Math.PI) / 180 }), math.complex(8, 6)) as math.Complex;
    expectPhasorClose(one(DIV([['230∠-120']], [['8+j6']], 15)), ref, 1e-13);
    expect(DIV([['230∠-120']], [['8+j6']])).toEqual([['23∠-156.87°']]);
  });
  it('works row by row over pair blocks and ranges', () => {
    const r = col(DIV([['230∠0'], ['230∠-120'], ['230∠120']], [[8, 6], [8, 6], [8, 6]], 15));
    r.forEach((z) => expectClose(z.abs(), 23, 1e-14));
  });
  it('refuses division by zero naming the row, and blanks', () => {
    expect(expectPhzError(() => DIV([['1']], [['0']])).message).toBe('b is 0: division by zero; give a non-zero divisor');
    expect(expectPhzError(() => DIV([['1']], [['1'], ['0+j0']])).message).toMatch(/^b, row 2 is 0/);
    expect(expectPhzError(() => DIV([['1']], [[null]])).message).toMatch(/^b is blank/);
  });
});

describe('PHZ.CONJ and PHZ.INV', () => {
  it('conjugate flips the angle (S = V·I*, common practice)', () => {
    expect(CONJ([['12∠-36.87']])).toEqual([['12∠36.87°']]);
    expectPhasorClose(one(CONJ([['3-j4']], 15)), math.conj(math.complex(3, -4)) as math.Complex, 1e-14);
  });
  it('inverse gives the admittance of an impedance, agreeing with mathjs', () => {
    expectPhasorClose(one(INV([['8+j6']], 15)), math.divide(1, math.complex(8, 6)) as math.Complex, 1e-14);
    expect(col(INV([['2'], ['j4']], 15)).map((z) => z.abs())).toEqual([0.5, 0.25]);
  });
  it('refuses zero and blanks', () => {
    expect(expectPhzError(() => INV([['0']])).message).toMatch(/^z is 0: it has no inverse/);
    expect(expectPhzError(() => CONJ([['']])).message).toMatch(/is blank/);
  });
});

describe('PHZ.PARALLEL', () => {
  it('combines resistors: 6 Ω ∥ 3 Ω = 2 Ω (product over sum, common practice)', () => {
    expect(PARALLEL([[['6']], [['3']]])).toEqual([['2∠0°']]);
  });
  it('agrees with mathjs 1/Σ(1/Z) for complex branches', () => {
    const ref = math.divide(1, math.add(math.divide(1, math.complex(10, 0)), math.divide(1, math.complex(0, 10)))) as math.Complex;
    expectPhasorClose(one(PARALLEL([[['10'], ['j10']]])), ref, 1e-5);
  });
  it('a 0 Ω branch shorts the group', () => {
    expect(PARALLEL([[['5']], [['0']]])).toEqual([['0']]);
  });
  it('refuses resonant branches and all blanks', () => {
    expect(expectPhzError(() => PARALLEL([[['j10']], [['-j10']]])).message).toMatch(/resonate/);
    expect(expectPhzError(() => PARALLEL([[[null]]])).message).toMatch(/holds no phasor/);
  });
});

describe('PHZ.ROTATE', () => {
  it('turns by degrees, row by row', () => {
    expect(ROTATE([['230∠0']], [[-120], [120]])).toEqual([['230∠-120°'], ['230∠120°']]);
  });
  it('agrees with mathjs multiplication by 1∠θ', () => {
    const ref = math.multiply(math.complex(3, 4), math.complex({ r: 1, phi: (37 * Math.PI) / 180 })) as math.Complex;
    expectPhasorClose(one(ROTATE([['3+j4']], [[37]], 15)), ref, 1e-14);
  });
  it('refuses text angles, blanks and unequal counts', () => {
    expect(expectPhzError(() => ROTATE([['1']], [['ninety']])).message).toMatch(/^degrees must be a number/);
    expect(expectPhzError(() => ROTATE([['1'], ['2']], [[1], [2], [3]])).message).toMatch(/z: 2, degrees: 3/);
  });
});
