import { PhzError } from '../../core/errors';
import { formatPolar } from '../../core/format';
import { feederMessages as M } from '../../core/messages/feeders';
import { readerMessages as R } from '../../core/messages';
import { parseNumberText, type UnitSeen } from '../../core/parse';
import { magnitude, rect, type Phasor } from '../../core/phasor';
import { balancedSet, dropFourWire, dropSinglePath, type DropRow, type DropSystem } from '../../core/threephase';
import { defineFunction, type HostResult } from '../spec';
import { asMatrix, isBlank, readBoolean, readDigits, readNumber, readPhasor, readPhasors } from '../readers';
import { DIGITS } from '../params';
import { isAbsent, isOmitted } from '../sets/_threephase';
import { readPowerFactor } from './_schedule';

const HEADER = ['', 'drop (phasor, V)', 'drop (V)', 'drop (%)', 'Annex G approximation (V)', 'Annex G approximation (%)'];

const SYSTEMS: Readonly<Record<string, DropSystem>> = { '1P': '1P', '1P2W': '1P', '3P': '3P', '3P3W': '3P', '3P4W': '3P4W' };

function readSystem(v: unknown): DropSystem {
  const m = asMatrix(v);
  const cell = m.length === 1 && m[0].length === 1 ? m[0][0] : v;
  const text = typeof cell === 'string' ? cell.trim().toUpperCase().replace(/\s+/g, '') : isBlank(cell) ? '' : String(cell);
  const s = SYSTEMS[text];
  if (s === undefined) throw new PhzError(M.dropSystem(typeof cell === 'string' ? cell.trim() : text));
  return s;
}

/** A conductor impedance per unit length: R must be 0 or more. */
function readConductor(arg: unknown, name: string): Phasor {
  const z = readPhasor(arg, name, { expect: 'impedance' });
  if (z.re < 0) throw new PhzError(M.dropResistance(name, z.re));
  return z;
}

/** The load of a 1P or 3P circuit: a current (number or A), or a power in W or VA turned into a current at the nominal voltage. */
function readLoadCurrent(arg: unknown, system: '1P' | '3P', nominal: number, pf: number): number {
  const m = asMatrix(arg);
  const cells = m.flat().filter((c) => !isBlank(c));
  if (cells.length !== 1) throw new PhzError(M.dropCurrentCount(system, cells.length));
  const v = cells[0];
  let value: number;
  let unit: UnitSeen['unit'] = null;
  if (typeof v === 'number') value = v;
  else if (typeof v === 'string') {
    const seen: UnitSeen = { unit: null };
    try {
      value = parseNumberText(v.trim(), seen);
    } catch (e) {
      throw new PhzError(R.inCell('current', (e as Error).message));
    }
    if (Number.isNaN(value)) throw new PhzError(M.dropCurrentText(v.trim()));
    unit = seen.unit;
    if (unit !== null && unit !== 'A' && unit !== 'W' && unit !== 'VA') throw new PhzError(M.dropCurrentUnit(v.trim(), unit));
  } else {
    // anything else (TRUE/FALSE, a data type) goes through the number reader for its message
    value = readNumber(v, 'current');
  }
  if (!Number.isFinite(value)) throw new PhzError(R.notFinite('current'));
  if (value < 0) throw new PhzError(M.dropCurrentNegative(value));
  const k = system === '1P' ? 1 : Math.sqrt(3);
  if (unit === 'W') return value / (pf * k * nominal);
  if (unit === 'VA') return value / (k * nominal);
  return value;
}

function row(r: DropRow, d: number): Array<string | number> {
  const n = (x: number): number => (x === 0 ? 0 : x);
  return [formatPolar(r.phasor, d), n(r.volts), n(r.percent), n(r.approxVolts), n(r.approxPercent)];
}

