/**
 * The one error type of the project. Core and function code throw it; only the host
 * layers (Excel registration, preview engine adapter) turn it into a host error.
 *
 * `code` is the host error it maps to: `invalidValue` (#VALUE!) for input the
 * engineer can correct, `notAvailable` (#N/A) for a result that does not exist for
 * valid input (e.g. a standard that gives no value there).
 */
export type PhzErrorCode = 'invalidValue' | 'notAvailable';

export class PhzError extends Error {
  readonly code: PhzErrorCode;
  constructor(message: string, code: PhzErrorCode = 'invalidValue') {
    super(message);
    this.name = 'PhzError';
    this.code = code;
  }
}

/** True when `e` is the project's error type (works across bundles). */
export function isPhzError(e: unknown): e is PhzError {
  return e instanceof PhzError || (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'PhzError');
}
