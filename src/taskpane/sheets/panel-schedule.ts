/**
 * Worked sheet 7: a panel schedule, the way an estimator aggregates it by hand, then its
 * feeder.
 *
 * - Each circuit's complex power from its load and power factor (PHZ.LOADPOWER: W is P, VA
 *   is |S|), then the circuits summed per connection: line to neutral on L1, L2, L3, line to
 *   line L1-L2, L2-L3, L3-L1, and three-phase (3P). The pane writes each connection in that
 *   canonical spelling, whatever spelling was typed.
 * - Each group's current from its own voltage: (S/E_k)* to neutral, (S/V_pq)* line to line
 *   (V_pq = E_p − E_q), and for three-phase loads the balanced set I1 = (S/(3·V₁))*, I2 = a²·I1,
 *   I3 = a·I1 with V₁ the positive-sequence supply voltage.
 * - Line currents by Kirchhoff's current law at the board: I1 = I1N + I12 − I31 + I3P and so on;
 *   the neutral current I1N + I2N + I3N.
 * - The NFPA 70 220.61 maximum unbalanced load (the line-to-neutral loads of each phase in VA
 *   over its voltage), the current unbalance, and the neutral's harmonics from the non-linear
 *   shares of the line-to-neutral circuits (each phase's harmonic at h × its voltage angle).
 * - The feeder: each phase's drop L·z·(I_k + I_N) with the neutral of the same conductor.
 */
import { connectionName } from '../../core/threephase';
import { functions } from '../../functions';
import { readConnection, readFraction, readLoad, readPowerFactor } from '../../functions/feeders/_schedule';
import { F, type SheetPlan } from './plan';
import { COMMON_CAUTIONS, column3, phaseFields, type Calculation, type FieldSpec, type FieldValues, type PlanMeta } from './calculation';
import { K, agreement, openPlan } from './star-common';

/** Circuits on the sheet (a spare is a blank load). */
export const CIRCUITS = 12;
const C = Array.from({ length: CIRCUITS }, (_, i) => i + 1);
/** The harmonic orders the sheet takes for the non-linear part. */
export const SCHEDULE_ORDERS = [3, 5, 7, 9] as const;
/** The connection groups: canonical spelling, step symbol and sheet name of its power and current. */
const GROUPS = [
  { word: 'L1', s: 'S_1N', i: 'I_1N', v: 'E_1', what: 'line 1 to neutral' },
  { word: 'L2', s: 'S_2N', i: 'I_2N', v: 'E_2', what: 'line 2 to neutral' },
  { word: 'L3', s: 'S_3N', i: 'I_3N', v: 'E_3', what: 'line 3 to neutral' },
  { word: 'L1-L2', s: 'S_12', i: 'I_12', v: 'V_12', what: 'line 1 to line 2' },
  { word: 'L2-L3', s: 'S_23', i: 'I_23', v: 'V_23', what: 'line 2 to line 3' },
  { word: 'L3-L1', s: 'S_31', i: 'I_31', v: 'V_31', what: 'line 3 to line 1' },
  { word: '3P', s: 'S_3P', i: 'I_3P', v: 'V_pos', what: 'three-phase' },
] as const;

/** Our own scenario: a workshop sub-board of twelve ways (one spare). */
const DEMO: ReadonlyArray<readonly [string, string, string, string]> = [
  ['L1', '1.6 kW', '0.95', '0.9'],
  ['B', '2.4 kVA', '0.9', '80 %'],
  ['3', '1.8 kVA', '0.97 lead', '0.9'],
  ['L1', '3 kW', '1', '0'],
  ['L2', '1.2 kW', '0.95', '0.9'],
  ['C', '2.5 kVA', '0.85', '0.3'],
  ['AB', '6 kVA', '0.75', '0'],
  ['L2-L3', '4.5 kW', '1', '0'],
  ['3P', '7.5 kW', '0.86', '0'],
  ['ABC', '11 kW', '0.88', '0.2'],
  ['A', '2 kVA', '0.9', '0.8'],
  ['L3', '', '', ''],
];
const ORDER_DEMO: Record<number, string> = { 3: '78', 5: '52', 7: '30', 9: '14' };

const readConn = (t: string, id: string): string => (t === '' ? '' : connectionName(readConnection(t, id)));
const readLoadField = (t: string, id: string): string | number => {
  const l = readLoad(t === '' ? null : t, id);
  if (l === null) return '';
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(t) ? Number(t) : t;
};
const readPf = (t: string, id: string): string | number => {
  const pf = readPowerFactor(t === '' ? null : t, id);
  if (pf === null) return '';
  return pf.leading ? t : pf.pf;
};
const readShare = (t: string, id: string): number => readFraction(t === '' ? null : t, id, 'a non-linear share') ?? 0;

