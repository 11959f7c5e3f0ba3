/**
 * The harmonic table NEUTRALRMS and SCHEDULE take: rows of [order, percent] (the same content
 * on every phase) or [order, percent 1, percent 2, percent 3]; blank rows are skipped.
 * Not a function: this module holds no spec.
 */
import { PhzError } from '../../core/errors';
import { threePhaseMessages as M } from '../../core/messages/threephase';
import type { Harmonic } from '../../core/threephase';
import { asMatrix, isBlank, readNumber } from '../readers';

export function readHarmonics(arg: unknown): Harmonic[] {
  const m = asMatrix(arg).filter((row) => !row.every(isBlank));
  if (m.length === 0) return [];
  const cols = m[0].length;
  if (cols !== 2 && cols !== 4) throw new PhzError(M.harmonicShape(cols));
  const seen = new Set<number>();
  return m.map((row, r) => {
    const at = (c: number): string => `harmonics, row ${r + 1} column ${c + 1}`;
    const order = readNumber(row[0], at(0));
    if (!Number.isInteger(order) || order < 2) throw new PhzError(M.harmonicOrder(`harmonics, row ${r + 1}`, order));
    if (seen.has(order)) throw new PhzError(M.harmonicDuplicate(order));
    seen.add(order);
    const pct = (c: number): number => {
      const p = readNumber(row[c], at(c));
      if (p < 0) throw new PhzError(M.harmonicPercent(at(c), p));
      return p;
    };
    const percent: [number, number, number] = cols === 2 ? [pct(1), pct(1), pct(1)] : [pct(1), pct(2), pct(3)];
    return { order, percent };
  });
}

