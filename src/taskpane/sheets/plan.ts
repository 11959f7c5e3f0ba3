/**
 * The sheet plan: everything a worked calculation sheet holds, as data a host adapter
 * writes in one go (cells with a constant or a formula and a role, sheet-scoped names,
 * column widths, the phasor chart request). Planners (one per calculation, beside this
 * file) build plans with `PlanBuilder`; the Excel and preview adapters write them. No host
 * code here.
 *
 * Layout of every sheet (columns), so a reader sees the result beside its relation:
 *   steps:  A step number · B quantity · C symbol · D relation in words · E polar, 6 figures ·
 *           F rectangular, 6 figures · G unit · H the value at 15 significant figures (the
 *           named cell holding the live formula, which later steps read) · I the formula of
 *           H as text (FORMULATEXT);
 *   inputs: B quantity · C symbol · D how to give it · E the value (named, styled as input) ·
 *           F read as polar · G unit · H read as rectangular;
 *   checks: B check · D what must hold · E residual · F tolerance · G pass/fail · H unit ·
 *           I source;
 *   one-call functions and tables start in E.
 * The chart place sits to the right (K onwards), beside the inputs.
 */
import type { PhasorChartRequest } from '../port';
import { a1, columnLetters } from '../a1';

/** What a cell is for; adapters style by role. */
export type CellRole =
  | 'title'
  | 'subtitle'
  | 'note'
  | 'scenario'
  | 'heading'
  | 'header'
  | 'label'
  | 'symbol'
  | 'input'
  | 'value'
  | 'result'
  | 'unit'
  | 'formulaText'
  | 'check'
  | 'verdict'
  | 'caution'
  | 'chart';

export interface PlanCell {
  /** 0-based row and column on the new sheet. */
  readonly row: number;
  readonly col: number;
  /** A constant (text or number) or a formula starting with `=`. */
  readonly content: string | number;
  readonly role: CellRole;
}

/** A name scoped to the new sheet, referring to one cell of it. */
export interface PlanName {
  /** Never readable as a cell address (E_1, Z_L1, V_N …). */
  readonly name: string;
  readonly row: number;
  readonly col: number;
  /** What the name stands for (Excel shows it as the name's comment). */
  readonly comment: string;
}

export type ValueKind = 'phasor' | 'number' | 'text';

/** A step as the tests and the status line see it: where its live value is. */
export interface PlanStep {
  readonly number: number;
  readonly quantity: string;
  readonly symbol: string;
  readonly relation: string;
  /** The sheet name of the value cell (column E). */
  readonly name: string;
  readonly row: number;
  readonly kind: ValueKind;
  readonly unit: string;
}

export interface PlanInput {
  /** The pane field's id (also the symbol shown, e.g. `E1`). */
  readonly field: string;
  readonly name: string;
  /** The value cell: row, and column `COL.input`. */
  readonly row: number;
  readonly kind: ValueKind;
}

export interface PlanCheck {
  readonly label: string;
  /** The row of the residual (`COL.residual`), tolerance and verdict cells. */
  readonly row: number;
  readonly tolerance: number;
}

export interface SheetPlan {
  /** The calculation's id, e.g. `star-neutral`. */
  readonly calculation: string;
  readonly title: string;
  /** The sheet name to start from; the writer makes it unique and valid. */
  readonly sheetName: string;
  readonly cells: readonly PlanCell[];
  readonly names: readonly PlanName[];
  /** Column widths in characters, from column A. */
  readonly columnWidths: readonly number[];
  readonly inputs: readonly PlanInput[];
  readonly steps: readonly PlanStep[];
  readonly checks: readonly PlanCheck[];
  /** The chart of the sheet's phasors; `sheet` is filled in by the writer. */
  readonly chart: Omit<PhasorChartRequest, 'sheet'>;
  /** Where the chart goes: top-left and bottom-right cells of a free, labelled area. */
  readonly chartArea: { readonly top: number; readonly left: number; readonly bottom: number; readonly right: number };
  /** Rows × columns the plan covers (from A1). */
  readonly extent: { readonly rows: number; readonly cols: number };
}

