/**
 * The one generic bridge between the PHZ registry and the HyperFormula engine used by
 * the preview workbook and the node tests. Nothing here knows any single function: the
 * engine metadata, argument conversion, spill sizes and error mapping are all derived
 * from each `FunctionSpec`, so a function added to the registry works in the preview
 * without touching this file.
 *
 * Only `src/preview` imports HyperFormula; the add-in bundle never does.
 */
import {
  ArraySize,
  CellError,
  EmptyValue,
  ErrorType,
  FunctionArgumentType,
  FunctionPlugin,
  HyperFormula,
  SimpleRangeValue,
} from 'hyperformula';
import type { FunctionMetadata, ImplementedFunctions, SimpleCellAddress } from 'hyperformula';
import { isPhzError } from '../core/errors';
import { readerMessages } from '../core/messages';
import type { FunctionSpec, HostResult } from '../functions/spec';

/** The namespace every registry function is called with (`PHZ.DIV`). */
export const NAMESPACE = 'PHZ';

/** What the adapter needs from the registry (`src/functions/index.ts` provides both). */
export interface Registry {
  readonly specs: readonly FunctionSpec[];
  /** Guarded implementations by name; a missing entry falls back to `spec.implementation`. */
  readonly functions?: Readonly<Record<string, (...args: any[]) => HostResult>>;
}

/** Engine function id of a registry name: `DIV` → `PHZ.DIV`. */
export function functionId(name: string): string {
  return `${NAMESPACE}.${name.toUpperCase()}`;
}

// The engine's internal shapes that the adapter touches. They are not part of the
// package's public typings, so they are described here as narrowly as possible.
interface AstNode {
  type: string;
  procedureName?: string;
  args?: AstNode[];
  expression?: AstNode;
}
interface EvalState {
  formulaAddress: SimpleCellAddress;
  arraysFlag: boolean;
  formulaVertex?: { formula?: AstNode; width: number; height: number };
}
/** A cell value inside the engine: raw scalars, rich numbers (dates, percents), errors, empty. */
type EngineScalar = number | string | boolean | CellError | symbol | { val: number };

/** Per engine instance (keyed by its dependency graph): addresses by `sheet:row:col`. */
type AddressBook = WeakMap<object, Map<string, SimpleCellAddress>>;

/** Formulas whose result came out another size than the area the engine reserved. */
const pendingResize: AddressBook = new WeakMap();
/** Formulas that asked for an area of more than one cell (they may be blocked: #SPILL!). */
const spillers: AddressBook = new WeakMap();

function noteAddress(book: AddressBook, graph: object, a: SimpleCellAddress): void {
  let map = book.get(graph);
  if (!map) book.set(graph, (map = new Map()));
  map.set(`${a.sheet}:${a.row}:${a.col}`, { sheet: a.sheet, row: a.row, col: a.col });
}

function graphOf(hf: HyperFormula): object {
  return (hf as unknown as { dependencyGraph: object }).dependencyGraph;
}

/** Addresses whose formula produced a result of another size than the engine reserved. */
export function takePendingResizes(hf: HyperFormula): SimpleCellAddress[] {
  const key = graphOf(hf);
  const list = [...(pendingResize.get(key)?.values() ?? [])];
  pendingResize.delete(key);
  return list;
}

/** Addresses of PHZ formulas that asked for a spill area (some may no longer exist). */
export function spillingFormulas(hf: HyperFormula): SimpleCellAddress[] {
  return [...(spillers.get(graphOf(hf))?.values() ?? [])];
}

/** Outcome of one call: the host's 2-D result or an engine error carrying our message. */
type Outcome = HostResult | CellError;

/** A registry function as the plugin calls it, with what its parameters ask worked out once. */
interface Entry {
  readonly id: string;
  readonly spec: FunctionSpec;
  readonly impl: (...args: any[]) => HostResult;
  /** Index of the repeating parameter, or -1. */
  readonly repeatIndex: number;
  /** Arguments that must be given. */
  readonly required: number;
  /** Per parameter: true when it takes one value (a scalar), false for a matrix. */
  readonly scalar: readonly boolean[];
}

/**
 * The engine asks a formula's spill size (`phzSize`) when the formula is entered, and then
 * evaluates it (`phzCall`): two calls of the implementation for one result. The first
 * outcome is kept here, by cell, with the arguments it was computed from; the evaluation
 * that follows uses it when the arguments are the same (registry functions are pure). Only
 * calls with a few argument cells are kept, so comparing them stays cheap. Cells are keyed
 * by a number and arguments compared value by value: string keys cost a paste of 40,000
 * formulas about a tenth of its time (building, hashing and comparing them).
 */
