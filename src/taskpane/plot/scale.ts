/** Magnitude scales of the plot: rounded ring values, and numbers with SI prefixes for labels. */

/** The smallest of 1, 2, 2.5, 5 × 10^k that is ≥ `x` (x > 0). */
export function niceCeil(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) return 1;
  const exp = Math.floor(Math.log10(x));
  const base = 10 ** exp;
  for (const m of [1, 2, 2.5, 5, 10]) {
    const v = m * base;
    // tolerate rounding in m × 10^k (e.g. 2.5e-7)
    if (v >= x * (1 - 1e-12)) return v;
  }
  return 10 * base;
}

/** One group's rings: `count` rings every `step`, the outer one at `full`. */
export interface GroupScale {
  readonly step: number;
  readonly full: number;
}

/** Ring counts the plot chooses from (every group of one diagram shares the count). */
export const RING_COUNTS = [3, 4, 5] as const;

/**
 * Rings for groups whose largest magnitudes are `maxima`: one ring count for all (the rings
 * are drawn once), each group its own rounded step. The count chosen leaves the largest
 * arrow of the worst-filled group as long as possible.
 *
 * @example ringScales([230, 12.3]) // 5 rings: 50 V steps (full 250), 2.5 A steps (full 12.5)
 */
export function ringScales(maxima: readonly number[]): { count: number; scales: GroupScale[] } {
  let best: { count: number; scales: GroupScale[]; fill: number } | undefined;
  for (const count of RING_COUNTS) {
    const scales = maxima.map((m) => {
      const step = m > 0 && Number.isFinite(m) ? niceCeil(m / count) : 0.25;
      return { step, full: step * count };
    });
    const fill = Math.min(...maxima.map((m, i) => (m > 0 ? m / scales[i].full : 1)));
    if (!best || fill > best.fill + 1e-9) best = { count, scales, fill };
  }
  return { count: best!.count, scales: best!.scales };
}

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
];

/** The SI prefix for values up to `full` in `unit` (none when there is no unit). */
export function prefixFor(full: number, unit: string): readonly [number, string] {
  if (unit === '' || !(full > 0)) return [1, ''];
  for (const p of PREFIXES) if (full >= p[0] * 0.9999) return p;
  return PREFIXES[PREFIXES.length - 1];
}

/** A number in at most `digits` significant figures, trailing zeros trimmed, true minus sign. */
export function shortNumber(v: number, digits = 4): string {
  if (v === 0 || Object.is(v, -0)) return '0';
  const s = String(Number(v.toPrecision(digits)));
  const t = /e/.test(s) ? v.toExponential(digits - 1).replace(/\.?0+e/, 'e') : s;
  return t.replace('-', '−');
}

/** `5000` in V with the prefix chosen for `full` → `5 kV`; without a unit just the number. */
export function formatScaled(v: number, unit: string, full: number): string {
  const [f, p] = prefixFor(full, unit);
  const n = shortNumber(v / f);
  return unit ? `${n} ${p}${unit}` : n;
}
