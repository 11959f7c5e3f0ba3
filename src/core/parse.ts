/**
 * The one phasor parser. Every text a cell can hold goes through `parsePhasor`.
 *
 * Notations (spaces anywhere; letters j, i, e, rad, deg and unit words in any case):
 * - rectangular: `7+j5`, `7+5j`, `7+5i`, `7 - j 5`, `-j3`, `j`, `2.5e-3+j1e-2`, `−` (U+2212) as minus;
 * - polar, degrees by default: `230∠-120`, `230∠-120°`, `230<-120`, `230@-120`, `1∠0.5rad`;
 * - exponential: `230e^(j30)`, `230e^(-j30°)`;
 * - a decimal comma where no other reading exists: `7,5+j2,25`, `0,125`, `0,250+j0,080`;
 * - a unit with SI prefix after the number or at the end: `11 kV∠0`, `7+j5 Ω`, `250 mΩ`.
 *   The prefix scales the value; the unit word is checked (and, when the caller says
 *   what quantity it expects, matched), never converted — except that a power unit says
 *   which part of S = P + jQ the value is: var is reactive power, so `40 kvar` and
 *   `j40 kvar` are both j40 000; W is real power; VA is complex power (any value).
 */
import { PhzError } from './errors';
import { polarDeg, polar, rect, type Phasor } from './phasor';
import { parseMessages as M } from './messages/parse';
import { fastParse, fastResult } from './fastparse';

/** The physical quantity a unit word names. */
export type Quantity = 'voltage' | 'current' | 'impedance' | 'admittance' | 'power';

/** A unit as the parser read it (prefix removed). W, var and VA are three kinds of power. */
export type UnitSymbol = 'V' | 'A' | 'Ω' | 'S' | 'W' | 'var' | 'VA';

/** Where the parser writes the unit a text carried (null for none). */
export interface UnitSeen {
  unit: UnitSymbol | null;
}

export interface ParseOptions {
  /** When set, a unit word for another quantity is an error. */
  readonly expect?: Quantity;
  /**
   * When set, the parser writes here the unit of a text that carries one, and leaves it
   * alone otherwise (so plain text costs nothing): set `unit` to null before, or after
   * reading one.
   */
  readonly seen?: UnitSeen;
}

/** The quantity each unit measures. */
export const QUANTITY_OF: Readonly<Record<UnitSymbol, Quantity>> = {
  V: 'voltage',
  A: 'current',
  Ω: 'impedance',
  S: 'admittance',
  W: 'power',
  var: 'power',
  VA: 'power',
};

/** Unit words, lower case, to the unit they name. */
const UNIT_WORDS: Readonly<Record<string, UnitSymbol>> = {
  ohms: 'Ω',
  ohm: 'Ω',
  var: 'var',
  va: 'VA',
  v: 'V',
  a: 'A',
  w: 'W',
  s: 'S',
  // Ω: both the Greek capital omega (U+03A9) and the ohm sign (U+2126) lower-case to ω
  '\u03c9': 'Ω',
};

const PREFIX: Readonly<Record<string, number>> = {
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  '\u00b5': 1e-6, // µ micro sign
  '\u03bc': 1e-6, // μ Greek mu
  m: 1e-3,
  k: 1e3,
  K: 1e3,
  M: 1e6,
  G: 1e9,
};

const C_SPACE = 32;
const C_TAB = 9;
const C_NBSP = 0xa0;
const C_PLUS = 43;
const C_MINUS = 45;
const C_UMINUS = 0x2212;
const C_DOT = 46;
const C_COMMA = 44;
const C_0 = 48;
const C_9 = 57;

function isDigit(c: number): boolean {
  return c >= C_0 && c <= C_9;
}

function lower(c: number): number {
  return c >= 65 && c <= 90 ? c + 32 : c;
}

/** Scanner state for one text; positions are UTF-16 indexes. */
class Scanner {
  i = 0;
  unit: UnitSymbol | null = null;
  /** Whether the last angle read was in radians. */
  rad = false;
  constructor(
    readonly s: string,
    readonly decimalComma: boolean,
  ) {}

