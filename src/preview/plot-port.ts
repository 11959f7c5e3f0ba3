/**
 * The phasor plot's part of the preview's WorkbookPort: the grid's selection and its events,
 * and linked charts drawn by the chart overlay over helper cells in the preview workbook.
 */
import { PhzError } from '../core/errors';
import { plotMessages as M } from '../core/messages';
import { checkChartRequest, freshChartName, freshSheetName, helperHeight, HELPER_COLUMNS, planChart } from '../taskpane/plot/chart-plan';
import type { SelectionBlock, SelectionCell } from '../taskpane/plot/model';
import type { PhasorChartRequest, PhasorChartResult, PlotPort, PlotRange, PlotSupport, SelectionChange } from '../taskpane/port';
import { a1, parseA1, parseRectA1, rectA1 } from './address';
import type { ChartOverlay } from './chart-overlay';
import { isDisplayError } from './engine';
import type { Grid } from './grid';
import type { Workbook } from './workbook';

export class PreviewPlotPort implements PlotPort {
  constructor(
    private readonly grid: Grid,
    private readonly workbook: Workbook,
    private readonly charts: ChartOverlay,
  ) {}

  plotSupport(): PlotSupport {
    return { read: null, recalc: null, chart: null };
  }

  async readSelection(maxCells: number, range?: PlotRange): Promise<SelectionBlock> {
    const sheet = range?.sheet ?? this.grid.sheetName;
    const sel = range ? parseRectA1(range.address) : this.grid.selection;
    if (!sel) throw new Error(`"${range?.address}" is not a block of cells`);
    const id = this.workbook.sheetId(sheet);
    const dims = this.workbook.hf.getSheetDimensions(id);
    // The used part: the selection cut to the sheet's filled rows and columns.
    const bottom = Math.min(sel.bottom, dims.height - 1);
    const right = Math.min(sel.right, dims.width - 1);
    const base = { sheet, selected: rectA1(sel), top: sel.top, left: sel.left };
    if (bottom < sel.top || right < sel.left) return { ...base, values: [], cellCount: 0 };
    const cellCount = (bottom - sel.top + 1) * (right - sel.left + 1);
    if (cellCount > maxCells) return { ...base, values: [], cellCount };
    const values: SelectionCell[][] = [];
    for (let r = sel.top; r <= bottom; r++) {
      const row: SelectionCell[] = [];
      for (let c = sel.left; c <= right; c++) {
        const v = this.workbook.engine.display({ sheet: id, row: r, col: c });
        row.push(isDisplayError(v) ? { error: v.error } : v);
      }
      values.push(row);
    }
    return { ...base, values, cellCount };
  }

  async watchSelection(listener: (why: SelectionChange) => void): Promise<() => Promise<void>> {
    const offSelection = this.grid.onSelectionChange(() => listener('selection'));
    const offValues = this.workbook.onChange(() => listener('values'));
    return async () => {
      offSelection();
      offValues();
    };
  }

  async insertPhasorChart(request: PhasorChartRequest): Promise<PhasorChartResult> {
    checkChartRequest(request);
    const names = this.workbook.sheetNames();
    if (!names.includes(request.sheet)) throw new PhzError(M.chartNoSheet(request.sheet));
    const anchor = request.anchor ? parseA1(request.anchor) : undefined;
    const height = helperHeight(request);
    if (anchor) {
      const id = this.workbook.sheetId(request.sheet);
      for (let r = anchor.row; r < anchor.row + height; r++) {
        for (let c = anchor.col; c < anchor.col + HELPER_COLUMNS; c++) {
          const at = { sheet: id, row: r, col: c };
          if (this.workbook.engine.rawContent(at) !== null || this.workbook.hf.isCellPartOfArray(at)) {
            throw new PhzError(M.chartAreaUsed(`${request.sheet}!${rectA1({ top: anchor.row, left: anchor.col, bottom: anchor.row + height - 1, right: anchor.col + HELPER_COLUMNS - 1 })}`));
          }
        }
      }
    }
    const dims = this.workbook.hf.getSheetDimensions(this.workbook.sheetId(request.sheet));
    const first = parseA1(request.phasors[0].cell.split(':')[0]);
    const at =
      (request.chartCell ? parseA1(request.chartCell) : undefined) ??
      (anchor ? { row: anchor.row, col: anchor.col + HELPER_COLUMNS + 1 } : { row: first?.row ?? 0, col: dims.width + 1 });
    const helperSheet = anchor ? request.sheet : freshSheetName(names);
    const plan = planChart(request, helperSheet, anchor?.row ?? 0, anchor?.col ?? 0, a1(at));
    if (!anchor) this.workbook.addSheet(helperSheet);
    this.workbook.setBlock(helperSheet, plan.top, plan.left, plan.rows.map((r) => [...r]), 'Insert chart');
    const chartName = freshChartName(this.charts.names(request.sheet));
    this.charts.add({ name: chartName, sheet: request.sheet, at, plan });
    this.grid.say(`Inserted ${chartName}; its helper cells are ${helperSheet}!${plan.range}.`);
    return { helperRange: `${helperSheet}!${plan.range}`, chartName };
  }
}
