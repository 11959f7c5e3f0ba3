/**
 * PHZ.SCHEDULE and PHZ.LOADPOWER: the standard checklist (normal use, range input, blank
 * cells, wrong type, wrong count, domain errors), the conventions of the details, published
 * NFPA 70 Annex D examples at 208Y/120 V, and random schedules of hundreds of ways written
 * as schedules write them, against mathjs circuit by circuit.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { polarDeg, rect } from '../../../src/core/phasor';
import { specByName } from '../../../src/functions';
import { expectClose, expectPhasorClose } from '../../helpers';
import { call, col, expectMessage, ph } from '../sets/_cells';
import { circuitByCircuit, randomSchedule, seeded } from '../../core/threephase/schedule-ref';

/** The supply of a 208Y/120 V system: 208/√3 = 120.09 V per phase. */
const E208 = 208 / Math.sqrt(3);

describe('PHZ.SCHEDULE', () => {
  it('normal use: a 4×5 table; rows 1–3 [I, |I|, P, Q, S] of each line, row 4 the neutral', () => {
    const t = call('SCHEDULE', 230, col('L1', 'L2', 'L3'), col('4.6 kW', '2.3 kW', '2.3 kW'), 1, null, null, null, null, 15);
    expect(t.length).toBe(4);
    expect(t.every((row) => row.length === 5)).toBe(true);
    // by hand: 20 A, 10 A, 10 A at unity power factor; the neutral carries 20∠0 + 10∠−120 + 10∠120 = 10∠0 A
    expectPhasorClose(ph(t[0][0]), rect(20), 1e-14);
    expect(t[0].slice(1)).toEqual([20, 4600, 0, 4600]);
    expectPhasorClose(ph(t[3][0]), rect(10), 1e-14);
    expect(t[3][1]).toBe(10);
    expectClose(t[3][2] as number, 20, 1e-14);
    // current unbalance: mean 40/3 A, largest deviation 20/3 A → 50 %
    expectClose(t[3][3] as number, 50, 1e-13);
    expect(t[3][4]).toBe(9200);
  });

  it('labels TRUE adds a header row and a label column (5×6); digits shortens the phasors only', () => {
    const t = call('SCHEDULE', 230, col('L1', '1-2'), col(2300, 4000), 1, null, null, null, true, 3);
    expect(t.length).toBe(5);
    expect(t[0]).toEqual(['', 'current (A)', '|I| (A)', 'P (W)', 'Q (var)', 'S (VA)']);
    expect(t.map((r) => r[0])).toEqual(['', 'line 1', 'line 2', 'line 3', 'neutral: I_N, I_N rms, max unbalanced L-N load (A), current unbalance (%), total S']);
    expect(t[4][1]).toBe('10∠0°');
    expect(typeof t[1][2]).toBe('number');
  });

  it('range input: the supply as three phase voltages or a pair block; columns or rows of cells; one power factor for all', () => {
    const ways = [col('A', 'BC', '3P'), col('3 kW', '5 kVA', '9 kW'), col(0.9, '0.8 lead', 0.85)];
    const byMagnitude = call('SCHEDULE', 230, ...ways, null, null, null, null, 15);
    const bySet = call('SCHEDULE', call('BALANCED', 230, 'positive', 0, 15), ...ways, null, null, null, null, 15);
    const byPairs = call('SCHEDULE', [[230, 0], [-115, -199.18584287042088], [-115, 199.18584287042088]], ...ways, null, null, null, null, 15);
    const byRows = call('SCHEDULE', [['230∠0', '230∠-120', '230∠120']], [['A', 'BC', '3P']], [['3 kW', '5 kVA', '9 kW']], [[0.9, '0.8 lead', 0.85]], null, null, null, null, 15);
    for (const other of [bySet, byPairs, byRows]) {
      for (let r = 0; r < 4; r++) {
        expectPhasorClose(ph(other[r][0]), ph(byMagnitude[r][0]), 1e-13);
        for (let c = 1; c < 5; c++) expectClose(other[r][c] as number, byMagnitude[r][c] as number, 1e-12, 1e-9);
      }
    }
    const onePf = call('SCHEDULE', 230, col('A', 'B'), col(1000, 2000), 0.8);
    const twoPf = call('SCHEDULE', 230, col('A', 'B'), col(1000, 2000), col(0.8, 0.8));
    expect(onePf).toEqual(twoPf);
  });

  it('blank cells: a way with a blank or 0 load is a spare whatever its other cells hold; a loaded way needs a connection and a power factor', () => {
    const withSpares = call('SCHEDULE', 230, col('L1', 'spare', '', 'L2'), col(2300, null, 0, 1150), col(1, 'x', null, 1));
    const without = call('SCHEDULE', 230, col('L1', 'L2'), col(2300, 1150), 1);
    expect(withSpares).toEqual(without);
    expectMessage(() => call('SCHEDULE', 230, col('L1', ''), col(2300, 100), 1), /connections, row 2 is blank but its circuit has a load/);
    expectMessage(() => call('SCHEDULE', 230, col('L1', 'L2'), col(2300, 100), col(1, null)), /power_factors, row 2 is blank but its circuit has a load/);
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(null), 1), /holds no load/);
  });

  it('wrong type: a load in A or var, text that is not a load, TRUE, a power factor in words', () => {
    expectMessage(() => call('SCHEDULE', 230, col('L1', 'L2'), col(2300, '16 A'), 1), /loads, row 2 is "16 A", in A: give a circuit's load as real power \(W, kW\) or apparent power \(VA, kVA\)/);
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col('3 kvar'), 1), /in var/);
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col('about 3 kW'), 1), /loads is "about 3 kW", which is not a load/);
    expectMessage(() => call('SCHEDULE', 230, col('L1', 'L2'), col(true, 100), 1), /loads, row 1 is "TRUE", which is not a load/);
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(100), 'high'), /power_factors is "high", which is not a power factor/);
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(100), '0.9 kW'), /which is not a power factor/);
  });

  it('wrong count: columns of different lengths, a block instead of a column, a supply of two voltages', () => {
    expectMessage(() => call('SCHEDULE', 230, col('L1', 'L2'), col(100), 1), /different numbers of circuits \(connections: 2, loads: 1\)/);
    expectMessage(() => call('SCHEDULE', 230, col('L1', 'L2'), col(100, 200), col(1, 1, 1)), /power_factors: 3/);
    expectMessage(() => call('SCHEDULE', 230, col('L1', 'L2'), col(100, 200), 1, col(0, 0, 0)), /nonlinear: 3/);
    expectMessage(() => call('SCHEDULE', 230, [['L1', 'L2'], ['L3', 'L1']], col(100, 200), 1), /connections is a block of 2 rows by 2 columns/);
    expectMessage(() => call('SCHEDULE', col(230, 230), col('L1'), col(100), 1), /supply holds 2 values/);
  });

  it.each([
    [col('L4'), /connections is "L4", which is not a connection: write a line-to-neutral circuit as 1, L1 or A/],
    [col('N'), /connections is "N", which is not a connection/],
    [col('1-1'), /names one line twice/],
  ])('domain error: connection %j names the row and the spellings', (conn, msg) => {
    expectMessage(() => call('SCHEDULE', 230, conn, col(100), 1), msg);
  });

  it.each([
    [-0.9, /power_factors is -0.9: a negative power factor is not read as leading here .* write the magnitude with the word lead, e.g. 0.9 lead/],
    ['-0.9 lead', /a negative power factor is not read as leading/],
    [0, /must be above 0 and at most 1/],
    [1.2, /power_factors is 1.2 but a power factor must be above 0 and at most 1/],
  ])('domain error: power factor %j', (pf, msg) => {
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(100), pf), msg);
  });

  it('domain error: a negative load, a share or demand outside 0–1, a loaded way across 0 V', () => {
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(-100), 1), /loads is -100 W/);
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(100), 1, 40, null, [[3, 50]]), /nonlinear is 40, but a non-linear share is a fraction from 0 to 1 \(0.4\) or a percentage written with its sign \(40 %\)/);
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(100), 1, null, '120 %'), /demand is 1.2, but a demand factor is a fraction/);
    expectMessage(() => call('SCHEDULE', col('230∠0', '230∠0', '230∠120'), col('L1', 'AB'), col(100, 100), 1), /connections, row 2 is connected across V12 = E1 − E2, which is 0 V/);
  });

  it('the power factor is lagging unless the word lead follows it; lag, ind and cap are read too', () => {
    const at = (pf: unknown): number => ph(call('LOADPOWER', '1 kW', pf, null, 15)[0][0]).im;
    const q = 1000 * Math.tan(Math.acos(0.8));
    expectClose(at(0.8), q, 1e-12);
    for (const lag of ['0.8', '0.8 lag', '0.8 LAGGING', '0,8 ind', '0.8inductive']) expectClose(at(lag), q, 1e-12);
    for (const lead of ['0.8 lead', '0.8 Leading', '0,8 cap', '0.8capacitive']) expectClose(at(lead), -q, 1e-12);
  });

  it('loads: a number is W, text in W, kW, VA, kVA or MVA; W is real power (S = P/pf), VA apparent (P = S·pf); demand scales both', () => {
    const s = (load: unknown, demand: unknown = null) => ph(call('LOADPOWER', load, 0.8, demand, 15)[0][0]);
    expectPhasorClose(s(2000), polarDeg(2500, Math.acos(0.8) * (180 / Math.PI)), 1e-14);
    expectPhasorClose(s('2 kW'), s(2000), 1e-15);
    expectPhasorClose(s('2000W'), s(2000), 1e-15);
    expectPhasorClose(s('2,5 kVA'), s(2000), 1e-14);
    expectPhasorClose(s('0.0025 MVA'), s(2000), 1e-14);
    expectPhasorClose(s('2 kW', 0.5), s(1000), 1e-14);
    expectPhasorClose(s('2 kW', '50 %'), s(1000), 1e-14);
  });

  it('NFPA 70 (2023) Annex D, Example D5(b), 208Y/120 V, per dwelling unit on two phase legs and the neutral: 16.2 A of lighting per leg, 71.6 A line to line; Annex D adds them to 87.8 A, the phasor line current is less', () => {
    // published: "3882 VA ÷ 2 legs ÷ 120 V/leg = 16.2 A"; "14,900 VA ÷ 208 V = 71.6 A"; "Total load = 16.2 A + 71.6 A = 87.8 A"
    const ln = call('SCHEDULE', E208, col('A', 'B'), col('1941 VA', '1941 VA'), 1, null, null, null, null, 15);
    expect(Math.abs((ln[0][1] as number) - 16.2)).toBeLessThan(0.05);
    expect(Math.abs((ln[3][2] as number) - 16.2)).toBeLessThan(0.05);
    const ll = call('SCHEDULE', E208, col('AB'), col('14900 VA'), 1, null, null, null, null, 15);
    expect(Math.abs((ll[0][1] as number) - 71.6)).toBeLessThan(0.05);
    const both = call('SCHEDULE', E208, col('A', 'B', 'AB'), col('1941 VA', '1941 VA', '14900 VA'), 1, null, null, null, null, 15);
    const i1 = both[0][1] as number;
    // the arithmetic sum bounds the phasor sum; mathjs gives the phasor sum: (1941/E∠0)* + (14900/208∠30°)*
    const ref = math.add(math.complex(1941 / E208, 0), math.complex({ r: 14900 / 208, phi: -Math.PI / 6 })) as math.Complex;
    expectClose(i1, math.abs(ref) as unknown as number, 1e-12);
    expect(i1).toBeLessThan(87.8);
    expect(Math.abs(i1 - 86.0)).toBeLessThan(0.05);
    // the neutral of a 3-wire circuit from a 4-wire wye carries as much as a leg (220.61(C)(1): no reduction)
    expectClose(ph(both[3][0]).abs(), ln[0][1] as number, 1e-12);
  });

  it('NFPA 70 (2023) Annex D, Example D5(a), 208Y/120 V main feeder: 99,600 VA of line-to-neutral load gives a 276.5 A neutral load, 253.6 A after 220.61(B); 75,090 VA three-phase draws 208 A', () => {
    // published: "99,600 VA ÷ (208)(1.732) = 276.5 A"; "200 A at 100 % + 76.5 A at 70 % = 253.6 A"; "75,090 VA ÷ (208 V)(1.732) = 208 A"
    const t = call('SCHEDULE', E208, col('A', 'B', 'C'), col('33200 VA', '33200 VA', '33200 VA'), 1, null, null, null, null, 15);
    expect(Math.abs((t[3][2] as number) - 276.5)).toBeLessThan(0.05);
    expect(t[3][0]).toBe('0');
    // the published 253.6 A comes from 276.5 and 76.5 × 0.7 = 53.6 rounded at each step: within 0.1 A
    expect(Math.abs((call('NEUTRALDEMAND', t[3][2])[0][0] as number) - 253.6)).toBeLessThan(0.1);
    const p3 = call('SCHEDULE', E208, col('3P'), col('75090 VA'), 1);
    for (let k = 0; k < 3; k++) expect(Math.abs((p3[k][1] as number) - 208)).toBeLessThan(0.5);
  });

  it('harmonics: the rms neutral current equals PHZ.NEUTRALRMS of the line currents when every circuit is line-to-neutral and non-linear, with percents scaled to each line (same model)', () => {
    const e = col('231∠0.5', '227∠-121', '233∠119');
    const t = call('SCHEDULE', e, col('A', 'B', 'C', 'A'), col('3 kVA', '2 kW', '4 kVA', '1.2 kW'), col(0.9, '0.95 lead', 0.8, 1), 1, null, [[3, 70], [5, 40], [9, 10]], null, 15);
    const rms = call('NEUTRALRMS', [[t[0][0]], [t[1][0]], [t[2][0]]], [[3, 70], [5, 40], [9, 10]], e)[0][0] as number;
    // NEUTRALRMS takes percent of each line's current; the schedule's non-linear part of line 1 is |I_A1| + |I_A2| ≥ |I_1|
    const nl1 = 3000 / 231 + 1200 / 231;
    const i1 = ph(t[0][0]).abs();
    const scaled = call('NEUTRALRMS', [[t[0][0]], [t[1][0]], [t[2][0]]], [[3, 70 * (nl1 / i1), 70, 70], [5, 40 * (nl1 / i1), 40, 40], [9, 10 * (nl1 / i1), 10, 10]], e)[0][0] as number;
    expectClose(t[3][1] as number, scaled, 1e-12);
    expect(t[3][1] as number).toBeGreaterThan(rms);
  });

  it('harmonics per line: [order, p1, p2, p3] gives each line’s circuits their own content (by hand: 9 + 6 + 3 A of third harmonic in phase add to 18 A)', () => {
    const t = call('SCHEDULE', 230, col('A', 'B', 'C'), col('2.3 kW', '2.3 kW', '2.3 kW'), 1, 1, null, [[3, 90, 60, 30]]);
    expect(t[3][0]).toBe('0');
    expectClose(t[3][1] as number, 18, 1e-13);
  });

  it('harmonics and non-linear shares go together: either alone is refused, saying why', () => {
    expectMessage(() => call('SCHEDULE', 230, col('L1'), col(100), 1, null, null, [[3, 50]]), /harmonics were given but nonlinear was left out/);
    expectMessage(() => call('SCHEDULE', 230, col('L1', 'L2'), col(100, 100), 1, col(0, '30 %')), /nonlinear, row 2 marks a non-linear share, but no harmonics table was given/);
    // shares of 0 with no table are linear loads
    expect(() => call('SCHEDULE', 230, col('L1'), col(100), 1, 0)).not.toThrow();
  });

  it('random schedules of 400 ways written as schedules write them (every spelling, W/kW/VA/kVA, lag and lead, shares and demand in % or fractions) agree with mathjs circuit by circuit', () => {
    for (let seed = 21; seed <= 25; seed++) {
      const rnd = seeded(seed);
      const s = randomSchedule(400, rnd);
      const e = [231 * (0.95 + 0.1 * rnd()), 229 * (0.95 + 0.1 * rnd()), 230 * (0.95 + 0.1 * rnd())].map((m, k) => polarDeg(m, [0, -120, 120][k] + 6 * rnd() - 3));
      const harmonics = [[3, 75], [5, 50], [7, 25], [9, 12]];
      const t = call('SCHEDULE', e.map((z) => [z.re, z.im]), s.connections, s.loads, s.powerFactors, s.nonlinear, s.demand, harmonics, null, 15);
      const ref = circuitByCircuit(e, s.circuits);
      const scale = Math.max(...ref.lines.map((z) => math.abs(z) as unknown as number));
      for (let k = 0; k < 3; k++) {
        const i = ph(t[k][0]);
        expect(Math.hypot(i.re - ref.lines[k].re, i.im - ref.lines[k].im)).toBeLessThanOrEqual(1e-11 * scale);
        expectClose(t[k][2] as number, ref.linePowers[k].re, 1e-10);
        expectClose(t[k][3] as number, ref.linePowers[k].im, 1e-9, math.abs(ref.linePowers[k]) as unknown as number);
      }
      const n = ph(t[3][0]);
      expect(Math.hypot(n.re - ref.neutral.re, n.im - ref.neutral.im)).toBeLessThanOrEqual(1e-11 * scale);
      expectClose(t[3][2] as number, Math.max(...ref.lnLoad), 1e-12);
      expectClose(t[3][4] as number, math.abs(ref.total) as unknown as number, 1e-12);
      // rms: each order's neutral component Σ_k p·(Σ share·|I|)_k ∠ h·∠E_k, root-sum-square with the fundamental
      let sumSq = (math.abs(ref.neutral) as unknown as number) ** 2;
      for (const [h, p] of harmonics) {
        const z = [0, 1, 2].reduce<math.Complex>((acc, k) => math.add(acc, math.complex({ r: (p / 100) * ref.nonlinearCurrent[k], phi: h * e[k].arg() })) as math.Complex, math.complex(0, 0));
        sumSq += (math.abs(z) as unknown as number) ** 2;
      }
      expectClose(t[3][1] as number, Math.sqrt(sumSq), 1e-11);
      // current unbalance from the mathjs line currents
      const m = ref.lines.map((z) => math.abs(z) as unknown as number);
      const mean = (m[0] + m[1] + m[2]) / 3;
      expectClose(t[3][3] as number, (100 * Math.max(...m.map((x) => Math.abs(x - mean)))) / mean, 1e-9);
    }
  });

  it('details state the conventions: lead, the refused negative power factor, the exact line-to-line phasor, the balanced three-phase set, 220.61', () => {
    const d = specByName.SCHEDULE.details ?? '';
    for (const phrase of ['0.9 lead', 'a negative power factor is refused', '(S/V_pq)*', 'not half the power on each phase', 'positive-sequence', 'NFPA 70 220.61(A)', 'their triplens do not flow there']) {
      expect(d).toContain(phrase);
    }
    expect(specByName.SCHEDULE.cautions?.some((c) => /competent, licensed person/.test(c))).toBe(true);
  });
});

