/**
 * Writes worked-sheet plans into the preview engine and reads their steps and checks back,
 * for the engine tests. Values are read from the cells (15-figure text parsed back by the
 * project parser, numbers as they are), never from the formula text.
 */
import { expect } from 'vitest';
import type { Complex as MComplex } from 'mathjs';
import * as math from 'mathjs';
import { parsePhasor } from '../../../src/core/parse';
import { PhzEngine, isDisplayError, type DisplayValue } from '../../../src/preview/engine';
import { writePlanToWorkbook } from '../../../src/preview/sheets';
import { Workbook } from '../../../src/preview/workbook';
import type { Calculation, FieldValue } from '../../../src/taskpane/sheets/calculation';
import { COL, type SheetPlan } from '../../../src/taskpane/sheets/plan';

export type Expected = MComplex | number | string;

export interface Written {
  readonly wb: Workbook;
  readonly plan: SheetPlan;
  readonly sheet: string;
  display(row: number, col: number): DisplayValue;
  /** The value of a named step or input, read from its cell. */
  value(name: string): MComplex | number | string;
  /** Sets an input by its field id, as a person would type it. */
  setInput(field: string, value: FieldValue): void;
}

export function write(calc: Calculation, values: Record<string, FieldValue>): Written {
  const wb = new Workbook(new PhzEngine({ sheets: { Existing: [['keep me', 42]] } }));
  const plan = calc.plan(values, { scenario: 'Engine test', date: '2026-12-02' });
  const { sheet } = writePlanToWorkbook(wb, plan);
  const id = wb.sheetId(sheet);
  const display = (row: number, col: number) => wb.engine.display({ sheet: id, row, col });
  const rowOf = new Map<string, { row: number; col: number }>();
  for (const n of plan.names) rowOf.set(n.name, { row: n.row, col: n.col });
  return {
    wb,
    plan,
    sheet,
    display,
    value(name) {
      const at = rowOf.get(name);
      if (!at) throw new Error(`no name ${name}`);
      const v = display(at.row, at.col);
      if (isDisplayError(v)) throw new Error(`${name} shows ${v.error}: ${v.message}`);
      if (typeof v === 'number') return v;
      if (typeof v === 'string') {
        try {
          const z = parsePhasor(v);
          return math.complex(z.re, z.im);
        } catch {
          return v;
        }
      }
      throw new Error(`${name} shows ${String(v)}`);
    },
    setInput(field, value) {
      const input = plan.inputs.find((i) => i.field === field);
      if (!input) throw new Error(`no input ${field}`);
      wb.setCell(sheet, input.row, COL.input, value);
    },
  };
}

/**
 * Every step of the plan equals its reference, relative 1e-9; every step must have one. A
 * quantity that cancels to (nearly) 0 is compared against a millionth of the largest
 * quantity of the same unit instead, the size of what produced it (or `floors[unit]`, e.g.
 * for percentages that are all near 0).
 */
export function expectStepsMatch(w: Written, reference: Readonly<Record<string, Expected>>, rel = 1e-9, floors: Readonly<Record<string, number>> = {}): void {
  const unitScale = new Map<string, number>();
  for (const step of w.plan.steps) {
    const want = reference[step.name];
    const m = typeof want === 'number' ? Math.abs(want) : typeof want === 'object' ? (math.abs(want) as unknown as number) : 0;
    unitScale.set(step.unit, Math.max(unitScale.get(step.unit) ?? 0, m));
  }
  for (const step of w.plan.steps) {
    const floor = Math.max(1e-12, 1e-6 * (unitScale.get(step.unit) ?? 0), floors[step.unit] ?? 0);
    const want = reference[step.name];
    expect(want, `the reference has no value for step ${step.number} ${step.name}`).toBeDefined();
    const got = w.value(step.name);
    if (typeof want === 'string') {
      expect(got, step.name).toBe(want);
    } else if (typeof want === 'number') {
      expect(typeof got, `${step.name} is a number`).toBe('number');
      const tol = rel * Math.max(Math.abs(want), floor);
      expect(Math.abs((got as number) - want), `${step.name}: ${String(got)} vs ${want}`).toBeLessThanOrEqual(tol);
    } else {
      const g = typeof got === 'number' ? math.complex(got, 0) : (got as MComplex);
      expect(typeof g, `${step.name} is a phasor`).toBe('object');
      const err = math.abs(math.subtract(g, want) as MComplex) as unknown as number;
      const scale = Math.max(math.abs(want) as unknown as number, floor);
      expect(err / scale, `${step.name}: ${g.toString()} vs ${want.toString()}`).toBeLessThanOrEqual(rel);
    }
  }
}

/** Every check of the plan shows "pass", and its residual is within its tolerance. */
export function expectChecksPass(w: Written): void {
  expect(w.plan.checks.length).toBeGreaterThan(0);
  for (const c of w.plan.checks) {
    const residual = w.display(c.row, COL.residual);
    const verdict = w.display(c.row, COL.verdict);
    expect(typeof residual, `${c.label}: residual ${JSON.stringify(residual)}`).toBe('number');
    expect(residual as number, c.label).toBeLessThanOrEqual(c.tolerance);
    expect(verdict, c.label).toBe('pass');
  }
}

/** The existing sheet is untouched. */
export function expectExistingUntouched(w: Written): void {
  const id = w.wb.sheetId('Existing');
  expect(w.wb.engine.display({ sheet: id, row: 0, col: 0 })).toBe('keep me');
  expect(w.wb.engine.display({ sheet: id, row: 0, col: 1 })).toBe(42);
  expect(w.wb.hf.getSheetDimensions(id)).toEqual({ width: 2, height: 1 });
}

// ------------------------------------------------------------------ mathjs helpers

export const cx = (v: FieldValue): MComplex => {
  const z = parsePhasor(String(v));
  return math.complex(z.re, z.im);
};
export const add = (...zs: MComplex[]): MComplex => zs.reduce((a, b) => math.add(a, b) as MComplex, math.complex(0, 0));
export const sub = (a: MComplex, b: MComplex): MComplex => math.subtract(a, b) as MComplex;
export const mul = (a: MComplex, b: MComplex | number): MComplex => math.multiply(a, b) as MComplex;
export const div = (a: MComplex | number, b: MComplex | number): MComplex => math.divide(a, b) as MComplex;
export const conj = (a: MComplex): MComplex => math.conj(a) as MComplex;
export const abs = (a: MComplex): number => math.abs(a) as unknown as number;
export const arg = (a: MComplex): number => math.arg(a) as unknown as number;
export const polar = (m: number, deg: number): MComplex => math.complex(m * Math.cos((deg * Math.PI) / 180), m * Math.sin((deg * Math.PI) / 180));
export const ZERO = math.complex(0, 0);
