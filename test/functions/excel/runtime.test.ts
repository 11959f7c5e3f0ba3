/**
 * The host contract, through Excel's own custom-functions runtime (the shipped
 * custom-functions-runtime.debug.js, driven by test/host/excel-runtime.ts): our registration
 * associates every registry function, and host messages shaped by functions.json reach them
 * with the runtime's invocation object appended, exactly as in Excel. Every documented
 * example must give its documented cells; bad input must come back as #VALUE!/#N/A with our
 * message. `npm run check:build` runs the same examples against the built bundle and the
 * built dist/functions.json.
 */
import { createRequire } from 'node:module';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { specs } from '../../../src/functions/index';
import { GENERIC_MESSAGE, HOST_MESSAGE_LIMIT, registerAll } from '../../../src/functions/excel/register';
import { DECLARATIONS_PATH } from '../../../src/functions/excel/render-declarations';
import { ExcelRuntime, RUNTIME_ERROR, officeJsPackage, type MetaFunction } from '../../host/excel-runtime';
import { HostEvaluator, HostCallFailed } from '../../host/host-examples';
import { expectClose } from '../../helpers';

const ROOT = resolve(__dirname, '../../..');
const pluginRequire = createRequire(createRequire(import.meta.url).resolve('custom-functions-metadata-plugin'));
const { generateCustomFunctionsMetadata } = pluginRequire('custom-functions-metadata') as {
  generateCustomFunctionsMetadata(input: string): Promise<{ metadataJson: string; errors: string[] }>;
};

let runtime: ExcelRuntime;
let evaluator: HostEvaluator;
let meta: MetaFunction[];

beforeAll(async () => {
  // functions.json exactly as the build makes it: the metadata plugin's generator on declarations.ts
  const generated = await generateCustomFunctionsMetadata(resolve(ROOT, DECLARATIONS_PATH));
  expect(generated.errors).toEqual([]);
  meta = JSON.parse(generated.metadataJson).functions;
  runtime = ExcelRuntime.load();
  vi.stubGlobal('CustomFunctions', runtime.CustomFunctions);
  registerAll();
  // a function whose body fails in a way that is not ours, to see what reaches the cell
  registerAll([
    {
      name: 'BROKENPROBE',
      declared: 1,
      implementation: () => {
        throw new TypeError("Cannot read properties of undefined (reading 're')");
      },
    },
  ]);
  runtime.sendMetadata([...meta, { id: 'BROKENPROBE', name: 'BROKENPROBE', parameters: [{ name: 'z', dimensionality: 'matrix' }] }]);
  evaluator = new HostEvaluator(runtime, meta);
}, 60_000);

afterAll(() => {
  evaluator?.dispose();
  vi.unstubAllGlobals();
});

/** Text and booleans exactly; numbers to 1e-9 relative. */
function expectCells(got: unknown, want: ReadonlyArray<ReadonlyArray<string | number | boolean>>, what: string): void {
  expect(Array.isArray(got), what).toBe(true);
  const rows = got as unknown[][];
  expect(rows.length, `${what}: rows`).toBe(want.length);
  rows.forEach((row, r) => {
    expect(row.length, `${what}: columns of row ${r + 1}`).toBe(want[r].length);
    row.forEach((cell, c) => {
      const w = want[r][c];
      if (typeof w === 'number') {
        expect(typeof cell, `${what} [${r},${c}]`).toBe('number');
        expectClose(cell as number, w, 1e-9, 1);
      } else expect(cell, `${what} [${r},${c}]`).toBe(w);
    });
  });
}

describe('the runtime under test', () => {
  it('is the office-js version whose internal message format the harness reads', () => {
    // Pinned in package.json; excel-runtime.ts reads internal names of this version.
    expect(officeJsPackage().version).toBe('1.1.110');
  });

  it('appends its invocation object after the declared parameters, as Excel does', async () => {
    const seen: unknown[][] = [];
    runtime.CustomFunctions.associate('ARGPROBE', (...args: unknown[]) => {
      seen.push(args);
      return [[args.length]];
    });
    runtime.sendMetadata([{ id: 'ARGPROBE', name: 'ARGPROBE', parameters: [] }]);
    const [out] = await runtime.invoke([{ functionName: 'ARGPROBE', parameterValues: [[['7+j5']], null], address: 'Sheet1!C3' }]);
    expect(out).toEqual({ ok: true, value: [[3]] });
    expect(seen[0].slice(0, 2)).toEqual([[['7+j5']], null]);
    expect(seen[0][2]).toMatchObject({ address: 'Sheet1!C3' });
  });

  it('functions.json declares every registry function with the parameters of its spec', () => {
    expect(meta.map((f) => f.id)).toEqual(specs.map((s) => s.name));
    for (const s of specs) expect(meta.find((f) => f.id === s.name)!.parameters.length, s.name).toBe(s.params.length);
  });
});

