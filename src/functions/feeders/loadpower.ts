import { PhzError } from '../../core/errors';
import { feederMessages as M } from '../../core/messages/feeders';
import { ZERO, rect } from '../../core/phasor';
import { defineFunction } from '../spec';
import { phasorColumn, readDigits } from '../readers';
import { DIGITS } from '../params';
import { isOmitted } from '../sets/_threephase';
import { loadPower, readFraction, readLoad, readPowerFactor, scheduleColumn } from './_schedule';

/** Complex power of schedule entries: load with its unit word, power factor with "lead". */
export const LOADPOWER = defineFunction({
  name: 'LOADPOWER',
  group: 'feeders',
  summary: 'Complex power S = P + jQ of each circuit of a schedule, from its load in W, kW, VA or kVA and its power factor.',
  details:
    'Reads the load, power-factor and demand columns the way PHZ.SCHEDULE does. A load in W is real power P, so |S| = P/pf; a load in VA is ' +
    'apparent power, so P = |S|·pf; a plain number is W. Q = |S|·sin φ, positive for a lagging (inductive) load and negative when the ' +
    'power factor is followed by the word lead (0.9 lead; lag, ind and cap are read too). A negative power factor is refused, never read ' +
    'as leading. The demand factor (0 to 1, or 80 %) scales P and Q. A blank or 0 load is a spare way: its S is 0 and its power factor ' +
    'may be blank. Use it for a column of S beside a schedule, or to check a circuit that PHZ.SCHEDULE adds.',
  params: [
    { name: 'load', type: 'matrix', description: 'Loads: a number is W; or text in W, kW, VA, kVA ("2.2 kW"). Blank or 0 = spare (S = 0).' },
    { name: 'power_factor', type: 'matrix', description: 'Power factors (a column, or one for all), lagging; "0.9 lead" for leading. Not negative.' },
    { name: 'demand', type: 'matrix', optional: true, description: 'Demand factors, 0 to 1 or "80 %" (a column, or one for all; default 1).' },
    DIGITS,
  ],
  result: 'Polar text, one row per load: S in VA when the loads are in W or VA.',
  errors: [
    'A load in a unit other than W or VA, a negative load, a power factor that is blank (with a load), negative or above 1, or a demand factor outside 0–1 gives #VALUE! naming the row.',
    'Columns of different lengths (power_factor and demand one value or as many as the loads) give #VALUE!.',
  ],
  examples: [
    { formula: '=PHZ.LOADPOWER("8 kW", 0.8)', result: [['10000∠36.8699°']] },
    { formula: '=PHZ.LOADPOWER({"10 kVA";"2 kW";""}, {"0.8 lead";1;""}, "50 %")', result: [['5000∠-36.8699°'], ['1000∠0°'], ['0']] },
  ],
  implementation: (load, powerFactor, demand, digits) => {
    const d = readDigits(digits);
    const loads = scheduleColumn(load, 'load');
    const pfs = scheduleColumn(powerFactor, 'power_factor');
    const dm = isOmitted(demand) ? null : scheduleColumn(demand, 'demand');
    const n = loads.cells.length;
    const bad = [['power_factor', pfs.cells.length], ['demand', dm ? dm.cells.length : 1]].filter(([, len]) => len !== 1 && len !== n);
    if (bad.length > 0) throw new PhzError(M.rowCounts([['load', n], ...bad].map(([k, c]) => `${k}: ${c}`).join(', ')));
    const out = [];
    for (let i = 0; i < n; i++) {
      const l = readLoad(loads.cells[i], loads.at(i));
      if (l === null || l.value === 0) {
        out.push(ZERO);
        continue;
      }
      const j = pfs.cells.length === 1 ? 0 : i;
      const pf = readPowerFactor(pfs.cells[j], pfs.at(j));
      if (pf === null) throw new PhzError(M.powerFactorBlank(pfs.at(j)));
      let f = 1;
      if (dm) {
        const k = dm.cells.length === 1 ? 0 : i;
        f = readFraction(dm.cells[k], dm.at(k), 'a demand factor') ?? 1;
      }
      const s = loadPower(l, pf, f);
      out.push(rect(s.re, s.im));
    }
    return phasorColumn(out, d);
  },
});
