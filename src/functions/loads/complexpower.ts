import { complexPowerFromPf } from '../../core/threephase';
import { defineFunction } from '../spec';
import { phasorColumn, readBoolean, readDigits, readNumbers, zipWith } from '../readers';
import { DIGITS } from '../params';

/** Complex power from real power and power factor. */
export const COMPLEXPOWER = defineFunction({
  name: 'COMPLEXPOWER',
  group: 'loads',
  summary: 'Complex power S = P + jQ from real power and power factor, row by row.',
  details:
    'Q = P·tan(acos pf) = P·√(1 − pf²)/pf, positive for a lagging (inductive) load, negative when leading is TRUE ' +
    '(the convention S = V·I*). The power factor is the magnitude, above 0 and at most 1. A negative P (power ' +
    'delivered) gives Q of the opposite sign by the same formula. Units follow P: W give VA. real_power may carry its ' +
    'unit, "4 kW" or "0,5 MW"; a value in var or VA is refused, since it is not a real power.',
  params: [
    { name: 'real_power', type: 'matrix', description: 'Real power P in W, e.g. 7360 or "7.36 kW" (a number or a column of numbers).' },
    { name: 'power_factor', type: 'matrix', description: 'Power factor, above 0 and at most 1 (a number or a column).' },
    { name: 'leading', type: 'scalar', optional: true, description: 'TRUE for a leading (capacitive) load; default FALSE (lagging).' },
    DIGITS,
  ],
  result: 'Polar text, one row per pair: S in VA when P is in W.',
  errors: ['A power factor of 0 or less or above 1, a blank or non-numeric cell, or different counts give #VALUE!.'],
  examples: [
    { formula: '=PHZ.COMPLEXPOWER(8000, 0.8)', result: [['10000∠36.8699°']] },
    { formula: '=PHZ.COMPLEXPOWER(8000, 0.8, TRUE())', result: [['10000∠-36.8699°']] },
  ],
  implementation: (realPower, powerFactor, leading, digits) => {
    const d = readDigits(digits);
    const lead = readBoolean(leading, 'leading', false);
    const ps = readNumbers(realPower, 'real_power', { units: ['W'] });
    const pfs = readNumbers(powerFactor, 'power_factor');
    const many = pfs.length > 1;
    return phasorColumn(
      zipWith(ps, 'real_power', pfs.map((pf, i) => [pf, i] as const), 'power_factor', (p, [pf, i]) =>
        complexPowerFromPf(p, pf, lead, many ? `power_factor, row ${i + 1}` : 'power_factor'),
      ),
      d,
    );
  },
});
