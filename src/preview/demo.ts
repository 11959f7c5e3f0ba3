/**
 * The demo workbook the preview opens with: a workshop sub-board of our own invention
 * (every number is made up), plus a sheet that runs each registry function's first
 * documented example live.
 *
 * Lines are data. A line whose formula needs a function the registry does not have
 * yet is left out (or its first alternative that the registry can run is used), and
 * so is every line that refers to a line left out; so the demo grows with the
 * registry and never shows an error for a missing function.
 *
 * Placeholders in formulas: `{c}` the phase column (B, C, D) of a per-phase line;
 * `{KEY}` the row number of line KEY; `{KEY+1}` a row below it; `{KEY#}` the range a
 * spilled line fills (e.g. `B40:B42`).
 */
import type { RawCellContent } from 'hyperformula';
import { GROUP_TITLES } from '../functions/spec';
import type { FunctionSpec } from '../functions/spec';
import { a1 } from './address';
import type { PhzEngine } from './engine';

/** A row of the scenario sheet. Columns: A label, B–D phases L1–L3, E unit, F note. */
type Line =
  | { readonly kind: 'title' | 'note' | 'blank'; readonly text?: string }
  | { readonly kind: 'header'; readonly cells: readonly string[] }
  | {
      readonly kind: 'input';
      readonly key: string;
      readonly label: string;
      readonly values: readonly (string | number)[];
      readonly unit?: string;
      readonly note?: string;
    }
  | {
      /** One formula per phase, written into B, C and D. */
      readonly kind: 'phase';
      readonly key?: string;
      readonly label: string;
      /** Alternatives, first runnable wins. */
      readonly formulas: readonly string[];
      readonly unit?: string;
      readonly note?: string;
    }
  | {
      /** One formula in B (one cell, or a block that spills down and right). */
      readonly kind: 'single';
      readonly key?: string;
      readonly label: string;
      readonly formulas: readonly string[];
      readonly unit?: string;
      readonly note?: string;
      /** Put the block under its label from column A (tables that bring their own labels). */
      readonly below?: boolean;
      /** Shows an error on purpose (to show how errors explain themselves). */
      readonly showsError?: boolean;
    };

export const DEMO_SHEET = 'Sub-board';
export const EXAMPLES_SHEET = 'Examples';

const PHASE_COLUMNS = ['B', 'C', 'D'] as const;

