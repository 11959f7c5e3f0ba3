/**
 * Evaluates documented example formulas through Excel's own runtime (excel-runtime.ts), as
 * Excel would: innermost PHZ calls first, each sent as a host message whose parameter
 * values are shaped by functions.json (matrices as 2-D arrays, scalars as values, `null` for
 * an argument left out, a repeating parameter as one array of its values). Calls of one
 * nesting level go out together in one host message. Non-PHZ parts of a formula (`PI()/2`)
 * are evaluated by HyperFormula, as Excel's own functions would be.
 */
import { HyperFormula } from 'hyperformula';
import type { ExcelRuntime, HostCall, HostOutcome, MetaFunction } from './excel-runtime';
import { parseCall } from '../preview/formula-args';

type Value = { kind: 'scalar'; value: unknown } | { kind: 'matrix'; rows: unknown[][] } | { kind: 'omitted' };

/** A PHZ call inside the example failed: carries the runtime's outcome. */
export class HostCallFailed extends Error {
  constructor(
    readonly call: HostCall,
    readonly outcome: Extract<HostOutcome, { ok: false }>,
  ) {
    super(`${call.functionName} failed with code ${outcome.errorCode}: ${outcome.message}`);
  }
}

/** Shapes evaluated arguments into the parameter values functions.json declares. */
export function shapeForHost(meta: MetaFunction, args: readonly Value[]): unknown[] {
  const out: unknown[] = [];
  meta.parameters.forEach((p, i) => {
    if (p.repeating) {
      out.push(args.slice(i).map((a) => asMatrix(a)));
      return;
    }
    const a: Value = args[i] ?? { kind: 'omitted' };
    if (a.kind === 'omitted') out.push(null);
    else if (p.dimensionality === 'matrix') out.push(asMatrix(a));
    else if (a.kind === 'scalar') out.push(a.value);
    else if (a.rows.length === 1 && a.rows[0].length === 1) out.push(a.rows[0][0]);
    else throw new Error(`${meta.id}.${p.name} is a scalar parameter but the example gives a ${a.rows.length}×${a.rows[0]?.length} array`);
  });
  return out;
}

function asMatrix(a: Value): unknown[][] | null {
  if (a.kind === 'omitted') return null;
  return a.kind === 'matrix' ? a.rows : [[a.value]];
}

export class HostEvaluator {
  private readonly meta: Map<string, MetaFunction>;
  private queue: Array<{ call: HostCall; resolve: (o: HostOutcome) => void; reject: (e: unknown) => void }> = [];
  private scheduled = false;
  private hf: HyperFormula | null = null;
  /** Host messages sent so far (one per nesting level of a batch). */
  messages = 0;

  constructor(
    private readonly runtime: ExcelRuntime,
    functions: readonly MetaFunction[],
  ) {
    this.meta = new Map(functions.map((f) => [f.id.toUpperCase(), f]));
  }

  /** Evaluates a whole formula (`=PHZ.NAME(...)`) to the 2-D result the cell would show. */
  async formula(formula: string): Promise<unknown[][]> {
    const v = await this.expr(formula.replace(/^=/, ''));
    if (v.kind === 'matrix') return v.rows;
    if (v.kind === 'scalar') return [[v.value]];
    throw new Error(`${formula} evaluates to nothing`);
  }

  /** Sends one call (batched with others made in the same tick). */
  call(call: HostCall): Promise<HostOutcome> {
    return new Promise((resolve, reject) => {
      this.queue.push({ call, resolve, reject });
      if (!this.scheduled) {
        this.scheduled = true;
        setTimeout(() => void this.flush(), 0);
      }
    });
  }

  dispose(): void {
    this.hf?.destroy();
  }

  private async flush(): Promise<void> {
    const batch = this.queue;
    this.queue = [];
    this.scheduled = false;
    this.messages++;
    try {
      const outcomes = await this.runtime.invoke(batch.map((b) => b.call));
      batch.forEach((b, i) => b.resolve(outcomes[i]));
    } catch (e) {
      for (const b of batch) b.reject(e);
    }
  }

  private async expr(source: string): Promise<Value> {
    const text = source.trim();
    if (text === '') return { kind: 'omitted' };
    const call = parseCall(`=${text}`);
    if (call) {
      const meta = this.meta.get(call.name);
      if (!meta) throw new Error(`PHZ.${call.name} is not in functions.json`);
      const args = await Promise.all(call.args.map((a) => (a.kind === 'other' ? this.expr(a.source) : Promise.resolve(literal(a)))));
      const hostCall: HostCall = { functionName: meta.id, parameterValues: shapeForHost(meta, args) };
      const outcome = await this.call(hostCall);
      if (!outcome.ok) throw new HostCallFailed(hostCall, outcome);
      return { kind: 'matrix', rows: outcome.value as unknown[][] };
    }
    const lit = parseCall(`=PHZ.X(${text})`)?.args[0];
    if (lit && lit.kind !== 'other') return literal(lit);
    if (/PHZ\./i.test(text)) throw new Error(`cannot evaluate "${text}": a PHZ call inside another expression`);
    return { kind: 'scalar', value: this.spreadsheetValue(text) };
  }

  /** A non-PHZ expression, evaluated by a spreadsheet engine (HyperFormula). */
  private spreadsheetValue(text: string): unknown {
    this.hf ??= HyperFormula.buildEmpty({ licenseKey: 'gpl-v3' });
    const sheet = this.hf.addSheet();
    const id = this.hf.getSheetId(sheet)!;
    this.hf.setCellContents({ sheet: id, row: 0, col: 0 }, `=${text}`);
    const v = this.hf.getCellValue({ sheet: id, row: 0, col: 0 });
    this.hf.removeSheet(id);
    if (typeof v === 'object' && v !== null) throw new Error(`"${text}" gives ${JSON.stringify(v)}`);
    return v;
  }
}

function literal(a: { kind: 'scalar'; value: unknown } | { kind: 'array'; rows: unknown[][] }): Value {
  return a.kind === 'scalar' ? { kind: 'scalar', value: a.value } : { kind: 'matrix', rows: a.rows };
}
