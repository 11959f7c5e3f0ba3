/**
 * The pane's Worked sheet part in a real browser, through the preview: each calculation
 * written from the pane, its results shown and its checks passing, an input changed on the
 * sheet and the sheet recalculated, a bad input refused with its message, inputs read from
 * the selection, and a second write never over the first. Screenshots go to
 * test-artifacts/ (look at them after changing the part or the sheet layout).
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium } from 'playwright-core';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { calculations } from '../../src/taskpane/sheets/calculations';
import { demoValues, readField } from '../../src/taskpane/sheets/calculation';
import { COL, cellA1 } from '../../src/taskpane/sheets/plan';
import { cellText, goTo, reveal, typeIn } from './grid';
import { CHROMIUM_ARGS, chromiumPath, repoRoot, startServer } from './server';
import type { RunningServer } from './server';

let server: RunningServer;
let browser: Browser;
let page: Page;
const problems: string[] = [];
const shots = path.join(repoRoot, 'test-artifacts');

const nameBox = () => page.locator('#pv-namebox');
const statusLine = () => page.locator('.sps-status');
const activeTab = () => page.locator('.pv-tabs button[role="tab"][aria-selected="true"]');

const selectCell = (address: string) => goTo(page, address);

const typeInto = (address: string, text: string) => typeIn(page, address, text);

async function text(address: string): Promise<string> {
  return cellText(page, address);
}

/** The plan's layout for a calculation's demo (addresses do not depend on the date). */
function demoPlan(id: string) {
  const calc = calculations.find((c) => c.id === id)!;
  return calc.plan(demoValues(calc), { scenario: '', date: '2026-12-02' });
}

async function choose(name: string): Promise<void> {
  await page.getByRole('tab', { name: 'Worked sheet' }).click();
  await page.getByLabel('Calculation').selectOption({ label: name });
}

