import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg } from '../../../src/core/phasor';
import { expectClose, expectPhasorClose } from '../../helpers';
import { call, col, expectMessage, ph, phs } from '../sets/_cells';

describe('PHZ.CURRENT', () => {
  it('normal use: 230 V across 8 + j6 Ω → 23 A at −36.87° (3-4-5 triangle, common practice)', () => {
    const i = ph(call('CURRENT', '230∠0', '8+j6', 15)[0][0]);
    expectClose(magnitude(i), 23);
    expectClose(angleDeg(i), -Math.atan2(3, 4) * (180 / Math.PI));
  });
  it('range input: three phase voltages over one impedance (broadcast), and pairs', () => {
    const r = phs(call('CURRENT', col('230∠0', '230∠-120', '230∠120'), '46', 15));
    expectPhasorClose(r[1], polarDeg(5, -120));
    expectPhasorClose(ph(call('CURRENT', [[230, 0]], [[8, 6]], 15)[0][0]), rect(230).div(rect(8, 6)));
  });
  it('blank cell: an error naming the cell', () => {
    expectMessage(() => call('CURRENT', col('230∠0', ''), '10'), /voltage, row 2 is blank/);
  });
  it('wrong type: a voltage given where an impedance belongs (unit check) and plain text', () => {
    expectMessage(() => call('CURRENT', '230∠0', '10 V'), /impedance/);
    expectMessage(() => call('CURRENT', 'ten', '10'), /voltage/);
  });
  it('wrong count: 3 voltages and 2 impedances', () => {
    expectMessage(() => call('CURRENT', col(1, 2, 3), col(1, 2)), /different numbers of values/);
  });
  it('domain error: a 0 Ω impedance', () => {
    expectMessage(() => call('CURRENT', col('230∠0', '230∠-120'), col('5', '0')), /impedance, row 2 is 0 Ω: a short circuit/);
  });
});

describe('PHZ.COMPLEXPOWER', () => {
  it('normal use: 8 kW at pf 0.8 lagging → 8000 + j6000 VA (3-4-5 power triangle, common practice)', () => {
    expectPhasorClose(ph(call('COMPLEXPOWER', 8000, 0.8, null, 15)[0][0]), rect(8000, 6000), 1e-12);
  });
  it('leading TRUE gives negative Q; pf 1 gives no Q', () => {
    expectPhasorClose(ph(call('COMPLEXPOWER', 8000, 0.8, true, 15)[0][0]), rect(8000, -6000), 1e-12);
    expect(ph(call('COMPLEXPOWER', 5000, 1)[0][0]).im).toBe(0);
  });
  it('range input: columns of P and pf from a panel schedule', () => {
    const r = phs(call('COMPLEXPOWER', col(1000, 2000, 3000), col(1, 0.6, 0.8), false, 15));
    expectPhasorClose(r[1], rect(2000, (2000 * 0.8) / 0.6), 1e-12);
    expectPhasorClose(r[2], rect(3000, 2250), 1e-12);
  });
  it('blank cell and wrong type', () => {
    expectMessage(() => call('COMPLEXPOWER', col(1000, null), 0.9), /real_power, row 2 is blank/);
    expectMessage(() => call('COMPLEXPOWER', 1000, 'high'), /power_factor must be a number/);
    expectMessage(() => call('COMPLEXPOWER', 1000, 0.9, 'maybe'), /leading must be TRUE or FALSE/);
  });
  it('wrong count: 3 powers and 2 power factors', () => {
    expectMessage(() => call('COMPLEXPOWER', col(1, 2, 3), col(0.9, 0.8)), /different numbers of values/);
  });
  it.each([0, -0.5, 1.01])('domain error: power factor %s is outside (0, 1]', (pf) => {
    expectMessage(() => call('COMPLEXPOWER', 1000, pf), /power factor must be above 0 and at most 1/);
  });
});

describe('PHZ.LOADCURRENT', () => {
  it('normal use: (S/V)* — 8000 + j6000 VA at 230 V → 43.48 A lagging 36.87°', () => {
    const i = ph(call('LOADCURRENT', '230∠0', '8000+j6000', 15)[0][0]);
    expectClose(magnitude(i), 10000 / 230);
    expectClose(angleDeg(i), -Math.atan2(6000, 8000) * (180 / Math.PI));
  });
  it('range input: three phases of one power', () => {
    const r = phs(call('LOADCURRENT', col('230∠0', '230∠-120', '230∠120'), '4600', 15));
    expectPhasorClose(r[2], polarDeg(20, 120));
  });
  it('round trip with POWER: POWER(V, LOADCURRENT(V, S)) = S', () => {
    const s = rect(3100, -1200);
    const i = call('LOADCURRENT', '231∠-118', '3100-j1200', 15);
    expectPhasorClose(ph(call('VIPOWER', '231∠-118', i, 15)[0][0]), s, 1e-12);
  });
  it('blank cell, wrong type, wrong count', () => {
    expectMessage(() => call('LOADCURRENT', '', '1000'), /voltage is blank/);
    expectMessage(() => call('LOADCURRENT', '230', '5 Ω'), /power/);
    expectMessage(() => call('LOADCURRENT', col(1, 2), col(1, 2, 3)), /different numbers of values/);
  });
  it('domain error: zero voltage', () => {
    expectMessage(() => call('LOADCURRENT', 0, '1000'), /voltage is 0 V/);
  });
});

