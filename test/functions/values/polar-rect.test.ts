// TOPOLAR and TORECT: the two text forms. Reference: mathjs 15 complex numbers (an independent
// parser of a+bi text and its own polar conversion, math.complex({ r, phi })).
import { describe, it, expect } from 'vitest';
import * as math from 'mathjs';
import { functions } from '../../../src/functions';
import { expectClose, expectPhzError, readResult } from '../../helpers';

const { TOPOLAR, TORECT } = functions;

describe('PHZ.TOPOLAR', () => {
  it('shows a phasor in polar form at 6 significant figures', () => {
    expect(TOPOLAR([['24.5413-j9.2778']])).toEqual([['26.2365∠-20.709°']]);
  });
  it('agrees with mathjs on magnitude and angle (digits 15)', () => {
    const ref = math.complex('24.5413-9.2778i');
    const z = readResult(TOPOLAR([['24.5413-j9.2778']], 15)[0][0] as string);
    expectClose(z.abs(), math.abs(ref), 1e-14);
    expectClose(z.arg(), math.arg(ref), 1e-13);
  });
  it('turns a range of text and a pair block into a column', () => {
    expect(TOPOLAR([['1'], ['j'], ['-1']])).toEqual([['1∠0°'], ['1∠90°'], ['1∠180°']]);
    expect(TOPOLAR([[3, 4], [0, -2]])).toEqual([['5∠53.1301°'], ['2∠-90°']]);
  });
  it('refuses a blank cell', () => {
    expect(expectPhzError(() => TOPOLAR([[null]])).message).toMatch(/^z is blank/);
  });
  it('refuses a wrong type and bad text', () => {
    expect(expectPhzError(() => TOPOLAR([[true]])).message).toMatch(/TRUE\/FALSE/);
    expect(expectPhzError(() => TOPOLAR([['7+k5']])).message).toMatch(/stopped at "k5"/);
  });
  it('refuses digits outside 1–15 and too many arguments', () => {
    expect(expectPhzError(() => TOPOLAR([['1']], 0)).message).toMatch(/^digits is 0/);
    expect(expectPhzError(() => TOPOLAR([['1']], 6, 1)).message).toBe('PHZ.TOPOLAR takes at most 2 arguments but was given 3');
  });
});

describe('PHZ.TORECT', () => {
  it('shows a phasor in rectangular form', () => {
    expect(TORECT([['26.2365∠-20.709']])).toEqual([['24.5413-j9.2778']]);
  });
  it('agrees with mathjs polar → rectangular (digits 15)', () => {
    const ref = math.complex({ r: 26.2365, phi: (-20.709 * Math.PI) / 180 });
    const z = readResult(TORECT([['26.2365∠-20.709']], 15)[0][0] as string);
    expectClose(z.re, ref.re, 1e-13);
    expectClose(z.im, ref.im, 1e-13);
  });
  it('turns a range into a column and refuses blanks', () => {
    expect(TORECT([['230∠0'], ['230∠-120'], ['230∠120']], 4)).toEqual([['230'], ['-115-j199.2'], ['-115+j199.2']]);
    expect(expectPhzError(() => TORECT([['1'], ['']])).message).toMatch(/^z, row 2 is blank/);
  });
});
