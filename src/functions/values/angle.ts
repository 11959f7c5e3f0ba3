import { angleDeg, angleRad } from '../../core/phasor';
import { defineFunction } from '../spec';
import { column, readChoice, readPhasors } from '../readers';
import { READS_TEXT_NOTE, phasorParam } from '../params';

/** Angle of each phasor, degrees in (−180, 180] or radians. */
export const ANGLE = defineFunction({
  name: 'ANGLE',
  group: 'values',
  summary: 'Angle of each phasor, in degrees (−180, 180] or, with "rad", radians; 0 for a zero phasor.',
  details: READS_TEXT_NOTE,
  params: [
    phasorParam('z', 'Phasors in any notation'),
    { name: 'unit', type: 'scalar', optional: true, description: '"deg" (default) or "rad".' },
  ],
  result: 'Numbers; one row per phasor.',
  errors: ['A blank cell, text that is not a phasor, or an unknown unit gives #VALUE!.'],
  examples: [
    { formula: '=PHZ.ANGLE("-1-j1")', result: [[-135]] },
    { formula: '=PHZ.ANGLE("-2")', result: [[180]] },
  ],
  implementation: (z, unit) => {
    const u = readChoice(unit, 'unit', ['deg', 'rad'] as const, 'deg');
    return column(readPhasors(z, 'z').map(u === 'rad' ? angleRad : angleDeg));
  },
});
