/**
 * The Excel adapter writing worked sheets, against Microsoft's `office-addin-mock`
 * (OfficeMockObject): how many context.sync() round trips, that nothing outside the new
 * sheet is written, that every name is scoped to the new sheet, and that a missing
 * requirement set is said plainly.
 */
import { OfficeMockObject } from 'office-addin-mock';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { excelPort, SHEET_REQUIREMENTS } from '../../../src/taskpane/ports/excel';
import { calculations } from '../../../src/taskpane/sheets/calculations';
import { demoValues } from '../../../src/taskpane/sheets/calculation';
import { cellA1, planGrid } from '../../../src/taskpane/sheets/plan';
import type { SheetPlan } from '../../../src/taskpane/sheets/plan';

interface Recorder {
  syncs: number;
  added: string[];
  activated: string[];
  /** Every write, by sheet: which range and which property. */
  writes: Array<{ sheet: string; address: string; what: string; value?: unknown }>;
  names: Array<{ scope: string; name: string; address: string; comment: string }>;
  workbookNames: string[];
  newSheet?: any;
}

/** A range whose every property set is recorded against its sheet. */
function rangeMock(rec: Recorder, sheet: string, address: string): any {
  const target = new OfficeMockObject({ address, format: { fill: {}, font: {}, borders: {} } }) as any;
  // where the test put it (reading `address` itself needs load + sync, as in Excel)
  target.placedAt = address;
  target.format.borders.getItem = () => {
    const edge: any = {};
    return new Proxy(edge, {
      set(o, p, v) {
        rec.writes.push({ sheet, address, what: `border.${String(p)}` });
        o[p] = v;
        return true;
      },
    });
  };
  const watch = (obj: any, prefix: string) =>
    new Proxy(obj, {
      set(o, p, v) {
        rec.writes.push({ sheet, address, what: `${prefix}${String(p)}`, value: v });
        o[p] = v;
        return true;
      },
    });
  target.format.fill = watch(target.format.fill, 'fill.');
  target.format.font = watch(target.format.font, 'font.');
  target.format = watch(target.format, 'format.');
  return watch(target, '');
}

function sheetMock(rec: Recorder, name: string): any {
  const sheet = new OfficeMockObject({ name, names: {} }) as any;
  sheet.getRange = (address: string) => rangeMock(rec, name, address);
  sheet.names.add = (n: string, ref: any, comment: string) => rec.names.push({ scope: name, name: n, address: ref.placedAt, comment });
  sheet.activate = () => rec.activated.push(name);
  return sheet;
}

function installExcel(existing: string[], supported = true): Recorder {
  const rec: Recorder = { syncs: 0, added: [], activated: [], writes: [], names: [], workbookNames: [] };
  const items = existing.map((n) => sheetMock(rec, n));
  const mock = new OfficeMockObject({
    context: {
      workbook: {
        worksheets: { items },
        names: {},
      },
    },
    run: async function (callback: (context: unknown) => Promise<unknown>) {
      return callback(this.context);
    },
  }) as any;
  // as in Excel: a sheet's name can be read only after load and sync
  mock.context.workbook.worksheets.load = (what: string) => {
    expect(what).toBe('items/name');
    for (const s of items) s.load('name');
  };
  mock.context.sync = async () => {
    rec.syncs++;
    for (const s of items) await s.sync();
  };
  mock.context.workbook.worksheets.items = items;
  mock.context.workbook.worksheets.add = (name: string) => {
    rec.added.push(name);
    const s = sheetMock(rec, name);
    rec.newSheet = s;
    return s;
  };
  mock.context.workbook.names.add = (name: string) => rec.workbookNames.push(name);
  (globalThis as any).Excel = mock;
  (globalThis as any).Office = new OfficeMockObject({
    context: { requirements: { isSetSupported: (set: string, version: string) => supported || !(set === 'ExcelApi' && version === '1.4') } },
  });
  return rec;
}

const plans: Array<[string, SheetPlan]> = calculations.map((c) => [c.name, c.plan(demoValues(c), { scenario: 'Mock test', date: '2026-12-02' })]);

