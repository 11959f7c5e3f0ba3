import { formatPolar } from '../../core/format';
import { solveDelta } from '../../core/threephase';
import { defineFunction, type HostResult } from '../spec';
import { DELTA_PARAMS, labelled, readDeltaArgs } from './_networks';

const HEADER = ['', 'line current', 'branch current', 'branch voltage', 'branch power'];
const ROW_LABELS = ['line 1, branch 12', 'line 2, branch 23', 'line 3, branch 31'];

/** Delta load from its line-to-line voltages: line and branch currents, voltages, powers. */
export const DELTALOAD = defineFunction({
  name: 'DELTALOAD',
  group: 'solvers',
  summary: 'Solves a delta load from its line-to-line voltages: line currents, branch currents, branch voltages and powers.',
  details:
    'Without line impedances each branch sees its line voltage: I12 = V12/Z12 and so on, and the line currents follow ' +
    'from Kirchhoff’s current law at the corners: I1 = I12 − I31, I2 = I23 − I12, I3 = I31 − I23. With line impedances ' +
    'the network is solved exactly, fed by the star set with the same line voltages (a three-wire load draws no ' +
    'zero-sequence current, so the source’s zero sequence cannot matter): line currents from the star equivalent of ' +
    'the delta, each branch current from whichever exact relation keeps its digits (the divider around the delta, or ' +
    'Ohm’s law on the corner voltage), so impedances many orders apart (1e9 Ω standing for an open, 1e-6 Ω for a ' +
    'short) lose no accuracy; a delta whose impedances sum to about 0 Ω is solved by nodal analysis. A branch ' +
    'may be "open". Row k: line current I_k, branch current I_k(k+1) (I12, I23, I31), voltage across that branch ' +
    'impedance, and its complex power V·I*. Line voltages physically sum to zero: a residual V12 + V23 + V31 up to 1 % ' +
    'of their mean magnitude (rounded or metered values) is removed by taking a third of it from each (dropping the ' +
    'zero-sequence part, which line voltages cannot have); a larger one is an error. For magnitudes only, use LINESET.',
  params: DELTA_PARAMS,
  result: 'A 3×4 table of polar text (4×5 with labels): row k [I_k, I_k(k+1), V_branch, S_branch].',
  errors: [
    'Other than three line voltages, other than one or three impedances, or line voltages whose sum is more than 1 % of their mean magnitude give #VALUE!.',
    'A 0 Ω branch with no line impedance, or lines joined through 0 Ω elements, short-circuits the supply: #VALUE!.',
    'All three branches "open", or a resonant network (no finite solution), give #VALUE!.',
  ],
  examples: [
    {
      formula: '=PHZ.DELTALOAD({"400∠0";"400∠-120";"400∠120"}, {"40";"80";"40"})',
      result: [
        ['17.3205∠-30°', '10∠0°', '400∠0°', '4000∠0°'],
        ['13.2288∠-160.893°', '5∠-120°', '400∠-120°', '2000∠0°'],
        ['13.2288∠100.893°', '10∠120°', '400∠120°', '4000∠0°'],
      ],
    },
  ],
  implementation: (lineVoltages, impedances, line, labels, digits) => {
    const a = readDeltaArgs(lineVoltages, impedances, line, labels, digits);
    const s = solveDelta(a);
    const f = (z: Parameters<typeof formatPolar>[0]): string => formatPolar(z, a.digits);
    const table: HostResult = [0, 1, 2].map((k) => [f(s.lineCurrents[k]), f(s.branchCurrents[k]), f(s.branchVoltages[k]), f(s.branchPowers[k])]);
    return labelled(table, a, HEADER, ROW_LABELS);
  },
});
