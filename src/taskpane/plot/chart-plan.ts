/**
 * The plan of a linked phasor chart, shared by the Excel and preview adapters: the helper
 * cells (PHZ formulas that read the plotted cells) and one chart series per phasor, a
 * segment from the origin to its tip. Pure: the adapters only carry it out.
 *
 * Each group (one unit) is divided by its own full scale, a live `MAX(PHZ.MAG(…))` of the
 * group, so every group fills the same −1…1 square whatever its unit, angles stay true on
 * equal axes, and the chart follows the cells when they change. Office.js cannot put an
 * arrowhead on a chart series, so the tip is marked by a marker on the tip point only, with
 * the phasor's name beside it.
 */
import { PhzError } from '../../core/errors';
import { plotMessages as M } from '../../core/messages';
import type { PhasorChartRequest } from '../port';
import { a1, columnLetters, parseA1, sheetRef } from '../a1';
import { phasorStyle, type MarkerShape } from './palette';
import { unitFromLabel, unitToken } from './units';

/** Series per chart at most: Excel allows 255, and beyond a few dozen a chart is unreadable. */
export const CHART_MAX_PHASORS = 50;
/** Columns of the helper block. */
export const HELPER_COLUMNS = 5;

export type HelperCell = string | number | null;

export interface ChartSeriesPlan {
  readonly name: string;
  readonly group: number;
  /** A1 ranges (no sheet) on the helper sheet: two cells each, origin then tip. */
  readonly x: string;
  readonly y: string;
  /** Zero-based row of the tip on the helper sheet (its x and y are in columns 2 and 3 of the block). */
  readonly tipRow: number;
  readonly colour: string;
  /** Excel's line style name for the group's dash. */
  readonly lineStyle: 'Continuous' | 'Dash' | 'RoundDot' | 'DashDot' | 'DashDotDot';
  readonly marker: MarkerShape;
  /** Excel's marker style name for `marker`. */
  readonly markerStyle: 'Circle' | 'Square' | 'Triangle' | 'Diamond' | 'X' | 'Star';
  /** The plotted cell as the request gave it (`B22`, `B5:C5`). */
  readonly cell: string;
}

export interface ChartGroupPlan {
  readonly name: string;
  readonly unit: string;
  /** A1 (no sheet) of the cell holding the group's full scale. */
  readonly scaleCell: string;
  readonly scaleRow: number;
}

export interface ChartPlan {
  readonly title: string;
  /** Sheet for the helper cells. */
  readonly helperSheet: string;
  /** Zero-based top-left of the helper block, its size, and its A1 range (no sheet). */
  readonly top: number;
  readonly left: number;
  readonly rows: readonly (readonly HelperCell[])[];
  readonly range: string;
  readonly groups: readonly ChartGroupPlan[];
  readonly series: readonly ChartSeriesPlan[];
  /** Where the chart's top-left goes, on the request's sheet (A1, no sheet). */
  readonly chartCell: string;
}

const LINE_STYLES: readonly ChartSeriesPlan['lineStyle'][] = ['Continuous', 'Dash', 'RoundDot', 'DashDot', 'DashDotDot'];
const MARKER_STYLES: Readonly<Record<MarkerShape, ChartSeriesPlan['markerStyle']>> = {
  circle: 'Circle',
  square: 'Square',
  triangle: 'Triangle',
  diamond: 'Diamond',
  cross: 'X',
  down: 'Star',
};

/** Checks a request before anything is written; throws a PhzError the pane shows as it is. */
export function checkChartRequest(request: PhasorChartRequest): void {
  const n = request.phasors.length;
  if (n === 0) throw new PhzError(M.chartEmpty);
  if (n > CHART_MAX_PHASORS) throw new PhzError(M.chartTooMany(n, CHART_MAX_PHASORS));
  for (const p of request.phasors) if (!isCellOrPair(p.cell)) throw new PhzError(M.chartBadCell(p.cell));
  if (request.anchor !== undefined && !parseA1(request.anchor)) throw new PhzError(M.chartBadCell(request.anchor));
  if (request.chartCell !== undefined && !parseA1(request.chartCell)) throw new PhzError(M.chartBadCell(request.chartCell));
}

function isCellOrPair(cell: string): boolean {
  const parts = cell.split(':');
  if (parts.length === 1) return parseA1(parts[0]) !== undefined;
  if (parts.length !== 2) return false;
  const a = parseA1(parts[0]);
  const b = parseA1(parts[1]);
  return !!a && !!b && a.row === b.row && b.col === a.col + 1;
}

