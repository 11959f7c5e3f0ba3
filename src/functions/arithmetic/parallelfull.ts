import { defineFunction } from '../spec';
import { PARALLEL, parallelValues } from './parallel';

/** PHZ.PARALLEL to 15 significant figures. */
export const PARALLELFULL = defineFunction({
  name: 'PARALLELFULL',
  group: 'arithmetic',
  summary: 'PHZ.PARALLEL to 15 significant figures: branches in parallel, 1 / Σ(1/Zk), for chains whose later steps need the figures.',
  details:
    'The same impedance as PHZ.PARALLEL, with the same arguments and rules, shown to 15 significant figures (as ' +
    'many as a spreadsheet keeps) instead of 6. Use it where the result feeds another function; for fewer figures ' +
    'on show, wrap it: PHZ.TOPOLAR(PHZ.PARALLELFULL(…), 4).',
  params: PARALLEL.params,
  result: 'One impedance, polar text to 15 significant figures.',
  errors: PARALLEL.errors,
  examples: [{ formula: '=PHZ.PARALLELFULL("10", "j10")', result: [['7.07106781186547∠45°']] }],
  implementation: (z) => parallelValues(z, 15),
});
