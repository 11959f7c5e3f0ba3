import { angleDeg, magnitude } from '../../core/phasor';
import { defineFunction } from '../spec';
import { readChoice, readPhasors } from '../readers';
import { READS_TEXT_NOTE, phasorParam } from '../params';

/** Splits phasors into two numeric columns: real/imaginary, or magnitude/degrees. */
export const SPLIT = defineFunction({
  name: 'SPLIT',
  group: 'values',
  summary: 'Splits phasors into two numeric columns: real and imaginary, or with "polar" magnitude and angle in degrees.',
  details: READS_TEXT_NOTE,
  params: [
    phasorParam('z', 'Phasors in any notation'),
    { name: 'form', type: 'scalar', optional: true, description: '"rect" (default) or "polar".' },
  ],
  result: 'An n×2 block of numbers, one row per phasor.',
  errors: ['A blank cell, text that is not a phasor, or an unknown form gives #VALUE!.'],
  examples: [
    { formula: '=PHZ.SPLIT("3-j4")', result: [[3, -4]] },
    { formula: '=PHZ.SPLIT({"j2";"-5"}, "polar")', result: [[2, 90], [5, 180]] },
  ],
  implementation: (z, form) => {
    const f = readChoice(form, 'form', ['rect', 'polar'] as const, 'rect');
    return readPhasors(z, 'z').map((p) => (f === 'rect' ? [p.re, p.im] : [magnitude(p), angleDeg(p)]));
  },
});
