/**
 * The preview workbook in a real browser: the page is built and served by the same
 * server `npm start` runs, and driven by keyboard and mouse the way a person would.
 * Expected values come from the registry's documented examples and from relations
 * the formulas must keep (|I| doubles when V doubles), not from copies of the output.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium } from 'playwright-core';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { specByName, specs } from '../../src/functions';
import { SUB_BOARD } from '../../src/preview/demo';
import { evaluateFormula, isDisplayError } from '../../src/preview/engine';
import { formatNumber } from '../../src/preview/format';
import { cellText, demoRow, goTo, intendedError, reveal, typeIn } from './grid';
import { CHROMIUM_ARGS, chromiumPath, repoRoot, startServer } from './server';
import type { RunningServer } from './server';

let server: RunningServer;
let browser: Browser;
let page: Page;
const requests: string[] = [];
const problems: string[] = [];

const cell = (address: string) => page.locator(`.pv-cell[data-cell="${address}"]`);
const formulaBar = () => page.getByLabel('Formula', { exact: true });
const nameBox = () => page.locator('#pv-namebox');

const selectCell = (address: string) => goTo(page, address);

const typeInto = (address: string, text: string) => typeIn(page, address, text);

async function text(address: string): Promise<string> {
  return cellText(page, address);
}

/** A documented result cell as the grid shows it. */
function shown(v: string | number | boolean): string {
  return typeof v === 'number' ? formatNumber(v) : typeof v === 'boolean' ? (v ? 'TRUE' : 'FALSE') : v;
}

/** The row (1-based) of a scenario line, found by its label in column A. */
async function rowOf(label: string): Promise<number> {
  return demoRow(label);
}

