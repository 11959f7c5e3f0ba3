/**
 * Worked sheet 1: star load with a neutral, solid (ZN = 0) or impedant, loads as
 * impedances, optional line impedances. Millman's theorem written so that a solid neutral
 * needs no special case: VN = ZN·ΣJ / (1 + ZN·ΣY), which is ΣJ / (ΣY + 1/ZN) for ZN ≠ 0 and
 * exactly 0 for ZN = 0.
 */
import { functions } from '../../functions';
import { F, type SheetPlan } from './plan';
import { COMMON_CAUTIONS, column3, type Calculation, type FieldSpec, type FieldValues, type PlanMeta } from './calculation';
import { agreement, branchSteps, currentAndPowerSteps, E_SCALE, K, lineFields, loadFields, openPlan, powerBalanceCheck, sourceFields, sourcePowerStep, starVoltagesAgree } from './star-common';

const FIELDS: readonly FieldSpec[] = [
  ...sourceFields(['231∠0', '228∠-119.5', '232∠120.4']),
  ...loadFields(['11.8+j4.2', '7.6+j5.9', '16.5-j2.8']),
  {
    id: 'ZN',
    label: 'neutral impedance (0 for a solid neutral)',
    unit: 'Ω',
    kind: 'phasor',
    expect: 'impedance',
    demo: '0.22+j0.07',
    hint: 'impedance; 0 = solid neutral',
    group: 'Neutral',
  },
  ...lineFields(['0.14+j0.06', '0.14+j0.06', '0.14+j0.06']),
];

function plan(values: FieldValues, meta: PlanMeta): SheetPlan {
  const b = openPlan(meta, FIELDS, values, {
    calculation: 'star-neutral',
    title: 'Star load with neutral',
    subtitle: 'Unbalanced star load fed from a star source through line impedances, neutral solid or impedant (Millman’s theorem).',
    sheetName: 'Star with neutral',
  });
  branchSteps(b);
  b.step({
    quantity: 'Star-point shift (load star point to source neutral)',
    symbol: 'VN',
    relation: 'VN = ZN·ΣJ / (1 + ZN·ΣY)   (Millman; 0 for a solid neutral)',
    formula: F.div(F.mul('Z_N', 'J_sum'), F.add('1', F.mul('Z_N', 'Y_sum'))),
    unit: 'V',
  });
  currentAndPowerSteps(b, () =>
    b.step({ quantity: 'Neutral current (load star point to source neutral)', symbol: 'IN', relation: 'IN = I1 + I2 + I3', formula: F.add('I_1', 'I_2', 'I_3'), unit: 'A' }),
  );
  b.step({ quantity: 'Loss in the neutral impedance', symbol: 'S neutral', name: 'S_neutral', relation: 'S neutral = |IN|² · ZN', formula: F.loss('I_N', 'Z_N'), unit: 'VA' });
  sourcePowerStep(b);

  b.section('One-call solver on the same inputs');
  const at = b.solverBlock(
    'PHZ.STARLOAD',
    `PHZ.STARLOAD(${b.range('E_1', 'E_3')}, ${b.range('Z_1', 'Z_3')}, Z_N, ${b.range('Z_L1', 'Z_L3')}, FALSE, 15)`,
    ['phase 1', 'phase 2', 'phase 3', 'neutral: IN, VN, total S'],
    ['current', 'load voltage', 'load power'],
  );

  b.section('Checks', 'checks');
  b.check(
    'Kirchhoff’s current law at the load star point',
    'the phase currents leave through the neutral: ZN·(I1 + I2 + I3) = VN',
    `PHZ.MAG(${F.sub(F.mul('Z_N', 'I_N'), 'V_N')})/${E_SCALE}`,
    1e-9,
    'KCL; residual over the largest source voltage',
  );
  powerBalanceCheck(b, [{ name: 'S_neutral', label: 'S neutral' }]);
  b.check(
    'Currents agree with PHZ.STARLOAD',
    'I1, I2, I3, IN of the steps = the solver’s',
    agreement([...K.map((k) => [`I_${k}`, at(k - 1, 0)] as const), ['I_N', at(3, 0)]]),
    1e-9,
    'largest difference over the largest current',
  );
  starVoltagesAgree(b, at);

  b.cautions([
    ...COMMON_CAUTIONS,
    'The neutral current feeds neutral conductor sizing: with non-linear loads add the harmonic currents (the “Neutral with harmonics and sizing” sheet).',
  ]);
  b.chartTitleIs('source voltages and line currents');
  K.forEach((k) => b.chartPhasor(`E${k}`, `E_${k}`, 'V'));
  b.chartPhasor('VN', 'V_N', 'V');
  K.forEach((k) => b.chartPhasor(`I${k}`, `I_${k}`, 'A'));
  b.chartPhasor('IN', 'I_N', 'A');
  return b.build();
}

export const starNeutral: Calculation = {
  id: 'star-neutral',
  name: 'Star load with neutral',
  summary: 'Solid or impedant neutral, loads as impedances, optional line impedances: currents, neutral current, star-point shift, powers.',
  demoScenario: 'Demo: workshop sub-board fed through a short sub-main, neutral 0.22+j0.07 Ω (our own invented numbers).',
  fields: FIELDS,
  crossCheck(values) {
    functions.STARLOAD(column3(values, ['E1', 'E2', 'E3']), column3(values, ['Z1', 'Z2', 'Z3']), [[values.ZN]], column3(values, ['ZL1', 'ZL2', 'ZL3']), null, null);
  },
  plan,
};
