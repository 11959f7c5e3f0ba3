/** Messages of the phasor parser (part of the one message catalogue, src/core/messages). */
import type { Quantity } from '../parse';

const FORMS = 'write it like 7+j5, 230∠-120, 230∠-120°, 1∠0.5rad or 230e^(j30)';

const UNIT_OF: Record<Quantity, string> = {
  voltage: 'V',
  current: 'A',
  impedance: 'Ω',
  admittance: 'S',
  power: 'VA, W or var',
};

function article(word: string): string {
  return /^[aeiou]/.test(word) ? 'an' : 'a';
}

/** A reading of the text for a message, at most 32 characters (Excel on Mac cuts long messages). */
function clip(text: string): string {
  return text.length > 32 ? `${text.slice(0, 31)}…` : text;
}

function quote(text: string): string {
  return text.length > 60 ? `"${text.slice(0, 57)}…"` : `"${text}"`;
}

export const parseMessages = {
  empty: `the text is empty: ${FORMS}`,
  numberExpected: 'a number was expected here',
  partExpected: 'a real or j-imaginary part was expected after the sign',
  angleExpected: 'an angle in degrees (or with "rad") was expected after ∠, < or @',
  expForm: 'the exponential form is written e^(j30) or e^(-j0.5rad)',
  closeParen: 'a closing ")" was expected after the angle',
  expectedSign: 'a + or − was expected between the parts',
  twoImag: 'the text has two imaginary parts',
  twoReal: 'the text has two real parts',
  twoUnits: 'a phasor takes one unit, not two',
  unexpected: 'this is not part of a phasor or a known unit (V, A, Ω or ohm, S, W, VA, var, with an optional prefix p n µ m k M G)',
  stoppedAt(text: string, at: number, why: string): string {
    const rest = text.slice(at);
    const where = rest.length === 0 ? 'at the end' : `at ${quote(rest)} (character ${at + 1})`;
    return `cannot read ${quote(text)} as a phasor: stopped ${where}, ${why}; ${FORMS}`;
  },
  commaAndPoint(text: string): string {
    return `cannot read ${quote(text)}: it mixes a decimal comma and a decimal point; use one decimal separator, e.g. 7.5+j2.25 or 7,5+j2,25`;
  },
  ambiguousComma(text: string, commas: number, thousands: string, decimal: string): string {
    const [sep, dec] = commas === 1 ? ['a thousands separator', 'a decimal comma'] : ['thousands separators', 'decimal commas'];
    return `cannot read ${quote(text)}: with ${sep} it is ${clip(thousands)}, with ${dec} ${clip(decimal)}; write it as one of these`;
  },
  thousandsSeparators(text: string, plain: string): string {
    return `cannot read ${quote(text)}: thousands separators are not read; write it as ${clip(plain)}`;
  },
  complexInVar(text: string): string {
    return `cannot read ${quote(text)}: var is reactive power alone (40 kvar means j40 kvar), so a value in var has no real part; for a complex power write it in VA, e.g. 8+j6 kVA`;
  },
  imaginaryInWatts(text: string): string {
    return `cannot read ${quote(text)}: W is real power alone, so a value in W has no imaginary part; for a complex power write it in VA, e.g. 8+j6 kVA`;
  },
  wrongQuantity(text: string, got: Quantity, expected: Quantity): string {
    return `${quote(text)} is ${article(got)} ${got} but ${article(expected)} ${expected} is expected here; give it in ${UNIT_OF[expected]} or without a unit`;
  },
  tooLarge(text: string): string {
    return `${quote(text)} is too large to compute with; give a value below 1e300`;
  },
};
