import { PhzError } from '../../core/errors';
import { formatPolar } from '../../core/format';
import { feederMessages as M } from '../../core/messages/feeders';
import { aggregateSchedule, type Harmonic } from '../../core/threephase';
import { defineFunction, type HostResult } from '../spec';
import { readBoolean, readDigits } from '../readers';
import { DIGITS } from '../params';
import { isOmitted } from '../sets/_threephase';
import { readHarmonics } from '../neutral/_harmonics';
import { SIZING_CAUTIONS } from '../neutral/_cautions';
import { readCircuits, readSupply, scheduleColumn } from './_schedule';

const HEADER = ['', 'current (A)', '|I| (A)', 'P (W)', 'Q (var)', 'S (VA)'];
const ROW_LABELS = ['line 1', 'line 2', 'line 3', 'neutral: I_N, I_N rms, max unbalanced L-N load (A), current unbalance (%), total S'];

/** A number as a cell: -0 shows as 0. */
const num = (x: number): number => (x === 0 ? 0 : x);

/** Panel schedule → line currents, neutral (fundamental and rms), unbalance. */
export const SCHEDULE = defineFunction({
  name: 'SCHEDULE',
  group: 'feeders',
  summary: 'Panel schedule → line currents, neutral current (fundamental and rms with harmonics), per-line powers, maximum unbalanced load and current unbalance.',
  details:
    'One row per circuit: connection, load, power factor, and optionally its non-linear share and demand factor. Connections, in any case: ' +
    'line to neutral 1, L1 or A (also L1-N, AN); line to line 1-2, 12, L1-L2, L1/L2 or AB, either order; three-phase 3P, 3PH, TP, 123, L1L2L3 or ABC. ' +
    'Loads: a number is W; text may carry W, kW, VA or kVA (any SI prefix, decimal comma). Power factor: the displacement power factor ' +
    'of the fundamental, lagging unless the word lead follows it (0.9 lead; lag, ind and cap are read too); a negative power factor is ' +
    'refused, never read as leading, since sign conventions differ. A load in W is P (S = P/pf), in VA |S| (P = S·pf). The demand factor ' +
    '(0 to 1, or 80 %) scales the load; the non-linear share (0 to 1, or 40 %) is the part of the load whose harmonic currents the ' +
    'harmonics table gives, rows [order, percent] or [order, p1, p2, p3] (p1 for the circuits on line 1, and so on) in percent of that part’s fundamental current, as NEUTRALRMS takes them. ' +
    'A row whose load is blank or 0 is a spare way and is skipped. Every load is taken at the supply voltage (no drop); S = V·I*. ' +
    'Line to neutral on phase k: I = (S/E_k)*. Line to line p-q: I = (S/V_pq)* with V_pq = E_p − E_q, out of line p and into line q ' +
    '(the exact phasor, not half the power on each phase). Three-phase: a balanced set, I1 = (S/(3·V₁))*, I2 = a²·I1, I3 = a·I1, with V₁ ' +
    'the positive-sequence supply voltage (E1 on a balanced supply), so it adds nothing to the neutral. Harmonics (the model of NEUTRALRMS): ' +
    'the non-linear part of a circuit on phase k draws at order h the given percent of its fundamental current at h times the angle of ' +
    'E_k, so the triplens of the three phases add in the neutral; line-to-line and three-phase circuits put no harmonic current into the ' +
    'neutral (their triplens do not flow there; common practice), so their non-linear share changes no cell of this table. ' +
    'Rows 1–3, line k: current I_k (fundamental), |I_k|, and P, Q, S of S_k = E_k·I_k*, the power through line k referred to the neutral ' +
    '(what a wattmeter per phase reads; the three add to the board’s power). Row 4: the neutral current I_N = I1 + I2 + I3 (fundamental), ' +
    'its rms with the harmonics, √(|I_N|² + Σ|I_N,h|²), the maximum unbalanced load of NFPA 70 220.61(A) — the largest calculated ' +
    'line-to-neutral load of one phase, Σ|S|/|E_k| over its line-to-neutral circuits after demand, added in VA as Article 220 adds loads ' +
    '(line-to-line and three-phase circuits are not between the neutral and a line) — the current unbalance, the largest deviation of ' +
    '|I_k| from their mean over the mean in %, and |Σ S| of the board. supply: the phase voltages, or one value for a balanced set from it. ' +
    'V and W give A, VA and var.',
  params: [
    { name: 'supply', type: 'matrix', description: 'Phase voltages E1, E2, E3 (e.g. PHZ.BALANCED(230)), or one phase voltage for a balanced supply (230).' },
    { name: 'connections', type: 'matrix', description: 'Column of connections: 1, L1, A; 1-2, L1-L2, AB; 3P, 123, ABC (any case).' },
    { name: 'loads', type: 'matrix', description: 'Column of loads: a number is W; or text in W, kW, VA, kVA ("2.2 kW"). Blank or 0 = spare.' },
    { name: 'power_factors', type: 'matrix', description: 'Column of power factors (or one for all), lagging; "0.9 lead" for leading. Not negative.' },
    { name: 'nonlinear', type: 'matrix', optional: true, description: 'Non-linear share of each load, 0 to 1 or "40 %" (or one for all; default 0).' },
    { name: 'demand', type: 'matrix', optional: true, description: 'Demand factor of each load, 0 to 1 or "80 %" (or one for all; default 1).' },
    { name: 'harmonics', type: 'matrix', optional: true, description: 'Harmonics of the non-linear part: rows [order, percent] or [order, p1, p2, p3].' },
    { name: 'labels', type: 'scalar', optional: true, description: 'TRUE adds a header row and a label column (default FALSE).' },
    DIGITS,
  ],
  result:
    'A 4×5 table (5×6 with labels): rows lines 1–3 [I (polar text), |I|, P, Q, S]; row 4 [I_N (polar text), I_N rms, max unbalanced L-N load, current unbalance %, |total S|].',
  errors: [
    'A connection other than those listed, or blank on a row with a load, gives #VALUE! naming the row.',
    'A load in a unit other than W or VA, a negative load, a power factor that is blank, negative or above 1, or a share or demand factor outside 0–1 gives #VALUE! naming the row.',
    'Columns of different lengths (connections and loads; the others one value or the same length), a block instead of a column, or no load at all gives #VALUE!.',
    'A harmonics table without nonlinear, or non-linear shares without a harmonics table, gives #VALUE! (the one would change nothing).',
    'A supply of other than one or three voltages, or a loaded circuit across 0 V, gives #VALUE!.',
  ],
  cautions: [
    ...SIZING_CAUTIONS,
    'Loads are taken at the supply voltage; demand factors, diversity and the 125 % rule for continuous loads follow the locally adopted rules and are for you to apply.',
  ],
  examples: [
    {
      formula: '=PHZ.SCHEDULE(230, {"L1";"B";"3";"L1-L2";"3P"}, {"4.6 kW";2300;"2.3 kVA";"8 kVA";"12 kW"}, {1;1;"0.8 lead";1;0.8}, , , , TRUE(), 4)',
      result: [['', 'current (A)', '|I| (A)', 'P (W)', 'Q (var)', 'S (VA)'], ['line 1', '54.86∠-3.137°', 54.8648325101462, 12600, 690.598923241497, 12618.9114773336], ['line 2', '50.38∠-147.3°', 50.382232704448, 10300, 5309.4010767585, 11587.913522023], ['line 3', '26.35∠104.5°', 26.3501218686987, 5840, 1620, 6060.5280298007], ['neutral: I_N, I_N rms, max unbalanced L-N load (A), current unbalance (%), total S', '7.488∠-39.19°', 7.48845454989662, 20, 39.9300491460641, 29733.0119564097]],
    },
    {
      formula: '=PHZ.SCHEDULE(230, {"A";"B";"C"}, {"2.3 kVA";"2.3 kVA";"2.3 kVA"}, 1, 1, 1, {3,80})',
      result: [['10∠0°', 10, 2300, 0, 2300], ['10∠-120°', 10, 2300, 0, 2300], ['10∠120°', 10, 2300, 0, 2300], ['0', 24, 10, 0, 6900]],
    },
  ],
  implementation: (supply, connections, loads, powerFactors, nonlinear, demand, harmonics, labels, digits) => {
    const d = readDigits(digits);
    const withLabels = readBoolean(labels, 'labels', false);
    const e = readSupply(supply);
    const hasNonlinear = !isOmitted(nonlinear);
    const { circuits, firstNonlinear } = readCircuits({
      connections: scheduleColumn(connections, 'connections'),
      loads: scheduleColumn(loads, 'loads'),
      powerFactors: scheduleColumn(powerFactors, 'power_factors'),
      nonlinear: hasNonlinear ? scheduleColumn(nonlinear, 'nonlinear') : null,
      demand: isOmitted(demand) ? null : scheduleColumn(demand, 'demand'),
    });
    const h: Harmonic[] = isOmitted(harmonics) ? [] : readHarmonics(harmonics);
    if (h.length > 0 && !hasNonlinear) throw new PhzError(M.harmonicsWithoutNonlinear);
    if (h.length === 0 && firstNonlinear !== null) throw new PhzError(M.nonlinearWithoutHarmonics(firstNonlinear));
    const r = aggregateSchedule(e, circuits, h);
    const table: HostResult = [0, 1, 2].map((k) => {
      const i = r.lineCurrents[k];
      const s = r.linePowers[k];
      return [formatPolar(i, d), num(i.abs()), num(s.re), num(s.im), num(s.abs())];
    });
    table.push([formatPolar(r.neutral, d), num(r.neutralRms), num(r.maxUnbalanced), num(r.unbalancePct), num(r.totalPower.abs())]);
    if (!withLabels) return table;
    return [HEADER.slice(), ...table.map((row, i) => [ROW_LABELS[i], ...row])];
  },
});
