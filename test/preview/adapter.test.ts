/**
 * The adapter's conversions, checked with small specs of the test's own that record
 * what they receive: matrices, repeats, omitted arguments, blanks, shapes, errors, and
 * spill areas that follow a change of inputs.
 */
import { describe, expect, it, vi } from 'vitest';
import { PhzError } from '../../src/core/errors';
import type { FunctionSpec, HostResult } from '../../src/functions/spec';
import { PhzEngine, evaluateFormula, isDisplayError } from '../../src/preview/engine';
import type { Registry } from '../../src/preview/engine';

const calls: unknown[][] = [];

function spec(name: string, params: FunctionSpec['params'], implementation: (...args: any[]) => HostResult): FunctionSpec {
  return { name, group: 'values', summary: name, params, result: '', errors: [], examples: [], implementation };
}

/** One row per non-blank cell of `z`, showing what arrived. */
const EACH = spec(
  'EACH',
  [
    { name: 'z', type: 'matrix', description: '' },
    { name: 'tag', type: 'scalar', description: '', optional: true },
  ],
  (z: unknown[][], tag: unknown) => {
    calls.push([z, tag]);
    const cells = z.flat().filter((v) => v !== null);
    if (cells.length === 0) throw new PhzError('argument z is all blank: give at least one value');
    return cells.map((v) => [`${typeof v}:${String(v)}`]);
  },
);
const COUNT = spec('COUNT', [{ name: 'z', type: 'repeat', description: '' }], (zs: unknown) => {
  calls.push([zs]);
  return [[Array.isArray(zs) ? zs.length : -1]];
});
const MISSING = spec('MISSING', [{ name: 'a', type: 'scalar', description: '' }], () => {
  throw new PhzError('no value exists for this input (test)', 'notAvailable');
});
const TABLE = spec('TABLE', [{ name: 'n', type: 'scalar', description: '' }], (n: number) =>
  Array.from({ length: n }, (_, r) => Array.from({ length: 2 }, (_, c) => r * 10 + c)),
);

const CRASH = spec('CRASH', [{ name: 'a', type: 'scalar', description: '' }], () => {
  throw new TypeError("Cannot read properties of undefined (reading 'im')");
});

/** Counts its calls; one cell out, whatever comes in. */
let pairCalls = 0;
const PAIR = spec(
  'PAIR',
  [
    { name: 'a', type: 'matrix', description: '' },
    { name: 'b', type: 'scalar', description: '', optional: true },
  ],
  (a: unknown[][], b: unknown) => {
    pairCalls++;
    return [[`${a.flat().map(String).join('|')}/${String(b)}`]];
  },
);

const registry: Registry = { specs: [EACH, COUNT, MISSING, TABLE, CRASH, PAIR] };
const last = () => calls[calls.length - 1];

describe('adapter: what implementations receive', () => {
  it('passes a range as rows of cells, blanks as null, with the omitted optional as null', () => {
    const shown = evaluateFormula('=PHZ.EACH(A1:B2)', [[1, 'x'], [null, true]], registry);
    expect(last()).toEqual([[[1, 'x'], [null, true]], null]);
    expect(shown).toEqual([['number:1'], ['string:x'], ['boolean:true']]);
  });

  it('wraps a single value given for a matrix parameter as [[v]]', () => {
    evaluateFormula('=PHZ.EACH("7+j5", 3)', [], registry);
    expect(last()).toEqual([[['7+j5']], 3]);
  });

  it('passes an empty cell for a matrix parameter as [[null]]', () => {
    const shown = evaluateFormula('=PHZ.EACH(A1)', [[null, 1]], registry);
    expect(last()).toEqual([[[null]], null]);
    expect(shown).toEqual([[{ error: '#VALUE!', message: 'argument z is all blank: give at least one value' }]]);
  });

  it('reads bare TRUE and FALSE as spreadsheet users write them', () => {
    evaluateFormula('=PHZ.EACH(1, TRUE)', [], registry);
    expect(last()).toEqual([[[1]], true]);
    evaluateFormula('=PHZ.EACH(1, false)', [], registry);
    expect(last()).toEqual([[[1]], false]);
  });

  it('treats an empty argument like a left-out one', () => {
    evaluateFormula('=PHZ.EACH(5,)', [], registry);
    expect(last()).toEqual([[[5]], null]);
  });

  it('collects repeating arguments into one array of matrices', () => {
    const shown = evaluateFormula('=PHZ.COUNT(1, A1:A2, "a")', [[1], [2]], registry);
    expect(last()).toEqual([[[[1]], [[1], [2]], [['a']]]]);
    expect(shown).toEqual([[3]]);
  });

  it('passes the value of a one-cell range to a scalar parameter, and refuses a larger range', () => {
    evaluateFormula('=PHZ.EACH(1, A1)', [['tagged']], registry);
    expect(last()).toEqual([[[1]], 'tagged']);
    const [[cell]] = evaluateFormula('=PHZ.EACH(1, A1:A2)', [['a'], ['b']], registry);
    expect(cell).toEqual({ error: '#VALUE!', message: 'PHZ.EACH: argument tag (the 2nd) takes one value, not a range of 2×1 cells.' });
  });

  it('propagates an error found in an argument without calling the implementation', () => {
    const before = calls.length;
    const [[cell]] = evaluateFormula('=PHZ.EACH(A1:A2)', [[1], ['=1/0']], registry);
    expect(isDisplayError(cell) && cell.error).toBe('#DIV/0!');
    expect(calls.length).toBe(before);
  });
});

