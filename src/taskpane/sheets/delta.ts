/**
 * Worked sheet 4: delta load from its line-to-line voltages, with optional line
 * impedances, solved the way a hand calculation does it:
 *   1. the supply as the star set with the same line voltages and no zero sequence,
 *      Ek = (Vk(k+1) − V(k−1)k)/3 (a three-wire load draws no zero-sequence current; a small
 *      closure residual of typed or metered values drops out here, as in PHZ.DELTALOAD);
 *   2. the delta as its star equivalent (Kennelly): Z1 = Z12·Z31/ΣZΔ …;
 *   3. the star equivalent plus the lines, star point floating (Millman) → line currents;
 *   4. the load corners' potentials Uk = Ek − Ik·ZLk, the branch voltages and currents.
 * Kirchhoff's current law at each corner (Ik = Ik(k+1) − I(k−1)k) then checks step 4
 * against step 3. With no line impedances the branch voltages are the line voltages.
 */
import { functions } from '../../functions';
import { F, type SheetPlan } from './plan';
import { COMMON_CAUTIONS, column3, type Calculation, type FieldSpec, type FieldValues, type PlanMeta } from './calculation';
import { agreement, K, lineFields, lineLossStep, openPlan, powerBalanceCheck } from './star-common';
import { LINE_CLOSE_REL } from '../../core/threephase/sets';

/** |V12 + V23 + V31| over the mean line-voltage magnitude. */
export const CLOSURE_RESIDUAL = `PHZ.MAG(${F.add('V_12', 'V_23', 'V_31')})/((PHZ.MAG(V_12)+PHZ.MAG(V_23)+PHZ.MAG(V_31))/3)`;

const BR = ['12', '23', '31'] as const;
/** Branch b joins corners (k, l): 12 → 1, 2; 23 → 2, 3; 31 → 3, 1. */
const ENDS = [
  [1, 2],
  [2, 3],
  [3, 1],
] as const;

const FIELDS: readonly FieldSpec[] = [
  ...BR.map((br, i) => ({
    id: `V${br}`,
    label: `line voltage ${br[0]} to ${br[1]}`,
    unit: 'V',
    kind: 'phasor' as const,
    expect: 'voltage' as const,
    // a measured set that closes to 6 figures: V31 = −(V12 + V23)
    demo: ['400∠30', '396∠-91', '391.985∠150.009'][i],
    hint: 'phasor, e.g. 400∠30',
    group: 'Supply',
  })),
  ...BR.map((br, i) => ({
    id: `Z${br}`,
    label: `branch ${br[0]}–${br[1]} impedance`,
    unit: 'Ω',
    kind: 'phasor' as const,
    expect: 'impedance' as const,
    demo: ['38+j14', '52+j9', '29-j6'][i],
    hint: 'impedance, e.g. 38+j14',
    group: 'Delta load',
  })),
  ...lineFields(['0.3+j0.12', '0.3+j0.12', '0.3+j0.12']),
];

