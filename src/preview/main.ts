/**
 * The preview workbook page: the engine with the whole registry, the demo workbook,
 * the grid, and the task pane docked beside it with a port onto the grid.
 */
import css from './preview.css?raw';
import chartCss from './chart-overlay.css?raw';
import { specs } from '../functions';
import { mountPane } from '../taskpane/pane';
import { loadDemo, DEMO_SHEET } from './demo';
import { PhzEngine } from './engine';
import { Grid } from './grid';
import { ChartOverlay } from './chart-overlay';
import { PreviewPlotPort } from './plot-port';
import { PreviewPort } from './port';
import { Workbook } from './workbook';

function adoptStyles(doc: Document, text: string): void {
  // A constructed stylesheet, so the page needs no inline <style> of its own.
  const sheet = new CSSStyleSheet();
  sheet.replaceSync(text);
  doc.adoptedStyleSheets = [...doc.adoptedStyleSheets, sheet];
}

function start(): void {
  adoptStyles(document, css);
  adoptStyles(document, chartCss);
  const bookRoot = document.getElementById('pv-book');
  const paneRoot = document.getElementById('pv-pane');
  if (!bookRoot || !paneRoot) throw new Error('preview.html lacks #pv-book or #pv-pane');

  const engine = new PhzEngine();
  const report = loadDemo(engine, specs);
  const workbook = new Workbook(engine);
  for (const s of report.styles) workbook.setStyle(s.sheet, s.row, s.col, s.style);
  const grid = new Grid(bookRoot, workbook);
  grid.showSheet(DEMO_SHEET);
  grid.select({ row: 5, col: 1 });
  const charts = new ChartOverlay(grid, workbook);
  mountPane(paneRoot, new PreviewPort(grid, workbook, new PreviewPlotPort(grid, workbook, charts)));
  grid.focus();
  const missing = report.skipped.length;
  grid.say(
    `Demo workbook loaded: ${specs.length} PHZ functions.` +
      (missing > 0 ? ` ${missing} demo line${missing === 1 ? '' : 's'} wait for functions not in the registry yet.` : ''),
  );
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
else start();
