/**
 * `npm run bench`: speed figures, printed (not asserted). Targets (issues 2 and 3):
 * DIV on two text phasors ≤ 0.5× complex.js's own parse + divide + toString;
 * ADD over a 100,000-cell column of text phasors ≤ 30 ms; STARLOAD ≤ 5 µs per call.
 * Worked sheets (issue 9): the largest sheet planned ≤ 1 ms and written into the preview
 * ≤ 250 ms (our own targets: the pane should answer at once). Panel schedules (issue 11):
 * PHZ.SCHEDULE on 500 ways ≤ 1 ms per call (our own target: a schedule recalculates at once).
 * The preview workbook (issue 12, bench/workbook.bench.ts): paste, recalculation, undo, redo,
 * reload, save as .xlsx and open of 40,000 rows of PHZ.DIV, each ≤ 1 s of waiting (for save
 * and open, what the page does ≤ 1 s; the file worker's part runs with the grid usable and is
 * printed beside it).
 *
 * The DIV figures come twice: on one constant input (whose angle hits the exact 15°
 * tables) and over 256 distinct realistic inputs (bench/inputs.ts: decimals, angles that
 * are not multiples of 15°), each against complex.js on the same values. The preview
 * case pastes new inputs into 20,000 rows of PHZ.DIV in the preview engine, against the
 * engine's own IMDIV on the same cells: the cost a user sees.
 *
 * Every case runs in a fresh node process (so one library's JIT state cannot help or
 * hurt another's), five times; the best batch of the best process is reported.
 */
import Complex from 'complex.js';
import * as math from 'mathjs';
import { execFileSync } from 'node:child_process';
import { functions } from '../src/functions';
import { benchStarload } from './starload.bench';
import { benchDeltaload } from './deltaload.bench';
import { benchPlot1000, benchReplot50 } from './plot.bench';
import { benchPlan, benchWrite, largest } from './sheets.bench';
import { benchSchedule } from './schedule.bench';
import { divCases } from './inputs';
import { PASTE_ROWS, workbookCases } from './workbook.bench';
import { PhzEngine } from '../src/preview/engine';

let sink = 0;

/** ns per call of `f`, the best of several timed batches after a warm-up. */
function nsPerCall(f: () => unknown, batch = 20000, rounds = 9): number {
  for (let i = 0; i < batch * 2; i++) if (f() === undefined) sink++;
  let best = Infinity;
  for (let r = 0; r < rounds; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) if (f() === undefined) sink++;
    const ns = Number(process.hrtime.bigint() - t0) / batch;
    if (ns < best) best = ns;
  }
  return best;
}

function msOnce(f: () => unknown, rounds = 9): number {
  f();
  let best = Infinity;
  for (let r = 0; r < rounds; r++) {
    const t0 = process.hrtime.bigint();
    f();
    const ms = Number(process.hrtime.bigint() - t0) / 1e6;
    if (ms < best) best = ms;
  }
  return best;
}

const A = [['230∠-120']];
const B = [['8+j6']];
const AR = [['-115-j199.186']];

function sumColumn(): string[][] {
  const cells: string[][] = [];
  for (let i = 0; i < 100000; i++) cells.push([i % 3 === 0 ? `${(i % 97) + 1}∠${((i * 7) % 360) - 180}` : `${i % 50}+j${i % 13}`]);
  return cells;
}

const VARIED = divCases(256);
const MASK = VARIED.length - 1;
const V_POLAR = VARIED.map((c) => [[c.polar]]);
const V_RECT = VARIED.map((c) => [[c.rectJ]]);
const V_DIVISOR = VARIED.map((c) => [[c.divisorJ]]);
let k = 0;

const ROWS = 20000;

/** ms to paste new dividends and divisors into 20,000 rows of `formula` and recalculate. */
function engineRecalc(formula: (row: number) => string): number {
  const first = divCases(ROWS, 1);
  const second = divCases(ROWS, 2);
  const sheet = first.map((c, r) => [c.rectI, c.divisorI, formula(r + 1)]);
  const engine = new PhzEngine({ sheets: { Sheet1: sheet } });
  const sheetId = engine.hf.getSheetId('Sheet1') ?? 0;
  const inputs = [second, first].map((set) => set.map((c) => [c.rectI, c.divisorI]));
  let round = 0;
  const ms = msOnce(() => engine.setContents({ sheet: sheetId, row: 0, col: 0 }, inputs[round++ & 1]), 5);
  // the results must be values, not errors, or the figure would time error handling
  const shown = engine.display({ sheet: sheetId, row: ROWS - 1, col: 2 });
  if (typeof shown !== 'string' || shown.length === 0) throw new Error(`unexpected result ${JSON.stringify(shown)}`);
  return ms;
}

