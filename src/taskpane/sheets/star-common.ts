/**
 * Pieces the planners share: every sheet's opening (`openPlan`: head, inputs block, Steps
 * heading), the star inputs (source voltages, load, neutral and line impedances), the
 * phase-by-phase steps up to the branch admittances, and the checks of networks fed through
 * line impedances. Not a planner itself.
 */
import { F, PlanBuilder } from './plan';
import type { PlanHeader } from './plan';
import type { FieldSpec, FieldValues, PlanMeta } from './calculation';
import { phaseFields } from './calculation';

export const K = [1, 2, 3] as const;

export function sourceFields(demo: readonly [string, string, string]): FieldSpec[] {
  return phaseFields('E', (k) => `phase ${k} source voltage (line to neutral)`, 'V', 'voltage', demo, 'Supply', 'phasor, e.g. 230∠-120');
}

export function loadFields(demo: readonly [string, string, string]): FieldSpec[] {
  return phaseFields('Z', (k) => `phase ${k} load impedance`, 'Ω', 'impedance', demo, 'Loads', 'impedance, e.g. 12+j5');
}

export function lineFields(demo: readonly [string, string, string]): FieldSpec[] {
  return phaseFields('ZL', (k) => `line ${k} impedance (0 for none)`, 'Ω', 'impedance', demo, 'Lines', 'impedance; 0 when none');
}

/**
 * A sheet's opening, the same for every calculation: its head (title, what it is, the scenario
 * and date of `meta`), the Inputs block with `fields` in order, and the Steps heading.
 */
export function openPlan(meta: PlanMeta, fields: readonly FieldSpec[], values: FieldValues, head: Omit<PlanHeader, 'scenario' | 'date'>): PlanBuilder {
  const b = new PlanBuilder({ ...head, scenario: meta.scenario, date: meta.date });
  b.section('Inputs', 'inputs');
  phasorInputs(b, fields, values);
  b.section('Steps', 'steps');
  return b;
}

/** The phasor inputs E1–E3, Z1–Z3 (and what `more` adds), in the sheet's inputs block. */
export function phasorInputs(b: PlanBuilder, fields: readonly FieldSpec[], values: FieldValues): void {
  for (const f of fields) {
    b.input({ field: f.id, quantity: f.label, value: values[f.id], unit: f.unit, kind: f.kind === 'phasor' ? 'phasor' : f.kind === 'number' ? 'number' : 'text', hint: f.hint, name: f.name });
  }
}

/**
 * Steps every star sheet starts with, phase by phase: branch impedance Z′k = Zk + ZLk,
 * admittance Yk = 1/Z′k, the current each branch would draw with its star point held at
 * the source neutral Jk = Ek/Z′k; then ΣJ and ΣY.
 */
export function branchSteps(b: PlanBuilder): { zt: string[]; y: string[]; j: string[]; jSum: string; ySum: string } {
  const zt = K.map((k) =>
    b.step({
      quantity: `Phase ${k} branch impedance (load + line)`,
      symbol: `Z′${k}`,
      name: `Zt_${k}`,
      relation: `Z′${k} = Z${k} + ZL${k}`,
      formula: F.add(`Z_${k}`, `Z_L${k}`),
      unit: 'Ω',
    }),
  );
  const y = K.map((k) =>
    b.step({ quantity: `Phase ${k} branch admittance`, symbol: `Y${k}`, relation: `Y${k} = 1 / Z′${k}`, formula: F.inv(`Zt_${k}`), unit: 'S' }),
  );
  const j = K.map((k) =>
    b.step({
      quantity: `Phase ${k} current with the star point held at N`,
      symbol: `J${k}`,
      relation: `J${k} = E${k} / Z′${k}  (= E${k}·Y${k})`,
      formula: F.div(`E_${k}`, `Zt_${k}`),
      unit: 'A',
    }),
  );
  const jSum = b.step({ quantity: 'Sum of the held currents', symbol: 'ΣJ', name: 'J_sum', relation: 'ΣJ = J1 + J2 + J3', formula: F.add('J_1', 'J_2', 'J_3'), unit: 'A' });
  const ySum = b.step({ quantity: 'Sum of the branch admittances', symbol: 'ΣY', name: 'Y_sum', relation: 'ΣY = Y1 + Y2 + Y3', formula: F.add('Y_1', 'Y_2', 'Y_3'), unit: 'S' });
  return { zt, y, j, jSum, ySum };
}

