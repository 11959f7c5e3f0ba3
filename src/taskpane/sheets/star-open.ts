/**
 * Worked sheet 2: star load without a neutral (three-wire, the load star point floats).
 * Millman's star-point shift VN = ΣJ / ΣY, the load voltages it causes, and a flag on
 * every load voltage more than 10 % above the nominal phase voltage: the over-voltage a
 * broken neutral brings. IEC 60038 (Table 1, 230/400 V systems) gives the supply voltage
 * tolerance as ±10 % of nominal under normal operating conditions (from memory); a load
 * voltage outside it is outside what equipment is built for.
 */
import { functions } from '../../functions';
import { F, type SheetPlan } from './plan';
import { COMMON_CAUTIONS, column3, type Calculation, type FieldSpec, type FieldValues, type PlanMeta } from './calculation';
import { agreement, branchSteps, currentAndPowerSteps, K, lineFields, loadFields, openPlan, powerBalanceCheck, sourceFields, sourcePowerStep, starVoltagesAgree } from './star-common';

/** The over-voltage flag threshold: 10 % above nominal (IEC 60038 supply tolerance, from memory). */
export const OVERVOLTAGE_LIMIT = 1.1;

const FIELDS: readonly FieldSpec[] = [
  ...sourceFields(['230∠0', '230∠-120', '230∠120']),
  ...loadFields(['9.4+j3.1', '31+j12', '24+j2']),
  ...lineFields(['0.09+j0.04', '0.09+j0.04', '0.09+j0.04']),
  {
    id: 'Un',
    label: 'nominal phase voltage (for the 10 % flag)',
    unit: 'V',
    kind: 'number',
    min: 0,
    minExclusive: true,
    demo: '230',
    hint: 'number, e.g. 230',
    group: 'Nominal',
  },
];

function plan(values: FieldValues, meta: PlanMeta): SheetPlan {
  const b = openPlan(meta, FIELDS, values, {
    calculation: 'star-open',
    title: 'Star load without neutral',
    subtitle: 'Three-wire star load: the load star point floats (Millman’s theorem); load voltages against the nominal phase voltage.',
    sheetName: 'Star without neutral',
  });
  branchSteps(b);
  b.step({
    quantity: 'Star-point shift (load star point to source neutral)',
    symbol: 'VN',
    relation: 'VN = ΣJ / ΣY   (Millman, no neutral)',
    formula: F.div('J_sum', 'Y_sum'),
    unit: 'V',
  });
  currentAndPowerSteps(b);
  K.forEach((k) =>
    b.step({
      quantity: `Phase ${k} load voltage over nominal`,
      symbol: `u${k}`,
      name: `pu_${k}`,
      relation: `u${k} = |U${k}| / Un`,
      formula: `PHZ.MAG(U_${k})/U_n`,
      unit: 'per unit',
      kind: 'number',
    }),
  );
  sourcePowerStep(b);

  b.section('Over-voltage flags (more than 10 % above nominal)');
  K.forEach((k) =>
    b.verdictRow(
      `Phase ${k} load voltage`,
      `u${k} > ${OVERVOLTAGE_LIMIT} ?`,
      `IF(pu_${k}>${OVERVOLTAGE_LIMIT}, "OVER-VOLTAGE: "&TEXT((pu_${k}-1)*100, "0.0")&" % above nominal", "within 10 % above nominal")`,
      'IEC 60038: supply tolerance ±10 % of nominal (from memory)',
    ),
  );

  b.section('One-call solver on the same inputs');
  const at = b.solverBlock(
    'PHZ.STARLOAD with neutral "open"',
    `PHZ.STARLOAD(${b.range('E_1', 'E_3')}, ${b.range('Z_1', 'Z_3')}, "open", ${b.range('Z_L1', 'Z_L3')}, FALSE, 15)`,
    ['phase 1', 'phase 2', 'phase 3', 'neutral: IN, VN, total S'],
    ['current', 'load voltage', 'load power'],
  );

  b.section('Checks', 'checks');
  b.check(
    'Kirchhoff’s current law at the load star point',
    'no neutral: I1 + I2 + I3 = 0',
    `PHZ.MAG(${F.add('I_1', 'I_2', 'I_3')})/MAX(PHZ.MAG(I_1), PHZ.MAG(I_2), PHZ.MAG(I_3))`,
    1e-9,
    'KCL; residual over the largest line current',
  );
  powerBalanceCheck(b);
  b.check('Currents agree with PHZ.STARLOAD', 'I1, I2, I3 of the steps = the solver’s', agreement(K.map((k) => [`I_${k}`, at(k - 1, 0)] as const)), 1e-9, 'largest difference over the largest current');
  starVoltagesAgree(b, at);

  b.cautions([
    ...COMMON_CAUTIONS,
    'A lost neutral puts the most lightly loaded phase at the highest voltage: equipment on it can be damaged. Protection against a broken neutral follows the locally adopted wiring rules.',
  ]);
  b.chartTitleIs('source voltages, star-point shift and load voltages');
  K.forEach((k) => b.chartPhasor(`E${k}`, `E_${k}`, 'V'));
  b.chartPhasor('VN', 'V_N', 'V');
  K.forEach((k) => b.chartPhasor(`U${k}`, `U_${k}`, 'V'));
  K.forEach((k) => b.chartPhasor(`I${k}`, `I_${k}`, 'A'));
  return b.build();
}

export const starOpen: Calculation = {
  id: 'star-open',
  name: 'Star load without neutral',
  summary: 'Three-wire star (lost or no neutral): star-point shift, load voltages, and a flag on any more than 10 % above nominal.',
  demoScenario: 'Demo: lighting and socket board after a broken neutral, loads as found (our own invented numbers).',
  fields: FIELDS,
  crossCheck(values) {
    functions.STARLOAD(column3(values, ['E1', 'E2', 'E3']), column3(values, ['Z1', 'Z2', 'Z3']), [['open']], column3(values, ['ZL1', 'ZL2', 'ZL3']), null, null);
  },
  plan,
};
