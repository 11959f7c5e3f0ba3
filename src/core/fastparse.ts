/**
 * Fast path of the parser for the two most common notations, plain rectangular
 * (`-115-j199.186`, `8+j6`, `7+5j`, `7`) and plain polar in degrees (`230∠-120`, `230∠-120°`,
 * `230<-120`, `230@-120`), ASCII digits, no unit, no decimal comma. It returns false for
 * anything else, and `parsePhasor` then runs the general scanner. A property test checks
 * that both paths agree on every text the fast path accepts.
 */
import { polarDegParts } from './phasor';

let pos = 0;


// exact powers of ten for the correctly rounded fast conversion (Clinger's fast path)
const POW10 = [1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];

/** Unsigned decimal at `pos` (digits, optional point, optional exponent); NaN when none. */
function num(s: string): number {
  // every read is inside the string: charCodeAt past the end is a slow path in V8
  const n = s.length;
  const start = pos;
  let i = pos;
  let mant = 0;
  let c = 0;
  while (i < n && (c = s.charCodeAt(i)) >= 48 && c <= 57) {
    mant = mant * 10 + (c - 48);
    i++;
  }
  const nd = i - start;
  let frac = 0;
  if (i < n && s.charCodeAt(i) === 46) {
    i++;
    const f0 = i;
    while (i < n && (c = s.charCodeAt(i)) >= 48 && c <= 57) {
      mant = mant * 10 + (c - 48);
      i++;
    }
    frac = i - f0;
  }
  if (nd + frac === 0) return NaN;
  // an exponent, or the start of e^(…): leave both to the general scanner
  if (i < n && (s.charCodeAt(i) | 32) === 101) return NaN;
  pos = i;
  if (nd + frac <= 15) return mant / POW10[frac];
  return Number(s.slice(start, i));
}

/** The character code at i, or -1 past the end (never an out-of-bounds read). */
function at(s: string, i: number): number {
  return i < s.length ? s.charCodeAt(i) : -1;
}

function spaces(s: string): void {
  const n = s.length;
  while (pos < n && s.charCodeAt(pos) === 32) pos++;
}

/** Parts of the last successful `fastParse` (one shared record: no allocation per call). */
export const fastResult = { re: 0, im: 0 };

function ok(re: number, im: number): true {
  fastResult.re = re;
  fastResult.im = im;
  return true;
}

/** True (parts in fastResult) for the common notations, false for anything else. */
export function fastParse(s: string): boolean {
  pos = 0;
  spaces(s);
  let c = at(s, pos);
  let neg = false;
  if (c === 45 || c === 43) {
    neg = c === 45;
    pos++;
    spaces(s);
  }
  const a = num(s);
  if (a !== a) return false; // NaN: not a plain number here
  const first = neg ? -a : a;
  spaces(s);
  c = at(s, pos);
  if (pos === s.length) return ok(first, 0);
  if (c === 0x2220 || c === 60 || c === 64) {
    // polar in degrees
    pos++;
    spaces(s);
    c = at(s, pos);
    let an = false;
    if (c === 45 || c === 43) {
      an = c === 45;
      pos++;
      spaces(s);
    }
    const d = num(s);
    if (d !== d) return false;
    spaces(s);
    if (at(s, pos) === 0xb0) {
      pos++;
      spaces(s);
    }
    if (pos !== s.length || neg) return false;
    // the same conversion as the general path, so both give identical bits
    polarDegParts(a, an ? -d : d, fastResult);
    return true;
  }
  if ((c | 32) === 106 || (c | 32) === 105) {
    // 4j
    pos++;
    spaces(s);
    return pos === s.length ? ok(0, first) : false;
  }
  if (c !== 43 && c !== 45) return false;
  const imNeg = c === 45;
  pos++;
  spaces(s);
  c = at(s, pos);
  let b: number;
  if ((c | 32) === 106 || (c | 32) === 105) {
    pos++;
    spaces(s);
    b = num(s);
    if (b !== b) return false;
  } else {
    b = num(s);
    if (b !== b) return false;
    spaces(s);
    c = at(s, pos);
    if ((c | 32) !== 106 && (c | 32) !== 105) return false;
    pos++;
  }
  spaces(s);
  if (pos !== s.length) return false;
  return ok(first, imNeg ? -b : b);
}
