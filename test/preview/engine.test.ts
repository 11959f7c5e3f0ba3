/**
 * The preview engine runs the real registry: every function's documented examples are
 * evaluated through HyperFormula and the generic adapter, and must show exactly the
 * documented cells. Driven from `specs`, so functions added later are covered too.
 */
import { describe, expect, it } from 'vitest';
import type { RawCellContent } from 'hyperformula';
import { isPhzError } from '../../src/core/errors';
import { functions, specByName, specs } from '../../src/functions';
import type { FunctionSpec } from '../../src/functions/spec';
import { a1 } from '../../src/preview/address';
import { PhzEngine, evaluateFormula, isDisplayError } from '../../src/preview/engine';
import type { DisplayValue } from '../../src/preview/engine';
import { expectClose } from '../helpers';
import { parseCall } from './formula-args';
import type { Arg, Literal } from './formula-args';

type Expected = ReadonlyArray<ReadonlyArray<string | number | boolean>>;

/** Cell by cell: text and booleans exactly, numbers to a relative 1e-9 (absolute near zero). */
function expectCells(got: DisplayValue[][], expected: Expected, what: string): void {
  const errors = got.flat().filter(isDisplayError);
  expect(errors, `${what} shows an error`).toEqual([]);
  expect(got.length, `${what}: rows`).toBe(expected.length);
  got.forEach((row, r) => {
    expect(row.length, `${what}: columns of row ${r + 1}`).toBe(expected[r].length);
    row.forEach((cell, c) => {
      const want = expected[r][c];
      if (typeof want === 'number') {
        expect(typeof cell, `${what} ${a1({ row: r, col: c })}`).toBe('number');
        expectClose(cell as number, want, 1e-9, 1);
      } else {
        expect(cell, `${what} ${a1({ row: r, col: c })}`).toBe(want);
      }
    });
  });
}

const examples = specs.flatMap((spec) => spec.examples.map((example, index) => ({ spec, example, label: `${spec.name} #${index + 1}: ${example.formula}` })));

/** Raw contents that hold exactly a literal (text stays text even when it looks like a number). */
function cellContent(v: Literal): RawCellContent {
  return typeof v === 'string' ? `'${v}` : v;
}

/** Host arguments for a direct call, built from literals as the host passes them. */
function hostArgs(spec: FunctionSpec, args: Arg[]): unknown[] | undefined {
  const out: unknown[] = [];
  const asMatrix = (a: Arg) => (a.kind === 'array' ? a.rows : a.kind === 'scalar' ? [[a.value]] : undefined);
  for (let i = 0; i < args.length; i++) {
    const param = spec.params[Math.min(i, spec.params.length - 1)];
    const a = args[i];
    if (a.kind === 'other') return undefined;
    if (param.type === 'repeat') {
      out.push(args.slice(i).map(asMatrix));
      if (args.slice(i).some((x) => x.kind === 'other')) return undefined;
      break;
    }
    if (param.type === 'scalar') {
      if (a.kind !== 'scalar') return undefined;
      out.push(a.value);
    } else out.push(asMatrix(a));
  }
  return out;
}

describe('preview engine: documented examples', () => {
  it('has examples for every registry function', () => {
    expect(specs.length).toBeGreaterThan(0);
    for (const spec of specs) expect(spec.examples.length, spec.name).toBeGreaterThan(0);
  });

  it.each(examples)('$label', ({ example, label }) => {
    expectCells(evaluateFormula(example.formula), example.result, label);
  });
});

describe('preview engine: arguments from cells', () => {
  const movable = examples.filter(({ example }) => parseCall(example.formula)?.args.some((a) => a.kind !== 'other'));

  it('finds examples with literal arguments to move into cells', () => {
    expect(movable.length).toBeGreaterThan(specs.length / 2);
  });

  // Each literal argument goes into a block of cells (an array constant into a range of
  // the same shape) and the formula refers to it: the result must not change.
  it.each(movable)('$label, with its arguments in cells', ({ example, label }) => {
    const call = parseCall(example.formula)!;
    const rows: RawCellContent[][] = [];
    let col = 0;
    const refs = call.args.map((arg) => {
      if (arg.kind === 'other') return arg.source;
      const block = arg.kind === 'array' ? arg.rows : [[arg.value]];
      block.forEach((line, r) => {
        rows[r] ??= [];
        line.forEach((v, c) => {
          rows[r][col + c] = cellContent(v);
        });
      });
      const width = Math.max(...block.map((l) => l.length));
      const start = a1({ row: 0, col });
      const end = a1({ row: block.length - 1, col: col + width - 1 });
      col += width + 1;
      return arg.kind === 'array' ? `${start}:${end}` : start;
    });
    const data = rows.map((r) => Array.from({ length: col }, (_, i) => r[i] ?? null));
    const formula = `=PHZ.${call.name}(${refs.join(', ')})`;
    expectCells(evaluateFormula(formula, data), example.result, `${label} as ${formula}`);
  });
});

