/**
 * The shared guard around every implementation: argument counting, omitted arguments,
 * and the rule that no stray exception and no NaN/∞ reaches a cell.
 */
import { PhzError, isPhzError } from '../core/errors';
import { readerMessages as M } from '../core/messages';
import type { FunctionSpec, HostResult } from './spec';

export function guarded(spec: FunctionSpec): (...args: any[]) => HostResult {
  const max = spec.params.length;
  const hasRepeat = spec.params.some((p) => p.type === 'repeat');
  const impl = spec.implementation;
  return (...args: any[]): HostResult => {
    if (args.length > max && !hasRepeat) throw new PhzError(M.tooManyArgs(spec.name, max, args.length));
    while (args.length < max) args.push(null);
    let result: HostResult;
    try {
      result = impl(...args);
    } catch (e) {
      if (isPhzError(e)) throw e;
      throw new PhzError(M.internal(spec.name, e instanceof Error ? e.message : String(e)));
    }
    for (const row of result) {
      for (const cell of row) {
        if (typeof cell === 'number' && !Number.isFinite(cell)) throw new PhzError(M.nonFiniteResult(spec.name));
      }
    }
    return result;
  };
}
