/**
 * Cells that hold Excel data types. The metadata generator writes
 * `allowCustomDataForDataTypeAny: true`, so on current Excel a cell holding a data type
 * reaches a function as an object in the JSON schema of `Excel.CellValue` ("Use data types
 * with custom functions in Excel": custom functions use the same JSON schema as the Excel
 * JavaScript API; the runtime hands over `JSON.parse` of each such value). Every field is
 * read defensively: the object comes from outside.
 *
 * - Double, FormattedNumber, String, Boolean: their `basicValue`. Their `properties` are
 *   ignored, as Excel's own calculations ignore them ("Add properties to basic cell values").
 * - Empty: a blank cell.
 * - Entity and LinkedEntity: a phasor when their properties carry one (see
 *   `phasorProperties`); refused otherwise.
 * - Error: refused, naming the error (`errorName`).
 * - Anything else (images, arrays, references, …): refused, naming what it is (`describeObject`).
 *
 * Only objects pay for this: plain numbers and text never reach these functions.
 */

/** The fields of an `Excel.CellValue` this module reads; the rest is ignored. */
interface CellObject {
  readonly type?: unknown;
  readonly basicValue?: unknown;
  readonly errorType?: unknown;
  readonly text?: unknown;
  readonly properties?: unknown;
  readonly code?: unknown;
  readonly error?: unknown;
}

/**
 * The plain value of a cell: a data-type object gives its basic value (a number, text,
 * TRUE/FALSE), `null` for Empty; every other value is returned unchanged.
 */
export function plainCell(v: unknown): unknown {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) return v;
  const o = v as CellObject;
  const b = o.basicValue;
  switch (o.type) {
    case 'Double':
    case 'FormattedNumber':
      return typeof b === 'number' ? b : v;
    case 'String':
      return typeof b === 'string' ? b : v;
    case 'Boolean':
      return typeof b === 'boolean' ? b : v;
    case 'Empty':
      return null;
    default:
      return v;
  }
}

/** True when some cell is an object (a data type, or anything else that is not a plain value). */
function hasObjectCell(m: unknown[][]): boolean {
  for (let r = 0; r < m.length; r++) {
    const row = m[r];
    for (let c = 0; c < row.length; c++) {
      const v = row[c];
      if (typeof v === 'object' && v !== null) return true;
    }
  }
  return false;
}

/** Rows of cells with every data-type object replaced by its plain value (the same rows when there is none). */
export function plainRows(m: unknown[][]): unknown[][] {
  return hasObjectCell(m) ? m.map((cells) => cells.map(plainCell)) : m;
}

/** How Excel shows each `errorType` of an `ErrorCellValue` (Excel.ErrorCellValueType). */
const ERROR_TEXT: Readonly<Record<string, string>> = {
  Blocked: '#BLOCKED!',
  Busy: '#BUSY!',
  Calc: '#CALC!',
  Connect: '#CONNECT!',
  Div0: '#DIV/0!',
  External: '#EXTERNAL!',
  Field: '#FIELD!',
  GettingData: '#GETTING_DATA',
  NotAvailable: '#N/A',
  Name: '#NAME?',
  Null: '#NULL!',
  Num: '#NUM!',
  Ref: '#REF!',
  Spill: '#SPILL!',
  Value: '#VALUE!',
};

function isErrorText(v: unknown): v is string {
  return typeof v === 'string' && v.startsWith('#') && v.length <= 20;
}

/**
 * The error an object stands for, as Excel shows it (`#DIV/0!`), `''` for an error whose
 * kind is not given, or `undefined` when the object is not an error. Reads an
 * `ErrorCellValue` (`type: "Error"`, `basicValue`, `errorType`) and a
 * `CustomFunctions.Error` (`code`).
 */
export function errorName(v: object): string | undefined {
  const o = v as CellObject;
  if (o.type === 'Error') {
    if (isErrorText(o.basicValue)) return o.basicValue;
    return (typeof o.errorType === 'string' && ERROR_TEXT[o.errorType]) || '';
  }
  if (o.type === undefined) {
    if (isErrorText(o.code)) return o.code;
    if (isErrorText(o.error)) return o.error;
  }
  return undefined;
}

/** True for an entity (plain or linked) — the data types whose properties may carry a phasor. */
export function isEntity(v: object): boolean {
  const t = (v as CellObject).type;
  return t === 'Entity' || t === 'LinkedEntity';
}

/** Text shown in a message for user data: one line, at most 30 characters. */
function shortText(s: string): string {
  const t = s.replace(/\s+/g, ' ').trim();
  return t.length > 30 ? `${t.slice(0, 29)}…` : t;
}

