import { solveStar, starExtras } from '../../core/threephase';
import { defineFunction } from '../spec';
import { SIZING_CAUTIONS } from '../neutral/_cautions';
import { STAR_PARAMS, extrasTable, labelled, readStarArgs } from './_networks';

const HEADER = ['', 'loss (VA)', 'source power (VA)', 'drop at load (%)'];
const ROW_LABELS = ['line 1', 'line 2', 'line 3', 'neutral loss; total source power; largest drop'];

/** The star solver's losses, source power and drops at the loads. */
export const STARLOSSES = defineFunction({
  name: 'STARLOSSES',
  group: 'solvers',
  summary: 'Losses in the lines and the neutral, source complex power and the voltage drop at each load of a star load (STARLOAD’s arguments).',
  details:
    'Takes exactly the arguments of PHZ.STARLOAD and solves the same network. Rows 1–3, line k: the loss in the line impedance |I_k|²·ZL_k, ' +
    'the complex power the source delivers through that line E_k·I_k*, and the drop at load k in percent, (|E_k| − |U_k|)/|E_k| × 100, ' +
    'where U_k is the voltage across the load impedance (terminal to the load star point, so the neutral’s share counts: what the ' +
    'equipment sees); a negative drop is a rise, as on the lightly loaded phases when the neutral is impedant or lost. Row 4: the loss ' +
    'in the neutral impedance |I_N|²·Z_N (0 for a solid or open neutral), the total source power Σ E_k·I_k*, and the largest of the ' +
    'three drops. Power balance: total source power = STARLOAD’s total load power + the first column’s sum (line and neutral losses), ' +
    'so PHZ.ADD of the first column is the total loss. Units as for STARLOAD (V and Ω give VA).',
  params: STAR_PARAMS,
  result: 'A 4×3 table (5×4 with labels): rows lines 1–3 [line loss, source power (polar text), drop at the load %]; row 4 [neutral loss, total source power, largest drop %].',
  errors: ['As PHZ.STARLOAD; and a 0 V source phase (the drop in percent needs its voltage) gives #VALUE!.'],
  cautions: [
    ...SIZING_CAUTIONS,
    'The permitted voltage drop and the conductors’ operating temperature (on which their resistance depends) are set by the locally adopted wiring rules.',
  ],
  examples: [
    {
      formula: '=PHZ.STARLOSSES({"230∠0";"230∠-120";"230∠120"}, {"11.5";"23";"23"}, "0.5", "0.5", FALSE(), 4)',
      result: [['176.8∠0°', '4325∠0°', 5.96892886345053], ['48.81∠0°', '2273∠0.9244°', 1.19449665450751], ['48.81∠0°', '2273∠-0.9244°', 1.19449665450751], ['37.42∠0°', '8870∠0°', 5.96892886345053]],
    },
  ],
  implementation: (phaseVoltages, impedances, neutral, line, labels, digits) => {
    const a = readStarArgs(phaseVoltages, impedances, neutral, line, labels, digits);
    const x = starExtras(a.sources, a.lines, a.neutral, solveStar(a));
    return labelled(extrasTable(x, a.digits), a, HEADER, ROW_LABELS);
  },
});
