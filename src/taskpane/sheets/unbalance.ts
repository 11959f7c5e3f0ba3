/**
 * Worked sheet 5: supply unbalance check from measured line voltages, given as phasors or
 * as magnitudes only.
 *
 * - Magnitudes only: the three magnitudes are the sides of the triangle the line-voltage
 *   phasors close (V12 + V23 + V31 = 0), so the law of cosines gives the angles: with V12
 *   at 0°, V23 is at C − 180° and V31 at A + C, where C is the triangle's angle between the
 *   sides U12 and U23 and A the angle between U23 and U31.
 * - Phasors: measured phasors close only to their typing precision; the set used is the
 *   measured one less its zero-sequence part V0 = (V12 + V23 + V31)/3, which changes neither
 *   V+ nor V− (so not the VUF) and makes the identities below exact.
 *
 * Then: symmetrical components of the line set (referred to V12; a = 1∠120°), VUF =
 * |V−|/|V+| (IEC 61000-4-30), LVUR (NEMA MG 1 percent unbalance), PVUR on the equivalent
 * star (IEEE phase definition), the IEC 61000-4-30 magnitude formula, NEMA MG 1 derating,
 * and the result against the usual limits, each named with its source.
 */
import { functions } from '../../functions';
import { readNumber } from '../../functions/readers';
import { F, type SheetPlan } from './plan';
import { COMMON_CAUTIONS, type Calculation, type FieldSpec, type FieldValues, type PlanMeta } from './calculation';
import { K, openPlan } from './star-common';
import { CLOSURE_RESIDUAL } from './delta';
import { LINE_CLOSE_REL } from '../../core/threephase/sets';

const BR = ['12', '23', '31'] as const;

/** VUF compatibility level for low-voltage networks: IEC 61000-2-2 (and EN 50160's 95 % weekly limit), from memory. */
export const VUF_LIMIT_PCT = 2;
/** NEMA MG 1 (Part 14, from memory): above 1 % unbalance a motor's rating is derated; above 5 % operation is not recommended. */
export const NEMA_DERATE_FROM_PCT = 1;
export const NEMA_MAX_PCT = 5;

const FIELDS: readonly FieldSpec[] = BR.map((br, i) => ({
  id: `V${br}`,
  label: `measured line voltage ${br[0]} to ${br[1]} (phasor, or magnitude only)`,
  unit: 'V',
  kind: 'phasor' as const,
  expect: 'voltage' as const,
  demo: ['411', '404', '395'][i],
  hint: 'magnitude (e.g. 411) or phasor (e.g. 411∠30)',
  group: 'Measured line voltages',
}));

/** True when every line voltage is a plain number: the magnitudes-only route. */
export function magnitudesOnly(values: FieldValues): boolean {
  return BR.every((br) => {
    try {
      readNumber(values[`V${br}`], `V${br}`);
      return true;
    } catch {
      return false;
    }
  });
}

