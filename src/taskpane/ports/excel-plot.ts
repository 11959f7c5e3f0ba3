/**
 * The phasor plot's part of the Excel WorkbookPort: reading the selection, following its
 * changes, and inserting a linked XY scatter chart. Requirement sets are checked at runtime
 * (Office.context.requirements) and what is missing is said in words; each action takes at
 * most two context.sync() calls.
 *
 * Minimum sets (from the API's own annotations in @types/office-js): ExcelApi 1.2 for
 * workbook.onSelectionChanged, 1.4 for getUsedRangeOrNullObject and getItemOrNullObject,
 * 1.7 for chart series built from ranges (series.add, setValues, setXAxisValues) and point
 * markers, 1.8 for worksheets.onCalculated.
 */
import { PhzError } from '../../core/errors';
import { plotMessages as M } from '../../core/messages';
import { columnLetters, parseA1 } from '../a1';
import { checkChartRequest, freshChartName, freshSheetName, helperHeight, HELPER_COLUMNS, planChart } from '../plot/chart-plan';
import type { SelectionBlock, SelectionCell } from '../plot/model';
import type { PhasorChartRequest, PhasorChartResult, PlotPort, PlotRange, PlotSupport, SelectionChange } from '../port';

/** Strips the sheet part of an Excel address: `'My sheet'!B2` → `B2`. */
function local(address: string): string {
  const bang = address.lastIndexOf('!');
  return bang >= 0 ? address.slice(bang + 1) : address;
}

function supported(version: string): boolean {
  try {
    return Office.context.requirements.isSetSupported('ExcelApi', version);
  } catch {
    return false;
  }
}

/** Excel values → plot cells: `''` is blank, errors (valueTypes `Error`) become error values. */
export function toSelectionCells(values: unknown[][], types: string[][] | undefined): SelectionCell[][] {
  return values.map((row, r) =>
    row.map((v, c) => {
      if (types?.[r]?.[c] === 'Error') return { error: String(v) };
      if (v === '' || v === null || v === undefined) return null;
      if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
      return { error: String(v) };
    }),
  );
}

