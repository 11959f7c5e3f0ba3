import { starToDelta } from '../../core/threephase';
import { defineFunction } from '../spec';
import { readDigits } from '../readers';
import { DIGITS } from '../params';
import { impedanceCell, readTripleArgs } from './_threephase';

/** Star → delta impedance transformation. */
export const STARTODELTA = defineFunction({
  name: 'STARTODELTA',
  group: 'sets',
  summary: 'Delta branches Z12, Z23, Z31 equivalent to star impedances Z1, Z2, Z3.',
  details:
    'Z12 = P/Z3, Z23 = P/Z1, Z31 = P/Z2 with P = Z1·Z2 + Z2·Z3 + Z3·Z1 (the inverse of the Kennelly delta–star ' +
    'transformation): each branch is P over the star arm opposite it. A 0 Ω star arm gives an "open" branch opposite ' +
    'it (the text open, which DELTALOAD and DELTATOSTAR accept). Give the arms as one range of three, or as three values.',
  params: [
    { name: 'z1', type: 'matrix', description: 'Star arm Z1, or a range of three: Z1, Z2, Z3.' },
    { name: 'z2', type: 'matrix', optional: true, description: 'Star arm Z2 (omit when z1 holds all three).' },
    { name: 'z3', type: 'matrix', optional: true, description: 'Star arm Z3 (omit when z1 holds all three).' },
    DIGITS,
  ],
  result: 'A 3×1 column of polar text: Z12, Z23, Z31 (or "open" for an unbounded branch).',
  errors: [
    'Other than three values, a blank cell or text that is not an impedance gives #VALUE!.',
    'Two 0 Ω arms (no unique delta), or arms with Z1·Z2 + Z2·Z3 + Z3·Z1 = 0, give #VALUE!.',
  ],
  examples: [
    { formula: '=PHZ.STARTODELTA(5, 3, 7.5)', result: [['10∠0°'], ['15∠0°'], ['25∠0°']] },
    { formula: '=PHZ.STARTODELTA({"4+j3";"4+j3";"4+j3"})', result: [['15∠36.8699°'], ['15∠36.8699°'], ['15∠36.8699°']] },
  ],
  implementation: (z1, z2, z3, digits) => {
    const d = readDigits(digits);
    const [a, b, c] = readTripleArgs(z1, z2, z3, ['z1', 'z2', 'z3'], 'star arms Z1, Z2, Z3');
    return starToDelta(a, b, c).map((z) => [impedanceCell(z, d)]);
  },
});
