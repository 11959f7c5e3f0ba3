import { deltaToStar } from '../../core/threephase';
import { PhzError } from '../../core/errors';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import { defineFunction } from '../spec';
import { readDigits } from '../readers';
import { DIGITS } from '../params';
import { isAbsent, readImpedances, setColumn } from './_threephase';
import type { Impedance } from '../../core/threephase';

function readDelta(z12: unknown, z23: unknown, z31: unknown): [Impedance, Impedance, Impedance] {
  if (isAbsent(z23) && isAbsent(z31)) {
    const zs = readImpedances(z12, 'z12', true);
    if (zs.length !== 3) throw new PhzError(M.needThree('z12', zs.length, 'Z12, Z23, Z31, or give z23 and z31 separately'));
    return [zs[0], zs[1], zs[2]];
  }
  if (isAbsent(z23) || isAbsent(z31)) throw new PhzError(M.oneOrThreeArgs('z12, z23, z31', 2));
  const one = (arg: unknown, name: string): Impedance => {
    const zs = readImpedances(arg, name, true);
    if (zs.length !== 1) throw new PhzError(M.oneOrThreeArgs('z12, z23, z31', 3));
    return zs[0];
  };
  return [one(z12, 'z12'), one(z23, 'z23'), one(z31, 'z31')];
}

/** Delta → star impedance transformation (Kennelly). */
export const DELTATOSTAR = defineFunction({
  name: 'DELTATOSTAR',
  group: 'sets',
  summary: 'Star impedances Z1, Z2, Z3 equivalent to delta branches Z12, Z23, Z31 (Kennelly).',
  details:
    'Z1 = Z12·Z31/ΣZ, Z2 = Z23·Z12/ΣZ, Z3 = Z31·Z23/ΣZ with ΣZ = Z12 + Z23 + Z31 (A. E. Kennelly, 1899). The star ' +
    'arm of a corner is the product of the two branches meeting there over the sum. One branch may be "open" ' +
    '(an open delta): then the arm opposite it is 0 Ω and the other arms equal the closed branches. Give the three ' +
    'branches as one range of three, or as three values.',
  params: [
    { name: 'z12', type: 'matrix', description: 'Branch Z12 (between lines 1 and 2), or a range of three: Z12, Z23, Z31. "open" for a missing branch.' },
    { name: 'z23', type: 'matrix', optional: true, description: 'Branch Z23 (omit when z12 holds all three).' },
    { name: 'z31', type: 'matrix', optional: true, description: 'Branch Z31 (omit when z12 holds all three).' },
    DIGITS,
  ],
  result: 'A 3×1 column of polar text: Z1, Z2, Z3 (ohms when the branches are in ohms).',
  errors: [
    'Other than three values, a blank cell or text that is not an impedance gives #VALUE!.',
    'Two or three "open" branches, or branches that sum to 0 Ω (resonance around the delta), give #VALUE!.',
  ],
  examples: [
    { formula: '=PHZ.DELTATOSTAR(10, 15, 25)', result: [['5∠0°'], ['3∠0°'], ['7.5∠0°']] },
    { formula: '=PHZ.DELTATOSTAR({"30";"30";"open"})', result: [['30∠0°'], ['0'], ['30∠0°']] },
  ],
  implementation: (z12, z23, z31, digits) => {
    const d = readDigits(digits);
    const [a, b, c] = readDelta(z12, z23, z31);
    return setColumn(deltaToStar(a, b, c), d);
  },
});
