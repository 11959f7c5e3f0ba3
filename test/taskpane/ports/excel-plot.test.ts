/**
 * The Excel adapter of the phasor plot against office-addin-mock's OfficeMockObject: every
 * range the adapter loads is a mock, so a property read without load + sync gives the mock's
 * error text instead of a value. context.sync() calls are counted (at most two per action),
 * every write is recorded, so the tests see where helper cells went, that the chart series
 * point at them, and that no user cell was written.
 */
import { OfficeMockObject } from 'office-addin-mock';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { excelPlotPort } from '../../../src/taskpane/ports/excel-plot';
import type { PhasorChartRequest } from '../../../src/taskpane/port';

interface Write {
  sheet: string;
  address: string;
  formulas: unknown[][];
}
interface SeriesRecord {
  name: string;
  x?: string;
  y?: string;
  format: { line: Record<string, unknown> };
  markerStyle?: string;
  tip: Record<string, unknown>;
}

interface SheetSpec {
  name: string;
  /** The sheet's used range (values only), or null when empty. */
  used: { rowIndex: number; columnIndex: number; columnCount: number } | null;
  /** Addresses whose used range is not empty (cells hold data). */
  busy?: string[];
}

/** A mock Excel with `sheets`; `supported` lists the ExcelApi versions offered. */
function installExcel(sheets: SheetSpec[], supported: string[], selection?: { sheet: string; address: string; used: null | { address: string; rowIndex: number; columnIndex: number; cellCount: number; values: unknown[][]; valueTypes: string[][] } }) {
  const state = {
    syncs: 0,
    writes: [] as Write[],
    addedSheets: [] as string[],
    charts: [] as Array<{ sheet: string; type: string; source: string; name?: string; series: SeriesRecord[]; position?: string; axes: Record<string, Record<string, unknown>>; title: { text?: string } }>,
    handlers: 0,
    removed: 0,
  };
  const mocks: OfficeMockObject[] = [];
  const mock = (data: object): any => {
    const m = new OfficeMockObject(data);
    mocks.push(m);
    return m;
  };
  const rangeOn = (sheet: string, address: string): any => {
    const r: any = {
      address,
      format: { font: {} },
      getUsedRangeOrNullObject() {
        const busy = sheets.find((s) => s.name === sheet)?.busy?.includes(address) ?? false;
        const used = mock({ address });
        used.isNullObject = !busy;
        return used;
      },
    };
    let formulas: unknown[][] | undefined;
    Object.defineProperty(r, 'formulas', {
      get: () => formulas,
      set: (v: unknown[][]) => {
        formulas = v;
        state.writes.push({ sheet, address, formulas: v });
      },
    });
    return r;
  };
  const worksheet = (spec: SheetSpec | undefined, name: string): any => {
    const charts: any = {
      items: [],
      load() {},
      add(type: string, source: any) {
        const record = { sheet: name, type, source: `${source.sheet}!${source.address}`, series: [] as SeriesRecord[], axes: { categoryAxis: { title: {} }, valueAxis: { title: {} } }, title: {} };
        const seriesApi = (rec: SeriesRecord) => ({
          set name(v: string) {
            rec.name = v;
          },
          setXAxisValues(r: any) {
            rec.x = `${r.sheet}!${r.address}`;
          },
          setValues(r: any) {
            rec.y = `${r.sheet}!${r.address}`;
          },
          format: rec.format,
          set markerStyle(v: string) {
            rec.markerStyle = v;
          },
          points: { getItemAt: (i: number) => (i === 1 ? rec.tip : {}) },
        });
        const newSeries = (n: string): SeriesRecord => {
          const rec: SeriesRecord = { name: n, format: { line: {} }, tip: { dataLabel: {} } };
          record.series.push(rec);
          return rec;
        };
        const first = newSeries('Series1');
        state.charts.push(record as never);
        return {
          set name(v: string) {
            (record as { name?: string }).name = v;
          },
          title: record.title,
          series: { getItemAt: (i: number) => (i === 0 ? seriesApi(first) : undefined), add: (n: string) => seriesApi(newSeries(n)) },
          axes: record.axes,
          legend: {},
          setPosition(cell: string) {
            (record as { position?: string }).position = cell;
          },
        };
      },
    };
    const used = mock(spec?.used ?? { rowIndex: 0, columnIndex: 0, columnCount: 0 });
    used.isNullObject = !spec?.used;
    return {
      name,
      isNullObject: !spec,
      charts,
      getRange: (address: string) => Object.assign(rangeOn(name, address), { sheet: name }),
      getUsedRangeOrNullObject: () => used,
    };
  };
  const worksheets: any = {
    items: sheets.map((s) => ({ name: s.name })),
    load() {},
    getItemOrNullObject: (n: string) => worksheet(sheets.find((s) => s.name === n), n),
    getItem: (n: string) => worksheet(sheets.find((s) => s.name === n), n),
    add: (n: string) => {
      state.addedSheets.push(n);
      const spec: SheetSpec = { name: n, used: null };
      sheets.push(spec);
      return worksheet(spec, n);
    },
    onCalculated: {
      add: () => {
        state.handlers++;
        return handler();
      },
    },
  };
  const context: any = {
    workbook: {
      worksheets,
      getSelectedRange: () => {
        if (!selection) throw new Error('no selection in this mock');
        const r = mock({ address: `${selection.sheet}!${selection.address}`, worksheet: { name: selection.sheet } });
        r.getUsedRangeOrNullObject = () => {
          const u = mock(selection.used ?? { address: '', rowIndex: 0, columnIndex: 0, cellCount: 0, values: [], valueTypes: [] });
          u.isNullObject = selection.used === null;
          return u;
        };
        return r;
      },
      onSelectionChanged: {
        add: () => {
          state.handlers++;
          return handler();
        },
      },
    },
    async sync() {
      state.syncs++;
      for (const m of mocks) await m.sync();
    },
  };
  const handler = () => ({
    context,
    remove: () => {
      state.removed++;
    },
  });
  const g = globalThis as any;
  g.Excel = {
    run: async (a: unknown, b?: (ctx: unknown) => Promise<unknown>) => (typeof a === 'function' ? (a as (ctx: unknown) => Promise<unknown>)(context) : b!(context)),
    ChartType: { xyscatterLines: 'XYScatterLines' },
    ChartSeriesBy: { columns: 'Columns' },
    ChartMarkerStyle: { none: 'None' },
    ChartLegendPosition: { right: 'Right' },
  };
  g.Office = { context: { requirements: { isSetSupported: (set: string, v: string) => set === 'ExcelApi' && supported.includes(v) } } };
  return state;
}

