import { closeLineSet, deltaExtras, solveDelta, starOfClosedLineSet } from '../../core/threephase';
import { defineFunction } from '../spec';
import { SIZING_CAUTIONS } from '../neutral/_cautions';
import { DELTA_PARAMS, extrasTable, labelled, readDeltaArgs } from './_networks';

const HEADER = ['', 'loss (VA)', 'source power (VA)', 'drop at branch (%)'];
const ROW_LABELS = ['line 1, branch 12', 'line 2, branch 23', 'line 3, branch 31', 'no neutral (0); total source power; largest drop'];

/** The delta solver's losses, source power and drops at the branches. */
export const DELTALOSSES = defineFunction({
  name: 'DELTALOSSES',
  group: 'solvers',
  summary: 'Losses in the lines, source complex power and the voltage drop at each branch of a delta load (DELTALOAD’s arguments).',
  details:
    'Takes exactly the arguments of PHZ.DELTALOAD and solves the same network (the line voltages closed the same way). Row k: the loss ' +
    'in line k’s impedance |I_k|²·ZL_k, the complex power the supply delivers through line k, E_k·I_k*, and the drop at branch ' +
    'k(k+1) in percent, (|V_k(k+1)| − |U_k(k+1)|)/|V_k(k+1)| × 100, with U the voltage across the branch impedance (0 % without line ' +
    'impedances; negative for a rise). E_k is the star set with the given line voltages and no zero sequence, which a three-wire load ' +
    'cannot tell from any other supply with those line voltages: the three source powers add to the supply’s power, while their split ' +
    'depends on that reference, as wattmeter readings do on their common point. Row 4: 0 (a delta has no neutral, so PHZ.ADD of the ' +
    'first column is the total loss, as for STARLOSSES), the total source power, and the largest of the three drops. Power balance: total ' +
    'source power = the sum of DELTALOAD’s branch powers + the line losses.',
  params: DELTA_PARAMS,
  result: 'A 4×3 table (5×4 with labels): rows 1–3 [line loss, source power (polar text), drop at the branch %]; row 4 [0, total source power, largest drop %].',
  errors: ['As PHZ.DELTALOAD; and a 0 V line voltage (the drop in percent needs it) gives #VALUE!.'],
  cautions: [
    ...SIZING_CAUTIONS,
    'The permitted voltage drop and the conductors’ operating temperature (on which their resistance depends) are set by the locally adopted wiring rules.',
  ],
  examples: [
    {
      formula: '=PHZ.DELTALOSSES({"400∠30";"400∠-90";"400∠150"}, {"40";"80";"40"}, "0.4", FALSE(), 4)',
      result: [['113.1∠0°', '3883∠0°', 2.67378939053405], ['66.72∠0°', '2983∠10.62°', 1.9607843137255], ['66.72∠0°', '2983∠-10.62°', 2.67378939053405], ['0', '9747∠0°', 2.67378939053405]],
    },
  ],
  implementation: (lineVoltages, impedances, line, labels, digits) => {
    const a = readDeltaArgs(lineVoltages, impedances, line, labels, digits);
    const s = solveDelta(a);
    const closed = closeLineSet(a.lineVoltages, 'line_voltages');
    const x = deltaExtras(closed, starOfClosedLineSet(closed), a.lines, s);
    return labelled(extrasTable(x, a.digits), a, HEADER, ROW_LABELS);
  },
});