const sizedOutcomes: WeakMap<object, Map<number, { readonly args: unknown[]; readonly outcome: Outcome }>> = new WeakMap();
const KEY_CELLS = 16;
const KEPT_OUTCOMES = 200_000;

/** One number per cell (rows below 2^20, columns below 2^14: Excel's sheet size). */
function cellNumber(a: SimpleCellAddress): number {
  return a.sheet * 17_179_869_184 + a.row * 16_384 + a.col;
}

/** Marks where a matrix opens and closes in flattened arguments. */
const OPEN = Symbol('open');
const CLOSE = Symbol('close');

/**
 * The host arguments flattened to their cells (with the shape marked), or `undefined` when
 * they hold more cells than are worth keeping. Flattened before the call, so the record
 * does not depend on what the implementation does with its arguments.
 */
function flatArguments(args: readonly unknown[]): unknown[] | undefined {
  const out: unknown[] = [];
  let cells = 0;
  const add = (v: unknown): boolean => {
    if (Array.isArray(v)) {
      out.push(OPEN);
      for (const x of v) if (!add(x)) return false;
      out.push(CLOSE);
      return true;
    }
    if (++cells > KEY_CELLS) return false;
    out.push(v === undefined ? null : v);
    return true;
  };
  for (const a of args) if (!add(a)) return undefined;
  return out;
}

