import { defineFunction } from '../spec';
import { ADD, addValues } from './add';

/** PHZ.ADD to 15 significant figures. */
export const ADDFULL = defineFunction({
  name: 'ADDFULL',
  group: 'arithmetic',
  summary: 'PHZ.ADD to 15 significant figures: the phasor sum of every value given, for chains whose later steps need the figures.',
  details:
    'The same sum as PHZ.ADD, with the same arguments, shown to 15 significant figures (as many as a spreadsheet ' +
    'keeps) instead of 6. Use it where the result feeds another function, since a 6-figure text carries its rounding ' +
    'into every later step; for fewer figures on show, wrap it: PHZ.TOPOLAR(PHZ.ADDFULL(…), 4).',
  params: ADD.params,
  result: 'One phasor, polar text to 15 significant figures.',
  errors: ADD.errors,
  examples: [
    { formula: '=PHZ.ADDFULL("7+j5", "1-j6", 3)', result: [['11.0453610171873∠-5.19442890773481°']] },
    { formula: '=PHZ.ADDFULL("10∠0", "10∠-120", "10∠120")', result: [['0']] },
  ],
  implementation: (z) => addValues(z, 15),
});
