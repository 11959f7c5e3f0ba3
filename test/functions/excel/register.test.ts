/**
 * Excel registration with a fake `CustomFunctions` global: every registry entry is
 * associated once, results pass through untouched, and thrown errors become the host
 * errors DESIGN.md §2 names (#VALUE! / #N/A with our message).
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { PhzError } from '../../../src/core/errors';
import { functions, specs } from '../../../src/functions/index';
import {
  GENERIC_MESSAGE,
  HOST_MESSAGE_LIMIT,
  fitHostMessage,
  hostWrapper,
  invoke,
  registerAll,
  toHostError,
} from '../../../src/functions/excel/register';

/** Stand-in for the runtime's error class; the codes are the runtime's enum values. */
class FakeHostError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}

const associate = vi.fn();

beforeEach(() => {
  associate.mockReset();
  vi.stubGlobal('CustomFunctions', {
    associate,
    Error: FakeHostError,
    ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', invalidNumber: '#NUM!' },
  });
});

afterEach(() => {
  vi.unstubAllGlobals();
});

/** Runs `f`, requires it to throw a host error, and returns it. */
function hostErrorOf(f: () => unknown): FakeHostError {
  let thrown: unknown = null;
  try {
    f();
  } catch (e) {
    thrown = e;
  }
  expect(thrown).toBeInstanceOf(FakeHostError);
  return thrown as FakeHostError;
}

describe('registerAll', () => {
  it('associates every spec of the registry exactly once, by its name', () => {
    expect(specs.length).toBeGreaterThan(0);
    const names = registerAll();
    const associated = associate.mock.calls.map(([name]) => name);
    expect(associated).toEqual(specs.map((s) => s.name));
    expect(names).toEqual(associated);
    expect(new Set(associated).size).toBe(associated.length);
    for (const [, fn] of associate.mock.calls) expect(typeof fn).toBe('function');
  });

  it('associates wrappers that pass the host arguments and the result through unchanged', () => {
    const result = [['5∠53.1301°'], ['1∠0°']];
    const impl = vi.fn(() => result);
    registerAll([{ name: 'ONE', implementation: impl, declared: 2 }]);
    const [[name, wrapped]] = associate.mock.calls;
    expect(name).toBe('ONE');
    const z = [['3+j4'], [1]];
    expect(wrapped(z, null)).toBe(result);
    expect(impl).toHaveBeenCalledWith(z, null);
  });

  it('passes only the declared parameters on: the invocation object Excel appends never reaches the function', () => {
    // The shipped runtime appends an InvocationContext after the declared parameters
    // (custom-functions-runtime.debug.js, _batchInvocationEntries); test/functions/excel/runtime.test.ts
    // drives that runtime itself.
    const impl = vi.fn((...args: unknown[]) => [[args.length]]);
    registerAll([{ name: 'TWO', implementation: impl, declared: 2 }]);
    const [[, wrapped]] = associate.mock.calls;
    const invocation = { functionName: 'TWO', address: 'Sheet1!A1' };
    expect(wrapped([['1']], null, invocation)).toEqual([[2]]);
    expect(impl).toHaveBeenCalledWith([['1']], null);
  });

  it('gives every registry function its declared parameter count, so a real host call succeeds', () => {
    registerAll();
    const byName = new Map(associate.mock.calls.map(([n, f]) => [n as string, f as (...a: unknown[]) => unknown]));
    const invocation = { functionName: 'PHZ.MAG', address: 'Sheet1!B2' };
    expect(byName.get('MAG')!([['3+j4']], invocation)).toEqual([[5]]);
    expect(byName.get('DIV')!([['230∠-120']], [['8+j6']], null, invocation)).toEqual([['23∠-156.87°']]);
  });

  it('turns a PhzError thrown at calculation time into the host error, per function', () => {
    registerAll([
      {
        name: 'BAD',
        declared: 1,
        implementation: () => {
          throw new PhzError('z: cell 2 of 3 ("7+k5") is not a phasor. Write it as 7+j5 or 4∠30.');
        },
      },
    ]);
    const [[, wrapped]] = associate.mock.calls;
    const e = hostErrorOf(() => wrapped([['7+k5']]));
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toBe('z: cell 2 of 3 ("7+k5") is not a phasor. Write it as 7+j5 or 4∠30.');
  });
});