/** Column indexes of the layout. */
export const COL = {
  step: 0,
  quantity: 1,
  symbol: 2,
  relation: 3,
  /** Steps. */
  polar: 4,
  rect: 5,
  unit: 6,
  value: 7,
  formula: 8,
  /** Inputs. */
  input: 4,
  inputPolar: 5,
  inputRect: 7,
  /** Checks. */
  residual: 4,
  tolerance: 5,
  verdict: 6,
  checkUnit: 7,
  source: 8,
  /** One-call functions, tables and verdict rows start here. */
  block: 4,
  chart: 10,
} as const;

/** Significant figures of the values later steps read (the `digits` argument). */
export const FULL = 15;

/** 0 → `A`, 25 → `Z`, 26 → `AA`. */
export const columnLetter = columnLetters;

/** `(1, 1)` → `B2`. */
export const cellA1 = a1;

// ------------------------------------------------------------------ sheet names

/** Characters Excel refuses in a sheet name. */
const BAD_SHEET_CHARS = /[:\\/?*[\]]/g;
export const MAX_SHEET_NAME = 31;

/**
 * A sheet name Excel accepts and that no sheet of `existing` has (compared without case,
 * as Excel does): the bad characters : \ / ? * [ ] removed, no leading or trailing
 * apostrophe, at most 31 characters, not `History`; then ` (2)`, ` (3)` … until free.
 */
export function uniqueSheetName(base: string, existing: readonly string[]): string {
  let clean = base.replace(BAD_SHEET_CHARS, ' ').replace(/\s+/g, ' ').trim().replace(/^'+|'+$/g, '').trim();
  if (clean === '' || clean.toLowerCase() === 'history') clean = 'Worked sheet';
  const taken = new Set(existing.map((n) => n.toLowerCase()));
  const fit = (s: string, suffix: string) => `${s.slice(0, MAX_SHEET_NAME - suffix.length).trimEnd()}${suffix}`;
  let name = fit(clean, '');
  for (let i = 2; taken.has(name.toLowerCase()); i++) name = fit(clean, ` (${i})`);
  return name;
}

// ------------------------------------------------------------------ names

/**
 * A sheet-scoped name from a symbol: `E1` → `E_1`, `ZL1` → `Z_L1`, `VN` → `V_N`, `pf1` →
 * `pf_1`: the leading letter(s), an underscore, then the rest, so it can never be read as a cell address (A1 or R1C1).
 */
export function nameOf(symbol: string): string {
  const s = symbol.replace(/[^A-Za-z0-9_]/g, '');
  if (!/^[A-Za-z]/.test(s)) throw new Error(`a name must start with a letter: ${symbol}`);
  const lower = /^([a-z]+)([0-9]+)$/.exec(s);
  if (lower) return `${lower[1]}_${lower[2]}`;
  return s.length === 1 ? `${s}_` : s.includes('_') ? s : `${s[0]}_${s.slice(1)}`;
}

/**
 * True when `name` could be mistaken for a cell address (A1 up to XFD1048576, or R1C1), or
 * begins with one (`I1_rms`): such names are refused by some hosts and read badly anyway.
 */
export function looksLikeAddress(name: string): boolean {
  return /^[A-Za-z]{1,3}[0-9]+/.test(name) || /^[Rr][0-9]*([Cc][0-9]*)?$/.test(name) || /^[Cc][0-9]*$/.test(name);
}

// ------------------------------------------------------------------ formula pieces

/**
 * Formula fragments at full precision. Repeating-argument functions (ADD, MUL) take no
 * `digits`, so sums and products are written the way a hand calculation does them: real
 * and imaginary parts add; magnitudes multiply and angles add. Every fragment returns
 * 15-figure text, so a chain of steps keeps rounding noise near 1e-15.
 */