describe('documented examples, called as Excel calls them', () => {
  const examples = specs.flatMap((spec) => spec.examples.map((example, i) => ({ label: `${spec.name} #${i + 1}: ${example.formula}`, example })));
  const results = new Map<string, PromiseSettledResult<unknown[][]>>();

  beforeAll(async () => {
    // All examples at once: the calls of one nesting level go to the runtime in one host message.
    const settled = await Promise.allSettled(examples.map(({ example }) => evaluator.formula(example.formula)));
    examples.forEach(({ label }, i) => results.set(label, settled[i]));
  }, 60_000);

  it('sends one host message per nesting level, not one per call', () => {
    expect(evaluator.messages).toBeLessThanOrEqual(4);
  });

  it.each(examples)('$label', ({ example, label }) => {
    const r = results.get(label)!;
    if (r.status === 'rejected') {
      const e = r.reason;
      throw e instanceof HostCallFailed ? new Error(`${label}: ${e.message}`) : e;
    }
    expectCells(r.value, example.result, label);
  });
});

describe('errors, as Excel receives them', () => {
  /** Bad text in every required argument of every function, all in one host message. */
  it('gives #VALUE! with our message, quoting the bad text, for every function', async () => {
    const bad = 'seven ohms?';
    const calls = meta.map((f) => ({
      functionName: f.id,
      parameterValues: f.parameters.map((p, i) => {
        if (p.optional && i > 0) return null;
        if (p.repeating) return [[[bad]], [[bad]], [[bad]]];
        return p.dimensionality === 'matrix' ? [[bad], [bad], [bad]] : bad;
      }),
    }));
    const outcomes = await runtime.invoke(calls);
    outcomes.forEach((o, i) => {
      const id = calls[i].functionName;
      expect(o.ok, id).toBe(false);
      if (o.ok) return;
      expect(o.errorCode, id).toBe(RUNTIME_ERROR.invalidValue);
      expect(o.message, id).toContain('seven ohms?');
      expect(o.message.length, id).toBeLessThanOrEqual(HOST_MESSAGE_LIMIT);
    });
  });

  it('gives #N/A with our message where a standard gives no value', async () => {
    const [o] = await runtime.invoke([{ functionName: 'MOTORDERATE', parameterValues: [7] }]);
    expect(o.ok).toBe(false);
    if (o.ok) return;
    expect(o.errorCode).toBe(RUNTIME_ERROR.notAvailable);
    expect(o.message).toMatch(/5 %/);
  });

  it('never shows the raw text of an exception that is not ours', async () => {
    const [o] = await runtime.invoke([{ functionName: 'BROKENPROBE', parameterValues: [[['1']]] }]);
    expect(o).toEqual({ ok: false, errorCode: RUNTIME_ERROR.invalidValue, message: GENERIC_MESSAGE });
  });

  it('reads cells holding Excel data types as Excel sends them (rich values, flag 8)', async () => {
    // Shapes from the Office docs, "Excel data types core concepts" (FormattedNumber, Double)
    // and "Use data types with custom functions in Excel" (entities); the runtime unwraps each
    // {value: JSON} before calling the function.
    const rich = (v: object) => ({ value: JSON.stringify(v) });
    const volts = rich({ type: 'FormattedNumber', basicValue: 230, numberFormat: '0 "V"' });
    const load = rich({
      type: 'Entity',
      text: 'Heater branch',
      properties: { Real: { type: 'Double', basicValue: 8.2 }, Imag: { type: 'Double', basicValue: 3.1 } },
    });
    const pictured = rich({ type: 'WebImage', address: 'https://example.org/board.png' });
    const [ok, refused] = await runtime.invoke([
      { functionName: 'DIV', parameterValues: [[[volts]], [[load]], null], flags: 8 },
      { functionName: 'MAG', parameterValues: [[[pictured]]], flags: 8 },
    ]);
    expect(ok).toEqual({ ok: true, value: [['26.2365∠-20.709°']] });
    expect(refused.ok).toBe(false);
    if (!refused.ok) {
      expect(refused.errorCode).toBe(RUNTIME_ERROR.invalidValue);
      expect(refused.message).toMatch(/image/);
    }
  });

  it('treats null for a left-out optional argument as omitted', async () => {
    const [a, b] = await runtime.invoke([
      { functionName: 'TOPOLAR', parameterValues: [[['3+j4']], null] },
      { functionName: 'BALANCED', parameterValues: [230, null, null, null] },
    ]);
    expect(a).toEqual({ ok: true, value: [['5∠53.1301°']] });
    expect(b).toEqual({ ok: true, value: [['230∠0°'], ['230∠-120°'], ['230∠120°']] });
  });
});
