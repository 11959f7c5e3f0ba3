import { sizingCurrent } from '../../core/threephase';
import { readNumber } from '../readers';
import { defineFunction } from '../spec';
import { SIZING_CAUTIONS } from './_cautions';

/** Cable sizing current with third harmonics, IEC 60364-5-52 Annex E. */
export const SIZINGCURRENT = defineFunction({
  name: 'SIZINGCURRENT',
  group: 'neutral',
  summary: 'Current to size a four- or five-core cable for, with third-harmonic currents (IEC 60364-5-52 Annex E, Table E.52.1).',
  details:
    'Table E.52.1 (IEC 60364-5-52:2009, Annex E), for four- and five-core cables whose neutral is in the cable, of the ' +
    'same material and cross-section as the line conductors, on a balanced three-phase circuit. Third-harmonic ' +
    'content of the line current 0–15 %: factor 1.0, size on the line current; above 15 to 33 %: 0.86 on the line ' +
    'current; above 33 to 45 %: 0.86 on the neutral current 3·(h/100)·I_B; above 45 %: 1.0 on the neutral current. ' +
    'The current returned is the basis current divided by the factor: the cable’s tabulated current-carrying ' +
    'capacity (after any other correction factors) must be at least this.',
  params: [
    { name: 'design_current', type: 'scalar', description: 'Design current I_B of the circuit (line current), A.' },
    { name: 'third_harmonic_pct', type: 'scalar', description: 'Third-harmonic content of the line current, percent of the fundamental (0 or more).' },
  ],
  result: 'A 1×3 row: current to size for (A), reduction factor, basis ("phase" or "neutral").',
  errors: ['A negative or non-numeric design current or percentage gives #VALUE!.'],
  cautions: [
    ...SIZING_CAUTIONS,
    'Table E.52.1 assumes a balanced three-phase load; with only two phases loaded, or unbalanced loads, the neutral carries more and must be assessed separately.',
  ],
  examples: [
    { formula: '=PHZ.SIZINGCURRENT(43, 20)', result: [[50, 0.86, 'phase']] },
    { formula: '=PHZ.SIZINGCURRENT(43, 50)', result: [[64.5, 1, 'neutral']] },
  ],
  implementation: (designCurrent, pct) => {
    const r = sizingCurrent(readNumber(designCurrent, 'design_current', { units: ['A'] }), readNumber(pct, 'third_harmonic_pct'));
    return [[r.current, r.factor, r.basis]];
  },
});
