/** How the preview grid shows engine values as text. */
import { parsePhasor } from '../core/parse';
import { isDisplayError } from './engine';
import type { DisplayValue } from './engine';

/**
 * Numbers with up to 10 significant figures (the formula bar and the tooltip keep the
 * full value), exponent form outside 1e-6…1e11.
 */
export function formatNumber(n: number): string {
  if (n === 0) return '0';
  const abs = Math.abs(n);
  if (abs >= 1e11 || abs < 1e-6) {
    return n
      .toExponential(6)
      .replace(/\.?0+e/, 'e')
      .replace('e+', 'E+')
      .replace('e-', 'E-');
  }
  return String(Number(n.toPrecision(10)));
}

/** The text a cell shows. */
export function displayText(v: DisplayValue): string {
  if (v === null || v === undefined) return '';
  if (isDisplayError(v)) return v.error;
  if (typeof v === 'number') return formatNumber(v);
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  return String(v);
}

/** What each engine error means, for errors that come without a message. */
const ERROR_MEANING: Record<string, string> = {
  '#VALUE!': 'A value in the formula is of the wrong kind.',
  '#N/A': 'No result exists for these inputs.',
  '#DIV/0!': 'Division by zero.',
  '#NAME?': 'Unknown function or name: check the spelling (PHZ functions start with PHZ.).',
  '#REF!': 'The formula refers to a cell that does not exist.',
  '#NUM!': 'A number is out of range.',
  '#CYCLE!': 'The formula refers to itself, directly or through other cells.',
  '#SPILL!': 'The result needs more room: empty the cells it would spill into.',
  '#ERROR!': 'The formula could not be read: check brackets, quotes and commas.',
  '#LIC!': 'The formula engine licence key is missing.',
};

/** The message shown for an error cell: the engine's (our) message, else what the code means. */
export function errorMessage(v: DisplayValue): string {
  if (!isDisplayError(v)) return '';
  const m = v.message.trim();
  return m !== '' ? m : (ERROR_MEANING[v.error] ?? v.error);
}

const phasorTextCache = new Map<string, boolean>();

/**
 * True when text is a value the PHZ functions read (a phasor in any notation): such a
 * cell is an input; other text (labels, titles) is shown as plain text.
 */
export function isPhasorText(text: string): boolean {
  let known = phasorTextCache.get(text);
  if (known === undefined) {
    try {
      parsePhasor(text);
      known = true;
    } catch {
      known = false;
    }
    if (phasorTextCache.size > 5000) phasorTextCache.clear();
    phasorTextCache.set(text, known);
  }
  return known;
}
