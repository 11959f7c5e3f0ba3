import { describe, expect, it } from 'vitest';
import { polarDeg, rect, magnitude, angleDeg, ZERO, type Phasor } from '../../../src/core/phasor';
import { OPEN, balancedSet, solveStar, type Neutral, type Triple } from '../../../src/core/threephase';
import { expectClose, expectPhasorClose, expectPhzError } from '../../helpers';
import { referenceStar } from './reference';

const E230 = balancedSet(polarDeg(230, 0));
const NONE: Triple<Phasor> = [ZERO, ZERO, ZERO];
const SOLID: Neutral = { kind: 'solid' };
const OPEN_N: Neutral = { kind: 'open' };

describe('solveStar — published examples', () => {
  it('Alexander & Sadiku, Fundamentals of Electric Circuits, Example 12.13 (acb, 100 V, 4-wire; from memory)', () => {
    // ZA = 15 Ω, ZB = 10 + j5 Ω, ZC = 6 − j8 Ω; book: Ia = 6.67∠0°, Ib = 8.94∠93.44°, Ic = 10∠−66.87°,
    // In = −(Ia + Ib + Ic) = 10.06∠178.4° (book direction N→N'); values as printed, 3–4 figures
    const s = solveStar({ sources: balancedSet(polarDeg(100, 0), 'negative'), loads: [rect(15), rect(10, 5), rect(6, -8)], lines: NONE, neutral: SOLID });
    expectClose(magnitude(s.currents[0]), 6.67, 1e-3);
    expectClose(magnitude(s.currents[1]), 8.94, 1e-3);
    expectClose(angleDeg(s.currents[1]), 93.44, 1e-3);
    expectClose(magnitude(s.currents[2]), 10, 1e-9);
    expectClose(angleDeg(s.currents[2]), -66.87, 1e-3);
    expectClose(magnitude(s.neutralCurrent), 10.06, 1e-3);
    expectClose(angleDeg(s.neutralCurrent.neg()), 178.4, 1e-3);
  });

  it('phase-sequence indicator: capacitor and two lamps (X_C = R) on a 3-wire supply give lamp voltages ≈ 1.5 and 0.4 × phase voltage (from memory)', () => {
    // the classic static indicator (capacitor on phase 1, lamps on 2 and 3, no neutral): the lamp on
    // the phase that follows the capacitor's phase in sequence (phase 2 for 1→2→3) is the bright one.
    // Exact values by Millman: V_N'N = E·(−1 + 3j)/5, lamp voltages 1.4966·E and 0.4009·E.
    const r = 1000;
    const s = solveStar({ sources: E230, loads: [rect(0, -r), rect(r), rect(r)], lines: NONE, neutral: OPEN_N });
    expectClose(magnitude(s.loadVoltages[1]) / 230, 1.5, 0.01);
    expectClose(magnitude(s.loadVoltages[2]) / 230, 0.4, 0.01);
    expectClose(magnitude(s.loadVoltages[1]) / 230, Math.hypot(0.3, 0.5 * Math.sqrt(3) + 0.6));
    expectClose(magnitude(s.loadVoltages[2]) / 230, Math.hypot(0.3, 0.5 * Math.sqrt(3) - 0.6));
    expectPhasorClose(s.shift, rect(-0.2 * 230, 0.6 * 230));
    // reversed sequence: the other lamp is bright
    const rev = solveStar({ sources: balancedSet(polarDeg(230, 0), 'negative'), loads: [rect(0, -r), rect(r), rect(r)], lines: NONE, neutral: OPEN_N });
    expect(magnitude(rev.loadVoltages[2])).toBeGreaterThan(magnitude(rev.loadVoltages[1]));
  });

  it('a star of j√3R, −j√3R, 3R without neutral draws balanced unity-power-factor currents (star equivalent of the Steinmetz delta; from memory)', () => {
    const rr = 30;
    const s = solveStar({ sources: E230, loads: [rect(0, Math.sqrt(3) * rr), rect(0, -Math.sqrt(3) * rr), rect(3 * rr)], lines: NONE, neutral: OPEN_N });
    // balanced currents carry the resistor's power V_line²/R = 3E²/R, so |I| = E/R, in phase with E
    for (let k = 0; k < 3; k++) expectPhasorClose(s.currents[k], E230[k].div(rr));
    expectClose(s.totalLoadPower.re, (230 * Math.sqrt(3)) ** 2 / rr);
    expectClose(s.totalLoadPower.im, 0, 1e-9, s.totalLoadPower.re);
  });
});

