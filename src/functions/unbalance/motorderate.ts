import { motorDerate } from '../../core/threephase';
import { readNumber } from '../readers';
import { defineFunction } from '../spec';

/** NEMA MG 1 motor derating factor for voltage unbalance. */
export const MOTORDERATE = defineFunction({
  name: 'MOTORDERATE',
  group: 'unbalance',
  summary: 'Derating factor for a polyphase induction motor on an unbalanced supply (NEMA MG 1 curve), 0–5 % unbalance.',
  details:
    'Linear interpolation on the NEMA MG 1 derating curve for medium motors (Part 14, effects of unbalanced voltages): ' +
    '1.00 up to 1 %, 0.97 at 1.5 %, 0.95 at 2 %, 0.93 at 2.5 %, 0.89 at 3 %, 0.85 at 3.5 %, 0.82 at 4 %, 0.78 at 4.5 %, ' +
    '0.76 at 5 % (points as read from the published curve). The unbalance is the NEMA percent unbalance of the line ' +
    'voltages (PHZ.UNBALANCE(…, "LVUR")). NEMA MG 1 advises against operating a motor above 5 % unbalance, so no ' +
    'factor is given there. Multiply the motor’s rated output by the factor.',
  params: [{ name: 'unbalance_pct', type: 'scalar', description: 'Voltage unbalance in percent (0 to 5).' }],
  result: 'A number between 0.76 and 1.',
  errors: ['A negative or non-numeric unbalance gives #VALUE!; above 5 % gives #N/A (the standard advises against operation).'],
  cautions: ['The curve is for motors of NEMA MG 1 design; check the motor maker’s data, and correct the supply unbalance where you can.'],
  examples: [
    { formula: '=PHZ.MOTORDERATE(3)', result: [[0.89]] },
    { formula: '=PHZ.MOTORDERATE(0.8)', result: [[1]] },
  ],
  implementation: (pct) => [[motorDerate(readNumber(pct, 'unbalance_pct'))]],
});