function plan(values: FieldValues, meta: PlanMeta): SheetPlan {
  const b = openPlan(meta, FIELDS, values, {
    calculation: 'delta',
    title: 'Delta load',
    subtitle: 'Unbalanced delta load fed by its line-to-line voltages through line impedances: branch and line currents (star equivalent, Millman).',
    sheetName: 'Delta load',
  });
  K.forEach((k, i) => {
    const [a, c] = [BR[i], BR[(i + 2) % 3]];
    b.step({
      quantity: `Phase ${k} voltage of the equivalent star supply`,
      symbol: `E${k}`,
      relation: `E${k} = (V${a} − V${c}) / 3`,
      formula: F.div(F.sub(`V_${a}`, `V_${c}`), '3'),
      unit: 'V',
    });
  });
  b.step({ quantity: 'Sum of the branch impedances', symbol: 'ΣZΔ', name: 'Z_sum', relation: 'ΣZΔ = Z12 + Z23 + Z31', formula: F.add('Z_12', 'Z_23', 'Z_31'), unit: 'Ω' });
  // Kennelly: the star arm at corner k is the product of the two branches meeting there over ΣZΔ.
  const meet = [
    ['12', '31'],
    ['23', '12'],
    ['31', '23'],
  ] as const;
  K.forEach((k, i) =>
    b.step({
      quantity: `Star-equivalent arm at corner ${k}`,
      symbol: `ZY${k}`,
      name: `Z_Y${k}`,
      relation: `ZY${k} = Z${meet[i][0]} · Z${meet[i][1]} / ΣZΔ`,
      formula: F.div(F.mul(`Z_${meet[i][0]}`, `Z_${meet[i][1]}`), 'Z_sum'),
      unit: 'Ω',
    }),
  );
  K.forEach((k) =>
    b.step({ quantity: `Phase ${k} branch impedance (arm + line)`, symbol: `Z′${k}`, name: `Zt_${k}`, relation: `Z′${k} = ZY${k} + ZL${k}`, formula: F.add(`Z_Y${k}`, `Z_L${k}`), unit: 'Ω' }),
  );
  K.forEach((k) => b.step({ quantity: `Phase ${k} branch admittance`, symbol: `Y${k}`, relation: `Y${k} = 1 / Z′${k}`, formula: F.inv(`Zt_${k}`), unit: 'S' }));
  K.forEach((k) =>
    b.step({ quantity: `Phase ${k} current with the star point held at N`, symbol: `J${k}`, relation: `J${k} = E${k} / Z′${k}`, formula: F.div(`E_${k}`, `Zt_${k}`), unit: 'A' }),
  );
  b.step({ quantity: 'Sum of the held currents', symbol: 'ΣJ', name: 'J_sum', relation: 'ΣJ = J1 + J2 + J3', formula: F.add('J_1', 'J_2', 'J_3'), unit: 'A' });
  b.step({ quantity: 'Sum of the admittances', symbol: 'ΣY', name: 'Y_sum', relation: 'ΣY = Y1 + Y2 + Y3', formula: F.add('Y_1', 'Y_2', 'Y_3'), unit: 'S' });
  b.step({ quantity: 'Star point of the equivalent star', symbol: 'VN', relation: 'VN = ΣJ / ΣY   (Millman, three-wire)', formula: F.div('J_sum', 'Y_sum'), unit: 'V' });
  K.forEach((k) =>
    b.step({ quantity: `Line ${k} current`, symbol: `I${k}`, relation: `I${k} = (E${k} − VN) / Z′${k}`, formula: F.div(F.sub(`E_${k}`, 'V_N'), `Zt_${k}`), unit: 'A' }),
  );
  K.forEach((k) =>
    b.step({ quantity: `Potential of load corner ${k}`, symbol: `U${k}`, relation: `U${k} = E${k} − I${k} · ZL${k}`, formula: F.sub(`E_${k}`, F.mul(`I_${k}`, `Z_L${k}`)), unit: 'V' }),
  );
  BR.forEach((br, i) => {
    const [p, q] = ENDS[i];
    b.step({ quantity: `Voltage across branch ${p}–${q}`, symbol: `V′${br}`, name: `Vb_${br}`, relation: `V′${br} = U${p} − U${q}`, formula: F.sub(`U_${p}`, `U_${q}`), unit: 'V' });
  });
  BR.forEach((br) =>
    b.step({ quantity: `Branch ${br[0]}–${br[1]} current`, symbol: `I${br}`, relation: `I${br} = V′${br} / Z${br}`, formula: F.div(`Vb_${br}`, `Z_${br}`), unit: 'A' }),
  );
  BR.forEach((br) =>
    b.step({ quantity: `Branch ${br[0]}–${br[1]} complex power`, symbol: `S${br}`, relation: `S${br} = V′${br} · I${br}*`, formula: F.power(`Vb_${br}`, `I_${br}`), unit: 'VA' }),
  );
  b.step({ quantity: 'Total load complex power', symbol: 'S load', name: 'S_load', relation: 'S load = S12 + S23 + S31', formula: F.add('S_12', 'S_23', 'S_31'), unit: 'VA' });
  lineLossStep(b);
  b.step({
    quantity: 'Complex power delivered by the supply',
    symbol: 'S source',
    name: 'S_source',
    relation: 'S source = Σ Ek · Ik*',
    formula: F.add(...K.map((k) => F.power(`E_${k}`, `I_${k}`))),
    unit: 'VA',
  });

  b.section('One-call solver on the same inputs');
  const at = b.solverBlock(
    'PHZ.DELTALOAD',
    `PHZ.DELTALOAD(${b.range('V_12', 'V_31')}, ${b.range('Z_12', 'Z_31')}, ${b.range('Z_L1', 'Z_L3')}, FALSE, 15)`,
    ['line 1, branch 12', 'line 2, branch 23', 'line 3, branch 31'],
    ['line current', 'branch current', 'branch voltage', 'branch power'],
  );

  b.section('Checks', 'checks');
  b.check(
    'The line voltages close',
    'V12 + V23 + V31 = 0 (Kirchhoff’s voltage law around the lines)',
    CLOSURE_RESIDUAL,
    LINE_CLOSE_REL,
    'KVL; typed or metered values leave a small residual, which steps 1–3 drop (as PHZ.DELTALOAD does); residual over the mean magnitude',
  );
  K.forEach((k, i) => {
    const [out, back] = [BR[i], BR[(i + 2) % 3]];
    b.check(
      `Kirchhoff’s current law at load corner ${k}`,
      `I${k} = I${out} − I${back}`,
      `PHZ.MAG(${F.sub(`I_${k}`, F.sub(`I_${out}`, `I_${back}`))})/MAX(PHZ.MAG(I_1), PHZ.MAG(I_2), PHZ.MAG(I_3))`,
      1e-9,
      'KCL; residual over the largest line current',
    );
  });
  powerBalanceCheck(b);
  b.check(
    'Currents agree with PHZ.DELTALOAD',
    'I1, I2, I3, I12, I23, I31 of the steps = the solver’s',
    agreement([...K.map((k) => [`I_${k}`, at(k - 1, 0)] as const), ...BR.map((br, i) => [`I_${br}`, at(i, 1)] as const)]),
    1e-9,
    'largest difference over the largest current',
  );

  b.cautions([
    ...COMMON_CAUTIONS,
    'The line voltages must close (V12 + V23 + V31 = 0); a set that misses by more than 1 % is not one supply’s line voltages. An open branch is not a finite impedance: use PHZ.DELTALOAD with "open" for it.',
  ]);
  b.chartTitleIs('line voltages, line and branch currents');
  BR.forEach((br) => b.chartPhasor(`V${br}`, `V_${br}`, 'V'));
  K.forEach((k) => b.chartPhasor(`I${k}`, `I_${k}`, 'A'));
  BR.forEach((br) => b.chartPhasor(`I${br}`, `I_${br}`, 'A'));
  return b.build();
}

export const delta: Calculation = {
  id: 'delta',
  name: 'Delta load',
  summary: 'Delta load from its line voltages, optional line impedances: branch currents, line currents, powers.',
  demoScenario: 'Demo: three-phase heater and motor-winding bank in delta on a long run from the main board (our own invented numbers).',
  fields: FIELDS,
  crossCheck(values) {
    functions.DELTALOAD(column3(values, ['V12', 'V23', 'V31']), column3(values, ['Z12', 'Z23', 'Z31']), column3(values, ['ZL1', 'ZL2', 'ZL3']), null, null);
  },
  plan,
};
