/**
 * The preview workbook page: the engine with the whole registry, the demo workbook (or the
 * one kept in this browser), the grid, the task pane docked beside it with a port onto the
 * grid, and the workbook's own actions: New, Open and Save as .xlsx.
 */
import css from './preview.css?raw';
import chartCss from './chart-overlay.css?raw';
import { workbookMessages as M } from '../core/messages';
import { specs } from '../functions';
import { mountPane } from '../taskpane/pane';
import { a1, parseA1 } from './address';
import { loadDemo, DEMO_SHEET } from './demo';
import { PhzEngine } from './engine';
import { Grid } from './grid';
import { ChartOverlay } from './chart-overlay';
import { indexedDbStore, Keeper } from './keep';
import { PreviewPlotPort } from './plot-port';
import { PreviewPort } from './port';
import { Workbook } from './workbook';
import type { WorkbookDocument } from './workbook';
import { FileError, prepareSave } from './xlsx';
import { xlsxTasks } from './xlsx-client';
import type { XlsxTasks } from './xlsx-client';

function adoptStyles(doc: Document, text: string): void {
  // A constructed stylesheet, so the page needs no inline <style> of its own.
  const sheet = new CSSStyleSheet();
  sheet.replaceSync(text);
  doc.adoptedStyleSheets = [...doc.adoptedStyleSheets, sheet];
}

/** The demo workbook as a document (built in an engine of its own). */
function demoDocument(): { doc: WorkbookDocument; skipped: number } {
  const engine = new PhzEngine();
  const report = loadDemo(engine, specs);
  const book = new Workbook(engine);
  for (const s of report.styles) book.setStyle(s.sheet, s.row, s.col, s.style);
  const doc = book.toDocument();
  engine.hf.destroy();
  return { doc, skipped: report.skipped.length };
}

function button(doc: Document, text: string, title: string): HTMLButtonElement {
  const b = doc.createElement('button');
  b.type = 'button';
  b.className = 'pv-button';
  b.textContent = text;
  b.title = title;
  return b;
}

const VIEW_KEY = 'starpoint-preview-view';

/** The sheet and cell shown last, so a reload comes back to them (as a spreadsheet reopens where it was). */
function readView(): { sheet: string; cell: string } | undefined {
  try {
    const v = JSON.parse(localStorageOrUndefined()?.getItem(VIEW_KEY) ?? 'null') as { sheet?: unknown; cell?: unknown } | null;
    return typeof v?.sheet === 'string' && typeof v.cell === 'string' ? { sheet: v.sheet, cell: v.cell } : undefined;
  } catch {
    return undefined;
  }
}

function saveView(grid: Grid): void {
  try {
    localStorageOrUndefined()?.setItem(VIEW_KEY, JSON.stringify({ sheet: grid.sheetName, cell: a1(grid.activeCell) }));
  } catch {
    // not kept: the workbook still is
  }
}

function localStorageOrUndefined(): Storage | undefined {
  try {
    return window.localStorage;
  } catch {
    return undefined;
  }
}

async function start(): Promise<void> {
  adoptStyles(document, css);
  adoptStyles(document, chartCss);
  const bookRoot = document.getElementById('pv-book');
  const paneRoot = document.getElementById('pv-pane');
  if (!bookRoot || !paneRoot) throw new Error('preview.html lacks #pv-book or #pv-pane');

  // the demo is built only when it is needed (no kept workbook, New, a kept one unreadable)
  let demo: { doc: WorkbookDocument; skipped: number } | undefined;
  const theDemo = () => (demo ??= demoDocument());
  const workbook = new Workbook(new PhzEngine());
  const keeper = new Keeper(workbook, {
    store: indexedDbStore(),
    journal: localStorageOrUndefined(),
    onProblem: (why) => grid.say(M.storageFailed(why)),
  });
  let restored: string | undefined;
  let problem: string | undefined;
  try {
    const found = await keeper.restore(() => workbook.load(theDemo().doc));
    if (found?.copy) restored = M.restored(new Date(found.copy.savedAt).toLocaleString());
    else if (found && found.replayed > 0) restored = M.restored('just now');
    else workbook.load(theDemo().doc);
  } catch (e) {
    workbook.load(theDemo().doc);
    problem = M.restoreFailed(e instanceof Error ? e.message : String(e));
  }

  const grid = new Grid(bookRoot, workbook);
  const charts = new ChartOverlay(grid, workbook);
  mountPane(paneRoot, new PreviewPort(grid, workbook, new PreviewPlotPort(grid, workbook, charts)));
  const view = restored ? readView() : undefined;
  if (view && workbook.sheetNames().includes(view.sheet)) {
    grid.showSheet(view.sheet);
    const at = parseA1(view.cell);
    if (at) grid.select(at);
  } else if (workbook.sheetNames().includes(DEMO_SHEET) && !restored) {
    grid.showSheet(DEMO_SHEET);
    grid.select({ row: 5, col: 1 });
  }
  grid.onSelectionChange(() => saveView(grid));
  // the file worker: ExcelJS reads and writes files there, so the grid stays usable meanwhile
  const files = xlsxTasks(typeof Worker === 'undefined' ? undefined : () => new Worker(new URL('./xlsx-worker.ts', import.meta.url), { name: 'preview-file-worker' }));
  addWorkbookActions(grid, workbook, keeper, () => theDemo().doc, files);
  keeper.start();
  // a hidden page may never come back (tab closed, browser quit): write the copy now
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') void keeper.flushIfChanged();
  });
  window.addEventListener('pagehide', () => void keeper.flushIfChanged());
  grid.focus();
  if (problem) grid.say(problem);
  else if (restored) grid.say(restored);
  else {
    grid.say(
      `Demo workbook loaded: ${specs.length} PHZ functions. Your edits are kept in this browser.` +
        (theDemo().skipped > 0 ? ` ${theDemo().skipped} demo line${theDemo().skipped === 1 ? '' : 's'} wait for functions not in the registry yet.` : ''),
    );
  }
}

