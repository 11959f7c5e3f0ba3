/**
 * DELTALOAD per call with line impedances (the network route: star equivalent, three-wire
 * star solve, branch currents): read the arguments, solve, format the 3×4 table of polar
 * text. Called by `npm run bench` (bench/run.ts); figures are printed, never asserted.
 */
import { functions } from '../src/functions';

const LINE_VOLTS = [['400∠30'], ['400∠-90'], ['400∠150']];
const LOADS = [['30+j12'], ['45-j20'], ['25+j5']];
const LINE = [['0.15+j0.08']];
let sink = 0;

/** Best ns per call over several timed batches after a warm-up. */
export async function benchDeltaload(): Promise<{ name: string; nsPerCall: number }> {
  const call = (): unknown[][] => functions.DELTALOAD(LINE_VOLTS, LOADS, LINE, null, null);
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
  return { name: 'PHZ.DELTALOAD (line impedance; parse, solve, format 3×4)', nsPerCall: best };
}
