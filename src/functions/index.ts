/**
 * The one registry: every PHZ function, by name without namespace. Excel registration,
 * the preview engine, the pane's reference and the README reference are driven from it.
 */
import type { FunctionSpec, HostResult } from './spec';
import { guarded } from './host';
import { valuesFunctions } from './values';
import { arithmeticFunctions } from './arithmetic';
import { setsFunctions } from './sets';
import { loadsFunctions } from './loads';
import { solversFunctions } from './solvers';
import { neutralFunctions } from './neutral';
import { feedersFunctions } from './feeders';
import { sequencesFunctions } from './sequences';
import { unbalanceFunctions } from './unbalance';

export type { FunctionSpec, ParamSpec, HostResult } from './spec';

/** Every spec, in reference order (by group). */
export const specs: readonly FunctionSpec[] = [
  ...valuesFunctions,
  ...arithmeticFunctions,
  ...setsFunctions,
  ...loadsFunctions,
  ...solversFunctions,
  ...neutralFunctions,
  ...feedersFunctions,
  ...sequencesFunctions,
  ...unbalanceFunctions,
];

/** Spec by name. */
export const specByName: Readonly<Record<string, FunctionSpec>> = Object.fromEntries(specs.map((s) => [s.name, s]));

/**
 * Implementation by name. Each takes the host's arguments (missing trailing ones are
 * treated as omitted) and returns a 2-D array; it throws `PhzError` on bad input, and
 * the shared guard turns any stray exception or non-finite number into one too.
 */
export const functions: Readonly<Record<string, (...args: any[]) => HostResult>> = Object.fromEntries(
  specs.map((s) => [s.name, guarded(s)]),
);