describe('preview engine: optional arguments', () => {
  // The top-level call decides (an example may wrap its function in another one).
  const omitting = examples
    .map((e) => ({ ...e, call: parseCall(e.example.formula) }))
    .map((e) => ({ ...e, called: e.call ? specByName[e.call.name] : undefined }))
    .filter(({ call, called }) => call && called && !called.params.some((p) => p.type === 'repeat') && call.args.length < called.params.length);

  it('has examples that leave optional arguments out', () => {
    expect(omitting.length).toBeGreaterThan(0);
  });

  // Left out and written as an empty argument both reach the implementation as null.
  it.each(omitting)('$label equals the same call with empty optional arguments', ({ example, label, call, called }) => {
    const empties = ','.repeat(called!.params.length - call!.args.length);
    const formula = `=PHZ.${call!.name}(${call!.args.map((a) => a.source).join(', ')}${empties})`;
    expectCells(evaluateFormula(formula), example.result, `${label} as ${formula}`);
  });
});

describe('preview engine: errors keep their message', () => {
  // The first argument replaced by text no reader accepts: the cell shows the error the
  // implementation throws for the same arguments, with its message.
  const cases = examples
    .map(({ spec, example, label }) => ({ spec, label, call: parseCall(example.formula) }))
    .filter(({ spec, call }) => call !== undefined && call.name === spec.name && call.args.length > 0 && hostArgs(spec, call.args) !== undefined);

  it('has cases to check', () => {
    expect(cases.length).toBeGreaterThan(specs.length / 2);
  });

  it.each(cases)('$label with a first argument that is not a value', ({ spec, call }) => {
    const bad = 'not a phasor';
    const args: Arg[] = [{ kind: 'scalar', value: bad, source: `"${bad}"` }, ...call!.args.slice(1)];
    let direct: unknown;
    try {
      direct = functions[spec.name](...hostArgs(spec, args)!);
    } catch (e) {
      direct = e;
    }
    const formula = `=PHZ.${spec.name}(${args.map((a) => a.source).join(', ')})`;
    const shown = evaluateFormula(formula);
    if (isPhzError(direct)) {
      expect(direct.message.length).toBeGreaterThan(0);
      expect(shown).toEqual([[{ error: direct.code === 'notAvailable' ? '#N/A' : '#VALUE!', message: direct.message }]]);
    } else {
      expect(direct, 'the implementation threw something other than PhzError').not.toBeInstanceOf(Error);
      expect(shown.flat().some(isDisplayError)).toBe(false);
    }
  });

  it('turns most of those into an error', () => {
    const errors = cases.filter(({ spec, call }) => {
      const shown = evaluateFormula(`=PHZ.${spec.name}("not a phasor"${call!.args.slice(1).map((a) => `, ${a.source}`).join('')})`);
      return isDisplayError(shown[0][0]);
    });
    expect(errors.length).toBeGreaterThan(cases.length / 2);
  });

  it('names the function and the count when too many arguments are given', () => {
    const spec = specs.find((s) => !s.params.some((p) => p.type === 'repeat'))!;
    const args = Array.from({ length: spec.params.length + 1 }, () => '1').join(',');
    const [[cell]] = evaluateFormula(`=PHZ.${spec.name}(${args})`);
    expect(isDisplayError(cell)).toBe(true);
    expect((cell as { error: string }).error).toBe('#VALUE!');
    expect((cell as { message: string }).message).toContain(`PHZ.${spec.name}`);
    expect((cell as { message: string }).message).toContain(String(spec.params.length + 1));
  });

  it('shows #NAME? for a function that is not in the registry', () => {
    const [[cell]] = evaluateFormula('=PHZ.NOSUCHFUNCTION(1)');
    expect(isDisplayError(cell) && cell.error).toBe('#NAME?');
  });
});

