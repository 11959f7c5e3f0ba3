/**
 * Identities of panel schedules as fast-check properties, through PHZ.SCHEDULE as a sheet
 * calls it (text cells, every spelling): Kirchhoff's current law (the line currents add to
 * the neutral current), conservation of complex power (the lines carry the circuits' power),
 * a schedule of line-to-line and three-phase circuits only leaves no fundamental neutral
 * current, and the order of the rows does not matter.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rect, type Phasor } from '../../../src/core/phasor';
import { call, ph } from '../sets/_cells';
import { seeded } from '../../core/threephase/schedule-ref';

const SPELL = {
  ln: ['1', 'L1', 'A', 'b', 'L2', '2', 'C', 'l3', '3'],
  ll: ['1-2', 'AB', 'L2-L3', 'cb', '31', 'L3/L1', 'BA'],
  three: ['3P', 'ABC', '123', '3PH'],
};

const way = fc.record({
  kind: fc.constantFrom<'ln' | 'll' | 'three'>('ln', 'll', 'three'),
  pick: fc.nat(100),
  load: fc.double({ min: 10, max: 20000, noNaN: true }),
  unit: fc.constantFrom('', ' W', ' kW', ' VA', ' kVA'),
  pf: fc.double({ min: 0.3, max: 1, noNaN: true }),
  lead: fc.boolean(),
  demand: fc.double({ min: 0.1, max: 1, noNaN: true }),
});
type Way = { kind: 'ln' | 'll' | 'three'; pick: number; load: number; unit: string; pf: number; lead: boolean; demand: number };

const supply = fc
  .tuple(fc.double({ min: 100, max: 280, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: 100, max: 280, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: 100, max: 280, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true }))
  .map(([m1, d1, m2, d2, m3, d3]) => [[`${m1}∠${d1}`], [`${m2}∠${-120 + d2}`], [`${m3}∠${120 + d3}`]]);

function cells(ways: readonly Way[]): { connections: unknown[][]; loads: unknown[][]; pfs: unknown[][]; demand: unknown[][] } {
  return {
    connections: ways.map((w) => [SPELL[w.kind][w.pick % SPELL[w.kind].length]]),
    loads: ways.map((w) => [w.unit === '' ? w.load : w.unit.includes('k') ? `${w.load / 1000}${w.unit}` : `${w.load}${w.unit}`]),
    pfs: ways.map((w) => [w.lead ? `${w.pf} lead` : w.pf]),
    demand: ways.map((w) => [w.demand]),
  };
}

function schedule(e: unknown[][], ways: readonly Way[]): (string | number | boolean)[][] {
  const c = cells(ways);
  return call('SCHEDULE', e, c.connections, c.loads, c.pfs, null, c.demand, null, null, 15);
}

const sum = (zs: Phasor[]): Phasor => zs.reduce((a, b) => a.add(b), rect(0));

describe('PHZ.SCHEDULE identities (fast-check)', () => {
  it('Kirchhoff: I1 + I2 + I3 equals the neutral current', () => {
    fc.assert(
      fc.property(supply, fc.array(way, { minLength: 1, maxLength: 60 }), (e, ways) => {
        const t = schedule(e, ways);
        const lines = [0, 1, 2].map((k) => ph(t[k][0]));
        const scale = lines.reduce((s, z) => s + z.abs(), 0);
        expect(sum(lines).sub(ph(t[3][0])).abs()).toBeLessThanOrEqual(1e-12 * scale);
      }),
      { numRuns: 200 },
    );
  });

  it('complex power is conserved: Σ E_k·I_k* of the lines equals Σ S of the circuits (PHZ.LOADPOWER)', () => {
    fc.assert(
      fc.property(supply, fc.array(way, { minLength: 1, maxLength: 60 }), (e, ways) => {
        const t = schedule(e, ways);
        const c = cells(ways);
        const circuits = call('LOADPOWER', c.loads, c.pfs, c.demand, 15).map((r) => ph(r[0]));
        const total = sum(circuits);
        const lineP = t.slice(0, 3).reduce((s, r) => s + (r[2] as number), 0);
        const lineQ = t.slice(0, 3).reduce((s, r) => s + (r[3] as number), 0);
        const scale = circuits.reduce((s, z) => s + z.abs(), 0);
        expect(Math.hypot(lineP - total.re, lineQ - total.im)).toBeLessThanOrEqual(1e-12 * scale);
        // row 4, column 5 is |Σ S|
        expect(Math.abs((t[3][4] as number) - total.abs())).toBeLessThanOrEqual(1e-12 * scale);
      }),
      { numRuns: 200 },
    );
  });

  it('only line-to-line and three-phase circuits: the fundamental neutral current is exactly 0, and so is the maximum unbalanced load', () => {
    fc.assert(
      fc.property(supply, fc.array(way.filter((w) => w.kind !== 'ln'), { minLength: 1, maxLength: 60 }), (e, ways) => {
        const t = schedule(e, ways);
        expect(t[3][0]).toBe('0');
        expect(t[3][1]).toBe(0);
        expect(t[3][2]).toBe(0);
      }),
      { numRuns: 200 },
    );
  });

  it('permuting the rows changes nothing', () => {
    fc.assert(
      fc.property(supply, fc.array(way, { minLength: 2, maxLength: 60 }), fc.nat(), (e, ways, seed) => {
        const rnd = seeded(seed);
        const shuffled = ways.map((w) => [rnd(), w] as const).sort((a, b) => a[0] - b[0]).map(([, w]) => w);
        const a = schedule(e, ways);
        const b = schedule(e, shuffled);
        // scales: the currents of the lines, the powers through them, and 100 for the percentage
        const iScale = [0, 1, 2].reduce((acc, k) => acc + (a[k][1] as number), 0);
        const sScale = [0, 1, 2].reduce((acc, k) => acc + (a[k][4] as number), 0);
        for (let r = 0; r < 4; r++) {
          expect(ph(a[r][0]).sub(ph(b[r][0])).abs()).toBeLessThanOrEqual(1e-12 * iScale);
          for (let c = 1; c < 5; c++) {
            const scale = r < 3 ? (c === 1 ? iScale : sScale) : c === 3 ? 100 : c === 4 ? sScale : iScale;
            expect(Math.abs((a[r][c] as number) - (b[r][c] as number)), `row ${r + 1} column ${c + 1}`).toBeLessThanOrEqual(1e-12 * scale);
          }
        }
      }),
      { numRuns: 150 },
    );
  });

  it('a balanced set of line-to-neutral loads on a balanced supply cancels in the neutral (by hand: 3 equal currents 120° apart)', () => {
    const t = call('SCHEDULE', 230, [['L1'], ['L2'], ['L3']], [['4 kW'], ['4 kW'], ['4 kW']], 0.9);
    expect(t[3][0]).toBe('0');
    expect(t[3][3]).toBe(0);
    const i = ph(t[0][0]);
    expect(Math.abs(i.abs() - 4000 / 0.9 / 230)).toBeLessThan(1e-4);
  });
});
