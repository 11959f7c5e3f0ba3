import { neutralDemand } from '../../core/threephase';
import { readNumber } from '../readers';
import { defineFunction } from '../spec';
import { SIZING_CAUTIONS } from './_cautions';

/** Feeder neutral load, NFPA 70 Art. 220.61. */
export const NEUTRALDEMAND = defineFunction({
  name: 'NEUTRALDEMAND',
  group: 'neutral',
  summary: 'Feeder or service neutral load per NFPA 70 (NEC) Art. 220.61: the first 200 A at 100 %, the rest at 70 %, nonlinear load at 100 %.',
  details:
    'Reading of NFPA 70, National Electrical Code, 2023 edition, 220.61 (numbering unchanged since the 2005 edition): ' +
    'the feeder neutral load is the maximum unbalanced load between the neutral and any one ungrounded conductor ' +
    '(220.61(A)); 220.61(B)(2) permits the portion of that load in excess of 200 A to be taken at 70 %; 220.61(C) ' +
    'allows no reduction for the portion consisting of nonlinear loads supplied from a 4-wire, wye-connected, ' +
    'three-phase system. unbalanced_load is the linear part of the maximum unbalanced load and nonlinear_load the ' +
    'nonlinear part, both in amperes: result = min(L, 200) + 0.7·max(L − 200, 0) + NL. The other conditions of ' +
    '220.61 (for example the 3-wire circuits from a 4-wire wye of 220.61(C)(1)) are for you to apply.',
  params: [
    { name: 'unbalanced_load', type: 'scalar', description: 'Linear part of the maximum unbalanced load on the neutral, A.' },
    { name: 'nonlinear_load', type: 'scalar', optional: true, description: 'Nonlinear part supplied from a 4-wire wye system, A (default 0).' },
  ],
  result: 'A number: the neutral load in amperes.',
  errors: ['A negative or non-numeric load gives #VALUE!.'],
  cautions: [...SIZING_CAUTIONS, 'Check the edition of NFPA 70 adopted where the installation is, and any local amendments.'],
  examples: [
    { formula: '=PHZ.NEUTRALDEMAND(300)', result: [[270]] },
    { formula: '=PHZ.NEUTRALDEMAND(300, 50)', result: [[320]] },
  ],
  implementation: (unbalanced, nonlinear) => [[neutralDemand(readNumber(unbalanced, 'unbalanced_load', { units: ['A'] }), readNumber(nonlinear, 'nonlinear_load', { default: 0, units: ['A'] }))]],
});
