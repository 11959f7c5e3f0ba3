// FROMPOLAR and FROMRECT. Reference: mathjs 15 complex numbers.
import { describe, it, expect } from 'vitest';
import * as math from 'mathjs';
import { functions } from '../../../src/functions';
import { expectPhasorClose, expectPhzError, readResult } from '../../helpers';

const { FROMPOLAR, FROMRECT } = functions;

describe('PHZ.FROMPOLAR', () => {
  it('makes a phasor from magnitude and degrees', () => {
    expect(FROMPOLAR([[230]], [[-120]])).toEqual([['230∠-120°']]);
  });
  it('agrees with mathjs math.complex({abs, arg}) in degrees and radians', () => {
    const z = readResult(FROMPOLAR([[11000]], [[-30]], null, 15)[0][0] as string);
    expectPhasorClose(z, math.complex({ r: 11000, phi: (-30 * Math.PI) / 180 }), 1e-13);
    const r = readResult(FROMPOLAR([[2]], [[0.5]], 'rad', 15)[0][0] as string);
    expectPhasorClose(r, math.complex({ r: 2, phi: 0.5 }), 1e-13);
  });
  it('reads columns row by row and broadcasts a single value', () => {
    expect(FROMPOLAR([[1], [2]], [[0], [90]])).toEqual([['1∠0°'], ['2∠90°']]);
    expect(FROMPOLAR([[10]], [[0], [90], [180]])).toEqual([['10∠0°'], ['10∠90°'], ['10∠180°']]);
  });
  it('refuses blanks, text, negative magnitudes, bad units and unequal columns', () => {
    expect(expectPhzError(() => FROMPOLAR([[null]], [[0]])).message).toMatch(/^magnitude is blank/);
    expect(expectPhzError(() => FROMPOLAR([['big']], [[0]])).message).toMatch(/^magnitude must be a number/);
    expect(expectPhzError(() => FROMPOLAR([[-5]], [[0]])).message).toBe(
      'magnitude is -5: give a magnitude of 0 or more, and add 180° to the angle to reverse the phasor',
    );
    expect(expectPhzError(() => FROMPOLAR([[1]], [[0]], 'grad')).message).toMatch(/^unit is "grad"/);
    expect(expectPhzError(() => FROMPOLAR([[1], [2]], [[0], [1], [2]])).message).toMatch(/magnitude: 2, angle: 3/);
  });
});

describe('PHZ.FROMRECT', () => {
  it('makes a phasor from real and imaginary parts (3-4-5 triangle, common practice)', () => {
    expect(FROMRECT([[3]], [[4]])).toEqual([['5∠53.1301°']]);
  });
  it('agrees with mathjs', () => {
    const z = readResult(FROMRECT([[-115]], [[199.186]], 15)[0][0] as string);
    expectPhasorClose(z, math.complex(-115, 199.186), 1e-13);
  });
  it('reads columns and refuses blanks, text and unequal columns', () => {
    expect(FROMRECT([[1], [0]], [[0], [-2]])).toEqual([['1∠0°'], ['2∠-90°']]);
    expect(expectPhzError(() => FROMRECT([[1]], [[null]])).message).toMatch(/^imag is blank/);
    expect(expectPhzError(() => FROMRECT([[true]], [[1]])).message).toMatch(/^real must be a number but is TRUE/);
    expect(expectPhzError(() => FROMRECT([[1], [2]], [[1], [2], [3]])).message).toMatch(/different numbers/);
  });
});
