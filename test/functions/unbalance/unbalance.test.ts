import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers';
import { specByName } from '../../../src/functions';
import { call, col, expectMessage } from '../sets/_cells';

const num = (r: unknown[][]): number => r[0][0] as number;

describe('PHZ.UNBALANCE', () => {
  it('PVUR by the IEEE Std 112 definition (phase voltage unbalance rate, from memory), applied by hand: 230, 232, 225 V → 4/229 = 1.747 %', () => {
    expectClose(num(call('UNBALANCE', col(230, 232, 225), 'PVUR')), (100 * 4) / 229);
    expectClose(num(call('UNBALANCE', col(230, 232, 225), 'pvur')), 1.7467, 1e-4);
  });
  it('details cite IEEE Std 112 for PVUR, and IEEE Std 1159 only for the sequence ratio', () => {
    const details = specByName.UNBALANCE.details ?? '';
    expect(details).toMatch(/PVUR: [^.]*IEEE Std 112/);
    expect(details).not.toMatch(/PVUR: [^.]*1159/);
    expect(details).toMatch(/IEEE Std 1159[^.]*(negative|sequence)/);
  });
  it('NEMA MG 1 example (from memory): 460, 467, 450 V → 1.96 % (LVUR)', () => {
    expectClose(num(call('UNBALANCE', col(460, 467, 450), 'LVUR')), 1.96, 1e-3);
  });
  it('normal use: VUF (default) from phasors, = |V−|/|V+|', () => {
    expectClose(num(call('UNBALANCE', col('230∠0', '230∠-120', '200∠120'))), (100 * 10) / 220);
  });
  it('ZERO from phase phasors; a three-wire (line) set has none', () => {
    expectClose(num(call('UNBALANCE', col('230∠0', '230∠-120', '200∠120'), 'ZERO')), (100 * 10) / 220);
    expect(num(call('UNBALANCE', call('LINEVOLTS', col('230∠0', '230∠-120', '200∠120'), 15), 'ZERO'))).toBe(0);
  });
  it('IEC 61000-4-30: MAG on the line-voltage magnitudes equals VUF on the line phasors', () => {
    const l = call('LINEVOLTS', col('236∠1', '228∠-118', '221∠122'), 15);
    const mags = call('SPLIT', l, 'polar').map((row) => [row[0]]);
    expectClose(num(call('UNBALANCE', mags, 'MAG')), num(call('UNBALANCE', l)), 1e-9);
  });
  it('range input: a row of numbers; phasor text for the magnitude methods', () => {
    expectClose(num(call('UNBALANCE', [[460, 467, 450]], 'LVUR')), 900 / 459);
    expectClose(num(call('UNBALANCE', col('460∠0', '467∠-120', '450∠120'), 'LVUR')), 900 / 459);
  });
  it('blank cell: an error naming it', () => {
    expectMessage(() => call('UNBALANCE', col(460, '', 450), 'LVUR'), /values, row 2 is blank/);
  });
  it('wrong type: plain numbers for VUF, an unknown method, text', () => {
    expectMessage(() => call('UNBALANCE', col(230, 232, 225)), /method VUF needs phasors/);
    expectMessage(() => call('UNBALANCE', col(230, 232, 225), 'NEMA'), /method is "NEMA", which is not one of "VUF", "ZERO", "LVUR", "PVUR", "MAG"/);
    expectMessage(() => call('UNBALANCE', col('a', 232, 225), 'LVUR'), /values, row 1/);
  });
  it('wrong count: two values', () => {
    expectMessage(() => call('UNBALANCE', col(230, 232), 'PVUR'), /values holds 2 values but needs three/);
  });
  it('domain errors: a zero positive sequence, a zero mean, a negative magnitude, no triangle', () => {
    expectMessage(() => call('UNBALANCE', col('230∠0', '230∠120', '230∠-120')), /no positive-sequence component/);
    expectMessage(() => call('UNBALANCE', col(0, 0, 0), 'LVUR'), /average magnitude of 0/);
    expectMessage(() => call('UNBALANCE', col(230, -232, 225), 'PVUR'), /values, row 2 is -232: a magnitude cannot be negative/);
    expectMessage(() => call('UNBALANCE', col(400, 100, 100), 'MAG'), /cannot form a closed triangle/);
  });
});

describe('PHZ.MOTORDERATE', () => {
  it.each([
    [2, 0.95],
    [3, 0.89],
    [4, 0.82],
    [5, 0.76],
  ])('Engineering ToolBox table of the NEMA MG 1 derating curve: %s %% → %s', (x, y) => {
    expect(num(call('MOTORDERATE', x))).toBe(y);
  });
  it('ABB power-quality note (NEMA MG 1): 3 % → about 90 % of rated load', () => {
    expectClose(num(call('MOTORDERATE', 3)), 0.9, 0.012);
  });
  it('normal use: no derating up to 1 %, interpolation between points', () => {
    expect(num(call('MOTORDERATE', 0.8))).toBe(1);
    expectClose(num(call('MOTORDERATE', 1.75)), 0.96);
  });
  it('range input and chaining: the LVUR of 460, 467, 450 V (1.96 %) → about 0.95, the NEMA MG 1 derating curve read near 2 % (from memory)', () => {
    expectClose(num(call('MOTORDERATE', call('UNBALANCE', col(460, 467, 450), 'LVUR'))), 0.95, 0.005);
  });
  it('blank cell, wrong type, wrong count', () => {
    expectMessage(() => call('MOTORDERATE', null), /unbalance_pct is blank/);
    expectMessage(() => call('MOTORDERATE', 'high'), /unbalance_pct must be a number/);
    expectMessage(() => call('MOTORDERATE', col(1, 2)), /unbalance_pct must be a number but is a range/);
  });
  it('domain errors: above 5 % is #N/A (the standard advises against operation); negative is #VALUE!', () => {
    expectMessage(() => call('MOTORDERATE', 6), /advises against operating/, 'notAvailable');
    expectMessage(() => call('MOTORDERATE', -0.5), /0 or more/);
  });
});
