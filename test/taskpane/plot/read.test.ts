/**
 * Reading a selection for the plot: every shape the functions accept, labels from the
 * selection itself, scales per column or row, units from labels and unit words, and the
 * cells that cannot be read listed with the parser's own message (blanks skipped).
 * Phasor values are checked against mathjs's own complex parsing and polar constructor
 * (an independent library), never against our parser.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { readSelection } from '../../../src/taskpane/plot/read';
import type { SelectionBlock, SelectionCell } from '../../../src/taskpane/plot/model';
import { functions } from '../../../src/functions';
import { expectPhasorClose } from '../../helpers';

function block(values: SelectionCell[][], top = 0, left = 0, sheet = 'Sheet1'): SelectionBlock {
  const rows = values.length;
  const cols = values[0]?.length ?? 0;
  const a1 = (r: number, c: number) => `${String.fromCharCode(65 + c)}${r + 1}`;
  return { sheet, top, left, values, selected: rows === 0 ? a1(top, left) : `${a1(top, left)}:${a1(top + rows - 1, left + cols - 1)}`, cellCount: rows * cols };
}

/** mathjs's phasor of magnitude∠degrees (independent of our parser). */
function mjPolar(m: number, deg: number): { re: number; im: number } {
  const z = math.complex({ r: m, phi: (deg * Math.PI) / 180 });
  return { re: z.re, im: z.im };
}