const FIELDS: readonly FieldSpec[] = [
  ...phaseFields('E', (k) => `phase ${k} supply voltage (line to neutral)`, 'V', 'voltage', ['230∠0', '230∠-120', '230∠120'], 'Supply', 'phasor, e.g. 230∠-120'),
  ...C.map((c) => ({
    id: `con${c}`,
    label: `circuit ${c} connection`,
    unit: '',
    kind: 'text' as const,
    demo: DEMO[c - 1][0],
    hint: 'L1, L2, L3; L1-L2, L2-L3, L3-L1; 3P',
    group: 'Connections',
    read: readConn,
  })),
  ...C.map((c) => ({
    id: `load${c}`,
    label: `circuit ${c} load (blank for a spare way)`,
    unit: 'W or VA',
    kind: 'text' as const,
    demo: DEMO[c - 1][1],
    hint: 'W, kW, VA or kVA; a number is W',
    group: 'Loads',
    read: readLoadField,
  })),
  ...C.map((c) => ({
    id: `pf${c}`,
    label: `circuit ${c} power factor`,
    unit: '',
    kind: 'text' as const,
    demo: DEMO[c - 1][2],
    hint: 'lagging; 0.9 lead for leading',
    group: 'Power factors',
    read: readPf,
  })),
  ...C.map((c) => ({
    id: `nl${c}`,
    label: `circuit ${c} non-linear share of the load`,
    unit: '',
    kind: 'number' as const,
    demo: DEMO[c - 1][3],
    hint: '0 to 1, or 40 %',
    group: 'Non-linear shares',
    read: readShare,
  })),
  ...SCHEDULE_ORDERS.map((h) => ({
    id: `k${h}`,
    label: `order-${h} harmonic content of the non-linear part`,
    unit: '%',
    kind: 'number' as const,
    min: 0,
    demo: ORDER_DEMO[h],
    hint: `% of its fundamental (order ${h})`,
    group: 'Harmonics of the non-linear part',
  })),
  {
    id: 'Zf',
    label: 'feeder conductor impedance per km (line and neutral alike)',
    unit: 'Ω/km',
    kind: 'phasor' as const,
    expect: 'impedance' as const,
    demo: '0.927+j0.08',
    hint: 'R + jX per km, e.g. 0.927+j0.08',
    group: 'Feeder',
  },
  { id: 'Lf', label: 'feeder route length', unit: 'km', kind: 'number' as const, min: 0, demo: '0.045', hint: 'km, one way', group: 'Feeder' },
];

/** Σ over the circuits on `word` of `term(c)`, as a formula: the circuits of one connection group. */
function onGroup(word: string, term: (c: number) => string): string[] {
  return C.map((c) => `IF(con_${c}="${word}", ${term(c)}, 0)`);
}

