import { PhzError } from '../../core/errors';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import { magnitude } from '../../core/phasor';
import { neutral120 } from '../../core/threephase';
import { asMatrix } from '../readers';
import { defineFunction } from '../spec';
import { cellName, isPairBlock, phaseRows } from '../sets/_threephase';

function checkNotNegative(arg: unknown, name: string): void {
  const m = asMatrix(arg);
  if (isPairBlock(m)) return;
  m.forEach((row, r) =>
    row.forEach((v, c) => {
      if (typeof v === 'number' && v < 0) throw new PhzError(M.negativeCurrent(cellName(name, m, r, c), v));
    }),
  );
}

/** Neutral current estimated from the three phase-current magnitudes. */
export const NEUTRAL120 = defineFunction({
  name: 'NEUTRAL120',
  group: 'neutral',
  summary: 'Neutral current from phase-current magnitudes only: √(Ia² + Ib² + Ic² − Ia·Ib − Ib·Ic − Ic·Ia).',
  details:
    'Valid only when the three currents are 120° apart and at the same power factor (loads of one kind on a ' +
    'balanced supply); then it equals the magnitude of the phasor sum. For loads of different power factors, or ' +
    'an unbalanced supply, it is wrong: use PHZ.NEUTRAL with phasors. Phasors may be given; only their magnitudes ' +
    'are used. A blank is 0 A. Works down columns (one result per row); i2 and i3 may be omitted when i1 holds ' +
    'the three currents.',
  params: [
    { name: 'i1', type: 'matrix', description: 'Phase 1 current magnitudes (A), or one range of three / three columns.' },
    { name: 'i2', type: 'matrix', optional: true, description: 'Phase 2 current magnitudes.' },
    { name: 'i3', type: 'matrix', optional: true, description: 'Phase 3 current magnitudes.' },
  ],
  result: 'Numbers (same unit as the currents), one per row.',
  errors: ['A negative number, text that is not a current, other than three currents per row, or different column lengths give #VALUE!.'],
  examples: [
    { formula: '=PHZ.NEUTRAL120(20, 10, 10)', result: [[10]] },
    { formula: '=PHZ.NEUTRAL120({30;20;20})', result: [[10]] },
  ],
  implementation: (i1, i2, i3) => {
    checkNotNegative(i1, 'i1');
    checkNotNegative(i2, 'i2');
    checkNotNegative(i3, 'i3');
    const rows = phaseRows([i1, i2, i3], ['i1', 'i2', 'i3'], 'i1', 'current');
    return rows.map((t) => {
      const [a, b, c] = t.map((z) => (z === null ? 0 : magnitude(z)));
      return [neutral120(a, b, c)];
    });
  },
});