export const excelPlotPort: PlotPort = {
  plotSupport(): PlotSupport {
    return {
      read: supported('1.4') ? null : M.missingSets('Reading the selection for the plot', 'ExcelApi 1.4'),
      recalc: supported('1.8') ? null : M.missingSets('Following recalculation (the plot still follows the selection; use Refresh)', 'ExcelApi 1.8'),
      chart: supported('1.7') ? null : M.missingSets('Insert as chart', 'ExcelApi 1.7'),
    };
  },

  readSelection(maxCells: number, range?: PlotRange): Promise<SelectionBlock> {
    return Excel.run(async (context) => {
      const selected = range ? context.workbook.worksheets.getItem(range.sheet).getRange(range.address) : context.workbook.getSelectedRange();
      selected.load('address,worksheet/name');
      const used = selected.getUsedRangeOrNullObject(true);
      used.load('address,rowIndex,columnIndex,cellCount');
      await context.sync();
      const base = { sheet: selected.worksheet.name, selected: local(selected.address) };
      if (used.isNullObject) return { ...base, top: 0, left: 0, values: [], cellCount: 0 };
      if (used.cellCount > maxCells) return { ...base, top: used.rowIndex, left: used.columnIndex, values: [], cellCount: used.cellCount };
      used.load('values,valueTypes');
      await context.sync();
      return {
        ...base,
        top: used.rowIndex,
        left: used.columnIndex,
        values: toSelectionCells(used.values, used.valueTypes as string[][]),
        cellCount: used.cellCount,
      };
    });
  },

  async watchSelection(listener: (why: SelectionChange) => void): Promise<() => Promise<void>> {
    const withCalc = supported('1.8');
    const handlers = await Excel.run(async (context) => {
      const list: OfficeExtension.EventHandlerResult<unknown>[] = [];
      list.push(context.workbook.onSelectionChanged.add(async () => listener('selection')));
      if (withCalc) list.push(context.workbook.worksheets.onCalculated.add(async () => listener('values')));
      await context.sync();
      return list;
    });
    return async () => {
      if (handlers.length === 0) return;
      await Excel.run(handlers[0].context, async (context) => {
        for (const h of handlers) h.remove();
        await context.sync();
      });
    };
  },

  insertPhasorChart(request: PhasorChartRequest): Promise<PhasorChartResult> {
    if (!supported('1.7')) return Promise.reject(new PhzError(M.missingSets('Insert as chart', 'ExcelApi 1.7')));
    try {
      checkChartRequest(request);
    } catch (e) {
      return Promise.reject(e);
    }
    return Excel.run(async (context) => {
      // First round trip: what exists (sheet names, the source sheet's used area, the anchor area, chart names).
      const sheets = context.workbook.worksheets;
      sheets.load('items/name');
      const source = sheets.getItemOrNullObject(request.sheet);
      const used = source.getUsedRangeOrNullObject(true);
      used.load('rowIndex,columnIndex,columnCount');
      source.charts.load('items/name');
      const anchor = request.anchor ? parseA1(request.anchor) : undefined;
      const height = helperHeight(request);
      const area = anchor
        ? `${columnLetters(anchor.col)}${anchor.row + 1}:${columnLetters(anchor.col + HELPER_COLUMNS - 1)}${anchor.row + height}`
        : undefined;
      const areaUsed = area ? source.getRange(area).getUsedRangeOrNullObject(true) : undefined;
      areaUsed?.load('address');
      await context.sync();

      if (source.isNullObject) throw new PhzError(M.chartNoSheet(request.sheet));
      if (areaUsed && !areaUsed.isNullObject) throw new PhzError(M.chartAreaUsed(`${request.sheet}!${area}`));
      const names = sheets.items.map((s) => s.name);
      const chartName = freshChartName(source.charts.items.map((c) => c.name));
      const helperName = anchor ? request.sheet : freshSheetName(names);
      // The chart goes beside the helper block (anchor) or right of the used cells of the sheet.
      const chartCol = anchor ? anchor.col + HELPER_COLUMNS + 1 : used.isNullObject ? 0 : used.columnIndex + used.columnCount + 1;
      const chartRow = anchor ? anchor.row : used.isNullObject ? 0 : used.rowIndex;
      const chartCell = request.chartCell ?? `${columnLetters(chartCol)}${chartRow + 1}`;
      const plan = planChart(request, helperName, anchor?.row ?? 0, anchor?.col ?? 0, chartCell);

      // Second round trip: helper cells, chart, series, formats.
      const helper = anchor ? source : sheets.add(helperName);
      helper.getRange(plan.range).formulas = plan.rows as unknown as string[][];
      helper.getRange(`${columnLetters(plan.left)}${plan.top + 1}`).format.font.bold = true;
      const first = plan.series[0];
      const chart = source.charts.add(Excel.ChartType.xyscatterLines, helper.getRange(`${first.x.split(':')[0]}:${first.y.split(':')[1]}`), Excel.ChartSeriesBy.columns);
      chart.name = chartName;
      chart.title.text = plan.title;
      plan.series.forEach((s, i) => {
        const series = i === 0 ? chart.series.getItemAt(0) : chart.series.add(s.name);
        series.name = s.name;
        series.setXAxisValues(helper.getRange(s.x));
        series.setValues(helper.getRange(s.y));
        series.format.line.color = s.colour;
        series.format.line.lineStyle = s.lineStyle;
        series.format.line.weight = 2;
        series.markerStyle = Excel.ChartMarkerStyle.none;
        // No arrowheads on chart series through Office.js: a marker on the tip point marks it.
        const tip = series.points.getItemAt(1);
        tip.markerStyle = s.markerStyle;
        tip.markerSize = 8;
        tip.markerBackgroundColor = s.colour;
        tip.markerForegroundColor = s.colour;
        tip.hasDataLabel = true;
        tip.dataLabel.showSeriesName = true;
        tip.dataLabel.showValue = false;
      });
      for (const axis of [chart.axes.categoryAxis, chart.axes.valueAxis]) {
        axis.minimum = -1;
        axis.maximum = 1;
        axis.majorUnit = 0.5;
      }
      chart.axes.categoryAxis.title.text = 'Re ÷ full scale';
      chart.axes.valueAxis.title.text = 'Im ÷ full scale';
      chart.legend.position = Excel.ChartLegendPosition.right;
      chart.setPosition(plan.chartCell);
      chart.width = 420;
      chart.height = 340;
      await context.sync();
      return { helperRange: `${helperName}!${plan.range}`, chartName };
    });
  },
};
