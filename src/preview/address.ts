/** A1-style addresses for the preview grid: columns A…Z, AA…, rows from 1 (src/taskpane/a1.ts underneath). */
import { a1 as rowColA1, columnLetters, parseA1 as parseRowColA1 } from '../taskpane/a1';

export interface CellPos {
  readonly row: number;
  readonly col: number;
}

/** 0 → `A`, 25 → `Z`, 26 → `AA`. */
export const columnName = columnLetters;

/** `{row: 1, col: 1}` → `B2`. */
export function a1(pos: CellPos): string {
  return rowColA1(pos.row, pos.col);
}

/** `B2` → `{row: 1, col: 1}`; `$B$2` accepted; `undefined` for anything else. */
export const parseA1: (text: string) => CellPos | undefined = parseRowColA1;

/** A rectangle of cells, inclusive, with `top <= bottom` and `left <= right`. */
export interface Rect {
  readonly top: number;
  readonly left: number;
  readonly bottom: number;
  readonly right: number;
}

export function rectOf(a: CellPos, b: CellPos): Rect {
  return {
    top: Math.min(a.row, b.row),
    left: Math.min(a.col, b.col),
    bottom: Math.max(a.row, b.row),
    right: Math.max(a.col, b.col),
  };
}

export function rectA1(r: Rect): string {
  const start = a1({ row: r.top, col: r.left });
  return r.top === r.bottom && r.left === r.right ? start : `${start}:${a1({ row: r.bottom, col: r.right })}`;
}

/** `A1:C3`, `B2` → a rectangle; `undefined` when not an address. */
export function parseRectA1(text: string): Rect | undefined {
  const parts = text.split(':');
  if (parts.length > 2) return undefined;
  const a = parseA1(parts[0]);
  const b = parts.length === 2 ? parseA1(parts[1]) : a;
  return a && b ? rectOf(a, b) : undefined;
}

export function inRect(r: Rect, row: number, col: number): boolean {
  return row >= r.top && row <= r.bottom && col >= r.left && col <= r.right;
}
