/**
 * STARLOAD per call: read the arguments (parse six text phasors and the neutral),
 * solve (Millman), format the 4×3 table of polar text. Called by `npm run bench`
 * (bench/run.ts); the target is ≤ 5 µs per call. Figures are printed, never asserted.
 */
import { functions } from '../src/functions';

const SOURCES = [['230∠0'], ['230∠-120'], ['230∠120']];
const LOADS = [['12+j5'], ['20'], ['8-j6']];
const LINE = [['0.15+j0.08']];
let sink = 0;

/** Best ns per call over several timed batches after a warm-up. */
export async function benchStarload(): Promise<{ name: string; nsPerCall: number }> {
  const call = (): unknown[][] => functions.STARLOAD(SOURCES, LOADS, [['open']], LINE, null, null);
  const batch = 20000;
  for (let i = 0; i < batch; i++) sink += call().length;
  let best = Infinity;
  for (let r = 0; r < 7; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) sink += call().length;
    const ns = Number(process.hrtime.bigint() - t0) / batch;
    if (ns < best) best = ns;
  }
  if (sink === -1) console.log(sink);
  return { name: 'PHZ.STARLOAD (3-wire, line impedance; parse, solve, format 4×3)', nsPerCall: best };
}