export const F = {
  sub: (a: string, b: string) => `PHZ.SUB(${a}, ${b}, ${FULL})`,
  div: (a: string, b: string) => `PHZ.DIV(${a}, ${b}, ${FULL})`,
  inv: (a: string) => `PHZ.INV(${a}, ${FULL})`,
  conj: (a: string) => `PHZ.CONJ(${a}, ${FULL})`,
  rotate: (a: string, deg: number) => `PHZ.ROTATE(${a}, ${deg}, ${FULL})`,
  power: (v: string, i: string) => `PHZ.VIPOWER(${v}, ${i}, ${FULL})`,
  /** a + b + …: the real parts add and the imaginary parts add. */
  add: (...terms: string[]) =>
    `PHZ.FROMRECT(${terms.map((t) => `PHZ.REAL(${t})`).join('+')}, ${terms.map((t) => `PHZ.IMAG(${t})`).join('+')}, ${FULL})`,
  /** a·b: the magnitudes multiply and the angles add. */
  mul: (a: string, b: string) => `PHZ.FROMPOLAR(PHZ.MAG(${a})*PHZ.MAG(${b}), PHZ.ANGLE(${a})+PHZ.ANGLE(${b}), "deg", ${FULL})`,
  /** |i|²·z: the power an impedance z takes with current i through it. */
  loss: (i: string, z: string) => `PHZ.FROMPOLAR(PHZ.MAG(${i})^2*PHZ.MAG(${z}), PHZ.ANGLE(${z}), "deg", ${FULL})`,
  /** |a − b| / scale: a residual relative to a scale (0 when both are 0). */
  relDiff: (a: string, b: string, scale: string) => `IF(${scale}=0, PHZ.MAG(${F.sub(a, b)}), PHZ.MAG(${F.sub(a, b)})/(${scale}))`,
  mag: (a: string) => `PHZ.MAG(${a})`,
  /** A number shown to 6 significant figures (0 stays 0). */
  six: (ref: string) => `IF(${ref}=0, 0, ROUND(${ref}, 5-INT(LOG10(ABS(${ref})))))`,
};

// ------------------------------------------------------------------ builder

export interface PlanHeader {
  readonly calculation: string;
  /** Sheet title, e.g. `Star load with neutral`. */
  readonly title: string;
  /** What the calculation is, one line. */
  readonly subtitle: string;
  /** The scenario note (editable on the sheet). */
  readonly scenario: string;
  /** Date written, e.g. `2026-12-02`. */
  readonly date: string;
  readonly sheetName: string;
}

interface InputSpec {
  readonly field: string;
  readonly quantity: string;
  readonly value: string | number;
  readonly unit: string;
  readonly kind: ValueKind;
  /** How to give it, shown in D. */
  readonly hint?: string;
  /** Name on the sheet; defaults to nameOf(field). */
  readonly name?: string;
}

interface StepSpec {
  readonly quantity: string;
  readonly symbol: string;
  readonly relation: string;
  /** The live formula without `=`. */
  readonly formula: string;
  readonly unit: string;
  readonly kind?: ValueKind;
  /** Name on the sheet; defaults to nameOf(symbol). */
  readonly name?: string;
}

interface ChartEntry {
  readonly label: string;
  readonly name: string;
  readonly group: string;
}

const CHART_ROWS = 18;
const CHART_COLS = 7;

/**
 * Builds a plan row by row. Steps are numbered in order; every input and step gets a
 * name scoped to the sheet; formulas refer to names, so they read like the hand
 * calculation and do not depend on where the cells are.
 */
export class PlanBuilder {
  private readonly cells: PlanCell[] = [];
  private readonly names: PlanName[] = [];
  private readonly inputs: PlanInput[] = [];
  private readonly steps: PlanStep[] = [];
  private readonly checks: PlanCheck[] = [];
  private readonly chartEntries: ChartEntry[] = [];
  private readonly byName = new Map<string, { row: number; col: number }>();
  private row = 0;
  private stepNumber = 0;
  private chartTitle = '';
  private readonly chartTop: number;

