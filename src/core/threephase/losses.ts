/**
 * What the star and delta solvers know besides their tables: the loss in each line and in
 * the neutral, the complex power the source delivers through each line, and the voltage
 * drop at each load in percent of its supply voltage. From a solution, no new solve.
 *
 * Drop at a load: (|E| − |U|) / |E| × 100, with E the supply voltage the load would see
 * with no line or neutral impedance (the phase voltage of a star load, the line voltage of a
 * delta branch) and U the voltage across the load impedance itself. For a star load U is
 * taken to the load's own star point, so the drop includes the neutral's share (the
 * star-point shift): what the equipment sees. A negative drop is a rise, as on the lightly
 * loaded phases of a star with a lost or impedant neutral.
 */
import { PhzError } from '../errors';
import { ZERO, magnitude, rect, type Phasor } from '../phasor';
import { feederMessages as M } from '../messages/feeders';
import type { Neutral, StarSolution } from './star';
import type { DeltaSolution } from './delta';
import type { Triple } from './types';

export interface SolverExtras {
  /** Loss in each line impedance, |I_k|²·ZL_k. */
  readonly lineLosses: Triple<Phasor>;
  /** Loss in the neutral impedance, |I_N|²·Z_N (0 for a solid, open or absent neutral). */
  readonly neutralLoss: Phasor;
  /** Complex power the source delivers through each line, E_k·I_k*. */
  readonly sourcePowers: Triple<Phasor>;
  /** Their sum: the source's complex power (loads + losses). */
  readonly sourcePower: Phasor;
  /** Drop at each load, % of its supply voltage (negative for a rise). */
  readonly dropPct: Triple<number>;
  /** The largest of the three drops. */
  readonly maxDropPct: number;
}

function lineLoss(i: Phasor, zl: Phasor): Phasor {
  const i2 = i.re * i.re + i.im * i.im;
  return rect(zl.re * i2, zl.im * i2);
}

function drops(supply: Triple<Phasor>, load: Triple<Phasor>, name: string, labels: Triple<string>): Triple<number> {
  return [0, 1, 2].map((k) => {
    const e = magnitude(supply[k]);
    if (e === 0) throw new PhzError(M.dropReference(name, labels[k]));
    return (100 * (e - magnitude(load[k]))) / e;
  }) as unknown as Triple<number>;
}

function sum3(t: Triple<Phasor>): Phasor {
  return t[0].add(t[1]).add(t[2]);
}

/** Extras of a star solution for the sources, line impedances and neutral it was solved with. */
export function starExtras(sources: Triple<Phasor>, lines: Triple<Phasor>, neutral: Neutral, s: StarSolution): SolverExtras {
  const lineLosses: Triple<Phasor> = [lineLoss(s.currents[0], lines[0]), lineLoss(s.currents[1], lines[1]), lineLoss(s.currents[2], lines[2])];
  const sourcePowers: Triple<Phasor> = [0, 1, 2].map((k) => sources[k].mul(s.currents[k].conjugate())) as unknown as Triple<Phasor>;
  const dropPct = drops(sources, s.loadVoltages, 'phase_voltages', ['E1', 'E2', 'E3']);
  return {
    lineLosses,
    neutralLoss: neutral.kind === 'impedance' ? s.neutralPower : ZERO,
    sourcePowers,
    sourcePower: sum3(sourcePowers),
    dropPct,
    maxDropPct: Math.max(...dropPct),
  };
}

/**
 * Extras of a delta solution. The source powers are referred to the star set with the same
 * line voltages and no zero sequence (the supply a three-wire load cannot tell apart from any
 * other with those line voltages): their sum is the source's power; the split among the
 * lines depends on that reference, as the readings of wattmeters do on where their common
 * point is.
 */
export function deltaExtras(lineVoltages: Triple<Phasor>, star: Triple<Phasor>, lines: Triple<Phasor> | null, s: DeltaSolution): SolverExtras {
  const zl = lines ?? [ZERO, ZERO, ZERO];
  const lineLosses: Triple<Phasor> = [lineLoss(s.lineCurrents[0], zl[0]), lineLoss(s.lineCurrents[1], zl[1]), lineLoss(s.lineCurrents[2], zl[2])];
  const sourcePowers: Triple<Phasor> = [0, 1, 2].map((k) => star[k].mul(s.lineCurrents[k].conjugate())) as unknown as Triple<Phasor>;
  const dropPct = drops(lineVoltages, s.branchVoltages, 'line_voltages', ['V12', 'V23', 'V31']);
  return {
    lineLosses,
    neutralLoss: ZERO,
    sourcePowers,
    sourcePower: sum3(sourcePowers),
    dropPct,
    maxDropPct: Math.max(...dropPct),
  };
}
