/**
 * The unit a label or a unit word names, for the plot's legend. Only units of the quantities
 * the parser knows (DESIGN §3): V, A, Ω, S and VA (W and var for power words that say so).
 */
import type { Quantity } from '../../core/parse';

const QUANTITY_UNIT: Readonly<Record<Quantity, string>> = {
  voltage: 'V',
  current: 'A',
  impedance: 'Ω',
  admittance: 'S',
  power: 'VA',
};

/** The unit symbol of a quantity the parser reported. */
export function unitOfQuantity(q: Quantity): string {
  return QUANTITY_UNIT[q];
}

/** A unit word alone (with an optional SI prefix, in brackets or not): `A`, `kV`, `(Ω)`, `[VA]`. */
const UNIT_TOKEN = /^[([]?\s*(?:p|n|µ|μ|u|m|k|M|G)?(VA|var|V|A|W|S|Ω|Ω|ohms?)\s*[)\]]?$/;

/** The base unit of a unit word (`kV` → `V`, `ohm` → `Ω`), or undefined when `text` is not one. */
export function unitToken(text: string): string | undefined {
  const m = UNIT_TOKEN.exec(text.trim());
  if (!m) return undefined;
  const u = m[1];
  if (u === 'Ω' || u.toLowerCase().startsWith('ohm')) return 'Ω';
  return u;
}

/** Text a unit column may hold for a quantity without a unit (power factor rows and the like). */
export function isNoUnitMark(text: string): boolean {
  return /^\s*[–—-]\s*$/.test(text);
}

/** Words that name a quantity, in the order they are looked for (`complex power` before `current`). */
const WORDS: ReadonlyArray<readonly [RegExp, string]> = [
  [/\breactive power\b/i, 'var'],
  [/\b(?:real|active) power\b/i, 'W'],
  [/\bpowers?\b/i, 'VA'],
  [/\bcurrents?\b/i, 'A'],
  [/\b(?:voltages?|volts)\b/i, 'V'],
  [/\bimpedances?\b/i, 'Ω'],
  [/\badmittances?\b/i, 'S'],
];

/**
 * The unit a label says: a bracketed unit (`I (A)`, `U [kV]`, `Current, A`) first, then a
 * quantity word (`Phase current` → A). `''` when it says none.
 *
 * @example unitFromLabel('Supply phase voltage') // 'V'
 */
export function unitFromLabel(label: string): string {
  const bracket = /[([]\s*([^()[\]]{1,6})\s*[)\]]/.exec(label);
  if (bracket) {
    const u = unitToken(bracket[1]);
    if (u) return u;
  }
  const tail = /,\s*(\S{1,5})\s*$/.exec(label);
  if (tail) {
    const u = unitToken(tail[1]);
    if (u) return u;
  }
  for (const [re, unit] of WORDS) if (re.test(label)) return unit;
  return '';
}
