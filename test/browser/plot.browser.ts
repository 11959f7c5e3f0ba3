/**
 * The phasor plot in the preview workbook, in a real browser: select the demo's phase
 * currents and read the drawn arrows' data attributes; change an input and watch the plot
 * follow; tip to tail; SVG and PNG exports parsed as files; "Insert as chart". Expected
 * values come from the demo's own magnitude and angle cells (PHZ.MAG, PHZ.ANGLE) and its
 * neutral current (PHZ.NEUTRAL), computed by the engine, never from copies of the output.
 */
import { mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { chromium } from 'playwright-core';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cellText, demoRow, goTo } from './grid';
import { CHROMIUM_ARGS, chromiumPath, repoRoot, startServer } from './server';
import type { RunningServer } from './server';

let server: RunningServer;
let browser: Browser;
let page: Page;
const problems: string[] = [];
const artifacts = path.join(repoRoot, 'test-artifacts');

const plot = () => page.locator('[data-part="plot"]');
const arrows = (role = 'phasor') => plot().locator(`.sp-plot-figure g.phasor[data-role="${role}"]`);

const select = (address: string) => goTo(page, address);

async function text(address: string): Promise<string> {
  return cellText(page, address);
}

async function rowOf(label: string): Promise<number> {
  return demoRow(label);
}

interface Drawn {
  label: string;
  magnitude: number;
  angle: number;
}

async function drawn(role = 'phasor'): Promise<Drawn[]> {
  return arrows(role).evaluateAll((els) =>
    els.map((e) => ({ label: e.getAttribute('data-label') ?? '', magnitude: Number(e.getAttribute('data-magnitude')), angle: Number(e.getAttribute('data-angle')) })),
  );
}

/** |a − b| within `rel` of |b| (the cells show 6 significant figures). */
function near(a: number, b: number, rel = 2e-5): boolean {
  return Math.abs(a - b) <= rel * Math.max(Math.abs(b), 1e-9);
}