/** The name an entity shows in its cell (`text`), if it has one worth quoting. */
function entityName(o: CellObject): string {
  if (typeof o.text === 'string' && o.text.trim() !== '') return ` "${shortText(o.text)}"`;
  if (typeof o.basicValue === 'string' && o.basicValue.trim() !== '' && !o.basicValue.startsWith('#')) return ` "${shortText(o.basicValue)}"`;
  return '';
}

const KINDS: Readonly<Record<string, string>> = {
  WebImage: 'an image',
  LocalImage: 'an image',
  Array: 'an array data type',
  Reference: 'a reference data type',
  Function: 'a function (LAMBDA) value',
  ExternalCodeServiceObject: 'an object from a code service (such as Python in Excel)',
  NotAvailable: 'a data type this version of Excel does not know',
  Double: 'a number data type without a number',
  FormattedNumber: 'a formatted number without a number',
  String: 'a text data type without text',
  Boolean: 'a TRUE/FALSE data type without a value',
};

/**
 * What a cell holding `v` (an object that is neither an error nor a basic value) holds,
 * for a message: `the entity "Feeder 3"`, `an image`, `a data type of kind "X"`.
 */
export function describeObject(v: object): string {
  const o = v as CellObject;
  if (o.type === 'Entity') return `the entity${entityName(o)}`;
  if (o.type === 'LinkedEntity') return `the linked data type${entityName(o)}`;
  if (typeof o.type === 'string') return KINDS[o.type] ?? `a data type of kind "${shortText(o.type)}"`;
  return 'a value that is neither a number nor text';
}

/**
 * Property names that carry a phasor, compared case-insensitively with spaces, `_`, `-`,
 * brackets and `°` removed (so `Angle (deg)` and `angle_deg` both match `angledeg`).
 */
const REAL = ['real', 're', 'realpart'];
const IMAG = ['imag', 'imaginary', 'im', 'imagpart', 'imaginarypart'];
const MAGNITUDE = ['magnitude', 'mag'];
const ANGLE_DEG = ['angle', 'angledeg', 'angledegrees'];
const ANGLE_RAD = ['anglerad', 'angleradians'];

function normalName(key: string): string {
  return key.toLowerCase().replace(/[\s_()[\]°-]+/g, '');
}

/** What an entity's properties say about a phasor. Values are raw (they may be cell values themselves). */
export type PhasorProperties =
  | { readonly kind: 'rect'; readonly re: unknown; readonly im: unknown; readonly names: readonly [string, string] }
  | {
      readonly kind: 'polar';
      readonly magnitude: unknown;
      readonly angle: unknown;
      readonly radians: boolean;
      readonly names: readonly [string, string];
    }
  | { readonly kind: 'half'; readonly has: string; readonly missing: string }
  | { readonly kind: 'none' };

/**
 * Finds a phasor in an entity's properties: real and imaginary parts (`real`/`re`,
 * `imag`/`imaginary`/`im`), or magnitude and angle (`magnitude`/`mag`, `angle` in degrees
 * or `angle_rad` in radians). Rectangular parts win when both forms are complete. One
 * part without its partner is reported as `half`.
 */
export function phasorProperties(v: object): PhasorProperties {
  const props = (v as CellObject).properties;
  if (typeof props !== 'object' || props === null || Array.isArray(props)) return { kind: 'none' };
  const byName = new Map<string, [string, unknown]>();
  for (const [key, value] of Object.entries(props)) {
    const n = normalName(key);
    if (!byName.has(n)) byName.set(n, [key, value]);
  }
  const find = (names: readonly string[]): [string, unknown] | undefined => {
    for (const n of names) {
      const hit = byName.get(n);
      if (hit) return hit;
    }
    return undefined;
  };
  const re = find(REAL);
  const im = find(IMAG);
  if (re && im) return { kind: 'rect', re: re[1], im: im[1], names: [re[0], im[0]] };
  const mag = find(MAGNITUDE);
  const deg = find(ANGLE_DEG);
  const ang = deg ?? find(ANGLE_RAD);
  if (mag && ang) return { kind: 'polar', magnitude: mag[1], angle: ang[1], radians: !deg, names: [mag[0], ang[0]] };
  if (re) return { kind: 'half', has: re[0], missing: 'imag' };
  if (im) return { kind: 'half', has: im[0], missing: 'real' };
  if (mag) return { kind: 'half', has: mag[0], missing: 'angle' };
  if (ang) return { kind: 'half', has: ang[0], missing: 'magnitude' };
  return { kind: 'none' };
}
