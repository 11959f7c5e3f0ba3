/**
 * Excel registration: associates every registry entry with its custom-function id and is
 * the only place a project error becomes a host error. The metadata (functions.json)
 * comes from the generated declarations.ts, which the runtime does not import, so each
 * function is associated exactly once, here.
 */
import { functions, specs } from '../index';
import type { HostResult } from '../spec';
import { isPhzError } from '../../core/errors';
import { clipMiddle } from '../../core/messages';

/**
 * Longest error message we hand to the host. Office documents no limit for
 * `CustomFunctions.Error` messages, but Excel on Mac has been reported to cut them at
 * about 255 characters (OfficeDev/office-js issue #4133); keeping every message within
 * that length makes all platforms show the same text.
 */
export const HOST_MESSAGE_LIMIT = 255;

/** Shown when something other than a `PhzError` escapes an implementation. */
export const GENERIC_MESSAGE =
  'Starpoint could not compute this result (internal error). Check the arguments; if they are valid, please report the formula.';

type Implementation = (...args: any[]) => HostResult;

/**
 * Fits a message to the host limit. Messages quote only an excerpt of what was given
 * (src/core/messages/quote.ts), so they fit already; one that still does not is cut in the
 * middle, keeping its start (which argument) and its end (what to do).
 */
export function fitHostMessage(message: string): string {
  const text = message.trim() || GENERIC_MESSAGE;
  return clipMiddle(text, HOST_MESSAGE_LIMIT);
}

/**
 * The host error for anything thrown by an implementation: a `PhzError` keeps its code
 * (`invalidValue` → #VALUE!, `notAvailable` → #N/A) and message; anything else becomes
 * #VALUE! with a generic message, so no raw exception text reaches a cell.
 */
export function toHostError(e: unknown): CustomFunctions.Error {
  if (isPhzError(e)) {
    const code = e.code === 'notAvailable' ? CustomFunctions.ErrorCode.notAvailable : CustomFunctions.ErrorCode.invalidValue;
    return new CustomFunctions.Error(code, fitHostMessage(e.message));
  }
  return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, GENERIC_MESSAGE);
}

/**
 * Wraps one implementation for Excel. Excel's custom-functions runtime calls every function
 * with one value per declared parameter (`null` when left out) and then appends an
 * invocation object (office-js custom-functions-runtime.debug.js, `_batchInvocationEntries`:
 * `message.parameterValues.push(invocationContext)`). The wrapper passes on exactly the
 * `declared` parameters, so the invocation object never reaches the readers, and turns
 * errors into host errors.
 */
export function hostWrapper(name: string, implementation: Implementation, declared: number): Implementation {
  const wrapped = (...args: any[]): HostResult => {
    try {
      return implementation(...(args.length > declared ? args.slice(0, declared) : args));
    } catch (e) {
      throw toHostError(e);
    }
  };
  Object.defineProperty(wrapped, 'name', { value: `PHZ.${name}` });
  return wrapped;
}

/**
 * Calls a registry function by name with the host's arguments, mapping errors as Excel
 * would. The generated declarations use it so their bodies match what is registered.
 */
export function invoke(name: string, args: readonly unknown[]): HostResult {
  const implementation = functions[name];
  if (!implementation) {
    throw new CustomFunctions.Error(CustomFunctions.ErrorCode.notAvailable, fitHostMessage(`PHZ.${name} is not in this version of Starpoint.`));
  }
  return hostWrapper(name, implementation, args.length)(...args);
}

/** What registration needs of one function: its id, its implementation, how many parameters it declares. */
export interface Registration {
  readonly name: string;
  readonly implementation: Implementation;
  /** The number of parameters in functions.json; a repeating parameter counts once. */
  readonly declared: number;
}

/** The project registry, as registrations. */
export function registryEntries(): Registration[] {
  return specs.map((s) => ({ name: s.name, implementation: functions[s.name], declared: s.params.length }));
}

/**
 * Associates every entry (default: the project registry) with Excel and returns the names
 * associated. Call once per runtime, before Excel evaluates a function.
 */
export function registerAll(entries: readonly Registration[] = registryEntries()): string[] {
  for (const e of entries) CustomFunctions.associate(e.name, hostWrapper(e.name, e.implementation, e.declared));
  return entries.map((e) => e.name);
}
