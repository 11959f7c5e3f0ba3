import { defineFunction } from '../spec';
import { NEUTRAL, neutralValues } from './neutral';

/** PHZ.NEUTRAL to 15 significant figures. */
export const NEUTRALFULL = defineFunction({
  name: 'NEUTRALFULL',
  group: 'neutral',
  summary: 'PHZ.NEUTRAL to 15 significant figures: the neutral current I1 + I2 + I3, for chains whose later steps need the figures.',
  details:
    'The same neutral current as PHZ.NEUTRAL, with the same arguments and shapes, shown to 15 significant figures ' +
    '(as many as a spreadsheet keeps) instead of 6. Give it currents carried at 15 figures too (e.g. ' +
    'PHZ.DIV(V, Z, 15)): then a balanced set sums to exactly 0, where 6-figure currents leave the sum of their ' +
    'rounding. For fewer figures on show, wrap it: PHZ.TOPOLAR(PHZ.NEUTRALFULL(…), 4).',
  params: NEUTRAL.params,
  result: 'Polar text to 15 significant figures: one neutral current, or one per row.',
  errors: NEUTRAL.errors,
  examples: [{ formula: '=PHZ.NEUTRALFULL("20∠0", "10∠-118", "10∠121")', result: [['10.1581755221896∠-1.45425774691028°']] }],
  implementation: (i1) => neutralValues(i1, 15),
});
