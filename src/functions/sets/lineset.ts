import { PhzError } from '../../core/errors';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import { lineSetFromMagnitudes } from '../../core/threephase';
import { defineFunction } from '../spec';
import { readDigits, readNumber, readNumbers } from '../readers';
import { DIGITS } from '../params';
import { setColumn } from './_threephase';

/** A closed line-voltage set from three measured line-to-line magnitudes. */
export const LINESET = defineFunction({
  name: 'LINESET',
  group: 'sets',
  summary: 'A closed set of line-to-line voltages V12, V23, V31 from their three measured magnitudes (law of cosines).',
  details:
    'Meters often give line-voltage magnitudes only. Line voltages sum to zero, so the three phasors are the sides of ' +
    'a triangle with those lengths: the angle γ between V12 and V23 follows from the law of cosines, ' +
    'cos γ = (|V12|² + |V23|² − |V31|²)/(2·|V12|·|V23|), computed in a form that keeps its digits for flat ' +
    'triangles. Positive sequence (V23 lags V12); V12 at angle, 30° by default, so equal magnitudes give the line ' +
    'voltages of BALANCED phase voltages at 0°, −120°, +120°, and STARVOLTS of the result puts V1 near 0°. The set ' +
    'closes exactly, so it can go straight into DELTALOAD, STARVOLTS or UNBALANCE.',
  params: [
    { name: 'magnitudes', type: 'matrix', description: 'Measured magnitudes |V12|, |V23|, |V31|: three numbers above 0, in a row or a column.' },
    { name: 'angle', type: 'scalar', optional: true, description: 'Angle of V12 in degrees (default 30).' },
    DIGITS,
  ],
  result: 'A 3×1 column of polar text: V12, V23, V31.',
  errors: [
    'Other than three numbers, a blank or non-numeric cell, a magnitude of 0 or below, or magnitudes of which one exceeds the sum of the other two (no triangle) give #VALUE!.',
  ],
  examples: [
    { formula: '=PHZ.LINESET({400;400;400})', result: [['400∠30°'], ['400∠-90°'], ['400∠150°']] },
    { formula: '=PHZ.LINESET({300;400;500}, 0, 4)', result: [['300∠0°'], ['400∠-90°'], ['500∠126.9°']] },
  ],
  implementation: (magnitudes, angle, digits) => {
    const d = readDigits(digits);
    const m = readNumbers(magnitudes, 'magnitudes', { units: ['V'] });
    if (m.length !== 3) throw new PhzError(M.needThree('magnitudes', m.length, '|V12|, |V23|, |V31|'));
    const a = readNumber(angle, 'angle', { default: 30 });
    return setColumn(lineSetFromMagnitudes([m[0], m[1], m[2]], a, 'magnitudes'), d);
  },
});
