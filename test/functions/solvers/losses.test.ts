/**
 * PHZ.STARLOSSES and PHZ.DELTALOSSES: the checklist, and every cell against the mathjs nodal
 * references of test/core/threephase/reference.ts (a different formulation from the solvers),
 * with the power balance source = loads + losses.
 */
import { describe, expect, it } from 'vitest';
import { magnitude, polarDeg, rect, type Phasor } from '../../../src/core/phasor';
import { specByName } from '../../../src/functions';
import { expectClose, expectPhasorClose } from '../../helpers';
import { call, col, expectMessage, ph } from '../sets/_cells';
import { referenceDelta, referenceStar } from '../../core/threephase/reference';

const E = col('230∠0', '230∠-120', '230∠120');
const EP = [polarDeg(230, 0), polarDeg(230, -120), polarDeg(230, 120)];
const sum = (zs: Phasor[]): Phasor => zs.reduce((a, b) => a.add(b), rect(0));

describe('PHZ.STARLOSSES', () => {
  it('normal use and the mathjs nodal reference: line losses |I|²·ZL, source power E·I*, neutral loss |I_N|²·Z_N, drops at the loads', () => {
    const z = [rect(9.6, 4.1), rect(14.5, -2.2), rect(21, 6.5)];
    const zl = [rect(0.18, 0.07), rect(0.21, 0.06), rect(0.16, 0.08)];
    const zn = rect(0.35, 0.05);
    const ref = referenceStar(EP, z, zl, zn);
    const t = call('STARLOSSES', E, col('9.6+j4.1', '14.5-j2.2', '21+j6.5'), '0.35+j0.05', col('0.18+j0.07', '0.21+j0.06', '0.16+j0.08'), null, 15);
    expect(t.length).toBe(4);
    const i = ref.currents.map((c) => rect(c.re, c.im));
    for (let k = 0; k < 3; k++) {
      expectPhasorClose(ph(t[k][0]), zl[k].mul(magnitude(i[k]) ** 2), 1e-11);
      expectPhasorClose(ph(t[k][1]), EP[k].mul(i[k].conjugate()), 1e-11);
      expectClose(t[k][2] as number, (100 * (230 - Math.hypot(ref.loadVoltages[k].re, ref.loadVoltages[k].im))) / 230, 1e-9);
    }
    const iN = rect(ref.neutralCurrent.re, ref.neutralCurrent.im);
    expectPhasorClose(ph(t[3][0]), zn.mul(magnitude(iN) ** 2), 1e-10);
    const source = sum([0, 1, 2].map((k) => EP[k].mul(i[k].conjugate())));
    expectPhasorClose(ph(t[3][1]), source, 1e-11);
    expectClose(t[3][2] as number, Math.max(t[0][2] as number, t[1][2] as number, t[2][2] as number), 0);
    // power balance: source = STARLOAD's load power + line and neutral losses (the first column)
    const load = ph(call('STARLOAD', E, col('9.6+j4.1', '14.5-j2.2', '21+j6.5'), '0.35+j0.05', col('0.18+j0.07', '0.21+j0.06', '0.16+j0.08'), null, 15)[3][2]);
    const losses = sum(t.map((r) => ph(r[0])));
    expectPhasorClose(load.add(losses), ph(t[3][1]), 1e-12);
  });

  it('a lost neutral: no neutral loss, and the lightly loaded phases see a rise (negative drop)', () => {
    const t = call('STARLOSSES', E, col('10', '40', '40'), 'open', '0.1', null, 15);
    expect(t[3][0]).toBe('0');
    expect(t[1][2] as number).toBeLessThan(0);
    expect(t[2][2] as number).toBeLessThan(0);
    expect(t[0][2] as number).toBeGreaterThan(0);
  });

  it('range input: one line impedance for all, or three; impedances as real/imaginary pairs', () => {
    const a = call('STARLOSSES', E, [[10, 2], [12, 0], [8, -1]], 0, '0.2+j0.1', null, 15);
    const b = call('STARLOSSES', E, col('10+j2', '12', '8-j1'), 0, col('0.2+j0.1', '0.2+j0.1', '0.2+j0.1'), null, 15);
    expect(a).toEqual(b);
    expect(a[3][0]).toBe('0');
  });

  it('labels TRUE adds a header row and a label column', () => {
    const t = call('STARLOSSES', E, col(23, 46, 23), null, '0.1', true);
    expect(t[0]).toEqual(['', 'loss (VA)', 'source power (VA)', 'drop at load (%)']);
    expect(t.map((r) => r[0])).toEqual(['', 'line 1', 'line 2', 'line 3', 'neutral loss; total source power; largest drop']);
  });

  it('blank cell, wrong type, wrong count and domain errors are STARLOAD’s; a 0 V phase cannot give a drop in percent', () => {
    expectMessage(() => call('STARLOSSES', col('230∠0', '', '230∠120'), col(1, 2, 3)), /phase_voltages, row 2 is blank/);
    expectMessage(() => call('STARLOSSES', E, col('abc', 2, 3)), /impedances, row 1/);
    expectMessage(() => call('STARLOSSES', E, col(1, 2)), /impedances holds 2 values/);
    expectMessage(() => call('STARLOSSES', E, col(0, 2, 3)), /short-circuited/);
    expectMessage(() => call('STARLOSSES', col('230∠0', 0, '230∠120'), col(10, 20, 30)), /phase_voltages: E2 is 0 V, so the drop at its load in percent is undefined/);
  });
});

