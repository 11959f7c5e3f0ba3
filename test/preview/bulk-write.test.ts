/**
 * A large block written into a workbook that holds little else is written by building the
 * engine again (`PhzEngine.setContents`). Whatever way a block goes in, the workbook must
 * hold and show the same: checked cell by cell against the same block written in pieces
 * small enough to go cell by cell, over a workbook with another sheet reading the block,
 * names (one scoped to a sheet), a spill the block blocks, a spill outside it, a formula
 * kept as text, a sheet whose name looks like a number, and the undo of the block.
 */
import type { RawCellContent } from 'hyperformula';
import { describe, expect, it } from 'vitest';
import { BULK_CELLS, PhzEngine } from '../../src/preview/engine';
import { Workbook } from '../../src/preview/workbook';

const ROWS = 4000;

/** Three columns of a block of rows: a phasor, a number and a formula of the row. */
function block(rows = ROWS): RawCellContent[][] {
  return Array.from({ length: rows }, (_, i) => [`${100 + (i % 37)}∠${(i * 7) % 360 - 180}`, 2 + (i % 5), `=PHZ.DIV(A${i + 1}, B${i + 1}, Digits)`]);
}

/**
 * A workbook with more around the block than a bare sheet. `reader` names the sheet that
 * reads the block; added after the others, a name that looks like a number sorts first
 * among an object's keys, so the engine's build cannot keep the order and the engine is
 * rebuilt by writing each sheet instead.
 */
function workbook(reader = 'Totals'): Workbook {
  const wb = new Workbook(
    new PhzEngine({
      sheets: {
        Data: [[null, null, null, null, 4, '=PHZ.BALANCED(230)']],
        Notes: [['kept', '=PHZ.BALANCED(E1)'], [], [], [], [], [null, 'blocker']],
      },
    }),
  );
  wb.addSheet(reader);
  wb.setBlock(reader, 0, 0, [['=PHZ.MAG(Data!C1)', '=SUM(Data!B1:B4000)', `='${'x'.repeat(10)}`]]);
  wb.engine.hf.addNamedExpression('Digits', '=Data!$E$1');
  wb.engine.hf.addNamedExpression('Local', '=Notes!$A$1', wb.sheetId('Notes'));
  wb.setCell('Notes', 0, 4, 3);
  wb.setCell('Notes', 1, 2, '=Local&"!"');
  wb.setCell('Notes', 2, 2, `=${'1+'.repeat(300)}1`);
  return wb;
}

/** Every cell of every sheet, as typed and as shown. */
function everything(wb: Workbook): unknown {
  return wb.sheetNames().map((name) => {
    const { height, width } = wb.used(name);
    const id = wb.sheetId(name);
    const cells: unknown[] = [];
    for (let r = 0; r < height; r++) for (let c = 0; c < width; c++) cells.push([r, c, wb.raw(name, r, c), wb.engine.display({ sheet: id, row: r, col: c })]);
    return { name, cells, names: wb.sheetNamesDefined(name) };
  });
}

/** Writes `rows` at `top`,`left` in pieces below the bulk size (always cell by cell). */
function inPieces(wb: Workbook, sheet: string, top: number, left: number, rows: RawCellContent[][]): void {
  const per = Math.floor((BULK_CELLS - 1) / (rows[0]?.length ?? 1));
  for (let r = 0; r < rows.length; r += per) wb.engine.setContents(wb.address(sheet, top + r, left), rows.slice(r, r + per));
}

describe('a large block written by building the engine again', () => {
  it.each(['Totals', '2024'])('gives the same workbook as writing the block in small pieces (another sheet named %s)', (reader) => {
    const bulk = workbook(reader);
    const pieces = workbook(reader);
    const before = bulk.hf;
    bulk.setBlock('Data', 0, 0, block(), 'Paste');
    inPieces(pieces, 'Data', 0, 0, block());
    expect(bulk.hf, 'the block went in by a build').not.toBe(before);
    expect(bulk.sheetNames()).toEqual(['Data', 'Notes', reader]);
    expect(everything(bulk)).toEqual(everything(pieces));
    // the other sheet reads the block: PHZ.MAG of C1 and the sum of B (2+3+4+5+6 repeating: 20 per 5 rows)
    expect(bulk.engine.display({ sheet: bulk.sheetId(reader), row: 0, col: 1 })).toBe((ROWS / 5) * 20);
    expect(bulk.engine.display({ sheet: bulk.sheetId('Notes'), row: 1, col: 2 })).toBe('kept!');
  });

  it('over a spill area and beside one: blocked and free as when written cell by cell', () => {
    const bulk = workbook();
    const pieces = workbook();
    // column B of Notes: the spill of PHZ.BALANCED(E1) at B1 runs over B2:B3; B6 holds text
    const rows = Array.from({ length: 3000 }, (_, i) => [i === 1 ? 'in the way' : null, i, `=C${i + 1}+1`, `=PHZ.MAG("3+j4")*${i}`]);
    bulk.setBlock('Notes', 0, 5, rows, 'Paste');
    inPieces(pieces, 'Notes', 0, 5, rows);
    expect(everything(bulk)).toEqual(everything(pieces));
    bulk.setBlock('Notes', 1, 1, Array.from({ length: 4000 }, (_, i) => [i === 0 ? 'in the way' : null, null, null]), 'Paste');
    inPieces(pieces, 'Notes', 1, 1, Array.from({ length: 4000 }, (_, i) => [i === 0 ? 'in the way' : null, null, null]));
    expect(bulk.engine.display({ sheet: bulk.sheetId('Notes'), row: 0, col: 1 })).toMatchObject({ error: '#SPILL!' });
    expect(everything(bulk)).toEqual(everything(pieces));
  });

  it('undoes and redoes the block as one step, the rest of the workbook untouched', () => {
    const wb = workbook();
    const untouched = everything(workbook());
    wb.setBlock('Data', 0, 0, block(), 'Paste');
    const pasted = everything(wb);
    expect(wb.undo()).toBe('Paste');
    expect(everything(wb)).toEqual(untouched);
    expect(wb.redo()).toBe('Paste');
    expect(everything(wb)).toEqual(pasted);
  });

  it('goes cell by cell for a small block, and for a large one where the workbook holds much more', () => {
    const wb = workbook();
    let hf = wb.hf;
    wb.setBlock('Data', 0, 0, block(10), 'Paste');
    expect(wb.hf).toBe(hf);
    const big = new Workbook(new PhzEngine({ sheets: { Big: block(ROWS * 2), Other: [[null, null, null, null, 5]] } }));
    big.engine.hf.addNamedExpression('Digits', '=Other!$E$1');
    hf = big.hf;
    big.setBlock('Other', 0, 0, block(ROWS), 'Paste');
    expect(big.hf, 'the rest holds more filled cells than half the block').toBe(hf);
    const shown = big.engine.display({ sheet: big.sheetId('Other'), row: ROWS - 1, col: 2 });
    expect(typeof shown === 'string' && shown.includes('∠')).toBe(true);
    expect(shown).toBe(big.engine.display({ sheet: big.sheetId('Big'), row: ROWS - 1, col: 2 }));
  });
});
