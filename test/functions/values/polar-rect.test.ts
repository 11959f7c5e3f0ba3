// POLAR and RECT: the two text forms. Reference: mathjs 15 complex numbers (an independent
// parser of a+bi text and its own polar conversion, math.complex({ r, phi })).
import { describe, it, expect } from 'vitest';
import * as math from 'mathjs';
import { functions } from '../../../src/functions';
import { expectClose, expectPhzError, readResult } from '../../helpers';

const { POLAR, RECT } = functions;

describe('PHZ.POLAR', () => {
  it('shows a phasor in polar form at 6 significant figures', () => {
    expect(POLAR([['48-j24']])).toEqual([['53.6656∠-26.5651°']]);
  });
  it('agrees with mathjs on magnitude and angle (digits 15)', () => {
    const ref = math.complex('48-24i');
    const z = readResult(POLAR([['48-j24']], 15)[0][0] as string);
    expectClose(z.abs(), math.abs(ref), 1e-14);
    expectClose(z.arg(), math.arg(ref), 1e-13);
  });
  it('turns a range of text and a pair block into a column', () => {
    expect(POLAR([['1'], ['j'], ['-1']])).toEqual([['1∠0°'], ['1∠90°'], ['1∠180°']]);
    expect(POLAR([[3, 4], [0, -2]])).toEqual([['5∠53.1301°'], ['2∠-90°']]);
  });
  it('refuses a blank cell', () => {
    expect(expectPhzError(() => POLAR([[null]])).message).toMatch(/^z is blank/);
  });
  it('refuses a wrong type and bad text', () => {
    expect(expectPhzError(() => POLAR([[true]])).message).toMatch(/TRUE\/FALSE/);
    expect(expectPhzError(() => POLAR([['4+k2']])).message).toMatch(/stopped at "k2"/);
  });
  it('refuses digits outside 1–15 and too many arguments', () => {
    expect(expectPhzError(() => POLAR([['1']], 0)).message).toMatch(/^digits is 0/);
    expect(expectPhzError(() => POLAR([['1']], 6, 1)).message).toBe('PHZ.POLAR takes at most 2 arguments but was given 3');
  });
});

describe('PHZ.RECT', () => {
  it('shows a phasor in rectangular form', () => {
    expect(RECT([['58.5∠-35.6']])).toEqual([['47.5664-j34.0542']]);
  });
  it('agrees with mathjs polar → rectangular (digits 15)', () => {
    const ref = math.complex({ r: 58.5, phi: (-35.6 * Math.PI) / 180 });
    const z = readResult(RECT([['58.5∠-35.6']], 15)[0][0] as string);
    expectClose(z.re, ref.re, 1e-13);
    expectClose(z.im, ref.im, 1e-13);
  });
  it('turns a range into a column and refuses blanks', () => {
    expect(RECT([['230∠0'], ['230∠-120'], ['230∠120']], 4)).toEqual([['230'], ['-115-j199.2'], ['-115+j199.2']]);
    expect(expectPhzError(() => RECT([['1'], ['']])).message).toMatch(/^z, row 2 is blank/);
  });
});
