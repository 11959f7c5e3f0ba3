/**
 * What the preview gives its formula engine. The engine reads a formula by recursion, so a
 * formula nested deeply enough, or a very long chain of operators, overflows the call stack
 * (around 130 brackets or 1,200 operators) and a very long formula takes long to read. Such
 * a formula is refused before the engine sees it: the cell keeps the text as typed and shows
 * an error saying why. The limits are documented in the README ("Limits").
 *
 * It also writes exponents the way the engine reads them: Excel takes `1E-3`, the engine
 * only `1e-3`.
 */
import { workbookMessages as M } from '../core/messages';

/** Longest formula, in characters: Excel's own limit (Excel specifications and limits). */
export const MAX_FORMULA_LENGTH = 8192;
/** Deepest nesting of brackets: Excel allows 64 levels of nested functions. */
export const MAX_NESTING = 64;
/** Most operators (+ − * / ^ & = < >) in one formula, outside text. */
export const MAX_OPERATORS = 256;

export type FormulaCheck = { readonly formula: string; readonly refused?: undefined } | { readonly formula?: undefined; readonly refused: string };

/** Characters that continue a name or a number (so `A1E3` or `X1E5` is not an exponent). */
const NAME_CHAR = /[A-Za-z0-9_.$]/;

/**
 * Checks a formula (text starting with `=`) against the limits, and writes `1E-3` as
 * `1e-3` outside text and quoted sheet names.
 *
 * @example checkFormula('=1E-3*2') // { formula: '=1e-3*2' }
 */
export function checkFormula(text: string): FormulaCheck {
  if (text.length > MAX_FORMULA_LENGTH) return { refused: M.formulaTooLong(text.length, MAX_FORMULA_LENGTH) };
  let depth = 0;
  let deepest = 0;
  let operators = 0;
  // where an exponent is written with a capital E (written `e` for the engine)
  let capitals: number[] | undefined;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code === 34 /* " */ || code === 39 /* ' */) {
      // text or a quoted sheet name, to its closing quote (a doubled quote stays inside)
      let j = i + 1;
      for (; j < text.length; j++) {
        if (text.charCodeAt(j) === code) {
          if (text.charCodeAt(j + 1) === code) j++;
          else break;
        }
      }
      i = j;
      continue;
    }
    if (code === 40 /* ( */ || code === 123 /* { */) deepest = Math.max(deepest, ++depth);
    else if (code === 41 /* ) */ || code === 125 /* } */) depth--;
    else if (OPERATOR[code] === 1) {
      if (i > 0) operators++;
    } else if ((code === 69 /* E */ || code === 101 /* e */) && isNumberChar(text.charCodeAt(i - 1))) {
      const sign = text.charCodeAt(i + 1) === 43 /* + */ || text.charCodeAt(i + 1) === 45; /* - */
      if (!isDigit(text.charCodeAt(sign ? i + 2 : i + 1))) continue;
      // an exponent when the number before it starts a token of its own
      let k = i - 1;
      while (k >= 0 && isNumberChar(text.charCodeAt(k))) k--;
      if (k < 0 || !NAME_CHAR.test(text[k])) {
        if (code === 69) (capitals ??= []).push(i);
        // the sign belongs to the exponent, not an operator
        if (sign) i++;
      }
    }
  }
  if (deepest > MAX_NESTING) return { refused: M.formulaTooDeep(deepest, MAX_NESTING) };
  if (operators > MAX_OPERATORS) return { refused: M.formulaTooManyOperators(operators, MAX_OPERATORS) };
  if (!capitals) return { formula: text };
  let out = '';
  let from = 0;
  for (const at of capitals) {
    out += `${text.slice(from, at)}e`;
    from = at + 1;
  }
  return { formula: out + text.slice(from) };
}

/** `+ - * / ^ & = < >` by character code. */
const OPERATOR = new Uint8Array(128);
for (const ch of '+-*/^&=<>') OPERATOR[ch.charCodeAt(0)] = 1;

function isDigit(code: number): boolean {
  return code >= 48 && code <= 57;
}

/** A digit or the decimal point. */
function isNumberChar(code: number): boolean {
  return (code >= 48 && code <= 57) || code === 46;
}

/** True when `text` (outside quotes) holds a doubled quote inside text, which the engine cannot read. */
export function hasDoubledQuote(text: string): boolean {
  let inText = false;
  for (let i = 0; i < text.length; i++) {
    if (text[i] !== '"') continue;
    if (inText && text[i + 1] === '"') return true;
    inText = !inText;
  }
  return false;
}
