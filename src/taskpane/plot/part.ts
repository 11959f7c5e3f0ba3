/**
 * The pane's "Phasor plot" part: plots the selected range live (selection and recalculation),
 * with a tip-to-tail view, an accessible data table, SVG and PNG export, and "Insert as
 * chart". Talks to the workbook only through the WorkbookPort; the picture itself comes from
 * the pure geometry (read.ts → geometry.ts → svg.ts).
 */
import plotCss from './plot.css?raw';
import { formatPolar } from '../../core/format';
import { plotMessages as M } from '../../core/messages';
import { rect } from '../../core/phasor';
import type { PanePart, PartHandle } from '../parts';
import type { PhasorChartRequest, PlotRange, WorkbookPort } from '../port';
import { CHART_MAX_PHASORS } from './chart-plan';
import { download, fileStem, pngFile, svgFile } from './export';
import { layoutPlot, type Drawing, type PlotView } from './geometry';
import type { PlotData, ScaleMode } from './model';
import { markerPath, renderSvg } from './svg';
import { phasorStyle, type PaletteName } from './palette';
import { PLOT_LIMITS, readSelection } from './read';
import { shortNumber } from './scale';
import { builder, ensureStyle, errorText } from '../dom';

const STYLE_ID = 'starpoint-plot-style';
/** Phasors ticked for tip to tail when a new block is selected (the first group, up to this many). */
const DEFAULT_CHAIN = 12;
let mounts = 0;

/** The chart request for what is plotted: one entry per phasor, grouped as on the plot. */
export function chartRequestOf(data: PlotData): PhasorChartRequest {
  const names = data.groups.map((g) => g.name);
  const title = names.length === 1 ? names[0] : names.length <= 3 ? names.join(', ') : `Phasors of ${data.source}`;
  return {
    title,
    sheet: data.sheet,
    phasors: data.phasors.map((p) => ({ label: p.label, cell: p.cell, group: data.groups[p.group].name })),
  };
}