describe('toHostError', () => {
  it('maps invalidValue to #VALUE! with the message', () => {
    const e = toHostError(new PhzError('impedance of phase 2 is 0 Ω: a short circuit draws unbounded current.'));
    expect(e).toEqual(new FakeHostError('#VALUE!', 'impedance of phase 2 is 0 Ω: a short circuit draws unbounded current.'));
  });

  it('maps notAvailable to #N/A with the message', () => {
    const e = toHostError(new PhzError('The curve gives no factor above 5 % unbalance.', 'notAvailable'));
    expect(e).toEqual(new FakeHostError('#N/A', 'The curve gives no factor above 5 % unbalance.'));
  });

  it('recognises a PhzError from another bundle by its name', () => {
    const foreign = Object.assign(new Error('from elsewhere'), { name: 'PhzError', code: 'notAvailable' });
    expect(toHostError(foreign)).toEqual(new FakeHostError('#N/A', 'from elsewhere'));
  });

  it.each([
    ['a TypeError', new TypeError("Cannot read properties of undefined (reading 're')")],
    ['a string', 'boom'],
    ['undefined', undefined],
  ])('maps %s to #VALUE! with the generic message, never the raw text', (_label, thrown) => {
    const e = toHostError(thrown);
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toBe(GENERIC_MESSAGE);
  });
});

describe('fitHostMessage', () => {
  it('keeps a message within the limit as it is', () => {
    const msg = 'x'.repeat(HOST_MESSAGE_LIMIT);
    expect(fitHostMessage(msg)).toBe(msg);
  });

  it('cuts a longer message in the middle, keeping which argument and the advice at its end', () => {
    const msg = `digits is "${'a'.repeat(300)}": give a whole number from 1 to 15`;
    const fitted = fitHostMessage(msg);
    expect(fitted).toHaveLength(HOST_MESSAGE_LIMIT);
    expect(fitted.startsWith('digits is "aaa')).toBe(true);
    expect(fitted.endsWith('": give a whole number from 1 to 15')).toBe(true);
    expect(fitted).toContain('…');
  });

  it('does not split a surrogate pair at either side of the cut', () => {
    // U+1D4B5 (mathematical script Z) is two UTF-16 units; a run of them makes every cut point fall near one.
    const msg = '\u{1D4B5}'.repeat(300);
    const fitted = fitHostMessage(msg);
    expect(fitted.length).toBeLessThanOrEqual(HOST_MESSAGE_LIMIT);
    expect(fitted).not.toMatch(/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/);
  });

  it('applies to PhzError messages on their way to the host', () => {
    const e = toHostError(new PhzError('m'.repeat(1000)));
    expect(e.message).toHaveLength(HOST_MESSAGE_LIMIT);
  });
});

describe('hostWrapper and invoke', () => {
  it('names the wrapper after the function for host diagnostics', () => {
    expect(hostWrapper('DIV', () => [[1]], 3).name).toBe('PHZ.DIV');
  });

  it('invoke calls the registry implementation by name', () => {
    const name = specs[0].name;
    const direct = (() => {
      try {
        return { ok: functions[name](null) };
      } catch (e) {
        return { err: toHostError(e) };
      }
    })();
    const via = (() => {
      try {
        return { ok: invoke(name, [null]) };
      } catch (e) {
        return { err: e };
      }
    })();
    expect(via).toEqual(direct);
  });

  it('invoke gives #N/A for a name that is not registered', () => {
    const e = hostErrorOf(() => invoke('NOSUCHFUNCTION', []));
    expect(e.code).toBe('#N/A');
    expect(e.message).toContain('PHZ.NOSUCHFUNCTION');
  });
});
