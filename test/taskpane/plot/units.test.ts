/** Units for the legend from labels and unit words (symbols of SI, IEC 80000-6 / common practice). */
import { describe, expect, it } from 'vitest';
import { unitFromLabel, unitToken } from '../../../src/taskpane/plot/units';
import { a1, columnLetters, parseA1, sheetRef } from '../../../src/taskpane/a1';

describe('units', () => {
  it.each([
    ['Phase current', 'A'],
    ['Supply phase voltage', 'V'],
    ['Line voltages V12, V23, V31', 'V'],
    ['Load impedance', 'Ω'],
    ['Load admittance', 'S'],
    ['complex power', 'VA'],
    ['Reactive power Q', 'var'],
    ['Real power P', 'W'],
    ['U (kV)', 'V'],
    ['I [A]', 'A'],
    ['Current, A', 'A'],
    ["neutral: I_N, V_N'N, total S", ''],
    ['L1', ''],
  ])('%s → %s', (label, unit) => {
    expect(unitFromLabel(label)).toBe(unit);
  });

  it('reads unit words with prefixes and nothing else', () => {
    expect(['A', 'kV', '(Ω)', 'ohm', 'mA', 'MVA', 'var'].map(unitToken)).toEqual(['A', 'V', 'Ω', 'Ω', 'A', 'VA', 'var']);
    expect(['Amps', 'I = V / Z', '–', ''].map(unitToken)).toEqual([undefined, undefined, undefined, undefined]);
  });
});

describe('addresses', () => {
  it('converts between A1 and row/column and quotes sheet names for formulas', () => {
    expect([columnLetters(0), columnLetters(25), columnLetters(26), columnLetters(701)]).toEqual(['A', 'Z', 'AA', 'ZZ']);
    expect(a1(21, 1)).toBe('B22');
    expect(parseA1('$AA$10')).toEqual({ row: 9, col: 26 });
    expect(parseA1('B0')).toBeUndefined();
    expect([sheetRef('Sheet1'), sheetRef('Sub-board'), sheetRef("Bob's"), sheetRef('AB12')]).toEqual(['Sheet1', "'Sub-board'", "'Bob''s'", "'AB12'"]);
  });
});
