/**
 * What a cell shows and how large a sheet is: shared by the engine and by the .xlsx code,
 * which also runs in a worker of its own without the engine (xlsx-worker.ts).
 */

/** One displayed cell: a value, `null` for empty, or an error with its message. */
export type DisplayValue = number | string | boolean | null | DisplayError;
export interface DisplayError {
  /** As the cell shows it: `#VALUE!`, `#N/A`, `#SPILL!`, … */
  readonly error: string;
  /** The message behind it (for PHZ functions, the engineer-facing text). */
  readonly message: string;
}

export function isDisplayError(v: unknown): v is DisplayError {
  return typeof v === 'object' && v !== null && 'error' in v && 'message' in v;
}

/** Sheet size: Excel's (1,048,576 rows × 16,384 columns, A to XFD), so any .xlsx fits. */
export const MAX_ROWS = 1_048_576;
export const MAX_COLUMNS = 16_384;
