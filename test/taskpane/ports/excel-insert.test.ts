/**
 * The Excel adapter's Insert (the function reference's button), against Microsoft's
 * `office-addin-mock`: it checks that the active cell is empty and writes in one Excel.run,
 * at most two context.sync() round trips, and never writes over a cell that holds anything
 * (a constant, a formula, or part of a spilled result).
 */
import { OfficeMockObject } from 'office-addin-mock';
import { afterEach, describe, expect, it } from 'vitest';
import { excelPort } from '../../../src/taskpane/ports/excel';

function install(formula: unknown, value: unknown) {
  const rec = { syncs: 0, runs: 0, written: undefined as unknown };
  const cell = new OfficeMockObject({
    address: 'Loads!C7',
    formulas: [[formula]],
    values: [[value]],
    worksheet: { name: 'Loads' },
  }) as any;
  const mock = new OfficeMockObject({
    context: { workbook: {} },
    run: async function (callback: (context: unknown) => Promise<unknown>) {
      rec.runs++;
      return callback(this.context);
    },
  }) as any;
  const sync = mock.context.sync.bind(mock.context);
  mock.context.sync = async () => {
    rec.syncs++;
    await cell.sync();
    return sync();
  };
  mock.context.workbook.getActiveCell = () =>
    new Proxy(cell, {
      set(o, p, v) {
        // the mock's own load sets properties too; a write by the adapter is a 2-D array
        if (p === 'formulas' && Array.isArray(v)) rec.written = v;
        o[p] = v;
        return true;
      },
    });
  (globalThis as any).Excel = mock;
  return rec;
}

describe('Excel adapter: Insert into the active cell', () => {
  afterEach(() => {
    delete (globalThis as any).Excel;
  });

  it('writes into an empty cell: one Excel.run, two context.sync() calls', async () => {
    const rec = install('', '');
    const result = await excelPort.insertIntoEmptyActiveCell('=PHZ.MAG("3+j4")');
    expect(result).toEqual({ sheet: 'Loads', address: 'C7', written: true });
    expect(rec.written).toEqual([['=PHZ.MAG("3+j4")']]);
    expect(rec.runs).toBe(1);
    expect(rec.syncs).toBe(2);
  });

  it.each([
    ['a constant', '230∠0', '230∠0'],
    ['a formula', '=B2*2', 4],
    ['part of a spilled result (a value, no formula of its own)', '', '230∠-120°'],
  ])('writes nothing over %s, in one round trip', async (_, formula, value) => {
    const rec = install(formula, value);
    const result = await excelPort.insertIntoEmptyActiveCell('=PHZ.MAG("3+j4")');
    expect(result.written).toBe(false);
    expect(rec.written).toBeUndefined();
    expect(rec.syncs).toBe(1);
  });
});
