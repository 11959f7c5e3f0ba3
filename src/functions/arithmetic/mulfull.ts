import { defineFunction } from '../spec';
import { MUL, mulValues } from './mul';

/** PHZ.MUL to 15 significant figures. */
export const MULFULL = defineFunction({
  name: 'MULFULL',
  group: 'arithmetic',
  summary: 'PHZ.MUL to 15 significant figures: the product of every value given, for chains whose later steps need the figures.',
  details:
    'The same product as PHZ.MUL, with the same arguments, shown to 15 significant figures (as many as a ' +
    'spreadsheet keeps) instead of 6. Use it where the result feeds another function; for fewer figures on show, ' +
    'wrap it: PHZ.TOPOLAR(PHZ.MULFULL(…), 4).',
  params: MUL.params,
  result: 'One phasor, polar text to 15 significant figures.',
  errors: MUL.errors,
  examples: [{ formula: '=PHZ.MULFULL("10∠-30", "4+j3")', result: [['50∠6.86989764584402°']] }],
  implementation: (z) => mulValues(z, 15),
});
