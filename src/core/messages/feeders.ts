/**
 * Messages of the panel-schedule, voltage-drop and loss calculations. Each says which
 * argument (and row), what was wrong, and what to do.
 */
import { excerpt } from './quote';

/** How a connection is written, for the messages that refuse one. */
export const CONNECTION_FORMS =
  'write a line-to-neutral circuit as 1, L1 or A (2, L2, B; 3, L3, C), a line-to-line one as 1-2, L1-L2 or AB (2-3, 3-1), a three-phase one as 3P, 123 or ABC';

export const feederMessages = {
  // --- schedule columns ----------------------------------------------------------------
  connection(where: string, got: string): string {
    return `${where} is "${excerpt(got)}", which is not a connection: ${CONNECTION_FORMS}`;
  },
  connectionBlank(where: string): string {
    return `${where} is blank but its circuit has a load: ${CONNECTION_FORMS}`;
  },
  connectionRepeated(where: string, got: string): string {
    return `${where} is "${excerpt(got)}", which names one line twice: a line-to-line circuit joins two different lines (1-2, 2-3 or 3-1)`;
  },
  notColumn(name: string, rows: number, cols: number): string {
    return `${name} is a block of ${rows} rows by ${cols} columns: give one column of the schedule (one cell per circuit)`;
  },
  rowCounts(described: string): string {
    return `the schedule columns hold different numbers of circuits (${described}): give the same rows for connections and loads, and for power_factors, nonlinear and demand either the same rows or one value for every circuit`;
  },
  noLoad: 'the schedule holds no load (every load cell is blank or 0): give each circuit its load in W, kW, VA or kVA',
  loadUnit(where: string, text: string, unit: string): string {
    return `${where} is "${excerpt(text)}", in ${unit}: give a circuit's load as real power (W, kW) or apparent power (VA, kVA); a plain number is W`;
  },
  loadNegative(where: string, value: number): string {
    return `${where} is ${value} W: a schedule lists loads of 0 or more (a blank or 0 marks a spare way)`;
  },
  loadText(where: string, text: string): string {
    return `${where} is "${excerpt(text)}", which is not a load: give a number of W, or a number with W, kW, VA or kVA (e.g. 2.2 kW, 1500 VA)`;
  },
  powerFactorBlank(where: string): string {
    return `${where} is blank but its circuit has a load: give the power factor (1 for a resistive load; e.g. 0.85, or 0.9 lead for a leading one)`;
  },
  powerFactorRange(where: string, value: number): string {
    return `${where} is ${value} but a power factor must be above 0 and at most 1: give its magnitude, with the word lead for a leading load (e.g. 0.9 lead)`;
  },
  powerFactorNegative(where: string, value: number): string {
    return `${where} is ${value}: a negative power factor is not read as leading here (sign conventions for power factor differ, and a negative one often means power flowing back); write the magnitude with the word lead, e.g. ${-value} lead`;
  },
  powerFactorText(where: string, text: string): string {
    return `${where} is "${excerpt(text)}", which is not a power factor: give a number above 0 and at most 1, optionally followed by lag or lead (e.g. 0.85, 0.9 lead; ind and cap are read as lag and lead)`;
  },
  fraction(where: string, value: number, what: string): string {
    return `${where} is ${value}, but ${what} is a fraction from 0 to 1 (0.4) or a percentage written with its sign (40 %): give one of those`;
  },
  fractionText(where: string, text: string, what: string): string {
    return `${where} is "${excerpt(text)}", which is not ${what}: give a fraction from 0 to 1 (0.4) or a percentage with its sign (40 %)`;
  },
  harmonicsWithoutNonlinear:
    'harmonics were given but nonlinear was left out, so no circuit has a non-linear share for them to apply to: give nonlinear (the share of each circuit’s load that is non-linear, 0 to 1)',
  nonlinearWithoutHarmonics(where: string):
    string {
    return `${where} marks a non-linear share, but no harmonics table was given, so the share would change nothing: give the harmonic content of the non-linear loads (rows of order and percent, e.g. {3,80;5,60;7,40}), or 0 for linear loads`;
  },
  zeroSupply(where: string, voltage: string): string {
    return `${where} is connected across ${voltage}, which is 0 V in the supply: a load current cannot be found from power at zero voltage; check the supply voltages`;
  },
  supplyCount(n: number): string {
    return `supply holds ${n} values: give one phase-voltage magnitude for a balanced supply (e.g. 230), or the three phase voltages E1, E2, E3 (e.g. PHZ.BALANCED(230))`;
  },

  // --- voltage drop ----------------------------------------------------------------------
  dropSystem(got: string): string {
    return `system is "${excerpt(got)}": give "1P" (single-phase two-wire), "3P" (three-phase, balanced) or "3P4W" (three-phase four-wire with the actual neutral current)`;
  },
  dropCurrentCount(system: string, n: number): string {
    return system === '3P4W'
      ? `current holds ${n} value${n === 1 ? '' : 's'}, but system "3P4W" needs the three line currents I1, I2, I3 as phasors (e.g. the first column of PHZ.SCHEDULE or PHZ.STARLOAD)`
      : `current holds ${n} values, but system "${excerpt(system)}" needs one: the load current in A, or the load in W, kW, VA or kVA`;
  },
  dropCurrentUnit(text: string, unit: string): string {
    return `current is "${excerpt(text)}", in ${unit}: give the load current in A, or the load as real power (W, kW) or apparent power (VA, kVA)`;
  },
  dropCurrentText(text: string): string {
    return `current is "${excerpt(text)}", which is not a load: give the current in A (e.g. 63 or 63 A), or the load in W, kW, VA or kVA (e.g. 40 kW)`;
  },
  dropCurrentNegative(value: number): string {
    return `current is ${value}: give the load current (or load) as a magnitude of 0 or more`;
  },
  dropNeedsPf(system: string): string {
    return `power_factor is left out: system "${excerpt(system)}" needs the load's power factor (1 for a resistive load; e.g. 0.85, or 0.9 lead for a leading one)`;
  },
  dropPfNotUsed:
    'power_factor was given, but system "3P4W" takes the line currents as phasors, whose angles already say the power factor: leave power_factor out',
  dropNeutralNotUsed:
    'neutral_impedance was given, but system "3P" is balanced and carries no neutral current: leave it out, or use "3P4W" with the line currents',
  dropVoltageCount(n: number): string {
    return `voltage holds ${n} values: give the nominal voltage (line-to-line for "3P" and "3P4W"), or for "3P4W" the three supply phase voltages E1, E2, E3`;
  },
  dropVoltageZero(where: string): string {
    return `${where} is 0 V: the drop in percent needs the nominal voltage; give it (e.g. 230 or 400)`;
  },
  dropResistance(name: string, value: number): string {
    return `${name} has a resistance of ${value} Ω per unit length: a conductor's resistance is 0 or more; give R + jX per unit length (e.g. 0.524+j0.085 for Ω/km)`;
  },
  dropTooLarge(where: string, volts: string, nominal: string): string {
    return `${where}: the drop along the conductors (${volts}) leaves no voltage at the load end of a ${nominal} supply, so this load cannot draw this current here; check the length and impedance units (Ω/km with km, or Ω/m with m)`;
  },

  // --- solver extras --------------------------------------------------------------------
  dropReference(name: string, phase: string): string {
    return `${name}: ${phase} is 0 V, so the drop at its load in percent is undefined; give the supply voltage of every phase`;
  },
} as const;