/** The scenario. Invented numbers for a small workshop sub-board fed at 400/230 V. */
export const SUB_BOARD: readonly Line[] = [
  { kind: 'title', text: 'Workshop sub-board DB-W2: unbalanced three-phase load check' },
  { kind: 'note', text: 'Demo scenario with invented numbers. Shaded cells are inputs: change one and every result recalculates.' },
  {
    kind: 'note',
    text: 'Results inform design only. Sizing, protection and neutral arrangements follow locally adopted wiring rules and need checking by a competent, licensed person.',
  },
  { kind: 'blank' },
  { kind: 'header', cells: ['Inputs per phase', 'L1', 'L2', 'L3', 'Unit', 'Notes'] },
  { kind: 'input', key: 'V', label: 'Supply phase voltage', values: ['230∠0', '227∠-121.5', '233∠118.8'], unit: 'V', note: 'Star voltages at the board' },
  { kind: 'input', key: 'Z', label: 'Load impedance', values: ['8.2+j3.1', '11.5+j4.4', '15.8-j1.2'], unit: 'Ω', note: 'Motors, lighting, heaters' },
  { kind: 'input', key: 'P', label: 'Load real power', values: [5200, 3400, 2800], unit: 'W', note: 'Second route: P and pf' },
  { kind: 'input', key: 'PF', label: 'Load power factor (lagging)', values: [0.86, 0.93, 0.99], unit: '–' },
  { kind: 'blank' },
  { kind: 'header', cells: ['Inputs for the board', 'Value', '', '', 'Unit', 'Notes'] },
  { kind: 'input', key: 'ZL', label: 'Line impedance (each line)', values: ['0.15+j0.06'], unit: 'Ω', note: 'Sub-main, per conductor' },
  { kind: 'input', key: 'ZN', label: 'Neutral impedance', values: ['0.15+j0.06'], unit: 'Ω' },
  { kind: 'input', key: 'IB', label: 'Design current of the sub-main', values: [40], unit: 'A' },
  { kind: 'input', key: 'NU', label: 'Largest unbalanced neutral load', values: [260], unit: 'A', note: 'For the feeder demand' },
  { kind: 'blank' },
  { kind: 'header', cells: ['Harmonics in the phase currents', 'Order', '% of fundamental', '', '', 'Notes'] },
  { kind: 'input', key: 'HA', label: 'Third', values: [3, 22], note: 'Adds up in the neutral' },
  { kind: 'input', key: 'HB', label: 'Fifth', values: [5, 9] },
  { kind: 'blank' },
  { kind: 'header', cells: ['Per phase', 'L1', 'L2', 'L3', 'Unit', 'How'] },
  {
    kind: 'phase',
    key: 'I',
    label: 'Phase current',
    formulas: ['=PHZ.CURRENT({c}{V},{c}{Z})', '=PHZ.DIV({c}{V},{c}{Z})'],
    unit: 'A',
    note: 'I = V / Z',
  },
  { kind: 'phase', label: 'Phase current, rectangular', formulas: ['=PHZ.TORECT({c}{I})'], unit: 'A' },
  { kind: 'phase', key: 'IM', label: 'Current magnitude', formulas: ['=PHZ.MAG({c}{I})'], unit: 'A' },
  { kind: 'phase', label: 'Current angle', formulas: ['=PHZ.ANGLE({c}{I})'], unit: '°' },
  {
    kind: 'phase',
    key: 'S',
    label: 'Complex power',
    formulas: ['=PHZ.VIPOWER({c}{V},{c}{I})', '=PHZ.MUL({c}{V},PHZ.CONJ({c}{I}))'],
    unit: 'VA',
    note: 'S = V·I*',
  },
  { kind: 'phase', label: 'Real power P', formulas: ['=PHZ.REAL({c}{S})'], unit: 'W' },
  { kind: 'phase', label: 'Reactive power Q', formulas: ['=PHZ.IMAG({c}{S})'], unit: 'var' },
  { kind: 'phase', label: 'Power factor', formulas: ['=PHZ.POWERFACTOR({c}{S})'], unit: '–' },
  { kind: 'phase', key: 'SP', label: 'Power from P and pf', formulas: ['=PHZ.COMPLEXPOWER({c}{P},{c}{PF})'], unit: 'VA', note: 'S = P + jQ' },
  { kind: 'phase', label: 'Current from P and pf', formulas: ['=PHZ.LOADCURRENT({c}{V},{c}{SP})'], unit: 'A', note: 'I = (S / V)*' },
  { kind: 'phase', label: 'Load admittance', formulas: ['=PHZ.INV({c}{Z})'], unit: 'S', note: 'Y = 1 / Z' },
  { kind: 'phase', label: 'Load with a 40 Ω heater across it', formulas: ['=PHZ.PARALLEL({c}{Z},40)'], unit: 'Ω' },
  { kind: 'blank' },
  { kind: 'header', cells: ['Whole board', 'Value', '', '', 'Unit', 'How'] },
  {
    kind: 'single',
    key: 'IN',
    label: 'Neutral current (phasor sum)',
    formulas: ['=PHZ.NEUTRAL(B{I}:D{I})', '=PHZ.ADD(B{I}:D{I})'],
    unit: 'A',
    note: 'IN = I1 + I2 + I3',
  },
  {
    kind: 'single',
    label: 'Neutral current, magnitudes only',
    formulas: ['=PHZ.NEUTRAL120(B{IM},C{IM},D{IM})'],
    unit: 'A',
    note: 'Estimate, 120° apart',
  },
  { kind: 'single', label: 'Line voltage L1–L2', formulas: ['=PHZ.SUB(B{V},C{V})'], unit: 'V', note: 'V12 = V1 − V2' },
  { kind: 'single', label: 'Total complex power', formulas: ['=PHZ.ADD(B{S}:D{S})'], unit: 'VA' },
  { kind: 'single', key: 'VUF', label: 'Supply voltage unbalance', formulas: ['=PHZ.UNBALANCE(B{V}:D{V})'], unit: '%', note: 'Negative / positive sequence' },
  {
    kind: 'single',
    label: 'Line voltage unbalance (LVUR)',
    formulas: ['=PHZ.UNBALANCE(PHZ.MAG(PHZ.LINEVOLTS(B{V}:D{V})),"LVUR")'],
    unit: '%',
    note: 'From line magnitudes',
  },
  { kind: 'single', label: 'Motor derating at that unbalance', formulas: ['=PHZ.MOTORDERATE(B{VUF})'], unit: '–' },
  { kind: 'single', label: 'Neutral demand of the feeder', formulas: ['=PHZ.NEUTRALDEMAND(B{NU})'], unit: 'A' },
  {
    kind: 'single',
    label: 'Neutral current with harmonics',
    formulas: ['=PHZ.NEUTRALRMS(B{I}:D{I},B{HA}:C{HB})'],
    unit: 'A',
    note: 'rms, harmonics above',
  },
  {
    kind: 'single',
    label: 'Current to size the cable for',
    formulas: ['=PHZ.SIZINGCURRENT(B{IB},C{HA})'],
    note: 'A, factor, basis',
  },
  { kind: 'blank' },
  { kind: 'header', cells: ['Three-phase sets (each spills)', 'Result', '', '', '', ''] },
  { kind: 'single', key: 'LV', label: 'Line voltages V12, V23, V31', formulas: ['=PHZ.LINEVOLTS(B{V}:D{V})'], unit: 'V' },
  { kind: 'single', label: 'Back to star voltages', formulas: ['=PHZ.STARVOLTS({LV#})'], unit: 'V' },
  { kind: 'single', key: 'SEQ', label: 'Sequence components 0, 1, 2', formulas: ['=PHZ.SEQCOMP(B{V}:D{V})'], unit: 'V' },
  {
    kind: 'single',
    label: 'Phases rebuilt from them',
    // Rebuilt from full-precision components, so the round trip shows the inputs again.
    formulas: ['=PHZ.FROMSEQCOMP(PHZ.SEQCOMP(B{V}:D{V},15))', '=PHZ.FROMSEQCOMP(B{SEQ},B{SEQ+1},B{SEQ+2})'],
    unit: 'V',
  },
  { kind: 'single', label: 'Balanced 230 V reference set', formulas: ['=PHZ.BALANCED(230)'], unit: 'V' },
  { kind: 'single', key: 'D', label: 'Delta equivalent of the load', formulas: ['=PHZ.STARTODELTA(B{Z}:D{Z})'], unit: 'Ω' },
  { kind: 'single', label: 'And back to star', formulas: ['=PHZ.DELTATOSTAR({D#})'], unit: 'Ω' },
  { kind: 'single', label: 'Currents as real and imaginary parts', formulas: ['=PHZ.SPLIT(B{I}:D{I})'], unit: 'A' },
  { kind: 'single', label: 'Currents as magnitude and angle', formulas: ['=PHZ.SPLIT(B{I}:D{I},"polar")'], unit: 'A, °' },
  { kind: 'blank' },
  { kind: 'header', cells: ['Solved networks (tables spill)', '', '', '', '', ''] },
  {
    kind: 'single',
    label: 'Star load, line and neutral impedance',
    formulas: ['=PHZ.STARLOAD(B{V}:D{V},B{Z}:D{Z},B{ZN},B{ZL},TRUE)', '=PHZ.STARLOAD(B{V}:D{V},B{Z}:D{Z},B{ZN},B{ZL})'],
    below: true,
  },
  {
    kind: 'single',
    label: 'Same load with no neutral',
    formulas: ['=PHZ.STARLOAD(B{V}:D{V},B{Z}:D{Z},"open",B{ZL},TRUE)', '=PHZ.STARLOAD(B{V}:D{V},B{Z}:D{Z},"open",B{ZL})'],
    below: true,
  },
  {
    kind: 'single',
    label: 'Delta load on the line voltages',
    formulas: ['=PHZ.DELTALOAD({LV#},B{Z}:D{Z},B{ZL},TRUE)', '=PHZ.DELTALOAD({LV#},B{Z}:D{Z},B{ZL})'],
    below: true,
  },
  { kind: 'blank' },
  { kind: 'header', cells: ['Errors explain themselves', 'Result', '', '', '', 'How'] },
  {
    kind: 'single',
    label: 'Current into a 0 Ω load',
    formulas: ['=PHZ.CURRENT(B{V},0)', '=PHZ.DIV(B{V},0)'],
    note: 'Select it: the line below the grid says why',
    showsError: true,
  },
];

