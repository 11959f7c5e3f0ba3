import { toSequence } from '../../core/threephase';
import { defineFunction } from '../spec';
import { readDigits } from '../readers';
import { DIGITS, phasorParam } from '../params';
import { readTriple, setColumn } from '../sets/_threephase';

/** Symmetrical components of a three-phase set. */
export const SEQCOMP = defineFunction({
  name: 'SEQCOMP',
  group: 'sequences',
  summary: 'Symmetrical components (zero, positive, negative sequence) of three phase values, referred to phase 1.',
  details:
    'Fortescue’s transformation with a = 1∠120° and positive sequence 1→2→3 (phase 2 lags by 120°): ' +
    'V0 = (V1 + V2 + V3)/3, V+ = (V1 + a·V2 + a²·V3)/3, V− = (V1 + a²·V2 + a·V3)/3. Works for voltages or currents, ' +
    'phase or line quantities (line quantities have no zero sequence).',
  params: [phasorParam('phases', 'Values of phases 1, 2, 3 (three)'), DIGITS],
  result: 'A 3×1 column of polar text: zero, positive, negative sequence.',
  errors: ['Other than three values, a blank cell or text that is not a phasor gives #VALUE!.'],
  examples: [
    { formula: '=PHZ.SEQCOMP({"10∠0";"10∠180";"0"})', result: [['0'], ['5.7735∠-30°'], ['5.7735∠30°']] },
    { formula: '=PHZ.SEQCOMP({"230∠0";"230∠-120";"230∠120"})', result: [['0'], ['230∠0°'], ['0']] },
  ],
  implementation: (phases, digits) => {
    const d = readDigits(digits);
    return setColumn(toSequence(readTriple(phases, 'phases', 'phases 1, 2, 3')), d);
  },
});