  constructor(private readonly header: PlanHeader) {
    this.put(0, 0, header.title, 'title');
    this.put(1, 0, header.subtitle, 'subtitle');
    this.put(2, 0, 'Scenario', 'label');
    this.put(2, 1, header.scenario, 'scenario');
    this.put(3, 0, `Written ${header.date} by the Starpoint pane. Amber cells are inputs: change one and every step and check recalculates.`, 'note');
    this.put(
      4,
      0,
      'Steps show their value to 6 figures in polar (E) and rectangular (F) form; H holds it at 15 significant figures, which later steps read, and I shows its formula.',
      'note',
    );
    this.row = 6;
    this.chartTop = this.row;
  }

  private put(row: number, col: number, content: string | number, role: CellRole): void {
    this.cells.push({ row, col, content, role });
  }

  private addName(name: string, row: number, col: number, comment: string): void {
    if (looksLikeAddress(name)) throw new Error(`name ${name} reads as a cell address`);
    const key = name.toLowerCase();
    if (this.byName.has(key)) throw new Error(`name ${name} is used twice`);
    this.byName.set(key, { row, col });
    this.names.push({ name, row, col, comment });
  }

  /** The A1 address of a named cell (for ranges such as E8:E10 in solver calls). */
  at(name: string): string {
    const p = this.byName.get(name.toLowerCase());
    if (!p) throw new Error(`no name ${name} in this plan`);
    return cellA1(p.row, p.col);
  }

  /** `E8:E10` for three names in consecutive rows. */
  range(first: string, last: string): string {
    return `${this.at(first)}:${this.at(last)}`;
  }

  /** A section heading and, for inputs and steps, the column headers. */
  section(title: string, columns: 'inputs' | 'steps' | 'checks' | 'none' = 'none'): void {
    if (this.row > this.chartTop) this.row++;
    this.put(this.row++, 0, title, 'heading');
    const heads: Record<string, readonly string[]> = {
      inputs: ['', 'Input', 'Symbol', 'How to give it', 'Value (edit me)', 'Read as (polar)', 'Unit', 'Read as (rectangular)'],
      steps: ['Step', 'Quantity', 'Symbol', 'Relation', 'Polar', 'Rectangular', 'Unit', 'Value, 15 figures (used by later steps)', 'Formula of the value'],
      checks: ['', 'Check', '', 'What must hold', 'Residual', 'Tolerance', 'Result', 'Unit', 'Source'],
    };
    const h = heads[columns];
    if (h) {
      h.forEach((text, c) => text && this.put(this.row, c, text, 'header'));
      this.row++;
    }
  }

  /** One input row: named value cell in E, its reading in F/G for phasors. */
  input(spec: InputSpec): string {
    const name = spec.name ?? nameOf(spec.field);
    const r = this.row++;
    this.put(r, COL.quantity, spec.quantity, 'label');
    this.put(r, COL.symbol, spec.field, 'symbol');
    if (spec.hint) this.put(r, COL.relation, spec.hint, 'note');
    this.put(r, COL.input, spec.value, 'input');
    if (spec.kind === 'phasor') {
      this.put(r, COL.inputPolar, `=PHZ.TOPOLAR(${name})`, 'result');
      this.put(r, COL.inputRect, `=PHZ.TORECT(${name})`, 'result');
    }
    if (spec.unit) this.put(r, COL.unit, spec.unit, 'unit');
    this.addName(name, r, COL.input, `${spec.field}: ${spec.quantity}${spec.unit ? ` (${spec.unit})` : ''}, input`);
    this.inputs.push({ field: spec.field, name, row: r, kind: spec.kind });
    return name;
  }

