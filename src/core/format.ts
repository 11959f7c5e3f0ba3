/**
 * The one phasor formatter: polar `26.2365∠-20.709°` and rectangular `24.5413-j9.2778`.
 *
 * - `digits` significant figures (1–15, default 6), trailing zeros trimmed.
 * - Polar: magnitude and angle each get `digits` significant figures; angle in (−180, 180].
 * - Rectangular: both parts are rounded at the decimal place that gives the larger part
 *   `digits` significant figures.
 * - A part within 1e-12 of the magnitude is shown as zero; `-0` is never shown; the
 *   zero phasor prints as `0`.
 */
import { PhzError } from './errors';
import { NOISE_REL, magnitudeOf, type Phasor } from './phasor';
import { valueMessages as M } from './messages/values';

function assertFinite(z: Phasor): void {
  if (!Number.isFinite(z.re) || !Number.isFinite(z.im)) throw new PhzError(M.notFinite);
}

export const DEFAULT_DIGITS = 6;

// exact powers of ten: scaling by them and rounding gives the correctly rounded result
/** 10^−i, the nearest doubles; only compared against. */
const NEG10 = [1, 1e-1, 1e-2, 1e-3, 1e-4, 1e-5, 1e-6];
const POW10 = [1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];

/** Number to shortest text at `digits` significant figures; never "-0". */
export function formatNumber(x: number, digits: number = DEFAULT_DIGITS): string {
  if (x === 0) return '0';
  const ax = x < 0 ? -x : x;
  if (digits <= 15 && ax >= 1e-6 && ax < 1e15) {
    const t = fastDigits(ax, digits, x < 0 ? -1 : 1);
    if (t !== undefined) return t;
  }
  return slowDigits(x, digits);
}

/** The reference rounding: exact decimal rounding by toPrecision, then the shortest text. */
export function slowDigits(x: number, digits: number): string {
  const r = Number(x.toPrecision(digits));
  return r === 0 ? '0' : String(r);
}

/**
 * Fast rounding for ordinary magnitudes: round |x|·10^k to an integer (10^k exact, so the
 * scaled value is the correctly rounded product) and scale back. Returns
 * undefined near a rounding tie, where toPrecision's exact decimal decides. A property
 * test checks it against `slowDigits`.
 */
function fastDigits(ax: number, digits: number, sign: number): string | undefined {
  // decimal exponent by comparison (Math.log10 can be one off at powers of ten)
  let e: number;
  if (ax >= 1) {
    e = 0;
    while (e < 15 && ax >= POW10[e + 1]) e++;
  } else {
    e = -1;
    while (e > -6 && ax < NEG10[-e]) e--;
  }
  const k = digits - 1 - e;
  if (k < 0) {
    const scaled = ax / POW10[-k];
    const f = scaled - Math.floor(scaled);
    if (f > 0.4999999 && f < 0.5000001) return undefined;
    const v = Math.round(scaled) * POW10[-k];
    return v === 0 ? '0' : String(sign * v);
  }
  if (k > 22) return undefined;
  const scaled = ax * POW10[k];
  const f = scaled - Math.floor(scaled);
  if (f > 0.4999999 && f < 0.5000001) return undefined;
  const n = Math.round(scaled);
  if (n === 0) return '0';
  // n / 10^k is the correctly rounded double of a decimal of at most 15 significant
  // digits, so its shortest text is that decimal with trailing zeros trimmed
  return String((sign * n) / POW10[k]);
}

/** Polar text, e.g. `230∠-120°`. */
export function formatPolar(z: Phasor, digits: number = DEFAULT_DIGITS): string {
  let re = z.re;
  let im = z.im;
  // re − re is 0 for finite numbers and NaN for ±∞ and NaN
  if (re - re !== 0 || im - im !== 0) throw new PhzError(M.notFinite);
  const m0 = magnitudeOf(re, im);
  // a part within 1e-12 of the magnitude is noise
  if (Math.abs(re) <= NOISE_REL * m0) re = 0;
  if (Math.abs(im) <= NOISE_REL * m0) im = 0;
  if (re === 0 && im === 0) return '0';
  const mag = re === 0 ? Math.abs(im) : im === 0 ? Math.abs(re) : m0;
  const ang = (Math.atan2(im, re) * 180) / Math.PI;
  let angText = formatNumber(ang, digits);
  // rounding may carry −179.9999… to −180, which is shown as 180
  if (angText === '-180') angText = '180';
  return `${formatNumber(mag, digits)}\u2220${angText}\u00b0`;
}

/** Drops parts that are noise relative to the magnitude. */
function clean(z: Phasor): [number, number] {
  let re = z.re;
  let im = z.im;
  const m = magnitudeOf(re, im);
  if (Math.abs(re) <= NOISE_REL * m) re = 0;
  if (Math.abs(im) <= NOISE_REL * m) im = 0;
  return [re, im];
}

/** Decimal exponent of |x| (x ≠ 0) as printed: 1234 → 3, 0.05 → −2. */
function exponentOf(x: number, digits: number): number {
  const t = Math.abs(x).toExponential(digits - 1);
  return Number(t.slice(t.indexOf('e') + 1));
}

/** Rounds x at the 10^−decimals place (decimals may be negative) and prints it shortest. */
function atDecimals(x: number, decimals: number): string {
  if (x === 0) return '0';
  // significant figures of x that reach down to the 10^−decimals place
  const sig = exponentOf(x, 15) + decimals + 1;
  let r: number;
  if (sig >= 1) {
    r = Number(x.toPrecision(Math.min(sig, 17)));
  } else if (sig === 0) {
    // x is below one unit of that place: it rounds to 0 or to one unit
    const unit = Number(`1e${-decimals}`);
    r = Math.abs(x) >= unit / 2 ? Math.sign(x) * unit : 0;
  } else {
    r = 0;
  }
  if (r === 0) return '0';
  return String(r);
}

/** Rectangular text, e.g. `24.5413-j9.2778`, `-j3`, `4`. */
export function formatRect(z: Phasor, digits: number = DEFAULT_DIGITS): string {
  assertFinite(z);
  const [re, im] = clean(z);
  if (re === 0 && im === 0) return '0';
  const big = Math.max(Math.abs(re), Math.abs(im));
  // the decimal exponent of the larger part after rounding (9.9999996 → 1.00000e+1)
  const decimals = digits - 1 - exponentOf(big, digits);
  const reText = atDecimals(re, decimals);
  const imAbs = atDecimals(Math.abs(im), decimals);
  if (imAbs === '0') return reText;
  const sign = im < 0 ? '-' : '+';
  if (reText === '0') return `${sign === '-' ? '-' : ''}j${imAbs}`;
  return `${reText}${sign}j${imAbs}`;
}
