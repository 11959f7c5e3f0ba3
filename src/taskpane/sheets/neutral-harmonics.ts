/**
 * Worked sheet 6: neutral current with harmonics, and neutral sizing.
 *
 * - rms neutral current: the fundamental phasor sum, plus one neutral component per
 *   harmonic order h: Σk (kh/100)·|Ik| ∠ h·φk, where φk is the angle of phase k's supply
 *   voltage (the harmonic currents of non-linear loads follow the voltage that feeds them,
 *   so on a balanced supply the triplens add arithmetically); the rms is the root-sum-square
 *   of the components (Parseval). Harmonic contents are percent of each phase's fundamental,
 *   the same on every phase.
 * - IEC 60364-5-52 Annex E (Table E.52.1): the current to size a four- or five-core cable
 *   for, from the design current IB (here the largest rms line current) and the
 *   third-harmonic content.
 * - NFPA 70 Art. 220.61: feeder neutral load, the linear unbalanced load above 200 A at
 *   70 %, the nonlinear part at 100 %.
 */
import { functions } from '../../functions';
import { F, type SheetPlan } from './plan';
import { COMMON_CAUTIONS, column3, phaseFields, type Calculation, type FieldSpec, type FieldValues, type PlanMeta } from './calculation';
import { K, openPlan } from './star-common';

/** The harmonic orders the sheet takes, with our demo contents (percent of the fundamental). */
export const ORDERS = [3, 5, 7, 9, 11, 13, 15] as const;
const ORDER_DEMO: Record<number, string> = { 3: '31', 5: '17', 7: '8', 9: '5', 11: '3', 13: '2', 15: '1' };
const ORDINAL: Record<number, string> = { 3: 'third', 5: 'fifth', 7: 'seventh', 9: 'ninth', 11: '11th', 13: '13th', 15: '15th' };

const FIELDS: readonly FieldSpec[] = [
  ...phaseFields('I', (k) => `phase ${k} current, fundamental`, 'A', 'current', ['182∠-21', '148∠-143', '167∠95'], 'Phase currents', 'phasor, e.g. 182∠-21'),
  ...phaseFields('E', (k) => `phase ${k} supply voltage (its angle refers the harmonics)`, 'V', 'voltage', ['230∠0', '230∠-120', '230∠120'], 'Supply', 'phasor, e.g. 230∠-120'),
  ...ORDERS.map((h) => ({
    id: `k${h}`,
    label: `${ORDINAL[h]}-harmonic content of each phase current`,
    unit: '%',
    kind: 'number' as const,
    min: 0,
    demo: ORDER_DEMO[h],
    hint: `% of the fundamental (order ${h})`,
    group: 'Harmonics',
  })),
  {
    id: 'Lu',
    label: 'linear part of the maximum unbalanced load on the neutral',
    unit: 'A',
    kind: 'number',
    min: 0,
    demo: '118',
    hint: 'A, from the load calculation',
    group: 'Feeder neutral load (NFPA 70 220.61)',
  },
  {
    id: 'Lnl',
    label: 'nonlinear part, supplied from a 4-wire wye system',
    unit: 'A',
    kind: 'number',
    min: 0,
    demo: '64',
    hint: 'A, from the load calculation',
    group: 'Feeder neutral load (NFPA 70 220.61)',
  },
];

