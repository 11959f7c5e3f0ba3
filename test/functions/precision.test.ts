// Precision through chains (issue 8 §4): every phasor-returning function has a route to 15
// significant figures, and a chain built that way reproduces a direct computation. The direct
// computation is mathjs 15 complex arithmetic on the typed inputs, independent of the project.
import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import { specByName, specs } from '../../src/functions';
import { PhzEngine } from '../../src/preview/engine';
import { parsePhasor } from '../../src/core/parse';
import { expectPhasorClose } from '../helpers';

/** Whether the examples show phasor text. */
function returnsPhasorText(name: string): boolean {
  return specByName[name].examples.some((e) => e.result.some((r) => r.some((c) => typeof c === 'string' && c.includes('∠'))));
}

function hasDigits(name: string): boolean {
  // the shared DIGITS parameter: optional, last
  const p = specByName[name].params;
  return p.length > 0 && p[p.length - 1].name === 'digits';
}

describe('every function that returns a phasor has a documented route to 15 significant figures', () => {
  it.each(specs.filter((s) => returnsPhasorText(s.name)).map((s) => [s.name] as const))('%s', (name) => {
    if (hasDigits(name)) return expect(specByName[name].params.at(-1)?.optional).toBe(true);
    // a twin is itself the route
    if (specs.some((s) => s.fullTwin === name)) return expect(specByName[name].result).toMatch(/15 significant figures/);
    // a repeating argument must be last, so the route is a twin with the same arguments
    // whose result has 15 significant figures
    const twin = specByName[name].fullTwin;
    expect(twin, `${name} has neither a digits argument nor a 15-figure twin`).toBeDefined();
    expect(specByName[twin!], `${twin} is in the registry`).toBeDefined();
    expect(specByName[twin!].params).toEqual(specByName[name].params);
    expect(specByName[name].details, `${name}'s details name the twin`).toContain(`PHZ.${twin}(`);
    expect(specByName[twin!].details, `${twin}'s details say what it is`).toMatch(/15 significant figures/);
  });
});

// A workshop board of our own: measured, slightly unbalanced supply; three branch impedances.
const V = ['231.4∠-1.3', '227.9∠-121.7', '229.2∠118.6'];
const Z = ['12.4+j5.1', '18.2+j2.3', '9.7-j3.2'];
const mjV = [math.complex({ r: 231.4, phi: (-1.3 * Math.PI) / 180 }), math.complex({ r: 227.9, phi: (-121.7 * Math.PI) / 180 }), math.complex({ r: 229.2, phi: (118.6 * Math.PI) / 180 })];
const mjZ = [math.complex(12.4, 5.1), math.complex(18.2, 2.3), math.complex(9.7, -3.2)];
const mjI = mjV.map((v, k) => math.divide(v, mjZ[k]) as math.Complex);

describe('a chain through the 15-figure route reproduces the direct computation to 1e-12', () => {
  // A1:A3 supply, B1:B3 impedances, C1:C3 currents, D/E/F the quantities built from them.
  const rows = V.map((v, k) => [v, Z[k], `=PHZ.DIV(A${k + 1},B${k + 1},15)`, `=PHZ.VIPOWER(A${k + 1},C${k + 1},15)`, `=PHZ.MULFULL(B${k + 1}:C${k + 1})`]);
  const engine = new PhzEngine({
    sheets: {
      Board: [
        ...rows,
        ['=PHZ.NEUTRALFULL(C1:C3)', '=PHZ.ADDFULL(C1,C2,C3)', '=PHZ.PARALLELFULL(B1:B3)', '=PHZ.ADDFULL(D1:D3)', '=PHZ.SUB(A1,E1,15)'],
        ['=PHZ.NEUTRALFULL(C1,C2,C3)', '=PHZ.MULFULL(A1,PHZ.INV(B1,15))', '=PHZ.PARALLELFULL(B1,B2:B3)'],
      ],
    },
  });
  const sheet = engine.hf.getSheetId('Board') ?? 0;
  const cell = (row: number, col: number) => {
    const v = engine.display({ sheet, row, col });
    expect(typeof v, JSON.stringify(v)).toBe('string');
    return parsePhasor(v as string);
  };
  const mjIN = math.add(math.add(mjI[0], mjI[1]), mjI[2]) as math.Complex;
  const mjS = mjV.map((v, k) => math.multiply(v, math.conj(mjI[k])) as math.Complex);

  it('NEUTRALFULL and ADDFULL of the currents: I1 + I2 + I3', () => {
    expectPhasorClose(cell(3, 0), mjIN, 1e-12);
    expectPhasorClose(cell(3, 1), mjIN, 1e-12);
    expectPhasorClose(cell(4, 0), mjIN, 1e-12);
  });
  it('PARALLELFULL of the branches: 1 / Σ(1/Z)', () => {
    const y = math.add(math.add(math.divide(1, mjZ[0]), math.divide(1, mjZ[1])), math.divide(1, mjZ[2]));
    expectPhasorClose(cell(3, 2), math.divide(1, y) as math.Complex, 1e-12);
    expectPhasorClose(cell(4, 2), math.divide(1, y) as math.Complex, 1e-12);
  });
  it('ADDFULL of the branch powers V·I*', () => {
    expectPhasorClose(cell(3, 3), math.add(math.add(mjS[0], mjS[1]), mjS[2]) as math.Complex, 1e-12);
  });
  it('MULFULL gives back each supply voltage as Z·I, and V − Z·I is exactly 0', () => {
    for (let k = 0; k < 3; k++) expectPhasorClose(cell(k, 4), mjV[k], 1e-12);
    expect(engine.display({ sheet, row: 3, col: 4 })).toBe('0');
  });
  it('MULFULL of separate values: V1 · (1/Z1) = I1', () => {
    expectPhasorClose(cell(4, 1), mjI[0], 1e-12);
  });
});

