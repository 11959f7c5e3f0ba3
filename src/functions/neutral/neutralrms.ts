import { neutralRms } from '../../core/threephase';
import { defineFunction } from '../spec';
import { phasorParam } from '../params';
import { isAbsent, readTriple } from '../sets/_threephase';
import { SIZING_CAUTIONS } from './_cautions';
import { readHarmonics } from './_harmonics';

/** rms neutral current with harmonics. */
export const NEUTRALRMS = defineFunction({
  name: 'NEUTRALRMS',
  group: 'neutral',
  summary: 'rms neutral current of three phase currents with harmonics: triplens add in the neutral, the others cancel when balanced.',
  details:
    'currents are the fundamental phasors of phases 1–3, on the same angle reference as the supply. Each harmonics row ' +
    'is [order, percent] (the same content on every phase) or [order, percent 1, percent 2, percent 3], in percent of ' +
    'that phase’s fundamental current magnitude. Model: phase k’s harmonic of order h has magnitude p/100·|I_k| and ' +
    'angle h·φ_k, where φ_k is the angle of phase k’s supply voltage (0°, −120°, +120° unless phase_voltages are ' +
    'given; only their angles are used). Harmonic currents of non-linear loads are drawn in step with the voltage ' +
    'that feeds them, not with the displacement of the fundamental current, so on a balanced supply the orders 3, 9, ' +
    '15 … of every phase are in phase and add arithmetically whatever the power factors (the 3 × h × I basis of ' +
    'IEC 60364-5-52 Annex E), and the other orders form sets that cancel as far as their contents are equal. This is ' +
    'the conservative model: referring the harmonics to the fundamental currents would let phases at different power ' +
    'factors partly cancel in the neutral, which real loads do not. The rms neutral current is √(|I_N,1|² + Σ|I_N,h|²) ' +
    'over the fundamental and every order given (components of different frequencies add in rms by ' +
    'root-sum-square). Blank rows are skipped.',
  params: [
    phasorParam('currents', 'Fundamental phase currents I1, I2, I3 (three)'),
    { name: 'harmonics', type: 'matrix', description: 'Rows of [order, percent] or [order, p1, p2, p3]; order a whole number ≥ 2, percent ≥ 0.' },
    {
      name: 'phase_voltages',
      type: 'matrix',
      optional: true,
      description: 'Supply phase voltages V1, V2, V3: the harmonics follow their angles (default a balanced set at 0°, −120°, +120°).',
    },
  ],
  result: 'A number: the rms neutral current (same unit as the currents).',
  errors: [
    'Other than three currents, a table that is not 2 or 4 columns wide, an order below 2 or not whole, a repeated order, or a percentage below 0 gives #VALUE!.',
    'phase_voltages other than three voltages, with a blank cell or with a 0 V phase (no angle) gives #VALUE!.',
  ],
  cautions: SIZING_CAUTIONS,
  examples: [
    { formula: '=PHZ.NEUTRALRMS({"100∠0";"100∠-120";"100∠120"}, {3,30;5,20})', result: [[90]] },
    { formula: '=PHZ.NEUTRALRMS({"100∠0";"100∠-120";"100∠120"}, {5,20;7,14})', result: [[0]] },
    { formula: '=PHZ.NEUTRALRMS({"40∠0";"40∠-120";"40∠60"}, {3,25})', result: [[50]] },
    { formula: '=PHZ.NEUTRALRMS({"40∠30";"40∠-90";"40∠90"}, {3,25}, {"230∠30";"230∠-90";"230∠150"})', result: [[50]] },
  ],
  implementation: (currents, harmonics, phaseVoltages) => {
    const i = readTriple(currents, 'currents', 'fundamental phase currents I1, I2, I3', 'current');
    const h = readHarmonics(harmonics);
    const v = isAbsent(phaseVoltages) ? null : readTriple(phaseVoltages, 'phase_voltages', 'supply phase voltages V1, V2, V3', 'voltage');
    return [[neutralRms(i, h, v, 'phase_voltages').rms]];
  },
});
