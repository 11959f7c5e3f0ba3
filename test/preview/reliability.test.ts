/**
 * Bad input that must not break the preview workbook: tiny numbers, formulas the engine
 * cannot take (too long, nested too deeply, too many operators), Excel's spellings the
 * engine does not read (1E-3, ""), and messages that quote what was given. Each case is
 * written through the engine the way the grid writes it, and read back the way a cell
 * shows it.
 */
import { describe, expect, it } from 'vitest';
import { functions, specs } from '../../src/functions';
import { fitHostMessage, HOST_MESSAGE_LIMIT } from '../../src/functions/excel/register';
import { EXCERPT_LENGTH, clipMiddle, excerpt } from '../../src/core/messages';
import { checkFormula, hasDoubledQuote, MAX_FORMULA_LENGTH, MAX_NESTING, MAX_OPERATORS } from '../../src/preview/formula-guard';
import { MAX_COLUMNS, MAX_ROWS, MESSAGE_LIMIT, PhzEngine, isDisplayError } from '../../src/preview/engine';
import { parseCall } from './formula-args';

function oneCell(content: unknown, data: unknown[][] = []) {
  const engine = new PhzEngine({ sheets: { S: data.length > 0 ? (data as never) : [[]] } });
  const at = { sheet: 0, row: data.length + 1, col: 0 };
  engine.setContents(at, [[content as never]]);
  return { shown: engine.display(at), raw: engine.rawContent(at), engine };
}

const nested = (n: number) => `=${'('.repeat(n)}1${')'.repeat(n)}`;

describe('numbers below the engine’s rounding range', () => {
  it.each([1e-300, -1e-300, 5e-324, 1e-200, 2.5e-308])('%s shows as itself, never NaN', (v) => {
    expect(oneCell(v).shown).toBe(v);
    expect(oneCell('=A1*1', [[v]]).shown).toBe(v);
  });

  it('keeps 15 significant figures of a result, as Excel does', () => {
    expect(oneCell('=0.1+0.2').shown).toBe(0.3);
    expect(oneCell('=1/3').shown).toBe(0.333333333333333);
  });
});

describe('formulas the engine is not given', () => {
  it.each([
    ['a 100 kB formula with a syntax error', `=PHZ.MAG("${'x'.repeat(100_000)}"`, /100,011 characters long; a formula may have at most 8,192/],
    ['brackets nested 3,000 deep', nested(3000), /nests brackets 3,000 deep; at most 64 levels/],
    ['functions nested 100 deep', `=${'ABS('.repeat(100)}1${')'.repeat(100)}`, /nests brackets 100 deep/],
    ['4,000 additions', `=${Array(4000).fill('1').join('+')}`, /3,999 operators; at most 256/],
    ['8,000 unary minus signs', `=${'-'.repeat(8000)}1`, /8,000 operators; at most 256/],
  ])('%s: an error in the cell with a message, the text kept as typed', (_, formula, message) => {
    const { shown, raw } = oneCell(formula);
    expect(isDisplayError(shown) && shown.error).toBe('#ERROR!');
    expect(isDisplayError(shown) && shown.message).toMatch(message);
    expect(raw).toBe(formula);
  });

  it('takes a formula right at the limits', () => {
    expect(oneCell(nested(MAX_NESTING)).shown).toBe(1);
    expect(oneCell(`=${Array(MAX_OPERATORS + 1).fill('1').join('+')}`).shown).toBe(MAX_OPERATORS + 1);
    const long = `=${'1'.padEnd(MAX_FORMULA_LENGTH - 1, '0')}`.slice(0, 18) + `+0*"${'y'.repeat(MAX_FORMULA_LENGTH - 40)}"`;
    expect(long.length).toBeLessThanOrEqual(MAX_FORMULA_LENGTH);
    expect(isDisplayError(oneCell(long).shown)).toBe(true); // "y…" is text: #VALUE!, read by the engine, not refused
    expect((oneCell(long).shown as { error: string }).error).toBe('#VALUE!');
  });

  it('a refused formula can be fixed in place: writing a short one replaces it', () => {
    const { engine } = oneCell(nested(200));
    const at = { sheet: 0, row: 1, col: 0 };
    engine.setContents(at, [['=1+1']]);
    expect(engine.display(at)).toBe(2);
  });

  it('a cell that refers to a refused formula reads its text, and says so without quoting it whole', () => {
    const engine = new PhzEngine({ sheets: { S: [[nested(100), '=PHZ.MAG(A1)']] } });
    const shown = engine.display({ sheet: 0, row: 0, col: 1 });
    expect(isDisplayError(shown)).toBe(true);
    expect((shown as { message: string }).message.length).toBeLessThan(MESSAGE_LIMIT);
  });
});

