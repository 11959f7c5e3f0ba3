/**
 * The one phasor formatter: polar `53.6656∠-26.5651°` and rectangular `47.5498-j34.0565`.
 *
 * - `digits` significant figures (1–15, default 6), trailing zeros trimmed.
 * - Polar: magnitude and angle each get `digits` significant figures; angle in (−180, 180].
 * - Rectangular: both parts are rounded at the decimal place that gives the larger part
 *   `digits` significant figures.
 * - A part within 1e-12 of the magnitude is shown as zero; `-0` is never shown; the
 *   zero phasor prints as `0`.
 */
import { PhzError } from './errors';
import type { Phasor } from './phasor';
import { valueMessages as M } from './messages/values';

function assertFinite(z: Phasor): void {
  if (!Number.isFinite(z.re) || !Number.isFinite(z.im)) throw new PhzError(M.notFinite);
}

export const DEFAULT_DIGITS = 6;
/** Parts smaller than this fraction of the magnitude are rounding noise. */
export const NOISE = 1e-12;

/** Number to shortest text at `digits` significant figures; never "-0". */
export function formatNumber(x: number, digits: number = DEFAULT_DIGITS): string {
  if (x === 0) return '0';
  const r = Number(x.toPrecision(digits));
  if (r === 0) return '0';
  return String(r);
}

/** Drops parts that are noise relative to the magnitude. */
function clean(z: Phasor): [number, number] {
  let re = z.re;
  let im = z.im;
  const m = Math.hypot(re, im);
  if (Math.abs(re) <= NOISE * m) re = 0;
  if (Math.abs(im) <= NOISE * m) im = 0;
  return [re, im];
}

/** Polar text, e.g. `230∠-120°`. */
export function formatPolar(z: Phasor, digits: number = DEFAULT_DIGITS): string {
  assertFinite(z);
  const [re, im] = clean(z);
  if (re === 0 && im === 0) return '0';
  const mag = Math.hypot(re, im);
  const ang = (Math.atan2(im, re) * 180) / Math.PI;
  let angText = formatNumber(ang, digits);
  // rounding may carry −179.9999… to −180, which is shown as 180
  if (angText === '-180') angText = '180';
  return `${formatNumber(mag, digits)}\u2220${angText}\u00b0`;
}

/** Rounds x to `decimals` places (negative: to tens, hundreds …) and prints it. */
function atDecimals(x: number, decimals: number): string {
  if (x === 0) return '0';
  let r: number;
  if (decimals >= 0) {
    r = Number(x.toFixed(Math.min(decimals, 100)));
  } else {
    const p = Math.pow(10, -decimals);
    r = Math.round(x / p) * p;
  }
  if (r === 0) return '0';
  // the shortest text for the rounded value; toPrecision guards against binary tails
  return String(Number(r.toPrecision(15)));
}

/** Rectangular text, e.g. `47.5498-j34.0565`, `-j3`, `4`. */
export function formatRect(z: Phasor, digits: number = DEFAULT_DIGITS): string {
  assertFinite(z);
  const [re, im] = clean(z);
  if (re === 0 && im === 0) return '0';
  const big = Math.max(Math.abs(re), Math.abs(im));
  // the decimal exponent of the larger part after rounding (9.9999996 → 1.00000e+1)
  const exp = big.toExponential(digits - 1);
  const e = Number(exp.slice(exp.indexOf('e') + 1));
  const decimals = digits - 1 - e;
  const reText = atDecimals(re, decimals);
  const imAbs = atDecimals(Math.abs(im), decimals);
  if (imAbs === '0') return reText;
  const sign = im < 0 ? '-' : '+';
  if (reText === '0') return `${sign === '-' ? '-' : ''}j${imAbs}`;
  return `${reText}${sign}j${imAbs}`;
}