beforeAll(async () => {
  mkdirSync(artifacts, { recursive: true });
  server = await startServer();
  browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, acceptDownloads: true });
  page = await context.newPage();
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console ${m.type()}: ${m.text()}`);
  });
  await page.goto(`${server.origin}/preview.html`);
  await page.locator('.pv-cell[data-cell="B6"]').waitFor();
  await page.locator('button[data-tab="plot"]').click();
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('phasor plot in the preview', () => {
  it('draws the selected phase currents as arrows with their label, magnitude and angle', async () => {
    const row = await rowOf('Phase current');
    const magRow = await rowOf('Current magnitude');
    const angRow = await rowOf('Current angle');
    await select(`A${row - 1}:D${row}`);
    await expect.poll(() => arrows().count()).toBe(3);
    const got = await drawn();
    expect(got.map((a) => a.label)).toEqual(['L1', 'L2', 'L3']);
    const cols = ['B', 'C', 'D'];
    for (let k = 0; k < 3; k++) {
      const mag = Number(await text(`${cols[k]}${magRow}`));
      const ang = Number(await text(`${cols[k]}${angRow}`));
      expect(near(got[k].magnitude, mag), `${got[k].magnitude} vs ${mag}`).toBe(true);
      expect(Math.abs(got[k].angle - ang)).toBeLessThan(1e-3);
    }
    await expect.poll(() => plot().locator('.sp-plot-status').first().textContent()).toBe(`Sub-board!A${row - 1}:D${row}: 3 phasors.`);
    // the accessible table lists the same phasors
    await expect.poll(() => plot().locator('table.sp-plot-table tbody tr').count()).toBe(3);
    await expect.poll(() => plot().locator('text=Phase current (A): rings every').count()).toBe(1);
    await page.screenshot({ path: path.join(artifacts, 'plot.png') });
  });

  it('follows an edit of an input while the block is kept', async () => {
    const row = await rowOf('Phase current');
    const zRow = await rowOf('Load impedance');
    const magRow = await rowOf('Current magnitude');
    await select(`A${row - 1}:D${row}`);
    await expect.poll(() => arrows().count()).toBe(3);
    await plot().getByLabel('Follow the selection').uncheck();
    const before = (await drawn())[0].magnitude;
    const original = await text(`B${zRow}`);
    // half the impedance of phase 1 (8.2+j3.1 in the demo): its current doubles
    await select(`B${zRow}`);
    await page.keyboard.type('4.1+j1.55');
    await page.keyboard.press('Enter');
    await expect.poll(async () => (await drawn())[0]?.magnitude).toBeGreaterThan(before * 1.9);
    const mag = Number(await text(`B${magRow}`));
    expect(near((await drawn())[0].magnitude, mag)).toBe(true);
    expect(near(mag, 2 * before, 1e-4)).toBe(true);
    // put it back
    await select(`B${zRow}`);
    await page.keyboard.type(original);
    await page.keyboard.press('Enter');
    await expect.poll(async () => near((await drawn())[0].magnitude, before)).toBe(true);
    await plot().getByLabel('Follow the selection').check();
  });

  it('adds the phase currents tip to tail and closes on the neutral current', async () => {
    const row = await rowOf('Phase current');
    const inRow = await rowOf('Neutral current (phasor sum)');
    await select(`A${row - 1}:D${row}`);
    await expect.poll(() => arrows().count()).toBe(3);
    await plot().getByLabel('Tip to tail', { exact: true }).check();
    await expect.poll(() => arrows('sum').count()).toBe(1);
    expect((await drawn('chain')).map((a) => a.label)).toEqual(['L1', 'L2', 'L3']);
    const sum = (await drawn('sum'))[0];
    // PHZ.NEUTRAL's result in polar text, e.g. 8.41913∠-77.04°
    const m = /^([\d.]+)∠(-?[\d.]+)°$/.exec(await text(`B${inRow}`));
    expect(m, await text(`B${inRow}`)).not.toBeNull();
    expect(near(sum.magnitude, Number(m![1]), 1e-4)).toBe(true);
    expect(Math.abs(sum.angle - Number(m![2]))).toBeLessThan(1e-2);
    await plot().locator('.sp-plot-figure').screenshot({ path: path.join(artifacts, 'plot-tip-to-tail.png') });
    await plot().getByLabel('From the origin', { exact: true }).check();
    await expect.poll(() => arrows('sum').count()).toBe(0);
  });

  it('saves the plot as an SVG file that parses as XML with the drawn phasors', async () => {
    const row = await rowOf('Phase current');
    await select(`A${row - 1}:D${row}`);
    await expect.poll(() => arrows().count()).toBe(3);
    const [download] = await Promise.all([page.waitForEvent('download'), plot().getByRole('button', { name: 'Save the plot as an SVG file' }).click()]);
    expect(download.suggestedFilename()).toBe(`phasors-Sub-board-A${row - 1}-D${row}.svg`);
    const svg = readFileSync((await download.path())!, 'utf8');
    expect(XMLValidator.validate(svg)).toBe(true);
    const doc = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '@' }).parse(svg) as { svg: { '@xmlns': string; g: Array<Record<string, unknown>> } };
    expect(doc.svg['@xmlns']).toBe('http://www.w3.org/2000/svg');
    const group = doc.svg.g.find((g) => g['@class'] === 'phasors') as { g: Array<Record<string, string>> };
    expect(group.g.map((g) => g['@data-label'])).toEqual(['L1', 'L2', 'L3']);
  });

  it('saves the plot as a PNG file with the PNG signature and an IHDR of twice the drawing size', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), plot().getByRole('button', { name: 'Save the plot as a PNG picture' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^phasors-Sub-board-.*\.png$/);
    const png = readFileSync((await download.path())!);
    // PNG signature, then the IHDR chunk (ISO/IEC 15948 §5.2, §11.2.2)
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(png.subarray(12, 16).toString('ascii')).toBe('IHDR');
    const width = png.readUInt32BE(16);
    const height = png.readUInt32BE(20);
    const viewBox = await plot().locator('.sp-plot-figure svg').getAttribute('viewBox');
    const [, , w, h] = viewBox!.split(' ').map(Number);
    expect([width, height]).toEqual([Math.round(2 * w), Math.round(2 * h)]);
    expect(png.length).toBeGreaterThan(5000);
  });

  it('inserts a chart linked to the cells through helper formulas, and the chart follows an edit', async () => {
    const row = await rowOf('Phase current');
    const zRow = await rowOf('Load impedance');
    await select(`A${row - 1}:D${row}`);
    await expect.poll(() => arrows().count()).toBe(3);
    await plot().getByRole('button', { name: 'Insert a chart linked to these cells into the workbook' }).click();
    await expect.poll(() => plot().locator('.sp-plot-status').last().textContent()).toMatch(/^Inserted Phasor chart 1, linked to the plotted cells through the helper cells Phasor chart data!A1:E13\.$/);
    const chart = page.locator('.pv-chart[data-chart="Phasor chart 1"]');
    await expect.poll(() => chart.locator('g.phasor').count()).toBe(3);
    const tab = page.locator('.pv-tab[data-sheet="Phasor chart data"]');
    await expect.poll(() => tab.count()).toBe(1);
    const chartMag = () => chart.locator('g.phasor').first().getAttribute('data-magnitude');
    const before = Number(await chartMag());
    expect(near(before, (await drawn())[0].magnitude, 1e-5)).toBe(true);
    await chart.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(artifacts, 'plot-chart.png') });
    // change an input: the chart re-renders from its helper cells
    const original = await text(`B${zRow}`);
    await select(`B${zRow}`);
    await page.keyboard.type('4.1+j1.55');
    await page.keyboard.press('Enter');
    await expect.poll(async () => Number(await chartMag())).toBeGreaterThan(before * 1.9);
    await select(`B${zRow}`);
    await page.keyboard.type(original);
    await page.keyboard.press('Enter');
    await expect.poll(async () => near(Number(await chartMag()), before, 1e-5)).toBe(true);
    // helper cells hold PHZ formulas that read the plotted cells
    await tab.click();
    await select('C9');
    await expect.poll(() => page.getByLabel('Formula', { exact: true }).inputValue()).toBe(`=IF($C$5=0,0,PHZ.REAL('Sub-board'!B${row})/$C$5)`);
    await page.locator('.pv-tab[data-sheet="Sub-board"]').click();
  });

  it('says plainly when the selection holds no phasors, and lists a cell it cannot read', async () => {
    await select('A1:A3');
    await expect.poll(() => plot().locator('.sp-plot-status').first().textContent()).toMatch(/^Sub-board!A1:A3 holds no phasors: select text such as 230∠-120/);
    await expect.poll(() => arrows().count()).toBe(0);
    const errRow = await rowOf('Current into a 0 Ω load');
    await select(`B${errRow}`);
    await expect.poll(() => plot().locator('.sp-plot-unreadable li').first().textContent()).toMatch(new RegExp(`^B${errRow} .*holds the error #VALUE!`));
  });

  it('ran without page errors', () => {
    expect(problems).toEqual([]);
  });
});
