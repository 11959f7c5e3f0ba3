/**
 * Dense complex linear solve by Gaussian elimination with partial pivoting, for the
 * small node equations of the delta solver (at most 9 unknowns). A pivot below
 * `SINGULAR_REL` of the matrix's largest entry means the system is singular.
 */
import { ZERO, magnitude, type Phasor } from '../phasor';

export const SINGULAR_REL = 1e-12;

/** Solves A·x = b; returns null when A is singular. A and b are not modified. */
export function solveLinear(aIn: readonly (readonly Phasor[])[], bIn: readonly Phasor[]): Phasor[] | null {
  const n = bIn.length;
  const a = aIn.map((row) => row.slice());
  const b = bIn.slice();
  let scale = 0;
  for (const row of a) for (const z of row) scale = Math.max(scale, magnitude(z));
  if (scale === 0) return null;
  for (let col = 0; col < n; col++) {
    let p = col;
    let best = magnitude(a[col][col]);
    for (let r = col + 1; r < n; r++) {
      const m = magnitude(a[r][col]);
      if (m > best) {
        best = m;
        p = r;
      }
    }
    if (best <= SINGULAR_REL * scale) return null;
    if (p !== col) {
      [a[p], a[col]] = [a[col], a[p]];
      [b[p], b[col]] = [b[col], b[p]];
    }
    const piv = a[col][col];
    for (let r = col + 1; r < n; r++) {
      const f = a[r][col].div(piv);
      if (f.re === 0 && f.im === 0) continue;
      for (let c = col; c < n; c++) a[r][c] = a[r][c].sub(f.mul(a[col][c]));
      b[r] = b[r].sub(f.mul(b[col]));
    }
  }
  const x: Phasor[] = new Array(n).fill(ZERO);
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r];
    for (let c = r + 1; c < n; c++) s = s.sub(a[r][c].mul(x[c]));
    x[r] = s.div(a[r][r]);
  }
  return x;
}
