/**
 * Varied, realistic inputs for the benchmark: supply voltages and load impedances as an
 * engineer types them (two or three decimals, angles that are not multiples of 15°), from
 * a seeded generator so every run times the same values. Not used by any test.
 */
import { seeded } from './seeded';

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
  const next = seeded(seed);
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

export interface NetworkCase {
  /** Source phase voltages (star) or line voltages (delta) as polar text, one per row. */
  readonly supply: string[][];
  /** Three load impedances as rectangular text, one per row. */
  readonly loads: string[][];
  /** One line impedance for every line. */
  readonly line: string[][];
}

/**
 * `n` three-phase networks as an engineer types them: a supply of 220–240 V phases a degree
 * or two off the ideal angles (their line voltages for a delta), three unequal loads of
 * 2–60 Ω at varied power factors, and a line impedance of 0.05–0.5 Ω.
 */
export function networkCases(n: number, kind: 'star' | 'delta', seed = 20261202): NetworkCase[] {
  const next = seeded(seed);
  const out: NetworkCase[] = [];
  for (let k = 0; k < n; k++) {
    // phase voltages a volt or a degree or two off the ideal set; a delta is fed their line
    // voltages (V1 − V2, V2 − V3, V3 − V1), which close as measured ones do
    const phases = [0, -120, 120].map((a) => {
      const m = Number(decimal(next, 220, 240, 1));
      const r = ((a + (next() - 0.5) * 3) * Math.PI) / 180;
      return [m * Math.cos(r), m * Math.sin(r)];
    });
    const parts = kind === 'star' ? phases : [0, 1, 2].map((i) => [phases[i][0] - phases[(i + 1) % 3][0], phases[i][1] - phases[(i + 1) % 3][1]]);
    const supply = parts.map(([re, im]) => [`${Math.hypot(re, im).toFixed(2)}∠${((Math.atan2(im, re) * 180) / Math.PI).toFixed(2)}`]);
    const loads = [0, 1, 2].map(() => {
      const r = decimal(next, 2, 60, 2);
      const x = decimal(next, -15, 30, 2);
      return [`${r}${x.startsWith('-') ? '-j' + x.slice(1) : '+j' + x}`];
    });
    out.push({ supply, loads, line: [[`${decimal(next, 0.05, 0.5, 3)}+j${decimal(next, 0.02, 0.2, 3)}`]] });
  }
  return out;
}