const ALL = ['1.1', '1.2', '1.4', '1.7', '1.8'];

const request: PhasorChartRequest = {
  title: 'Phase current',
  sheet: 'Sub-board',
  phasors: [
    { label: 'L1', cell: 'B22', group: 'Phase current' },
    { label: 'L2', cell: 'C22', group: 'Phase current' },
    { label: 'L3', cell: 'D22', group: 'Phase current' },
  ],
};

afterEach(() => {
  const g = globalThis as any;
  delete g.Excel;
  delete g.Office;
});

describe('Excel insertPhasorChart', () => {
  let state: ReturnType<typeof installExcel>;
  beforeEach(() => {
    state = installExcel([{ name: 'Sub-board', used: { rowIndex: 0, columnIndex: 0, columnCount: 6 } }], ALL);
  });

  it('writes the helper cells on a new sheet, within two syncs, and no user cell', async () => {
    const result = await excelPlotPort.insertPhasorChart(request);
    expect(state.syncs).toBe(2);
    expect(state.addedSheets).toEqual(['Phasor chart data']);
    expect(state.writes.map((w) => w.sheet)).toEqual(['Phasor chart data']);
    expect(result).toEqual({ helperRange: 'Phasor chart data!A1:E13', chartName: 'Phasor chart 1' });
    const rows = state.writes[0].formulas;
    expect(state.writes[0].address).toBe('A1:E13');
    expect(rows[4]).toEqual(['Phase current', 'A', "=MAX(PHZ.MAG('Sub-board'!B22),PHZ.MAG('Sub-board'!C22),PHZ.MAG('Sub-board'!D22))", null, null]);
    // one origin row (0, 0) and one tip row of PHZ formulas per phasor
    expect(rows[7]).toEqual(['L1', 'Sub-board!B22', 0, 0, 'Phase current']);
    expect(rows[8]).toEqual([null, null, "=IF($C$5=0,0,PHZ.REAL('Sub-board'!B22)/$C$5)", "=IF($C$5=0,0,PHZ.IMAG('Sub-board'!B22)/$C$5)", null]);
    expect(rows[12][2]).toBe("=IF($C$5=0,0,PHZ.REAL('Sub-board'!D22)/$C$5)");
  });

  it('adds an XY scatter chart on the data sheet whose series are origin-to-tip segments over the helper cells', async () => {
    await excelPlotPort.insertPhasorChart(request);
    expect(state.charts).toHaveLength(1);
    const chart = state.charts[0];
    expect(chart.type).toBe('XYScatterLines');
    expect(chart.sheet).toBe('Sub-board');
    expect(chart.title.text).toBe('Phase current');
    expect(chart.series.map((s) => [s.name, s.x, s.y])).toEqual([
      ['L1', 'Phasor chart data!C8:C9', 'Phasor chart data!D8:D9'],
      ['L2', 'Phasor chart data!C10:C11', 'Phasor chart data!D10:D11'],
      ['L3', 'Phasor chart data!C12:C13', 'Phasor chart data!D12:D13'],
    ]);
    // the tip is marked (no arrowheads on series): a marker and the name on point 2 only
    for (const s of chart.series) {
      expect(s.markerStyle).toBe('None');
      expect(s.tip.markerStyle).not.toBe('None');
      expect(s.tip.hasDataLabel).toBe(true);
      expect((s.tip.dataLabel as { showSeriesName?: boolean }).showSeriesName).toBe(true);
    }
    expect(new Set(chart.series.map((s) => s.format.line.color)).size).toBe(3);
    expect(chart.axes.categoryAxis).toMatchObject({ minimum: -1, maximum: 1 });
    expect(chart.axes.valueAxis).toMatchObject({ minimum: -1, maximum: 1 });
    // right of the used columns A:F, leaving one column free
    expect((chart as { position?: string }).position).toBe('H1');
  });

  it('writes at an anchor on the same sheet when that area is empty', async () => {
    const result = await excelPlotPort.insertPhasorChart({ ...request, anchor: 'H30' });
    expect(state.syncs).toBe(2);
    expect(state.addedSheets).toEqual([]);
    expect(state.writes.map((w) => `${w.sheet}!${w.address}`)).toEqual(['Sub-board!H30:L42']);
    expect(result.helperRange).toBe('Sub-board!H30:L42');
    expect(state.charts[0].series[0].x).toBe('Sub-board!J37:J38');
  });

  it('writes nothing when the anchor area holds data, and says where', async () => {
    state = installExcel([{ name: 'Sub-board', used: { rowIndex: 0, columnIndex: 0, columnCount: 6 }, busy: ['H30:L42'] }], ALL);
    await expect(excelPlotPort.insertPhasorChart({ ...request, anchor: 'H30' })).rejects.toThrow(
      'The helper cells would go at Sub-board!H30:L42, but cells there hold data; nothing was written. Choose an empty area.',
    );
    expect(state.syncs).toBe(1);
    expect(state.writes).toEqual([]);
    expect(state.charts).toEqual([]);
  });

  it('picks a fresh helper sheet name when one is taken', async () => {
    state = installExcel(
      [
        { name: 'Sub-board', used: null },
        { name: 'Phasor chart data', used: null },
      ],
      ALL,
    );
    const result = await excelPlotPort.insertPhasorChart(request);
    expect(state.addedSheets).toEqual(['Phasor chart data 2']);
    expect(result.helperRange.startsWith('Phasor chart data 2!')).toBe(true);
  });

  it('says plainly which requirement set is missing, before any sync', async () => {
    state = installExcel([{ name: 'Sub-board', used: null }], ['1.1', '1.2', '1.4']);
    await expect(excelPlotPort.insertPhasorChart(request)).rejects.toThrow('Insert as chart needs ExcelApi 1.7, which this version of Excel does not offer.');
    expect(state.syncs).toBe(0);
    expect(excelPlotPort.plotSupport()).toEqual({
      read: null,
      recalc: 'Following recalculation (the plot still follows the selection; use Refresh) needs ExcelApi 1.8, which this version of Excel does not offer.',
      chart: 'Insert as chart needs ExcelApi 1.7, which this version of Excel does not offer.',
    });
  });

  it('refuses a bad request before touching the workbook', async () => {
    await expect(excelPlotPort.insertPhasorChart({ ...request, phasors: [{ label: 'x', cell: 'B22:D22' }] })).rejects.toThrow(/is not a cell address/);
    await expect(excelPlotPort.insertPhasorChart({ ...request, phasors: [] })).rejects.toThrow(/nothing to chart/);
    expect(state.syncs).toBe(0);
  });
});

