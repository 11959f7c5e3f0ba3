/**
 * What the solvers and their losses twins share: the same arguments, read the same way, so
 * STARLOSSES takes exactly STARLOAD's arguments and DELTALOSSES exactly DELTALOAD's.
 */
import { formatPolar } from '../../core/format';
import { ZERO } from '../../core/phasor';
import type { DeltaInput, SolverExtras, StarInput } from '../../core/threephase';
import { readBoolean, readDigits } from '../readers';
import { DIGITS, phasorParam } from '../params';
import type { HostResult, ParamSpec } from '../spec';
import { readImpedanceSet, readLineImpedances, readNeutral, readTriple } from '../sets/_threephase';

const LINE: ParamSpec = { name: 'line', type: 'matrix', optional: true, description: 'Line impedance: one for every line, or three (default none).' };
const LABELS: ParamSpec = { name: 'labels', type: 'scalar', optional: true, description: 'TRUE adds a header row and a label column (default FALSE).' };

/** STARLOAD's parameters (and STARLOSSES'). */
export const STAR_PARAMS: readonly ParamSpec[] = [
  phasorParam('phase_voltages', 'Source phase voltages E1, E2, E3 (three)'),
  { name: 'impedances', type: 'matrix', description: 'Load impedances Z1, Z2, Z3 (three values, or one for all); "open" for a disconnected phase.' },
  { name: 'neutral', type: 'matrix', optional: true, description: 'Left out or 0 = solid neutral; an impedance (e.g. 0.5+j0.2) = impedant neutral; "open" = no neutral. Not a blank cell.' },
  LINE,
  LABELS,
  DIGITS,
];

/** DELTALOAD's parameters (and DELTALOSSES'). */
export const DELTA_PARAMS: readonly ParamSpec[] = [
  phasorParam('line_voltages', 'Line-to-line voltages V12, V23, V31 (three)'),
  { name: 'impedances', type: 'matrix', description: 'Branch impedances Z12, Z23, Z31 (three, or one for all); "open" for a missing branch.' },
  LINE,
  LABELS,
  DIGITS,
];

/** How a solver's table is shown: significant figures and whether labels are wanted. */
export interface TableOptions {
  readonly digits: number;
  readonly labels: boolean;
}

/** The star network and table options from STARLOAD's arguments. */
export function readStarArgs(phaseVoltages: unknown, impedances: unknown, neutral: unknown, line: unknown, labels: unknown, digits: unknown): StarInput & TableOptions {
  const d = readDigits(digits);
  const sources = readTriple(phaseVoltages, 'phase_voltages', 'source phase voltages E1, E2, E3', 'voltage');
  const loads = readImpedanceSet(impedances, 'impedances', true, 'load impedance');
  const lines = readLineImpedances(line) ?? [ZERO, ZERO, ZERO];
  return { sources, loads, lines, neutral: readNeutral(neutral), labels: readBoolean(labels, 'labels', false), digits: d };
}

/** The delta network and table options from DELTALOAD's arguments. */
export function readDeltaArgs(lineVoltages: unknown, impedances: unknown, line: unknown, labels: unknown, digits: unknown): DeltaInput & TableOptions {
  const d = readDigits(digits);
  const lineVoltagesRead = readTriple(lineVoltages, 'line_voltages', 'line voltages V12, V23, V31', 'voltage');
  const loads = readImpedanceSet(impedances, 'impedances', true, 'branch impedance');
  return { lineVoltages: lineVoltagesRead, loads, lines: readLineImpedances(line), labels: readBoolean(labels, 'labels', false), digits: d };
}

/** A table with a header row and a label column when asked. */
export function labelled(table: HostResult, options: TableOptions, header: readonly string[], rowLabels: readonly string[]): HostResult {
  if (!options.labels) return table;
  return [header.slice(), ...table.map((row, i) => [rowLabels[i], ...row])];
}

/**
 * The losses table of STARLOSSES and DELTALOSSES: rows 1–3 [line loss, source power, drop %],
 * row 4 [neutral loss, total source power, largest drop %].
 */
export function extrasTable(x: SolverExtras, digits: number): HostResult {
  const f = (z: Parameters<typeof formatPolar>[0]): string => formatPolar(z, digits);
  const num = (v: number): number => (v === 0 ? 0 : v); // never -0 in a cell
  const table: HostResult = [0, 1, 2].map((k) => [f(x.lineLosses[k]), f(x.sourcePowers[k]), num(x.dropPct[k])]);
  table.push([f(x.neutralLoss), f(x.sourcePower), num(x.maxDropPct)]);
  return table;
}
