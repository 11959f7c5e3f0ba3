/**
 * What a worked-sheet calculation is to the pane: its fields (with the demo scenario of
 * our own), how a field's text is read (the functions' own readers, so the messages are
 * the functions' messages), a whole-case check through the one-call function, and the
 * planner. One module per calculation lists one `Calculation`; `calculations.ts` lists
 * them in the chooser's order.
 */
import { PhzError } from '../../core/errors';
import type { Quantity } from '../../core/parse';
import { readChoice, readNumber, readPhasor } from '../../functions/readers';
import type { SheetPlan } from './plan';

export type FieldKind = 'phasor' | 'number' | 'choice' | 'text';

export interface FieldSpec {
  /** The symbol, also the field's id and the start of its label: `E1`, `ZL2`, `pf3`. */
  readonly id: string;
  /** What it is, after the symbol in the label: `phase 1 source voltage`. */
  readonly label: string;
  readonly unit: string;
  readonly kind: FieldKind;
  /** For phasors: the quantity a unit word must name. */
  readonly expect?: Quantity;
  /** For numbers. */
  readonly min?: number;
  readonly max?: number;
  readonly minExclusive?: boolean;
  /** For choices: the words accepted (first is the default). */
  readonly choices?: readonly string[];
  /** The demo scenario's value, as typed. */
  readonly demo: string;
  /** Shown on the sheet beside the value. */
  readonly hint: string;
  /** The group the pane shows it in (`Supply`, `Loads` …). */
  readonly group: string;
  /** The sheet name of its input cell; default made from the id (`E1` → `E_1`). */
  readonly name?: string;
  /**
   * Reads the field's text when the shared readers by kind do not fit (a schedule's
   * connection, load or power factor): returns what the sheet gets, or throws PhzError with
   * the function's message naming the field. Required for kind `text`.
   */
  readonly read?: (text: string, id: string) => FieldValue;
}

/** A field's value once read: what goes into the sheet's input cell. */
export type FieldValue = string | number;

export type FieldValues = Readonly<Record<string, FieldValue>>;

export interface PlanMeta {
  /** The scenario note, editable on the sheet. */
  readonly scenario: string;
  /** `YYYY-MM-DD`. */
  readonly date: string;
}

export interface Calculation {
  /** Stable id, e.g. `star-neutral`. */
  readonly id: string;
  /** Shown in the chooser. */
  readonly name: string;
  /** One line under the chooser. */
  readonly summary: string;
  /** The scenario note the pane starts with (our own demo). */
  readonly demoScenario: string;
  readonly fields: readonly FieldSpec[];
  /**
   * Checks the whole case the way the sheet's solver check will compute it (e.g. a short
   * circuit); throws PhzError with the function's message.
   */
  crossCheck(values: FieldValues): void;
  /** The planner: inputs → sheet plan. Pure. */
  plan(values: FieldValues, meta: PlanMeta): SheetPlan;
}

/**
 * Reads one field's text with the functions' readers: the message names the field by its
 * symbol, as a function names its argument. Returns the value the sheet gets: phasor text
 * as typed (trimmed), a number, or the chosen word.
 */
export function readField(spec: FieldSpec, text: string): FieldValue {
  const t = text.trim();
  if (spec.read) return spec.read(t, spec.id);
  if (spec.kind === 'text') throw new Error(`field ${spec.id} of kind text has no reader`);
  if (spec.kind === 'phasor') {
    readPhasor([[t === '' ? null : t]], spec.id, spec.expect ? { expect: spec.expect } : {});
    return t;
  }
  if (spec.kind === 'number') {
    return readNumber(t === '' ? null : t, spec.id, { min: spec.min, max: spec.max, minExclusive: spec.minExclusive });
  }
  const choices = spec.choices ?? [];
  if (t === '') throw new PhzError(`${spec.id} is blank: give ${choices.map((c) => `"${c}"`).join(' or ')}`);
  return readChoice(t, spec.id, choices, choices[0]);
}

/** Reads every field; the first problem per field, by id. */
export function readFields(calc: Calculation, texts: Readonly<Record<string, string>>): { values: Record<string, FieldValue>; problems: Record<string, string> } {
  const values: Record<string, FieldValue> = {};
  const problems: Record<string, string> = {};
  for (const f of calc.fields) {
    try {
      values[f.id] = readField(f, texts[f.id] ?? '');
    } catch (e) {
      problems[f.id] = e instanceof Error ? e.message : String(e);
    }
  }
  return { values, problems };
}

/** The demo values of a calculation, read. */
export function demoValues(calc: Calculation): Record<string, FieldValue> {
  const { values, problems } = readFields(calc, Object.fromEntries(calc.fields.map((f) => [f.id, f.demo])));
  const bad = Object.entries(problems);
  if (bad.length > 0) throw new Error(`demo of ${calc.id} does not read: ${bad.map(([k, m]) => `${k}: ${m}`).join('; ')}`);
  return values;
}

/** A field value as a function argument cell (text stays text, numbers stay numbers). */
export function cell(v: FieldValue): unknown[][] {
  return [[v]];
}

/** Three field values as a 3×1 argument. */
export function column3(values: FieldValues, ids: readonly [string, string, string]): unknown[][] {
  return ids.map((id) => [values[id]]);
}

// ------------------------------------------------------------------ shared wording

/** DESIGN §8 cautions every sheet carries. */
export const COMMON_CAUTIONS: readonly string[] = [
  'Results inform design; they do not replace it. They depend on the inputs and the model: fundamental-frequency phasors and linear loads unless harmonics are given.',
  'Conductor sizing, protection and neutral arrangements follow the wiring rules adopted where you work and must be checked by a competent, licensed person.',
  'Work on live systems is for qualified people only.',
];

/** Field factories for the three-phase families. */
export function phaseFields(prefix: string, label: (k: number) => string, unit: string, expect: Quantity, demo: readonly [string, string, string], group: string, hint: string): FieldSpec[] {
  return [1, 2, 3].map((k) => ({ id: `${prefix}${k}`, label: label(k), unit, kind: 'phasor' as const, expect, demo: demo[k - 1], hint, group }));
}
