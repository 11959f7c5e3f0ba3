import { lineVoltages } from '../../core/threephase';
import { defineFunction } from '../spec';
import { readDigits } from '../readers';
import { DIGITS, phasorParam } from '../params';
import { readTriple, setColumn } from './_threephase';

/** Line-to-line voltages of a set of phase voltages. */
export const LINEVOLTS = defineFunction({
  name: 'LINEVOLTS',
  group: 'sets',
  summary: 'Line-to-line voltages V12, V23, V31 of three phase (line-to-neutral) voltages.',
  details:
    'V12 = V1 − V2, V23 = V2 − V3, V31 = V3 − V1. For a balanced positive-sequence set each line voltage is √3 times ' +
    'the phase voltage and leads it by 30° (V12 leads V1).',
  params: [phasorParam('phase_set', 'Phase voltages V1, V2, V3 (three)'), DIGITS],
  result: 'A 3×1 column of polar text: V12, V23, V31.',
  errors: ['Other than three values, a blank cell or text that is not a phasor gives #VALUE!.'],
  examples: [{ formula: '=PHZ.LINEVOLTS({"230∠0";"230∠-120";"230∠120"})', result: [['398.372∠30°'], ['398.372∠-90°'], ['398.372∠150°']] }],
  implementation: (phaseSet, digits) => {
    const d = readDigits(digits);
    return setColumn(lineVoltages(readTriple(phaseSet, 'phase_set', 'phase voltages V1, V2, V3', 'voltage')), d);
  },
});
