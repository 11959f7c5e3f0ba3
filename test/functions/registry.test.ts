import { describe, it, expect } from 'vitest';
import { HyperFormula } from 'hyperformula';
import { specs, functions, specByName } from '../../src/functions';

// Names Excel accepts (Office docs, "Naming guidelines" for custom functions): a letter first,
// at least three characters, and not the name of a built-in function in any language.
const ID = /^[A-Z][A-Z0-9]{2,}$/;
// An A1 reference up to Excel's last column XFD and row 1,048,576 (e.g. "ABC1", "Z12").
const A1 = /^[A-Z]{1,3}[1-9][0-9]{0,6}$/;

/** Built-in function names: every function HyperFormula registers, plus Excel's newer ones it lacks. */
function builtInNames(): Set<string> {
  const names = new Set<string>();
  for (const plugin of HyperFormula.getAllFunctionPlugins()) {
    for (const name of Object.keys((plugin as { implementedFunctions?: object }).implementedFunctions ?? {})) names.add(name);
  }
  // Excel dynamic-array and later functions (Microsoft's Excel function list, from memory).
  for (const name of ['SEQUENCE', 'TEXTSPLIT', 'TEXTBEFORE', 'TEXTAFTER', 'LET', 'LAMBDA', 'XLOOKUP', 'XMATCH', 'FILTER', 'SORT', 'SORTBY', 'UNIQUE', 'RANDARRAY', 'TAKE', 'DROP', 'CHOOSEROWS', 'CHOOSECOLS', 'EXPAND', 'TOCOL', 'TOROW', 'WRAPROWS', 'WRAPCOLS', 'VSTACK', 'HSTACK', 'MAP', 'REDUCE', 'SCAN', 'MAKEARRAY', 'BYROW', 'BYCOL', 'ISOMITTED', 'GROUPBY', 'PIVOTBY', 'PERCENTOF', 'TRIMRANGE', 'REGEXTEST', 'REGEXEXTRACT', 'REGEXREPLACE', 'IMAGE', 'ARRAYTOTEXT', 'VALUETOTEXT', 'STOCKHISTORY', 'FIELDVALUE', 'POWER', 'SUM', 'PRODUCT', 'COMPLEX', 'IMAGINARY', 'IMREAL']) {
    names.add(name);
  }
  return names;
}

/**
 * HyperFormula also implements Google Sheets functions that are not Excel built-ins in any
 * language. PHZ.SPLIT keeps the design's name: in Excel no SPLIT exists, and in both hosts
 * the PHZ namespace keeps it apart from a sheet's own SPLIT.
 */
const NOT_EXCEL = new Set(['SPLIT']);

describe('the registry', () => {
  it('lists every spec once under its name, and every name has an implementation', () => {
    const names = specs.map((s) => s.name);
    expect(new Set(names).size).toBe(names.length);
    expect(Object.keys(functions)).toEqual(names);
    expect(Object.keys(specByName)).toEqual(names);
  });

  it.each(specs.map((s) => [s.name, s] as const))('%s is documented and well formed', (name, s) => {
    expect(name).toMatch(ID);
    expect(name).not.toMatch(A1);
    expect(s.summary.length).toBeGreaterThan(10);
    expect(s.result.length).toBeGreaterThan(5);
    expect(s.errors.length).toBeGreaterThan(0);
    expect(s.examples.length).toBeGreaterThan(0);
    for (const e of s.examples) expect(e.formula.startsWith(`=PHZ.${name}(`)).toBe(true);
    for (const p of s.params) {
      expect(p.name).toMatch(/^[a-z][a-z0-9_]*$/);
      expect(p.description.length).toBeGreaterThan(5);
      // Excel's argument tip shows the description; longer text belongs in details.
      expect(p.description.length, `${name}.${p.name}`).toBeLessThanOrEqual(128);
      // a repeating argument's name ends in a number, so the tip reads (z1, [z2], …)
      if (p.type === 'repeat') expect(p.name).toMatch(/[a-z]1$/);
    }
    // optional arguments come last; a repeating argument is the very last
    const firstOptional = s.params.findIndex((p) => p.optional);
    if (firstOptional >= 0) expect(s.params.slice(firstOptional).every((p) => p.optional)).toBe(true);
    const repeat = s.params.findIndex((p) => p.type === 'repeat');
    if (repeat >= 0) expect(repeat).toBe(s.params.length - 1);
  });

  it('uses no name of a spreadsheet built-in function', () => {
    const builtIns = builtInNames();
    expect(builtIns.has('SPLIT')).toBe(true); // the list is real: HyperFormula registers it
    expect(builtIns.has('IMSUM')).toBe(true);
    const clashes = specs.map((s) => s.name).filter((n) => builtIns.has(n) && !NOT_EXCEL.has(n));
    expect(clashes).toEqual([]);
  });

  it('gives every phasor-text function an optional last digits argument, unless a repeating argument must be last', () => {
    for (const s of specs) {
      const textPhasor = s.examples.some((e) => e.result.some((r) => r.some((c) => typeof c === 'string' && c.includes('∠'))));
      const repeat = s.params.some((p) => p.type === 'repeat');
      if (textPhasor && !repeat) expect(s.params[s.params.length - 1].name, s.name).toBe('digits');
    }
  });
});