describe('PHZ.VIPOWER', () => {
  it('normal use: 230∠0 V and 10∠−36.87° A → 1840 + j1380 VA (positive Q: inductive)', () => {
    expectPhasorClose(ph(call('VIPOWER', '230∠0', '10∠-36.86989764584402', 15)[0][0]), rect(1840, 1380), 1e-12);
  });
  it('range input: per phase', () => {
    const r = phs(call('VIPOWER', col('230∠0', '230∠-120'), col('10∠0', '10∠-150'), 15));
    expectPhasorClose(r[1], polarDeg(2300, 30));
  });
  it('blank cell, wrong type, wrong count', () => {
    expectMessage(() => call('VIPOWER', col('230', null), col(1, 2)), /voltage, row 2 is blank/);
    expectMessage(() => call('VIPOWER', '230', true), /TRUE\/FALSE/);
    expectMessage(() => call('VIPOWER', col(1, 2), col(1, 2, 3)), /different numbers of values/);
  });
  it('domain: zero current gives zero power, shown as 0', () => {
    expect(call('VIPOWER', '230∠0', 0)).toEqual([['0']]);
  });
});

describe('PHZ.POWERFACTOR', () => {
  it('normal use: 8000 + j6000 VA → 0.8', () => {
    expect(call('POWERFACTOR', '8000+j6000')).toEqual([[0.8]]);
  });
  it('range input: a column, and the COMPLEXPOWER round trip', () => {
    const r = call('POWERFACTOR', col('3+j4', 5, '-4+j3'));
    expectClose(r[0][0] as number, 0.6);
    expectClose(r[1][0] as number, 1);
    expectClose(r[2][0] as number, -0.8);
    expectClose(call('POWERFACTOR', call('COMPLEXPOWER', 1234, 0.73, true, 15))[0][0] as number, 0.73, 1e-12);
  });
  it('blank cell and wrong type', () => {
    expectMessage(() => call('POWERFACTOR', col('3+j4', '')), /power, row 2 is blank/);
    expectMessage(() => call('POWERFACTOR', '5 A'), /power/);
  });
  it('wrong count: too many arguments', () => {
    expectMessage(() => call('POWERFACTOR', '3+j4', 6), /takes at most 1 argument/);
  });
  it('domain error: zero power has no power factor', () => {
    expectMessage(() => call('POWERFACTOR', 0), /power is 0 VA/);
  });
});

describe('loads — Alexander & Sadiku, Fundamentals of Electric Circuits, Examples 11.11 and 11.13 (from memory)', () => {
  // Ex. 11.11: v = 60 cos(ωt − 10°) V, i = 1.5 cos(ωt + 50°) A → S = 45∠−60° VA, P = 22.5 W, Q = −38.97 var,
  // pf = 0.5 leading, Z = 40∠−60° Ω. Phasors here are rms: 60/√2 V and 1.5/√2 A.
  const v = `${60 / Math.SQRT2}∠-10`;
  const i = `${1.5 / Math.SQRT2}∠50`;
  it('Ex. 11.11 (a, b): POWER gives S = 45∠−60° VA, P = 22.5 W, Q = −38.97 var', () => {
    const s = ph(call('VIPOWER', v, i, 15)[0][0]);
    expectPhasorClose(s, polarDeg(45, -60), 1e-12);
    expectClose(s.re, 22.5, 1e-12);
    expectClose(s.im, -38.97, 1e-4);
  });
  it('Ex. 11.11 (c): PF gives 0.5 and CURRENT through Z = 40∠−60° Ω gives back the current', () => {
    expectClose(call('POWERFACTOR', call('VIPOWER', v, i, 15))[0][0] as number, 0.5, 1e-12);
    expectPhasorClose(ph(call('CURRENT', v, '40∠-60', 15)[0][0]), polarDeg(1.5 / Math.SQRT2, 50), 1e-12);
  });
  it('Ex. 11.11: LOADCURRENT of S = 45∠−60° VA at v gives the current', () => {
    expectPhasorClose(ph(call('LOADCURRENT', v, '45∠-60', 15)[0][0]), polarDeg(1.5 / Math.SQRT2, 50), 1e-12);
  });
  it('Ex. 11.13: 12 kVA at pf 0.856 lagging from 120 V — P = 10.272 kW, Q = 6.204 kvar, I = 100 A rms, Z = 1.2∠31.13° Ω', () => {
    const s = ph(call('COMPLEXPOWER', 12000 * 0.856, 0.856, null, 15)[0][0]);
    expectClose(magnitude(s), 12000, 1e-12);
    expectClose(s.im, 6204, 1e-3);
    const cur = ph(call('LOADCURRENT', 120, call('COMPLEXPOWER', 12000 * 0.856, 0.856, null, 15), 15)[0][0]);
    expectClose(magnitude(cur), 100, 1e-12);
    expectClose(-angleDeg(cur), 31.13, 1e-3);
  });
});
