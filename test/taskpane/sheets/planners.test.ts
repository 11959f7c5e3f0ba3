/**
 * The worked-sheet planners as pure functions: what every plan must hold (title, scenario,
 * date, named inputs styled as inputs, numbered steps with relation and live formula,
 * checks with tolerances, cautions, a chart request on named cells), the names, the layout,
 * the field readers and their messages, and valid sheet names.
 */
import { describe, expect, it } from 'vitest';
import { functions } from '../../../src/functions';
import { calculationById, calculations } from '../../../src/taskpane/sheets/calculations';
import { demoValues, readField, readFields } from '../../../src/taskpane/sheets/calculation';
import { COL, F, cellA1, looksLikeAddress, nameOf, planGrid, uniqueSheetName, type SheetPlan } from '../../../src/taskpane/sheets/plan';
import { magnitudesOnly } from '../../../src/taskpane/sheets/unbalance';
import { parseA1 } from '../../../src/taskpane/a1';

const META = { scenario: 'Planner test scenario', date: '2026-12-02' };
const plans: Array<[string, SheetPlan]> = calculations.map((c) => [c.id, c.plan(demoValues(c), META)]);

/** Identifiers a formula uses that are not functions, numbers, strings or A1 references. */
function namesUsed(formula: string): string[] {
  const noStrings = formula.replace(/"[^"]*"/g, '""');
  const ids = [...noStrings.matchAll(/[A-Za-z_][A-Za-z0-9_.]*/g)].filter((m) => !/^\s*\(/.test(noStrings.slice(m.index! + m[0].length))).map((m) => m[0]);
  return ids.filter((id) => !/^PHZ\./.test(id) && !/^[A-Z]{1,3}[0-9]+$/.test(id) && !/^(TRUE|FALSE)$/.test(id) && !/^E$/i.test(id));
}

describe('the calculations', () => {
  it('are the six of the worked-sheet issue and the panel schedule, in the chooser’s order, with unique ids', () => {
    expect(calculations.map((c) => c.name)).toEqual([
      'Star load with neutral',
      'Star load without neutral',
      'Star load from power and power factor',
      'Delta load',
      'Supply unbalance check',
      'Neutral with harmonics and sizing',
      'Panel schedule',
    ]);
    expect(new Set(calculations.map((c) => c.id)).size).toBe(7);
    expect(() => calculationById('nope')).toThrow(/star-neutral/);
  });

  it.each(calculations.map((c) => [c.id, c] as const))('%s: its demo reads and solves', (_id, calc) => {
    const values = demoValues(calc);
    expect(() => calc.crossCheck(values)).not.toThrow();
    expect(calc.demoScenario).toMatch(/our own/);
  });

  it('field labels begin with their symbol, as the pane shows them (E1, Z2, ZN, ZL1, P3, pf1 …)', () => {
    const ids = calculations.flatMap((c) => c.fields.map((f) => f.id));
    for (const want of ['E1', 'Z2', 'ZN', 'ZL1', 'ZL3', 'P3', 'pf1', 'V12', 'Z31', 'k3', 'Un']) expect(ids).toContain(want);
    for (const c of calculations) for (const f of c.fields) expect(f.id).toMatch(/^[A-Za-z]+[0-9]*$/);
  });
});

describe('reading a field uses the functions’ readers and messages', () => {
  const e1 = calculationById('star-neutral').fields.find((f) => f.id === 'E1')!;
  const pf1 = calculationById('star-power').fields.find((f) => f.id === 'pf1')!;
  const sense = calculationById('star-power').fields.find((f) => f.id === 'sense1')!;

  it('keeps phasor text as typed, numbers as numbers', () => {
    expect(readField(e1, ' 230∠-120 ')).toBe('230∠-120');
    expect(readField(pf1, '0.9')).toBe(0.9);
    expect(readField(sense, 'Leading')).toBe('leading');
  });

  it('refuses bad text with the message a function gives for the same argument', () => {
    let fromFunction = '';
    try {
      functions.TOPOLAR([['23O∠0']]);
    } catch (e) {
      fromFunction = (e as Error).message;
    }
    expect(() => readField(e1, '23O∠0')).toThrow(fromFunction.replace(/^z/, 'E1').slice(0, 10));
    expect(() => readField(e1, '23O∠0')).toThrow(/E1/);
    expect(() => readField(e1, '12 A')).toThrow(/E1/);
    expect(() => readField(e1, '')).toThrow(/E1 is blank/);
    expect(() => readField(pf1, '1.2')).toThrow(/pf1 is 1.2 but must be above 0 and at most 1/);
    expect(() => readField(sense, 'sideways')).toThrow(/sense1/);
  });

  it('reads every field of a calculation and names each problem', () => {
    const calc = calculationById('star-neutral');
    const texts = Object.fromEntries(calc.fields.map((f) => [f.id, f.demo]));
    const { problems } = readFields(calc, { ...texts, Z2: 'x', ZN: '' });
    expect(Object.keys(problems)).toEqual(['Z2', 'ZN']);
  });

  it('a case with no solution is refused by the solver’s own check', () => {
    const calc = calculationById('star-neutral');
    const values = { ...demoValues(calc), Z1: '0', ZL1: '0', ZN: '0' };
    expect(() => calc.crossCheck(values)).toThrow(/short/i);
  });
});

describe.each(plans)('plan %s', (id, plan) => {
  const calc = calculationById(id);
  const at = new Map(plan.cells.map((c) => [`${c.row},${c.col}`, c]));

  it('has the title, calculation name, editable scenario note and the date written', () => {
    expect(at.get('0,0')).toMatchObject({ content: plan.title, role: 'title' });
    expect(String(at.get('1,0')!.content).length).toBeGreaterThan(20);
    expect(plan.cells.find((c) => c.role === 'scenario')!.content).toBe(META.scenario);
    expect(plan.cells.some((c) => String(c.content).includes(META.date))).toBe(true);
  });

  it('puts every cell once, and leaves the spill areas of its one-call functions empty', () => {
    expect(at.size).toBe(plan.cells.length);
    for (const c of plan.cells) {
      const f = String(c.content);
      const spill = /^=PHZ\.(STARLOAD|DELTALOAD|SEQCOMP|SIZINGCURRENT|LINESET|SCHEDULE|VOLTDROP)\(/.exec(f);
      if (!spill) continue;
      const [rows, cols] = { STARLOAD: [4, 3], DELTALOAD: [3, 4], SEQCOMP: [3, 1], SIZINGCURRENT: [1, 3], LINESET: [3, 1], SCHEDULE: [4, 5], VOLTDROP: [3, 5] }[spill[1]]!;
      for (let r = 0; r < rows; r++) for (let k = 0; k < cols; k++) if (r > 0 || k > 0) expect(at.has(`${c.row + r},${c.col + k}`), `${cellA1(c.row + r, c.col + k)} in the spill of ${f}`).toBe(false);
    }
  });

  it('names every input and step, scoped names that no one could read as a cell address', () => {
    expect(plan.names.length).toBe(plan.inputs.length + plan.steps.length);
    for (const n of plan.names) {
      expect(looksLikeAddress(n.name), n.name).toBe(false);
      expect(n.name).toMatch(/^[A-Za-z][A-Za-z0-9_]*$/);
    }
    expect(new Set(plan.names.map((n) => n.name.toLowerCase())).size).toBe(plan.names.length);
  });

  it('has one input per field, styled as input, with symbol, description, value and unit', () => {
    expect(plan.inputs.map((i) => i.field)).toEqual(calc.fields.map((f) => f.id));
    for (const input of plan.inputs) {
      expect(at.get(`${input.row},${COL.input}`)!.role).toBe('input');
      expect(at.get(`${input.row},${COL.symbol}`)!.content).toBe(input.field);
      expect(String(at.get(`${input.row},${COL.quantity}`)!.content).length).toBeGreaterThan(5);
      expect(at.has(`${input.row},${COL.unit}`) || calc.fields.find((f) => f.id === input.field)!.unit === '').toBe(true);
    }
  });

  it('numbers its steps, each with quantity, symbol, relation, a live formula on names, 6-figure forms, unit and formula text', () => {
    plan.steps.forEach((s, i) => expect(s.number).toBe(i + 1));
    const defined = new Set(plan.names.map((n) => n.name.toLowerCase()));
    for (const s of plan.steps) {
      expect(at.get(`${s.row},${COL.step}`)!.content).toBe(s.number);
      expect(s.relation).toMatch(/=|≤|\/|max|min/);
      const formula = String(at.get(`${s.row},${COL.value}`)!.content);
      expect(formula.startsWith('=')).toBe(true);
      // every name the formula uses is defined on the sheet, and steps refer to earlier values only
      for (const used of namesUsed(formula.slice(1))) {
        expect(defined.has(used.toLowerCase()), `${s.name} uses ${used}`).toBe(true);
        const target = plan.names.find((n) => n.name.toLowerCase() === used.toLowerCase())!;
        expect(target.row, `${s.name} uses ${used} from below`).toBeLessThan(s.row);
      }
      // chained phasor steps keep 15 significant figures
      if (s.kind === 'phasor') expect(formula).toMatch(/, 15\)$/);
      expect(at.get(`${s.row},${COL.formula}`)!.content).toBe(`=FORMULATEXT(${cellA1(s.row, COL.value)})`);
      if (s.kind === 'phasor') {
        expect(at.get(`${s.row},${COL.polar}`)!.content).toBe(`=PHZ.TOPOLAR(${cellA1(s.row, COL.value)})`);
        expect(at.get(`${s.row},${COL.rect}`)!.content).toBe(`=PHZ.TORECT(${cellA1(s.row, COL.value)})`);
      }
    }
  });

  it('has checks with a tolerance and a pass/fail cell, including agreement with a one-call function', () => {
    expect(plan.checks.length).toBeGreaterThanOrEqual(3);
    for (const c of plan.checks) {
      expect(at.get(`${c.row},${COL.tolerance}`)!.content).toBe(c.tolerance);
      expect(String(at.get(`${c.row},${COL.verdict}`)!.content)).toMatch(/"pass", "FAIL"/);
      expect(c.tolerance).toBeLessThanOrEqual(/close/.test(c.label) ? 0.01 : 1e-9);
    }
    expect(plan.checks.some((c) => /agree/i.test(c.label))).toBe(true);
    if (id !== 'unbalance' && id !== 'neutral-harmonics') {
      expect(plan.checks.some((c) => /Kirchhoff/.test(c.label))).toBe(true);
      expect(plan.checks.some((c) => /Power balance/.test(c.label))).toBe(true);
    }
  });

  it('carries the cautions of DESIGN §8', () => {
    const cautions = plan.cells.filter((c) => c.role === 'caution').map((c) => String(c.content));
    expect(cautions.some((t) => /competent, licensed person/.test(t))).toBe(true);
    expect(cautions.some((t) => /qualified people/.test(t))).toBe(true);
  });

  it('asks for a phasor chart of named cells and keeps a labelled place for it beside the steps', () => {
    expect(plan.chart.phasors.length).toBeGreaterThanOrEqual(4);
    const named = new Set(plan.names.map((n) => cellA1(n.row, n.col)));
    for (const p of plan.chart.phasors) expect(named.has(p.cell), p.label).toBe(true);
    expect(new Set(plan.chart.phasors.map((p) => p.group))).toContain('V');
    const place = plan.cells.filter((c) => c.row >= plan.chartArea.top && c.row <= plan.chartArea.bottom && c.col >= plan.chartArea.left);
    expect(place.some((c) => /The phasor chart of the values named below goes here/.test(String(c.content)))).toBe(true);
    // nothing else is written inside the chart area
    expect(place.every((c) => c.role === 'chart' || c.role === 'heading')).toBe(true);
    // the chart goes into that place; its helper cells go below everything the plan writes
    const chartAt = parseA1(plan.chart.chartCell!)!;
    expect(chartAt.row).toBeGreaterThan(plan.chartArea.top);
    expect(chartAt.row).toBeLessThanOrEqual(plan.chartArea.bottom);
    expect(chartAt.col).toBe(plan.chartArea.left);
    expect(parseA1(plan.chart.anchor!)!.row).toBeGreaterThanOrEqual(plan.extent.rows);
  });

  it('lays out as a rectangle the writers can write in one block', () => {
    const grid = planGrid(plan);
    expect(grid.length).toBe(plan.extent.rows);
    expect(grid.every((r) => r.length === plan.extent.cols)).toBe(true);
    expect(grid.flat().filter((v) => v !== null)).toHaveLength(plan.cells.length);
  });
});

describe('sheet names and sheet-scoped names', () => {
  it('makes a valid, free sheet name of at most 31 characters', () => {
    expect(uniqueSheetName('Star with neutral', [])).toBe('Star with neutral');
    expect(uniqueSheetName('Star with neutral', ['star WITH neutral'])).toBe('Star with neutral (2)');
    expect(uniqueSheetName('Star with neutral', ['Star with neutral', 'Star with neutral (2)'])).toBe('Star with neutral (3)');
    expect(uniqueSheetName('a:b\\c/d?e*f[g]h', [])).toBe('a b c d e f g h');
    expect(uniqueSheetName("'quoted'", [])).toBe('quoted');
    expect(uniqueSheetName('History', [])).toBe('Worked sheet');
    expect(uniqueSheetName('   ', [])).toBe('Worked sheet');
    const long = 'A very long calculation sheet name indeed';
    const first = uniqueSheetName(long, []);
    expect(first.length).toBe(31);
    const second = uniqueSheetName(long, [first]);
    expect(second.length).toBeLessThanOrEqual(31);
    expect(second.endsWith(' (2)')).toBe(true);
  });

  it('names symbols so they are never cell addresses', () => {
    expect(nameOf('E1')).toBe('E_1');
    expect(nameOf('ZL1')).toBe('Z_L1');
    expect(nameOf('VN')).toBe('V_N');
    expect(nameOf('pf1')).toBe('pf_1');
    expect(nameOf('P3')).toBe('P_3');
    for (const bad of ['E1', 'Z1', 'ZN1', 'XFD1048576', 'R1C1', 'R', 'C', 'r2c', 'I1_rms', 'u2_pct']) expect(looksLikeAddress(bad), bad).toBe(true);
    for (const good of ['E_1', 'Z_L1', 'V_N', 'pf_1', 'J_sum']) expect(looksLikeAddress(good), good).toBe(false);
  });

  it('writes sums and products the way a hand calculation does, at 15 figures', () => {
    expect(F.add('a', 'b')).toBe('PHZ.FROMRECT(PHZ.REAL(a)+PHZ.REAL(b), PHZ.IMAG(a)+PHZ.IMAG(b), 15)');
    expect(F.mul('a', 'b')).toBe('PHZ.FROMPOLAR(PHZ.MAG(a)*PHZ.MAG(b), PHZ.ANGLE(a)+PHZ.ANGLE(b), "deg", 15)');
  });
});

describe('the supply unbalance sheet takes magnitudes or phasors', () => {
  it('uses the law of cosines for magnitudes and the measured phasors otherwise', () => {
    const calc = calculationById('unbalance');
    expect(magnitudesOnly({ V12: '411', V23: 404, V31: '395' })).toBe(true);
    expect(magnitudesOnly({ V12: '411∠30', V23: 404, V31: '395' })).toBe(false);
    const byMag = calc.plan({ V12: '411', V23: '404', V31: '395' }, META);
    const byPhasor = calc.plan({ V12: '400∠30', V23: '400∠-90', V31: '400∠150' }, META);
    expect(byMag.steps.some((s) => s.relation.startsWith('cos C'))).toBe(true);
    expect(byPhasor.steps.some((s) => s.relation.startsWith('cos C'))).toBe(false);
    expect(byPhasor.steps.some((s) => s.name === 'V_0')).toBe(true);
    // magnitudes are written as numbers
    const v12 = byMag.inputs.find((i) => i.field === 'V12')!;
    expect(byMag.cells.find((c) => c.row === v12.row && c.col === COL.input)!.content).toBe(411);
  });
});