describe('readSelection: shapes', () => {
  it('reads text in every notation and numbers in one column, addresses as labels', () => {
    const d = readSelection(block([['230∠-120'], ['7+j5'], ['7 - j 5'], ['230e^(j30)'], [12.5], ['1∠0.5rad'], ['7,5+j2,25']], 4, 1));
    expect(d.groups).toHaveLength(1);
    expect(d.phasors.map((p) => p.label)).toEqual(['B5', 'B6', 'B7', 'B8', 'B9', 'B10', 'B11']);
    expectPhasorClose(d.phasors[0], mjPolar(230, -120));
    expectPhasorClose(d.phasors[1], math.complex('7+5i'));
    expectPhasorClose(d.phasors[2], math.complex('7-5i'));
    expectPhasorClose(d.phasors[3], mjPolar(230, 30));
    expectPhasorClose(d.phasors[4], { re: 12.5, im: 0 });
    expectPhasorClose(d.phasors[5], math.complex({ r: 1, phi: 0.5 }));
    expectPhasorClose(d.phasors[6], math.complex('7.5+2.25i'));
    expect(d.unreadable).toEqual([]);
  });

  it('skips blanks and lists unreadable cells with the parser message, in the order of the sheet', () => {
    const d = readSelection(block([['230∠0'], [null], ['  '], ['abc'], [true], [{ error: '#DIV/0!' }], ['5∠30']], 0, 2));
    expect(d.phasors.map((p) => p.cell)).toEqual(['C1', 'C7']);
    expect(d.unreadable.map((u) => u.cell)).toEqual(['C4', 'C5', 'C6']);
    expect(d.unreadable[0].message).toMatch(/^C4: cannot read "abc" as a phasor/);
    expect(d.unreadable[1].message).toMatch(/C5 is TRUE\/FALSE, not a phasor/);
    expect(d.unreadable[2].message).toMatch(/C6 holds the error #DIV\/0!: fix the cell it comes from first/);
  });

  it('reads two numeric columns as (real, imaginary) pairs, one phasor per row, with the row labels', () => {
    const d = readSelection(block([['Phase currents', 'Re', 'Im'], ['I1', 24.54, -9.28], ['I2', -14.61, -11.24], ['I3', null, null], ['I4', 3, null]], 0, 0));
    expect(d.groups).toEqual([{ name: 'Phase currents', unit: 'A' }]);
    expect(d.phasors.map((p) => [p.label, p.cell])).toEqual([
      ['I1', 'B2:C2'],
      ['I2', 'B3:C3'],
    ]);
    expectPhasorClose(d.phasors[1], math.complex(-14.61, -11.24));
    expect(d.unreadable).toEqual([{ cell: 'B5:C5', message: expect.stringMatching(/B5:C5 has one part of a real\/imaginary pair/) }]);
  });

  it('reads a spilled set as the function returns it', () => {
    const set = functions.BALANCED([[400]], null, null) as string[][];
    const d = readSelection(block(set, 9, 3));
    expect(d.phasors.map((p) => p.cell)).toEqual(['D10', 'D11', 'D12']);
    // the positive-sequence set 0°, −120°, +120° (DESIGN §4 conventions), built with mathjs
    [0, -120, 120].forEach((deg, i) => expectPhasorClose(d.phasors[i], mjPolar(400, deg), 1e-5));
  });

  it('reads a labelled STARLOAD table: header row and label column give the labels, one scale per column with its unit', () => {
    const table = functions.STARLOAD([['230∠0'], ['230∠-120'], ['230∠120']], [['23'], ['46'], ['23']], null, null, true, null) as string[][];
    const d = readSelection(block(table, 40, 0));
    expect(d.scaleMode).toBe('columns');
    expect(d.groups).toEqual([
      { name: 'current', unit: 'A' },
      { name: 'voltage', unit: 'V' },
      { name: 'complex power', unit: 'VA' },
    ]);
    expect(d.phasors.filter((p) => p.group === 0).map((p) => p.label)).toEqual(['phase 1 (A)', 'phase 2 (A)', 'phase 3 (A)', "neutral: I_N, V_N'N, total S (A)"]);
    // Row 1 of the documented example: 10∠0° A through 23 Ω at 230∠0° V; the neutral row 5∠60° A
    expectPhasorClose(d.phasors[0], mjPolar(10, 0), 1e-5);
    expectPhasorClose(d.phasors[3], mjPolar(5, 60), 1e-5);
    expect(d.phasors[3].cell).toBe('B45');
    expect(d.unreadable).toEqual([]);
  });

  it('reads a labelled DELTALOAD table the same way', () => {
    const table = functions.DELTALOAD([['400∠0'], ['400∠-120'], ['400∠120']], [['40'], ['80'], ['40']], null, true, null) as string[][];
    const d = readSelection(block(table));
    expect(d.groups.map((g) => [g.name, g.unit])).toEqual([
      ['line current', 'A'],
      ['branch current', 'A'],
      ['branch voltage', 'V'],
      ['branch power', 'VA'],
    ]);
    expect(d.phasors).toHaveLength(12);
    // I12 = V12/Z12 = 400∠0/40 = 10∠0 A (Ohm's law), checked with mathjs
    expectPhasorClose(d.phasors[3], math.divide(math.complex(400, 0), math.complex(40, 0)) as math.Complex, 1e-5);
  });
});

describe('readSelection: labels, scales and units', () => {
  it('a row of phases under a header, with the quantity as the row label, is one group named by its label', () => {
    const d = readSelection(block([['Per phase', 'L1', 'L2', 'L3'], ['Phase current', '26.2∠-20.7', '18.4∠-142.4', '14.7∠123.1']], 20, 0, 'Sub-board'));
    expect(d.source).toBe('Sub-board!A21:D22');
    expect(d.groups).toEqual([{ name: 'Phase current', unit: 'A' }]);
    expect(d.phasors.map((p) => [p.label, p.cell])).toEqual([
      ['L1', 'B22'],
      ['L2', 'C22'],
      ['L3', 'D22'],
    ]);
  });

  it('rows of quantities with a unit column: one scale per row, units from the column, labels marked by unit', () => {
    const d = readSelection(block([['Supply phase voltage', '230∠0', '227∠-121.5', '233∠118.8', 'V'], ['Phase current', '26∠-21', '18∠-142', '15∠123', 'A']], 5, 0));
    expect(d.scaleMode).toBe('rows');
    expect(d.groups).toEqual([
      { name: 'Supply phase voltage', unit: 'V' },
      { name: 'Phase current', unit: 'A' },
    ]);
    expect(d.phasors.map((p) => p.label)).toEqual(['B6', 'C6', 'D6', 'B7', 'C7', 'D7']);
    expect(d.unreadable).toEqual([]);
  });

  it('two columns of text phasors (voltages beside currents) get one scale each, named by the header', () => {
    const d = readSelection(block([['', 'U (kV)', 'I [A]'], ['L1', '11∠0', '120∠-30'], ['L2', '11∠-120', '118∠-150']]));
    expect(d.groups).toEqual([
      { name: 'U (kV)', unit: 'V' },
      { name: 'I [A]', unit: 'A' },
    ]);
    expect(d.phasors.map((p) => p.label)).toEqual(['L1 (V)', 'L2 (V)', 'L1 (A)', 'L2 (A)']);
    expect(d.phasors.map((p) => p.group)).toEqual([0, 0, 1, 1]);
  });

  it('a unit word in the cells names the unit and its prefix scales the value', () => {
    const d = readSelection(block([['11 kV∠0'], ['11 kV∠-120']]));
    expect(d.groups[0].unit).toBe('V');
    expectPhasorClose(d.phasors[0], { re: 11000, im: 0 });
  });

  it('labels the parser would also read as phasors (I1, j2) stay labels in a label column', () => {
    const d = readSelection(block([['I1', '5∠0'], ['I2', '5∠-120'], ['j3', '5∠120']]));
    expect(d.phasors.map((p) => p.label)).toEqual(['I1', 'I2', 'j3']);
  });

  it('the scale mode can be forced: one per row, or one for all', () => {
    const values: SelectionCell[][] = [
      ['10∠0', '20∠0'],
      ['30∠0', '40∠0'],
    ];
    expect(readSelection(block(values), 'columns').groups).toHaveLength(2);
    const rows = readSelection(block(values), 'rows');
    expect(rows.groups.map((g) => g.name)).toEqual(['Row 1', 'Row 2']);
    expect(rows.phasors.map((p) => p.group)).toEqual([0, 0, 1, 1]);
    expect(readSelection(block(values), 'one').groups).toEqual([{ name: 'All phasors', unit: '' }]);
  });

  it('an empty selection gives nothing; a lone row of text gives no phasors and lists the cells after its label', () => {
    const none = readSelection(block([]));
    expect([none.phasors, none.unreadable, none.groups]).toEqual([[], [], []]);
    const d = readSelection(block([['Per phase', 'L1', 'L2']]));
    expect(d.phasors).toEqual([]);
    expect(d.unreadable.map((u) => u.cell)).toEqual(['B1', 'C1']);
  });
});
