/**
 * Varied, realistic inputs for the benchmark: supply voltages and load impedances as an
 * engineer types them (two or three decimals, angles that are not multiples of 15°), from
 * a seeded generator so every run times the same values. Not used by any test.
 */

/** mulberry32: a small seeded generator (public domain), so runs are repeatable. */
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

/** A decimal in [lo, hi) with `decimals` places, as text. */
function decimal(next: () => number, lo: number, hi: number, decimals: number): string {
  return (lo + (hi - lo) * next()).toFixed(decimals);
}

/** An angle in degrees with one or two decimals that is not a multiple of 15°. */
function angle(next: () => number, lo: number, hi: number): string {
  for (;;) {
    const t = decimal(next, lo, hi, next() < 0.5 ? 1 : 2);
    if (Number(t) % 15 !== 0) return t;
  }
}

export interface DivCase {
  /** Dividend as polar text, e.g. `231.7∠-118.64`. */
  readonly polar: string;
  /** The same dividend's parts as rectangular text with j, e.g. `-111.2-j203.35`. */
  readonly rectJ: string;
  /** The same rectangular dividend with an i suffix (complex.js and IMDIV read only this). */
  readonly rectI: string;
  /** Divisor (an impedance) as rectangular text with j. */
  readonly divisorJ: string;
  /** The same divisor with an i suffix. */
  readonly divisorI: string;
}

/** `n` distinct cases: voltages 180–420 V at varied angles, impedances 0.5–60 Ω, −30…+40 Ω. */
export function divCases(n: number, seed = 20240611): DivCase[] {
  const next = generator(seed);
  const out: DivCase[] = [];
  const seen = new Set<string>();
  while (out.length < n) {
    const mag = decimal(next, 180, 420, next() < 0.5 ? 1 : 2);
    const ang = angle(next, -179.9, 180);
    const r = (Number(mag) * Math.cos((Number(ang) * Math.PI) / 180)).toFixed(3);
    const x = (Number(mag) * Math.sin((Number(ang) * Math.PI) / 180)).toFixed(3);
    const zr = decimal(next, 0.5, 60, 2);
    const zx = decimal(next, -30, 40, 2);
    const key = `${mag}/${ang}/${zr}/${zx}`;
    if (seen.has(key)) continue;
    seen.add(key);
    const rectJ = `${r}${x.startsWith('-') ? '-j' + x.slice(1) : '+j' + x}`;
    const rectI = `${r}${x.startsWith('-') ? x : '+' + x}i`;
    const divisorJ = `${zr}${zx.startsWith('-') ? '-j' + zx.slice(1) : '+j' + zx}`;
    const divisorI = `${zr}${zx.startsWith('-') ? zx : '+' + zx}i`;
    out.push({ polar: `${mag}∠${ang}`, rectJ, rectI, divisorJ, divisorI });
  }
  return out;
}
