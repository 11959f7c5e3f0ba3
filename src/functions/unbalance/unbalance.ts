import { PhzError } from '../../core/errors';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import { magnitude } from '../../core/phasor';
import { magUnbalance, maxDeviation, vuf, zeroUnbalance, type Triple, type UnbalanceMethod } from '../../core/threephase';
import { asMatrix, readChoice } from '../readers';
import { defineFunction } from '../spec';
import { cellName, isPairBlock, isPlainNumbers, readTriple } from '../sets/_threephase';

const METHODS = ['VUF', 'ZERO', 'LVUR', 'PVUR', 'MAG'] as const satisfies readonly UnbalanceMethod[];

function magnitudes(values: unknown): Triple<number> {
  const m = asMatrix(values);
  if (!isPairBlock(m)) {
    m.forEach((row, r) =>
      row.forEach((v, c) => {
        if (typeof v === 'number' && v < 0) throw new PhzError(M.negativeMagnitudeValue(cellName('values', m, r, c), v));
      }),
    );
  }
  const t = readTriple(values, 'values', 'three voltages (or currents)');
  return [magnitude(t[0]), magnitude(t[1]), magnitude(t[2])];
}

/** Voltage (or current) unbalance in percent, by a named definition. */
export const UNBALANCE = defineFunction({
  name: 'UNBALANCE',
  group: 'unbalance',
  summary: 'Unbalance of three voltages (or currents) in percent: VUF (default), ZERO, LVUR, PVUR or MAG.',
  details:
    'VUF: |negative sequence| / |positive sequence| × 100 (the voltage unbalance factor of IEC 61000-4-30; IEEE Std ' +
    '1159 also defines unbalance by this sequence ratio), from phasors — line or phase values give the same result. ' +
    'ZERO: |zero| / |positive| × 100, ' +
    'from phase values. LVUR: the largest deviation of the three line-voltage magnitudes from their average, over ' +
    'the average × 100 (NEMA MG 1 "percent unbalance"). PVUR: the same on phase magnitudes (the phase voltage ' +
    'unbalance rate of IEEE Std 112, the test procedure for polyphase induction motors). MAG: the IEC 61000-4-30 ' +
    'formula from the three line-voltage magnitudes only, ' +
    'u2 = √((1 − √(3 − 6β))/(1 + √(3 − 6β))) × 100 with β = ΣU⁴/(ΣU²)² — equal to VUF for a three-wire supply. ' +
    'LVUR, PVUR and MAG accept plain numbers (magnitudes); VUF and ZERO need phasors.',
  params: [
    {
      name: 'values',
      type: 'matrix',
      description: 'Three voltages or currents: phasors such as 400∠0 (a range or real/imaginary columns), or magnitudes for LVUR, PVUR, MAG.',
    },
    { name: 'method', type: 'scalar', optional: true, description: '"VUF" (default), "ZERO", "LVUR", "PVUR" or "MAG".' },
  ],
  result: 'A number: the unbalance in percent.',
  errors: [
    'Other than three values, an unknown method, plain numbers for VUF or ZERO, a zero positive sequence or average, a negative magnitude, or MAG magnitudes that cannot close a triangle give #VALUE!.',
  ],
  examples: [
    { formula: '=PHZ.UNBALANCE({400;404;396}, "LVUR")', result: [[1]] },
    { formula: '=PHZ.UNBALANCE({"230∠0";"230∠-120";"0"})', result: [[50]] },
  ],
  implementation: (values, method) => {
    const how = readChoice(method, 'method', METHODS, 'VUF');
    if (how === 'LVUR' || how === 'PVUR') return [[maxDeviation(magnitudes(values), 'values')]];
    if (how === 'MAG') return [[magUnbalance(magnitudes(values), 'values')]];
    if (isPlainNumbers(values)) throw new PhzError(M.needPhasors(how));
    const t = readTriple(values, 'values', 'three voltages (or currents)');
    return [[how === 'VUF' ? vuf(t, 'values') : zeroUnbalance(t, 'values')]];
  },
});
