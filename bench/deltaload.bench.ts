/**
 * DELTALOAD per call with line impedances: read the arguments, solve the network (star
 * equivalent, stiff-safe branch currents), format the 3×4 table. 64 different networks
 * (bench/inputs.ts), taken in turn. Called by `npm run bench` (bench/run.ts); figures are
 * printed, never asserted.
 */
import { functions } from '../src/functions';
import { networkCases } from './inputs';
import { bestNsPerCall } from './seeded';

const CASES = networkCases(64, 'delta');

/** Best ns per call over several timed batches after a warm-up. */
export async function benchDeltaload(): Promise<{ name: string; nsPerCall: number }> {
  const nsPerCall = bestNsPerCall((i) => {
    const c = CASES[i & 63];
    return functions.DELTALOAD(c.supply, c.loads, c.line, null, null);
  });
  return { name: 'PHZ.DELTALOAD (64 varied networks with line impedance; parse, solve, format 3×4)', nsPerCall };
}