describe('adapter: errors', () => {
  it('maps notAvailable to #N/A and keeps the message', () => {
    expect(evaluateFormula('=PHZ.MISSING(1)', [], registry)).toEqual([[{ error: '#N/A', message: 'no value exists for this input (test)' }]]);
  });

  it('shows the generic message for an exception that is not ours, and logs the detail to the console', () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      expect(evaluateFormula('=PHZ.CRASH(1)', [], registry)).toEqual([
        [{ error: '#VALUE!', message: 'PHZ.CRASH could not compute this (internal error): check the inputs, and report the formula if they are valid' }],
      ]);
      expect(log).toHaveBeenCalled();
      expect(String(log.mock.calls[0][1])).toContain('Cannot read properties');
    } finally {
      log.mockRestore();
    }
  });

  it('reports too few and too many arguments with the signature', () => {
    expect(evaluateFormula('=PHZ.MISSING()', [], registry)).toEqual([
      [{ error: '#VALUE!', message: 'PHZ.MISSING(a) needs at least 1 argument; 0 were given.' }],
    ]);
    expect(evaluateFormula('=PHZ.EACH(1,2,3)', [], registry)).toEqual([
      [{ error: '#VALUE!', message: 'PHZ.EACH(z, [tag]) takes at most 2 arguments; 3 were given.' }],
    ]);
  });
});

describe('adapter: spill areas', () => {
  it('spills a 2-D result over the block it needs', () => {
    expect(evaluateFormula('=PHZ.TABLE(3)', [], registry)).toEqual([
      [0, 1],
      [10, 11],
      [20, 21],
    ]);
  });

  it('resizes a spill when an input change changes the size of the result', () => {
    const engine = new PhzEngine({ registry, sheets: { S: [['a'], ['b'], [null], [null, '=PHZ.EACH(A1:A3)']] } });
    const at = { sheet: 0, row: 3, col: 1 };
    expect(engine.spillSize(at)).toEqual({ width: 1, height: 2 });
    engine.setContents({ sheet: 0, row: 2, col: 0 }, [['c']]);
    expect(engine.spillSize(at)).toEqual({ width: 1, height: 3 });
    expect(engine.display({ sheet: 0, row: 5, col: 1 })).toBe('string:c');
    engine.setContents({ sheet: 0, row: 0, col: 0 }, [[null]]);
    engine.setContents({ sheet: 0, row: 1, col: 0 }, [[null]]);
    expect(engine.spillSize(at)).toEqual({ width: 1, height: 1 });
    expect(engine.display(at)).toBe('string:c');
    expect(engine.display({ sheet: 0, row: 4, col: 1 })).toBe(null);
  });

  it('sizes a spill that reads another spill, when both are built together', () => {
    const engine = new PhzEngine({ registry, sheets: { S: [['=PHZ.TABLE(4)', null, '=PHZ.EACH(A1:B4)']] } });
    expect(engine.spillSize({ sheet: 0, row: 0, col: 2 })).toEqual({ width: 1, height: 8 });
    expect(engine.display({ sheet: 0, row: 7, col: 2 })).toBe('number:31');
  });

  it('tells a cell of a spill from the formula that fills it', () => {
    const engine = new PhzEngine({ registry, sheets: { S: [['=PHZ.TABLE(2)']] } });
    expect(engine.rawContent({ sheet: 0, row: 0, col: 0 })).toBe('=PHZ.TABLE(2)');
    expect(engine.rawContent({ sheet: 0, row: 1, col: 1 })).toBe(null);
    expect(engine.spillAnchor({ sheet: 0, row: 1, col: 1 })).toEqual({ sheet: 0, row: 0, col: 0 });
    expect(engine.spillAnchor({ sheet: 0, row: 0, col: 0 })).toBeUndefined();
  });
});

describe('adapter: one call per result', () => {
  it('runs the implementation once for a formula entered (the size query and the evaluation share it)', () => {
    const engine = new PhzEngine({ registry, sheets: { S: [['x', 2]] } });
    pairCalls = 0;
    engine.setContents({ sheet: 0, row: 0, col: 2 }, [['=PHZ.PAIR(A1, B1)']]);
    expect(pairCalls).toBe(1);
    expect(engine.display({ sheet: 0, row: 0, col: 2 })).toBe('x/2');
  });

  it('calls again with the new values when an input changes, never giving the kept result', () => {
    const engine = new PhzEngine({ registry, sheets: { S: [['x', 2, '=PHZ.PAIR(A1, B1)']] } });
    engine.setContents({ sheet: 0, row: 0, col: 1 }, [[3]]);
    expect(engine.display({ sheet: 0, row: 0, col: 2 })).toBe('x/3');
    engine.setContents({ sheet: 0, row: 0, col: 0 }, [['y']]);
    expect(engine.display({ sheet: 0, row: 0, col: 2 })).toBe('y/3');
  });

  it('computes again when an input is itself computed after the size query (pasted together)', () => {
    const engine = new PhzEngine({ registry, sheets: { S: [[]] } });
    // C1 is entered before A1 holds its value, so its size query saw an empty cell
    engine.setContents({ sheet: 0, row: 0, col: 0 }, [['=PHZ.PAIR(B1)', 'b', '=PHZ.PAIR(A1)']]);
    expect(engine.display({ sheet: 0, row: 0, col: 0 })).toBe('b/null');
    expect(engine.display({ sheet: 0, row: 0, col: 2 })).toBe('b/null/null');
  });

  it('gives a range argument its cells in order, and a one-cell range the same as the cell', () => {
    const engine = new PhzEngine({ registry, sheets: { S: [[1, 2, '=PHZ.PAIR(A1:B1, A1:A1)']] } });
    expect(engine.display({ sheet: 0, row: 0, col: 2 })).toBe('1|2/1');
    engine.setContents({ sheet: 0, row: 0, col: 1 }, [[5]]);
    expect(engine.display({ sheet: 0, row: 0, col: 2 })).toBe('1|5/1');
  });
});
