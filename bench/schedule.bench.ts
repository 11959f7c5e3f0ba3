/**
 * PHZ.SCHEDULE per call on a 500-way schedule: read every cell (connections in the spellings
 * schedules use, loads in W, kW, VA and kVA with decimal points and commas, power factors
 * lagging and "lead", shares and demand factors as fractions and percentages), aggregate,
 * and format the 4×5 table, with a harmonic table. Sixteen different schedules from a seeded
 * generator, taken in turn, so no call times the same cells as the one before. Called by
 * `npm run bench` (bench/run.ts); figures are printed, never asserted.
 */
import { functions } from '../src/functions';

function generator(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const CONNECTIONS = ['L1', 'L2', 'L3', 'A', 'B', 'C', '1', '2', '3', 'L1-L2', 'L2-L3', 'L3-L1', 'AB', 'BC', 'CA', '3P', 'ABC', '123'];

interface Schedule {
  readonly connections: unknown[][];
  readonly loads: unknown[][];
  readonly pfs: unknown[][];
  readonly nonlinear: unknown[][];
  readonly demand: unknown[][];
}

/** A schedule of `n` ways as a sheet holds it. */
export function scheduleCells(n: number, seed: number): Schedule {
  const next = generator(seed);
  const s: Schedule = { connections: [], loads: [], pfs: [], nonlinear: [], demand: [] };
  for (let i = 0; i < n; i++) {
    s.connections.push([CONNECTIONS[Math.floor(next() * CONNECTIONS.length)]]);
    const kw = 0.1 + 14.9 * next();
    const form = next();
    s.loads.push([
      form < 0.25 ? Math.round(kw * 1000) : form < 0.5 ? `${kw.toFixed(2)} kW` : form < 0.75 ? `${(kw * 1.1).toFixed(1)} kVA` : `${kw.toFixed(2).replace('.', ',')} kW`,
    ]);
    const pf = (0.6 + 0.4 * next()).toFixed(2);
    s.pfs.push([next() < 0.15 ? `${pf} lead` : Number(pf)]);
    s.nonlinear.push([next() < 0.5 ? 0 : next() < 0.5 ? `${Math.round(next() * 100)} %` : Number(next().toFixed(2))]);
    s.demand.push([next() < 0.6 ? 1 : `${Math.round(40 + 60 * next())} %`]);
  }
  return s;
}

const SUPPLY = [['231∠0'], ['228.5∠-120.4'], ['232.1∠119.7']];
const HARMONICS = [
  [3, 78],
  [5, 52],
  [7, 30],
  [9, 14],
  [11, 8],
];
let sink = 0;

/** Best µs per call over several timed batches after a warm-up. */
export function benchSchedule(n = 500): number {
  const cases = Array.from({ length: 16 }, (_, k) => scheduleCells(n, 100 + k));
  let k = 0;
  const call = (): unknown[][] => {
    const s = cases[(k = (k + 1) & 15)];
    return functions.SCHEDULE(SUPPLY, s.connections, s.loads, s.pfs, s.nonlinear, s.demand, HARMONICS, null, null);
  };
  const batch = 200;
  for (let i = 0; i < batch; i++) sink += call().length;
  let best = Infinity;
  for (let r = 0; r < 9; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) sink += call().length;
    const us = Number(process.hrtime.bigint() - t0) / 1000 / batch;
    if (us < best) best = us;
  }
  if (sink === -1) console.log(sink);
  return best;
}
