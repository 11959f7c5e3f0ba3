/**
 * The hand-written three-phase examples of the README show exact results: each formula is
 * in the README with the figures it shows, the preview engine gives those figures, and the
 * same calculation with every intermediate step at 15 significant figures gives them too
 * (so no figure is one carried through 6-figure text). The reference values of the
 * calculations themselves are checked against their sources in test/core and
 * test/functions; this file guards the README's text.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluateFormula, isDisplayError, type DisplayValue } from '../src/preview/engine';

const readme = readFileSync(join(__dirname, '..', 'README.md'), 'utf8');

interface Example {
  /** As written in the README. */
  readonly formula: string;
  /** The same calculation with intermediate steps at 15 figures (and the outer call at the shown figures). */
  readonly exact: string;
  /** Shown cells as [row, column, text]; text ending in … is a number shown by its leading digits. */
  readonly shown: ReadonlyArray<readonly [number, number, string]>;
  /** The README describes this call in words rather than writing the formula out. */
  readonly inWords?: true;
}

const EXAMPLES: Example[] = [
  { formula: '=PHZ.BALANCED(230)', exact: '=PHZ.BALANCED(230)', shown: [[0, 0, '230∠0°'], [1, 0, '230∠-120°'], [2, 0, '230∠120°']] },
  {
    formula: '=PHZ.LINEVOLTS(PHZ.BALANCED(230))',
    exact: '=PHZ.LINEVOLTS(PHZ.BALANCED(230, , , 15))',
    shown: [[0, 0, '398.372∠30°'], [1, 0, '398.372∠-90°'], [2, 0, '398.372∠150°']],
  },
  { formula: '=PHZ.LINESET({402;395;385})', exact: '=PHZ.LINESET({402;395;385})', shown: [[0, 0, '402∠30°'], [1, 0, '395∠-92.2369°'], [2, 0, '385∠149.794°']] },
  { formula: '=PHZ.DELTATOSTAR(48, 60, 40)', exact: '=PHZ.DELTATOSTAR(48, 60, 40)', shown: [[0, 0, '12.973∠0°'], [1, 0, '19.4595∠0°'], [2, 0, '16.2162∠0°']] },
  { formula: '=PHZ.COMPLEXPOWER(4500, 0.82)', exact: '=PHZ.COMPLEXPOWER(4500, 0.82)', shown: [[0, 0, '5487.8∠34.9152°']] },
  {
    formula: '=PHZ.LOADCURRENT("230∠-120", PHZ.COMPLEXPOWER(4500, 0.82))',
    exact: '=PHZ.LOADCURRENT("230∠-120", PHZ.COMPLEXPOWER(4500, 0.82, , 15))',
    shown: [[0, 0, '23.86∠-154.915°']],
  },
  {
    formula: '=PHZ.STARLOAD(PHZ.BALANCED(230), {"8.8";"9.6+j6.7";"26+j4"}, "0.3+j0.1", "0.12+j0.05", TRUE, 4)',
    exact: '=PHZ.STARLOAD(PHZ.BALANCED(230, , , 15), {"8.8";"9.6+j6.7";"26+j4"}, "0.3+j0.1", "0.12+j0.05", TRUE, 4)',
    shown: [
      [1, 1, '25.62∠-0.4156°'], [1, 2, '225.5∠-0.4156°'], [1, 3, '5777∠0°'],
      [2, 1, '19.52∠-155°'], [2, 2, '228.6∠-120.1°'], [2, 3, '4463∠34.91°'],
      [3, 1, '8.717∠111.5°'], [3, 2, '229.3∠120.3°'], [3, 3, '1999∠8.746°'],
      [4, 1, '4.73∠-3.839°'], [4, 2, '1.496∠14.6°'], [4, 3, '11760∠14.06°'],
    ],
  },
  {
    // "with the neutral lost": the shift and phase 2's load voltage
    formula: '=PHZ.STARLOAD(PHZ.BALANCED(230), {"8.8";"9.6+j6.7";"26+j4"}, "open", "0.12+j0.05", TRUE, 4)',
    exact: '=PHZ.STARLOAD(PHZ.BALANCED(230, , , 15), {"8.8";"9.6+j6.7";"26+j4"}, "open", "0.12+j0.05", TRUE, 4)',
    shown: [[4, 2, '22.46∠10.47°'], [2, 2, '242.5∠-123.9°']],
    inWords: true,
  },
  {
    formula: '=PHZ.DELTALOAD(PHZ.LINEVOLTS(PHZ.BALANCED(230)), {"48";"60";"open"}, , TRUE, 4)',
    exact: '=PHZ.DELTALOAD(PHZ.LINEVOLTS(PHZ.BALANCED(230, , , 15), 15), {"48";"60";"open"}, , TRUE, 4)',
    shown: [[1, 1, '8.299∠30°'], [2, 1, '12.96∠-123.7°'], [3, 1, '6.64∠90°']],
  },
  { formula: '=PHZ.NEUTRAL({"25.6∠-2";"19.7∠-155";"8.7∠111"})', exact: '=PHZ.NEUTRAL({"25.6∠-2";"19.7∠-155";"8.7∠111"})', shown: [[0, 0, '4.74097∠-13.377°']] },
  {
    formula: '=PHZ.NEUTRALRMS({"18∠-5";"14∠-128";"16∠117"}, {3,45;5,25;7,12;9,8})',
    exact: '=PHZ.NEUTRALRMS({"18∠-5";"14∠-128";"16∠117"}, {3,45;5,25;7,12;9,8})',
    shown: [[0, 0, '22.117…']],
  },
  { formula: '=PHZ.SIZINGCURRENT(32, 38)', exact: '=PHZ.SIZINGCURRENT(32, 38)', shown: [[0, 0, '42.4186…'], [0, 1, '0.86'], [0, 2, 'neutral']] },
  { formula: '=PHZ.NEUTRALDEMAND(240, 35)', exact: '=PHZ.NEUTRALDEMAND(240, 35)', shown: [[0, 0, '263']] },
  {
    formula: '=PHZ.SEQCOMP({"231∠0";"226∠-121";"229∠119"})',
    exact: '=PHZ.SEQCOMP({"231∠0";"226∠-121";"229∠119"})',
    shown: [[0, 0, '2.49347∠61.4071°'], [1, 0, '228.659∠-0.663269°'], [2, 0, '1.24987∠21.4754°']],
  },
  { formula: '=PHZ.UNBALANCE({"231∠0";"226∠-121";"229∠119"})', exact: '=PHZ.UNBALANCE(PHZ.LINEVOLTS({"231∠0";"226∠-121";"229∠119"}, 15))', shown: [[0, 0, '0.546611…']] },
  { formula: '=PHZ.UNBALANCE({402;395;385}, "LVUR")', exact: '=PHZ.UNBALANCE({402;395;385}, "LVUR")', shown: [[0, 0, '2.28426…']] },
];

/** A number shown as its leading digits and an ellipsis (or in full) matches the value rounded there. */
function matches(cell: DisplayValue, text: string): boolean {
  if (typeof cell === 'number') {
    const t = text.replace('…', '');
    const sig = t.replace(/^[-0.]+/, '').replace('.', '').length;
    return Number(cell.toPrecision(sig)) === Number(t);
  }
  return cell === text;
}

describe('README: hand-written three-phase examples', () => {
  it.each(EXAMPLES)('$formula', ({ formula, exact, shown, inWords }) => {
    if (!inWords) expect(readme).toContain(formula);
    for (const [, , text] of shown) expect(readme, text).toContain(text);
    for (const f of [formula, exact]) {
      const got = evaluateFormula(f);
      expect(got.flat().filter(isDisplayError), f).toEqual([]);
      for (const [r, c, text] of shown) expect(matches(got[r][c], text), `${f} [${r}][${c}] = ${String(got[r][c])}, README ${text}`).toBe(true);
    }
  });
});