  /** One numbered step: the live formula in E (named), 6-figure polar and rectangular beside it. */
  step(spec: StepSpec): string {
    const kind = spec.kind ?? 'phasor';
    const name = spec.name ?? nameOf(spec.symbol);
    const r = this.row++;
    const n = ++this.stepNumber;
    const at = cellA1(r, COL.value);
    this.put(r, COL.step, n, 'label');
    this.put(r, COL.quantity, spec.quantity, 'label');
    this.put(r, COL.symbol, spec.symbol, 'symbol');
    this.put(r, COL.relation, spec.relation, 'label');
    this.put(r, COL.value, `=${spec.formula}`, 'value');
    if (kind === 'phasor') {
      this.put(r, COL.polar, `=PHZ.TOPOLAR(${at})`, 'result');
      this.put(r, COL.rect, `=PHZ.TORECT(${at})`, 'result');
    } else if (kind === 'number') {
      this.put(r, COL.polar, `=${F.six(at)}`, 'result');
    } else {
      this.put(r, COL.polar, `=IF(ISNUMBER(${at}), ${F.six(at)}, ${at})`, 'result');
    }
    if (spec.unit) this.put(r, COL.unit, spec.unit, 'unit');
    this.put(r, COL.formula, `=FORMULATEXT(${at})`, 'formulaText');
    this.addName(name, r, COL.value, `${spec.symbol}: ${spec.quantity}, step ${n}`);
    this.steps.push({ number: n, quantity: spec.quantity, symbol: spec.symbol, relation: spec.relation, name, row: r, kind, unit: spec.unit });
    return name;
  }

  /**
   * A one-call solver block: a label row, then the formula in E (`COL.block`) spilling `rows` × `cols`
   * with `columnLabels` above it and `rowLabels` in B. Returns the A1 address of the
   * result cell at (r, c) of the spill.
   */
  solverBlock(label: string, formula: string, rowLabels: readonly string[], columnLabels: readonly string[]): (r: number, c: number) => string {
    const head = this.row++;
    this.put(head, COL.quantity, label, 'label');
    columnLabels.forEach((t, c) => this.put(head, COL.block + c, t, 'header'));
    const top = this.row;
    this.put(top, COL.block, `=${formula}`, 'value');
    rowLabels.forEach((t, r) => this.put(top + r, COL.quantity, t, 'label'));
    this.row += rowLabels.length;
    if (columnLabels.length > COL.formula - COL.block) {
      // a block wider than E:H would spill over the formula column: its formula text goes below it
      const below = this.row++;
      this.put(below, COL.quantity, 'Formula of the block above', 'label');
      this.put(below, COL.block, `=FORMULATEXT(${cellA1(top, COL.block)})`, 'formulaText');
    } else {
      this.put(top, COL.formula, `=FORMULATEXT(${cellA1(top, COL.block)})`, 'formulaText');
    }
    return (r, c) => cellA1(top + r, COL.block + c);
  }

  /**
   * A small table of constants and formulas from column E (e.g. the argument table of a
   * function), `rowLabels` in B and `columnLabels` above. Returns its A1 range.
   */
  table(label: string, rows: ReadonlyArray<ReadonlyArray<string | number>>, rowLabels: readonly string[], columnLabels: readonly string[]): string {
    const head = this.row++;
    this.put(head, COL.quantity, label, 'label');
    columnLabels.forEach((t, c) => this.put(head, COL.block + c, t, 'header'));
    const top = this.row;
    rows.forEach((cells, r) => {
      if (rowLabels[r]) this.put(top + r, COL.quantity, rowLabels[r], 'label');
      cells.forEach((v, c) => this.put(top + r, COL.block + c, v, 'value'));
    });
    this.row += rows.length;
    const width = Math.max(...rows.map((r) => r.length));
    return `${cellA1(top, COL.block)}:${cellA1(top + rows.length - 1, COL.block + width - 1)}`;
  }

  /** One one-call function giving one value: label in B, the formula in E. Returns E's address. */
  solverValue(label: string, formula: string): string {
    const r = this.row++;
    const at = cellA1(r, COL.block);
    this.put(r, COL.quantity, label, 'label');
    this.put(r, COL.block, `=${formula}`, 'value');
    this.put(r, COL.formula, `=FORMULATEXT(${at})`, 'formulaText');
    return at;
  }

