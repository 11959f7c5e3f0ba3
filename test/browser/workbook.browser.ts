/**
 * The preview as a dependable workbook, in a real browser: typing survives a reload (and
 * closing the tab); a paste of 40,000 rows with a PHZ.DIV per row, an edit, undo and redo
 * of the whole block; row 100,000 reached by the name box, by Ctrl+Down and by scrolling,
 * and edited; save as .xlsx and open it again with the same cells; a file that cannot be
 * read leaves the workbook as it was; New asks first; bad input (a tiny number, a formula
 * nested too deeply, a 100 kB formula) gives an error in its cell and never a page error.
 * Timings are printed (and go to test-artifacts/timings.json) for the report; the speed
 * targets themselves live in `npm run bench`.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import * as ExcelJS from 'exceljs';
import { chromium } from 'playwright-core';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateFormula } from '../../src/preview/engine';
import { formatNumber } from '../../src/preview/format';
import { cellText, demoSheetNames, goTo, reveal, typeIn } from './grid';
import { CHROMIUM_ARGS, chromiumPath, repoRoot, startServer } from './server';
import type { RunningServer } from './server';

let server: RunningServer;
let browser: Browser;
let context: BrowserContext;
let page: Page;
const problems: string[] = [];
const artifacts = path.join(repoRoot, 'test-artifacts');
const timings: Record<string, number> = {};
const ROWS = 40_000;
/** The sheet the 40,000 rows go to (added by the test). */
let bigSheet = '';

const nameBox = () => page.locator('#pv-namebox');
const formulaBar = () => page.getByLabel('Formula', { exact: true });
const status = () => page.locator('.pv-status');

const go = (address: string) => goTo(page, address);

const typeInto = (address: string, text: string) => typeIn(page, address, text);

const text = (address: string) => cellText(page, address);

