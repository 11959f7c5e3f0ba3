/**
 * The searchable function reference shown in the pane, built from the registry's specs.
 * Pure data in, data out: no DOM, no host.
 */
import { GROUP_TITLES, type ExampleSpec, type FunctionSpec, type Group, type ParamSpec } from '../functions/spec';

export const NAMESPACE = 'PHZ';

export interface ReferenceParam {
  readonly name: string;
  /** How the argument appears in the call line: `digits`, `[digits]`, `z, …`. */
  readonly label: string;
  readonly description: string;
  readonly optional: boolean;
  readonly repeating: boolean;
}

export interface ReferenceExample {
  readonly formula: string;
  /** The result rows as the cells show them, every cell as text. */
  readonly rows: readonly (readonly string[])[];
}

export interface ReferenceEntry {
  readonly name: string;
  /** `PHZ.NAME(a, [b])`. */
  readonly call: string;
  readonly summary: string;
  readonly details?: string;
  readonly params: readonly ReferenceParam[];
  readonly result: string;
  readonly errors: readonly string[];
  readonly examples: readonly ReferenceExample[];
  readonly cautions: readonly string[];
  /** The formula the pane's Insert button writes: the first example's. */
  readonly starter: string;
}

export interface ReferenceGroup {
  readonly group: Group;
  readonly title: string;
  readonly entries: readonly ReferenceEntry[];
}

function paramLabel(p: ParamSpec): string {
  if (p.type === 'repeat') return `${p.name}, …`;
  return p.optional ? `[${p.name}]` : p.name;
}

/** `PHZ.NAME(a, [b])` from a spec. */
export function callSignature(spec: FunctionSpec): string {
  return `${NAMESPACE}.${spec.name}(${spec.params.map(paramLabel).join(', ')})`;
}

/** A cell value as the grid shows it (booleans in upper case, like the host). */
export function cellText(value: string | number | boolean): string {
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  return String(value);
}

function example(e: ExampleSpec): ReferenceExample {
  return { formula: e.formula, rows: e.result.map((row) => row.map(cellText)) };
}

/** The reference entry for one spec. */
export function toEntry(spec: FunctionSpec): ReferenceEntry {
  const examples = spec.examples.map(example);
  return {
    name: spec.name,
    call: callSignature(spec),
    summary: spec.summary,
    details: spec.details,
    params: spec.params.map((p) => ({
      name: p.name,
      label: paramLabel(p),
      description: p.description,
      optional: p.optional === true,
      repeating: p.type === 'repeat',
    })),
    result: spec.result,
    errors: spec.errors,
    examples,
    cautions: spec.cautions ?? [],
    starter: examples[0]?.formula ?? `=${NAMESPACE}.${spec.name}()`,
  };
}

function haystack(spec: FunctionSpec): string {
  return [
    spec.name,
    `${NAMESPACE}.${spec.name}`,
    spec.summary,
    ...spec.params.flatMap((p) => [p.name, p.description]),
  ]
    .join('\n')
    .toLowerCase();
}

/**
 * True when every word of `query` occurs in the function's name, summary, parameter
 * names or parameter descriptions (case-insensitive). An empty query matches everything.
 */
export function matches(spec: FunctionSpec, query: string): boolean {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return true;
  const text = haystack(spec);
  return words.every((w) => text.includes(w));
}

/**
 * The reference, grouped in GROUP_TITLES order (registry order inside a group), keeping
 * only functions that match `query`; groups left empty are dropped.
 */
export function buildReference(specs: readonly FunctionSpec[], query = ''): ReferenceGroup[] {
  const groups = Object.keys(GROUP_TITLES) as Group[];
  return groups
    .map((group) => ({
      group,
      title: GROUP_TITLES[group],
      entries: specs.filter((s) => s.group === group && matches(s, query)).map(toEntry),
    }))
    .filter((g) => g.entries.length > 0);
}

/** Number of functions in a built reference. */
export function countEntries(groups: readonly ReferenceGroup[]): number {
  return groups.reduce((n, g) => n + g.entries.length, 0);
}