  /** A check: residual formula (a number ≥ 0), its tolerance, pass/fail. */
  check(label: string, relation: string, residual: string, tolerance: number, source: string, unit = 'relative'): void {
    const r = this.row++;
    const res = cellA1(r, COL.residual);
    const tol = cellA1(r, COL.tolerance);
    this.put(r, COL.quantity, label, 'label');
    this.put(r, COL.relation, relation, 'label');
    this.put(r, COL.residual, `=${residual}`, 'check');
    this.put(r, COL.tolerance, tolerance, 'check');
    this.put(r, COL.verdict, `=IF(${res}<=${tol}, "pass", "FAIL")`, 'verdict');
    this.put(r, COL.checkUnit, unit, 'unit');
    this.put(r, COL.source, source, 'note');
    this.checks.push({ label, row: r, tolerance });
  }

  /** A row of text in B (a remark under a block). */
  remark(text: string, role: CellRole = 'note'): void {
    this.put(this.row++, COL.quantity, text, role);
  }

  /** A result row in words: label in B, formula in E (text or number), source in I; no name. */
  verdictRow(label: string, relation: string, formula: string, source: string): void {
    const r = this.row++;
    this.put(r, COL.quantity, label, 'label');
    this.put(r, COL.relation, relation, 'label');
    this.put(r, COL.block, `=${formula}`, 'verdict');
    this.put(r, COL.source, source, 'note');
  }

  /** Cautions (DESIGN §8) as a block of notes. */
  cautions(lines: readonly string[]): void {
    this.section('Cautions');
    for (const l of lines) this.put(this.row++, COL.quantity, l, 'caution');
  }

  /** Adds a phasor of a named cell to the chart (`group` shares one scale: `V`, `A`). */
  chartPhasor(label: string, name: string, group: string): void {
    this.chartEntries.push({ label, name, group });
  }

  chartTitleIs(title: string): void {
    this.chartTitle = title;
  }

  build(): SheetPlan {
    const left = COL.chart;
    const top = this.chartTop;
    const area = { top, left, bottom: top + CHART_ROWS - 1, right: left + CHART_COLS - 1 };
    this.put(top, left, `Phasor chart: ${this.chartTitle}`, 'heading');
    const cols = Math.max(...this.cells.map((c) => c.col)) + 1;
    const rows = Math.max(...this.cells.map((c) => c.row)) + 1;
    // The chart's helper cells go below everything else on the sheet, from column B.
    const helperAt = cellA1(Math.max(rows, top + CHART_ROWS) + 2, 1);
    this.put(
      top + 1,
      left,
      `The phasor chart of the values named below goes here, linked to their cells through helper cells from ${helperAt}. ` +
        'Where the host cannot insert charts this place stays empty: select the cells and use the pane’s Phasor plot.',
      'chart',
    );
    const listed = this.chartEntries.map((e) => `${e.label} (${this.at(e.name)})`).join(', ');
    this.put(top + 2, left, `Phasors: ${listed}.`, 'chart');
    return {
      calculation: this.header.calculation,
      title: this.header.title,
      sheetName: this.header.sheetName,
      cells: this.cells.slice(),
      names: this.names.slice(),
      columnWidths: [9, 36, 8, 34, 20, 22, 7, 36, 60, 2, 14],
      inputs: this.inputs.slice(),
      steps: this.steps.slice(),
      checks: this.checks.slice(),
      chart: {
        title: this.chartTitle,
        phasors: this.chartEntries.map((e) => ({ label: e.label, cell: this.at(e.name), group: e.group })),
        anchor: helperAt,
        chartCell: cellA1(top + 3, left),
      },
      chartArea: area,
      extent: { rows: Math.max(rows, area.bottom + 1), cols: Math.max(cols, area.right + 1) },
    };
  }
}

/** The plan as rows of contents from A1 (empty cells `null`), for adapters that write blocks. */
export function planGrid(plan: SheetPlan): (string | number | null)[][] {
  const grid: (string | number | null)[][] = Array.from({ length: plan.extent.rows }, () => new Array<string | number | null>(plan.extent.cols).fill(null));
  for (const c of plan.cells) grid[c.row][c.col] = c.content;
  return grid;
}
