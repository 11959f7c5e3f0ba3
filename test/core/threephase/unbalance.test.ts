import { describe, expect, it } from 'vitest';
import { polarDeg, rect } from '../../../src/core/phasor';
import { NEMA_DERATE_CURVE, balancedSet, lineVoltages, magUnbalance, maxDeviation, motorDerate, vuf, zeroUnbalance } from '../../../src/core/threephase';
import { expectClose, expectPhzError } from '../../helpers';

describe('maxDeviation (LVUR / PVUR)', () => {
  it.each([
    // [source, magnitudes, published percent, relative tolerance of the published rounding]
    ['IEEE Std 112 phase-voltage definition (PVUR, from memory) applied by hand: 230, 232, 225 V → 4/229 = 1.747 %', [230, 232, 225], 1.7467, 1e-4],
    ['NEMA MG 1 (Part 14, unbalanced voltages) example: 460, 467, 450 V → 1.96 % (from memory)', [460, 467, 450], 1.96, 0.001],
    ['industrialmonitordirect.com, NEMA MG1 limits: 480, 476, 472 V → 0.84 %', [480, 476, 472], 0.84, 0.002],
    ['eng-tips.com thread 481112, NEMA definition: 462, 463, 455 V → 1.1 %', [462, 463, 455], 1.1, 0.02],
  ] as const)('%s', (_, m, pct, rel) => {
    expectClose(maxDeviation([m[0], m[1], m[2]]), pct, rel);
  });
  it('is exactly 100·max|U − mean|/mean', () => {
    expectClose(maxDeviation([230, 232, 225]), (100 * 4) / 229);
  });
  it('rejects a zero mean', () => {
    expect(expectPhzError(() => maxDeviation([0, 0, 0], 'values')).message).toMatch(/average magnitude of 0/);
  });
});

describe('vuf, zeroUnbalance and the IEC 61000-4-30 magnitude formula', () => {
  it('VUF of (230, 230∠−120, 200∠120) is |V−|/|V+| = 10/220', () => {
    expectClose(vuf([polarDeg(230, 0), polarDeg(230, -120), polarDeg(200, 120)]), (100 * 10) / 220);
    expectClose(zeroUnbalance([polarDeg(230, 0), polarDeg(230, -120), polarDeg(200, 120)]), (100 * 10) / 220);
  });
  it('VUF is the same from phase or line voltages', () => {
    const p = [polarDeg(236, 1), polarDeg(228, -118), polarDeg(221, 122)] as const;
    expectClose(vuf(lineVoltages(p)), vuf(p), 1e-12);
  });
  it('IEC 61000-4-30 (cl. 5.7): the magnitude formula equals the negative/positive ratio for line voltages', () => {
    const l = lineVoltages([polarDeg(236, 1), polarDeg(228, -118), polarDeg(221, 122)]);
    expectClose(magUnbalance([l[0].abs(), l[1].abs(), l[2].abs()]), vuf(l), 1e-10);
  });
  it('the stable form agrees with the formula as the standard writes it, away from balance', () => {
    const u = [400, 380, 415] as const;
    const beta = (u[0] ** 4 + u[1] ** 4 + u[2] ** 4) / (u[0] ** 2 + u[1] ** 2 + u[2] ** 2) ** 2;
    const r = Math.sqrt(3 - 6 * beta);
    expectClose(magUnbalance(u), 100 * Math.sqrt((1 - r) / (1 + r)), 1e-9);
  });
  it('a balanced set has zero VUF and zero MAG', () => {
    expect(vuf(balancedSet(polarDeg(230, 17)))).toBe(0);
    expect(magUnbalance([400, 400, 400])).toBe(0);
  });
  it('rejects magnitudes that cannot close a triangle, and a set with no positive sequence', () => {
    expect(expectPhzError(() => magUnbalance([400, 100, 100], 'values')).message).toMatch(/closed triangle/);
    expect(expectPhzError(() => vuf(balancedSet(rect(230), 'negative').map((z) => z.mul(0)) as never, 'values')).message).toMatch(/no positive-sequence/);
  });
});

describe('motorDerate (NEMA MG 1 curve)', () => {
  it.each(NEMA_DERATE_CURVE.filter(([x]) => x !== 1).map(([x, y]) => [x, y]))(
    'Engineering ToolBox, "Voltage Imbalance – Derating Factor in Polyphase Motors" (points of the NEMA MG 1 curve): %s %% → %s',
    (x, y) => {
      expect(motorDerate(x)).toBe(y);
    },
  );
  it('ABB power-quality note: 3 % unbalance → derate to about 90 % of rated load (NEMA MG 1)', () => {
    expectClose(motorDerate(3), 0.9, 0.012);
  });
  it('NEMA MG 1 derating curve read near 2 % (from memory): 1.96 % → a factor near 0.95', () => {
    expectClose(motorDerate(1.96), 0.95, 0.005);
  });
  it('interpolates linearly between points', () => {
    expectClose(motorDerate(2.75), (0.93 + 0.89) / 2);
  });
  it('above 5 % is #N/A: NEMA MG 1 advises against operation', () => {
    expect(expectPhzError(() => motorDerate(5.01), 'notAvailable').message).toMatch(/advises against operating/);
  });
  it('a negative unbalance is #VALUE!', () => {
    expect(expectPhzError(() => motorDerate(-1)).message).toMatch(/0 or more/);
  });
});
