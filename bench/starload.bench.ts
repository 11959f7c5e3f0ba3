/**
 * STARLOAD per call: read the arguments (parse six text phasors and the neutral), solve
 * (Millman), format the 4×3 table of polar text. 64 different three-wire networks with line
 * impedances (bench/inputs.ts), taken in turn. Called by `npm run bench` (bench/run.ts);
 * the target is ≤ 5 µs per call. Figures are printed, never asserted.
 */
import { functions } from '../src/functions';
import { networkCases } from './inputs';
import { bestNsPerCall } from './seeded';

const CASES = networkCases(64, 'star');
const OPEN = [['open']];

/** Best ns per call over several timed batches after a warm-up. */
export async function benchStarload(): Promise<{ name: string; nsPerCall: number }> {
  const nsPerCall = bestNsPerCall((i) => {
    const c = CASES[i & 63];
    return functions.STARLOAD(c.supply, c.loads, OPEN, c.line, null, null);
  });
  return { name: 'PHZ.STARLOAD (64 varied 3-wire networks with line impedance; parse, solve, format 4×3)', nsPerCall };
}
