/** Helpers for the three-phase function tests: call through the registry, read cells back as numbers. */
import { expect } from 'vitest';
import { functions } from '../../../src/functions';
import { parsePhasor } from '../../../src/core/parse';
import type { Phasor } from '../../../src/core/phasor';
import { expectPhzError } from '../../helpers';

/** Calls a PHZ function the way the host does (through the registry's guard). */
export function call(name: string, ...args: unknown[]): (string | number | boolean)[][] {
  return functions[name](...args);
}

/** A column argument, as the host passes a vertical range. */
export function col(...values: unknown[]): unknown[][] {
  return values.map((v) => [v]);
}

/** A polar-text result cell read back through the project parser. */
export function ph(cell: unknown): Phasor {
  expect(typeof cell).toBe('string');
  return parsePhasor(cell as string);
}

/** The first column of a result as phasors. */
export function phs(result: unknown[][], column = 0): Phasor[] {
  return result.map((row) => ph(row[column]));
}

/** Asserts the call gives a PhzError whose message matches. */
export function expectMessage(f: () => unknown, pattern: RegExp, code: 'invalidValue' | 'notAvailable' = 'invalidValue'): void {
  expect(expectPhzError(f, code).message).toMatch(pattern);
}