  get done(): boolean {
    return this.i >= this.s.length;
  }
  peek(): number {
    return this.s.charCodeAt(this.i);
  }
  ws(): void {
    const s = this.s;
    for (;;) {
      const c = s.charCodeAt(this.i);
      if (c === C_SPACE || c === C_TAB || c === C_NBSP || c === 0x202f || c === 10 || c === 13) this.i++;
      else return;
    }
  }
  /** Reads an optional sign; returns -1, 1, or 0 when none. */
  sign(): number {
    const c = this.peek();
    if (c === C_PLUS) {
      this.i++;
      return 1;
    }
    if (c === C_MINUS || c === C_UMINUS) {
      this.i++;
      return -1;
    }
    return 0;
  }
  isLetter(letter: number): boolean {
    return lower(this.peek()) === letter;
  }
  /** Reads an unsigned decimal number, or returns NaN (position unchanged) when none starts here. */
  number(): number {
    const s = this.s;
    const start = this.i;
    let i = start;
    while (isDigit(s.charCodeAt(i))) i++;
    let digits = i - start;
    let comma = -1;
    const c = s.charCodeAt(i);
    if (c === C_DOT || (c === C_COMMA && this.decimalComma)) {
      if (c === C_COMMA) comma = i;
      i++;
      const f = i;
      while (isDigit(s.charCodeAt(i))) i++;
      digits += i - f;
    }
    if (digits === 0) return NaN;
    // exponent: e or E followed by digits (not "e^", which starts the exponential form)
    let uminus = false;
    if ((s.charCodeAt(i) | 32) === 101) {
      let k = i + 1;
      const sc = s.charCodeAt(k);
      if (sc === C_PLUS || sc === C_MINUS || sc === C_UMINUS) k++;
      if (isDigit(s.charCodeAt(k))) {
        uminus = sc === C_UMINUS;
        while (isDigit(s.charCodeAt(k))) k++;
        i = k;
      }
    }
    this.i = i;
    let text = s.slice(start, i);
    if (comma >= 0) text = text.replace(',', '.');
    if (uminus) text = text.replace('\u2212', '-');
    return Number(text);
  }
  /**
   * Reads an optional unit (SI prefix + unit word) and returns its scale (1 when none).
   * A unit may appear once in a phasor.
   */
  unitScale(): number {
    const s = this.s;
    const at = this.i;
    const c0 = s.charCodeAt(at);
    // fast exit: units start with a letter, µ, μ or Ω
    const letter = (c0 | 32) >= 97 && (c0 | 32) <= 122;
    if (!letter && c0 !== 0xb5 && c0 !== 0x3bc && c0 !== 0x3a9 && c0 !== 0x2126 && c0 !== 0x3c9) return 1;
    for (let withPrefix = 1; withPrefix >= 0; withPrefix--) {
      let k = at;
      let scale = 1;
      if (withPrefix) {
        const p = PREFIX[s[k]];
        if (p === undefined) continue;
        scale = p;
        k++;
      }
      let end = k;
      while (end < s.length) {
        const ch = s.charCodeAt(end);
        const isWordChar = ((ch | 32) >= 97 && (ch | 32) <= 122) || ch === 0x3a9 || ch === 0x2126 || ch === 0x3c9;
        if (!isWordChar) break;
        end++;
      }
      const word = s.slice(k, end).toLowerCase();
      const u = UNIT_WORDS[word];
      if (u === undefined) continue;
      if (this.unit !== null) throw this.fail(M.twoUnits);
      this.unit = u;
      this.i = end;
      return scale;
    }
    return 1;
  }
  fail(why: string): PhzError {
    return new PhzError(M.stoppedAt(this.s, this.i, why));
  }
}

/**
 * Angle after ∠ < @ or inside e^(j…): signed number with optional °, deg or rad.
 * Returns degrees, or radians when the text says rad (then `sc.rad` is set).
 */
function angleValue(sc: Scanner): number {
  sc.rad = false;
  sc.ws();
  const sg = sc.sign();
  sc.ws();
  const v = sc.number();
  if (Number.isNaN(v)) throw sc.fail(M.angleExpected);
  sc.ws();
  const c = sc.peek();
  const value = sg === -1 ? -v : v;
  if (c === 0xb0 || c === 0xba) {
    sc.i++;
    return value;
  }
  if (sc.done) return value;
  const rest = sc.s.slice(sc.i, sc.i + 3).toLowerCase();
  if (rest === 'rad') {
    sc.i += 3;
    sc.rad = true;
    return value;
  }
  if (rest === 'deg') sc.i += 3;
  return value;
}

/** Phasor from a magnitude and the angle just read (exact at multiples of 90°). */
function fromAngle(sc: Scanner, mag: number, angle: number): Phasor {
  return sc.rad ? polar(mag, angle) : polarDeg(mag, angle);
}

function isAngleMark(c: number): boolean {
  return c === 0x2220 || c === 60 || c === 64; // ∠ < @
}