function plan(values: FieldValues, meta: PlanMeta): SheetPlan {
  const mags = magnitudesOnly(values);
  const inputs = mags ? Object.fromEntries(BR.map((br) => [`V${br}`, readNumber(values[`V${br}`], `V${br}`)])) : values;
  const fields = FIELDS.map((f) => (mags ? { ...f, kind: 'number' as const } : f));
  const b = openPlan(meta, fields, inputs, {
    calculation: 'unbalance',
    title: 'Supply unbalance check',
    subtitle: `Voltage unbalance of a three-phase supply from its measured line voltages (${mags ? 'magnitudes only: angles by the law of cosines' : 'phasors'}), against the usual limits.`,
    sheetName: 'Supply unbalance',
  });
  if (mags) {
    BR.forEach((br) => b.step({ quantity: `Magnitude of V${br}`, symbol: `U${br}`, relation: `U${br} = |V${br}|`, formula: `PHZ.MAG(V_${br})`, unit: 'V', kind: 'number' }));
    b.step({
      quantity: 'Angle of the triangle between the sides U12 and U23',
      symbol: 'C',
      name: 'C_12',
      relation: 'cos C = (U12² + U23² − U31²) / (2·U12·U23)',
      formula: 'DEGREES(ACOS((U_12^2+U_23^2-U_31^2)/(2*U_12*U_23)))',
      unit: '°',
      kind: 'number',
    });
    b.step({
      quantity: 'Angle of the triangle between the sides U23 and U31',
      symbol: 'A',
      name: 'A_23',
      relation: 'cos A = (U23² + U31² − U12²) / (2·U23·U31)',
      formula: 'DEGREES(ACOS((U_23^2+U_31^2-U_12^2)/(2*U_23*U_31)))',
      unit: '°',
      kind: 'number',
    });
    const angle = { '12': '0', '23': 'C_12-180', '31': 'A_23+C_12' } as const;
    const words = { '12': 'U12∠0°', '23': 'U23∠(C − 180°)', '31': 'U31∠(A + C)' } as const;
    BR.forEach((br) =>
      b.step({
        quantity: `Line voltage ${br[0]} to ${br[1]}, closed set`,
        symbol: `V${br}c`,
        name: `Vc_${br}`,
        relation: `V${br}c = ${words[br]}`,
        formula: `PHZ.FROMPOLAR(U_${br}, ${angle[br]}, "deg", 15)`,
        unit: 'V',
      }),
    );
  } else {
    b.step({ quantity: 'Zero-sequence part of the measured set (typing error)', symbol: 'V0', relation: 'V0 = (V12 + V23 + V31) / 3', formula: F.div(F.add('V_12', 'V_23', 'V_31'), '3'), unit: 'V' });
    BR.forEach((br) =>
      b.step({ quantity: `Line voltage ${br[0]} to ${br[1]}, closed set`, symbol: `V${br}c`, name: `Vc_${br}`, relation: `V${br}c = V${br} − V0`, formula: F.sub(`V_${br}`, 'V_0'), unit: 'V' }),
    );
    BR.forEach((br) => b.step({ quantity: `Magnitude of V${br}c`, symbol: `U${br}`, relation: `U${br} = |V${br}c|`, formula: `PHZ.MAG(Vc_${br})`, unit: 'V', kind: 'number' }));
  }
  b.step({
    quantity: 'Positive-sequence line voltage (referred to V12)',
    symbol: 'V+',
    name: 'V_pos',
    relation: 'V+ = (V12c + a·V23c + a²·V31c) / 3,  a = 1∠120°',
    formula: F.div(F.add('Vc_12', F.rotate('Vc_23', 120), F.rotate('Vc_31', -120)), '3'),
    unit: 'V',
  });
  b.step({
    quantity: 'Negative-sequence line voltage',
    symbol: 'V−',
    name: 'V_neg',
    relation: 'V− = (V12c + a²·V23c + a·V31c) / 3',
    formula: F.div(F.add('Vc_12', F.rotate('Vc_23', -120), F.rotate('Vc_31', 120)), '3'),
    unit: 'V',
  });
  b.step({ quantity: 'Voltage unbalance factor', symbol: 'VUF', name: 'VUF_pct', relation: 'VUF = |V−| / |V+| × 100', formula: 'PHZ.MAG(V_neg)/PHZ.MAG(V_pos)*100', unit: '%', kind: 'number' });
  b.step({ quantity: 'Average line-voltage magnitude', symbol: 'U avg', name: 'U_avg', relation: 'U avg = (U12 + U23 + U31) / 3', formula: '(U_12+U_23+U_31)/3', unit: 'V', kind: 'number' });
  b.step({
    quantity: 'Line voltage unbalance rate (NEMA percent unbalance)',
    symbol: 'LVUR',
    name: 'LVUR_pct',
    relation: 'LVUR = max |Ukl − U avg| / U avg × 100',
    formula: 'MAX(ABS(U_12-U_avg), ABS(U_23-U_avg), ABS(U_31-U_avg))/U_avg*100',
    unit: '%',
    kind: 'number',
  });
  K.forEach((k, i) => {
    const [a, c] = [BR[i], BR[(i + 2) % 3]];
    b.step({
      quantity: `Phase ${k} voltage of the equivalent star (no zero sequence)`,
      symbol: `E${k}`,
      relation: `E${k} = (V${a}c − V${c}c) / 3`,
      formula: F.div(F.sub(`Vc_${a}`, `Vc_${c}`), '3'),
      unit: 'V',
    });
  });
  b.step({
    quantity: 'Phase voltage unbalance rate (IEEE definition)',
    symbol: 'PVUR',
    name: 'PVUR_pct',
    relation: 'PVUR = max ||Ek| − avg| / avg × 100, avg = (|E1| + |E2| + |E3|)/3',
    formula:
      'MAX(ABS(PHZ.MAG(E_1)-(PHZ.MAG(E_1)+PHZ.MAG(E_2)+PHZ.MAG(E_3))/3), ABS(PHZ.MAG(E_2)-(PHZ.MAG(E_1)+PHZ.MAG(E_2)+PHZ.MAG(E_3))/3), ABS(PHZ.MAG(E_3)-(PHZ.MAG(E_1)+PHZ.MAG(E_2)+PHZ.MAG(E_3))/3))/((PHZ.MAG(E_1)+PHZ.MAG(E_2)+PHZ.MAG(E_3))/3)*100',
    unit: '%',
    kind: 'number',
  });
  b.step({ quantity: 'IEC magnitude ratio', symbol: 'β', name: 'beta_U', relation: 'β = (U12⁴ + U23⁴ + U31⁴) / (U12² + U23² + U31²)²', formula: '(U_12^4+U_23^4+U_31^4)/(U_12^2+U_23^2+U_31^2)^2', unit: '', kind: 'number' });
  b.step({
    quantity: 'Unbalance from the magnitudes only (IEC 61000-4-30)',
    symbol: 'u2',
    name: 'IEC_u2',
    relation: 'u2 = √((1 − √(3 − 6β)) / (1 + √(3 − 6β))) × 100',
    formula: 'SQRT((1-SQRT(3-6*beta_U))/(1+SQRT(3-6*beta_U)))*100',
    unit: '%',
    kind: 'number',
  });
  b.step({
    quantity: 'Motor derating factor (NEMA MG 1 curve, on LVUR)',
    symbol: 'k derate',
    name: 'k_derate',
    relation: `k derate = NEMA MG 1 curve at LVUR (none above ${NEMA_MAX_PCT} %)`,
    formula: `IF(LVUR_pct>${NEMA_MAX_PCT}, "none: operation above ${NEMA_MAX_PCT} % not recommended", PHZ.MOTORDERATE(LVUR_pct))`,
    unit: '',
    kind: 'text',
  });

  b.section('Against the limits');
  b.verdictRow(
    `VUF against ${VUF_LIMIT_PCT} %`,
    `VUF ≤ ${VUF_LIMIT_PCT} %`,
    `IF(VUF_pct<=${VUF_LIMIT_PCT}, "within ${VUF_LIMIT_PCT} %", "EXCEEDS ${VUF_LIMIT_PCT} %")`,
    'IEC 61000-2-2 compatibility level for LV networks; EN 50160: 95 % of 10-min means in a week ≤ 2 % (from memory)',
  );
  b.verdictRow(
    `LVUR against ${NEMA_DERATE_FROM_PCT} % (motors)`,
    `LVUR ≤ ${NEMA_DERATE_FROM_PCT} % needs no derating`,
    `IF(LVUR_pct<=${NEMA_DERATE_FROM_PCT}, "within ${NEMA_DERATE_FROM_PCT} %: no derating", IF(LVUR_pct<=${NEMA_MAX_PCT}, "ABOVE ${NEMA_DERATE_FROM_PCT} %: derate motors by the factor above", "ABOVE ${NEMA_MAX_PCT} %: operation not recommended"))`,
    'NEMA MG 1 Part 14, effects of unbalanced voltages on motors (from memory)',
  );

  b.section('One-call functions on the same set');
  const closed = b.range('Vc_12', 'Vc_31');
  const mag3 = b.range('U_12', 'U_31');
  const one = (label: string, formula: string) => b.solverValue(label, formula);
  const vuf = one('PHZ.UNBALANCE, VUF', `PHZ.UNBALANCE(${closed}, "VUF")`);
  const lvur = one('PHZ.UNBALANCE, LVUR', `PHZ.UNBALANCE(${mag3}, "LVUR")`);
  const mag = one('PHZ.UNBALANCE, MAG', `PHZ.UNBALANCE(${mag3}, "MAG")`);
  const pvur = one('PHZ.UNBALANCE, PVUR', `PHZ.UNBALANCE(${b.range('E_1', 'E_3')}, "PVUR")`);
  const seq = b.solverBlock('PHZ.SEQCOMP', `PHZ.SEQCOMP(${closed}, 15)`, ['zero', 'positive', 'negative'], ['component']);
  const lineset = mags ? b.solverBlock('PHZ.LINESET, V12 at 0°', `PHZ.LINESET(${mag3}, 0, 15)`, ['V12', 'V23', 'V31'], ['phasor']) : null;

  b.section('Checks', 'checks');
  b.check(
    mags ? 'The constructed set closes' : 'The measured set closes',
    'V12 + V23 + V31 = 0 (Kirchhoff’s voltage law around the lines)',
    mags
      ? `PHZ.MAG(${F.add('Vc_12', 'Vc_23', 'Vc_31')})/MAX(U_12, U_23, U_31)`
      : CLOSURE_RESIDUAL,
    mags ? 1e-9 : LINE_CLOSE_REL,
    mags ? 'KVL; the law of cosines closes the triangle' : 'KVL; typed or metered values leave a small residual, removed as V0 (as PHZ.UNBALANCE and PHZ.STARVOLTS do); residual over the mean magnitude',
  );
  if (lineset) {
    b.check(
      'The closed set agrees with PHZ.LINESET',
      'V12c, V23c, V31c of the steps = the function’s',
      `MAX(${BR.map((br, i) => `PHZ.MAG(${F.sub(`Vc_${br}`, lineset(i, 0))})`).join(', ')})/MAX(U_12, U_23, U_31)`,
      1e-9,
      'law of cosines two ways; largest difference over the largest magnitude',
    );
  }
  b.check(
    'VUF equals the magnitude formula',
    'VUF = u2 for a three-wire (closed) set',
    'ABS(VUF_pct-IEC_u2)/MAX(VUF_pct, 1)',
    1e-9,
    'IEC 61000-4-30 (the formula is exact for line voltages); residual over VUF (at least 1 %)',
  );
  b.check(
    'Unbalance factors agree with PHZ.UNBALANCE',
    'VUF, LVUR, PVUR, u2 of the steps = the function’s',
    `MAX(ABS(VUF_pct-${vuf}), ABS(LVUR_pct-${lvur}), ABS(PVUR_pct-${pvur}), ABS(IEC_u2-${mag}))/MAX(VUF_pct, LVUR_pct, PVUR_pct, 1)`,
    1e-9,
    'largest difference over the largest factor (at least 1 %)',
  );
  b.check(
    'Sequence components agree with PHZ.SEQCOMP',
    'V+ and V− of the steps = the function’s',
    `MAX(PHZ.MAG(${F.sub('V_pos', seq(1, 0))}), PHZ.MAG(${F.sub('V_neg', seq(2, 0))}))/PHZ.MAG(V_pos)`,
    1e-9,
    'largest difference over |V+|',
  );

  b.cautions([
    ...COMMON_CAUTIONS,
    'One set of readings is a snapshot: the limits of IEC 61000-2-2 and EN 50160 apply to 10-minute means over a week. Correct the supply unbalance where you can; check the motor maker’s data before derating.',
    'PVUR here is on the star set with these line voltages and no zero sequence; phase-to-neutral voltages measured on a four-wire supply may differ.',
  ]);
  b.chartTitleIs('line voltages and their sequence components');
  BR.forEach((br) => b.chartPhasor(`V${br}`, `Vc_${br}`, 'V'));
  b.chartPhasor('V+', 'V_pos', 'V');
  b.chartPhasor('V−', 'V_neg', 'V');
  return b.build();
}

export const unbalance: Calculation = {
  id: 'unbalance',
  name: 'Supply unbalance check',
  summary: 'Measured line voltages (phasors or magnitudes only): sequence components, VUF, LVUR, PVUR, the IEC magnitude formula, NEMA derating and the limits.',
  demoScenario: 'Demo: line voltages read with a meter at a plant-room motor control centre (our own invented numbers).',
  fields: FIELDS,
  crossCheck(values) {
    const col = BR.map((br) => [values[`V${br}`]]);
    if (magnitudesOnly(values)) functions.LINESET(col, null, null);
    else functions.STARVOLTS(col, null);
  },
  plan,
};
