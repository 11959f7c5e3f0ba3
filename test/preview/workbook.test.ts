/** The preview workbook model: edits, clearing, copy with moved references, sheets, undo and redo. */
import { describe, expect, it } from 'vitest';
import { a1, columnName, parseA1, parseRectA1, rectA1 } from '../../src/preview/address';
import { PhzEngine } from '../../src/preview/engine';
import { displayText, formatNumber, isPhasorText } from '../../src/preview/format';
import { UNDO_LIMIT, Workbook } from '../../src/preview/workbook';
import { workbookMessages } from '../../src/core/messages';

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

describe('workbook: blocks, limits and documents', () => {
  it('pastes, clears, undoes and redoes a block as one engine write each', () => {
    const { wb, engine } = book();
    const writes: number[] = [];
    const original = engine.setContents.bind(engine);
    engine.setContents = (at, rows) => {
      writes.push(rows.length);
      original(at, rows);
    };
    const rows = Array.from({ length: 5000 }, (_, i) => [`${i}+j1`, `=PHZ.MAG(D${i + 10})`]);
    wb.setBlock('S', 9, 3, rows, 'Paste');
    wb.clear('S', { top: 9, left: 3, bottom: 5008, right: 4 });
    expect(wb.undo()).toBe('Clear');
    expect(wb.undo()).toBe('Paste');
    expect(wb.redo()).toBe('Paste');
    expect(writes).toEqual([5000, 5000, 5000, 5000, 5000]);
    expect(engine.display({ sheet: 0, row: 5008, col: 4 })).toBeCloseTo(Math.hypot(4999, 1), 9);
  });

  it('clears only the used part of a whole-sheet selection', () => {
    const { wb, at } = book();
    wb.clear('S', { top: 0, left: 0, bottom: 1_048_575, right: 16_383 });
    expect(at(0, 0)).toBe(null);
    expect(at(2, 1)).toBe(null);
    wb.undo();
    expect(at(0, 1)).toBe(5);
  });

  it('refuses a block that would run off the sheet, writing nothing', () => {
    const { wb, at } = book();
    expect(() => wb.setBlock('S', 1_048_575, 0, [['a'], ['b']])).toThrow(/a sheet ends at row 1,048,576 and column XFD/);
    expect(wb.canUndo()).toBe(false);
    expect(at(0, 0)).toBe('3+j4');
  });

  it('says when the undo history lets its oldest step go', () => {
    const { wb } = book();
    const notices: string[] = [];
    wb.onNotice((m) => notices.push(m));
    for (let i = 0; i < UNDO_LIMIT; i++) wb.setCell('S', 5, 0, i);
    expect(notices).toEqual([]);
    wb.setCell('S', 5, 0, 'one more');
    expect(notices).toEqual([workbookMessages.undoDropped(UNDO_LIMIT)]);
    let undone = 0;
    while (wb.undo()) undone++;
    expect(undone).toBe(UNDO_LIMIT);
  });

  it('inserts only into an empty cell', () => {
    const { wb } = book();
    expect(wb.setCellIfEmpty('S', 0, 0, '=1')).toEqual({ written: false, held: '3+j4' });
    expect(wb.setCellIfEmpty('S', 3, 2, '=1')).toEqual({ written: false, held: 'part of a spilled result' });
    expect(wb.setCellIfEmpty('S', 7, 7, '=1+1')).toEqual({ written: true, held: '' });
    expect(wb.raw('S', 7, 7)).toBe('=1+1');
  });

  it('replaces the whole workbook by a document as one undoable step', () => {
    const { wb } = book();
    const other = new Workbook(new PhzEngine({ sheets: { Other: [['=PHZ.MAG("6+j8")']] } }));
    other.setColumnWidth('Other', 0, 20);
    wb.replaceWith(other.toDocument(), 'Open other.xlsx');
    expect(wb.sheetNames()).toEqual(['Other']);
    expect(wb.engine.display({ sheet: wb.sheetId('Other'), row: 0, col: 0 })).toBe(10);
    expect(wb.columnWidths('Other')).toEqual([20]);
    expect(wb.undo()).toBe('Open other.xlsx');
    expect(wb.sheetNames()).toEqual(['S']);
    expect(wb.raw('S', 2, 1)).toBe('=PHZ.SPLIT(A1:A2)');
  });

  it('uses a snapshot taken earlier for the undo step only while nothing changed since', () => {
    const other = new Workbook(new PhzEngine({ sheets: { Other: [[1]] } })).toDocument();
    const { wb } = book();
    const taken = wb.snapshot();
    wb.replaceWith(other, 'Open other.xlsx', taken);
    wb.undo();
    expect(wb.toDocument()).toEqual(taken.doc);
    // an edit after the snapshot: the undo step is taken again, the edit in it
    const stale = wb.snapshot();
    wb.setCell('S', 5, 0, 'typed while the file was read');
    wb.replaceWith(other, 'Open other.xlsx', stale);
    wb.undo();
    expect(wb.raw('S', 5, 0)).toBe('typed while the file was read');
    // a role set after the snapshot counts as a change too
    const beforeStyle = wb.snapshot();
    wb.setStyle('S', 0, 0, 'input');
    wb.replaceWith(other, 'Open other.xlsx', beforeStyle);
    wb.undo();
    expect(wb.styleOf('S', 0, 0)).toBe('input');
  });

  it('sets a column width as an undoable step', () => {
    const { wb } = book();
    wb.setColumnWidth('S', 2, 18.5);
    expect(wb.columnWidths('S')).toEqual([0, 0, 18.5]);
    expect(wb.undo()).toBe('Column width');
    expect(wb.columnWidths('S')).toEqual([0, 0, 0]);
  });
});
