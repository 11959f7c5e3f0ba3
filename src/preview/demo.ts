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
export const PANEL_SHEET = 'Schedule DB-OW1';
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

/** One way of the panel-schedule demo: columns A–G of its row. */
export interface Way {
  readonly way: string;
  readonly description: string;
  readonly connection: string;
  /** Blank for a spare way. */
  readonly load: string | number | null;
  readonly pf: string | number | null;
  readonly nonlinear: string | number | null;
  readonly demand: string | number | null;
}

/**
 * The panel-schedule scenario: board DB-OW1 of a small office and joinery workshop, fed at
 * 400/230 V. Every number is invented for the demo; connections are written the several ways
 * schedules write them.
 */
export const PANEL_WAYS: readonly Way[] = [
  { way: '1', description: 'Office lighting, ground floor (LED)', connection: 'L1', load: '1.2 kW', pf: 0.95, nonlinear: 0.9, demand: 1 },
  { way: '2', description: 'Office lighting, first floor (LED)', connection: 'L2', load: '1.1 kW', pf: 0.95, nonlinear: 0.9, demand: 1 },
  { way: '3', description: 'Workshop high-bay lighting (LED)', connection: 'L3', load: '2.4 kW', pf: 0.96, nonlinear: 0.9, demand: 1 },
  { way: '4', description: 'Sockets, open-plan office A (PCs)', connection: 'A', load: '2.8 kVA', pf: 0.9, nonlinear: '80 %', demand: '60 %' },
  { way: '5', description: 'Sockets, open-plan office B (PCs)', connection: 'B', load: '2.6 kVA', pf: 0.9, nonlinear: '80 %', demand: '60 %' },
  { way: '6', description: 'Sockets, reception and meeting room', connection: 'C', load: '1.5 kVA', pf: 0.92, nonlinear: '70 %', demand: '60 %' },
  { way: '7', description: 'Server rack UPS', connection: '1', load: '3 kVA', pf: '0.98 lead', nonlinear: 0.3, demand: 1 },
  { way: '8', description: 'Kitchenette water heater', connection: '2', load: '3 kW', pf: 1, nonlinear: 0, demand: 1 },
  { way: '9', description: 'Kitchenette sockets', connection: '3', load: '2 kW', pf: 1, nonlinear: 0, demand: '50 %' },
  { way: '10', description: 'Welding set, 400 V single-phase', connection: 'L1-L2', load: '9 kVA', pf: 0.7, nonlinear: 0, demand: '40 %' },
  { way: '11', description: 'Drying-room heater, 400 V', connection: 'BC', load: '6 kW', pf: 1, nonlinear: 0, demand: 1 },
  { way: '12', description: 'Planer-thicknesser, 400 V two-line', connection: '3-1', load: '3.7 kW', pf: 0.82, nonlinear: 0, demand: 1 },
  { way: '13', description: 'Air compressor', connection: '3P', load: '7.5 kW', pf: 0.85, nonlinear: 0, demand: 1 },
  { way: '14', description: 'Dust extractor', connection: '3P', load: '5.5 kW', pf: 0.84, nonlinear: 0, demand: 1 },
  { way: '15', description: 'Heat-pump condenser (inverter)', connection: 'ABC', load: '11 kW', pf: 0.88, nonlinear: 0.2, demand: 1 },
  { way: '16', description: 'Metal lathe', connection: '123', load: '4 kW', pf: 0.8, nonlinear: 0, demand: '50 %' },
  { way: '17', description: 'Workshop bench sockets 1', connection: 'L1', load: '2.5 kVA', pf: 0.85, nonlinear: 0.3, demand: '50 %' },
  { way: '18', description: 'Workshop bench sockets 2', connection: 'L2', load: '2.5 kVA', pf: 0.85, nonlinear: 0.3, demand: '50 %' },
  { way: '19', description: 'Workshop bench sockets 3', connection: 'L3', load: '2.5 kVA', pf: 0.85, nonlinear: 0.3, demand: '50 %' },
  { way: '20', description: 'Hand dryers', connection: 'L1', load: '1.8 kW', pf: 1, nonlinear: 0, demand: 1 },
  { way: '21', description: 'Van charging point, 230 V', connection: 'L2', load: '7.2 kW', pf: 0.99, nonlinear: 0.1, demand: 1 },
  { way: '22', description: 'Outdoor and yard lighting (LED)', connection: 'L3', load: '0.6 kW', pf: 0.95, nonlinear: 0.9, demand: 1 },
  { way: '23', description: 'Fire alarm panel', connection: 'L1', load: '0.2 kVA', pf: 0.9, nonlinear: 0.5, demand: 1 },
  { way: '24', description: 'Access control and intruder alarm', connection: 'L2', load: '0.15 kVA', pf: 0.9, nonlinear: 0.5, demand: 1 },
  { way: '25', description: 'Network switch cabinet', connection: 'L3', load: '0.8 kVA', pf: '0.97 lead', nonlinear: 0.9, demand: 1 },
  { way: '26', description: 'Spare (three-phase)', connection: '3P', load: null, pf: null, nonlinear: null, demand: null },
  { way: '27', description: 'Spare', connection: 'L1', load: null, pf: null, nonlinear: null, demand: null },
  { way: '28', description: 'Spare (400 V)', connection: 'L1-L2', load: 0, pf: null, nonlinear: null, demand: null },
];

