/** The preview workbook model: edits, clearing, copy with moved references, sheets, undo and redo. */
import { describe, expect, it } from 'vitest';
import { a1, columnName, parseA1, parseRectA1, rectA1 } from '../../src/preview/address';
import { PhzEngine } from '../../src/preview/engine';
import { displayText, formatNumber, isPhasorText } from '../../src/preview/format';
import { Workbook } from '../../src/preview/workbook';

function book() {
  const engine = new PhzEngine({ sheets: { S: [['3+j4', '=PHZ.MAG(A1)'], ['6+j8', null], [null, '=PHZ.SPLIT(A1:A2)']] } });
  return { engine, wb: new Workbook(engine), at: (row: number, col: number) => engine.display({ sheet: 0, row, col }) };
}

describe('workbook', () => {
  it('copies a formula with its relative references moved, and undo removes it', () => {
    const { wb, at } = book();
    wb.copyBlock('S', { top: 0, left: 1, bottom: 0, right: 1 }, 'S', 1, 1);
    expect(wb.raw('S', 1, 1)).toBe('=PHZ.MAG(A2)');
    expect(at(1, 1)).toBe(10);
    wb.undo();
    expect(wb.raw('S', 1, 1)).toBe(null);
  });

  it('undoes and redoes an edit, with results following', () => {
    const { wb, at } = book();
    wb.setCell('S', 0, 0, '5');
    expect(at(0, 1)).toBe(5);
    expect(at(2, 1)).toBe(5);
    expect(wb.undo()).toBe('Edit');
    expect(wb.raw('S', 0, 0)).toBe('3+j4');
    expect(at(2, 2)).toBe(4);
    expect(wb.redo()).toBe('Edit');
    expect(at(2, 2)).toBe(0);
    expect(wb.canRedo()).toBe(false);
  });

  it('clears a block without touching cells that only show a spill, and undo restores it', () => {
    const { wb, at } = book();
    wb.clear('S', { top: 2, left: 1, bottom: 3, right: 2 });
    expect(at(2, 1)).toBe(null);
    expect(at(3, 2)).toBe(null);
    wb.undo();
    expect(wb.raw('S', 2, 1)).toBe('=PHZ.SPLIT(A1:A2)');
    expect(at(3, 2)).toBe(8);
  });

  it('adds sheets with fresh names, and undo removes them', () => {
    const { wb } = book();
    expect(wb.addSheet()).toBe('Sheet2');
    expect(wb.addSheet('S')).toBe('S (2)');
    wb.undo();
    wb.undo();
    expect(wb.sheetNames()).toEqual(['S']);
    wb.redo();
    expect(wb.sheetNames()).toEqual(['S', 'Sheet2']);
  });

  it('records nothing when an edit changes nothing', () => {
    const { wb } = book();
    wb.setCell('S', 0, 0, '3+j4');
    expect(wb.canUndo()).toBe(false);
  });
});

describe('addresses', () => {
  it.each([
    [0, 'A'],
    [25, 'Z'],
    [26, 'AA'],
    [701, 'ZZ'],
    [702, 'AAA'],
  ])('column %i is %s', (col, name) => {
    expect(columnName(col)).toBe(name);
    expect(parseA1(`${name}1`)).toEqual({ row: 0, col });
  });

  it('reads and writes cells and ranges', () => {
    expect(a1({ row: 1, col: 1 })).toBe('B2');
    expect(parseA1('$C$7')).toEqual({ row: 6, col: 2 });
    expect(parseA1('B0')).toBeUndefined();
    expect(parseRectA1('C3:A1')).toEqual({ top: 0, left: 0, bottom: 2, right: 2 });
    expect(rectA1({ top: 0, left: 0, bottom: 0, right: 0 })).toBe('A1');
  });
});

describe('cell text', () => {
  it.each([
    [0.1 + 0.2, '0.3'],
    [5644.498984123, '5644.498984'],
    [-20.709, '-20.709'],
    [1e12, '1E+12'],
    [2.5e-9, '2.5E-9'],
    [0, '0'],
  ])('shows %s as %s', (n, text) => {
    expect(formatNumber(n)).toBe(text);
  });

  it('shows errors by their code and booleans in capitals', () => {
    expect(displayText({ error: '#N/A', message: 'x' })).toBe('#N/A');
    expect(displayText(true)).toBe('TRUE');
    expect(displayText(null)).toBe('');
  });

  it.each([
    ['230∠-120', true],
    ['7+j5', true],
    ['Load impedance', false],
    ['L1', false],
  ])('treats %s as a phasor input: %s', (text, yes) => {
    expect(isPhasorText(text)).toBe(yes);
  });
});

describe('workbook: a whole new sheet at once (worked sheets)', () => {
  it('adds the sheet with its cells, styles and names scoped to it, as one undoable step', () => {
    const { wb, engine } = book();
    wb.addSheetWith(
      {
        name: "Tom's sheet",
        rows: [['3+j4', '=PHZ.MAG(Z_a)'], [null, '=PHZ.MAG(A1)']],
        styles: [{ row: 0, col: 0, style: 'input' }],
        names: [{ name: 'Z_a', row: 0, col: 0 }],
        columnWidths: [12, 30],
      },
      'Write sheet',
    );
    const id = wb.sheetId("Tom's sheet");
    expect(engine.display({ sheet: id, row: 0, col: 1 })).toBe(5);
    expect(wb.styleOf("Tom's sheet", 0, 0)).toBe('input');
    expect(wb.sheetNamesDefined("Tom's sheet")).toEqual(['Z_a']);
    expect(wb.columnWidths("Tom's sheet")).toEqual([12, 30]);
    // the name is the new sheet's own: another sheet cannot use it
    wb.setCell('S', 4, 0, '=PHZ.MAG(Z_a)');
    expect(engine.display({ sheet: 0, row: 4, col: 0 })).toMatchObject({ error: '#NAME?' });
    wb.setCell("Tom's sheet", 0, 0, '6+j8');
    expect(engine.display({ sheet: id, row: 0, col: 1 })).toBe(10);
    wb.undo();
    wb.undo();
    expect(wb.undo()).toBe('Write sheet');
    expect(wb.sheetNames()).toEqual(['S']);
    expect(wb.redo()).toBe('Write sheet');
    expect(engine.display({ sheet: wb.sheetId("Tom's sheet"), row: 0, col: 1 })).toBe(5);
  });

  it('refuses a name that is taken', () => {
    const { wb } = book();
    expect(() => wb.addSheetWith({ name: 'S', rows: [] })).toThrow(/already exists/);
  });
});
