/** Messages of the argument readers and the shared function guard. */
import type { Quantity, UnitSymbol } from '../parse';
import { excerpt } from './quote';

/** What a value in each unit is, for messages. */
const MEANING: Record<UnitSymbol, string> = {
  V: 'a voltage',
  A: 'a current',
  Ω: 'an impedance',
  S: 'an admittance',
  W: 'a real power',
  var: 'a reactive power',
  VA: 'a complex or apparent power',
};

function clip(text: string): string {
  return excerpt(text);
}

function article(word: string): string {
  return /^[aeiou]/.test(word) ? 'an' : 'a';
}

export const readerMessages = {
  blankRequired(where: string): string {
    return `${where} is blank: a phasor is required here; enter a value such as 230∠0 or 7+j5`;
  },
  noPhasors(name: string): string {
    return `${name} holds no phasor (every cell is blank): give at least one value such as 230∠0`;
  },
  notOne(name: string, n: number): string {
    return `${name} must be one phasor but holds ${n}: give a single cell or value`;
  },
  boolean(where: string): string {
    return `${where} is TRUE/FALSE, not a phasor: give a number or text such as 7+j5`;
  },
  /** `error` as Excel shows it (`#DIV/0!`), or '' when the kind of error is not known. */
  errorValue(where: string, error = ''): string {
    return `${where} holds ${error === '' ? 'an error value' : `the error ${error}`}: fix the cell it comes from first`;
  },
  unsupported(where: string): string {
    return `${where} holds a value that is neither a number nor text: give a number or text such as 7+j5`;
  },
  /** A cell holding a data type that is not a phasor; `what` names it (`an image`, `the entity "Feeder 3"`). */
  dataType(where: string, what: string): string {
    return `${where} holds ${what}, not a phasor: give a number, text such as 7+j5, or an entity with properties real and imag (or magnitude and angle)`;
  },
  entityNoPhasor(where: string, what: string): string {
    return `${where} holds ${what}, whose properties carry no phasor: give it the properties real and imag, or magnitude and angle (degrees)`;
  },
  entityHalf(where: string, what: string, has: string, missing: string): string {
    return `${where} holds ${what} with the property "${clip(has)}" but no "${missing}": give both (0 for a zero part)`;
  },
  /** Where a property of an entity cell sits, for the number messages: `z, property "real"`. */
  property(where: string, name: string): string {
    return `${where}, property "${clip(name)}"`;
  },
  notFinite(where: string): string {
    return `${where} is not a finite number: give a finite value`;
  },
  halfPair(name: string, row: number): string {
    return `row ${row} of ${name} has one part of a real/imaginary pair but not the other: enter 0 for a zero part`;
  },
  inCell(where: string, message: string): string {
    return `${where}: ${message}`;
  },
  numberExpected(where: string, got: string): string {
    return `${where} must be a number but is ${got}: give a plain number`;
  },
  numberWithUnitExpected(where: string, got: string, units: readonly UnitSymbol[]): string {
    return `${where} must be a number but is ${got}: give a number, with or without a unit (${units.join(', ')})`;
  },
  unitRefused(where: string, text: string, unit: UnitSymbol, allowed: readonly UnitSymbol[]): string {
    const is = `${where} is "${clip(text)}", ${MEANING[unit]} in ${unit}`;
    if (allowed.length === 0) return `${is}, but takes a plain number: give it without a unit`;
    const takes = allowed.map((u) => `${MEANING[u]} in ${u}`).join(' or ');
    return `${is}, but takes ${takes}: give it in ${allowed.join(' or ')} or as a plain number`;
  },
  mixedQuantities(where: string, text: string, quantity: Quantity, firstWhere: string, firstText: string, firstQuantity: Quantity): string {
    return `${where} ("${clip(text)}") is ${article(quantity)} ${quantity} but ${firstWhere} ("${clip(firstText)}") is ${article(firstQuantity)} ${firstQuantity}: the values of one sum must be one quantity; check the units`;
  },
  numberRequired(where: string): string {
    return `${where} is blank: a number is required here`;
  },
  outOfRange(where: string, value: number, range: string): string {
    return `${where} is ${value} but must be ${range}`;
  },
  wholeNumber(where: string, value: number): string {
    return `${where} is ${value} but must be a whole number`;
  },
  choice(where: string, got: string, choices: readonly string[]): string {
    return `${where} is "${clip(got)}", which is not one of ${choices.map((c) => `"${c}"`).join(', ')}: use one of those (any case)`;
  },
  /** A choice given as something other than text (a data type); `got` names it. */
  choiceNotText(where: string, got: string, choices: readonly string[]): string {
    return `${where} is ${got}, not one of the words ${choices.map((c) => `"${c}"`).join(', ')}: use one of those (any case)`;
  },
  booleanExpected(where: string, got: string): string {
    return `${where} must be TRUE or FALSE but is ${got}`;
  },
  counts(described: string): string {
    return `the arguments hold different numbers of values (${described}): give equal counts, or a single value to use for every row`;
  },
  tooManyArgs(fn: string, max: number, got: number): string {
    return `PHZ.${fn} takes at most ${max} argument${max === 1 ? '' : 's'} but was given ${got}`;
  },
  nonFiniteResult(fn: string): string {
    return `PHZ.${fn} gave a result that is not a finite number (a division by zero or an overflow): check the inputs for zero impedances, open circuits or zero voltages`;
  },
  /** Something that is not a PhzError escaped: the cell never shows its raw text (the console gets it). */
  internal(fn: string): string {
    return `PHZ.${fn} could not compute this (internal error): check the inputs, and report the formula if they are valid`;
  },
};