describe('PHZ.DELTALOSSES', () => {
  const V = col('400∠30', '400∠-90', '400∠150');
  const VP = [polarDeg(400, 30), polarDeg(400, -90), polarDeg(400, 150)];

  it('normal use and the mathjs nodal reference: line losses, source power through each line, drops at the branches, the power balance', () => {
    const z = [rect(38, 12), rect(52, 0), rect(45, -9)];
    const zl = [rect(0.3, 0.1), rect(0.25, 0.08), rect(0.35, 0.12)];
    const ref = referenceDelta(VP, z, zl);
    const t = call('DELTALOSSES', V, col('38+j12', '52', '45-j9'), col('0.3+j0.1', '0.25+j0.08', '0.35+j0.12'), null, 15);
    const il = ref.lineCurrents.map((c) => rect(c.re, c.im));
    const ib = ref.branchCurrents.map((c) => rect(c.re, c.im));
    for (let k = 0; k < 3; k++) {
      expectPhasorClose(ph(t[k][0]), zl[k].mul(magnitude(il[k]) ** 2), 1e-10);
      expectClose(t[k][2] as number, (100 * (400 - magnitude(z[k].mul(ib[k])))) / 400, 1e-9);
    }
    expect(t[3][0]).toBe('0');
    // the supply's power does not depend on the star reference: Σ V·I* of the branches + the line losses
    const branches = sum([0, 1, 2].map((k) => z[k].mul(ib[k]).mul(ib[k].conjugate())));
    const lineLoss = sum([0, 1, 2].map((k) => zl[k].mul(magnitude(il[k]) ** 2)));
    expectPhasorClose(ph(t[3][1]), branches.add(lineLoss), 1e-11);
    expectPhasorClose(sum([0, 1, 2].map((k) => ph(t[k][1]))), ph(t[3][1]), 1e-12);
  });

  it('without line impedances: no loss and no drop', () => {
    const t = call('DELTALOSSES', V, col(40, 80, 40));
    expect(t.map((r) => r[0])).toEqual(['0', '0', '0', '0']);
    expect(t.map((r) => r[2])).toEqual([0, 0, 0, 0]);
    expectPhasorClose(ph(t[3][1]), rect(4000 + 2000 + 4000), 1e-6);
  });

  it('labels TRUE; errors as DELTALOAD’s', () => {
    expect(call('DELTALOSSES', V, 40, '0.5', true)[0]).toEqual(['', 'loss (VA)', 'source power (VA)', 'drop at branch (%)']);
    expectMessage(() => call('DELTALOSSES', col('400∠30', '400∠-90'), 40), /line_voltages holds 2 values/);
    expectMessage(() => call('DELTALOSSES', col('400∠30', '400∠-90', '300∠150'), 40), /does not close/);
    expectMessage(() => call('DELTALOSSES', V, col('open', 'open', 'open')), /all three branch impedances are "open"/);
  });

  it('details name the reference of the per-line source powers', () => {
    expect(specByName.DELTALOSSES.details).toMatch(/no zero sequence/);
    expect(specByName.STARLOSSES.details).toMatch(/PHZ.ADD of the first column is the total loss/);
  });
});