/** Says `text(seconds)` in the status line now and every half second until the returned function is called. */
function ticking(grid: Grid, text: (seconds: number) => string): () => void {
  const started = Date.now();
  const say = () => grid.say(text(Math.floor((Date.now() - started) / 1000)));
  say();
  const timer = setInterval(say, 500);
  return () => clearInterval(timer);
}

/** Lets the page paint (the status line) before a long piece of work in the page. */
function nextPaint(): Promise<void> {
  return new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
}

/** New workbook, Open (.xlsx) and Save as .xlsx, in the formula bar row. */
function addWorkbookActions(grid: Grid, workbook: Workbook, keeper: Keeper, demo: () => WorkbookDocument, files: XlsxTasks): void {
  const doc = grid.element.ownerDocument;
  const newButton = button(doc, 'New', 'New workbook: the demo workbook again (asks first; Ctrl+Z brings this one back)');
  const openButton = button(doc, 'Open…', 'Open an .xlsx file (replaces this workbook; Ctrl+Z brings it back)');
  const saveButton = button(doc, 'Save .xlsx', 'Save this workbook as an .xlsx file');
  const picker = doc.createElement('input');
  picker.type = 'file';
  picker.accept = '.xlsx,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
  picker.hidden = true;
  picker.setAttribute('aria-label', 'Open an .xlsx file');
  const group = doc.createElement('span');
  group.className = 'pv-file';
  group.setAttribute('role', 'group');
  group.setAttribute('aria-label', 'Workbook');
  group.append(newButton, openButton, saveButton, picker);
  grid.bar.append(group);

  newButton.addEventListener('click', () => {
    if (!window.confirm(M.confirmNew)) return;
    workbook.replaceWith(demo(), 'New workbook');
    grid.showSheet(DEMO_SHEET);
    void keeper.flush();
    grid.say('New workbook: the demo workbook. Ctrl+Z brings back the one before.');
    grid.focus();
  });

  openButton.addEventListener('click', () => picker.click());
  picker.addEventListener('change', () => {
    const file = picker.files?.[0];
    picker.value = '';
    if (!file) return;
    void (async () => {
      openButton.disabled = true;
      // read in the file worker: the grid stays usable (and what is typed meanwhile goes into
      // the workbook the file replaces, which Ctrl+Z brings back)
      const stop = ticking(grid, (s) => M.reading(file.name, file.size / 1024 / 1024, s));
      try {
        const reading = files.read(await file.arrayBuffer(), file.name);
        // the copy of this workbook that Ctrl+Z brings back, taken while the worker reads
        // (taken again at the end if anything is changed meanwhile)
        const current = files.inWorker ? workbook.snapshot() : undefined;
        const read = await reading;
        stop();
        if (!window.confirm(M.confirmOpen(file.name))) {
          grid.say('Nothing was opened.');
          return;
        }
        grid.say(M.opening(file.name, read.cells));
        await nextPaint();
        workbook.replaceWith(read.doc, `Open ${file.name}`, current);
        grid.showSheet(read.doc.sheets[0].name);
        grid.say(M.opened(file.name, read.doc.sheets.length, read.cells, read.skipped));
        // written once the opened workbook is shown
        setTimeout(() => void keeper.flush(), 0);
      } catch (e) {
        stop();
        grid.say(e instanceof FileError ? e.message : M.fileUnreadable(file.name, e instanceof Error ? e.message : String(e)));
      } finally {
        openButton.disabled = false;
      }
      grid.focus();
    })();
  });

  saveButton.addEventListener('click', () => {
    void (async () => {
      const name = `${grid.sheetName.replace(/[\\/:*?"<>|]+/g, '_') || 'workbook'}.xlsx`;
      saveButton.disabled = true;
      let stop = (): void => undefined;
      try {
        // what the cells hold and show is read here, at once; the file is built in the worker
        const data = prepareSave({
          doc: workbook.toDocument(),
          valueAt: (sheet, row, col) => workbook.engine.display({ sheet: workbook.sheetId(sheet), row, col }),
          spillAt: (sheet, row, col) => workbook.engine.spillSize({ sheet: workbook.sheetId(sheet), row, col }),
          widthsPx: (sheet, count) => grid.columnPixels(sheet, count),
        });
        stop = ticking(grid, (s) => M.saving(s));
        const bytes = await files.build(data);
        stop();
        const url = URL.createObjectURL(new Blob([bytes], { type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' }));
        const link = doc.createElement('a');
        link.href = url;
        link.download = name;
        doc.body.append(link);
        link.click();
        link.remove();
        setTimeout(() => URL.revokeObjectURL(url), 10_000);
        grid.say(M.saved(name));
      } catch (e) {
        stop();
        grid.say(`The workbook could not be saved as .xlsx: ${e instanceof Error ? e.message : String(e)}`);
      } finally {
        saveButton.disabled = false;
      }
    })();
  });
}

function run(): void {
  start().catch((e: unknown) => {
    console.error('preview: could not start', e);
  });
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', run);
else run();