describe('Excel adapter: writing a worked sheet', () => {
  afterEach(() => {
    delete (globalThis as any).Excel;
    delete (globalThis as any).Office;
  });

  it.each(plans)('%s: two context.sync() calls, one new sheet, activated', async (_name, plan) => {
    const rec = installExcel(['Sheet1', 'Loads']);
    const result = await excelPort.writeSheetPlan!(plan);
    expect(rec.syncs).toBe(2);
    expect(rec.added).toEqual([plan.sheetName]);
    expect(result.sheet).toBe(plan.sheetName);
    expect(rec.activated).toEqual([plan.sheetName]);
    expect(result.cells).toBe(plan.cells.length);
  });

  it.each(plans)('%s: writes nothing outside the new sheet, and every cell of the plan once', async (_name, plan) => {
    const rec = installExcel(['Sheet1']);
    await excelPort.writeSheetPlan!(plan);
    const sheets = new Set(rec.writes.map((w) => w.sheet));
    expect([...sheets]).toEqual([plan.sheetName]);
    const contents = rec.writes.filter((w) => w.what === 'formulas');
    expect(contents).toHaveLength(1);
    const grid = planGrid(plan);
    expect(contents[0].address).toBe(`A1:${cellA1(grid.length - 1, grid[0].length - 1)}`);
    // the block written holds exactly the plan's cells; the rest is null (left as it is)
    expect(contents[0].value).toEqual(grid);
    expect((contents[0].value as unknown[][]).flat().filter((v) => v !== null)).toHaveLength(plan.cells.length);
  });

  it.each(plans)('%s: every name is scoped to the new sheet and none to the workbook', async (_name, plan) => {
    const rec = installExcel(['Sheet1']);
    await excelPort.writeSheetPlan!(plan);
    expect(rec.workbookNames).toEqual([]);
    expect(rec.names).toHaveLength(plan.names.length);
    for (const n of rec.names) expect(n.scope).toBe(plan.sheetName);
    expect(rec.names.map((n) => [n.name, n.address])).toEqual(plan.names.map((n) => [n.name, cellA1(n.row, n.col)]));
  });

  it('picks a free sheet name when the plan’s name is taken, whatever its case', async () => {
    const plan = plans[0][1];
    const rec = installExcel([plan.sheetName.toUpperCase(), `${plan.sheetName} (2)`]);
    const result = await excelPort.writeSheetPlan!(plan);
    expect(result.sheet).toBe(`${plan.sheetName} (3)`);
    expect(rec.added).toEqual([`${plan.sheetName} (3)`]);
    expect(rec.syncs).toBe(2);
  });

  it('styles input cells as inputs', async () => {
    const plan = plans[0][1];
    const rec = installExcel([]);
    await excelPort.writeSheetPlan!(plan);
    const input = plan.cells.find((c) => c.role === 'input')!;
    const fills = rec.writes.filter((w) => w.what === 'fill.color').map((w) => w.address);
    expect(fills.some((a) => a.split(':')[0] === cellA1(input.row, input.col) || a === `${cellA1(input.row, input.col)}:${cellA1(input.row, input.col)}`)).toBe(true);
  });
});

describe('Excel adapter: requirement sets', () => {
  beforeEach(() => {
    delete (globalThis as any).Office;
  });
  afterEach(() => {
    delete (globalThis as any).Excel;
    delete (globalThis as any).Office;
  });

  it('says which requirement set is missing and writes nothing', async () => {
    const rec = installExcel(['Sheet1'], false);
    const reason = excelPort.sheetWritingBlocked!();
    expect(reason).toContain(`${SHEET_REQUIREMENTS[0][0]} ${SHEET_REQUIREMENTS[0][1]}`);
    await expect(excelPort.writeSheetPlan!(plans[0][1])).rejects.toThrow(/ExcelApi 1\.4/);
    expect(rec.syncs).toBe(0);
    expect(rec.added).toEqual([]);
  });

  it('is not blocked when the host has the sets', () => {
    installExcel([]);
    expect(excelPort.sheetWritingBlocked!()).toBeNull();
  });
});

