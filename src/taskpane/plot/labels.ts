/**
 * Phasor labels that do not collide: each label tries spots around its arrow's tip, nearest
 * first, and takes the first one clear of the labels already placed and of the diagram's
 * own text (spoke angles, ring values). A label with no free spot near its tip goes to the
 * side of the diagram, in the nearest free slot, with a leader line to its tip; below the
 * diagram there is always room, so every label is placed and none overlaps another.
 */
import type { MarkerShape } from './palette';

export interface Box {
  readonly left: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
}

export interface LabelRequest {
  readonly arrow: number;
  readonly text: string;
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
  readonly colour: string;
  readonly marker: MarkerShape;
}

export interface Placed {
  readonly arrow: number;
  readonly text: string;
  readonly x: number;
  readonly y: number;
  readonly anchor: 'start' | 'end';
  /** Centre of the marker: at the end of the label nearer the tip. */
  readonly markerX: number;
  readonly box: Box;
  readonly colour: string;
  readonly marker: MarkerShape;
  readonly leader?: { readonly x1: number; readonly y1: number; readonly x2: number; readonly y2: number };
}

/** Longest label drawn on the diagram; longer ones are cut with an ellipsis (full text in the tooltip). */
export const MAX_LABEL_CHARS = 24;
const FONT = 12;
const CHAR_W = FONT * 0.6;
const BOX_H = FONT + 3;
/** Room for the marker before the text. */
const MARKER_W = 13;
const PAD = 1.5;

export function overlaps(a: Box, b: Box, pad = 0): boolean {
  return a.left < b.right + pad && b.left < a.right + pad && a.top < b.bottom + pad && b.top < a.bottom + pad;
}

function inside(b: Box, bounds: Box): boolean {
  return b.left >= bounds.left && b.right <= bounds.right && b.top >= bounds.top && b.bottom <= bounds.bottom;
}

/** Cuts a long label with an ellipsis, keeping a closing unit such as ` (A)` that tells groups apart. */
export function shorten(text: string): string {
  if (text.length <= MAX_LABEL_CHARS) return text;
  const tail = / \([^()]{1,6}\)$/.exec(text)?.[0] ?? '';
  return `${text.slice(0, MAX_LABEL_CHARS - 1 - tail.length)}…${tail}`;
}

/** The point of `b` nearest to (x, y). */
function nearest(b: Box, x: number, y: number): [number, number] {
  return [Math.max(b.left, Math.min(b.right, x)), Math.max(b.top, Math.min(b.bottom, y))];
}

/** Beyond this distance from its tip a label gets a leader line. */
const LEADER_FROM = 14;

const TURNS = [0, 25, -25, 50, -50, 80, -80, 115, -115, 180].map((d) => (d * Math.PI) / 180);
const DISTANCES = [5, 12, 22, 34, 48];

/** Whether the segment (x1, y1)–(x2, y2) passes through `b` (Liang–Barsky clipping). */
export function segmentHitsBox(x1: number, y1: number, x2: number, y2: number, b: Box): boolean {
  const dx = x2 - x1;
  const dy = y2 - y1;
  let t0 = 0;
  let t1 = 1;
  const edges: Array<[number, number]> = [
    [-dx, x1 - b.left],
    [dx, b.right - x1],
    [-dy, y1 - b.top],
    [dy, b.bottom - y1],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}

export interface Segment {
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
}

/**
 * Places every label; see the module comment. `bounds` is where labels may go near the tips;
 * spots that cross no arrow in `segments` are tried first.
 */
export function placeLabels(requests: readonly LabelRequest[], obstacles: readonly Box[], bounds: Box, segments: readonly Segment[] = []): Placed[] {
  const taken: Box[] = [...obstacles];
  const placedBoxes: Box[] = [];
  const out: Placed[] = [];
  const cx = (bounds.left + bounds.right) / 2;
  const free = (b: Box) => taken.every((t) => !overlaps(b, t, PAD));
  const put = (r: LabelRequest, text: string, box: Box, leader?: Placed['leader']) => {
    taken.push(box);
    placedBoxes.push(box);
    const markerRight = (box.left + box.right) / 2 < r.x2;
    out.push({
      arrow: r.arrow,
      text,
      x: markerRight ? box.right - MARKER_W : box.left + MARKER_W,
      y: box.bottom - 4,
      anchor: markerRight ? 'end' : 'start',
      markerX: markerRight ? box.right - 5 : box.left + 5,
      box,
      colour: r.colour,
      marker: r.marker,
      leader,
    });
  };

  for (const r of requests) {
    const text = shorten(r.text);
    const w = MARKER_W + text.length * CHAR_W;
    const len = Math.hypot(r.x2 - r.x1, r.y2 - r.y1);
    // a zero phasor has no direction: its label goes up and to the right
    const ux = len > 1e-9 ? (r.x2 - r.x1) / len : Math.SQRT1_2;
    const uy = len > 1e-9 ? (r.y2 - r.y1) / len : -Math.SQRT1_2;
    let done = false;
    for (const clearOfArrows of [true, false]) {
     if (done) break;
     for (const d of DISTANCES) {
      for (const t of TURNS) {
        const dx = ux * Math.cos(t) - uy * Math.sin(t);
        const dy = ux * Math.sin(t) + uy * Math.cos(t);
        const px = r.x2 + dx * d;
        const py = r.y2 + dy * d;
        const left = dx > 0.35 ? px : dx < -0.35 ? px - w : px - w / 2;
        const top = dy < -0.35 ? py - BOX_H : dy > 0.35 ? py : py - BOX_H / 2;
        const box = { left, top, right: left + w, bottom: top + BOX_H };
        if (inside(box, bounds) && free(box) && (!clearOfArrows || !segments.some((g) => segmentHitsBox(g.x1, g.y1, g.x2, g.y2, box)))) {
          const [nx, ny] = nearest(box, r.x2, r.y2);
          put(r, text, box, Math.hypot(nx - r.x2, ny - r.y2) > LEADER_FROM ? { x1: r.x2, y1: r.y2, x2: nx, y2: ny } : undefined);
          done = true;
          break;
        }
      }
      if (done) break;
     }
    }
    if (done) continue;
    // At the side nearest the tip, in the free slot nearest its height; else below everything.
    const right = r.x2 >= cx;
    const left = right ? bounds.right - w : bounds.left;
    let placed = false;
    for (let k = 0; k < 60 && !placed; k++) {
      for (const sign of [1, -1]) {
        const top = r.y2 - BOX_H / 2 + sign * k * (BOX_H + 2);
        const box = { left, top, right: left + w, bottom: top + BOX_H };
        if (inside(box, bounds) && free(box)) {
          put(r, text, box, { x1: r.x2, y1: r.y2, x2: right ? box.left : box.right, y2: top + BOX_H / 2 });
          placed = true;
          break;
        }
      }
    }
    if (placed) continue;
    let top = Math.max(bounds.bottom, ...taken.map((b) => b.bottom)) + 2;
    const box = { left, top, right: left + w, bottom: top + BOX_H };
    put(r, text, box, { x1: r.x2, y1: r.y2, x2: right ? box.left : box.right, y2: top + BOX_H / 2 });
    top += BOX_H;
  }
  return out;
}