/** Each case returns its figure: ns per call, or ms for ADD and the engine cases. */
const CASES: Record<string, () => Promise<number> | number> = {
  divPolar: () => nsPerCall(() => functions.DIV(A, B)),
  divRect: () => nsPerCall(() => functions.DIV(AR, B)),
  complexjs: () => nsPerCall(() => new Complex('-115-199.186i').div(new Complex('8+6i')).toString()),
  divVariedPolar: () => nsPerCall(() => functions.DIV(V_POLAR[(k = (k + 1) & MASK)], V_DIVISOR[k])),
  divVariedRect: () => nsPerCall(() => functions.DIV(V_RECT[(k = (k + 1) & MASK)], V_DIVISOR[k])),
  complexjsVaried: () =>
    nsPerCall(() => {
      const c = VARIED[(k = (k + 1) & MASK)];
      return new Complex(c.rectI).div(new Complex(c.divisorI)).toString();
    }),
  enginePhz: () => engineRecalc((r) => `=PHZ.DIV(A${r},B${r})`),
  engineImdiv: () => engineRecalc((r) => `=IMDIV(A${r},B${r})`),
  mathjs: () => nsPerCall(() => math.format(math.divide(math.complex('-115-199.186i'), math.complex('8+6i'))), 5000),
  sum: () => {
    const cells = sumColumn();
    return msOnce(() => functions.ADD([cells]));
  },
  starload: async () => (await benchStarload()).nsPerCall,
  deltaload: async () => (await benchDeltaload()).nsPerCall,
  plot1000: benchPlot1000,
  replot50: benchReplot50,
  schedule500: () => benchSchedule(500),
  sheetPlan: () => benchPlan(),
  sheetWrite: () => benchWrite(),
  ...workbookCases,
};

function measure(name: string): number {
  let best = Infinity;
  for (let k = 0; k < 5; k++) {
    const out = execFileSync(process.execPath, [__filename, name], { encoding: 'utf8' });
    best = Math.min(best, Number(out.trim()));
  }
  return best;
}

function row(name: string, value: string, note = ''): void {
  console.log(`${name.padEnd(74)} ${value.padStart(10)}  ${note}`);
}

