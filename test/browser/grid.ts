/**
 * Helpers for browser tests of the virtual grid: only the cells in view are in the page, so
 * a cell is scrolled into view before it is read; rows of the demo are found from the demo
 * itself, built here in node the same way the page builds it.
 */
import type { Locator, Page } from 'playwright-core';
import { expect } from 'vitest';
import { specs } from '../../src/functions';
import { parseA1 } from '../../src/preview/address';
import { DEMO_SHEET, loadDemo } from '../../src/preview/demo';
import { PhzEngine } from '../../src/preview/engine';

/** Row height in the grid (grid.ts ROW_PX). */
const ROW_PX = 23;

/** Scrolls the grid (without moving the selection) until `address` is drawn; returns its cell. */
export async function reveal(page: Page, address: string): Promise<Locator> {
  const cell = page.locator(`.pv-cell[data-cell="${address}"]`);
  if ((await cell.count()) > 0) return cell;
  const pos = parseA1(address);
  if (!pos) throw new Error(`${address} is not an address`);
  await page.evaluate(
    ({ row, rowPx }) => {
      const s = document.querySelector('.pv-scroll') as HTMLElement;
      s.scrollTop = Math.max(0, row * rowPx - 3 * rowPx);
    },
    { row: pos.row, rowPx: ROW_PX },
  );
  for (let i = 0; i < 200 && (await cell.count()) === 0; i++) {
    const heads = await page.locator('.pv-colhead').evaluateAll((els) => els.map((e) => Number((e as HTMLElement).dataset.col)));
    const right = Math.max(...heads);
    const left = Math.min(...heads);
    await page.evaluate((dx) => {
      const s = document.querySelector('.pv-scroll') as HTMLElement;
      s.scrollLeft += dx;
    }, pos.col > right ? 300 : pos.col < left ? -300 : 0);
    await page.waitForTimeout(20);
  }
  await cell.waitFor();
  return cell;
}

/** What a cell shows, scrolled into view first. */
export async function cellText(page: Page, address: string): Promise<string> {
  return ((await reveal(page, address)).textContent()).then((t) => t ?? '');
}

let demoColumnA: Map<string, number> | undefined;
let demoError: string | undefined;
let demoSheets: string[] = [];

/** The demo's sheets, in order. */
export function demoSheetNames(): string[] {
  demoRow('Phase current');
  return demoSheets;
}

/** The demo cell that shows an error on purpose (`B97`). */
export function intendedError(): string {
  demoRow('Phase current');
  return demoError!;
}

/** The row (1-based) of a line of the demo's scenario sheet, found by its label in column A. */
export function demoRow(label: string): number {
  if (!demoColumnA) {
    const engine = new PhzEngine();
    const report = loadDemo(engine, specs);
    demoError = report.intendedErrors.find((e) => e.startsWith(`${DEMO_SHEET}!`))!.split('!')[1];
    demoSheets = engine.hf.getSheetNames();
    const id = engine.hf.getSheetId(DEMO_SHEET)!;
    demoColumnA = new Map();
    const height = engine.hf.getSheetDimensions(id).height;
    for (let r = height - 1; r >= 0; r--) {
      const v = engine.display({ sheet: id, row: r, col: 0 });
      if (typeof v === 'string') demoColumnA.set(v, r + 1);
    }
  }
  const row = demoColumnA.get(label);
  if (row === undefined) throw new Error(`the demo has no line labelled ${label}`);
  return row;
}

/** Moves the selection to `address` through the name box, as a person does, and waits for it. */
export async function goTo(page: Page, address: string): Promise<void> {
  const nameBox = page.locator('#pv-namebox');
  await nameBox.fill(address);
  await nameBox.press('Enter');
  await expect.poll(() => nameBox.inputValue()).toBe(address);
}

/** Types into a cell the way a person does: select, type, Enter. */
export async function typeIn(page: Page, address: string, text: string): Promise<void> {
  await goTo(page, address);
  await page.keyboard.type(text);
  await page.keyboard.press('Enter');
}