beforeAll(async () => {
  server = await startServer();
  browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  context.on('request', (r) => requests.push(r.url()));
  page = await context.newPage();
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() === 'error' || /Content Security Policy/i.test(m.text())) problems.push(`console ${m.type()}: ${m.text()}`);
  });
  await page.goto(`${server.origin}/preview.html`);
  await page.locator('.pv-cell[data-cell="B6"]').waitFor();
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('preview workbook in the browser', () => {
  it('opens with the demo workbook, inputs and formulas styled apart, no error cells', async () => {
    const input = SUB_BOARD.find((l) => l.kind === 'input');
    if (input?.kind !== 'input') throw new Error('the demo has no input line');
    const row = await rowOf(input.label);
    await expect.poll(() => text(`B${row}`)).toBe(String(input.values[0]));
    expect(await cell(`B${row}`).getAttribute('class')).toContain('k-input');
    const currentRow = await rowOf('Phase current');
    expect(await cell(`B${currentRow}`).getAttribute('class')).toContain('k-formula');
    // No error in view; one line further down shows an error on purpose, with its message as the tooltip.
    expect(await page.locator('.pv-cell.k-error').count()).toBe(0);
    // Only the cells in view are in the page (virtual scrolling), each with its address.
    const drawn = await page.locator('.pv-cell[data-cell]').count();
    expect(drawn).toBeGreaterThan(100);
    expect(drawn).toBeLessThan(3000);
    mkdirSync(path.join(repoRoot, 'test-artifacts'), { recursive: true });
    await page.screenshot({ path: path.join(repoRoot, 'test-artifacts/preview.png') });
    const errorCell = await reveal(page, intendedError());
    expect(await errorCell.getAttribute('class')).toContain('k-error');
    expect(((await errorCell.getAttribute('title')) ?? '').length).toBeGreaterThan(10);
    await page.evaluate(() => document.querySelector('.pv-scroll')!.scrollTo(0, 0));
    expect(await page.locator('.pv-tabs button[role="tab"]').allTextContents()).toEqual(['Sub-board', 'Schedule DB-OW1', 'Examples']);
  });

  it('fits the window: the page itself never scrolls, the grid and the pane scroll inside', async () => {
    const [scrollHeight, clientHeight] = await page.evaluate(() => [document.scrollingElement!.scrollHeight, document.scrollingElement!.clientHeight]);
    expect(scrollHeight).toBe(clientHeight);
  });

  it('shows documented results for typed formulas', async () => {
    const singles = specs
      .flatMap((s) => s.examples)
      .filter((e) => e.result.length === 1 && e.result[0].length === 1)
      .slice(0, 4);
    expect(singles.length).toBeGreaterThan(0);
    for (const [i, example] of singles.entries()) {
      const address = `H${3 + i}`;
      await typeInto(address, example.formula);
      await expect.poll(() => text(address), { message: example.formula }).toBe(shown(example.result[0][0]));
      expect(await cell(address).getAttribute('class')).toContain('k-formula');
    }
  });

  it('spills a 2-D result into the cells below and beside it', async () => {
    const example = specs.flatMap((s) => s.examples).find((e) => e.result.length >= 2)!;
    await typeInto('I10', example.formula);
    for (let r = 0; r < example.result.length; r++) {
      for (let c = 0; c < example.result[r].length; c++) {
        const address = `${String.fromCharCode(73 + c)}${10 + r}`;
        await expect.poll(() => text(address), { message: `${example.formula} at ${address}` }).toBe(shown(example.result[r][c]));
        if (r > 0 || c > 0) expect(await cell(address).getAttribute('class')).toContain('k-spill');
      }
    }
    await selectCell('I11');
    await expect.poll(() => page.getByRole('status').first().textContent()).toContain('spilled from I10');
  });

  it('recalculates when an input changes, and undo puts it back', async () => {
    const vRow = await rowOf('Supply phase voltage');
    const magRow = await rowOf('Current magnitude');
    const before = Number(await text(`B${magRow}`));
    const original = await text(`B${vRow}`);
    const doubled = original.replace(/^(\d+(?:\.\d+)?)/, (m) => String(2 * Number(m)));
    expect(doubled).not.toBe(original);
    await typeInto(`B${vRow}`, doubled);
    await expect.poll(async () => Number(await text(`B${magRow}`))).toBeCloseTo(2 * before, 4);

    await selectCell(`B${vRow}`);
    await page.keyboard.press('Control+z');
    await expect.poll(() => text(`B${vRow}`)).toBe(original);
    await expect.poll(async () => Number(await text(`B${magRow}`))).toBeCloseTo(before, 6);
    await page.keyboard.press('Control+y');
    await expect.poll(() => text(`B${vRow}`)).toBe(doubled);
    await page.keyboard.press('Control+z');
    await expect.poll(() => text(`B${vRow}`)).toBe(original);
  });

  it('shows an error with its message as a tooltip and in the status line', async () => {
    const name = specs.find((s) => s.params[0]?.type === 'matrix')!.name;
    const formula = `=PHZ.${name}("not a phasor")`;
    const [[expected]] = evaluateFormula(formula);
    expect(isDisplayError(expected)).toBe(true);
    if (!isDisplayError(expected)) return;
    await typeInto('H20', formula);
    await expect.poll(() => text('H20')).toBe(expected.error);
    expect(await cell('H20').getAttribute('title')).toBe(expected.message);
    await selectCell('H20');
    await expect.poll(() => page.locator('.pv-status').textContent()).toContain(expected.message);
  });

  it('edits with F2, cancels with Escape and clears with Delete', async () => {
    await typeInto('K2', '3+j4');
    await selectCell('K2');
    await page.keyboard.press('F2');
    await page.keyboard.type('0');
    await page.keyboard.press('Escape');
    await expect.poll(() => text('K2')).toBe('3+j4');
    await page.keyboard.press('F2');
    await page.keyboard.press('End');
    await page.keyboard.type('0');
    await page.keyboard.press('Enter');
    await expect.poll(() => text('K2')).toBe('3+j40');
    await selectCell('K2');
    await page.keyboard.press('Delete');
    await expect.poll(() => text('K2')).toBe('');
  });

  it('replaces a cell by typing over it, and edits it after a double-click', async () => {
    await typeInto('K8', '1+j1');
    await typeInto('K8', '2+j2');
    await expect.poll(() => text('K8')).toBe('2+j2');
    await cell('K8').dblclick();
    const editor = page.getByLabel('Cell editor');
    await expect.poll(() => editor.isVisible()).toBe(true);
    expect(await editor.inputValue()).toBe('2+j2');
    await page.keyboard.press('End');
    await page.keyboard.type('0');
    await page.keyboard.press('Tab');
    await expect.poll(() => text('K8')).toBe('2+j20');
    await expect.poll(() => nameBox().inputValue()).toBe('L8');
  });

  it('moves the selection with arrow keys, Tab and Enter, and with the mouse', async () => {
    await selectCell('C3');
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => nameBox().inputValue()).toBe('D3');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Tab');
    await expect.poll(() => nameBox().inputValue()).toBe('E4');
    await page.keyboard.press('Shift+ArrowDown');
    await expect.poll(() => nameBox().inputValue()).toBe('E4:E5');
    await cell('B8').click();
    await expect.poll(() => nameBox().inputValue()).toBe('B8');
    expect(await formulaBar().inputValue()).toBe((await text('B8')).trim());
  });

  it('copies a formula with Ctrl+C and pastes it with Ctrl+V, references moved', async () => {
    await typeInto('M2', '3+j4');
    await typeInto('N2', '6+j8');
    expect(specByName.MAG, 'PHZ.MAG is used to check the pasted formula').toBeDefined();
    await typeInto('M3', '=PHZ.MAG(M2)');
    await selectCell('M3');
    await page.keyboard.press('Control+c');
    await selectCell('N3');
    await page.keyboard.press('Control+v');
    await expect.poll(() => text('N3')).toBe(shown(evaluateFormula('=PHZ.MAG("6+j8")')[0][0] as number));
    await selectCell('N3');
    expect(await formulaBar().inputValue()).toBe('=PHZ.MAG(N2)');
  });

  it('edits through the formula bar', async () => {
    await selectCell('K5');
    await formulaBar().click();
    await formulaBar().fill('=PHZ.MAG("3+j4")');
    await formulaBar().press('Enter');
    await expect.poll(() => text('K5')).toBe(shown(evaluateFormula('=PHZ.MAG("3+j4")')[0][0] as number));
  });

  it('adds a sheet and switches between sheets', async () => {
    await page.getByRole('button', { name: 'Add sheet' }).click();
    await expect.poll(() => page.locator('.pv-tabs button[role="tab"]').count()).toBe(4);
    const tab = page.locator('.pv-tabs button[role="tab"][aria-selected="true"]');
    expect(await tab.textContent()).toBe('Sheet4');
    await typeInto('A1', '42');
    await page.locator('.pv-tabs button[role="tab"]', { hasText: 'Examples' }).click();
    await expect.poll(() => text('A1')).toContain('example');
    await page.locator('.pv-tabs button[role="tab"]', { hasText: 'Sheet4' }).click();
    await expect.poll(() => text('A1')).toBe('42');
    await page.locator('.pv-tabs button[role="tab"]', { hasText: 'Sub-board' }).click();
  });

  it('inserts a function from the pane’s reference into the active cell', async () => {
    const spec = specs[0];
    await selectCell('H30');
    const button = page.locator(`article[data-function="${spec.name}"] .sp-insert`);
    const label = (await button.getAttribute('aria-label')) ?? '';
    const starter = /^Insert (=.*) into the active cell$/.exec(label)?.[1];
    expect(starter, label).toBeDefined();
    await button.click();
    await expect.poll(() => page.locator(`article[data-function="${spec.name}"] .sp-status`).textContent()).toContain('Sub-board!H30');
    await selectCell('H30');
    expect(await formulaBar().inputValue()).toBe(starter);
    expect(await text('H30')).not.toBe('');
  });

  it('loads nothing from outside this server and breaks no policy', async () => {
    expect(requests.length).toBeGreaterThan(0);
    const outside = requests.filter((u) => !u.startsWith(`${server.origin}/`) && !u.startsWith('data:') && !u.startsWith('blob:'));
    expect(outside).toEqual([]);
    expect(problems).toEqual([]);
    const response = await page.request.get(`${server.origin}/preview.html`);
    const meta = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
    expect(response.headers()['content-security-policy']).toBe(meta!.replace(/\s+/g, ' ').trim());
    expect(meta).toContain("default-src 'self'");
  });
});

describe('the add-in page of the development build in the browser', () => {
  it('loads office.js from this server, breaks no policy, and shows the pane’s reference', async () => {
    const own: string[] = [];
    const pageProblems: string[] = [];
    const pane = await browser.newPage();
    try {
      pane.on('request', (r) => own.push(r.url()));
      pane.on('pageerror', (e) => pageProblems.push(`page error: ${e.message}`));
      pane.on('console', (m) => {
        if (/Content Security Policy/i.test(m.text())) pageProblems.push(`console ${m.type()}: ${m.text()}`);
      });
      const response = await pane.goto(`${server.origin}/taskpane.html`);
      // Outside Office, Office.onReady reports no host and the pane shows the reference alone.
      await pane.locator(`article[data-function="${specs[0].name}"]`).waitFor();
      expect(own).toContain(`${server.origin}/office-js/office.js`);
      expect(own.filter((u) => !u.startsWith(`${server.origin}/`) && !u.startsWith('data:') && !u.startsWith('blob:'))).toEqual([]);
      expect(pageProblems).toEqual([]);
      const meta = await pane.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
      expect(meta).toContain("script-src 'self';");
      expect(response!.headers()['content-security-policy']).toBe(meta);
    } finally {
      await pane.close();
    }
  });
});
