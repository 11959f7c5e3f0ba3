import { starVoltages } from '../../core/threephase';
import { defineFunction } from '../spec';
import { readDigits } from '../readers';
import { DIGITS, phasorParam } from '../params';
import { readTriple, setColumn } from './_threephase';

/** The star (phase) set with given line voltages and no zero-sequence part. */
export const STARVOLTS = defineFunction({
  name: 'STARVOLTS',
  group: 'sets',
  summary: 'The star (phase) voltages with the given line-to-line voltages and no zero-sequence part.',
  details:
    'V1 = (V12 − V31)/3, V2 = (V23 − V12)/3, V3 = (V31 − V23)/3: the only phase set with those line voltages whose ' +
    'phasors sum to zero (the star point at the centroid of the line-voltage triangle). Line voltages physically sum ' +
    'to zero; a residual V12 + V23 + V31 up to 1 % of their mean magnitude (values typed at 4 figures, meter angles ' +
    'at 0.1°) is rounding and cancels in these differences (it is the zero-sequence part, which line voltages cannot ' +
    'have); a larger residual is an error. For magnitudes only, build the set with LINESET.',
  params: [phasorParam('line_set', 'Line-to-line voltages V12, V23, V31 (three)'), DIGITS],
  result: 'A 3×1 column of polar text: V1, V2, V3.',
  errors: ['Other than three values, a blank cell, text that is not a phasor, or a set whose sum is more than 1 % of its mean magnitude gives #VALUE!.'],
  examples: [{ formula: '=PHZ.STARVOLTS({"400∠30";"400∠-90";"400∠150"})', result: [['230.94∠0°'], ['230.94∠-120°'], ['230.94∠120°']] }],
  implementation: (lineSet, digits) => {
    const d = readDigits(digits);
    return setColumn(starVoltages(readTriple(lineSet, 'line_set', 'line voltages V12, V23, V31', 'voltage'), 'line_set'), d);
  },
});