function plan(values: FieldValues, meta: PlanMeta): SheetPlan {
  const b = openPlan(meta, FIELDS, values, {
    calculation: 'neutral-harmonics',
    title: 'Neutral with harmonics and sizing',
    subtitle: 'rms neutral current of three phase currents with harmonics, IEC 60364-5-52 Annex E sizing current, NFPA 70 220.61 feeder neutral load.',
    sheetName: 'Neutral and harmonics',
  });
  b.step({ quantity: 'Neutral current at the fundamental', symbol: 'IN1', name: 'I_N1', relation: 'IN1 = I1 + I2 + I3', formula: F.add('I_1', 'I_2', 'I_3'), unit: 'A' });
  for (const h of ORDERS) {
    b.step({
      quantity: `Neutral current of order ${h}`,
      symbol: `IN${h}`,
      name: `I_N${h}`,
      relation: `IN${h} = Σ (k${h}/100)·|Ik| ∠ ${h}·φk,  φk = angle of Ek`,
      formula: F.add(...K.map((k) => `PHZ.FROMPOLAR(k_${h}/100*PHZ.MAG(I_${k}), MOD(${h}*PHZ.ANGLE(E_${k}), 360), "deg", 15)`)),
      unit: 'A',
    });
  }
  const squares = ['I_N1', ...ORDERS.map((h) => `I_N${h}`)].map((n) => `PHZ.MAG(${n})^2`).join('+');
  b.step({ quantity: 'rms neutral current', symbol: 'IN rms', name: 'IN_rms', relation: 'IN rms = √(|IN1|² + Σh |INh|²)', formula: `SQRT(${squares})`, unit: 'A', kind: 'number' });
  const distortion = `SQRT(1+${ORDERS.map((h) => `(k_${h}/100)^2`).join('+')})`;
  K.forEach((k) =>
    b.step({
      quantity: `Phase ${k} rms line current`,
      symbol: `I${k} rms`,
      name: `Irms_${k}`,
      relation: `I${k} rms = |I${k}| · √(1 + Σh (kh/100)²)`,
      formula: `PHZ.MAG(I_${k})*${distortion}`,
      unit: 'A',
      kind: 'number',
    }),
  );
  b.step({ quantity: 'Design current (largest rms line current)', symbol: 'IB', relation: 'IB = max Ik rms', formula: 'MAX(Irms_1, Irms_2, Irms_3)', unit: 'A', kind: 'number' });
  b.step({ quantity: 'Neutral over the largest line current', symbol: 'IN/IB', name: 'IN_ratio', relation: 'IN rms / IB', formula: 'IN_rms/I_B', unit: '', kind: 'number' });
  b.step({
    quantity: 'Reduction factor, Table E.52.1',
    symbol: 'kE',
    name: 'k_E',
    relation: 'k3 ≤ 15 %: 1.0; ≤ 33 %: 0.86; ≤ 45 %: 0.86; above: 1.0',
    formula: 'IF(k_3<=15, 1, IF(k_3<=33, 0.86, IF(k_3<=45, 0.86, 1)))',
    unit: '',
    kind: 'number',
  });
  b.step({ quantity: 'Size selection based on', symbol: 'basis', name: 'basis_E', relation: 'k3 ≤ 33 %: the line current; above: the neutral current', formula: 'IF(k_3<=33, "phase", "neutral")', unit: '', kind: 'text' });
  b.step({
    quantity: 'Current the basis takes',
    symbol: 'I basis',
    name: 'I_basis',
    relation: 'line: IB;  neutral: 3 · (k3/100) · IB',
    formula: 'IF(k_3<=33, I_B, 3*k_3/100*I_B)',
    unit: 'A',
    kind: 'number',
  });
  b.step({ quantity: 'Current to size the cable for (Annex E)', symbol: 'I size', name: 'I_size', relation: 'I size = I basis / kE', formula: 'I_basis/k_E', unit: 'A', kind: 'number' });
  b.step({
    quantity: 'Feeder neutral load (NFPA 70 220.61)',
    symbol: 'L neutral',
    name: 'L_neutral',
    relation: 'min(Lu, 200) + 0.7 · max(Lu − 200, 0) + Lnl',
    formula: 'MIN(L_u, 200)+0.7*MAX(L_u-200, 0)+L_nl',
    unit: 'A',
    kind: 'number',
  });

  b.section('One-call functions on the same inputs');
  // the percent column refers to the inputs, so the table follows them
  const tableRange = b.table(
    'Harmonic table for PHZ.NEUTRALRMS',
    ORDERS.map((h) => [h, `=k_${h}`]),
    ORDERS.map((h) => `order ${h}`),
    ['order', '% of fundamental'],
  );
  const rms = b.solverValue('PHZ.NEUTRALRMS', `PHZ.NEUTRALRMS(${b.range('I_1', 'I_3')}, ${tableRange}, ${b.range('E_1', 'E_3')})`);
  const size = b.solverBlock('PHZ.SIZINGCURRENT', `PHZ.SIZINGCURRENT(I_B, k_3)`, ['IB, k3'], ['current', 'factor', 'basis']);
  const demand = b.solverValue('PHZ.NEUTRALDEMAND', 'PHZ.NEUTRALDEMAND(L_u, L_nl)');

  b.section('Checks', 'checks');
  b.check('rms neutral current agrees with PHZ.NEUTRALRMS', 'IN rms of the steps = the function’s', `ABS(IN_rms-${rms})/MAX(IN_rms, I_B)`, 1e-9, 'Parseval sum of the components; residual over the larger of IN rms and IB');
  b.check(
    'Sizing agrees with PHZ.SIZINGCURRENT',
    'I size, kE and the basis of the steps = the function’s',
    `ABS(I_size-${size(0, 0)})/I_size+ABS(k_E-${size(0, 1)})+IF(basis_E=${size(0, 2)}, 0, 1)`,
    1e-9,
    'IEC 60364-5-52:2009 Annex E, Table E.52.1',
  );
  b.check('Neutral load agrees with PHZ.NEUTRALDEMAND', 'L neutral of the steps = the function’s', `ABS(L_neutral-${demand})/MAX(L_neutral, 1)`, 1e-9, 'NFPA 70 (2023) 220.61(B)(2) and (C)(2)');

  b.cautions([
    ...COMMON_CAUTIONS,
    'Table E.52.1 of IEC 60364-5-52 is for four- and five-core cables on balanced three-phase circuits, the neutral of the same material and cross-section as the line conductors; with unbalanced loads the neutral carries more and must be assessed on its own.',
    'The harmonic contents are estimates unless measured; check the edition of IEC 60364-5-52 and NFPA 70 adopted where the installation is, and any local amendments.',
  ]);
  b.chartTitleIs('phase currents and the fundamental neutral current');
  K.forEach((k) => b.chartPhasor(`E${k}`, `E_${k}`, 'V'));
  K.forEach((k) => b.chartPhasor(`I${k}`, `I_${k}`, 'A'));
  b.chartPhasor('IN1', 'I_N1', 'A');
  return b.build();
}

export const neutralHarmonics: Calculation = {
  id: 'neutral-harmonics',
  name: 'Neutral with harmonics and sizing',
  summary: 'Phase currents with a harmonic table: rms neutral current, IEC 60364-5-52 Annex E sizing current, NFPA 70 220.61 feeder neutral load.',
  demoScenario: 'Demo: office floor sub-main feeding IT equipment and LED lighting (our own invented numbers).',
  fields: FIELDS,
  crossCheck(values) {
    const harmonics = ORDERS.map((h) => [h, values[`k${h}`]]);
    functions.NEUTRALRMS(column3(values, ['I1', 'I2', 'I3']), harmonics, column3(values, ['E1', 'E2', 'E3']));
    functions.NEUTRALDEMAND([[values.Lu]], [[values.Lnl]]);
  },
  plan,
};