beforeAll(async () => {
  server = await startServer();
  browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });
  const context = await browser.newContext({ viewport: { width: 1600, height: 1000 } });
  page = await context.newPage();
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console ${m.type()}: ${m.text()}`);
  });
  await page.goto(`${server.origin}/preview.html`);
  await page.locator('.pv-cell[data-cell="B6"]').waitFor();
  mkdirSync(shots, { recursive: true });
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('worked sheets from the pane, in the preview', () => {
  it('shows the part with a chooser labelled Calculation, symbol-first field labels and a Write sheet button', async () => {
    await page.getByRole('tab', { name: 'Worked sheet' }).click();
    const chooser = page.getByLabel('Calculation');
    expect(await chooser.locator('option').allTextContents()).toEqual(calculations.map((c) => c.name));
    for (const symbol of ['E1', 'Z2', 'ZN', 'ZL1', 'ZL3']) {
      await expect.poll(() => page.getByLabel(new RegExp(`^${symbol} `)).count(), { message: symbol }).toBe(1);
    }
    expect(await page.getByRole('button', { name: 'Write sheet' }).isEnabled()).toBe(true);
    await page.screenshot({ path: path.join(shots, 'worked-sheet-pane.png') });
  });

  it.each(calculations.map((c) => [c.name, c.id] as const))('writes “%s”: a new active sheet, results shown, every check passing', async (name, id) => {
    await choose(name);
    const before = await page.locator('.pv-tabs button[role="tab"]').count();
    await page.getByRole('button', { name: 'Write sheet' }).click();
    await expect.poll(() => statusLine().textContent()).toMatch(/^Wrote the new sheet “[^”]+” \(now active\)/);
    const status = (await statusLine().textContent())!;
    const plan = demoPlan(id);
    expect(status).toContain(`${plan.inputs.length} inputs, ${plan.steps.length} steps, ${plan.checks.length} checks`);
    expect(await page.locator('.pv-tabs button[role="tab"]').count()).toBe(before + 1);
    const sheet = /“([^”]+)”/.exec(status)![1];
    expect(await activeTab().textContent()).toBe(sheet);
    await expect.poll(() => text('A1')).toBe(plan.title);
    // results shown: every step's 6-figure value, no error anywhere, every check passing
    for (const s of plan.steps) expect((await text(cellA1(s.row, COL.polar))).length, s.name).toBeGreaterThan(0);
    expect(await page.locator('.pv-cell.k-error').count()).toBe(0);
    for (const c of plan.checks) await expect.poll(() => text(cellA1(c.row, COL.verdict)), { message: c.label }).toBe('pass');
    // inputs look like inputs
    expect(await (await reveal(page, cellA1(plan.inputs[0].row, COL.input))).getAttribute('class')).toMatch(/k-input|s-input/);
    await page.screenshot({ path: path.join(shots, `worked-sheet-${id}.png`) });
    // and the end of the sheet: checks and cautions
    await selectCell(cellA1(plan.extent.rows - 1, 1));
    await page.screenshot({ path: path.join(shots, `worked-sheet-${id}-checks.png`) });
  });

  it('recalculates the sheet when an input is changed on it', async () => {
    await choose('Star load with neutral');
    await page.getByRole('button', { name: 'Write sheet' }).click();
    await expect.poll(() => statusLine().textContent()).toMatch(/^Wrote/);
    const plan = demoPlan('star-neutral');
    const i1 = plan.steps.find((s) => s.name === 'I_1')!;
    const e1 = plan.inputs.find((i) => i.field === 'E1')!;
    const before = await text(cellA1(i1.row, COL.polar));
    const magnitude = Number(before.split('∠')[0]);
    await typeInto(cellA1(e1.row, COL.input), '462∠0');
    await expect.poll(async () => text(cellA1(i1.row, COL.polar))).not.toBe(before);
    // doubling E1 alone does not double I1 (the star point moves), but it raises it
    expect(Number((await text(cellA1(i1.row, COL.polar))).split('∠')[0])).toBeGreaterThan(magnitude);
    for (const c of plan.checks) await expect.poll(() => text(cellA1(c.row, COL.verdict)), { message: c.label }).toBe('pass');
    // undo puts the input back and the result with it
    await selectCell(cellA1(e1.row, COL.input));
    await page.keyboard.press('Control+z');
    await expect.poll(() => text(cellA1(i1.row, COL.polar))).toBe(before);
  });

  it('refuses a bad input with the functions’ message and will not write', async () => {
    await choose('Star load with neutral');
    const field = page.getByLabel(/^E1 /);
    await field.fill('23O∠0');
    const calc = calculations[0];
    let expected = '';
    try {
      readField(calc.fields[0], '23O∠0');
    } catch (e) {
      expected = (e as Error).message;
    }
    expect(expected).toContain('E1');
    const errorId = await field.getAttribute('aria-describedby');
    await expect.poll(() => page.locator(`#${errorId}`).textContent()).toBe(expected);
    expect(await field.getAttribute('aria-invalid')).toBe('true');
    expect(await page.getByRole('button', { name: 'Write sheet' }).isDisabled()).toBe(true);
    expect(await page.locator('.sps-blocker').textContent()).toBe('Fix E1 (marked in red) to write the sheet.');
    await page.screenshot({ path: path.join(shots, 'worked-sheet-bad-input.png') });
    await field.fill('231∠0');
    await expect.poll(() => page.getByRole('button', { name: 'Write sheet' }).isEnabled()).toBe(true);
  });

  it('refuses a case with no solution with the solver’s message', async () => {
    await choose('Star load with neutral');
    for (const [label, value] of [
      [/^Z1 /, '0'],
      [/^ZL1 /, '0'],
      [/^ZN /, '0'],
    ] as const) {
      await page.getByLabel(label).fill(value);
    }
    await expect.poll(() => page.locator('.sps-case').textContent()).toMatch(/no solution: .*short/i);
    expect(await page.getByRole('button', { name: 'Write sheet' }).isDisabled()).toBe(true);
    await page.getByRole('button', { name: 'Demo values' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Write sheet' }).isEnabled()).toBe(true);
  });

  it('reads inputs from the selected cells, starting at the field last clicked', async () => {
    await page.locator('.pv-tabs button[role="tab"]', { hasText: 'Sub-board' }).click();
    await choose('Star load with neutral');
    await selectCell('B6');
    await page.keyboard.press('Shift+ArrowRight');
    await page.keyboard.press('Shift+ArrowRight');
    await expect.poll(() => nameBox().inputValue()).toBe('B6:D6');
    await page.getByLabel(/^E1 /).focus();
    await page.getByRole('button', { name: 'Read from selection' }).click();
    await expect.poll(() => statusLine().textContent()).toContain('Filled E1, E2, E3 from Sub-board!B6:D6');
    const shown = [await text('B6'), await text('C6'), await text('D6')];
    expect([await page.getByLabel(/^E1 /).inputValue(), await page.getByLabel(/^E2 /).inputValue(), await page.getByLabel(/^E3 /).inputValue()]).toEqual(shown);
  });

  it('never writes over a sheet: the same calculation twice gives a second, new sheet', async () => {
    await choose('Delta load');
    await page.getByRole('button', { name: 'Write sheet' }).click();
    await expect.poll(() => statusLine().textContent()).toMatch(/^Wrote the new sheet “Delta load \(2\)”/);
    expect(await page.locator('.pv-tabs button[role="tab"]', { hasText: /^Delta load$/ }).count()).toBe(1);
    expect(await activeTab().textContent()).toBe('Delta load (2)');
  });

  it('broke no page rule and logged no error', () => {
    expect(problems).toEqual([]);
  });
});