describe('Excel readSelection and watchSelection', () => {
  it('reads the used part of the selection with its values, errors marked, in two syncs', async () => {
    const state = installExcel([], ALL, {
      sheet: 'Sub-board',
      address: 'A21:F200',
      used: {
        address: "'Sub-board'!A21:D22",
        rowIndex: 20,
        columnIndex: 0,
        cellCount: 8,
        values: [
          ['Per phase', 'L1', 'L2', 'L3'],
          ['Phase current', '26.2∠-20.7', '', '#DIV/0!'],
        ],
        valueTypes: [
          ['String', 'String', 'String', 'String'],
          ['String', 'String', 'Empty', 'Error'],
        ],
      },
    });
    const block = await excelPlotPort.readSelection(4000);
    expect(state.syncs).toBe(2);
    expect(block).toEqual({
      sheet: 'Sub-board',
      selected: 'A21:F200',
      top: 20,
      left: 0,
      cellCount: 8,
      values: [
        ['Per phase', 'L1', 'L2', 'L3'],
        ['Phase current', '26.2∠-20.7', null, { error: '#DIV/0!' }],
      ],
    });
  });

  it('leaves the values out over the limit (one sync) and reads an empty selection as empty', async () => {
    let state = installExcel([], ALL, { sheet: 'S', address: 'A:Z', used: { address: 'S!A1:Z9000', rowIndex: 0, columnIndex: 0, cellCount: 234000, values: [], valueTypes: [] } });
    const big = await excelPlotPort.readSelection(4000);
    expect(state.syncs).toBe(1);
    expect([big.cellCount, big.values]).toEqual([234000, []]);
    state = installExcel([], ALL, { sheet: 'S', address: 'K5', used: null });
    const none = await excelPlotPort.readSelection(4000);
    expect(state.syncs).toBe(1);
    expect([none.cellCount, none.values, none.selected]).toEqual([0, [], 'K5']);
  });

  it('follows selection changes and, with ExcelApi 1.8, recalculation; stopping removes both handlers', async () => {
    const state = installExcel([], ALL);
    const stop = await excelPlotPort.watchSelection(() => undefined);
    expect(state.handlers).toBe(2);
    await stop();
    expect(state.removed).toBe(2);
    expect(state.syncs).toBe(2);
    const old = installExcel([], ['1.1', '1.2', '1.4', '1.7']);
    await excelPlotPort.watchSelection(() => undefined);
    expect(old.handlers).toBe(1);
  });
});
