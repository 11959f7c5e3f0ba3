/**
 * The shared guard: an exception that is not ours never shows its raw text in a cell; the
 * cell gets the generic internal-error message and the console gets the detail.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { guarded } from '../../src/functions/host';
import { defineFunction } from '../../src/functions/spec';
import { PhzError } from '../../src/core/errors';
import { expectPhzError } from '../helpers';

const failing = (thrown: unknown) =>
  guarded(
    defineFunction({
      name: 'BROKEN',
      group: 'values',
      summary: 'test double',
      params: [{ name: 'z', type: 'matrix', description: 'anything' }],
      result: 'nothing',
      errors: [],
      examples: [{ formula: '=PHZ.BROKEN(1)', result: [[1]] }],
      implementation: () => {
        throw thrown;
      },
    }),
  );

describe('guarded: exceptions that are not ours', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows the generic message, never the raw text, and logs the detail to the console', () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const secret = new TypeError("Cannot read properties of undefined (reading 're') at /home/build/secret.ts:12");
    const err = expectPhzError(() => failing(secret)([[1]]));
    expect(err.message).toBe('PHZ.BROKEN could not compute this (internal error): check the inputs, and report the formula if they are valid');
    expect(err.message).not.toContain('Cannot read');
    expect(log).toHaveBeenCalledTimes(1);
    expect(log.mock.calls[0]).toContain(secret);
  });

  it('does the same for a thrown non-Error value', () => {
    vi.spyOn(console, 'error').mockImplementation(() => undefined);
    expect(expectPhzError(() => failing('raw text')([[1]])).message).not.toContain('raw text');
  });

  it('passes a PhzError through unchanged, without logging', () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const ours = new PhzError('z is blank: a phasor is required here', 'notAvailable');
    let thrown: unknown;
    try {
      failing(ours)([[1]]);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBe(ours);
    expect(log).not.toHaveBeenCalled();
  });
});
