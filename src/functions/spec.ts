/**
 * Function metadata declared as data beside each implementation. The Excel metadata
 * (functions.json, through a generated declarations file), the preview engine, the
 * pane's reference and the README reference are all generated from these specs.
 */
export type Group = 'values' | 'arithmetic' | 'sets' | 'loads' | 'solvers' | 'neutral' | 'feeders' | 'sequences' | 'unbalance';

export const GROUP_TITLES: Record<Group, string> = {
  values: 'Values and forms',
  arithmetic: 'Arithmetic',
  sets: 'Three-phase sets',
  loads: 'Loads and powers',
  solvers: 'Star and delta solvers',
  neutral: 'Neutral current and sizing',
  feeders: 'Panel schedules and feeders',
  sequences: 'Symmetrical components',
  unbalance: 'Unbalance',
};

/**
 * How the host passes a parameter:
 * - `matrix`: a cell, a range or an array, always as `any[][]` (phasor and list arguments);
 * - `repeat`: a repeating argument (z1, z2, …), arriving as ONE `any[][][]`; must be last;
 * - `scalar`: one value of any type (`number | string | boolean | null`), read and
 *   checked by the shared readers so the message is ours, not the host's.
 * An omitted optional argument arrives as `null` (or `undefined` from some callers).
 */
export type ParamType = 'matrix' | 'repeat' | 'scalar';

export interface ParamSpec {
  /** Identifier shown by the host (snake_case, e.g. `phase_voltages`). */
  readonly name: string;
  readonly type: ParamType;
  /** What to give, with units and the default when optional. */
  readonly description: string;
  readonly optional?: boolean;
}

export interface ExampleSpec {
  /** A self-contained formula (literals and array constants only), e.g. `=PHZ.DIV("230∠-120","10∠30")`. */
  readonly formula: string;
  /** The result exactly as the cells show it (text or number), as rows of cells. */
  readonly result: ReadonlyArray<ReadonlyArray<string | number | boolean>>;
}

export type HostCell = string | number | boolean;
/** What every implementation returns: a 2-D array of cells (1×1 for one value). */
export type HostResult = HostCell[][];

export interface FunctionSpec {
  /** Name without namespace, upper case, e.g. `DIV`. */
  readonly name: string;
  readonly group: Group;
  /** One-line summary. */
  readonly summary: string;
  /** Longer text: conventions, validity limits, the source of the formula. */
  readonly details?: string;
  readonly params: readonly ParamSpec[];
  /** What comes back: form, shape and units. */
  readonly result: string;
  /** When it gives #VALUE! or #N/A. */
  readonly errors: readonly string[];
  /** At least one example; a test evaluates each through the formula engine. */
  readonly examples: readonly ExampleSpec[];
  /**
   * For a function whose repeating argument leaves no room for a digits argument: the name
   * of its twin, which takes the same arguments and gives the result to 15 significant
   * figures (the route for chains whose later steps need the figures).
   */
  readonly fullTwin?: string;
  /** Cautions shown beside the function (sizing and protection results). */
  readonly cautions?: readonly string[];
  /**
   * Takes exactly the arguments the host passes, in `params` order, and returns what
   * the host shows. Throws `PhzError` on bad input; never returns NaN or ∞.
   */
  readonly implementation: (...args: any[]) => HostResult;
}

/** Identity helper that type-checks a spec. */
export function defineFunction(spec: FunctionSpec): FunctionSpec {
  return spec;
}
