/** A1-style addresses for the preview grid: columns A…Z, AA…, rows from 1. */

export interface CellPos {
  readonly row: number;
  readonly col: number;
}

/** 0 → `A`, 25 → `Z`, 26 → `AA`. */
export function columnName(col: number): string {
  let n = col + 1;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** `{row: 1, col: 1}` → `B2`. */
export function a1(pos: CellPos): string {
  return `${columnName(pos.col)}${pos.row + 1}`;
}

/** `B2` → `{row: 1, col: 1}`; `$B$2` accepted; `undefined` for anything else. */
export function parseA1(text: string): CellPos | undefined {
  const m = /^\s*\$?([A-Za-z]{1,3})\$?([1-9][0-9]{0,6})\s*$/.exec(text);
  if (!m) return undefined;
  let col = 0;
  for (const ch of m[1].toUpperCase()) col = col * 26 + (ch.charCodeAt(0) - 64);
  return { row: Number(m[2]) - 1, col: col - 1 };
}

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
