/**
 * Messages of the three-phase analysis (sets, loads, solvers, neutral, sequences,
 * unbalance). Each says which argument, what was wrong, and what to do.
 */
import { excerpt } from './quote';
export const threePhaseMessages = {
  // --- counts and shapes -------------------------------------------------------------
  needThree(name: string, n: number, what: string): string {
    return `${name} holds ${n} value${n === 1 ? '' : 's'} but needs three (${what}): give one value per phase, in a row or a column`;
  },
  oneOrThree(name: string, n: number, what: string): string {
    return `${name} holds ${n} values: give one ${what} for all three phases, or three (one per phase)`;
  },
  oneOrThreeArgs(name: string, n: number): string {
    return `${name}: give one range of three values, or three separate values (${n} were given)`;
  },
  notLine(name: string): string {
    return `${name} must be a single row or column (or two numeric columns of real and imaginary parts)`;
  },
  rowsMismatch(described: string): string {
    return `the arguments hold different numbers of rows (${described}): give equal counts, or a single value to use for every row`;
  },

  // --- sets ----------------------------------------------------------------------
  negativeMagnitude(name: string, value: number): string {
    return `${name} is ${value}: give a magnitude of 0 or more (use angle to turn the set)`;
  },
  kvl(name: string, residual: string, percent: string): string {
    return `${name} does not close: V12 + V23 + V31 = ${residual}, ${percent} % of their mean magnitude (up to 1 % is removed as rounding). Check the order V12, V23, V31, the angles (V∠θ, V∠θ−120°, V∠θ+120°) and that all are line-to-line`;
  },
  lineSetNotTriangle(name: string, big: string, others: string, value: number, sum: number): string {
    return `${name}: ${big} = ${value} exceeds ${others} = ${sum}, so the three cannot close a triangle and are not the line voltages of one supply: check the readings (all three line-to-line, in one unit)`;
  },
  lineSetZero(name: string, which: string): string {
    return `${name}: ${which} is 0, which leaves the angles of the set undefined: give the three measured line-to-line magnitudes, all above 0`;
  },
  deltaResonant:
    'the three delta impedances add up to 0 Ω (the branches resonate around the delta), so the star equivalent is unbounded: check the reactances',
  deltaTwoOpen(branches: string): string {
    return `branches ${branches} are open: a delta with only one branch has no star equivalent; give at most one "open" branch`;
  },
  deltaAllOpen: 'all three delta branches are "open": there is no load to convert; give at least two impedances',
  starTwoZero(arms: string): string {
    return `star impedances ${arms} are both 0 Ω: lines are tied together and the delta equivalent is not unique; give at most one 0 Ω arm`;
  },
  starZeroSum:
    'the star impedances give Z1·Z2 + Z2·Z3 + Z3·Z1 = 0, so every delta branch would be 0 Ω or undefined: check the reactances',

  // --- loads ---------------------------------------------------------------------
  zeroImpedance(where: string): string {
    return `${where} is 0 Ω: a short circuit draws unbounded current; give a non-zero impedance`;
  },
  zeroVoltage(where: string): string {
    return `${where} is 0 V: a load current cannot be found from power at zero voltage; give the supply voltage`;
  },
  zeroPower(where: string): string {
    return `${where} is 0 VA: a power factor is undefined without power; give a non-zero complex power`;
  },
  powerFactor(where: string, value: number): string {
    return `${where} is ${value} but a power factor must be above 0 and at most 1: give the magnitude (e.g. 0.85) and set leading TRUE for a leading load`;
  },

  // --- solvers -------------------------------------------------------------------
  allOpen(name: string): string {
    return `all three ${name} are "open": no current can flow; give at least one load impedance`;
  },
  sourceShortNeutral(phase: number, what: string): string {
    return `phase ${phase}: ${what} is 0 Ω and the neutral is solid, so source phase ${phase} is short-circuited; give the load and line impedances of phase ${phase}`;
  },
  sourceShortLines(a: number, b: number, what: string): string {
    return `phases ${a} and ${b}: ${what} are both 0 Ω, so lines ${a} and ${b} of the source are short-circuited; give non-zero impedances`;
  },
  deltaBranchShort(branch: string, a: number, b: number): string {
    return `branch ${branch} is 0 Ω with no line impedance, so lines ${a} and ${b} of the supply are short-circuited; give the branch impedance (or the line impedances)`;
  },
  deltaSupplyShort(a: number, b: number): string {
    return `lines ${a} and ${b} of the supply are joined through 0 Ω (a 0 Ω branch with 0 Ω line impedances): a short circuit; give non-zero impedances`;
  },
  resonance:
    'the admittances around the load star point add up to zero (series resonance), so no finite solution exists: check the reactances of the loads, lines and neutral',
  networkSingular:
    'the delta load and line impedances resonate (the node equations are singular), so no finite solution exists: check the reactances',
  neutralWord(got: string): string {
    return `neutral is "${excerpt(got)}": give 0 (or leave the argument out) for a solid neutral, an impedance (e.g. 0.5+j0.2) for an impedant neutral, or "open" for no neutral`;
  },
  neutralBlank:
    'neutral refers to a blank cell: give 0 for a solid neutral, an impedance (e.g. 0.5+j0.2) for an impedant neutral, or "open" for no neutral (only a left-out argument means a solid neutral)',
  openNotAllowed(where: string): string {
    return `${where} is "open": only load impedances may be open here; give an impedance`;
  },

  // --- neutral and sizing -------------------------------------------------------------
  negativeCurrent(where: string, value: number): string {
    return `${where} is ${value} A: give a current magnitude of 0 or more`;
  },
  harmonicShape(cols: number): string {
    return `harmonics has ${cols} column${cols === 1 ? '' : 's'}: give rows of [order, percent] (same for every phase) or [order, percent 1, percent 2, percent 3]`;
  },
  harmonicOrder(where: string, value: number): string {
    return `${where}: harmonic order ${value} is not allowed; give a whole number of 2 or more (the fundamental is given by currents)`;
  },
  harmonicPercent(where: string, value: number): string {
    return `${where}: harmonic content ${value} % is below 0; give a percentage of the phase's fundamental current of 0 or more`;
  },
  harmonicDuplicate(order: number): string {
    return `harmonic order ${order} appears in more than one row: give each order once`;
  },
  zeroVoltageAngle(name: string, phase: number): string {
    return `${name}, phase ${phase} is 0 V: the harmonic currents of phase ${phase} are referred to its voltage angle, which 0 V does not have; give the supply phase voltages, or leave the argument out for a balanced supply at 0°, −120°, +120°`;
  },
  negativePercent(name: string, value: number): string {
    return `${name} is ${value} %: give a percentage of 0 or more`;
  },
  negativeLoad(name: string, value: number): string {
    return `${name} is ${value} A: give a load current of 0 or more`;
  },

  // --- sequences and unbalance -----------------------------------------------------------
  zeroPositive(name: string): string {
    return `${name} has no positive-sequence component (|V1| = 0), so an unbalance factor is undefined: check the angles and the phase order`;
  },
  zeroMean(name: string): string {
    return `${name} has an average magnitude of 0, so the unbalance ratio is undefined: give the measured magnitudes`;
  },
  needPhasors(method: string): string {
    return `method ${method} needs phasors (magnitude and angle), but plain numbers were given: enter the values as text such as 230∠-120, or use "MAG", "LVUR" or "PVUR" for magnitudes only`;
  },
  notTriangle(name: string): string {
    return `${name}: these three line-voltage magnitudes cannot form a closed triangle (one exceeds the sum of the other two), so they are not the line voltages of a three-wire supply`;
  },
  negativeMagnitudeValue(where: string, value: number): string {
    return `${where} is ${value}: a magnitude cannot be negative; give the measured magnitude`;
  },
  derateNegative(value: number): string {
    return `unbalance_pct is ${value} %: give the voltage unbalance as a percentage of 0 or more`;
  },
  derateAbove(value: number): string {
    return `unbalance_pct is ${value} %: NEMA MG 1 advises against operating a polyphase induction motor above 5 % voltage unbalance, so no derating factor is given; correct the supply unbalance first`;
  },
} as const;
