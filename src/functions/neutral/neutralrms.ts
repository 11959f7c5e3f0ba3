import { PhzError } from '../../core/errors';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import { neutralRms, type Harmonic } from '../../core/threephase';
import { asMatrix, isBlank, readNumber } from '../readers';
import { defineFunction } from '../spec';
import { phasorParam } from '../params';
import { readTriple } from '../sets/_threephase';
import { SIZING_CAUTIONS } from './_cautions';

function readHarmonics(arg: unknown): Harmonic[] {
  const m = asMatrix(arg).filter((row) => !row.every(isBlank));
  if (m.length === 0) return [];
  const cols = m[0].length;
  if (cols !== 2 && cols !== 4) throw new PhzError(M.harmonicShape(cols));
  const seen = new Set<number>();
  return m.map((row, r) => {
    const at = (c: number): string => `harmonics, row ${r + 1} column ${c + 1}`;
    const order = readNumber(row[0], at(0));
    if (!Number.isInteger(order) || order < 2) throw new PhzError(M.harmonicOrder(`harmonics, row ${r + 1}`, order));
    if (seen.has(order)) throw new PhzError(M.harmonicDuplicate(order));
    seen.add(order);
    const pct = (c: number): number => {
      const p = readNumber(row[c], at(c));
      if (p < 0) throw new PhzError(M.harmonicPercent(at(c), p));
      return p;
    };
    const percent: [number, number, number] = cols === 2 ? [pct(1), pct(1), pct(1)] : [pct(1), pct(2), pct(3)];
    return { order, percent };
  });
}

/** rms neutral current with harmonics. */
export const NEUTRALRMS = defineFunction({
  name: 'NEUTRALRMS',
  group: 'neutral',
  summary: 'rms neutral current of three phase currents with harmonics: triplens add in the neutral, the others cancel when balanced.',
  details:
    'currents are the fundamental phasors of phases 1–3. Each harmonics row is [order, percent] (the same content ' +
    'on every phase) or [order, percent 1, percent 2, percent 3], in percent of that phase’s fundamental current. ' +
    'Phase k’s harmonic of order h has magnitude p/100·|I_k| and angle h·θ_k (a waveform shifted by θ at the ' +
    'fundamental is shifted by h·θ at harmonic h), so with 120° spacing the orders 3, 9, 15 … add in phase and the ' +
    'others form balanced sets that cancel. The rms neutral current is √(|I_N,1|² + Σ|I_N,h|²) over the fundamental ' +
    'and every order given (components of different frequencies add in rms by root-sum-square). Blank rows are skipped.',
  params: [
    phasorParam('currents', 'Fundamental phase currents I1, I2, I3 (three)'),
    { name: 'harmonics', type: 'matrix', description: 'Rows of [order, percent] or [order, p1, p2, p3]; order a whole number ≥ 2, percent ≥ 0.' },
  ],
  result: 'A number: the rms neutral current (same unit as the currents).',
  errors: [
    'Other than three currents, a table that is not 2 or 4 columns wide, an order below 2 or not whole, a repeated order, or a percentage below 0 gives #VALUE!.',
  ],
  cautions: SIZING_CAUTIONS,
  examples: [
    { formula: '=PHZ.NEUTRALRMS({"100∠0";"100∠-120";"100∠120"}, {3,30;5,20})', result: [[90]] },
    { formula: '=PHZ.NEUTRALRMS({"100∠0";"100∠-120";"100∠120"}, {5,20;7,14})', result: [[0]] },
  ],
  implementation: (currents, harmonics) => {
    const i = readTriple(currents, 'currents', 'fundamental phase currents I1, I2, I3', 'current');
    return [[neutralRms(i, readHarmonics(harmonics)).rms]];
  },
});