describe('solveStar — cases', () => {
  it('solid neutral: each phase sees its own source voltage and N’ stays at N', () => {
    const s = solveStar({ sources: E230, loads: [rect(23), rect(46), rect(23)], lines: NONE, neutral: SOLID });
    expectPhasorClose(s.currents[0], rect(10));
    expectPhasorClose(s.currents[1], polarDeg(5, -120));
    expect(magnitude(s.shift)).toBe(0);
    expectPhasorClose(s.neutralCurrent, polarDeg(5, 60));
  });
  it('open neutral: Millman gives V_N’N = E·(1 + a)/5 = 46∠60° for 23, 46, 23 Ω', () => {
    const s = solveStar({ sources: E230, loads: [rect(23), rect(46), rect(23)], lines: NONE, neutral: OPEN_N });
    expectPhasorClose(s.shift, polarDeg(46, 60));
    expect(magnitude(s.neutralCurrent)).toBe(0);
  });
  it('a balanced load gives zero neutral current and zero shift, exactly', () => {
    const s = solveStar({ sources: E230, loads: [rect(8, 6), rect(8, 6), rect(8, 6)], lines: [rect(0.2, 0.1), rect(0.2, 0.1), rect(0.2, 0.1)], neutral: { kind: 'impedance', z: rect(1, 1) } });
    expect(magnitude(s.neutralCurrent)).toBe(0);
    expect(magnitude(s.shift)).toBe(0);
  });
  it('equal EMFs on a floating star point drive exactly no current (no rounding residue)', () => {
    const e: Triple<Phasor> = [polarDeg(50, 10), polarDeg(50, 10), polarDeg(50, 10)];
    const s = solveStar({ sources: e, loads: [rect(3, 1), rect(0.1, -6), rect(7)], lines: [rect(0.01), rect(0.02), rect(0.01, 2)], neutral: OPEN_N });
    for (const i of s.currents) expect(magnitude(i)).toBe(0);
    expectPhasorClose(s.shift, polarDeg(50, 10));
  });
  it('an open phase carries no current and has the whole E − V_N’N across it', () => {
    const s = solveStar({ sources: E230, loads: [rect(10), OPEN, rect(10)], lines: NONE, neutral: OPEN_N });
    expect(magnitude(s.currents[1])).toBe(0);
    expectPhasorClose(s.loadVoltages[1], E230[1].sub(s.shift));
    // the remaining two loads are in series across V31
    expectPhasorClose(s.currents[0], E230[0].sub(E230[2]).div(20));
  });
  it('a 0 Ω phase with no neutral pins the star point to that phase (line-to-line loads)', () => {
    const s = solveStar({ sources: E230, loads: [rect(0), rect(10), rect(10, 10)], lines: NONE, neutral: OPEN_N });
    expectPhasorClose(s.shift, E230[0]);
    expectPhasorClose(s.currents[1], E230[1].sub(E230[0]).div(10));
    expectPhasorClose(s.currents[0], s.currents[1].add(s.currents[2]).neg());
  });
  it('a 0 Ω phase with an impedant neutral: KCL puts the neutral current through the pinned phase', () => {
    const zn = rect(2, 1);
    const s = solveStar({ sources: E230, loads: [rect(10), rect(0), rect(10)], lines: NONE, neutral: { kind: 'impedance', z: zn } });
    expectPhasorClose(s.shift, E230[1]);
    expectPhasorClose(s.neutralCurrent, E230[1].div(zn));
  });
  it('matches the mathjs reference (4-node nodal solve) with line and neutral impedances', () => {
    const e = [polarDeg(240, 2), polarDeg(228, -121), polarDeg(233, 118)];
    const z = [rect(12, 5), rect(20, 0), rect(8, -6)];
    const zl = [rect(0.15, 0.08), rect(0.2, 0.1), rect(0.12, 0.07)];
    for (const n of [rect(0.5, 0.2), 'open', 'solid'] as const) {
      const neutral: Neutral = n === 'open' ? OPEN_N : n === 'solid' ? SOLID : { kind: 'impedance', z: n };
      const s = solveStar({ sources: [e[0], e[1], e[2]], loads: [z[0], z[1], z[2]], lines: [zl[0], zl[1], zl[2]], neutral });
      const ref = referenceStar(e, z, zl, n);
      for (let k = 0; k < 3; k++) {
        expectPhasorClose(s.currents[k], ref.currents[k], 1e-10);
        expectPhasorClose(s.loadVoltages[k], ref.loadVoltages[k], 1e-10);
      }
      // these may be zero, so compare on the scale of the currents and voltages
      expect(Math.hypot(s.neutralCurrent.re - ref.neutralCurrent.re, s.neutralCurrent.im - ref.neutralCurrent.im)).toBeLessThan(1e-10 * magnitude(s.currents[0]));
      expect(Math.hypot(s.shift.re - ref.shift.re, s.shift.im - ref.shift.im)).toBeLessThan(1e-10 * 240);
    }
  });
});

describe('solveStar — bad networks', () => {
  it.each([
    ['a 0 Ω phase with a solid neutral (shorts source phase 2)', () => solveStar({ sources: E230, loads: [rect(10), rect(0), rect(10)], lines: NONE, neutral: SOLID }), /phase 2: the load impedance of phase 2 is 0 Ω and the neutral is solid/],
    ['load + line cancelling to 0 Ω with a solid neutral', () => solveStar({ sources: E230, loads: [rect(0, -1), rect(10), rect(10)], lines: [rect(0, 1), rect(0, 1), rect(0, 1)], neutral: SOLID }), /load \+ line impedance of phase 1 is 0 Ω/],
    ['two 0 Ω phases without neutral (line-to-line short)', () => solveStar({ sources: E230, loads: [rect(0), rect(0), rect(10)], lines: NONE, neutral: OPEN_N }), /lines 1 and 2 of the source are short-circuited/],
    ['all three loads open', () => solveStar({ sources: E230, loads: [OPEN, OPEN, OPEN], lines: NONE, neutral: SOLID }), /all three load impedances are "open"/],
    ['series resonance at the star point', () => solveStar({ sources: E230, loads: [rect(0, 10), rect(0, -10), OPEN], lines: NONE, neutral: OPEN_N }), /series resonance/],
  ])('rejects %s', (_, f, msg) => {
    expect(expectPhzError(f).message).toMatch(msg);
  });
});
