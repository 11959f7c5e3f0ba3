/**
 * A1 addresses, one implementation for the pane (plot, worked sheets, Excel adapters) and the
 * preview (which may import the pane's modules; the pane may not import the preview's).
 */

/** Column letters of a zero-based column index: 0 → A, 25 → Z, 26 → AA. */
export function columnLetters(col: number): string {
  let n = col + 1;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** A1 address of a zero-based row and column: (21, 1) → `B22`. */
export function a1(row: number, col: number): string {
  return `${columnLetters(col)}${row + 1}`;
}

/** Zero-based row and column of an A1 address without sheet (`$B$22` allowed); undefined when it is not one. */
export function parseA1(address: string): { row: number; col: number } | undefined {
  const m = /^\$?([A-Za-z]{1,3})\$?(\d{1,7})$/.exec(address.trim());
  if (!m) return undefined;
  let col = 0;
  for (const ch of m[1].toUpperCase()) col = col * 26 + (ch.charCodeAt(0) - 64);
  const row = Number(m[2]);
  if (row < 1) return undefined;
  return { row: row - 1, col: col - 1 };
}

/** A sheet name as a formula reference needs it: `'Sub-board'`, `Sheet1`. */
export function sheetRef(sheet: string): string {
  return /^[A-Za-z_][A-Za-z0-9_.]*$/.test(sheet) && !/^[A-Za-z]{1,3}\d+$/.test(sheet) ? sheet : `'${sheet.replace(/'/g, "''")}'`;
}
