/**
 * Worked sheet 3: star load from per-phase real power and power factor (what a panel
 * schedule gives), solid neutral, loads taken at their source phase voltage: complex
 * power, line currents, neutral current, the equivalent impedances, totals.
 */
import { functions } from '../../functions';
import { F, type SheetPlan } from './plan';
import { COMMON_CAUTIONS, type Calculation, type FieldSpec, type FieldValues, type PlanMeta } from './calculation';
import { K, agreement, openPlan, sourceFields } from './star-common';

const PF_DEMO = ['0.88', '0.95', '0.82'] as const;
const P_DEMO = ['4600', '2900', '3700'] as const;
const SENSE_DEMO = ['lagging', 'leading', 'lagging'] as const;

const FIELDS: readonly FieldSpec[] = [
  ...sourceFields(['230∠0', '230∠-120', '230∠120']),
  ...K.map((k) => ({
    id: `P${k}`,
    label: `phase ${k} real power`,
    unit: 'W',
    kind: 'number' as const,
    min: 0,
    demo: P_DEMO[k - 1],
    hint: 'number in W, e.g. 4600',
    group: 'Loads',
  })),
  ...K.map((k) => ({
    id: `pf${k}`,
    label: `phase ${k} power factor`,
    unit: '',
    kind: 'number' as const,
    min: 0,
    minExclusive: true,
    max: 1,
    demo: PF_DEMO[k - 1],
    hint: 'above 0, at most 1',
    group: 'Loads',
  })),
  ...K.map((k) => ({
    id: `sense${k}`,
    name: `sense_${k}`,
    label: `phase ${k} power factor: lagging (inductive) or leading (capacitive)`,
    unit: '',
    kind: 'choice' as const,
    choices: ['lagging', 'leading'],
    demo: SENSE_DEMO[k - 1],
    hint: 'lagging or leading',
    group: 'Loads',
  })),
];

function plan(values: FieldValues, meta: PlanMeta): SheetPlan {
  const b = openPlan(meta, FIELDS, values, {
    calculation: 'star-power',
    title: 'Star load from power and power factor',
    subtitle: 'Four-wire star load given per phase as real power and power factor (a panel schedule), taken at the source phase voltages.',
    sheetName: 'Star from P and pf',
  });
  K.forEach((k) =>
    b.step({
      quantity: `Phase ${k} complex power`,
      symbol: `S${k}`,
      relation: `S${k} = P${k} ± j·P${k}·tan(acos pf${k})   (+ lagging, − leading)`,
      formula: `PHZ.COMPLEXPOWER(P_${k}, pf_${k}, sense_${k}="leading", 15)`,
      unit: 'VA',
    }),
  );
  K.forEach((k) =>
    b.step({ quantity: `Phase ${k} line current`, symbol: `I${k}`, relation: `I${k} = (S${k} / E${k})*`, formula: `PHZ.LOADCURRENT(E_${k}, S_${k}, 15)`, unit: 'A' }),
  );
  b.step({ quantity: 'Neutral current (star point to source neutral)', symbol: 'IN', relation: 'IN = I1 + I2 + I3', formula: F.add('I_1', 'I_2', 'I_3'), unit: 'A' });
  K.forEach((k) =>
    b.step({ quantity: `Phase ${k} equivalent load impedance`, symbol: `Z${k}`, relation: `Z${k} = E${k} / I${k}`, formula: F.div(`E_${k}`, `I_${k}`), unit: 'Ω' }),
  );
  b.step({ quantity: 'Total complex power', symbol: 'S total', name: 'S_total', relation: 'S total = S1 + S2 + S3', formula: F.add('S_1', 'S_2', 'S_3'), unit: 'VA' });
  b.step({ quantity: 'Total real power', symbol: 'P total', name: 'P_total', relation: 'P total = Re(S total)', formula: 'PHZ.REAL(S_total)', unit: 'W', kind: 'number' });
  b.step({ quantity: 'Total reactive power', symbol: 'Q total', name: 'Q_total', relation: 'Q total = Im(S total)', formula: 'PHZ.IMAG(S_total)', unit: 'var', kind: 'number' });
  b.step({ quantity: 'Overall power factor', symbol: 'pf total', name: 'pf_total', relation: 'pf total = P total / |S total|', formula: 'PHZ.POWERFACTOR(S_total)', unit: '', kind: 'number' });
  b.step({
    quantity: 'Complex power from the currents',
    symbol: 'S drawn',
    name: 'S_drawn',
    relation: 'S drawn = Σ Ek · Ik*',
    formula: F.add(...K.map((k) => F.power(`E_${k}`, `I_${k}`))),
    unit: 'VA',
  });

  b.section('One-call solver on the same inputs');
  const at = b.solverBlock(
    'PHZ.STARLOAD on the equivalent impedances, solid neutral',
    `PHZ.STARLOAD(${b.range('E_1', 'E_3')}, ${b.range('Z_1', 'Z_3')}, 0, , FALSE, 15)`,
    ['phase 1', 'phase 2', 'phase 3', 'neutral: IN, VN, total S'],
    ['current', 'load voltage', 'load power'],
  );

  b.section('Checks', 'checks');
  b.check(
    'Power balance',
    'the currents draw the scheduled power: Σ Ek·Ik* = Σ Sk',
    `PHZ.MAG(${F.sub('S_drawn', 'S_total')})/PHZ.MAG(S_total)`,
    1e-9,
    'S = V·I* per phase; residual over |S total|',
  );
  b.check(
    'Power factors recovered',
    'P / |S| of each Ek·Ik* = pfk',
    `MAX(${K.map((k) => `ABS(PHZ.POWERFACTOR(PHZ.VIPOWER(E_${k}, I_${k}, 15))-pf_${k})`).join(', ')})`,
    1e-9,
    'definition of power factor; largest difference',
    'absolute',
  );
  b.check(
    'Kirchhoff’s current law and currents agree with PHZ.STARLOAD',
    'I1, I2, I3 and IN = I1 + I2 + I3 of the steps = the solver’s',
    agreement([...K.map((k) => [`I_${k}`, at(k - 1, 0)] as const), ['I_N', at(3, 0)]]),
    1e-9,
    'KCL at the star point; largest difference over the largest current',
  );

  b.cautions([
    ...COMMON_CAUTIONS,
    'Loads are taken at the source voltages (no voltage drop): the currents are those the schedule’s powers draw at these voltages. Non-linear loads add harmonic neutral current (the “Neutral with harmonics and sizing” sheet).',
  ]);
  b.chartTitleIs('phase voltages and line currents');
  K.forEach((k) => b.chartPhasor(`E${k}`, `E_${k}`, 'V'));
  K.forEach((k) => b.chartPhasor(`I${k}`, `I_${k}`, 'A'));
  b.chartPhasor('IN', 'I_N', 'A');
  return b.build();
}

export const starPower: Calculation = {
  id: 'star-power',
  name: 'Star load from power and power factor',
  summary: 'Per-phase real power and power factor (a panel schedule), solid neutral: complex powers, currents, neutral current.',
  demoScenario: 'Demo: small office distribution board from its schedule, one phase with capacitive LED drivers (our own invented numbers).',
  fields: FIELDS,
  crossCheck(values) {
    for (const k of K) {
      const v = [[values[`E${k}`]]];
      functions.LOADCURRENT(v, functions.COMPLEXPOWER([[values[`P${k}`]]], [[values[`pf${k}`]]], values[`sense${k}`] === 'leading', null), null);
    }
  },
  plan,
};
