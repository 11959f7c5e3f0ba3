/**
 * Panel-schedule aggregation in the core: how connections are read, the exact line-to-line
 * and three-phase contributions, the neutral and its harmonics, against mathjs computed
 * circuit by circuit and by nodal analysis (test/core/threephase/schedule-ref.ts).
 */
import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import { polarDeg, rect, type Phasor } from '../../../src/core/phasor';
import { aggregateSchedule, balancedSet, connectionName, groupOf, parseConnection, type ScheduleCircuit, type Triple } from '../../../src/core/threephase';
import { expectClose, expectPhasorClose, expectPhzError } from '../../helpers';
import { circuitByCircuit, nodalSchedule, refPower, seeded, type RefCircuit, type RefConnection } from './schedule-ref';

const E230 = balancedSet(rect(230));

describe('parseConnection', () => {
  it.each([
    ['1', 'L1'],
    ['L1', 'L1'],
    ['a', 'L1'],
    [' l 1 ', 'L1'],
    ['L1-N', 'L1'],
    ['AN', 'L1'],
    ['1N', 'L1'],
    ['2', 'L2'],
    ['B', 'L2'],
    ['l2', 'L2'],
    ['3', 'L3'],
    ['C', 'L3'],
    ['1-2', 'L1-L2'],
    ['12', 'L1-L2'],
    ['L1-L2', 'L1-L2'],
    ['L1L2', 'L1-L2'],
    ['L1/L2', 'L1-L2'],
    ['AB', 'L1-L2'],
    ['ba', 'L1-L2'],
    ['2-1', 'L1-L2'],
    ['L2–L1', 'L1-L2'],
    ['2-3', 'L2-L3'],
    ['BC', 'L2-L3'],
    ['32', 'L2-L3'],
    ['3-1', 'L3-L1'],
    ['31', 'L3-L1'],
    ['CA', 'L3-L1'],
    ['AC', 'L3-L1'],
    ['1-3', 'L3-L1'],
    ['3P', '3P'],
    ['3p', '3P'],
    ['3PH', '3P'],
    ['3φ', '3P'],
    ['TP', '3P'],
    ['123', '3P'],
    ['1-2-3', '3P'],
    ['ABC', '3P'],
    ['cab', '3P'],
    ['L1L2L3', '3P'],
    ['L1-L2-L3', '3P'],
  ])('reads %j as %s (common practice: the spellings schedules use)', (text, name) => {
    const r = parseConnection(text);
    expect(r.ok).toBe(true);
    if (r.ok) expect(connectionName(r.connection)).toBe(name);
  });

  it('reads numbers as their digits: 1 is L1, 12 lines 1-2, 123 three-phase', () => {
    const names = [1, 2, 3, 12, 23, 31, 21, 123].map((n) => {
      const r = parseConnection(n);
      return r.ok ? connectionName(r.connection) : 'refused';
    });
    expect(names).toEqual(['L1', 'L2', 'L3', 'L1-L2', 'L2-L3', 'L3-L1', 'L1-L2', '3P']);
  });

  it.each(['', 'L4', 'D', 'N', '0', '4', '1--2', '-1', '1-', 'L', 'L1-L2-N', 'TPN', '3P4W', '1 phase', 'spare'])('refuses %j', (text) => {
    expect(parseConnection(text)).toEqual({ ok: false, repeated: false });
  });

  it.each(['11', 'AA', 'L1-L1', '1-1-2'])('refuses %j, which names a line twice, and says so', (text) => {
    expect(parseConnection(text)).toEqual({ ok: false, repeated: true });
  });

  it('gives seven groups in a fixed order', () => {
    const groups = ['L1', 'L2', 'L3', 'L1-L2', 'L2-L3', 'L3-L1', '3P'].map((t) => {
      const r = parseConnection(t);
      return r.ok ? groupOf(r.connection) : -1;
    });
    expect(groups).toEqual([0, 1, 2, 3, 4, 5, 6]);
  });
});

const circuit = (text: string, s: Phasor, nonlinear = 0, at = 'connections'): ScheduleCircuit => {
  const r = parseConnection(text);
  if (!r.ok) throw new Error(text);
  return { group: groupOf(r.connection), re: s.re, im: s.im, nonlinear, at: () => at };
};