/**
 * Steps after the star-point shift VN: line currents, load voltages and powers, line
 * losses. `afterCurrents` adds steps right after the line currents.
 */
export function currentAndPowerSteps(b: PlanBuilder, afterCurrents?: () => void): void {
  K.forEach((k) =>
    b.step({ quantity: `Phase ${k} line current`, symbol: `I${k}`, relation: `I${k} = (E${k} − VN) / Z′${k}`, formula: F.div(F.sub(`E_${k}`, 'V_N'), `Zt_${k}`), unit: 'A' }),
  );
  afterCurrents?.();
  K.forEach((k) =>
    b.step({ quantity: `Phase ${k} load voltage (terminal to load star point)`, symbol: `U${k}`, relation: `U${k} = I${k} · Z${k}`, formula: F.mul(`I_${k}`, `Z_${k}`), unit: 'V' }),
  );
  K.forEach((k) =>
    b.step({ quantity: `Phase ${k} load complex power`, symbol: `S${k}`, relation: `S${k} = U${k} · I${k}*`, formula: F.power(`U_${k}`, `I_${k}`), unit: 'VA' }),
  );
  b.step({ quantity: 'Total load complex power', symbol: 'S load', name: 'S_load', relation: 'S load = S1 + S2 + S3', formula: F.add('S_1', 'S_2', 'S_3'), unit: 'VA' });
  lineLossStep(b);
}

/** Losses in the line impedances, S lines = Σ |Ik|²·ZLk (line currents I_1–I_3). */
export function lineLossStep(b: PlanBuilder): string {
  return b.step({
    quantity: 'Losses in the line impedances',
    symbol: 'S lines',
    name: 'S_lines',
    relation: 'S lines = Σ |Ik|² · ZLk',
    formula: F.add(...K.map((k) => F.loss(`I_${k}`, `Z_L${k}`))),
    unit: 'VA',
  });
}

/** Source complex power Σ Ek·Ik*. */
export function sourcePowerStep(b: PlanBuilder): string {
  return b.step({
    quantity: 'Complex power delivered by the source',
    symbol: 'S source',
    name: 'S_source',
    relation: 'S source = Σ Ek · Ik*',
    formula: F.add(...K.map((k) => F.power(`E_${k}`, `I_${k}`))),
    unit: 'VA',
  });
}

/** max(|a_k − b_k|) / max(|a_k|) over pairs of (step name, cell): the solver-agreement residual. */
export function agreement(pairs: ReadonlyArray<readonly [string, string]>): string {
  const diffs = pairs.map(([a, c]) => `PHZ.MAG(${F.sub(a, c)})`).join(', ');
  const mags = pairs.map(([a]) => `PHZ.MAG(${a})`).join(', ');
  return `MAX(${diffs})/MAX(${mags})`;
}

/** The largest source voltage magnitude, a scale for voltage residuals. */
export const E_SCALE = 'MAX(PHZ.MAG(E_1), PHZ.MAG(E_2), PHZ.MAG(E_3))';

/**
 * The power-balance check of a network fed through line impedances: what the source delivers
 * is what the load, the lines (and `more`, e.g. the neutral impedance) take (Tellegen).
 */
export function powerBalanceCheck(b: PlanBuilder, more: { name: string; label: string }[] = []): void {
  b.check(
    'Power balance',
    ['S source = S load + S lines', ...more.map((m) => m.label)].join(' + '),
    `PHZ.MAG(${F.sub('S_source', F.add('S_load', 'S_lines', ...more.map((m) => m.name)))})/PHZ.MAG(S_source)`,
    1e-9,
    'conservation of complex power (Tellegen); residual over |S source|',
  );
}

/** The star solvers' voltages check: U1–U3 and VN of the steps against PHZ.STARLOAD's (`at(row, column)` of its block). */
export function starVoltagesAgree(b: PlanBuilder, at: (row: number, col: number) => string): void {
  b.check(
    'Voltages agree with PHZ.STARLOAD',
    'U1, U2, U3, VN of the steps = the solver’s',
    `MAX(${[...K.map((k) => `PHZ.MAG(${F.sub(`U_${k}`, at(k - 1, 1))})`), `PHZ.MAG(${F.sub('V_N', at(3, 1))})`].join(', ')})/${E_SCALE}`,
    1e-9,
    'largest difference over the largest source voltage',
  );
}
