// Unit words across the functions: a unit never changes what a value means (issue 8 §2).
// Power units follow IEC 60050-131 (IEV 131-11-39 to -44, from memory): S = P + jQ, with P
// in W, Q in var and S in VA. References are mathjs 15 complex arithmetic on the same values.
import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import { angleDeg, magnitude } from '../../src/core/phasor';
import { expectClose, expectPhasorClose } from '../helpers';
import { call, col, expectMessage, ph } from './sets/_cells';

describe('a value in var is reactive power', () => {
  it('LOADCURRENT("230", "40 kvar") draws 173.913 A at −90°, as (S/V)* with S = j40 000 VA', () => {
    const ref = math.conj(math.divide(math.complex(0, 40000), math.complex(230, 0)) as math.Complex) as math.Complex;
    const i = ph(call('LOADCURRENT', '230', '40 kvar', 15)[0][0]);
    expectPhasorClose(i, ref, 1e-14);
    expectClose(angleDeg(i), -90, 1e-14);
    expect(call('LOADCURRENT', '230', '40 kvar')).toEqual([['173.913∠-90°']]);
    expect(call('LOADCURRENT', '230', 'j40 kvar')).toEqual([['173.913∠-90°']]);
  });
  it('POWERFACTOR of a value in var is 0, of a value in W is 1', () => {
    expect(call('POWERFACTOR', col('40 kvar', '40 kW'))).toEqual([[0], [1]]);
  });
  it('a complex value in var, or a non-real one in W, is refused with the way to write it in VA', () => {
    expectMessage(() => call('LOADCURRENT', '230', '40+j30 kvar'), /^power: cannot read "40\+j30 kvar": var is reactive power alone.*write it in VA/);
    expectMessage(() => call('POWERFACTOR', '40∠30 kW'), /^power: cannot read "40∠30 kW": W is real power alone.*write it in VA/);
  });
});

describe('the values of one sum are one quantity', () => {
  it('ADD("10 A", "5 V") is refused, naming both', () => {
    expectMessage(() => call('ADD', [[['10 A']], [['5 V']]]), /^z2 \("5 V"\) is a voltage but z1 \("10 A"\) is a current: the values of one sum must be one quantity/);
  });
  it('SUB of a current and a voltage is refused; a value without a unit joins any quantity', () => {
    expectMessage(() => call('SUB', '10 A', '5 V'), /^b \("5 V"\) is a voltage but a \("10 A"\) is a current/);
    expectPhasorClose(ph(call('SUB', '10 A', 5, 15)[0][0]), math.complex(5, 0) as math.Complex, 1e-15);
  });
  it('W, var and VA add as powers: 40 kW + 30 kvar = 40 + j30 kVA', () => {
    const ref = math.add(math.complex(40000, 0), math.complex(0, 30000)) as math.Complex;
    expectPhasorClose(ph(call('ADD', [[['40 kW']], [['30 kvar']]])[0][0]), ref, 1e-6);
    expect(call('ADD', [[['40 kW']], [['30 kvar']]])).toEqual([['50000∠36.8699°']]);
  });
  it('PARALLEL takes impedances: a value in S is refused rather than read as ohms', () => {
    expectMessage(() => call('PARALLEL', [[['10 Ω']], [['0.1 S']]]), /^z2: "0.1 S" is an admittance but an impedance is expected here/);
    expect(call('PARALLEL', [[['6 Ω']], [['3 ohm']]])).toEqual([['2∠0°']]);
  });
});

describe('numeric arguments take the unit words of the quantity they name', () => {
  it('COMPLEXPOWER("4 kW", 0.8) = 4000 + j3000 VA (3-4-5 power triangle, common practice)', () => {
    expectPhasorClose(ph(call('COMPLEXPOWER', '4 kW', 0.8, null, 15)[0][0]), { re: 4000, im: 3000 }, 1e-14);
    expectPhasorClose(ph(call('COMPLEXPOWER', col('4 kW', 2500, '0,5 MW'), '0,8', null, 15)[2][0]), { re: 5e5, im: 3.75e5 }, 1e-14);
  });
  it('COMPLEXPOWER refuses a reactive or apparent power where the real power belongs', () => {
    expectMessage(() => call('COMPLEXPOWER', '40 kvar', 0.8), /^real_power is "40 kvar", a reactive power in var, but takes a real power in W/);
    expectMessage(() => call('COMPLEXPOWER', col(1000, '5 kVA'), 0.8), /^real_power, row 2 is "5 kVA", a complex or apparent power in VA/);
    expectMessage(() => call('COMPLEXPOWER', 4000, '0.8 W'), /^power_factor is "0.8 W", a real power in W, but takes a plain number/);
  });
  it('currents in A for SIZINGCURRENT and NEUTRALDEMAND, voltages or currents for BALANCED', () => {
    expect(call('SIZINGCURRENT', '63 A', 10)).toEqual(call('SIZINGCURRENT', 63, 10));
    expect(call('NEUTRALDEMAND', '0,3 kA', '50 A')).toEqual(call('NEUTRALDEMAND', 300, 50));
    expect(call('BALANCED', '11 kV')).toEqual(call('BALANCED', 11000));
    expectMessage(() => call('SIZINGCURRENT', '63 V', 10), /^design_current is "63 V", a voltage in V, but takes a current in A/);
    expectMessage(() => call('BALANCED', '5 Ω'), /^magnitude is "5 Ω", an impedance in Ω, but takes a voltage in V or a current in A/);
  });
  it('magnitudes of the result follow the prefix', () => {
    expectClose(magnitude(ph(call('BALANCED', '0,4 kV', null, null, 15)[1][0])), 400, 1e-15);
  });
});
