/** Shared test helpers: relative-tolerance comparisons (never through formatted strings). */
import { expect } from 'vitest';
import { PhzError } from '../src/core/errors';
import type { Phasor } from '../src/core/phasor';

/** |actual − expected| ≤ rel·max(|expected|, floor); `floor` keeps a zero expectation meaningful. */
export function expectClose(actual: number, expected: number, rel = 1e-9, floor = 1e-12): void {
  const tol = rel * Math.max(Math.abs(expected), floor);
  if (!(Math.abs(actual - expected) <= tol)) {
    throw new Error(`expected ${actual} to be within ${rel} (relative) of ${expected}`);
  }
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);
}

/** Phasor comparison relative to the expected magnitude. */
export function expectPhasorClose(actual: Phasor | { re: number; im: number }, expected: { re: number; im: number }, rel = 1e-9): void {
  const scale = Math.max(Math.hypot(expected.re, expected.im), 1e-12);
  const err = Math.hypot(actual.re - expected.re, actual.im - expected.im);
  if (!(err <= rel * scale)) {
    throw new Error(`expected ${actual.re}${actual.im >= 0 ? '+' : ''}${actual.im}j to be within ${rel} of ${expected.re}${expected.im >= 0 ? '+' : ''}${expected.im}j`);
  }
  expect(err).toBeLessThanOrEqual(rel * scale);
}

/** Runs `f`, asserts it throws PhzError, and returns the error for message checks. */
export function expectPhzError(f: () => unknown, code: 'invalidValue' | 'notAvailable' = 'invalidValue'): PhzError {
  let thrown: unknown;
  try {
    f();
  } catch (e) {
    thrown = e;
  }
  expect(thrown, 'expected a PhzError to be thrown').toBeInstanceOf(PhzError);
  const err = thrown as PhzError;
  expect(err.code).toBe(code);
  return err;
}

/** Reads a polar text result `m∠a°` back to numbers (for tests of results, with the formatter's own tests separate). */
export function cellNumber(cell: unknown): number {
  expect(typeof cell).toBe('number');
  return cell as number;
}

/** A text phasor result read back through the project parser (use digits 15 for precision checks). */
export { parsePhasor as readResult } from '../src/core/parse';
