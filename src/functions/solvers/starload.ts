import { formatPolar } from '../../core/format';
import { solveStar } from '../../core/threephase';
import { defineFunction, type HostResult } from '../spec';
import { STAR_PARAMS, labelled, readStarArgs } from './_networks';

const HEADER = ['', 'current', 'voltage', 'complex power'];
const ROW_LABELS = ['phase 1', 'phase 2', 'phase 3', "neutral: I_N, V_N'N, total S"];

/** Star load fed from a star source: currents, voltages, powers, neutral current and shift. */
export const STARLOAD = defineFunction({
  name: 'STARLOAD',
  group: 'solvers',
  summary: 'Solves a star (wye) load fed from a star source: line currents, load voltages and powers, neutral current, star-point shift.',
  details:
    'Exact for every case by Millman’s theorem with the line and neutral admittances: V_N′N = Σ E_k·Y_k / (Σ Y_k + Y_N), ' +
    'Y_k = 1/(Z_k + ZL_k), then I_k = (E_k − V_N′N)·Y_k, with E_k − V_N′N formed from differences of the EMFs so that ' +
    'impedances many orders apart (1e9 Ω standing for an open, 1e-9 Ω for a short) lose no accuracy. neutral left ' +
    'out, 0 or "solid" = solid neutral (V_N′N = 0); an impedance = impedant neutral; "open" = three-wire, the star ' +
    'point floats. A neutral that refers to a blank cell is an error: an input not yet filled in is never taken ' +
    'as a solid neutral. A load impedance may be "open" (a disconnected ' +
    'phase). Rows 1–3 are phases 1–3: line current, voltage across the load impedance (terminal to star point), load ' +
    'complex power V·I*. Row 4: neutral current from the load star point to the source neutral (= I1 + I2 + I3), the ' +
    'star-point shift V_N′N, and the total load complex power (line and neutral losses excluded). Units are whatever ' +
    'you give consistently (V and Ω give A and VA). Conventions: phase 2 lags phase 1 by 120° in positive sequence.',
  params: STAR_PARAMS,
  result: 'A 4×3 table of polar text (5×4 with labels): rows phases 1–3 [I, V_load, S]; row 4 [I_N, V_N′N, total S].',
  errors: [
    'Other than three phase voltages, or other than one or three impedances, gives #VALUE!.',
    'A 0 Ω phase (load + line) with a solid neutral, or two 0 Ω phases, short-circuits the source: #VALUE!.',
    'All three loads "open", or admittances that sum to zero at the star point (series resonance), give #VALUE!.',
    'An unknown neutral word, a neutral that refers to a blank cell, or a blank cell or text that is not a phasor elsewhere gives #VALUE!.',
  ],
  examples: [
    {
      formula: '=PHZ.STARLOAD({"230∠0";"230∠-120";"230∠120"}, {"23";"46";"23"})',
      result: [
        ['10∠0°', '230∠0°', '2300∠0°'],
        ['5∠-120°', '230∠-120°', '1150∠0°'],
        ['10∠120°', '230∠120°', '2300∠0°'],
        ['5∠60°', '0', '5750∠0°'],
      ],
    },
    {
      formula: '=PHZ.STARLOAD({"230∠0";"230∠-120";"230∠120"}, {"23";"46";"23"}, "open", 0, FALSE(), 4)',
      result: [
        ['9.165∠-10.89°', '210.8∠-10.89°', '1932∠0°'],
        ['6∠-120°', '276∠-120°', '1656∠0°'],
        ['9.165∠130.9°', '210.8∠130.9°', '1932∠0°'],
        ['0', '46∠60°', '5520∠0°'],
      ],
    },
  ],
  implementation: (phaseVoltages, impedances, neutral, line, labels, digits) => {
    const a = readStarArgs(phaseVoltages, impedances, neutral, line, labels, digits);
    const s = solveStar(a);
    const f = (z: Parameters<typeof formatPolar>[0]): string => formatPolar(z, a.digits);
    const table: HostResult = [
      [f(s.currents[0]), f(s.loadVoltages[0]), f(s.loadPowers[0])],
      [f(s.currents[1]), f(s.loadVoltages[1]), f(s.loadPowers[1])],
      [f(s.currents[2]), f(s.loadVoltages[2]), f(s.loadPowers[2])],
      [f(s.neutralCurrent), f(s.shift), f(s.totalLoadPower)],
    ];
    return labelled(table, a, HEADER, ROW_LABELS);
  },
});