describe('rounding noise: the sum of 6-figure currents is the true sum of the rounded operands (README)', () => {
  // The README's example: a balanced 230 V supply into three equal 12.4 + j5.1 Ω branches.
  const engine = new PhzEngine({
    sheets: {
      Load: [
        ['=PHZ.BALANCED(230)', '=PHZ.DIV(A1:A3,"12.4+j5.1")', '=PHZ.DIV(A1:A3,"12.4+j5.1",15)'],
        [null],
        [null],
        ['=PHZ.NEUTRAL(B1:B3)', '=PHZ.NEUTRALFULL(C1:C3)', '=PHZ.ADD("10","-7.5","-2.5")'],
      ],
    },
  });
  const shown = (row: number, col: number) => engine.display({ sheet: 0, row, col });

  it('6-figure currents leave their rounding in the sum; it is not hidden', () => {
    expect(shown(3, 0)).toBe('0.0000299397∠127.643°');
    // mathjs on the three texts as shown, each taken as exact
    const texts = [0, 1, 2].map((r) => shown(r, 1) as string);
    expect(texts).toEqual(['17.1542∠-22.3569°', '17.1542∠-142.357°', '17.1542∠97.6431°']);
    const rounded = texts.map((t) => {
      const [m, a] = t.replace('°', '').split('∠').map(Number);
      return math.complex({ r: m, phi: (a * Math.PI) / 180 });
    });
    const sum = math.add(math.add(rounded[0], rounded[1]), rounded[2]) as math.Complex;
    expectPhasorClose(parsePhasor(shown(3, 0) as string), sum, 1e-5);
  });
  it('the 15-figure route gives exactly 0', () => {
    expect(shown(3, 1)).toBe('0');
  });
  it('typed values are exact: 10 − 7.5 − 2.5 is 0', () => {
    expect(shown(3, 2)).toBe('0');
  });
});

describe('numbers read from a chained result are worth the figures its text shows', () => {
  const engine = new PhzEngine({ sheets: { S: [['=PHZ.REAL(PHZ.DIV("231.4∠-1.3","12.4+j5.1"))', '=PHZ.REAL(PHZ.DIV("231.4∠-1.3","12.4+j5.1",15))']] } });
  const exact = (math.divide(mjV[0], mjZ[0]) as math.Complex).re;
  it('REAL of 6-figure text is good to about 6 figures only; with 15 digits it is good to 1e-13', () => {
    const six = engine.display({ sheet: 0, row: 0, col: 0 }) as number;
    const fifteen = engine.display({ sheet: 0, row: 0, col: 1 }) as number;
    expect(Math.abs(six - exact) / exact).toBeGreaterThan(1e-9);
    expect(Math.abs(six - exact) / exact).toBeLessThan(1e-5);
    expect(Math.abs(fifteen - exact) / exact).toBeLessThan(1e-13);
  });
  it('no function promises "full precision", and the number functions say what is true', () => {
    for (const s of specs) expect(`${s.summary} ${s.details ?? ''} ${s.result}`, s.name).not.toMatch(/full precision/i);
    for (const name of ['MAG', 'ANGLE', 'REAL', 'IMAG', 'SPLIT']) expect(specByName[name].details, name).toMatch(/only the significant figures it shows/);
  });
});
