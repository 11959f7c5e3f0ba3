/** The pane's function reference model: grouping, call lines, search. */
import { describe, expect, it } from 'vitest';
import { specs } from '../../src/functions/index';
import { GROUP_TITLES, type FunctionSpec, type Group } from '../../src/functions/spec';
import { buildReference, callSignature, cellText, countEntries, matches, toEntry } from '../../src/taskpane/reference';

const make = (name: string, group: Group, extra: Partial<FunctionSpec> = {}): FunctionSpec => ({
  name,
  group,
  summary: `Summary of ${name}.`,
  params: [],
  result: 'Polar text.',
  errors: [],
  examples: [{ formula: `=PHZ.${name}(1)`, result: [['1∠0°']] }],
  implementation: () => [['1∠0°']],
  ...extra,
});

const sample: FunctionSpec[] = [
  make('NEUTRALX', 'neutral', {
    summary: 'Neutral current from three line currents.',
    params: [{ name: 'currents', type: 'matrix', description: 'Line currents in A, three cells.' }],
    cautions: ['Size the neutral by the locally adopted rules.'],
  }),
  make('DIVX', 'arithmetic', {
    summary: 'Divides one phasor by another.',
    params: [
      { name: 'a', type: 'matrix', description: 'Dividend.' },
      { name: 'b', type: 'matrix', description: 'Divisor, e.g. an impedance in Ω.' },
      { name: 'digits', type: 'scalar', optional: true, description: 'Significant figures.' },
    ],
  }),
  make('SUMX', 'arithmetic', {
    summary: 'Adds phasors.',
    params: [{ name: 'z', type: 'repeat', description: 'Phasors to add.' }],
    examples: [
      { formula: '=PHZ.SUMX("1","j")', result: [['1.41421∠45°']] },
      { formula: '=PHZ.SUMX({"1";"2"})', result: [['3∠0°']] },
    ],
  }),
  make('POLARX', 'values', { examples: [{ formula: '=PHZ.POLARX("1")', result: [[true, 2, 'x']] }] }),
];

describe('buildReference', () => {
  it('groups in GROUP_TITLES order, keeping registry order inside a group', () => {
    const groups = buildReference(sample);
    expect(groups.map((g) => g.group)).toEqual(['values', 'arithmetic', 'neutral']);
    expect(groups.map((g) => g.title)).toEqual([GROUP_TITLES.values, GROUP_TITLES.arithmetic, GROUP_TITLES.neutral]);
    expect(groups[1].entries.map((e) => e.name)).toEqual(['DIVX', 'SUMX']);
    expect(countEntries(groups)).toBe(sample.length);
  });

  it('lists every function of the real registry exactly once', () => {
    const names = buildReference(specs).flatMap((g) => g.entries.map((e) => e.name));
    expect(names.slice().sort()).toEqual(specs.map((s) => s.name).sort());
  });

  it.each([
    ['divx', ['DIVX']],
    ['PHZ.DIVX', ['DIVX']],
    ['  NEUTRAL  ', ['NEUTRALX']],
    ['impedance', ['DIVX']], // parameter description
    ['currents', ['NEUTRALX']], // parameter name
    ['phasor', ['DIVX', 'SUMX']], // summaries
    ['phasor adds', ['SUMX']], // every word must match
    ['nothing-like-this', []],
    ['', ['POLARX', 'DIVX', 'SUMX', 'NEUTRALX']],
  ])('filters on %j', (query, expected) => {
    const names = buildReference(sample, query).flatMap((g) => g.entries.map((e) => e.name));
    expect(names).toEqual(expected);
  });

  it('drops groups that have no match', () => {
    expect(buildReference(sample, 'neutral').map((g) => g.group)).toEqual(['neutral']);
  });
});

describe('entries', () => {
  it('writes call lines with optional arguments in brackets and repeating ones with an ellipsis', () => {
    expect(callSignature(sample[1])).toBe('PHZ.DIVX(a, b, [digits])');
    expect(callSignature(sample[2])).toBe('PHZ.SUMX(z, …)');
    expect(callSignature(sample[3])).toBe('PHZ.POLARX()');
  });

  it('uses the first example as the starter formula and keeps cautions', () => {
    expect(toEntry(sample[2]).starter).toBe('=PHZ.SUMX("1","j")');
    expect(toEntry(sample[2]).examples).toHaveLength(2);
    expect(toEntry(sample[0]).cautions).toEqual(['Size the neutral by the locally adopted rules.']);
    expect(toEntry(sample[1]).cautions).toEqual([]);
  });

  it('shows example cells as the grid does', () => {
    expect(toEntry(sample[3]).examples[0].rows).toEqual([['TRUE', '2', 'x']]);
    expect(cellText(false)).toBe('FALSE');
    expect(cellText(0.1)).toBe('0.1');
  });

  it('marks optional and repeating parameters', () => {
    const [a, , digits] = toEntry(sample[1]).params;
    expect([a.optional, digits.optional, digits.label]).toEqual([false, true, '[digits]']);
    expect(toEntry(sample[2]).params[0]).toMatchObject({ repeating: true, label: 'z, …' });
  });

  it('matches() ignores case and surrounding space', () => {
    expect(matches(sample[0], ' Neutral  CURRENT ')).toBe(true);
    expect(matches(sample[0], 'neutral voltage')).toBe(false);
  });
});