function plan(values: FieldValues, meta: PlanMeta): SheetPlan {
  const b = openPlan(meta, FIELDS, values, {
    calculation: 'panel-schedule',
    title: 'Panel schedule',
    subtitle:
      'A board’s circuits aggregated into line currents, the neutral current (fundamental and rms with harmonics), the NFPA 70 220.61 maximum unbalanced load, the current unbalance, and the feeder’s voltage drop with the actual neutral current. Loads at the supply voltage; apply demand factors to the loads first.',
    sheetName: 'Panel schedule',
  });
  C.forEach((c) =>
    b.step({
      quantity: `Circuit ${c} complex power`,
      symbol: `Sc${c}`,
      name: `S_c${c}`,
      relation: `Sc${c} = P + jQ: W is P, VA is |S| (pf${c}, lead → Q < 0); spare → 0`,
      formula: `PHZ.LOADPOWER(load_${c}, pf_${c}, , 15)`,
      unit: 'VA',
    }),
  );
  for (const g of GROUPS) {
    b.step({
      quantity: `Complex power connected ${g.what}`,
      symbol: g.s.replace('_', ''),
      name: g.s,
      relation: `${g.s.replace('_', '')} = Σ Sc over the circuits on ${g.word}`,
      formula: F.add(...onGroup(g.word, (c) => `S_c${c}`)),
      unit: 'VA',
    });
  }
  const lineVolts: Array<[string, string, string]> = [
    ['V_12', 'E_1', 'E_2'],
    ['V_23', 'E_2', 'E_3'],
    ['V_31', 'E_3', 'E_1'],
  ];
  for (const [name, p, q] of lineVolts) {
    b.step({ quantity: `Line voltage ${name.replace('_', '')}`, symbol: name.replace('_', ''), name, relation: `${name.replace('_', '')} = ${p.replace('_', '')} − ${q.replace('_', '')}`, formula: F.sub(p, q), unit: 'V' });
  }
  b.step({
    quantity: 'Positive-sequence supply voltage',
    symbol: 'V₁',
    name: 'V_pos',
    relation: 'V₁ = (E1 + a·E2 + a²·E3) / 3,  a = 1∠120°',
    formula: F.div(F.add('E_1', F.rotate('E_2', 120), F.rotate('E_3', -120)), '3'),
    unit: 'V',
  });
  for (const g of GROUPS) {
    const three = g.word === '3P';
    b.step({
      quantity: three ? 'Three-phase current, line 1 of the balanced set' : `Current connected ${g.what}`,
      symbol: g.i.replace('_', ''),
      name: g.i,
      relation: three ? 'I3P = (S3P / (3·V₁))*' : `${g.i.replace('_', '')} = (${g.s.replace('_', '')} / ${g.v.replace('_', '')})*`,
      formula: `PHZ.LOADCURRENT(${g.v}, ${three ? F.div('S_3P', '3') : g.s}, 15)`,
      unit: 'A',
    });
  }
  const lines: Array<[string, string]> = [
    ['I1 = I1N + I12 − I31 + I3P', F.add('I_1N', 'I_12', F.rotate('I_31', 180), 'I_3P')],
    ['I2 = I2N + I23 − I12 + a²·I3P', F.add('I_2N', 'I_23', F.rotate('I_12', 180), F.rotate('I_3P', -120))],
    ['I3 = I3N + I31 − I23 + a·I3P', F.add('I_3N', 'I_31', F.rotate('I_23', 180), F.rotate('I_3P', 120))],
  ];
  K.forEach((k) => b.step({ quantity: `Line ${k} current (Kirchhoff at the board)`, symbol: `I${k}`, relation: lines[k - 1][0], formula: lines[k - 1][1], unit: 'A' }));
  b.step({ quantity: 'Neutral current, fundamental', symbol: 'IN', relation: 'IN = I1N + I2N + I3N', formula: F.add('I_1N', 'I_2N', 'I_3N'), unit: 'A' });
  K.forEach((k) => b.step({ quantity: `Complex power through line ${k}`, symbol: `SL${k}`, relation: `SL${k} = E${k} · I${k}*`, formula: F.power(`E_${k}`, `I_${k}`), unit: 'VA' }));
  b.step({ quantity: 'Complex power of the circuits', symbol: 'S total', name: 'S_total', relation: 'S total = Σ Sc', formula: F.add(...C.map((c) => `S_c${c}`)), unit: 'VA' });
  b.step({ quantity: 'Complex power through the lines', symbol: 'S lines', name: 'S_lines', relation: 'S lines = SL1 + SL2 + SL3', formula: F.add('S_L1', 'S_L2', 'S_L3'), unit: 'VA' });
  K.forEach((k) =>
    b.step({
      quantity: `Calculated line-to-neutral load of phase ${k}`,
      symbol: `L${k}N`,
      relation: `L${k}N = Σ |Sc| over the circuits on L${k} / |E${k}|  (in VA, as Article 220 adds loads)`,
      formula: `(${onGroup(`L${k}`, (c) => `PHZ.MAG(S_c${c})`).join('+')})/PHZ.MAG(E_${k})`,
      unit: 'A',
      kind: 'number',
    }),
  );
  b.step({ quantity: 'Maximum unbalanced load (NFPA 70 220.61(A))', symbol: 'L max', name: 'L_max', relation: 'L max = max(L1N, L2N, L3N)', formula: 'MAX(L_1N, L_2N, L_3N)', unit: 'A', kind: 'number' });
  b.step({ quantity: 'Mean line current', symbol: 'I mean', name: 'I_mean', relation: 'I mean = (|I1| + |I2| + |I3|) / 3', formula: '(PHZ.MAG(I_1)+PHZ.MAG(I_2)+PHZ.MAG(I_3))/3', unit: 'A', kind: 'number' });
  b.step({
    quantity: 'Current unbalance',
    symbol: 'uI',
    name: 'u_I',
    relation: 'uI = max |Ik| − I mean| / I mean × 100',
    formula: '100*MAX(ABS(PHZ.MAG(I_1)-I_mean), ABS(PHZ.MAG(I_2)-I_mean), ABS(PHZ.MAG(I_3)-I_mean))/I_mean',
    unit: '%',
    kind: 'number',
  });
  K.forEach((k) =>
    b.step({
      quantity: `Non-linear current of phase ${k} (line-to-neutral circuits)`,
      symbol: `Inl${k}`,
      relation: `Inl${k} = Σ share·|Sc| over the circuits on L${k} / |E${k}|`,
      formula: `(${onGroup(`L${k}`, (c) => `nl_${c}*PHZ.MAG(S_c${c})`).join('+')})/PHZ.MAG(E_${k})`,
      unit: 'A',
      kind: 'number',
    }),
  );
  for (const h of SCHEDULE_ORDERS) {
    b.step({
      quantity: `Neutral current of order ${h}`,
      symbol: `IN${h}`,
      name: `I_N${h}`,
      relation: `IN${h} = Σ (k${h}/100)·Inlk ∠ ${h}·φk,  φk = angle of Ek`,
      formula: F.add(...K.map((k) => `PHZ.FROMPOLAR(k_${h}/100*I_nl${k}, MOD(${h}*PHZ.ANGLE(E_${k}), 360), "deg", 15)`)),
      unit: 'A',
    });
  }
  const squares = ['I_N', ...SCHEDULE_ORDERS.map((h) => `I_N${h}`)].map((n) => `PHZ.MAG(${n})^2`).join('+');
  b.step({ quantity: 'rms neutral current', symbol: 'IN rms', name: 'IN_rms', relation: 'IN rms = √(|IN|² + Σh |INh|²)', formula: `SQRT(${squares})`, unit: 'A', kind: 'number' });
  K.forEach((k) => {
    const sum = F.add(`I_${k}`, 'I_N');
    b.step({
      quantity: `Feeder drop seen by phase ${k} (line and neutral)`,
      symbol: `ΔV${k}`,
      name: `dV_${k}`,
      relation: `ΔV${k} = Lf · Zf · (I${k} + IN)`,
      formula: `PHZ.FROMPOLAR(L_f*PHZ.MAG(Z_f)*PHZ.MAG(${sum}), PHZ.ANGLE(Z_f)+PHZ.ANGLE(${sum}), "deg", 15)`,
      unit: 'V',
    });
  });
  K.forEach((k) =>
    b.step({
      quantity: `Voltage drop at the board, phase ${k}`,
      symbol: `Δu${k}`,
      name: `du_${k}`,
      relation: `Δu${k} = (|E${k}| − |E${k} − ΔV${k}|) / |E${k}| × 100`,
      formula: `100*(PHZ.MAG(E_${k})-PHZ.MAG(${F.sub(`E_${k}`, `dV_${k}`)}))/PHZ.MAG(E_${k})`,
      unit: '%',
      kind: 'number',
    }),
  );
  b.step({
    quantity: 'Feeder neutral load (NFPA 70 220.61(B))',
    symbol: 'L neutral',
    name: 'L_neutral',
    relation: 'min(L max, 200) + 0.7 · max(L max − 200, 0)',
    formula: 'MIN(L_max, 200)+0.7*MAX(L_max-200, 0)',
    unit: 'A',
    kind: 'number',
  });
  b.step({ quantity: 'Neutral to size for (the larger)', symbol: 'IN size', name: 'IN_size', relation: 'IN size = max(L neutral, IN rms)', formula: 'MAX(L_neutral, IN_rms)', unit: 'A', kind: 'number' });

  b.section('One-call functions on the same inputs');
  const harmonics = b.table(
    'Harmonic table for PHZ.SCHEDULE',
    SCHEDULE_ORDERS.map((h) => [h, `=k_${h}`]),
    SCHEDULE_ORDERS.map((h) => `order ${h}`),
    ['order', '% of fundamental'],
  );
  const sch = b.solverBlock(
    'PHZ.SCHEDULE',
    `PHZ.SCHEDULE(${b.range('E_1', 'E_3')}, ${b.range('con_1', `con_${CIRCUITS}`)}, ${b.range('load_1', `load_${CIRCUITS}`)}, ${b.range('pf_1', `pf_${CIRCUITS}`)}, ${b.range('nl_1', `nl_${CIRCUITS}`)}, , ${harmonics}, FALSE, 15)`,
    ['line 1', 'line 2', 'line 3', 'neutral: IN, IN rms, L max, uI, |S|'],
    ['current', '|I|', 'P', 'Q', 'S'],
  );
  const drop = b.solverBlock(
    'PHZ.VOLTDROP, four-wire with the neutral current',
    `PHZ.VOLTDROP(${sch(0, 0)}:${sch(2, 0)}, Z_f, L_f, "3P4W", ${b.range('E_1', 'E_3')}, , , FALSE, 15)`,
    ['phase 1', 'phase 2', 'phase 3'],
    ['drop', 'V', '%', 'Annex G V', 'Annex G %'],
  );

  b.section('Checks', 'checks');
  b.check(
    'Kirchhoff’s current law at the board',
    'I1 + I2 + I3 = IN',
    `PHZ.MAG(${F.sub(F.add('I_1', 'I_2', 'I_3'), 'I_N')})/MAX(PHZ.MAG(I_1), PHZ.MAG(I_2), PHZ.MAG(I_3))`,
    1e-9,
    'KCL; residual over the largest line current',
  );
  b.check(
    'Power balance',
    'the lines carry the circuits’ power: S lines = S total (a connection written other than L1 … 3P falls in no group and shows here)',
    `IF(PHZ.MAG(S_total)=0, PHZ.MAG(S_lines), PHZ.MAG(${F.sub('S_lines', 'S_total')})/PHZ.MAG(S_total))`,
    1e-9,
    'S = V·I* for every connection; residual over |S total|',
  );
  b.check(
    'Currents agree with PHZ.SCHEDULE',
    'I1, I2, I3 and IN of the steps = the function’s',
    agreement([...K.map((k) => [`I_${k}`, sch(k - 1, 0)] as const), ['I_N', sch(3, 0)]]),
    1e-9,
    'largest difference over the largest current',
  );
  b.check(
    'Neutral rms, maximum unbalanced load and unbalance agree with PHZ.SCHEDULE',
    'IN rms, L max, uI of the steps = the function’s',
    `MAX(ABS(IN_rms-${sch(3, 1)}), ABS(L_max-${sch(3, 2)}))/MAX(IN_rms, L_max, I_mean)+ABS(u_I-${sch(3, 3)})/100`,
    1e-9,
    'NEUTRALRMS model; NFPA 70 (2023) 220.61(A)',
  );
  b.check(
    'Drops agree with PHZ.VOLTDROP',
    'Δu1, Δu2, Δu3 of the steps = the function’s (in %)',
    `MAX(${K.map((k) => `ABS(du_${k}-${drop(k - 1, 2)})`).join(', ')})`,
    1e-9,
    'IEC 60364-5-52 Annex G beside the exact drop',
    'absolute',
  );

  b.cautions([
    ...COMMON_CAUTIONS,
    'Loads are taken at the supply voltage; demand factors, diversity and the 125 % rule for continuous loads follow the locally adopted rules: apply them to the loads before they go in.',
    'The maximum unbalanced load follows NFPA 70 (2023) 220.61 as read here; check the edition and clauses adopted where the installation is. The harmonic contents are estimates unless measured.',
    'The permitted voltage drop is set by the locally adopted wiring rules; the feeder’s conductor data must be at its operating temperature.',
  ]);
  b.chartTitleIs('supply voltages, line currents and the neutral current');
  K.forEach((k) => b.chartPhasor(`E${k}`, `E_${k}`, 'V'));
  K.forEach((k) => b.chartPhasor(`I${k}`, `I_${k}`, 'A'));
  b.chartPhasor('IN', 'I_N', 'A');
  return b.build();
}