describe('preview engine: spills', () => {
  const spilling = examples.filter(({ example }) => example.result.length * example.result[0].length > 1);

  it('has spilling examples', () => {
    expect(spilling.length).toBeGreaterThan(0);
  });

  it.each(spilling)('$label: other formulas read the spilled cells', ({ example, label }) => {
    const engine = new PhzEngine({ sheets: { S: [[example.formula]] } });
    const last = { row: example.result.length - 1, col: example.result[0].length - 1 };
    engine.setContents({ sheet: 0, row: 0, col: 10 }, [[`=${a1(last)}`]]);
    expectCells([[engine.display({ sheet: 0, row: 0, col: 10 })]], [[example.result[last.row][last.col]]], `${label}, read back`);
    expect(engine.spillSize({ sheet: 0, row: 0, col: 0 })).toEqual({ width: example.result[0].length, height: example.result.length });
  });

  it('shows #SPILL! while a cell blocks the result, and spills again once it is cleared', () => {
    const { example } = spilling[0];
    const engine = new PhzEngine({ sheets: { S: [[example.formula]] } });
    const blocker = example.result.length > 1 ? { sheet: 0, row: 1, col: 0 } : { sheet: 0, row: 0, col: 1 };
    engine.setContents(blocker, [['in the way']]);
    const anchor = engine.display({ sheet: 0, row: 0, col: 0 });
    expect(isDisplayError(anchor) && anchor.error).toBe('#SPILL!');
    engine.setContents(blocker, [[null]]);
    expectCells([[engine.display({ sheet: 0, row: 0, col: 0 })]], [[example.result[0][0]]], 'anchor after clearing');
  });
});

describe('preview engine: STARLOAD neutral left out versus a blank cell', () => {
  // A1:A3 supply, B1:B3 loads, C1 blank, D1 = 0
  const data = [
    ["'230∠0", 23, null, 0],
    ["'230∠-120", 46, null, null],
    ["'230∠120", 23, null, null],
  ];
  const solid = evaluateFormula('=PHZ.STARLOAD(A1:A3, B1:B3, D1)', data);
  it('left out, or an empty argument, is a solid neutral', () => {
    expect(solid.flat().filter(isDisplayError)).toEqual([]);
    expect(evaluateFormula('=PHZ.STARLOAD(A1:A3, B1:B3)', data)).toEqual(solid);
    expect(evaluateFormula('=PHZ.STARLOAD(A1:A3, B1:B3, , )', data)).toEqual(solid);
  });
  it('a reference to a blank cell is #VALUE! asking for 0, an impedance or "open"', () => {
    const shown = evaluateFormula('=PHZ.STARLOAD(A1:A3, B1:B3, C1)', data);
    expect(shown[0][0]).toMatchObject({ error: '#VALUE!' });
    expect((shown[0][0] as { message: string }).message).toMatch(/^neutral refers to a blank cell: give 0 for a solid neutral/);
    const empty = evaluateFormula('=PHZ.STARLOAD(A1:A3, B1:B3, "")', data);
    expect((empty[0][0] as { message: string }).message).toMatch(/^neutral refers to a blank cell/);
  });
});

describe('typed text the engine reads as a date or time', () => {
  it('still reads dates and times beside phasor text (which skips the date formats)', () => {
    const engine = new PhzEngine({ sheets: { S: [['31/12/2024', '230∠-120', '31/12/2024', '12:30', '5+j2', '12:30']] } });
    // serial day numbers of the 1900 date system (common practice): days since 1899-12-30
    const day = (Date.UTC(2024, 11, 31) - Date.UTC(1899, 11, 30)) / 86_400_000;
    expect(engine.display({ sheet: 0, row: 0, col: 0 })).toBe(day);
    expect(engine.display({ sheet: 0, row: 0, col: 1 })).toBe('230∠-120');
    expect(engine.display({ sheet: 0, row: 0, col: 2 })).toBe(day);
    expectClose(engine.display({ sheet: 0, row: 0, col: 3 }) as number, 12.5 / 24, 1e-12);
    expect(engine.display({ sheet: 0, row: 0, col: 4 })).toBe('5+j2');
    expectClose(engine.display({ sheet: 0, row: 0, col: 5 }) as number, 12.5 / 24, 1e-12);
  });
});