/** Rows the helper block takes for a request (for checking that the area is free). */
export function helperHeight(request: PhasorChartRequest): number {
  return 4 + groupNames(request).length + 2 + 2 * request.phasors.length;
}

function groupNames(request: PhasorChartRequest): string[] {
  const names: string[] = [];
  for (const p of request.phasors) {
    const g = p.group ?? '';
    if (!names.includes(g)) names.push(g);
  }
  return names;
}

/** Text that a spreadsheet would take for a formula is kept as text. */
function asText(s: string): string {
  return /^[=+\-@]/.test(s) ? `'${s}` : s;
}

/**
 * Plans the helper block at (`top`, `left`) on `helperSheet` and the chart at `chartCell` on
 * the request's sheet. The request must have passed `checkChartRequest`.
 */
export function planChart(request: PhasorChartRequest, helperSheet: string, top: number, left: number, chartCell: string): ChartPlan {
  const names = groupNames(request);
  const rows: HelperCell[][] = [];
  const src = (cell: string) => `${sheetRef(request.sheet)}!${cell}`;
  const at = (r: number, c: number) => a1(top + r, left + c);
  const abs = (r: number, c: number) => `$${columnLetters(left + c)}$${top + r + 1}`;
  const title = request.title.trim() || 'Phasors';

  rows.push([`Phasor chart data: ${asText(title)}`, null, null, null, null]);
  rows.push(['Written by Starpoint for the chart of these phasors. The formulas read the plotted cells; keep these cells while the chart is in use.', null, null, null, null]);
  rows.push(['Each group is divided by its full scale (its largest magnitude), so the chart spans −1 to 1 and every group fills it.', null, null, null, null]);
  rows.push(['Group', 'Unit', 'Full scale', null, null]);
  const groups: ChartGroupPlan[] = names.map((name) => {
    const row = rows.length;
    const members = request.phasors.filter((p) => (p.group ?? '') === name).map((p) => `PHZ.MAG(${src(p.cell)})`);
    const unit = unitToken(name) ?? unitFromLabel(name);
    rows.push([asText(name || 'Phasors'), unit || null, `=MAX(${members.join(',')})`, null, null]);
    return { name: name || 'Phasors', unit, scaleCell: at(row, 2), scaleRow: top + row };
  });
  rows.push([null, null, null, null, null]);
  rows.push(['Phasor', 'Cell', 'x (÷ full scale)', 'y (÷ full scale)', 'Group']);
  const counters = names.map(() => 0);
  const series: ChartSeriesPlan[] = request.phasors.map((p) => {
    const g = names.indexOf(p.group ?? '');
    const scale = abs(groups[g].scaleRow - top, 2);
    const origin = rows.length;
    rows.push([asText(p.label), `${request.sheet}!${p.cell}`, 0, 0, asText(groups[g].name)]);
    rows.push([
      null,
      null,
      `=IF(${scale}=0,0,PHZ.REAL(${src(p.cell)})/${scale})`,
      `=IF(${scale}=0,0,PHZ.IMAG(${src(p.cell)})/${scale})`,
      null,
    ]);
    const index = counters[g]++;
    const style = phasorStyle('starpoint', index, p.label);
    return {
      name: p.label,
      group: g,
      x: `${at(origin, 2)}:${at(origin + 1, 2)}`,
      y: `${at(origin, 3)}:${at(origin + 1, 3)}`,
      tipRow: top + origin + 1,
      colour: style.colour,
      lineStyle: LINE_STYLES[g % LINE_STYLES.length],
      marker: style.marker,
      markerStyle: MARKER_STYLES[style.marker],
      cell: p.cell,
    };
  });
  return {
    title,
    helperSheet,
    top,
    left,
    rows,
    range: `${at(0, 0)}:${at(rows.length - 1, HELPER_COLUMNS - 1)}`,
    groups,
    series,
    chartCell,
  };
}

/** A sheet name not in `taken`: `Phasor chart data`, then `Phasor chart data 2`, … */
export function freshSheetName(taken: readonly string[], base = 'Phasor chart data'): string {
  const lower = new Set(taken.map((t) => t.toLowerCase()));
  if (!lower.has(base.toLowerCase())) return base;
  for (let i = 2; ; i++) if (!lower.has(`${base} ${i}`.toLowerCase())) return `${base} ${i}`;
}

/** The chart's name in the workbook, unique among `taken`. */
export function freshChartName(taken: readonly string[]): string {
  const set = new Set(taken);
  for (let i = 1; ; i++) if (!set.has(`Phasor chart ${i}`)) return `Phasor chart ${i}`;
}