function mountPlot(panel: HTMLElement, port: WorkbookPort | null): PartHandle {
  const doc = panel.ownerDocument;
  const h = builder(doc);
  const id = `spp${++mounts}`;
  ensureStyle(doc, STYLE_ID, plotCss);
  if (!port) {
    panel.replaceChildren(h('p', { className: 'sp-note', text: M.noWorkbook }));
    return {};
  }

  // ---- controls
  const viewRadios = (['origin', 'tipToTail'] as const).map((v) => {
    const input = h('input', { attrs: { type: 'radio', name: `${id}-view`, value: v, id: `${id}-view-${v}` } });
    input.checked = v === 'origin';
    return { v, input, label: h('label', { attrs: { for: `${id}-view-${v}` }, text: v === 'origin' ? 'From the origin' : 'Tip to tail' }) };
  });
  const scaleSelect = h(
    'select',
    { attrs: { id: `${id}-scales` } },
    h('option', { attrs: { value: 'auto' }, text: 'Automatic' }),
    h('option', { attrs: { value: 'columns' }, text: 'One per column' }),
    h('option', { attrs: { value: 'rows' }, text: 'One per row' }),
    h('option', { attrs: { value: 'one' }, text: 'One for all' }),
  );
  const paletteSelect = h(
    'select',
    { attrs: { id: `${id}-palette` } },
    h('option', { attrs: { value: 'starpoint' }, text: 'Starpoint (colour and shape)' }),
    h('option', { attrs: { value: 'iec60445' }, text: 'IEC 60445 conductor colours' }),
  );
  const button = (text: string, label?: string) => h('button', { className: 'sp-plot-button', text, attrs: { type: 'button', ...(label ? { 'aria-label': label } : {}) } });
  const follow = h('input', { attrs: { type: 'checkbox', id: `${id}-follow` } });
  follow.checked = true;
  const refreshButton = button('Refresh', 'Read the cells again');
  const svgButton = button('Save SVG', 'Save the plot as an SVG file');
  const pngButton = button('Save PNG', 'Save the plot as a PNG picture');
  const chartButton = button('Insert as chart', 'Insert a chart linked to these cells into the workbook');

  const support = port.plotSupport();
  const missing = [support.read, support.recalc, support.chart].filter((s): s is string => s !== null);
  const supportNote = missing.length > 0 ? h('ul', { className: 'sp-plot-support', attrs: { role: 'note' } }, ...missing.map((m) => h('li', { text: m }))) : null;
  if (support.chart) chartButton.disabled = true;

  const status = h('p', { className: 'sp-plot-status', attrs: { role: 'status', 'aria-live': 'polite', id: `${id}-status` } });
  const figure = h('div', { className: 'sp-plot-figure', attrs: { 'data-plot': '' } });
  const unreadableBox = h('div', { className: 'sp-plot-unreadable' });
  unreadableBox.hidden = true;
  const tbody = h('tbody');
  const table = h(
    'table',
    { className: 'sp-plot-table' },
    h('caption', { text: 'Phasors plotted' }),
    h(
      'thead',
      {},
      h(
        'tr',
        {},
        ...['Sum', 'Phasor', 'Group', 'Magnitude', 'Angle', 'Cell'].map((t) =>
          h('th', { text: t, attrs: { scope: 'col', ...(t === 'Sum' ? { title: 'Tick phasors to add them tip to tail' } : {}) } }),
        ),
      ),
    ),
    tbody,
  );
  table.hidden = true;
  const actionStatus = h('p', { className: 'sp-plot-status', attrs: { role: 'status', 'aria-live': 'polite' } });
  const tipStatus = h('p', { className: 'sp-plot-status sp-plot-tip', attrs: { 'aria-live': 'polite' } });

  const viewGroup = h(
    'fieldset',
    { className: 'sp-plot-view' },
    h('legend', { text: 'View' }),
    ...viewRadios.flatMap((r) => [r.input, r.label]),
  );
  panel.replaceChildren(
    h(
      'section',
      { className: 'sp-plot', attrs: { 'aria-label': 'Phasor plot of the selection' } },
      supportNote,
      h(
        'div',
        { className: 'sp-plot-bar' },
        viewGroup,
        h('span', { className: 'sp-plot-field' }, h('label', { attrs: { for: scaleSelect.id }, text: 'Scales' }), scaleSelect),
        h('span', { className: 'sp-plot-field' }, h('label', { attrs: { for: paletteSelect.id }, text: 'Colours' }), paletteSelect),
        h(
          'span',
          { className: 'sp-plot-field' },
          follow,
          h('label', { attrs: { for: follow.id, title: 'Untick to keep plotting these cells while you select and edit others' }, text: 'Follow the selection' }),
        ),
      ),
      h('div', { className: 'sp-plot-actions' }, refreshButton, svgButton, pngButton, chartButton),
      status,
      figure,
      tipStatus,
      unreadableBox,
      h('div', { className: 'sp-plot-table-wrap' }, table),
      actionStatus,
    ),
  );

  // ---- state
  let data: PlotData | null = null;
  let drawing: Drawing | null = null;
  let svgText = '';
  let tableKey = '';
  let cellsKey = '';
  let chain: string[] = [];
  let stop: (() => Promise<void>) | null = null;
  let busy = false;
  let again = false;
  let visible = false;
  /** The block kept while "Follow the selection" is off. */
  let pinned: PlotRange | undefined;

  const view = (): PlotView => (viewRadios.find((r) => r.input.checked)?.v ?? 'origin');
  const palette = () => paletteSelect.value as PaletteName;
  const setExports = (on: boolean) => {
    svgButton.disabled = !on;
    pngButton.disabled = !on;
    chartButton.disabled = !on || support.chart !== null;
  };
  setExports(false);

  function clearPlot(text: string): void {
    data = null;
    drawing = null;
    status.textContent = text;
    if (svgText !== '') figure.replaceChildren();
    svgText = '';
    table.hidden = true;
    tableKey = '';
    tipStatus.textContent = '';
    setExports(false);
  }

  function renderUnreadable(d: PlotData): void {
    unreadableBox.hidden = d.unreadable.length === 0;
    if (d.unreadable.length === 0) return;
    unreadableBox.replaceChildren(
      h('h3', { text: `Not plotted: ${d.unreadable.length} cell${d.unreadable.length === 1 ? '' : 's'} could not be read` }),
      h('ul', {}, ...d.unreadable.slice(0, 50).map((u) => h('li', { attrs: { 'data-cell': u.cell } }, h('strong', { text: u.cell }), ` ${u.message.startsWith(`${u.cell}: `) ? u.message.slice(u.cell.length + 2) : u.message}`))),
      ...(d.unreadable.length > 50 ? [h('p', { text: `… and ${d.unreadable.length - 50} more.` })] : []),
    );
  }

  function renderTable(d: PlotData): void {
    const key = JSON.stringify([d.source, d.groups, d.phasors, chain, palette()]);
    if (key === tableKey) return;
    tableKey = key;
    table.hidden = false;
    tbody.replaceChildren(
      ...d.phasors.map((p) => {
        const g = d.groups[p.group];
        const unit = g.unit ? ` ${g.unit}` : '';
        const box = h('input', { attrs: { type: 'checkbox', 'aria-label': `Add ${p.label} tip to tail` } });
        box.checked = chain.includes(p.cell);
        box.addEventListener('change', () => {
          chain = box.checked ? [...chain, p.cell] : chain.filter((c) => c !== p.cell);
          if (box.checked && view() !== 'tipToTail') {
            const radio = viewRadios.find((r) => r.v === 'tipToTail');
            if (radio) radio.input.checked = true;
          }
          draw();
        });
        const style = phasorStyle(palette(), p.index, p.label);
        const swatch = h('span', { className: 'sp-plot-swatch', attrs: { 'aria-hidden': 'true' } });
        swatch.innerHTML = `<svg width="14" height="14" viewBox="0 0 14 14">${markerPath(style.marker, 7, 7, 10, style.colour)}</svg>`;
        const mag = Math.hypot(p.re, p.im);
        return h(
          'tr',
          { attrs: { 'data-cell': p.cell } },
          h('td', {}, box),
          h('th', { attrs: { scope: 'row' } }, swatch, p.label),
          h('td', { text: g.name }),
          h('td', { className: 'sp-num', text: `${shortNumber(mag, 6)}${unit}`, attrs: { title: formatPolar(rect(p.re, p.im), 15) } }),
          h('td', { className: 'sp-num', text: `${shortNumber(p.re === 0 && p.im === 0 ? 0 : (Math.atan2(p.im, p.re) * 180) / Math.PI, 5)}°` }),
          h('td', { text: p.cell }),
        );
      }),
    );
  }

  /** Lays out and draws `data` with the current options; the DOM changes only when the picture does. */
  function draw(): void {
    const d = data;
    if (!d) return;
    const chainIdx = chain.map((c) => d.phasors.findIndex((p) => p.cell === c)).filter((i) => i >= 0);
    drawing = layoutPlot(d, { palette: palette(), view: view(), chain: chainIdx, idPrefix: id });
    const svg = renderSvg(drawing);
    if (svg !== svgText) {
      svgText = svg;
      figure.innerHTML = svg;
    }
    renderTable(d);
    const groups = new Set(chainIdx.map((i) => d.phasors[i].group));
    tipStatus.textContent = view() !== 'tipToTail' ? '' : chainIdx.length < 2 ? M.tipToTailNone : groups.size > 1 ? M.tipToTailMixed : '';
  }

  async function readAndDraw(): Promise<void> {
    let block;
    try {
      block = await port!.readSelection(PLOT_LIMITS.maxCells, pinned);
    } catch (e) {
      clearPlot(M.readFailed(port!.hostName, errorText(e)));
      return;
    }
    const source = `${block.sheet}!${block.selected}`;
    if (block.cellCount > PLOT_LIMITS.maxCells) return clearPlot(M.tooManyCells(source, block.cellCount, PLOT_LIMITS.maxCells));
    const next = readSelection(block, scaleSelect.value as ScaleMode);
    // A block of labels and notes is not a list of mistakes: cells are listed when some
    // phasors were read, or when the one cell selected cannot be.
    renderUnreadable(next.phasors.length > 0 || block.cellCount === 1 ? next : { ...next, unreadable: [] });
    if (next.phasors.length === 0) return clearPlot(block.cellCount === 0 ? M.pick : M.noPhasors(source, block.cellCount === 1 ? next.unreadable.length : 0));
    if (next.phasors.length > PLOT_LIMITS.maxPhasors) return clearPlot(M.tooManyPhasors(source, next.phasors.length, PLOT_LIMITS.maxPhasors));
    // A new block of cells starts with its first group ticked for tip to tail.
    const key = `${next.source}|${next.phasors.map((p) => p.cell).join(',')}`;
    if (key !== cellsKey) {
      cellsKey = key;
      chain = next.phasors.filter((p) => p.group === 0).slice(0, DEFAULT_CHAIN).map((p) => p.cell);
    }
    data = next;
    status.textContent = M.plotted(next.source, next.phasors.length, next.groups.length);
    setExports(true);
    draw();
  }

  /** Reads and draws; events that arrive meanwhile cause one more round, not one each. */
  async function refresh(): Promise<void> {
    if (busy) {
      again = true;
      return;
    }
    busy = true;
    try {
      do {
        again = false;
        await readAndDraw();
      } while (again);
    } finally {
      busy = false;
    }
  }

  for (const r of viewRadios) r.input.addEventListener('change', draw);
  paletteSelect.addEventListener('change', draw);
  scaleSelect.addEventListener('change', () => void refresh());
  refreshButton.addEventListener('click', () => void refresh());
  follow.addEventListener('change', () => {
    pinned = follow.checked || !data ? undefined : { sheet: data.sheet, address: data.source.slice(data.sheet.length + 1) };
    if (!follow.checked && !pinned) follow.checked = true;
    void refresh();
  });
  svgButton.addEventListener('click', () => {
    if (!data || !svgText) return;
    download(doc, svgFile(svgText), `${fileStem(data.source)}.svg`);
    actionStatus.textContent = `Saved ${fileStem(data.source)}.svg.`;
  });
  pngButton.addEventListener('click', () => {
    if (!data || !drawing) return;
    const name = `${fileStem(data.source)}.png`;
    pngFile(doc, svgText, drawing.width, drawing.height)
      .then((blob) => {
        download(doc, blob, name);
        actionStatus.textContent = `Saved ${name}.`;
      })
      .catch((e: unknown) => {
        actionStatus.textContent = `Could not make the PNG: ${errorText(e)}.`;
      });
  });
  chartButton.addEventListener('click', () => {
    if (!data) return;
    if (data.phasors.length > CHART_MAX_PHASORS) {
      actionStatus.textContent = M.chartTooMany(data.phasors.length, CHART_MAX_PHASORS);
      return;
    }
    chartButton.disabled = true;
    actionStatus.textContent = 'Inserting the chart…';
    port
      .insertPhasorChart(chartRequestOf(data))
      .then((r) => {
        actionStatus.textContent = `Inserted ${r.chartName}, linked to the plotted cells through the helper cells ${r.helperRange}.`;
      })
      .catch((e: unknown) => {
        actionStatus.textContent = `Could not insert the chart: ${errorText(e)}`;
      })
      .finally(() => {
        chartButton.disabled = support.chart !== null || !data;
      });
  });

  async function start(): Promise<void> {
    if (stop || !visible) return;
    if (support.read) {
      clearPlot(support.read);
      return;
    }
    try {
      // With the block kept, a selection change alone does not move the plot.
      const off = await port!.watchSelection((why) => {
        if (why === 'values' || !pinned) void refresh();
      });
      if (!visible) {
        await off();
        return;
      }
      stop = off;
    } catch (e) {
      status.textContent = `The plot cannot follow the selection: ${errorText(e)}. Use Refresh.`;
    }
    await refresh();
  }

  async function halt(): Promise<void> {
    const off = stop;
    stop = null;
    if (off) await off().catch(() => undefined);
  }

  return {
    show() {
      visible = true;
      void start();
    },
    hide() {
      visible = false;
      void halt();
    },
    dispose() {
      visible = false;
      void halt();
    },
  };
}

/** The "Phasor plot" tab of the pane. */
export const plotPart: PanePart = {
  id: 'plot',
  label: 'Phasor plot',
  mount: mountPlot,
};
