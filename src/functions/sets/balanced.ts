import { polarDeg } from '../../core/phasor';
import { balancedSet } from '../../core/threephase';
import { defineFunction } from '../spec';
import { readChoice, readDigits, readNumber } from '../readers';
import { DIGITS } from '../params';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import { PhzError } from '../../core/errors';
import { setColumn } from './_threephase';

/** A balanced three-phase set of phasors. */
export const BALANCED = defineFunction({
  name: 'BALANCED',
  group: 'sets',
  summary: 'A balanced three-phase set: three equal magnitudes 120° apart, phase 1 first.',
  details:
    'Positive sequence (default) is 1→2→3: phase 1 at angle, phase 2 at angle − 120°, phase 3 at angle + 120°, ' +
    'i.e. phase 1 times 1, a², a with the operator a = 1∠120°. Negative sequence swaps phases 2 and 3 ' +
    '(phase 2 at angle + 120°). The magnitude is whatever quantity you give (volts, amperes, ohms).',
  params: [
    { name: 'magnitude', type: 'scalar', description: 'Magnitude of every phase (a number of 0 or more), e.g. 230 for 230 V.' },
    { name: 'sequence', type: 'scalar', optional: true, description: '"positive" (default) or "negative".' },
    { name: 'angle', type: 'scalar', optional: true, description: 'Angle of phase 1 in degrees (default 0).' },
    DIGITS,
  ],
  result: 'A 3×1 column of polar text: phases 1, 2, 3.',
  errors: [
    'A negative or non-numeric magnitude, a non-numeric angle, or a sequence other than "positive"/"negative" gives #VALUE!.',
  ],
  examples: [
    { formula: '=PHZ.BALANCED(230)', result: [['230∠0°'], ['230∠-120°'], ['230∠120°']] },
    { formula: '=PHZ.BALANCED(400, "negative", 30)', result: [['400∠30°'], ['400∠150°'], ['400∠-90°']] },
  ],
  implementation: (magnitude, sequence, angle, digits) => {
    const d = readDigits(digits);
    const m = readNumber(magnitude, 'magnitude', { units: ['V', 'A'] });
    if (m < 0) throw new PhzError(M.negativeMagnitude('magnitude', m));
    const seq = readChoice(sequence, 'sequence', ['positive', 'negative'] as const, 'positive');
    const a = readNumber(angle, 'angle', { default: 0 });
    return setColumn(balancedSet(polarDeg(m, a), seq), d);
  },
});