/** Exponential tail after the magnitude: e^( ±j θ ). Position is at the 'e'. Returns the angle (see angleValue). */
function expAngle(sc: Scanner): number {
  sc.i++; // e
  sc.ws();
  if (sc.peek() !== 94) throw sc.fail(M.expForm);
  sc.i++;
  sc.ws();
  if (sc.peek() !== 40) throw sc.fail(M.expForm);
  sc.i++;
  sc.ws();
  const sg = sc.sign();
  sc.ws();
  if (!(sc.isLetter(106) || sc.isLetter(105))) throw sc.fail(M.expForm);
  sc.i++;
  const a = angleValue(sc);
  sc.ws();
  if (sc.peek() !== 41) throw sc.fail(M.closeParen);
  sc.i++;
  return sg === -1 ? -a : a;
}

/**
 * Where a comma is used, decide whether it is a decimal comma. A thousands-grouped number
 * has one to three leading digits, the first not 0, then groups of exactly three digits
 * (common practice). A comma that cannot be part of such a number (`0,125`, `2,5`,
 * `1234,5`) is a decimal comma, and then every comma of the text is. Where every comma
 * could be either, the text is refused with both readings.
 */
function commaMode(text: string): boolean {
  if (text.indexOf(',') < 0) return false;
  if (text.indexOf('.') >= 0) throw new PhzError(M.commaAndPoint(text));
  let decimalOnly = false;
  let thousandsOnly = false;
  for (const run of text.match(/[0-9,]*,[0-9,]*/g) ?? []) {
    const parts = run.split(',');
    const lead = parts[0];
    const couldBeThousands = lead.length >= 1 && lead.length <= 3 && lead[0] !== '0' && parts.slice(1).every((g) => g.length === 3);
    if (!couldBeThousands) decimalOnly = true;
    else if (parts.length > 2) thousandsOnly = true;
  }
  if (decimalOnly) return true;
  const t = text.trim();
  if (thousandsOnly) throw new PhzError(M.thousandsSeparators(t, t.replace(/,/g, '')));
  const commas = (t.match(/,/g) ?? []).length;
  throw new PhzError(M.ambiguousComma(t, commas, t.replace(/,/g, ''), t.replace(/,/g, '.')));
}

/**
 * Reads one phasor from text. Throws `PhzError` with what was read, where it stopped
 * and an example of a valid form.
 *
 * @example parsePhasor('230∠-120') // ≈ -115 - j199.186
 */
export function parsePhasor(text: string, options?: ParseOptions): Phasor {
  if (fastParse(text)) return rect(fastResult.re, fastResult.im);
  return parseGeneral(text, options);
}

/** A phasor read from text with the quantity its unit word names (`null` when no unit was given). */
export interface PhasorWithQuantity {
  readonly phasor: Phasor;
  readonly quantity: Quantity | null;
}

/**
 * Reads one phasor like `parsePhasor` and also says which quantity its unit word names, so
 * a caller can show the unit (the phasor plot's legend). Same notations, same messages.
 *
 * @example parsePhasorWithQuantity('11 kV∠0') // { phasor: 11000 + j0, quantity: 'voltage' }
 */
export function parsePhasorWithQuantity(text: string, options?: ParseOptions): PhasorWithQuantity {
  const seen: UnitSeen = { unit: null };
  const phasor = parsePhasor(text, { ...options, seen });
  return { phasor, quantity: seen.unit === null ? null : QUANTITY_OF[seen.unit] };
}

/**
 * Reads one real number with an optional unit (`4 kW`, `-2,5 kvar`, `0,8`, `1e3`) for a
 * numeric argument: the prefix scales it and the unit goes to `seen` for the caller to
 * accept or refuse (a var value stays a plain number here: the argument says what it is).
 * NaN when the text is not one number with an optional unit; a `PhzError` for a comma
 * that could be read two ways or a value too large.
 */
export function parseNumberText(text: string, seen: UnitSeen): number {
  const sc = new Scanner(text, commaMode(text));
  sc.ws();
  const sg = sc.sign();
  sc.ws();
  const v = sc.number();
  if (Number.isNaN(v)) return NaN;
  sc.ws();
  const scale = sc.done ? 1 : sc.unitScale();
  sc.ws();
  if (!sc.done) return NaN;
  const x = (sg === -1 ? -v : v) * scale;
  if (!Number.isFinite(x)) throw new PhzError(M.tooLarge(text));
  seen.unit = sc.unit;
  return x;
}

/** The general scanner: every notation, with messages. Exported for the fast-path agreement test. */
export function parseGeneral(text: string, options?: ParseOptions): Phasor {
  return scan(new Scanner(text, commaMode(text)), options);
}

