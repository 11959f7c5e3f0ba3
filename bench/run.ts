/**
 * `npm run bench`: speed figures, printed (not asserted). Targets (issues 2 and 3):
 * DIV on two text phasors ≤ 0.5× complex.js's own parse + divide + toString;
 * SUM over a 100,000-cell column of text phasors ≤ 30 ms; STARLOAD ≤ 5 µs per call.
 */
import Complex from 'complex.js';
import * as math from 'mathjs';
import { functions } from '../src/functions';
import { benchStarload } from './starload.bench';

let sink = 0;

/** ns per call of `f`, the best of several timed batches after a warm-up. */
function nsPerCall(f: () => unknown, batch = 20000, rounds = 7): number {
  for (let i = 0; i < batch; i++) sink ^= (f() as unknown[]).length ?? 0;
  let best = Infinity;
  for (let r = 0; r < rounds; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) {
      const v = f();
      if (v === undefined) sink++;
    }
    const ns = Number(process.hrtime.bigint() - t0) / batch;
    if (ns < best) best = ns;
  }
  return best;
}

function msOnce(f: () => unknown, rounds = 7): number {
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

function row(name: string, value: string, note = ''): void {
  console.log(`${name.padEnd(58)} ${value.padStart(12)}  ${note}`);
}

async function main(): Promise<void> {
  console.log(`Starpoint benchmark — node ${process.version}, best of 7 batches\n`);
  const a = [['230∠-120']];
  const b = [['8+j6']];
  const ar = [['-115-j199.186']];
  const divPolar = nsPerCall(() => functions.DIV(a, b));
  const divRect = nsPerCall(() => functions.DIV(ar, b));
  const cjs = nsPerCall(() => new Complex('-115-199.186i').div(new Complex('8+6i')).toString());
  const mjs = nsPerCall(() => math.format(math.divide(math.complex('-115-199.186i'), math.complex('8+6i'))), 5000);
  row('PHZ.DIV("230∠-120", "8+j6") → polar text', `${divPolar.toFixed(0)} ns`);
  row('PHZ.DIV("-115-j199.186", "8+j6") → polar text', `${divRect.toFixed(0)} ns`);
  row('complex.js: parse ×2 + div + toString', `${cjs.toFixed(0)} ns`);
  row('mathjs: complex() ×2 + divide + format', `${mjs.toFixed(0)} ns`);
  const ratio = Math.max(divPolar, divRect) / cjs;
  row('DIV / complex.js round trip (target ≤ 0.5)', ratio.toFixed(2), ratio <= 0.5 ? 'met' : 'NOT MET');

  const n = 100000;
  const cells: string[][] = [];
  for (let i = 0; i < n; i++) cells.push([i % 3 === 0 ? `${(i % 97) + 1}∠${(i * 7) % 360 - 180}` : `${i % 50}+j${i % 13}`]);
  const sumMs = msOnce(() => functions.SUM([cells]));
  row(`PHZ.SUM over a ${n.toLocaleString('en')}-cell column of text`, `${sumMs.toFixed(1)} ms`, sumMs <= 30 ? 'met (≤ 30 ms)' : 'NOT MET (≤ 30 ms)');

  const r = await benchStarload();
  row(r.name, `${(r.nsPerCall / 1000).toFixed(2)} µs`, r.nsPerCall <= 5000 ? 'met (≤ 5 µs)' : 'NOT MET (≤ 5 µs)');
  if (sink === 0.5) console.log('');
}

void main();