describe('PHZ.LOADPOWER', () => {
  it('normal use and a published value: 8 kW at 0.8 is 10 kVA at 36.87° (S = P/pf, common practice)', () => {
    expectPhasorClose(ph(call('LOADPOWER', '8 kW', 0.8, null, 15)[0][0]), polarDeg(10000, Math.acos(0.8) * (180 / Math.PI)), 1e-14);
  });
  it('range input: a column of loads with one power factor, or one per load; one demand factor for all', () => {
    const r = call('LOADPOWER', col('1 kW', '2 kVA', 500), col(1, '0.8 lead', 0.5), '50 %', 15);
    expectPhasorClose(ph(r[0][0]), rect(500), 1e-15);
    expectPhasorClose(ph(r[1][0]), rect(800, -600), 1e-14);
    expectPhasorClose(ph(r[2][0]), polarDeg(500, 60), 1e-13);
    expect(call('LOADPOWER', col(100, 200), 1)).toEqual([['100∠0°'], ['200∠0°']]);
  });
  it('blank cell: a blank or 0 load is a spare (0) and needs no power factor; a load with a blank power factor is an error', () => {
    expect(call('LOADPOWER', col(null, 0, ''), col(null, null, null))).toEqual([['0'], ['0'], ['0']]);
    expectMessage(() => call('LOADPOWER', col(100), col(null)), /power_factor is blank but its circuit has a load/);
  });
  it('wrong type, wrong count and domain errors name the row', () => {
    expectMessage(() => call('LOADPOWER', col(100, '5 A'), 1), /load, row 2 is "5 A", in A/);
    expectMessage(() => call('LOADPOWER', col(100, 200, 300), col(1, 1)), /load: 3, power_factor: 2/);
    expectMessage(() => call('LOADPOWER', col(100, 200), col(1, -0.7)), /power_factor, row 2 is -0.7: a negative power factor is not read as leading/);
  });
});