/** The schedule's columns as the function takes them. */
function columns(values: FieldValues): { con: unknown[][]; load: unknown[][]; pf: unknown[][]; nl: unknown[][] } {
  return {
    con: C.map((c) => [values[`con${c}`]]),
    load: C.map((c) => [values[`load${c}`]]),
    pf: C.map((c) => [values[`pf${c}`]]),
    nl: C.map((c) => [values[`nl${c}`]]),
  };
}

export const panelSchedule: Calculation = {
  id: 'panel-schedule',
  name: 'Panel schedule',
  summary: 'Twelve circuits (connection, load in W or VA, power factor, non-linear share): line and neutral currents, 220.61 load, unbalance, feeder drop.',
  demoScenario: 'Demo: workshop sub-board DB-W3 with office, lighting and machine circuits (our own invented numbers).',
  fields: FIELDS,
  crossCheck(values) {
    const c = columns(values);
    const table = functions.SCHEDULE(column3(values, ['E1', 'E2', 'E3']), c.con, c.load, c.pf, c.nl, null, SCHEDULE_ORDERS.map((h) => [h, values[`k${h}`]]), null, 15);
    functions.VOLTDROP(table.slice(0, 3).map((r) => [r[0]]), [[values.Zf]], values.Lf, '3P4W', column3(values, ['E1', 'E2', 'E3']), null, null, null, null);
  },
  plan,
};