/** Names of the PHZ functions a formula calls. */
export function functionsIn(formula: string): string[] {
  return [...formula.matchAll(/PHZ\.([A-Z0-9_]+)\s*\(/gi)].map((m) => m[1].toUpperCase());
}

/** What the demo loader did, for tests and the status line. */
export interface DemoReport {
  /** Formulas written, with their cell (`Sub-board!B17`). */
  readonly formulas: { readonly sheet: string; readonly address: string; readonly formula: string }[];
  /** Labels of scenario lines left out because a function is not in the registry yet. */
  readonly skipped: string[];
  /** Cells that show an error on purpose (`Sub-board!B97`). */
  readonly intendedErrors: string[];
  /** Titles, notes and headings, for the grid to style. */
  readonly styles: { readonly sheet: string; readonly row: number; readonly col: number; readonly style: 'title' | 'note' | 'heading' }[];
}

interface Placed {
  readonly row: number;
  /** Spill range of a `single` line, A1. */
  readonly range?: string;
}

function resolve(template: string, placed: ReadonlyMap<string, Placed>, column: string): string | undefined {
  let missing = false;
  const out = template.replace(/\{([A-Za-z0-9]+)(#|[+-]\d+)?\}|\{c\}/g, (whole, key: string | undefined, mod: string | undefined) => {
    if (whole === '{c}') return column;
    const p = key === undefined ? undefined : placed.get(key);
    if (!p) {
      missing = true;
      return whole;
    }
    if (mod === '#') {
      if (!p.range) missing = true;
      return p.range ?? whole;
    }
    return String(p.row + 1 + (mod ? Number(mod) : 0));
  });
  return missing ? undefined : out;
}

function pick(
  formulas: readonly string[],
  available: ReadonlySet<string>,
  placed: ReadonlyMap<string, Placed>,
  column: string,
): string | undefined {
  for (const f of formulas) {
    if (!functionsIn(f).every((n) => available.has(n))) continue;
    const resolved = resolve(f, placed, column);
    if (resolved !== undefined) return resolved;
  }
  return undefined;
}

function text(s: string): string {
  // A leading apostrophe keeps text as text in the engine (e.g. "=PHZ…" shown as a formula's text).
  return `'${s}`;
}

/**
 * Writes the demo sheets into `engine` (which should be empty apart from an unused
 * first sheet, which is removed). Only functions in `specs` are used.
 */
export function loadDemo(engine: PhzEngine, specs: readonly FunctionSpec[]): DemoReport {
  const hf = engine.hf;
  const available = new Set(specs.map((s) => s.name.toUpperCase()));
  const report: DemoReport = { formulas: [], skipped: [], styles: [], intendedErrors: [] };
  const leftovers = hf.getSheetNames();

  // ---- the scenario sheet
  engine.change((h) => h.addSheet(DEMO_SHEET));
  const sheet = hf.getSheetId(DEMO_SHEET) ?? 0;
  const put = (row: number, col: number, content: RawCellContent) => engine.setContents({ sheet, row, col }, [[content]]);
  const placed = new Map<string, Placed>();
  let row = 0;
  for (const line of SUB_BOARD) {
    switch (line.kind) {
      case 'title':
      case 'note':
        put(row, 0, line.text ?? '');
        report.styles.push({ sheet: DEMO_SHEET, row, col: 0, style: line.kind });
        row++;
        break;
      case 'blank':
        row++;
        break;
      case 'header':
        engine.setContents({ sheet, row, col: 0 }, [line.cells.map((c) => (c === '' ? null : c))]);
        line.cells.forEach((_, col) => report.styles.push({ sheet: DEMO_SHEET, row, col, style: 'heading' }));
        row++;
        break;
      case 'input':
        engine.setContents({ sheet, row, col: 0 }, [[line.label, ...line.values, ...Array(3 - line.values.length).fill(null), line.unit ?? null, line.note ?? null]]);
        placed.set(line.key, { row });
        row++;
        break;
      case 'phase': {
        const cells = PHASE_COLUMNS.map((c) => pick(line.formulas, available, placed, c));
        if (cells.some((c) => c === undefined)) {
          report.skipped.push(line.label);
          break;
        }
        engine.setContents({ sheet, row, col: 0 }, [[line.label, ...(cells as string[]), line.unit ?? null, line.note ?? null]]);
        cells.forEach((f, i) => report.formulas.push({ sheet: DEMO_SHEET, address: `${PHASE_COLUMNS[i]}${row + 1}`, formula: f as string }));
        if (line.key) placed.set(line.key, { row });
        row++;
        break;
      }
      case 'single': {
        const formula = pick(line.formulas, available, placed, 'B');
        if (formula === undefined) {
          report.skipped.push(line.label);
          break;
        }
        put(row, 0, line.label);
        const top = line.below ? row + 1 : row;
        const left = line.below ? 0 : 1;
        const at = { sheet, row: top, col: left };
        engine.setContents(at, [[formula]]);
        report.formulas.push({ sheet: DEMO_SHEET, address: a1({ row: top, col: left }), formula });
        if (line.showsError) report.intendedErrors.push(`${DEMO_SHEET}!${a1({ row: top, col: left })}`);
        const size = engine.spillSize(at);
        // Unit and note go beside a result that stays within the phase columns.
        if (!line.below && size.width <= 3) engine.setContents({ sheet, row, col: 4 }, [[line.unit ?? null, line.note ?? null]]);
        const range = `${a1({ row: top, col: left })}:${a1({ row: top + size.height - 1, col: left + size.width - 1 })}`;
        if (line.key) placed.set(line.key, { row: top, range });
        row = top + size.height;
        break;
      }
    }
  }

  // ---- every registry function's first example, live
  engine.change((h) => h.addSheet(EXAMPLES_SHEET));
  const ex = hf.getSheetId(EXAMPLES_SHEET) ?? 1;
  const putEx = (r: number, c: number, content: RawCellContent) => engine.setContents({ sheet: ex, row: r, col: c }, [[content]]);
  putEx(0, 0, 'Each function’s documented example, calculated live by the engine');
  putEx(1, 0, 'Column C shows the formula as text; column D holds the same formula, so a spilled result fills the cells below or to its right.');
  engine.setContents({ sheet: ex, row: 3, col: 0 }, [['Function', 'Group', 'Formula', 'Result']]);
  report.styles.push({ sheet: EXAMPLES_SHEET, row: 0, col: 0, style: 'title' }, { sheet: EXAMPLES_SHEET, row: 1, col: 0, style: 'note' });
  for (let col = 0; col < 4; col++) report.styles.push({ sheet: EXAMPLES_SHEET, row: 3, col, style: 'heading' });
  let r = 4;
  for (const spec of specs) {
    const example = spec.examples[0];
    if (!example) continue;
    engine.setContents({ sheet: ex, row: r, col: 0 }, [[`PHZ.${spec.name}`, GROUP_TITLES[spec.group] ?? spec.group, text(example.formula)]]);
    putEx(r, 3, example.formula);
    report.formulas.push({ sheet: EXAMPLES_SHEET, address: `D${r + 1}`, formula: example.formula });
    r += engine.spillSize({ sheet: ex, row: r, col: 3 }).height;
  }

  for (const name of leftovers) {
    const id = hf.getSheetId(name);
    if (id !== undefined && name !== DEMO_SHEET && name !== EXAMPLES_SHEET) engine.change((h) => h.removeSheet(id));
  }
  return report;
}