async function open(p: Page): Promise<void> {
  p.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  p.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console ${m.type()}: ${m.text()}`);
  });
  await p.goto(`${server.origin}/preview.html`);
  await p.locator('.pv-cell').first().waitFor();
}

/** Runs `action` in the page and returns how long it took there (ms), including the repaint it caused. */
async function timed(name: string, action: () => Promise<unknown>): Promise<number> {
  const start = Date.now();
  await action();
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => r(null))));
  const ms = Date.now() - start;
  timings[name] = ms;
  console.log(`${name}: ${ms} ms`);
  return ms;
}

/**
 * Starts noting the longest time the page did not get to run a timer (a frozen page), and
 * returns a function that stops and gives it in ms: printed with the timings, never asserted.
 */
async function watchBlocking(): Promise<() => Promise<number>> {
  await page.evaluate(() => {
    const w = window as unknown as { blockWatch?: { longest: number; stop: boolean } };
    const watch = { longest: 0, stop: false };
    w.blockWatch = watch;
    let last = performance.now();
    const tick = () => {
      const now = performance.now();
      watch.longest = Math.max(watch.longest, now - last);
      last = now;
      if (!watch.stop) setTimeout(tick, 0);
    };
    tick();
  });
  return () =>
    page.evaluate(() => {
      const watch = (window as unknown as { blockWatch: { longest: number; stop: boolean } }).blockWatch;
      watch.stop = true;
      return Math.round(watch.longest);
    });
}

/** Pastes `text` as the system clipboard would deliver it (a paste event with text/plain). */
async function pasteText(tsv: string): Promise<void> {
  await page.evaluate((t) => {
    const data = new DataTransfer();
    data.setData('text/plain', t);
    (document.querySelector('.pv-scroll') as HTMLElement).focus();
    document.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true }));
  }, tsv);
}

async function key(combo: string): Promise<void> {
  await page.locator('.pv-scroll').focus();
  await page.keyboard.press(combo);
}

/** Dividend, divisor and a PHZ.DIV per row whose digits argument is the common input E1. */
function bigBlock(): string {
  return Array.from({ length: ROWS }, (_, i) => `${200 + (i % 50)}∠${(i % 360) - 180}\t${5 + (i % 7)}+j${1 + (i % 5)}\t=PHZ.DIV(A${i + 1},B${i + 1},$E$1)`).join('\n');
}

/** What row `i` (0-based) of the block shows in column C, from the engine in node. */
function expectedC(i: number, digits: number): string {
  return String(evaluateFormula(`=PHZ.DIV("${200 + (i % 50)}∠${(i % 360) - 180}", "${5 + (i % 7)}+j${1 + (i % 5)}", ${digits})`)[0][0]);
}

beforeAll(async () => {
  mkdirSync(artifacts, { recursive: true });
  server = await startServer();
  browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });
  context = await browser.newContext({ viewport: { width: 1440, height: 900 }, acceptDownloads: true });
  page = await context.newPage();
  await open(page);
});

afterAll(async () => {
  writeFileSync(path.join(artifacts, 'timings.json'), `${JSON.stringify(timings, null, 2)}\n`);
  await browser?.close();
  await server?.stop();
});

describe('keeps your work', () => {
  it('keeps what was typed across a reload, at once (no waiting for the copy)', async () => {
    await typeInto('H4', '12.5+j3');
    await typeInto('H5', '=PHZ.MAG(H4)');
    await page.reload();
    await page.locator('.pv-cell').first().waitFor();
    await expect.poll(() => status().textContent()).toMatch(/restored from this browser/);
    await expect.poll(() => text('H4')).toBe('12.5+j3');
    expect(await text('H5')).toBe(formatNumber(Math.hypot(12.5, 3)));
  });

  it('keeps it when the tab is closed and the preview opened again', async () => {
    await typeInto('H6', 'closed tab');
    await page.close();
    page = await context.newPage();
    await open(page);
    await expect.poll(() => text('H6')).toBe('closed tab');
    expect(await text('H4')).toBe('12.5+j3');
  });

  it('keeps a formula that fails and the edits around it', async () => {
    await typeInto('H7', '=PHZ.DIV(H4, 0)');
    await typeInto('H8', 'after the error');
    await page.reload();
    await page.locator('.pv-cell').first().waitFor();
    await expect.poll(() => text('H8')).toBe('after the error');
    expect(await text('H7')).toBe('#VALUE!');
    await go('H7');
    expect(await formulaBar().inputValue()).toBe('=PHZ.DIV(H4, 0)');
  });
});

describe('holds 100,000 rows', () => {
  it('pastes 40,000 rows × 3 columns with a PHZ.DIV per row, as one step', async () => {
    await page.getByRole('button', { name: 'Add sheet' }).click();
    bigSheet = (await page.locator('.pv-tab[aria-selected="true"]').textContent()) ?? '';
    await typeInto('E1', '6');
    await go('A1');
    await timed('paste 40,000 rows × 3 columns', () => pasteText(bigBlock()));
    await expect.poll(() => status().textContent()).toContain('Pasted 40,000×3 cells of text into A1:C40000');
    await go(`C${ROWS}`);
    expect(await text(`C${ROWS}`)).toBe(expectedC(ROWS - 1, 6));
    expect(await text('C1')).toBe(expectedC(0, 6));
    await page.screenshot({ path: path.join(artifacts, 'large-sheet-end.png') });
  });

  it('recalculates all 40,000 rows when their common input changes, and undoes it', async () => {
    await go('E1');
    await page.keyboard.type('3');
    await timed('edit that recalculates 40,000 rows', () => page.keyboard.press('Enter'));
    await go(`C${ROWS}`);
    expect(await text(`C${ROWS}`)).toBe(expectedC(ROWS - 1, 3));
    await timed('undo of that edit', () => key('Control+z'));
    expect(await text(`C${ROWS}`)).toBe(expectedC(ROWS - 1, 6));
  });

  it('undoes and redoes the whole 40,000-row paste at once', async () => {
    await timed('undo of the 40,000-row paste', () => key('Control+z'));
    await expect.poll(() => status().textContent()).toContain('Undid: Paste');
    expect(await text(`C${ROWS}`)).toBe('');
    expect(await text('A1')).toBe('');
    await timed('redo of the 40,000-row paste', () => key('Control+y'));
    expect(await text(`C${ROWS}`)).toBe(expectedC(ROWS - 1, 6));
  });

  it('reaches row 100,000 by scrolling: the scrolled area grows past the used rows, as in a spreadsheet', async () => {
    await go('A1');
    const rowPx = 23;
    const height = () => page.evaluate(() => (document.querySelector('.pv-scroll') as HTMLElement).scrollHeight);
    expect(await height()).toBeLessThan((ROWS + 2000) * rowPx);
    // scroll to the end again and again: the area grows each time, as a spreadsheet's does
    for (let i = 0; i < 100 && (await height()) < 100_000 * rowPx; i++) {
      await page.evaluate(() => {
        const s = document.querySelector('.pv-scroll') as HTMLElement;
        s.scrollTop = s.scrollHeight;
      });
      await page.waitForTimeout(40);
    }
    expect(await height()).toBeGreaterThan(100_000 * rowPx);
    // then drag the scroll thumb back to row 100,000
    await page.evaluate((y) => {
      (document.querySelector('.pv-scroll') as HTMLElement).scrollTop = y;
    }, 99_990 * rowPx);
    await expect.poll(() => page.locator('.pv-cell[data-cell="A100000"]').count()).toBe(1);
    await page.locator('.pv-cell[data-cell="A100000"]').click();
    await expect.poll(() => nameBox().inputValue()).toBe('A100000');
    expect(await text('B100000')).toBe('');
    await page.screenshot({ path: path.join(artifacts, 'large-sheet-scrolled.png') });
  });

  it('reaches row 100,000 by the name box and edits it', async () => {
    await go('B100000');
    await page.keyboard.type('=PHZ.MAG("3+j4")');
    await page.keyboard.press('Enter');
    await expect.poll(() => text('B100000')).toBe('5');
    await expect.poll(() => nameBox().inputValue()).toBe('B100001');
    await page.screenshot({ path: path.join(artifacts, 'large-sheet-row-100000.png') });
  });

  it('reaches the last row by Ctrl+Down, and the top by Ctrl+Home', async () => {
    await go('F1');
    await key('Control+ArrowDown');
    await expect.poll(() => nameBox().inputValue()).toBe('F1048576');
    await key('Control+Home');
    await expect.poll(() => nameBox().inputValue()).toBe('A1');
    await go('A1');
    await key('Control+ArrowDown');
    await expect.poll(() => nameBox().inputValue()).toBe(`A${ROWS}`);
  });

  it('scrolls smoothly: a frame of scrolling draws only the cells in view', async () => {
    await go('A20000');
    const frames = await page.evaluate(async () => {
      const s = document.querySelector('.pv-scroll') as HTMLElement;
      const times: number[] = [];
      for (let i = 0; i < 30; i++) {
        const t = performance.now();
        s.scrollTop += 400;
        await new Promise((r) => requestAnimationFrame(() => r(null)));
        times.push(performance.now() - t);
      }
      return times.sort((a, b) => a - b);
    });
    timings['scroll frame, median (ms)'] = Math.round(frames[15]);
    timings['scroll frame, slowest (ms)'] = Math.round(frames[frames.length - 1]);
    console.log(`scroll frames: median ${frames[15].toFixed(1)} ms, slowest ${frames[frames.length - 1].toFixed(1)} ms`);
    expect(await page.locator('.pv-cell[data-cell]').count()).toBeLessThan(3000);
  });

  it('keeps the 40,000 rows across a reload', async () => {
    await timed('reload with 40,000 rows (to the first paint)', async () => {
      await page.reload();
      await page.locator('.pv-cell').first().waitFor();
    });
    // the page comes back to the sheet and cell shown last
    expect(await page.locator('.pv-tab[aria-selected="true"]').textContent()).toBe(bigSheet);
    expect(await nameBox().inputValue()).toBe('A20000');
    await go(`C${ROWS}`);
    expect(await text(`C${ROWS}`)).toBe(expectedC(ROWS - 1, 6));
    expect(await text('B100000')).toBe('5');
  });
});

describe('opens and saves .xlsx', () => {
  let saved = '';

  it('saves the workbook as an .xlsx file that Excel can read, built in the file worker', async () => {
    const blocking = await watchBlocking();
    const started = Date.now();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save .xlsx' }).click()]);
    timings['save as .xlsx (40,000 rows), to the file'] = Date.now() - started;
    timings['save as .xlsx: longest the page was blocked (ms)'] = await blocking();
    console.log(`save as .xlsx: ${timings['save as .xlsx (40,000 rows), to the file']} ms; page blocked at most ${timings['save as .xlsx: longest the page was blocked (ms)']} ms`);
    // ExcelJS ran in the file worker, not in the page (the page's policy let it start)
    expect(page.workers().map((w) => w.url())).toContainEqual(expect.stringContaining('preview-file-worker'));
    saved = (await download.path())!;
    const x = new ExcelJS.Workbook();
    await x.xlsx.load(readFileSync(saved) as unknown as ExcelJS.Buffer);
    const ws = x.getWorksheet(bigSheet)!;
    const c = ws.getCell(`C${ROWS}`).value as ExcelJS.CellFormulaValue;
    expect(c.formula).toBe(`PHZ.DIV(A${ROWS},B${ROWS},$E$1)`);
    expect(c.result).toBe(expectedC(ROWS - 1, 6));
    expect(x.worksheets.map((w) => w.name)).toContain('Sub-board');
  });

  it('opens it again: the same cells and results, after asking first', async () => {
    await typeInto('E2', 'typed after saving');
    page.once('dialog', (d) => void d.accept());
    const blocking = await watchBlocking();
    await timed('open the .xlsx (40,000 rows)', async () => {
      await page.locator('input[type="file"]').setInputFiles(saved);
      await expect.poll(() => status().textContent(), { timeout: 30_000 }).toMatch(/^.*Opened /);
    });
    timings['open the .xlsx: longest the page was blocked (ms)'] = await blocking();
    console.log(`open the .xlsx: page blocked at most ${timings['open the .xlsx: longest the page was blocked (ms)']} ms`);
    await page.locator(`.pv-tab[data-sheet="${bigSheet}"]`).click();
    await go(`C${ROWS}`);
    expect(await text(`C${ROWS}`)).toBe(expectedC(ROWS - 1, 6));
    expect(await formulaBar().inputValue()).toBe(`=PHZ.DIV(A${ROWS},B${ROWS},$E$1)`);
    expect(await text('E2')).toBe('');
    // undo brings back the workbook from before the file was opened
    await key('Control+z');
    await expect.poll(() => text('E2')).toBe('typed after saving');
  });

  it('loses nothing typed while a file is read: it is in the workbook the file replaced, which Ctrl+Z brings back', async () => {
    page.once('dialog', (d) => void d.accept());
    await page.locator('input[type="file"]').setInputFiles(saved);
    // typed at once, in one go in the page (name box, formula bar, Enter), so the file cannot
    // replace the workbook half-way: while the file worker reads, or on a slow run just after
    const typedWhileReading = await page.evaluate((sheet) => {
      const reading = /Reading /.test(document.querySelector('.pv-status')?.textContent ?? '');
      const box = document.querySelector('#pv-namebox') as HTMLInputElement;
      box.value = `${sheet}!F3`;
      box.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
      const bar = document.querySelector('input[aria-label="Formula"]') as HTMLInputElement;
      bar.focus();
      bar.value = 'typed while reading';
      bar.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
      return reading;
    }, bigSheet);
    timings['typed while the file was read (1 = yes)'] = typedWhileReading ? 1 : 0;
    await expect.poll(() => status().textContent(), { timeout: 30_000 }).toMatch(/Opened /);
    await page.locator(`.pv-tab[data-sheet="${bigSheet}"]`).click();
    if (typedWhileReading) {
      // the file replaced the workbook it was typed into: Ctrl+Z (the open) brings that back
      expect(await text('F3')).toBe('');
      await key('Control+z');
      await expect.poll(() => status().textContent()).toContain('Undid: Open');
      await page.locator(`.pv-tab[data-sheet="${bigSheet}"]`).click();
    }
    expect(await text('F3')).toBe('typed while reading');
    expect(await text(`C${ROWS}`)).toBe(expectedC(ROWS - 1, 6));
    if (!typedWhileReading) {
      // typed into the opened file: undo that and the open, back to the workbook from before
      await key('Control+z');
      await key('Control+z');
      await expect.poll(() => status().textContent()).toContain('Undid: Open');
    }
  });

  it('says why a file cannot be read, and leaves the workbook as it was', async () => {
    const bad = path.join(artifacts, 'not-a-workbook.xlsx');
    writeFileSync(bad, 'Phase,Current\nL1,12\n');
    await page.locator('input[type="file"]').setInputFiles(bad);
    await expect.poll(() => status().textContent()).toMatch(/not-a-workbook\.xlsx is not an \.xlsx workbook .*nothing was changed/);
    expect(await text('E2')).toBe('typed after saving');
  });
});

describe('bad input does not break it', () => {
  it('shows 1e-300 as a number, never NaN, with the exact value in the status line', async () => {
    await page.locator('.pv-tab', { hasText: 'Sub-board' }).click();
    await typeInto('H10', '1e-300');
    await typeInto('H11', '=H10*1');
    expect(await text('H10')).toBe('1E-300');
    expect(await text('H11')).toBe('1E-300');
    expect(await page.locator('.pv-cell', { hasText: 'NaN' }).count()).toBe(0);
  });

  it.each([
    ['nested too deeply', `=${'('.repeat(3000)}1${')'.repeat(3000)}`, /nests brackets 3,000 deep/],
    ['a 100 kB formula with a syntax error', `=PHZ.MAG("${'x'.repeat(100_000)}"`, /characters long; a formula may have at most 8,192/],
  ])('a formula %s gives an error in its cell with a message, the edit kept, the page responsive', async (_, formula, message) => {
    await go('H12');
    await timed(`enter a formula ${_}`, async () => {
      await formulaBar().fill(formula);
      await formulaBar().press('Enter');
    });
    await expect.poll(() => text('H12')).toBe('#ERROR!');
    expect(await (await reveal(page, 'H12')).getAttribute('title')).toMatch(message);
    await go('H12');
    expect((await formulaBar().inputValue()).length).toBe(formula.length);
  });

  it('gives "" inside text a message saying how to write a quote, and reads 1E-3', async () => {
    await typeInto('H13', '="a""b"');
    expect(await (await reveal(page, 'H13')).getAttribute('title')).toMatch(/CHAR\(34\)/);
    await typeInto('H14', '=1E-3*2');
    expect(await text('H14')).toBe('0.002');
  });

  it('cuts a 100,000-character message to a readable length, advice kept', async () => {
    await go('H15');
    await formulaBar().fill(`=PHZ.ANGLE("3+j4", "${'x'.repeat(5000)}")`);
    await formulaBar().press('Enter');
    const title = (await (await reveal(page, 'H15')).getAttribute('title')) ?? '';
    expect(title.length).toBeLessThan(300);
    expect(title).toMatch(/use one of those/);
  });

  it('the pane’s Insert writes only into an empty cell', async () => {
    await typeInto('H16', 'mine');
    await go('H16');
    await page.locator('article .sp-insert').first().click();
    await expect.poll(() => page.locator('article .sp-status').first().textContent()).toContain('is not empty, so nothing was written');
    expect(await text('H16')).toBe('mine');
  });

  it('New workbook asks first, and Cancel keeps everything', async () => {
    page.once('dialog', (d) => void d.dismiss());
    await page.getByRole('button', { name: 'New' }).click();
    expect(await text('H16')).toBe('mine');
    page.once('dialog', (d) => void d.accept());
    await page.getByRole('button', { name: 'New' }).click();
    await expect.poll(() => text('H16')).toBe('');
    expect(await page.locator('.pv-tab').allTextContents()).toEqual(demoSheetNames());
  });

  it('ran without page errors', () => {
    expect(problems).toEqual([]);
  });
});
