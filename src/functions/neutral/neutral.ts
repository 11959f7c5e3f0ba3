import { sumOf, type Phasor } from '../../core/phasor';
import { defineFunction, type HostResult } from '../spec';
import { phasorColumn } from '../readers';
import { phaseRows, repeatGroups } from '../sets/_threephase';

/** The neutral currents of the repeating argument as polar text of `digits` figures (NEUTRAL and NEUTRALFULL). */
export function neutralValues(i1: unknown, digits: number): HostResult {
  const rows = phaseRows(repeatGroups(i1), ['i1', 'i2', 'i3'], 'currents', 'current');
  return phasorColumn(
    rows.map((t) => sumOf(t.filter((z): z is Phasor => z !== null))),
    digits,
  );
}

/** Neutral current: the phasor sum of the three phase currents. */
export const NEUTRAL = defineFunction({
  name: 'NEUTRAL',
  group: 'neutral',
  summary: 'Neutral current of a four-wire circuit: the phasor sum I1 + I2 + I3 (Kirchhoff’s current law at the star point).',
  details:
    'Give one range of three currents, a range with three columns (one neutral current per row, e.g. a panel ' +
    'schedule with one circuit per row), or three currents i1, i2, i3 — single values or equal columns. A blank cell ' +
    'is a phase with no current. Fundamental-frequency phasors only: for triplen harmonics use NEUTRALRMS. The ' +
    'currents argument repeats, so it must come last and NEUTRAL takes no digits argument: results have 6 ' +
    'significant figures; PHZ.NEUTRALFULL(i1, …) takes the same currents and shows 15, for a chain whose later ' +
    'steps need the figures (PHZ.REAL or PHZ.IMAG of a 6-figure result has those 6 figures only).',
  params: [{ name: 'i1', type: 'repeat', description: 'Phase currents: one range of three, a three-column range, or i1, i2, i3 (cells, columns or pairs).' }],
  result: 'Polar text: one neutral current, or one per row.',
  errors: ['Other than three currents per row, two or more than three arguments, different column lengths, or text that is not a phasor give #VALUE!.'],
  examples: [
    { formula: '=PHZ.NEUTRAL({"10∠0";"10∠-120";"10∠120"})', result: [['0']] },
    { formula: '=PHZ.NEUTRAL("20∠0", "10∠-120", "10∠120")', result: [['10∠0°']] },
    { formula: '=PHZ.NEUTRAL({"12∠0","8∠-120","10∠120";"5∠0","5∠-120",""})', result: [['3.4641∠30°'], ['5∠-60°']] },
  ],
  fullTwin: 'NEUTRALFULL',
  implementation: (i1) => neutralValues(i1, 6),
});