function sameArguments(a: readonly unknown[], b: readonly unknown[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function ordinal(n: number): string {
  const s = n % 100 >= 11 && n % 100 <= 13 ? 'th' : (['th', 'st', 'nd', 'rd'][n % 10] ?? 'th');
  return `${n}${s}`;
}

function signature(spec: FunctionSpec): string {
  return spec.params
    .map((p) => (p.type === 'repeat' ? `${p.name}, …` : p.optional ? `[${p.name}]` : p.name))
    .join(', ');
}

/** Engine cell value → what the host passes: numbers, text, booleans, `null` for empty. */
function toHostScalar(v: EngineScalar): number | string | boolean | null | CellError {
  if (v === EmptyValue || v === undefined || v === null) return null;
  if (v instanceof CellError) return v;
  if (typeof v === 'object' && v !== null && 'val' in v) return v.val;
  if (typeof v === 'symbol') return null;
  return v;
}

function firstError(rows: (number | string | boolean | null | CellError)[][]): CellError | undefined {
  for (const row of rows) for (const c of row) if (c instanceof CellError) return c;
  return undefined;
}

function isEmptyArg(ast: AstNode): boolean {
  return ast.type === 'EMPTY';
}

function unwrapParentheses(ast: AstNode | undefined): AstNode | undefined {
  let a = ast;
  while (a && a.type === 'PARENTHESIS' && a.expression) a = a.expression;
  return a;
}

/** Ragged or empty results are padded so the engine always gets a rectangle. */
function resultSize(result: HostResult): { width: number; height: number } {
  const height = result.length;
  const width = result.reduce((w, row) => Math.max(w, row.length), 0);
  return { width, height };
}

function toEngineValue(outcome: Outcome): unknown {
  if (outcome instanceof CellError) return outcome;
  const { width, height } = resultSize(outcome);
  if (width === 1 && height === 1) return outcome[0][0];
  const data = outcome.map((row) => {
    const out: unknown[] = row.map((c) => (c === null || c === undefined ? EmptyValue : c));
    while (out.length < width) out.push(EmptyValue);
    return out;
  });
  return SimpleRangeValue.onlyValues(data as never);
}

/**
 * Builds the engine plugin for a registry. One class serves every function: each
 * entry of `implementedFunctions` points at the same `phzCall`/`phzSize` methods, which
 * look the spec up by the called name.
 */
export function createPhzPlugin(registry: Registry): typeof FunctionPlugin & { implementedFunctions: ImplementedFunctions } {
  const byId = new Map<string, Entry>();
  const implemented: ImplementedFunctions = {};
  for (const spec of registry.specs) {
    const id = functionId(spec.name);
    const params = spec.params;
    const repeatIndex = params.length > 0 && params[params.length - 1].type === 'repeat' ? params.length - 1 : -1;
    byId.set(id, {
      id,
      spec,
      impl: registry.functions?.[spec.name] ?? spec.implementation,
      repeatIndex,
      required: params.filter((p) => !p.optional && p.type !== 'repeat').length + (repeatIndex >= 0 && !params[repeatIndex].optional ? 1 : 0),
      scalar: params.map((p) => p.type === 'scalar'),
    });
    const last = params[params.length - 1];
    const metadata: FunctionMetadata = {
      method: 'phzCall',
      sizeOfResultArrayMethod: 'phzSize',
      // Ranges reach the implementation whole; the engine must not map over them.
      vectorizationForbidden: true,
      enableArrayArithmeticForArguments: true,
      parameters: params.map((p) => ({
        argumentType: FunctionArgumentType.ANY,
        optionalArg: p.optional === true || p.type === 'repeat',
      })),
      ...(last?.type === 'repeat' ? { repeatLastArgs: 1 } : {}),
    };
    implemented[id] = metadata;
  }

  class PhzPlugin extends FunctionPlugin {
    static override implementedFunctions = implemented;

    /** An argument for a matrix parameter: rows of cells (`null` for a left-out argument). */
    private matrixArgument(arg: AstNode, inner: EvalState): (number | string | boolean | null)[][] | CellError | null {
      if (isEmptyArg(arg)) return null;
      const v = this.evaluateAst(arg as never, inner as never) as unknown;
      if (v instanceof SimpleRangeValue) {
        const rows = (v.data as EngineScalar[][]).map((row) => row.map(toHostScalar));
        return firstError(rows) ?? (rows as (number | string | boolean | null)[][]);
      }
      const s = toHostScalar(v as EngineScalar);
      return s instanceof CellError ? s : [[s]];
    }

    /** An argument for a scalar parameter: one value; a range of more than one cell is refused. */
    private scalarArgument(entry: Entry, arg: AstNode, index: number, inner: EvalState): number | string | boolean | null | CellError {
      if (isEmptyArg(arg)) return null;
      const v = this.evaluateAst(arg as never, inner as never) as unknown;
      if (v instanceof SimpleRangeValue) {
        if (v.width() === 1 && v.height() === 1) return toHostScalar(v.data[0][0] as EngineScalar);
        return new CellError(
          ErrorType.VALUE,
          `${entry.id}: argument ${entry.spec.params[index].name} (the ${ordinal(index + 1)}) takes one value, not a range of ${v.height()}×${v.width()} cells.`,
        );
      }
      return toHostScalar(v as EngineScalar);
    }

    /**
     * Evaluates the arguments and runs the implementation; never throws. `phase` says who
     * asks: the size query keeps its outcome for the evaluation that follows (see `sizedOutcomes`).
     */
    private callRegistry(ast: AstNode, state: EvalState, phase: 'size' | 'call'): Outcome {
      const id = (ast.procedureName ?? '').toUpperCase();
      const entry = byId.get(id);
      if (!entry) return new CellError(ErrorType.NAME, `${id} is not in the PHZ registry.`);
      const { spec, repeatIndex, required } = entry;
      const args = ast.args ?? [];
      const params = spec.params;
      if (args.length < required) {
        return new CellError(
          ErrorType.VALUE,
          `${id}(${signature(spec)}) needs at least ${required} argument${required === 1 ? '' : 's'}; ${args.length} ${args.length === 1 ? 'was' : 'were'} given.`,
        );
      }
      if (repeatIndex < 0 && args.length > params.length) {
        return new CellError(
          ErrorType.VALUE,
          `${id}(${signature(spec)}) takes at most ${params.length} argument${params.length === 1 ? '' : 's'}; ${args.length} were given.`,
        );
      }
      // The engine's own state type is not exported; it is a plain record of these fields.
      const inner: EvalState = { formulaAddress: state.formulaAddress, arraysFlag: true, formulaVertex: state.formulaVertex };

      const hostArgs: unknown[] = [];
      for (let i = 0; i < params.length; i++) {
        if (i === repeatIndex) {
          const group: unknown[] = [];
          for (let j = i; j < args.length; j++) {
            const m = this.matrixArgument(args[j], inner);
            if (m instanceof CellError) return m;
            if (m !== null) group.push(m);
          }
          hostArgs.push(group.length > 0 ? group : null);
          break;
        }
        if (i >= args.length) {
          hostArgs.push(null);
          continue;
        }
        const value = entry.scalar[i] ? this.scalarArgument(entry, args[i], i, inner) : this.matrixArgument(args[i], inner);
        if (value instanceof CellError) return value;
        hostArgs.push(value);
      }

      const graph = this.dependencyGraph as object;
      const cell = cellNumber(state.formulaAddress);
      const flat = flatArguments(hostArgs);
      let kept = sizedOutcomes.get(graph);
      if (phase === 'call' && kept) {
        const before = kept.get(cell);
        if (before) {
          kept.delete(cell);
          if (flat !== undefined && sameArguments(before.args, flat)) return before.outcome;
        }
      }
      const outcome = this.runImplementation(id, spec, entry.impl, hostArgs);
      if (phase === 'size' && flat !== undefined) {
        if (!kept) sizedOutcomes.set(graph, (kept = new Map()));
        if (kept.size >= KEPT_OUTCOMES) kept.clear();
        kept.set(cell, { args: flat, outcome });
      }
      return outcome;
    }

    private runImplementation(id: string, spec: FunctionSpec, impl: (...args: any[]) => HostResult, hostArgs: unknown[]): Outcome {
      try {
        const result = impl(...hostArgs);
        if (!Array.isArray(result) || result.length === 0 || !result.every((r) => Array.isArray(r))) {
          return new CellError(ErrorType.VALUE, `${id} returned no cells.`);
        }
        return result;
      } catch (e) {
        if (isPhzError(e)) return new CellError(e.code === 'notAvailable' ? ErrorType.NA : ErrorType.VALUE, e.message);
        // As in the shared guard: never the raw text of an exception that is not ours.
        console.error(`${id}: internal error`, e);
        return new CellError(ErrorType.VALUE, readerMessages.internal(spec.name));
      }
    }

    /** Evaluation: the result itself; a 2-D result spills. */
    phzCall(ast: AstNode, state: EvalState): unknown {
      const outcome = this.callRegistry(ast, state, 'call');
      const vertex = state.formulaVertex;
      // The engine reserves the spill area when the formula is entered and cannot take
      // a larger result later. When inputs change the natural size (e.g. a range
      // switches from pairs to text), the result is fitted to the reserved area for now
      // and the owner re-enters the formula (see `PhzEngine.settle`).
      if (vertex && unwrapParentheses(vertex.formula) === ast) {
        const natural = outcome instanceof CellError ? { width: 1, height: 1 } : resultSize(outcome);
        if (natural.width !== vertex.width || natural.height !== vertex.height) {
          noteAddress(pendingResize, this.dependencyGraph as object, state.formulaAddress);
          if (!(outcome instanceof CellError)) {
            const fitted = outcome.slice(0, vertex.height).map((row) => row.slice(0, vertex.width));
            return toEngineValue(fitted);
          }
        }
      }
      return toEngineValue(outcome);
    }

    /**
     * Spill size: the size of the result for the values the arguments hold now. The
     * engine asks before it evaluates; when inputs are not computed yet the answer is
     * one cell and the evaluation above reports the real size.
     */
    phzSize(ast: AstNode, state: EvalState): ArraySize {
      try {
        const outcome = this.callRegistry(ast, state, 'size');
        if (outcome instanceof CellError) return ArraySize.scalar();
        const { width, height } = resultSize(outcome);
        if (width * height > 1) noteAddress(spillers, this.dependencyGraph as object, state.formulaAddress);
        return new ArraySize(Math.max(1, width), Math.max(1, height));
      } catch {
        return ArraySize.scalar();
      }
    }
  }
  return PhzPlugin as unknown as typeof FunctionPlugin & { implementedFunctions: ImplementedFunctions };
}

let registeredIds: string[] = [];
let registeredFor: Registry | undefined;

/**
 * Registers the registry's functions with the engine (all languages get the `PHZ.`
 * names). Engines built afterwards see them; re-registering a different registry
 * replaces the previous set.
 */
export function registerRegistry(registry: Registry): void {
  if (registeredFor === registry) return;
  for (const id of registeredIds) {
    try {
      HyperFormula.unregisterFunction(id);
    } catch {
      // already gone
    }
  }
  const plugin = createPhzPlugin(registry);
  const names: Record<string, string> = {};
  for (const id of Object.keys(plugin.implementedFunctions)) names[id] = id;
  const translations: Record<string, Record<string, string>> = {};
  for (const code of HyperFormula.getRegisteredLanguagesCodes()) translations[code] = names;
  HyperFormula.registerFunctionPlugin(plugin as never, translations);
  registeredIds = Object.keys(names);
  registeredFor = registry;
}
