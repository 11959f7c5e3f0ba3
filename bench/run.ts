/**
 * `npm run bench`: speed figures, printed (not asserted). Targets (issues 2 and 3):
 * DIV on two text phasors ≤ 0.5× complex.js's own parse + divide + toString;
 * SUM over a 100,000-cell column of text phasors ≤ 30 ms; STARLOAD ≤ 5 µs per call.
 *
 * Every case runs in a fresh node process (so one library's JIT state cannot help or
 * hurt another's), five times; the best batch of the best process is reported.
 */
import Complex from 'complex.js';
import * as math from 'mathjs';
import { execFileSync } from 'node:child_process';
import { functions } from '../src/functions';
import { benchStarload } from './starload.bench';

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

/** Each case returns its figure: ns per call, or ms for SUM. */
const CASES: Record<string, () => Promise<number> | number> = {
  divPolar: () => nsPerCall(() => functions.DIV(A, B)),
  divRect: () => nsPerCall(() => functions.DIV(AR, B)),
  complexjs: () => nsPerCall(() => new Complex('-115-199.186i').div(new Complex('8+6i')).toString()),
  mathjs: () => nsPerCall(() => math.format(math.divide(math.complex('-115-199.186i'), math.complex('8+6i'))), 5000),
  sum: () => {
    const cells = sumColumn();
    return msOnce(() => functions.ADD([cells]));
  },
  starload: async () => (await benchStarload()).nsPerCall,
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
  console.log(`${name.padEnd(62)} ${value.padStart(10)}  ${note}`);
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
  const sumMs = measure('sum');
  row('PHZ.ADD over a 100,000-cell column of text', `${sumMs.toFixed(1)} ms`, sumMs <= 30 ? 'met (≤ 30 ms)' : 'NOT MET (≤ 30 ms)');
  const star = measure('starload');
  row('PHZ.STARLOAD (3-wire, line Z; parse, solve, format 4×3)', `${(star / 1000).toFixed(2)} µs`, star <= 5000 ? 'met (≤ 5 µs)' : 'NOT MET (≤ 5 µs)');
}

void main();