describe('aggregateSchedule', () => {
  it('a line-to-line load draws (S/V12)* out of line 1 and into line 2, not half its power on each phase', () => {
    // 8 kVA at unity pf across V12 = 398.372∠30° V: 20.0817∠30° A (by hand: 8000/(230·√3))
    const r = aggregateSchedule(E230, [circuit('1-2', rect(8000))], []);
    expectPhasorClose(r.lineCurrents[0], polarDeg(8000 / (230 * Math.sqrt(3)), 30), 1e-14);
    expectPhasorClose(r.lineCurrents[1], polarDeg(8000 / (230 * Math.sqrt(3)), -150), 1e-14);
    expect(r.lineCurrents[2]).toEqual(rect(0));
    expect(r.neutral.re === 0 && r.neutral.im === 0).toBe(true);
    // the shortcut of halving the load onto two phases gives 4000/230 = 17.4 A at 0°: wrong in magnitude and angle
    expect(Math.abs(r.lineCurrents[0].abs() - 4000 / 230)).toBeGreaterThan(2);
    // its power through each line (wattmeter per phase) is not half each, but adds to 8 kVA
    expectPhasorClose(r.linePowers[0].add(r.linePowers[1]), rect(8000), 1e-14);
    expectClose(r.linePowers[0].re, 4000, 1e-12);
    expectClose(r.linePowers[0].im, -8000 / (2 * Math.sqrt(3)), 1e-12);
  });

  it('a three-phase load splits as a balanced positive-sequence set, even on an unbalanced supply', () => {
    const e: Triple<Phasor> = [polarDeg(236, 2), polarDeg(221, -117), polarDeg(229, 121.5)];
    const s = polarDeg(15000, 31.79);
    const r = aggregateSchedule(e, [circuit('3P', s)], []);
    const [i1, i2, i3] = r.lineCurrents;
    expectClose(i2.abs(), i1.abs(), 1e-13);
    expectClose(i3.abs(), i1.abs(), 1e-13);
    expectPhasorClose(i1.add(i2).add(i3), rect(0), 1e-13);
    // Σ E_k·I_k* is the load's power exactly (3·V₁·I₁*, the positive-sequence power)
    expectPhasorClose(r.linePowers[0].add(r.linePowers[1]).add(r.linePowers[2]), s, 1e-13);
    expect(r.neutral.re === 0 && r.neutral.im === 0).toBe(true);
  });

  it('agrees with mathjs circuit by circuit on random schedules of 400 ways, all connection kinds, mixed power factors, unbalanced supplies', () => {
    for (let seed = 1; seed <= 6; seed++) {
      const rnd = seeded(seed);
      const e: Triple<Phasor> = [polarDeg(210 + 40 * rnd(), -4 + 8 * rnd()), polarDeg(210 + 40 * rnd(), -124 + 8 * rnd()), polarDeg(210 + 40 * rnd(), 116 + 8 * rnd())];
      const circuits: RefCircuit[] = [];
      for (let i = 0; i < 400; i++) {
        const k = rnd();
        const b = Math.floor(rnd() * 3);
        const connection: RefConnection = k < 0.5 ? { kind: 'ln', phase: b } : k < 0.8 ? { kind: 'll', from: b, to: (b + 1) % 3 } : { kind: '3p' };
        circuits.push({ connection, load: 50 + 9950 * rnd(), apparent: rnd() < 0.5, pf: 0.5 + 0.5 * rnd(), leading: rnd() < 0.2, nonlinear: rnd(), demand: 0.3 + 0.7 * rnd() });
      }
      const names = ['L1', 'L2', 'L3'];
      const ours = aggregateSchedule(
        e,
        circuits.map((c, i) => {
          const s = refPower(c);
          const text = c.connection.kind === 'ln' ? names[c.connection.phase] : c.connection.kind === 'll' ? `${c.connection.from + 1}-${c.connection.to + 1}` : '3P';
          return circuit(text, rect(s.re, s.im), c.nonlinear, `row ${i + 1}`);
        }),
        [{ order: 3, percent: [80, 70, 60] }],
      );
      const ref = circuitByCircuit(
        e.map((z) => ({ re: z.re, im: z.im })),
        circuits,
      );
      const scale = Math.max(...ref.lines.map((z) => math.abs(z) as unknown as number));
      for (let k = 0; k < 3; k++) {
        expectPhasorClose(ours.lineCurrents[k], ref.lines[k], (1e-11 * scale) / ours.lineCurrents[k].abs());
        expectPhasorClose(ours.linePowers[k], ref.linePowers[k], 1e-10);
        expectClose(ours.lineToNeutralLoad[k], ref.lnLoad[k], 1e-12);
      }
      expectPhasorClose(ours.neutral, ref.neutral, (1e-11 * scale) / ours.neutral.abs());
      expectPhasorClose(ours.totalPower, ref.total, 1e-13);
      // third harmonic in the neutral: Σ_k p_k·(Σ nonlinear·|I|)_k ∠ 3·∠E_k (the NEUTRALRMS model)
      const pct = [0.8, 0.7, 0.6];
      const third = [0, 1, 2].reduce<math.Complex>((acc, k) => math.add(acc, math.complex({ r: pct[k] * ref.nonlinearCurrent[k], phi: 3 * e[k].arg() })) as math.Complex, math.complex(0, 0));
      expectClose(ours.byOrder[0][1], math.abs(third) as unknown as number, 1e-11);
      expectClose(ours.neutralRms, Math.hypot(math.abs(ref.neutral) as unknown as number, math.abs(third) as unknown as number), 1e-11);
    }
  });

  it('agrees with a nodal analysis in mathjs (every circuit an admittance, three-phase circuits as floating stars) on a balanced supply', () => {
    for (const [seed, volts] of [
      [11, 230],
      [12, 120],
      [13, 277],
    ] as const) {
      const rnd = seeded(seed);
      const e = balancedSet(polarDeg(volts, 360 * rnd() - 180));
      const circuits: RefCircuit[] = [];
      for (let i = 0; i < 300; i++) {
        const k = rnd();
        const b = Math.floor(rnd() * 3);
        const connection: RefConnection = k < 0.5 ? { kind: 'ln', phase: b } : k < 0.8 ? { kind: 'll', from: b, to: (b + 1) % 3 } : { kind: '3p' };
        circuits.push({ connection, load: 50 + 9950 * rnd(), apparent: rnd() < 0.5, pf: 0.5 + 0.5 * rnd(), leading: rnd() < 0.2, nonlinear: 0, demand: 1 });
      }
      const names = ['L1', 'L2', 'L3'];
      const ours = aggregateSchedule(
        e,
        circuits.map((c) => {
          const s = refPower(c);
          const text = c.connection.kind === 'ln' ? names[c.connection.phase] : c.connection.kind === 'll' ? `${c.connection.from + 1}-${c.connection.to + 1}` : '3P';
          return circuit(text, rect(s.re, s.im));
        }),
        [],
      );
      const ref = nodalSchedule(
        e.map((z) => ({ re: z.re, im: z.im })),
        circuits,
      );
      const scale = Math.max(...ref.lines.map((z) => math.abs(z) as unknown as number));
      for (let k = 0; k < 3; k++) expectPhasorClose(ours.lineCurrents[k], ref.lines[k], (1e-9 * scale) / ours.lineCurrents[k].abs());
      expectPhasorClose(ours.neutral, ref.neutral, (1e-9 * scale) / Math.max(ours.neutral.abs(), 1e-9));
    }
  });

  it('the maximum unbalanced load adds the line-to-neutral loads of a phase in VA, as NFPA 70 Article 220 adds loads', () => {
    // two loads on L1 at different power factors: calculated load (1000 + 1000)/230 A, more than their phasor sum
    const r = aggregateSchedule(E230, [circuit('L1', rect(1000)), circuit('L1', polarDeg(1000, 60)), circuit('1-2', rect(50000)), circuit('3P', rect(90000))], []);
    expectClose(r.maxUnbalanced, 2000 / 230, 1e-14);
    expect(r.neutral.abs()).toBeLessThan(r.maxUnbalanced);
    // line-to-line and three-phase loads are not between the neutral and a line: they do not count
    expect(r.lineToNeutralLoad).toEqual([2000 / 230, 0, 0]);
  });

  it('a harmonic table reaches the neutral only through line-to-neutral circuits', () => {
    const h = [{ order: 3, percent: [90, 90, 90] as Triple<number> }];
    const onlyLL = aggregateSchedule(E230, [circuit('1-2', rect(9000), 1), circuit('3P', rect(9000), 1)], h);
    expect(onlyLL.neutralRms).toBe(0);
    expect(onlyLL.byOrder).toEqual([[3, 0]]);
    // balanced non-linear L-N loads: 10 A per phase, 9 A of third harmonic each, 27 A in the neutral (3 × h × I, IEC 60364-5-52 Annex E basis)
    const ln = aggregateSchedule(E230, ['L1', 'L2', 'L3'].map((p) => circuit(p, rect(2300), 1)), h);
    expect(ln.neutral.abs()).toBe(0);
    expectClose(ln.neutralRms, 27, 1e-13);
  });

  it('refuses a schedule with no load, and a loaded circuit across 0 V naming it', () => {
    expect(expectPhzError(() => aggregateSchedule(E230, [], [])).message).toMatch(/holds no load/);
    expect(expectPhzError(() => aggregateSchedule(E230, [circuit('L1', rect(0))], [])).message).toMatch(/holds no load/);
    const e: Triple<Phasor> = [rect(230), rect(230), polarDeg(230, 120)];
    expect(expectPhzError(() => aggregateSchedule(e, [circuit('L1', rect(100)), circuit('1-2', rect(100), 0, 'connections, row 9')], [])).message).toMatch(
      /connections, row 9 is connected across V12 = E1 − E2, which is 0 V/,
    );
    expect(expectPhzError(() => aggregateSchedule([rect(0), rect(230), rect(230)], [circuit('A', rect(100), 0, 'connections, row 2')], [])).message).toMatch(/row 2 is connected across E1/);
  });
});
