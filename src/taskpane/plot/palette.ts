/**
 * Colours and shapes of the plot. Our own palette: six colours that differ in lightness as
 * well as hue, each with a marker shape of its own, and a dash per group, so phasors stay
 * apart for readers who do not tell the hues apart (or print in grey). Every colour has a
 * contrast of at least 4.5:1 on white (checked in the tests with the WCAG 2.x formula).
 *
 * The optional conductor colours are those IEC 60445 gives for L1, L2, L3 and N (brown,
 * black, grey, blue), the open standard for identifying conductors.
 */

export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond' | 'cross' | 'down';
export type PaletteName = 'starpoint' | 'iec60445';

export interface PhasorStyle {
  readonly colour: string;
  readonly marker: MarkerShape;
}

/** Ours: deep blue, burnt orange, violet, sea green, crimson, slate. */
export const STARPOINT_PALETTE: readonly PhasorStyle[] = [
  { colour: '#1b5e9e', marker: 'circle' },
  { colour: '#b34d00', marker: 'square' },
  { colour: '#6a3d9a', marker: 'triangle' },
  { colour: '#0d7361', marker: 'diamond' },
  { colour: '#a3123a', marker: 'cross' },
  { colour: '#4a5560', marker: 'down' },
];

/** IEC 60445 conductor colours (brown L1, black L2, grey L3, blue N), darkened just enough to read as lines on white. */
export const IEC_60445: Readonly<Record<'L1' | 'L2' | 'L3' | 'N', PhasorStyle>> = {
  L1: { colour: '#7a4419', marker: 'circle' },
  L2: { colour: '#1a1a1a', marker: 'square' },
  L3: { colour: '#6e6e6e', marker: 'triangle' },
  N: { colour: '#1f5fbf', marker: 'diamond' },
};

/** Dash patterns by group: solid, dashed, dotted, dash-dot, long dash. */
export const GROUP_DASHES: readonly string[] = ['', '8 4', '2 3', '10 3 2 3', '14 4'];

/** The closing sum of a tip-to-tail view: near black, heavier, hollow head. */
export const SUM_STYLE = { colour: '#111111', width: 3.5 } as const;

/** Which conductor a label names, if any: `L1`, `phase 2`, `a`, `neutral`, `I_N`. */
export function conductorOf(label: string): 'L1' | 'L2' | 'L3' | 'N' | undefined {
  const t = label.toLowerCase();
  if (/\bneutral\b|\bi_?n\b|^n$|\bl_?n\b/.test(t)) return 'N';
  const m = /\b(?:l|phase|line)\s*_?([123])\b/.exec(t) ?? /^(?:[iuve])?_?([123])\b/.exec(t) ?? /\b([abc])\b$/.exec(t);
  if (!m) return undefined;
  const k = m[1];
  return k === '1' || k === 'a' ? 'L1' : k === '2' || k === 'b' ? 'L2' : 'L3';
}

/**
 * The style of the phasor at `index` in its group. With IEC colours, a label that names a
 * conductor takes its colour; otherwise the position does (1st L1, 2nd L2, 3rd L3, 4th N),
 * and beyond four our palette continues.
 */
export function phasorStyle(palette: PaletteName, index: number, label: string): PhasorStyle {
  if (palette === 'iec60445') {
    const named = conductorOf(label);
    if (named) return IEC_60445[named];
    const order = ['L1', 'L2', 'L3', 'N'] as const;
    if (index < order.length) return IEC_60445[order[index]];
  }
  return STARPOINT_PALETTE[index % STARPOINT_PALETTE.length];
}

export function groupDash(group: number): string {
  return GROUP_DASHES[group % GROUP_DASHES.length];
}