describe('Excel spellings', () => {
  it.each([
    ['=1E-3', 0.001],
    ['=2.5E+2', 250],
    ['=SUM(1E2, 2)', 102],
    ['=.5E1', 5],
  ])('%s reads as in Excel', (formula, value) => {
    expect(oneCell(formula).shown).toBe(value);
  });

  it('leaves names and references that hold an E alone', () => {
    expect(checkFormula('=A1E3+X1E5').formula).toBe('=A1E3+X1E5');
    expect(checkFormula("='Sheet1E3'!A1").formula).toBe("='Sheet1E3'!A1");
    expect(checkFormula('="1E3"&1E3').formula).toBe('="1E3"&1e3');
  });

  it('"" inside text gets a message saying how to write a quote', () => {
    const { shown, raw } = oneCell('="say ""hi"""');
    expect(raw).toBe('="say ""hi"""');
    expect(isDisplayError(shown) && shown.message).toMatch(/doubled quote .* CHAR\(34\)/);
    expect(oneCell('="say "&CHAR(34)&"hi"&CHAR(34)').shown).toBe('say "hi"');
    expect(hasDoubledQuote('=""')).toBe(false);
    expect(hasDoubledQuote('=A1&""&B1')).toBe(false);
  });

  it('other unreadable formulas say so briefly, with where to look', () => {
    const { shown } = oneCell(`=PHZ.MAG("3+j4",,,${'x'.repeat(5000)}))`);
    expect(isDisplayError(shown)).toBe(true);
    expect((shown as { message: string }).message.length).toBeLessThanOrEqual(MESSAGE_LIMIT);
  });
});

describe('sheet size', () => {
  it('holds Excel’s 1,048,576 rows × 16,384 columns', () => {
    const engine = new PhzEngine({ sheets: { S: [[]] } });
    engine.setContents({ sheet: 0, row: MAX_ROWS - 1, col: MAX_COLUMNS - 1 }, [['=PHZ.MAG("3+j4")']]);
    expect(engine.display({ sheet: 0, row: MAX_ROWS - 1, col: MAX_COLUMNS - 1 })).toBe(5);
  });

  it('takes a block of 100,000 rows × 3 columns in one write', () => {
    const engine = new PhzEngine({ sheets: { S: [[]] } });
    const rows = Array.from({ length: 100_000 }, (_, i) => [i, i * 2, null]);
    engine.setContents({ sheet: 0, row: 0, col: 0 }, rows);
    expect(engine.display({ sheet: 0, row: 99_999, col: 1 })).toBe(199_998);
  });
});

/** Every registry function, with the text of `n` characters in each argument in turn. */
function longArgumentMessages(n: number): { where: string; message: string }[] {
  const out: { where: string; message: string }[] = [];
  const long = `${'7'.repeat(3)}${'x'.repeat(n)}`;
  for (const spec of specs) {
    const call = parseCall(spec.examples[0].formula);
    if (!call) continue;
    const base = call.args.map((a) => (a.kind === 'scalar' ? [[a.value]] : a.kind === 'array' ? a.rows : null));
    for (let i = 0; i < spec.params.length; i++) {
      const args: unknown[] = spec.params.map((p, k) => (k < base.length ? (p.type === 'scalar' ? (base[k] as unknown[][] | null)?.[0][0] ?? null : base[k]) : null));
      args[i] = spec.params[i].type === 'scalar' ? long : spec.params[i].type === 'repeat' ? [[[long]]] : [[long]];
      if (spec.params[spec.params.length - 1].type === 'repeat' && i < spec.params.length - 1) {
        const last = spec.params.length - 1;
        args[last] = base.slice(last).filter(Boolean).length > 0 ? base.slice(last) : null;
      }
      try {
        functions[spec.name](...args);
      } catch (e) {
        out.push({ where: `${spec.name}(${spec.params[i].name})`, message: (e as Error).message });
      }
    }
  }
  return out;
}

describe('error messages quote an excerpt of what was given', () => {
  const long = longArgumentMessages(100_000);
  const short = new Map(longArgumentMessages(2).map((m) => [m.where, m.message]));

  it('has a case for every function', () => {
    expect(long.length).toBeGreaterThan(specs.length);
  });

  it('never quotes more than an excerpt: a 100,000-character input gives a short message', () => {
    const over = long.filter((m) => m.message.length > 2 * HOST_MESSAGE_LIMIT);
    expect(over.map((m) => `${m.where}: ${m.message.length}`)).toEqual([]);
  });

  it('keeps the advice in Excel’s 255-character cut: the end of the message survives', () => {
    for (const { where, message } of long) {
      const fitted = fitHostMessage(message);
      expect(fitted.length, where).toBeLessThanOrEqual(HOST_MESSAGE_LIMIT);
      const advice = message.slice(message.lastIndexOf(':') + 1).trim();
      if (advice.length < 80) expect(fitted.endsWith(advice), `${where}: ${fitted}`).toBe(true);
    }
  });

  it('says the same thing for a short and a long input, apart from the excerpt', () => {
    for (const { where, message } of long) {
      const s = short.get(where);
      if (s === undefined) continue;
      // what follows the last quoted excerpt: the advice
      const advice = (m: string) => m.slice(Math.max(m.lastIndexOf('"'), m.lastIndexOf('”')) + 1);
      expect(advice(message), where).toBe(advice(s));
    }
  });

  it('excerpt and clipMiddle keep their bounds', () => {
    expect(excerpt('x'.repeat(100_000))).toHaveLength(EXCERPT_LENGTH);
    expect(clipMiddle(`${'q'.repeat(1000)}: do this`, 50).endsWith(': do this')).toBe(true);
    expect(clipMiddle('short', 50)).toBe('short');
  });
});

describe('phasor literals in a formula (README "Writing phasors")', () => {
  it('are text in quotes: unquoted, j4 is read as a reference to the empty cell J4', () => {
    expect(oneCell('=PHZ.MAG("3+j4")').shown).toBe(5);
    expect(oneCell('=PHZ.MAG(3+j4)').shown).toBe(3);
  });
});