function scan(sc: Scanner, options: ParseOptions | undefined): Phasor {
  sc.ws();
  if (sc.done) throw new PhzError(M.empty);
  let re = 0;
  let im = 0;
  let terms = 0;
  let hadImag = false;
  let hadReal = false;
  let scale = 1;
  for (;;) {
    sc.ws();
    let sg = sc.sign();
    if (terms > 0 && sg === 0) throw sc.fail(M.expectedSign);
    sc.ws();
    // a second sign, as in 4+-j2
    if (terms > 0) {
      const sg2 = sc.sign();
      if (sg2 !== 0) {
        sg = sg * sg2;
        sc.ws();
      }
    }
    const neg = sg === -1;
    if (sc.isLetter(106) || sc.isLetter(105)) {
      // j-prefixed imaginary part: j, j2, j 2, and j-2 as some tools write it
      sc.i++;
      sc.ws();
      const inner = sc.sign();
      sc.ws();
      let v = sc.number();
      if (Number.isNaN(v)) {
        if (inner !== 0) throw sc.fail(M.numberExpected);
        v = 1;
      }
      if (inner === -1) v = -v;
      if (hadImag) throw sc.fail(M.twoImag);
      hadImag = true;
      im = neg ? -v : v;
    } else if (terms === 0 && sc.isLetter(101)) {
      // e^(jθ) with magnitude 1
      const a = expAngle(sc);
      const z = fromAngle(sc, neg ? -1 : 1, a);
      return finish(sc, z.re, z.im, options);
    } else {
      const v = sc.number();
      if (Number.isNaN(v)) throw sc.fail(terms === 0 ? M.numberExpected : M.partExpected);
      const signed = neg ? -v : v;
      sc.ws();
      if (sc.isLetter(106) || sc.isLetter(105)) {
        // suffix imaginary part: 2j, 2i
        sc.i++;
        if (hadImag) throw sc.fail(M.twoImag);
        hadImag = true;
        im = signed;
      } else {
        if (terms === 0) {
          // magnitude of a polar or exponential form may carry the unit: 11 kV∠0
          const unitAt = sc.i;
          const s1 = sc.unitScale();
          sc.ws();
          const c = sc.peek();
          if (isAngleMark(c)) {
            sc.i++;
            const a = angleValue(sc);
            const z = fromAngle(sc, signed * s1, a);
            return finish(sc, z.re, z.im, options);
          }
          if (sc.isLetter(101)) {
            const a = expAngle(sc);
            const z = fromAngle(sc, signed * s1, a);
            return finish(sc, z.re, z.im, options);
          }
          if (sc.unit !== null) {
            // a unit after a plain number ends the phasor: "250 mΩ"
            scale = s1;
            re = signed;
            hadReal = true;
            terms++;
            break;
          }
          sc.i = unitAt;
        }
        if (hadReal) throw sc.fail(M.twoReal);
        hadReal = true;
        re = signed;
      }
    }
    terms++;
    sc.ws();
    if (sc.done || terms === 2) break;
    const c = sc.peek();
    if (c !== C_PLUS && c !== C_MINUS && c !== C_UMINUS) break;
  }
  sc.ws();
  return finish(sc, re * scale, im * scale, options);
}

/**
 * Reads a trailing unit, checks nothing is left and the unit fits the expected quantity.
 * A power unit places the value in S = P + jQ: a real value in var is jQ, a value in var
 * that is already imaginary stays, and a complex value in var or a non-real one in W is
 * refused (it is a complex power: VA).
 */
function finish(sc: Scanner, re: number, im: number, options: ParseOptions | undefined): Phasor {
  sc.ws();
  if (!sc.done) {
    const scale = sc.unitScale();
    sc.ws();
    if (!sc.done) throw sc.fail(M.unexpected);
    re *= scale;
    im *= scale;
  }
  const unit = sc.unit;
  if (unit !== null) {
    if (options?.expect && QUANTITY_OF[unit] !== options.expect) {
      throw new PhzError(M.wrongQuantity(sc.s, QUANTITY_OF[unit], options.expect));
    }
    if (unit === 'var') {
      if (re !== 0 && im !== 0) throw new PhzError(M.complexInVar(sc.s));
      if (im === 0) {
        im = re;
        re = 0;
      }
    } else if (unit === 'W' && im !== 0) {
      throw new PhzError(M.imaginaryInWatts(sc.s));
    }
  }
  if (unit !== null && options?.seen) options.seen.unit = unit;
  if (!Number.isFinite(re) || !Number.isFinite(im)) throw new PhzError(M.tooLarge(sc.s));
  return rect(re, im);
}
