/**
 * Worked sheets: time to plan the largest sheet (pure: inputs → plan) and to write it into
 * the preview workbook (new sheet, names, every formula evaluated by the engine). Called
 * by `npm run bench` (bench/run.ts); figures are printed, never asserted. Inputs vary from
 * run to run (the demo's impedances and voltages scaled), as a person adjusting a case would.
 */
import { PhzEngine } from '../src/preview/engine';
import { writePlanToWorkbook } from '../src/preview/sheets';
import { Workbook } from '../src/preview/workbook';
import { demoValues, type Calculation, type FieldValue } from '../src/taskpane/sheets/calculation';
import { calculations } from '../src/taskpane/sheets/calculations';

const META = { scenario: 'Bench', date: '2026-12-02' };

/** The calculation whose demo sheet has the most cells. */
export function largest(): { calc: Calculation; cells: number } {
  let best = { calc: calculations[0], cells: 0 };
  for (const calc of calculations) {
    const cells = calc.plan(demoValues(calc), META).cells.length;
    if (cells > best.cells) best = { calc, cells };
  }
  return best;
}

/** The demo with every phasor scaled by `k` (text) and numbers left alone: a varied, valid case. */
function varied(calc: Calculation, k: number): Record<string, FieldValue> {
  const out: Record<string, FieldValue> = { ...demoValues(calc) };
  for (const f of calc.fields) {
    const v = out[f.id];
    if (f.kind === 'phasor' && typeof v === 'string') {
      const m = /^([0-9.]+)(.*)$/.exec(v);
      if (m && Number(m[1]) > 0) out[f.id] = `${(Number(m[1]) * k).toPrecision(6)}${m[2]}`;
    }
  }
  return out;
}

/** Best µs to plan the largest sheet. */
export function benchPlan(): number {
  const { calc } = largest();
  const cases = [0.9, 0.95, 1, 1.05, 1.1].map((k) => varied(calc, k));
  let sink = 0;
  let best = Infinity;
  for (let r = 0; r < 7; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < 200; i++) sink += calc.plan(cases[i % cases.length], META).cells.length;
    best = Math.min(best, Number(process.hrtime.bigint() - t0) / 1e3 / 200);
  }
  if (sink === -1) console.log(sink);
  return best;
}

/** Best ms to write the largest sheet into a preview workbook (engine built beforehand). */
export function benchWrite(): number {
  const { calc } = largest();
  let best = Infinity;
  for (let r = 0; r < 7; r++) {
    const plan = calc.plan(varied(calc, 0.9 + 0.03 * r), META);
    const wb = new Workbook(new PhzEngine({ sheets: { Existing: [['230∠0']] } }));
    const t0 = process.hrtime.bigint();
    writePlanToWorkbook(wb, plan);
    best = Math.min(best, Number(process.hrtime.bigint() - t0) / 1e6);
    wb.hf.destroy();
  }
  return best;
}