async function main(): Promise<void> {
  const only = process.argv[2];
  if (only) {
    process.stdout.write(String(await CASES[only]()));
    if (sink === 0.5) console.log('');
    return;
  }
  console.log(`Starpoint benchmark — node ${process.version}; each case in a fresh process, best of 5\n`);
  const divPolar = measure('divPolar');
  const divRect = measure('divRect');
  const cjs = measure('complexjs');
  const mjs = measure('mathjs');
  row('PHZ.DIV("230∠-120", "8+j6") → polar text', `${divPolar.toFixed(0)} ns`);
  row('PHZ.DIV("-115-j199.186", "8+j6") → polar text', `${divRect.toFixed(0)} ns`);
  row('complex.js: parse ×2 + div + toString', `${cjs.toFixed(0)} ns`);
  row('mathjs: complex() ×2 + divide + format', `${mjs.toFixed(0)} ns`);
  const ratio = Math.max(divPolar, divRect) / cjs;
  row('slower PHZ.DIV / complex.js round trip (target ≤ 0.5)', ratio.toFixed(2), ratio <= 0.5 ? 'met' : 'NOT MET');
  const vPolar = measure('divVariedPolar');
  const vRect = measure('divVariedRect');
  const vCjs = measure('complexjsVaried');
  row(`PHZ.DIV over ${VARIED.length} varied inputs, polar dividend → polar text`, `${vPolar.toFixed(0)} ns`);
  row(`PHZ.DIV over ${VARIED.length} varied inputs, rectangular dividend`, `${vRect.toFixed(0)} ns`);
  row('complex.js on the same values (rectangular text) ×2 + div + toString', `${vCjs.toFixed(0)} ns`);
  const vRatio = Math.max(vPolar, vRect) / vCjs;
  row('slower varied PHZ.DIV / complex.js on the same values (target ≤ 0.5)', vRatio.toFixed(2), vRatio <= 0.5 ? 'met' : 'NOT MET');
  const ePhz = measure('enginePhz');
  const eIm = measure('engineImdiv');
  row(`preview engine: paste ${ROWS} rows of new inputs, PHZ.DIV recalculates`, `${ePhz.toFixed(0)} ms`);
  row(`preview engine: the same with the engine's own IMDIV`, `${eIm.toFixed(0)} ms`);
  row('PHZ.DIV / IMDIV in the preview engine', (ePhz / eIm).toFixed(2));
  const sumMs = measure('sum');
  row('PHZ.ADD over a 100,000-cell column of text', `${sumMs.toFixed(1)} ms`, sumMs <= 30 ? 'met (≤ 30 ms)' : 'NOT MET (≤ 30 ms)');
  const star = measure('starload');
  row('PHZ.STARLOAD, 64 varied 3-wire networks with line Z (parse, solve, 4×3)', `${(star / 1000).toFixed(2)} µs`, star <= 5000 ? 'met (≤ 5 µs)' : 'NOT MET (≤ 5 µs)');
  const delta = measure('deltaload');
  row('PHZ.DELTALOAD, 64 varied networks with line Z (parse, solve, 3×4)', `${(delta / 1000).toFixed(2)} µs`);
  const plot = measure('plot1000');
  row('Phasor plot: geometry + SVG text, 1,000 phasors', `${plot.toFixed(2)} ms`, plot <= 20 ? 'met (≤ 20 ms)' : 'NOT MET (≤ 20 ms)');
  const replot = measure('replot50');
  row('Phasor plot: re-plot of 50 phasors (read, lay out, SVG)', `${replot.toFixed(2)} ms`, replot <= 5 ? 'met (≤ 5 ms)' : 'NOT MET (≤ 5 ms)');
  const sched = measure('schedule500');
  row('PHZ.SCHEDULE, 500 ways (read the cells, aggregate, format 4×5; harmonics)', `${sched.toFixed(0)} µs`, sched <= 1000 ? 'met (≤ 1 ms)' : 'NOT MET (≤ 1 ms)');
  const big = largest();
  const plan = measure('sheetPlan');
  row(`Worked sheet: plan "${big.calc.name}" (${big.cells} cells)`, `${plan.toFixed(0)} µs`, plan <= 1000 ? 'met (≤ 1 ms)' : 'NOT MET (≤ 1 ms)');
  const write = measure('sheetWrite');
  row(`Worked sheet: write it into the preview (engine evaluates all)`, `${write.toFixed(1)} ms`, write <= 250 ? 'met (≤ 250 ms)' : 'NOT MET (≤ 250 ms)');
  const rows = PASTE_ROWS.toLocaleString('en-US');
  const workbookFigures = new Map<string, number>();
  for (const [name, label] of [
    ['wbPaste', `Preview workbook: paste ${rows} rows × 3 columns, a PHZ.DIV per row`],
    ['wbEdit', `Preview workbook: edit the common input, ${rows} PHZ.DIV recalculate`],
    ['wbUndoEdit', 'Preview workbook: undo of that edit'],
    ['wbUndoPaste', `Preview workbook: undo of the ${rows}-row paste (one block)`],
    ['wbRedoPaste', `Preview workbook: redo of it`],
    ['wbSaveCopy', `Preview workbook: the whole workbook as a document (the browser copy)`],
    ['wbReload', `Preview workbook: reload it from that copy (engine rebuilt)`],
    ['wbSavePage', `Preview workbook: save as .xlsx, the page's part (cells and results read)`],
    ['wbSaveWorker', `Preview workbook: save as .xlsx, the file worker's part (ExcelJS writes)`],
    ['wbOpenWorker', `Preview workbook: open that .xlsx, the file worker's part (ExcelJS reads)`],
    ['wbOpenPage', `Preview workbook: open it, the page's part (engine built, one undo step)`],
  ] as const) {
    const t = measure(name);
    workbookFigures.set(name, t);
    // the worker's part runs while the grid stays usable: its figure is the wait for the file, not a freeze
    const note = name.endsWith('Worker') ? (t <= 1000 ? 'within 1 s (grid usable meanwhile)' : 'over 1 s (grid usable meanwhile)') : t <= 1000 ? 'met (≤ 1 s)' : 'NOT MET (≤ 1 s)';
    row(label, `${t.toFixed(0)} ms`, note);
  }
  const figure = (name: string) => workbookFigures.get(name) ?? NaN;
  const save = figure('wbSavePage') + figure('wbSaveWorker');
  const open = figure('wbOpenWorker') + figure('wbOpenPage');
  row('Preview workbook: save as .xlsx, both parts (click to file)', `${save.toFixed(0)} ms`, save <= 1000 ? 'within 1 s' : 'over 1 s');
  row('Preview workbook: open that .xlsx, both parts (file chosen to workbook shown)', `${open.toFixed(0)} ms`, open <= 1000 ? 'within 1 s' : 'over 1 s');
}

void main();
