/**
 * The README's panel-schedule section shows exact results: the scenario's formulas are the
 * ones the demo workbook writes, every figure quoted is what the engine shows there (to the
 * figures quoted), and the inline examples give what the text says. The calculations
 * themselves are checked against their sources in test/core and test/functions; this file
 * guards the README's text.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { functions, specs } from '../src/functions';
import { PANEL_SHEET, PANEL_WAYS, loadDemo } from '../src/preview/demo';
import { PhzEngine, evaluateFormula, type DisplayValue } from '../src/preview/engine';

const readme = readFileSync(join(__dirname, '..', 'README.md'), 'utf8');
const section = readme.slice(readme.indexOf('## Panel schedules and feeders'), readme.indexOf('## Worked sheets'));

const engine = new PhzEngine({ registry: { specs, functions } });
const report = loadDemo(engine, specs);
const sheet = engine.hf.getSheetId(PANEL_SHEET)!;
const at = (address: string): DisplayValue => {
  const m = /^([A-Z])(\d+)$/.exec(address)!;
  return engine.display({ sheet, row: Number(m[2]) - 1, col: m[1].charCodeAt(0) - 65 });
};

/** A number shown with some decimals is the value rounded there (− is a minus sign). */
function expectShown(value: DisplayValue, shown: string): void {
  if (typeof value === 'string') {
    expect(value).toBe(shown);
    return;
  }
  expect(typeof value).toBe('number');
  const t = shown.replace('−', '-');
  const decimals = (t.split('.')[1] ?? '').length;
  expect(Math.abs((value as number) - Number(t)), `${value} shown as ${shown}`).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-12);
}

describe('README: panel schedules and feeders', () => {
  it('quotes the scenario’s formulas as the demo workbook writes them', () => {
    const written = report.formulas.filter((f) => f.sheet === PANEL_SHEET).map((f) => f.formula);
    for (const f of ['=PHZ.SCHEDULE(B6:B8,C11:C38,D11:D38,E11:E38,F11:F38,G11:G38,B41:C45,TRUE)', '=PHZ.VOLTDROP(B49:B51,B55,B56,"3P4W",B6:B8,,,TRUE)', '=PHZ.NEUTRALDEMAND(D52)', '=PHZ.LOADPOWER(D11,E11,G11)']) {
      expect(section).toContain(f);
      expect(written).toContain(f);
    }
    expect(section).toContain(`${PANEL_WAYS.length} ways`);
  });

  it.each([
    ['B49', '97.9364∠-24.6799°'], ['C49', '97.94'], ['D49', '20468'], ['E49', '9405'], ['F49', '22525'],
    ['B50', '119∠-137.62°'], ['C50', '119.00'], ['D50', '26086'], ['E50', '8285'], ['F50', '27370'],
    ['B51', '98.8495∠97.0044°'], ['C51', '98.85'], ['D51', '20929'], ['E51', '8882'], ['F51', '22735'],
    ['B52', '25.475∠-115.501°'], ['C52', '48.24'], ['D52', '62.57'], ['E52', '13.05'], ['F52', '72526'],
    ['B61', '3.56542∠-34.3788°'], ['C61', '2.93'], ['D61', '1.28'], ['E61', '3.26'], ['F61', '1.42'],
    ['B62', '5.0533∠-128.84°'], ['C62', '4.99'], ['D62', '2.17'], ['E62', '4.10'], ['F62', '1.78'],
    ['B63', '2.77792∠111.972°'], ['C63', '2.75'], ['D63', '1.20'], ['E63', '3.32'], ['F63', '1.44'],
    ['B66', '62.57'], ['B67', '48.24'], ['B68', '62.57'],
  ])('the scenario’s %s shows %s', (address, shown) => {
    expect(section).toContain(shown);
    expectShown(at(address), shown);
  });

  it('the inline examples give the figures the text quotes', () => {
    const one = evaluateFormula('=PHZ.SCHEDULE(230, "L1-L2", "8 kVA", 1, , , , TRUE, 4)');
    expect(section).toContain('=PHZ.SCHEDULE(230, "L1-L2", "8 kVA", 1, , , , TRUE, 4)');
    for (const [r, c, shown] of [[1, 1, '20.08∠30°'], [2, 1, '20.08∠-150°'], [1, 2, '20.08'], [1, 3, '4000'], [1, 4, '−2309'], [2, 4, '2309'], [1, 5, '4619'], [4, 4, '100'], [4, 5, '8000']] as const) {
      expectShown(one[r][c], shown);
    }
    // the halving shortcut quoted beside it: 4000 W at 230 V
    expect(section).toContain('17.39 A at 0°');
    expect(Math.abs(4000 / 230 - 17.39)).toBeLessThan(0.005);
    expect(evaluateFormula('=PHZ.LOADPOWER({"2.2 kW";"3 kVA";""}, {0.85;"0.9 lead";""})')).toEqual([['2588.24∠31.7883°'], ['3000∠-25.8419°'], ['0']]);
    expect(section).toContain('`2588.24∠31.7883°`, `3000∠-25.8419°`, `0`');
    const drop = evaluateFormula('=PHZ.VOLTDROP(32, "7.41+j0.1", 0.025, "1P", 230, 0.95, , TRUE, 4)');
    expectShown(drop[1][1], '11.86∠-17.42°');
    for (const [c, shown] of [[2, '11.34'], [3, '4.93'], [4, '11.31'], [5, '4.92']] as const) expectShown(drop[1][c], shown);
  });

  it('the solver extras paragraph gives STARLOSSES’ figures', () => {
    const t = evaluateFormula('=PHZ.STARLOSSES(PHZ.BALANCED(230), {"8.8";"9.6+j6.7";"26+j4"}, "0.3+j0.1", "0.12+j0.05", TRUE, 4)');
    expect(readme).toContain('=PHZ.STARLOSSES(PHZ.BALANCED(230), {"8.8";"9.6+j6.7";"26+j4"}, "0.3+j0.1", "0.12+j0.05", TRUE, 4)');
    for (const [r, c, shown] of [[1, 1, '85.34∠22.62°'], [2, 1, '49.56∠22.62°'], [3, 1, '9.878∠22.62°'], [4, 1, '7.074∠18.43°'], [4, 2, '11910∠14.17°'], [1, 3, '1.97'], [2, 3, '0.62'], [3, 3, '0.30']] as const) {
      expectShown(t[r][c], shown);
    }
  });
});
