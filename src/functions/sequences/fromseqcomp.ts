import { fromSequence } from '../../core/threephase';
import { defineFunction } from '../spec';
import { readDigits } from '../readers';
import { DIGITS } from '../params';
import { readTripleArgs, setColumn } from '../sets/_threephase';

/** Phase values from symmetrical components. */
export const FROMSEQCOMP = defineFunction({
  name: 'FROMSEQCOMP',
  group: 'sequences',
  summary: 'Phase values of phases 1, 2, 3 from zero, positive and negative sequence components (referred to phase 1).',
  details:
    'V1 = V0 + V+ + V−, V2 = V0 + a²·V+ + a·V−, V3 = V0 + a·V+ + a²·V−, with a = 1∠120° (the inverse of PHZ.SEQCOMP). ' +
    'Give the three components as one range of three (zero, positive, negative), or as three values.',
  params: [
    { name: 'zero', type: 'matrix', description: 'Zero-sequence component, or a range of three: zero, positive, negative.' },
    { name: 'positive', type: 'matrix', optional: true, description: 'Positive-sequence component (omit when zero holds all three).' },
    { name: 'negative', type: 'matrix', optional: true, description: 'Negative-sequence component (omit when zero holds all three).' },
    DIGITS,
  ],
  result: 'A 3×1 column of polar text: phases 1, 2, 3.',
  errors: ['Other than three values, a blank cell or text that is not a phasor gives #VALUE!.'],
  examples: [
    { formula: '=PHZ.FROMSEQCOMP(0, "230∠0", 0)', result: [['230∠0°'], ['230∠-120°'], ['230∠120°']] },
    { formula: '=PHZ.FROMSEQCOMP({"10";"100";"0"})', result: [['110∠0°'], ['95.3939∠-114.791°'], ['95.3939∠114.791°']] },
  ],
  implementation: (zero, positive, negative, digits) => {
    const d = readDigits(digits);
    const [z0, z1, z2] = readTripleArgs(zero, positive, negative, ['zero', 'positive', 'negative'], 'zero, positive, negative');
    return setColumn(fromSequence(z0, z1, z2), d);
  },
});