/** Voltage drop of a circuit or feeder: exact phasor drop beside the IEC 60364-5-52 Annex G approximation. */
export const VOLTDROP = defineFunction({
  name: 'VOLTDROP',
  group: 'feeders',
  summary: 'Voltage drop of a circuit or feeder: the exact phasor drop, in V and % of nominal, beside the IEC 60364-5-52 Annex G approximation.',
  details:
    'Systems: "1P" single-phase two-wire (the drop is along the line and the return conductor); "3P" three-phase, balanced; "3P4W" ' +
    'three-phase four-wire with the actual neutral current. impedance is R + jX of one line conductor per unit length (Ω/km with ' +
    'length in km, or Ω/m with m: any one length unit) at its operating temperature; neutral_impedance that of the return or neutral ' +
    'conductor (default the same). IEC 60364-5-52 Annex G approximation: u = b·(R cos φ + X sin φ)·L·I with b = 2 for 1P and b = 1 per phase for ' +
    'three-phase, Δu = 100·u/U0; shown for 3P in line-to-line volts (√3·I·L·(R cos φ + X sin φ); the percentage is the same). ' +
    '1P and 3P: current is the load current in A (a number or "63 A"), or the load in W or VA ("40 kW", "50 kVA"), turned into a current ' +
    'at the nominal voltage (I = S/V for 1P, S/(√3·V) for 3P; W through the power factor); power_factor is the load’s, lagging unless ' +
    'followed by lead ("0.9 lead"); voltage the nominal voltage of the circuit (1P, e.g. 230, or 400 for a line-to-line circuit) or ' +
    'line to line (3P), held at the supply end. Exact: with the load-end voltage U_r as reference and the current I∠−φ, the drop along ' +
    'the path is D = Z·I, and |U_r| = √(U_s² − Im(D)²) − Re(D), so the drop is U_s − |U_r|; Re(D) is the approximation, and the rest ' +
    '(about Im(D)²/2U_s) is what the approximation leaves out. "3P4W": current holds the three line currents I1, I2, I3 as phasors on ' +
    'the supply’s angle reference (the first column of PHZ.SCHEDULE or PHZ.STARLOAD), voltage the nominal line-to-line voltage (a balanced ' +
    'supply at 0°, −120°, +120°) or the three phase voltages E1, E2, E3; I_N = I1 + I2 + I3 returns in the neutral, and phase k sees ' +
    'D_k = L·(z·I_k + z_N·I_N), drop_k = |E_k| − |E_k − D_k| in line-to-neutral volts, % of |E_k|; its approximation is Annex G’s b = 1 ' +
    'with φ_k from E_k to I_k, which leaves the neutral out. Columns: the phasor drop (1P across the loop and 3P line to line, referred ' +
    'to the load-end voltage; 3P4W per phase on the supply’s reference), the drop in V and in %, and the approximation in V and in %.',
  params: [
    { name: 'current', type: 'matrix', description: 'Load current in A or load in W/VA ("40 kW"); for "3P4W" the three line currents as phasors.' },
    { name: 'impedance', type: 'matrix', description: 'R + jX of one line conductor per unit length, e.g. 0.524+j0.085 (Ω/km, with length in km).' },
    { name: 'length', type: 'scalar', description: 'Route length (one way), in the length unit of the impedance.' },
    { name: 'system', type: 'scalar', description: '"1P" single-phase two-wire, "3P" three-phase balanced, "3P4W" four-wire with the neutral current.' },
    { name: 'voltage', type: 'matrix', description: 'Nominal voltage: 1P the circuit’s; 3P and 3P4W line to line; or for 3P4W the phase voltages.' },
    { name: 'power_factor', type: 'scalar', optional: true, description: 'Load power factor for 1P and 3P, lagging; "0.9 lead" for leading. Not for 3P4W.' },
    { name: 'neutral_impedance', type: 'matrix', optional: true, description: 'Return or neutral conductor R + jX per unit length (default: as impedance).' },
    { name: 'labels', type: 'scalar', optional: true, description: 'TRUE adds a header row and a label column (default FALSE).' },
    DIGITS,
  ],
  result: 'A 1×5 row (3×5 for "3P4W", one row per phase; with labels a header and a label column): [phasor drop, drop V, drop %, approximation V, approximation %].',
  errors: [
    'An unknown system, a current in a unit other than A, W or VA, a negative current, length or resistance, or a zero voltage gives #VALUE!.',
    'For 1P and 3P: other than one current, or no power_factor; for 3P: a neutral_impedance; for 3P4W: other than three currents or a power_factor gives #VALUE!.',
    'A drop that leaves no voltage at the load end (check the length and impedance units) gives #VALUE!.',
  ],
  cautions: [
    'Results inform design; they do not replace it. They depend on the inputs and the model (fundamental-frequency phasors, the conductor data you give at its operating temperature).',
    'The permitted drop is set by the locally adopted wiring rules (IEC 60364-5-52 Annex G gives 3 % for lighting and 5 % for other uses from a public low-voltage supply, from memory); conductor sizing must be checked by a competent, licensed person.',
    'Work on live systems is for qualified people only.',
  ],
  examples: [
    { formula: '=PHZ.VOLTDROP(32, "7.41+j0.1", 0.025, "1P", 230, 0.95)', result: [['11.8571∠-17.4217°', 11.3405588924152, 4.93067777931097, 11.3131599839872, 4.91876521042921]] },
    { formula: '=PHZ.VOLTDROP("40 kW", "0.387+j0.079", 0.12, "3P", 400, 0.85, , FALSE(), 4)', result: [['5.576∠-20.25°', 5.23617423223568, 1.30904355805892, 5.23151763280614, 1.30787940820154]] },
    { formula: '=PHZ.VOLTDROP({"60∠-20";"42∠-135";"35∠95"}, "0.524+j0.085", 0.08, "3P4W", 400)', result: [['3.72394∠-14.935°', 3.59611234791251, 1.55716232407757, 2.50305909827759, 1.08385638314108], ['1.9305∠-88.4545°', 1.6429981985028, 0.711439089137744, 1.77456636607887, 0.768409776862867], ['1.20449∠52.6878°', 0.461903515473921, 0.200010089248877, 1.43031793143446, 0.619345832055326]] },
  ],
  implementation: (current, impedance, length, system, voltage, powerFactor, neutralImpedance, labels, digits) => {
    const d = readDigits(digits);
    const withLabels = readBoolean(labels, 'labels', false);
    const sys = readSystem(system);
    const z = readConductor(impedance, 'impedance');
    const zn = isOmitted(neutralImpedance) ? z : readConductor(neutralImpedance, 'neutral_impedance');
    const len = readNumber(length, 'length', { min: 0 });
    let rows: DropRow[];
    if (sys === '3P4W') {
      if (!isAbsent(powerFactor) && !isOmitted(powerFactor)) throw new PhzError(M.dropPfNotUsed);
      const currents = readPhasors(current, 'current', { expect: 'current' });
      if (currents.length !== 3) throw new PhzError(M.dropCurrentCount(sys, currents.length));
      const v = readPhasors(voltage, 'voltage', { expect: 'voltage' });
      let supply: readonly [Phasor, Phasor, Phasor];
      if (v.length === 1) {
        const m = magnitude(v[0]);
        if (m === 0) throw new PhzError(M.dropVoltageZero('voltage'));
        supply = balancedSet(rect(m / Math.sqrt(3), 0));
      } else if (v.length === 3) supply = [v[0], v[1], v[2]];
      else throw new PhzError(M.dropVoltageCount(v.length));
      rows = dropFourWire(supply, [currents[0], currents[1], currents[2]], z, zn, len);
    } else {
      if (sys === '3P' && !isOmitted(neutralImpedance)) throw new PhzError(M.dropNeutralNotUsed);
      const nominal = readNumber(voltage, 'voltage', { min: 0, minExclusive: true, units: ['V'] });
      if (isOmitted(powerFactor)) throw new PhzError(M.dropNeedsPf(sys));
      const pf = readPowerFactor(asMatrix(powerFactor)[0][0], 'power_factor');
      if (pf === null) throw new PhzError(M.dropNeedsPf(sys));
      const i = readLoadCurrent(current, sys, nominal, pf.pf);
      rows = [dropSinglePath(sys, i, pf.pf, pf.leading, z, zn, len, nominal)];
    }
    const table: HostResult = rows.map((r) => row(r, d));
    if (!withLabels) return table;
    const labelsCol = sys === '3P4W' ? ['phase 1', 'phase 2', 'phase 3'] : [sys === '1P' ? 'single-phase circuit' : 'three-phase, line to line'];
    return [HEADER.slice(), ...table.map((r, k) => [labelsCol[k], ...r])];
  },
});