/** Harmonic content of the non-linear part of the loads (percent of its fundamental current): our own estimate for switch-mode supplies and LED drivers. */
export const PANEL_HARMONICS: ReadonlyArray<readonly [number, number]> = [
  [3, 78],
  [5, 52],
  [7, 30],
  [9, 14],
  [11, 8],
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

  loadPanelSheet(engine, available, report);

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
    if (id !== undefined && name !== DEMO_SHEET && name !== PANEL_SHEET && name !== EXAMPLES_SHEET) engine.change((h) => h.removeSheet(id));
  }
  return report;
}

/**
 * The panel-schedule sheet: supply, the schedule of PANEL_WAYS with each way's complex power,
 * the harmonic table, the board totals by PHZ.SCHEDULE, the feeder's voltage drop with the
 * actual neutral current (PHZ.VOLTDROP) and a neutral sizing row. A formula whose functions
 * the registry lacks is left out, with everything that reads it.
 */
function loadPanelSheet(engine: PhzEngine, available: ReadonlySet<string>, report: DemoReport): void {
  engine.change((h) => h.addSheet(PANEL_SHEET));
  const sheet = engine.hf.getSheetId(PANEL_SHEET) ?? 0;
  const put = (row: number, col: number, content: RawCellContent): void => engine.setContents({ sheet, row, col }, [[content]]);
  const style = (row: number, col: number, kind: 'title' | 'note' | 'heading'): void => {
    report.styles.push({ sheet: PANEL_SHEET, row, col, style: kind });
  };
  const heading = (row: number, cells: readonly string[]): void => {
    engine.setContents({ sheet, row, col: 0 }, [cells.map((c) => (c === '' ? null : c))]);
    cells.forEach((_, col) => style(row, col, 'heading'));
  };
  const left: string[] = [];
  /** Writes a formula when the registry has its functions; returns whether it did. */
  const formula = (row: number, col: number, f: string, label: string): boolean => {
    if (!functionsIn(f).every((n) => available.has(n))) {
      left.push(label);
      return false;
    }
    put(row, col, f);
    report.formulas.push({ sheet: PANEL_SHEET, address: a1({ row, col }), formula: f });
    return true;
  };

  put(0, 0, 'Board DB-OW1, office and joinery workshop: panel schedule, neutral and feeder check');
  style(0, 0, 'title');
  put(1, 0, 'Demo scenario with invented numbers. Connections are written the several ways schedules write them (L1, A, 1; L1-L2, BC, 3-1; 3P, ABC, 123); loads in W, kW, VA or kVA; "0.98 lead" marks a leading power factor; a blank load is a spare way.');
  style(1, 0, 'note');
  put(2, 0, 'Results inform design only. Conductor sizing, protection and neutral arrangements follow the locally adopted wiring rules and must be checked by a competent, licensed person; work on live systems is for qualified people only.');
  style(2, 0, 'note');

  heading(4, ['Supply', 'Value', 'Unit', 'Notes']);
  const supplyTop = 5;
  ['230∠0', '230∠-120', '230∠120'].forEach((v, k) => {
    engine.setContents({ sheet, row: supplyTop + k, col: 0 }, [[`Phase voltage E${k + 1}`, v, 'V', k === 0 ? '400/230 V at the main switchboard' : null]]);
  });
  const supply = `B${supplyTop + 1}:B${supplyTop + 3}`;

  const head = 9;
  heading(head, ['Way', 'Description', 'Connection', 'Load', 'Power factor', 'Non-linear share', 'Demand factor', 'S after demand (VA)']);
  const top = head + 1;
  PANEL_WAYS.forEach((w, i) => {
    engine.setContents({ sheet, row: top + i, col: 0 }, [[w.way, w.description, w.connection, w.load, w.pf, w.nonlinear, w.demand]]);
    formula(top + i, 7, `=PHZ.LOADPOWER(D${top + i + 1},E${top + i + 1},G${top + i + 1})`, `S of way ${w.way}`);
  });
  const bottom = top + PANEL_WAYS.length; // 1-based row of the last way
  const col = (c: string): string => `${c}${top + 1}:${c}${bottom}`;

  const hHead = bottom + 1;
  heading(hHead, ['Harmonics of the non-linear part', 'Order', '% of its fundamental', '', '', 'Notes']);
  const ordinal: Record<number, string> = { 3: 'Third', 5: 'Fifth', 7: 'Seventh', 9: 'Ninth', 11: 'Eleventh' };
  PANEL_HARMONICS.forEach(([order, pct], i) => {
    engine.setContents({ sheet, row: hHead + 1 + i, col: 0 }, [[ordinal[order] ?? `Order ${order}`, order, pct, null, null, i === 0 ? 'Switch-mode supplies and LED drivers (our estimate)' : null]]);
  });
  const harmonics = `B${hHead + 2}:C${hHead + 1 + PANEL_HARMONICS.length}`;

  const tHead = hHead + 1 + PANEL_HARMONICS.length + 1;
  heading(tHead, ['Board totals (PHZ.SCHEDULE)', '', '', '', '', '']);
  const tTop = tHead + 1;
  const totals = formula(
    tTop,
    0,
    `=PHZ.SCHEDULE(${supply},${col('C')},${col('D')},${col('E')},${col('F')},${col('G')},${harmonics},TRUE)`,
    'Board totals',
  );
  // with labels: header row, lines 1–3, then the neutral row; values from column B
  const lineCurrents = `B${tTop + 2}:B${tTop + 4}`;
  const neutralRow = tTop + 5; // 1-based

  const fHead = tTop + 6;
  heading(fHead, ['Feeder from the main switchboard', 'Value', 'Unit', 'Notes']);
  engine.setContents({ sheet, row: fHead + 1, col: 0 }, [['Conductor R + jX per km', '0.927+j0.08', 'Ω/km', '4-core 25 mm² copper at 90 °C; the neutral is the same']]);
  engine.setContents({ sheet, row: fHead + 2, col: 0 }, [['Route length', 0.038, 'km', null]]);
  engine.setContents({ sheet, row: fHead + 3, col: 0 }, [['Nominal voltage, line to line', 400, 'V', null]]);
  const z = `B${fHead + 2}`;
  const len = `B${fHead + 3}`;

  const dHead = fHead + 5;
  heading(dHead, ['Feeder voltage drop with the actual neutral current (PHZ.VOLTDROP, 3P4W)', '', '', '', '', '']);
  const dTop = dHead + 1;
  const drop = totals && formula(dTop, 0, `=PHZ.VOLTDROP(${lineCurrents},${z},${len},"3P4W",${supply},,,TRUE)`, 'Feeder voltage drop');

  const nHead = dTop + 5;
  heading(nHead, ['Neutral sizing', 'Value', 'Unit', 'How']);
  if (totals) {
    const demand = formula(nHead + 1, 1, `=PHZ.NEUTRALDEMAND(D${neutralRow})`, 'Feeder neutral load');
    put(nHead + 1, 0, 'Feeder neutral load, NFPA 70 220.61');
    engine.setContents({ sheet, row: nHead + 1, col: 2 }, [['A', 'From the maximum unbalanced load (D of the neutral row)']]);
    engine.setContents({ sheet, row: nHead + 2, col: 0 }, [['rms neutral current with harmonics', `=C${neutralRow}`, 'A', 'Triplens of the line-to-neutral non-linear loads add']]);
    report.formulas.push({ sheet: PANEL_SHEET, address: `B${nHead + 3}`, formula: `=C${neutralRow}` });
    if (demand) {
      engine.setContents({ sheet, row: nHead + 3, col: 0 }, [['Neutral to size for (the larger)', `=MAX(B${nHead + 2},B${nHead + 3})`, 'A', 'Then the locally adopted rules and a competent, licensed person']]);
      report.formulas.push({ sheet: PANEL_SHEET, address: `B${nHead + 4}`, formula: `=MAX(B${nHead + 2},B${nHead + 3})` });
    }
    if (drop) {
      engine.setContents({ sheet, row: nHead + 4, col: 0 }, [['Largest feeder drop', `=MAX(D${dTop + 2}:D${dTop + 4})`, '%', 'Limits: the locally adopted rules']]);
      report.formulas.push({ sheet: PANEL_SHEET, address: `B${nHead + 5}`, formula: `=MAX(D${dTop + 2}:D${dTop + 4})` });
    }
  }
  report.skipped.push(...left);
}
