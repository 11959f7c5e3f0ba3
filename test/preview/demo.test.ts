/**
 * The demo workbook: every formula it writes calculates (no error cell anywhere), it
 * uses every function group the registry has, it lists every function's example, and
 * with a registry that lacks functions it leaves those lines out instead of breaking.
 */
import { describe, expect, it } from 'vitest';
import { functions, specByName, specs } from '../../src/functions';
import type { FunctionSpec } from '../../src/functions/spec';
import { DEMO_SHEET, EXAMPLES_SHEET, PANEL_SHEET, SUB_BOARD, functionsIn, loadDemo } from '../../src/preview/demo';
import { a1 } from '../../src/preview/address';
import { PhzEngine, isDisplayError } from '../../src/preview/engine';

function load(list: readonly FunctionSpec[]) {
  const engine = new PhzEngine({ registry: { specs: list, functions } });
  const report = loadDemo(engine, list);
  const errors: string[] = [];
  for (const name of engine.hf.getSheetNames()) {
    const values = engine.hf.getSheetValues(engine.hf.getSheetId(name)!);
    values.forEach((row, r) =>
      row.forEach((v, c) => {
        const shown = engine.display({ sheet: engine.hf.getSheetId(name)!, row: r, col: c });
        const where = `${name}!${a1({ row: r, col: c })}`;
        if (isDisplayError(shown) && !report.intendedErrors.includes(where)) errors.push(`${where} ${shown.error} ${shown.message}`);
        void v;
      }),
    );
  }
  return { engine, report, errors };
}

const usedByScenario = new Set(
  SUB_BOARD.flatMap((line) => ('formulas' in line ? line.formulas.flatMap(functionsIn) : [])),
);

describe('demo workbook with the whole registry', () => {
  const { engine, report, errors } = load(specs);

  it('has the two scenario sheets and the examples sheet, nothing else', () => {
    expect(engine.hf.getSheetNames()).toEqual([DEMO_SHEET, PANEL_SHEET, EXAMPLES_SHEET]);
  });

  it('shows no error in any cell but the one that shows an error on purpose', () => {
    expect(errors).toEqual([]);
    expect(report.intendedErrors.length).toBe(1);
    const [sheet, address] = report.intendedErrors[0].split('!');
    const m = /^([A-Z]+)(\d+)$/.exec(address)!;
    const shown = engine.display({ sheet: engine.hf.getSheetId(sheet)!, row: Number(m[2]) - 1, col: m[1].charCodeAt(0) - 65 });
    expect(isDisplayError(shown) && shown.message.length > 0).toBe(true);
  });

  it('uses every function group the registry has on the scenario sheets', () => {
    const groups = new Set(
      report.formulas.filter((f) => f.sheet !== EXAMPLES_SHEET).flatMap((f) => functionsIn(f.formula).map((n) => specByName[n].group)),
    );
    expect([...groups].sort()).toEqual([...new Set(specs.map((s) => s.group))].sort());
  });

  it('runs every function’s first example on the examples sheet', () => {
    const listed = report.formulas.filter((f) => f.sheet === EXAMPLES_SHEET).map((f) => f.formula);
    expect(listed).toEqual(specs.filter((s) => s.examples.length > 0).map((s) => s.examples[0].formula));
  });

  it.runIf([...usedByScenario].every((n) => n in specByName))('leaves no scenario line out when every function it uses exists', () => {
    expect(report.skipped).toEqual([]);
  });

  it('writes only formulas whose functions are in the registry', () => {
    for (const f of report.formulas) for (const n of functionsIn(f.formula)) expect(specByName[n], `${f.address}: ${n}`).toBeDefined();
  });
});

describe('demo workbook with part of the registry', () => {
  const partial = specs.filter((s) => s.group === 'values');
  const { report, errors } = load(partial);

  it('leaves out lines whose functions are missing, and the lines that depend on them', () => {
    expect(report.skipped).toContain('Phase current');
    expect(report.skipped).toContain('Current magnitude');
  });

  it('still shows no error in any cell', () => {
    expect(errors).toEqual([]);
  });

  it('uses only the functions it has', () => {
    const names = new Set(partial.map((s) => s.name));
    for (const f of report.formulas) for (const n of functionsIn(f.formula)) expect(names.has(n), `${f.address}: ${n}`).toBe(true);
  });
});
