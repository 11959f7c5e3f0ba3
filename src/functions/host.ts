/**
 * The shared guard around every implementation: argument counting, omitted arguments,
 * and the rule that no stray exception and no NaN/∞ reaches a cell (an exception that is
 * not a PhzError becomes the generic internal-error message; its text goes to the console).
 */
import { PhzError, isPhzError } from '../core/errors';
import { readerMessages as M } from '../core/messages';
import type { FunctionSpec, HostResult } from './spec';

export function guarded(spec: FunctionSpec): (...args: any[]) => HostResult {
  const max = spec.params.length;
  const impl = spec.implementation;
  const name = spec.name;
  return (...args: any[]): HostResult => {
    if (args.length > max) throw new PhzError(M.tooManyArgs(name, max, args.length));
    // arguments left out stay undefined, which every reader takes as omitted (spec.ts)
    let result: HostResult;
    try {
      result = impl(...args);
    } catch (e) {
      if (isPhzError(e)) throw e;
      // Not ours: its text may be anything (a library's wording, a stack detail), so the
      // cell gets the generic message and the console gets the detail for a report.
      console.error(`PHZ.${name}: internal error`, e);
      throw new PhzError(M.internal(name));
    }
    for (let r = 0; r < result.length; r++) {
      const row = result[r];
      for (let c = 0; c < row.length; c++) {
        const cell = row[c];
        if (typeof cell === 'number' && !Number.isFinite(cell)) throw new PhzError(M.nonFiniteResult(name));
      }
    }
    return result;
  };
}
