import { PhzError } from '../../core/errors';
import { valueMessages as M } from '../../core/messages';
import { polarDeg, polar } from '../../core/phasor';
import { defineFunction } from '../spec';
import { readChoice, readDigits, readNumbers, zipWith, phasorColumn } from '../readers';
import { DIGITS } from '../params';

/** Makes phasors from columns of magnitudes and angles. */
export const FROMPOLAR = defineFunction({
  name: 'FROMPOLAR',
  group: 'values',
  summary: 'Makes phasors from magnitudes and angles (columns, row by row).',
  params: [
    { name: 'magnitude', type: 'matrix', description: 'Magnitudes (0 or more): a number or a column of numbers.' },
    { name: 'angle', type: 'matrix', description: 'Angles, in degrees unless unit is "rad": a number or a column.' },
    { name: 'unit', type: 'scalar', optional: true, description: 'Angle unit: "deg" (default) or "rad".' },
    DIGITS,
  ],
  result: 'Polar text, one row per magnitude/angle pair (a single value is used for every row).',
  errors: ['A negative magnitude, a blank or non-numeric cell, or columns of different lengths give #VALUE!.'],
  examples: [
    { formula: '=PHZ.FROMPOLAR(230, -120)', result: [['230∠-120°']] },
    { formula: '=PHZ.FROMPOLAR(10, {0;90;180})', result: [['10∠0°'], ['10∠90°'], ['10∠180°']] },
    { formula: '=PHZ.FROMPOLAR(2, PI()/2, "rad")', result: [['2∠90°']] },
  ],
  implementation: (magnitude, angle, unit, digits) => {
    const u = readChoice(unit, 'unit', ['deg', 'rad'] as const, 'deg');
    const d = readDigits(digits);
    const mags = readNumbers(magnitude, 'magnitude');
    mags.forEach((m, i) => {
      if (m < 0) throw new PhzError(M.negativeMagnitude(mags.length > 1 ? `magnitude, row ${i + 1}` : 'magnitude', m));
    });
    const angles = readNumbers(angle, 'angle');
    const zs = zipWith(mags, 'magnitude', angles, 'angle', (m, a) => (u === 'rad' ? polar(m, a) : polarDeg(m, a)));
    return phasorColumn(zs, d);
  },
});
