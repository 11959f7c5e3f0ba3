/**
 * The preview's side of the phasor plot, in node with the real engine: reading the selection
 * (values, errors, the used part, the limit), following edits, and "Insert as chart" writing
 * helper cells whose PHZ formulas the engine evaluates — the chart's points must be the
 * plotted phasors divided by their group's full scale (checked with mathjs), follow a change
 * of input, and never land on a cell that holds anything.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { chartData, type ChartOverlay, type PreviewChart } from '../../src/preview/chart-overlay';
import { PhzEngine } from '../../src/preview/engine';
import type { Grid } from '../../src/preview/grid';
import { PreviewPlotPort } from '../../src/preview/plot-port';
import { Workbook } from '../../src/preview/workbook';
import type { Rect } from '../../src/preview/address';
import type { PlotPhasor } from '../../src/taskpane/plot/model';
import { expectClose, expectPhasorClose } from '../helpers';

function setup(selection: Rect) {
  const engine = new PhzEngine({
    sheets: {
      Board: [
        ['Per phase', 'L1', 'L2', 'L3'],
        ['Supply', '230∠0', '230∠-120', '230∠120'],
        ['Load', '8+j6', '10', '6-j8'],
        ['Current', '=PHZ.DIV(B2,B3)', '=PHZ.DIV(C2,C3)', '=PHZ.DIV(D2,D3)'],
        ['Bad', '=PHZ.DIV(B2,0)', null, 'note'],
      ],
    },
  });
  const workbook = new Workbook(engine);
  const selectionListeners: Array<() => void> = [];
  const said: string[] = [];
  const grid = {
    sheetName: 'Board',
    selection,
    onSelectionChange: (l: () => void) => {
      selectionListeners.push(l);
      return () => selectionListeners.splice(selectionListeners.indexOf(l), 1);
    },
    say: (m: string) => said.push(m),
  } as unknown as Grid;
  const charts: PreviewChart[] = [];
  const overlay = { names: () => charts.map((c) => c.name), add: (c: PreviewChart) => charts.push(c) } as unknown as ChartOverlay;
  return { engine, workbook, grid, charts, said, port: new PreviewPlotPort(grid, workbook, overlay), selectionListeners };
}

describe('preview readSelection', () => {
  it('reads the selected block with display values, errors as error values', async () => {
    const { port } = setup({ top: 3, left: 0, bottom: 4, right: 3 });
    const block = await port.readSelection(100);
    expect(block.sheet).toBe('Board');
    expect(block.selected).toBe('A4:D5');
    expect(block.top).toBe(3);
    expect(block.values[0][0]).toBe('Current');
    expect(typeof block.values[0][1]).toBe('string');
    expect(block.values[1][1]).toEqual({ error: '#VALUE!' });
    expect(block.values[1][2]).toBe(null);
  });

  it('cuts a whole-column selection to the filled rows, and leaves values out over the limit', async () => {
    const { port } = setup({ top: 0, left: 1, bottom: 199, right: 1 });
    const block = await port.readSelection(100);
    expect(block.values).toHaveLength(5);
    expect(block.cellCount).toBe(5);
    const over = await port.readSelection(4);
    expect([over.cellCount, over.values]).toEqual([5, []]);
  });

  it('reads a kept block instead of the selection', async () => {
    const { port } = setup({ top: 0, left: 0, bottom: 0, right: 0 });
    const block = await port.readSelection(100, { sheet: 'Board', address: 'B4:D4' });
    expect(block.values[0]).toHaveLength(3);
  });

  it('tells selection changes and recalculation apart, until stopped', async () => {
    const { port, workbook, selectionListeners } = setup({ top: 0, left: 0, bottom: 0, right: 0 });
    const seen: string[] = [];
    const stop = await port.watchSelection((why) => seen.push(why));
    selectionListeners.forEach((l) => l());
    workbook.setCell('Board', 1, 1, '231∠0');
    await stop();
    workbook.setCell('Board', 1, 1, '232∠0');
    expect(seen).toEqual(['selection', 'values']);
  });
});

describe('preview insertPhasorChart', () => {
  const request = {
    title: 'Current',
    sheet: 'Board',
    phasors: [
      { label: 'L1', cell: 'B4', group: 'Current' },
      { label: 'L2', cell: 'C4', group: 'Current' },
      { label: 'L3', cell: 'D4', group: 'Current' },
      { label: 'V1', cell: 'B2', group: 'Supply' },
    ],
  };

  it('writes helper cells on a new sheet whose formulas give each tip ÷ its group full scale', async () => {
    const { port, workbook, charts } = setup({ top: 3, left: 1, bottom: 3, right: 3 });
    const result = await port.insertPhasorChart(request);
    expect(result.helperRange).toBe('Phasor chart data!A1:E16');
    expect(workbook.sheetNames()).toContain('Phasor chart data');
    const chart = charts[0];
    expect(chart.sheet).toBe('Board');
    // I = V / Z, worked with mathjs
    const currents = [
      [230, 0, 8, 6],
      [230 * Math.cos((-120 * Math.PI) / 180), 230 * Math.sin((-120 * Math.PI) / 180), 10, 0],
      [230 * Math.cos((120 * Math.PI) / 180), 230 * Math.sin((120 * Math.PI) / 180), 6, -8],
    ].map(([vr, vi, zr, zi]) => math.divide(math.complex(vr, vi), math.complex(zr, zi)) as math.Complex);
    const full = Math.max(...currents.map((z) => math.abs(z) as unknown as number));
    const id = workbook.sheetId('Phasor chart data');
    // the current cells hold 6-significant-figure text, so parts agree to 1e-5 of the full scale (1)
    chart.plan.series.slice(0, 3).forEach((s, k) => {
      expectClose(workbook.engine.display({ sheet: id, row: s.tipRow, col: 2 }) as number, currents[k].re / full, 1e-5, 1);
      expectClose(workbook.engine.display({ sheet: id, row: s.tipRow, col: 3 }) as number, currents[k].im / full, 1e-5, 1);
    });
    // the supply group has its own full scale: its one phasor reaches exactly 1
    const v = chart.plan.series[3];
    expectClose(workbook.engine.display({ sheet: id, row: v.tipRow, col: 2 }) as number, 1, 1e-12);
    // and the chart reads the plotted phasors back from the helper cells
    const data = chartData(workbook, chart);
    if (typeof data === 'string') throw new Error(data);
    data.phasors.slice(0, 3).forEach((p: PlotPhasor, k: number) => expectPhasorClose(p, currents[k], 1e-5));
    expect(data.groups).toEqual([
      { name: 'Current', unit: 'A' },
      { name: 'Supply', unit: '' },
    ]);
  });

  it('follows a change of input through the helper formulas', async () => {
    const { port, workbook, charts } = setup({ top: 3, left: 1, bottom: 3, right: 3 });
    await port.insertPhasorChart(request);
    workbook.setCell('Board', 2, 1, '4+j3'); // Z1 halves: I1 doubles
    const data = chartData(workbook, charts[0]);
    if (typeof data === 'string') throw new Error(data);
    expectPhasorClose(data.phasors[0], math.divide(math.complex(230, 0), math.complex(4, 3)) as math.Complex, 1e-5);
  });

  it('writes at an empty anchor on the same sheet, and refuses an area that holds anything', async () => {
    const { port, workbook, charts } = setup({ top: 0, left: 0, bottom: 0, right: 0 });
    const ok = await port.insertPhasorChart({ ...request, anchor: 'G1' });
    expect(ok.helperRange).toBe('Board!G1:K16');
    expect(charts[0].at).toEqual({ row: 0, col: 12 });
    const before = workbook.raw('Board', 4, 3);
    await expect(port.insertPhasorChart({ ...request, anchor: 'C5' })).rejects.toThrow(/The helper cells would go at Board!C5:G20, but cells there hold data; nothing was written/);
    expect(workbook.raw('Board', 4, 3)).toBe(before);
    expect(charts).toHaveLength(1);
  });

  it('refuses an unknown sheet and a request of too many phasors', async () => {
    const { port } = setup({ top: 0, left: 0, bottom: 0, right: 0 });
    await expect(port.insertPhasorChart({ ...request, sheet: 'Nope' })).rejects.toThrow('There is no sheet named “Nope”.');
    const many = Array.from({ length: 51 }, (_, k) => ({ label: `p${k}`, cell: `B${k + 1}` }));
    await expect(port.insertPhasorChart({ ...request, phasors: many })).rejects.toThrow(/A chart takes at most 50 phasors/);
  });
});
