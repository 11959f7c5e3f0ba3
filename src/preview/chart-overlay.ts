/**
 * Linked phasor charts in the preview: a chart object floats over the grid at its anchor
 * cell, reads its helper cells (the PHZ formulas a chart insertion wrote) and draws them
 * with the plot's own geometry, again after every recalculation.
 *
 * Its only contact with the grid is the grid's overlay hook: `overlayLayer` (an element that
 * scrolls with the cells), `cellBox(pos)` (where a cell sits in it), `onRepaint(listener)`
 * and `sheetName`. A grid that draws its cells another way (virtual scrolling) keeps the
 * charts working by keeping those four members.
 */
import { layoutPlot } from '../taskpane/plot/geometry';
import type { PlotData, PlotPhasor } from '../taskpane/plot/model';
import { renderSvg } from '../taskpane/plot/svg';
import { a1, type CellPos } from './address';
import { isDisplayError } from './engine';
import type { PreviewChart, Workbook } from './workbook';

export type { PreviewChart } from './workbook';

/** What the overlay needs from the grid (see the module comment). */
export interface OverlayHost {
  readonly sheetName: string;
  readonly overlayLayer: HTMLElement;
  cellBox(pos: CellPos): { left: number; top: number; width: number; height: number };
  onRepaint(listener: () => void): () => void;
}

/** The chart's picture data from its helper cells, or a message when a cell cannot be used. */
export function chartData(workbook: Workbook, chart: PreviewChart): PlotData | string {
  const { plan } = chart;
  const sheetId = workbook.hf.getSheetId(plan.helperSheet);
  if (sheetId === undefined) return `The helper sheet ${plan.helperSheet} is gone, so this chart has nothing to show.`;
  const num = (row: number, col: number): number | string => {
    const v = workbook.engine.display({ sheet: sheetId, row, col });
    if (typeof v === 'number' && Number.isFinite(v)) return v;
    const where = `${plan.helperSheet}!${a1({ row, col })}`;
    return isDisplayError(v) ? `${where} shows ${v.error}: ${v.message}` : `${where} does not hold a number.`;
  };
  const scales: number[] = [];
  for (const g of plan.groups) {
    const s = num(g.scaleRow, plan.left + 2);
    if (typeof s === 'string') return s;
    scales.push(s);
  }
  const counters = plan.groups.map(() => 0);
  const phasors: PlotPhasor[] = [];
  for (const s of plan.series) {
    const x = num(s.tipRow, plan.left + 2);
    if (typeof x === 'string') return x;
    const y = num(s.tipRow, plan.left + 3);
    if (typeof y === 'string') return y;
    phasors.push({ label: s.name, cell: s.cell, re: x * scales[s.group], im: y * scales[s.group], group: s.group, index: counters[s.group]++ });
  }
  return {
    source: plan.title,
    sheet: chart.sheet,
    groups: plan.groups.map((g) => ({ name: g.name, unit: g.unit })),
    phasors,
    unreadable: [],
    scaleMode: 'columns',
  };
}

export class ChartOverlay {
  private readonly elements = new Map<string, HTMLElement>();

  constructor(
    private readonly grid: OverlayHost,
    private readonly workbook: Workbook,
  ) {
    grid.onRepaint(() => this.render());
  }

  /** Names of the charts on `sheet`. */
  names(sheet: string): string[] {
    return this.workbook.charts.filter((c) => c.sheet === sheet).map((c) => c.name);
  }

  /** Adds a chart to the workbook (kept with it, drawn over the grid). */
  add(chart: PreviewChart): void {
    this.workbook.addChart(chart);
    this.render();
  }

  remove(name: string): void {
    this.workbook.removeChart(name);
    this.render();
  }

  /** Draws the charts of the shown sheet from their helper cells; hides the others. */
  render(): void {
    const layer = this.grid.overlayLayer;
    const doc = layer.ownerDocument;
    const charts = this.workbook.charts;
    for (const [name, element] of this.elements) {
      if (!charts.some((c) => c.name === name)) {
        element.remove();
        this.elements.delete(name);
      }
    }
    for (const chart of charts) {
      let box = this.elements.get(chart.name);
      if (!box) {
        box = doc.createElement('div');
        box.className = 'pv-chart';
        box.dataset.chart = chart.name;
        box.setAttribute('role', 'figure');
        box.setAttribute('aria-label', `${chart.name}: ${chart.plan.title}`);
        const head = doc.createElement('div');
        head.className = 'pv-chart-head';
        const title = doc.createElement('span');
        title.textContent = `${chart.plan.title} · ${chart.name}`;
        title.title = `Linked to the plotted cells through the helper cells ${chart.plan.helperSheet}!${chart.plan.range}`;
        const close = doc.createElement('button');
        close.type = 'button';
        close.className = 'pv-chart-close';
        close.textContent = '×';
        close.setAttribute('aria-label', `Remove ${chart.name} (its helper cells stay)`);
        close.addEventListener('click', () => this.remove(chart.name));
        head.append(title, close);
        const body = doc.createElement('div');
        body.className = 'pv-chart-body';
        box.append(head, body);
        layer.append(box);
        this.elements.set(chart.name, box);
      }
      const shown = chart.sheet === this.grid.sheetName;
      box.hidden = !shown;
      if (!shown) continue;
      const at = this.grid.cellBox(chart.at);
      box.style.left = `${at.left}px`;
      box.style.top = `${at.top}px`;
      const body = box.querySelector('.pv-chart-body') as HTMLElement;
      const data = chartData(this.workbook, chart);
      const svg =
        typeof data === 'string'
          ? ''
          : renderSvg(layoutPlot(data, { idPrefix: `pv-${chart.name.replace(/\W+/g, '-')}`, radius: 120 }));
      const key = typeof data === 'string' ? data : svg;
      const stamp = String(hash(key));
      // Only a changed picture is replaced, so recalculations that change nothing do not flicker.
      if (body.dataset.key !== stamp) {
        body.dataset.key = stamp;
        if (typeof data === 'string') {
          const p = doc.createElement('p');
          p.className = 'pv-chart-note';
          p.textContent = data;
          body.replaceChildren(p);
        } else body.innerHTML = svg;
      }
    }
  }
}

/** A short fingerprint of a long text (to tell whether a picture changed). */
function hash(text: string): number {
  let h = 2166136261;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 16777619);
  return h >>> 0;
}
