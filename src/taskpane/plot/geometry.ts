/**
 * The phasor diagram as a drawing description: phasors and options in, rings, spokes,
 * arrows, labels and legend out, in SVG user units (y grows downwards). Pure: no DOM, so
 * every number here is checked in node.
 *
 * Conventions of the trade: arrows start at the origin; angles are measured counter-clockwise
 * from the positive real axis (so a positive angle points up); spokes every 30°.
 */
import { formatPolar } from '../../core/format';
import { rect } from '../../core/phasor';
import type { PlotData, PlotPhasor } from './model';
import { groupDash, phasorStyle, SUM_STYLE, type MarkerShape, type PaletteName } from './palette';
import { formatScaled, ringScales, type GroupScale } from './scale';
import { overlaps, placeLabels, type Box, type Placed } from './labels';

export type PlotView = 'origin' | 'tipToTail';

export interface PlotOptions {
  /** Radius of the outer ring in user units (default 150). */
  readonly radius?: number;
  readonly palette?: PaletteName;
  readonly view?: PlotView;
  /** Indices into `data.phasors` to add tip to tail (view `tipToTail`), in that order. */
  readonly chain?: readonly number[];
  /** Prefix for ids inside the SVG, so several plots can share a page. */
  readonly idPrefix?: string;
  /** Phasor labels drawn on the diagram at most (the rest are in tooltips and the table). */
  readonly maxLabels?: number;
}

export type ArrowRole = 'phasor' | 'ghost' | 'chain' | 'sum';

export interface Arrow {
  readonly role: ArrowRole;
  readonly label: string;
  readonly cell: string;
  /** Index into `PlotData.phasors`; -1 for the sum. */
  readonly phasor: number;
  readonly group: number;
  readonly magnitude: number;
  /** Degrees in (−180, 180], counter-clockwise from +real. */
  readonly angleDeg: number;
  /** Tail and tip in user units. */
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
  /** Where the shaft ends (the base of the head), so the line does not poke through it. */
  readonly sx: number;
  readonly sy: number;
  /** Arrowhead triangle: tip, then the two base corners. */
  readonly head: readonly (readonly [number, number])[];
  readonly colour: string;
  readonly dash: string;
  readonly width: number;
  readonly marker: MarkerShape;
  readonly tooltip: string;
}

export interface Ring {
  readonly r: number;
  /** Value of this ring in each group, formatted with its unit (`50 V`). */
  readonly values: readonly string[];
}

export interface Spoke {
  readonly angleDeg: number;
  readonly x2: number;
  readonly y2: number;
  readonly label: string;
  readonly lx: number;
  readonly ly: number;
  readonly anchor: 'start' | 'middle' | 'end';
}

export interface TextItem {
  readonly text: string;
  readonly x: number;
  readonly y: number;
  readonly anchor: 'start' | 'middle' | 'end';
}

/** A phasor label placed clear of the others (see labels.ts). */
export type PlacedLabel = Placed;

export interface LegendRow {
  readonly kind: 'group' | 'sum';
  readonly text: string;
  readonly dash: string;
  readonly colour: string;
  readonly width: number;
  readonly y: number;
}

export interface Drawing {
  readonly width: number;
  readonly height: number;
  readonly cx: number;
  readonly cy: number;
  readonly radius: number;
  readonly idPrefix: string;
  readonly title: string;
  readonly desc: string;
  readonly view: PlotView;
  readonly rings: readonly Ring[];
  readonly ringLabels: readonly TextItem[];
  readonly spokes: readonly Spoke[];
  readonly axisLabels: readonly TextItem[];
  readonly arrows: readonly Arrow[];
  readonly labels: readonly PlacedLabel[];
  readonly legendTop: number;
  readonly legend: readonly LegendRow[];
  /** Notes under the legend (labels left to the table, a tip-to-tail remark). */
  readonly notes: readonly TextItem[];
  /** Each group's scale (rings every `step`, outer ring at `full`). */
  readonly scales: readonly GroupScale[];
}

const DEG = Math.PI / 180;
const MARGIN = 58;
const LEGEND_ROW = 18;
export const LABEL_FONT = 12;
const DEFAULT_MAX_LABELS = 40;

function magnitudeOf(re: number, im: number): number {
  return Math.hypot(re, im);
}

/** Degrees in (−180, 180], 0 for the zero phasor (as the core's `angleDeg`). */
function angleDegOf(re: number, im: number): number {
  if (re === 0 && im === 0) return 0;
  const d = Math.atan2(im, re) / DEG;
  return d === -180 ? 180 : d;
}

function unitSuffix(unit: string): string {
  return unit ? ` ${unit}` : '';
}

/** The tooltip of a phasor: label, polar value with unit, and the cell. */
function tooltipOf(label: string, re: number, im: number, unit: string, cell: string): string {
  const polar = formatPolar(rect(re, im), 6);
  return `${label}: ${polar}${unitSuffix(unit)}${cell ? ` (cell ${cell})` : ''}`;
}

/** Spoke label: 0°, 30°, …, 180°, −150°, …, −30° (angles as the functions give them). */
function spokeLabel(deg: number): string {
  const d = deg > 180 ? deg - 360 : deg;
  return `${d < 0 ? '−' : ''}${Math.abs(d)}°`;
}

interface ArrowInput {
  readonly role: ArrowRole;
  readonly p: PlotPhasor | undefined;
  readonly label: string;
  readonly cell: string;
  readonly group: number;
  /** Tail and tip in value units. */
  readonly from: readonly [number, number];
  readonly to: readonly [number, number];
  readonly magnitude: number;
  readonly angleDeg: number;
  readonly colour: string;
  readonly dash: string;
  readonly width: number;
  readonly marker: MarkerShape;
  readonly tooltip: string;
}

function makeArrow(a: ArrowInput, index: number, cx: number, cy: number, pxPer: number): Arrow {
  const x1 = cx + a.from[0] * pxPer;
  const y1 = cy - a.from[1] * pxPer;
  const x2 = cx + a.to[0] * pxPer;
  const y2 = cy - a.to[1] * pxPer;
  const len = Math.hypot(x2 - x1, y2 - y1);
  const headLen = Math.min(7 + a.width * 2, len * 0.45);
  const ux = len > 0 ? (x2 - x1) / len : 1;
  const uy = len > 0 ? (y2 - y1) / len : 0;
  const bx = x2 - ux * headLen;
  const by = y2 - uy * headLen;
  const half = headLen * 0.42;
  return {
    role: a.role,
    label: a.label,
    cell: a.cell,
    phasor: index,
    group: a.group,
    magnitude: a.magnitude,
    angleDeg: a.angleDeg,
    x1,
    y1,
    x2,
    y2,
    sx: bx,
    sy: by,
    head: [
      [x2, y2],
      [bx - uy * half, by + ux * half],
      [bx + uy * half, by - ux * half],
    ],
    colour: a.colour,
    dash: a.dash,
    width: a.width,
    marker: a.marker,
    tooltip: a.tooltip,
  };
}

/**
 * The direction (degrees) between spokes farthest from every arrow, for the ring values;
 * directions in `blocked` (where the values would run into the angle labels) only when
 * every direction is.
 */
function quietAngle(angles: readonly number[], blocked: (deg: number) => boolean): number {
  let best = 75;
  let bestGap = -1;
  // Steep directions only, so stacked ring values keep the ring spacing between their lines.
  const candidates = [75, 105, 45, 135, 255, 285, 225, 315];
  const open = candidates.filter((d) => !blocked(d));
  for (const d of open.length > 0 ? open : candidates) {
    let gap = 360;
    for (const a of angles) {
      const diff = Math.abs((((d - a) % 360) + 540) % 360 - 180);
      gap = Math.min(gap, diff);
    }
    // prefer the upper right when tied, where a reader looks first
    if (gap > bestGap + 1e-9) {
      bestGap = gap;
      best = d;
    }
  }
  return best;
}

/**
 * Lays out the diagram of `data`.
 *
 * Origin view: one arrow per phasor from the origin, each group on its own scale.
 * Tip-to-tail view: the chosen phasors (one group) drawn head to tail from the origin, their
 * sum as a heavier near-black arrow with a hollow head, and the phasors themselves faintly
 * from the origin; the scale then covers the whole path.
 */
export function layoutPlot(data: PlotData, options: PlotOptions = {}): Drawing {
  const R = options.radius ?? 150;
  const palette = options.palette ?? 'starpoint';
  const idPrefix = options.idPrefix ?? 'phz-plot';
  const maxLabels = options.maxLabels ?? DEFAULT_MAX_LABELS;
  const groups = data.groups;
  const phasors = data.phasors;

  // Tip to tail: only phasors of one group (one unit) add up.
  const chain = (options.view === 'tipToTail' ? (options.chain ?? []) : []).filter((i) => i >= 0 && i < phasors.length);
  const chainGroup = chain.length > 0 ? phasors[chain[0]].group : -1;
  const tipToTail = options.view === 'tipToTail' && chain.length > 0 && chain.every((i) => phasors[i].group === chainGroup);

  // Scales: largest magnitude per group, and in tip-to-tail the farthest point of the path.
  const maxima = groups.map(() => 0);
  for (const p of phasors) maxima[p.group] = Math.max(maxima[p.group], magnitudeOf(p.re, p.im));
  let sumRe = 0;
  let sumIm = 0;
  if (tipToTail) {
    for (const i of chain) {
      sumRe += phasors[i].re;
      sumIm += phasors[i].im;
      maxima[chainGroup] = Math.max(maxima[chainGroup], magnitudeOf(sumRe, sumIm));
    }
  }
  const { count, scales } = ringScales(maxima);

  // Size: the rings, a margin for spoke and phasor labels, the legend below.
  const cx = R + MARGIN;
  const cy = R + MARGIN - 8;
  const width = 2 * (R + MARGIN);

  const rings: Ring[] = [];
  for (let k = 1; k <= count; k++) {
    rings.push({ r: (R * k) / count, values: scales.map((s, g) => formatScaled(s.step * k, groups[g].unit, s.full)) });
  }
  const spokes: Spoke[] = [];
  for (let d = 0; d < 360; d += 30) {
    const c = Math.cos(d * DEG);
    const s = Math.sin(d * DEG);
    const lr = R + 14;
    spokes.push({
      angleDeg: d,
      x2: cx + R * c,
      y2: cy - R * s,
      label: spokeLabel(d),
      lx: cx + lr * c,
      ly: cy - lr * s + 4,
      anchor: Math.abs(c) < 0.2 ? 'middle' : c > 0 ? 'start' : 'end',
    });
  }
  const axisLabels: TextItem[] = [
    { text: 'Re', x: cx + R + 40, y: cy + 14, anchor: 'end' },
    { text: 'Im', x: cx + 8, y: cy - R - 30, anchor: 'start' },
  ];

  // Arrows.
  const inputs: ArrowInput[] = [];
  const phasorIndex: number[] = [];
  const unitOf = (g: number) => groups[g]?.unit ?? '';
  phasors.forEach((p, i) => {
    const style = phasorStyle(palette, p.index, p.label);
    const mag = magnitudeOf(p.re, p.im);
    // In the tip-to-tail view only the chain's own group stays, faintly, from the origin.
    if (tipToTail && p.group !== chainGroup) return;
    inputs.push({
      role: tipToTail ? 'ghost' : 'phasor',
      p,
      label: p.label,
      cell: p.cell,
      group: p.group,
      from: [0, 0],
      to: [p.re / scales[p.group].full, p.im / scales[p.group].full],
      magnitude: mag,
      angleDeg: angleDegOf(p.re, p.im),
      colour: style.colour,
      dash: groupDash(p.group),
      width: tipToTail ? 1.5 : 2.25,
      marker: style.marker,
      tooltip: tooltipOf(p.label, p.re, p.im, unitOf(p.group), p.cell),
    });
    phasorIndex.push(i);
  });
  if (tipToTail) {
    const full = scales[chainGroup].full;
    let x = 0;
    let y = 0;
    for (const i of chain) {
      const p = phasors[i];
      const style = phasorStyle(palette, p.index, p.label);
      inputs.push({
        role: 'chain',
        p,
        label: p.label,
        cell: p.cell,
        group: p.group,
        from: [x / full, y / full],
        to: [(x + p.re) / full, (y + p.im) / full],
        magnitude: magnitudeOf(p.re, p.im),
        angleDeg: angleDegOf(p.re, p.im),
        colour: style.colour,
        dash: groupDash(p.group),
        width: 2.25,
        marker: style.marker,
        tooltip: tooltipOf(p.label, p.re, p.im, unitOf(p.group), p.cell),
      });
      phasorIndex.push(i);
      x += p.re;
      y += p.im;
    }
    const sumLabel = `Sum of ${chain.map((i) => phasors[i].label).join(' + ')}`;
    inputs.push({
      role: 'sum',
      p: undefined,
      label: 'Sum',
      cell: '',
      group: chainGroup,
      from: [0, 0],
      to: [sumRe / full, sumIm / full],
      magnitude: magnitudeOf(sumRe, sumIm),
      angleDeg: angleDegOf(sumRe, sumIm),
      colour: SUM_STYLE.colour,
      dash: '',
      width: SUM_STYLE.width,
      marker: 'circle',
      tooltip: tooltipOf(sumLabel, sumRe, sumIm, unitOf(chainGroup), ''),
    });
    phasorIndex.push(-1);
  }
  const arrows = inputs.map((a, k) => makeArrow(a, phasorIndex[k], cx, cy, R));

  // Ring values along the quietest direction between spokes.
  // Up to two groups' values beside each ring; with more, the legend gives each group's step.
  const ringLabelsAt = (deg: number): TextItem[] => {
    const rightSide = Math.cos(deg * DEG) >= 0;
    return rings.map((ring) => ({
      text: ring.values.length <= 2 ? ring.values.join(' · ') : '',
      x: cx + ring.r * Math.cos(deg * DEG) + (rightSide ? 3 : -3),
      y: cy - ring.r * Math.sin(deg * DEG) - 3,
      anchor: rightSide ? 'start' : 'end',
    }));
  };
  const spokeBoxes = spokes.map((s) => textBox({ text: s.label, x: s.lx, y: s.ly, anchor: s.anchor }));
  const hitsSpokeLabel = (t: TextItem) => t.text !== '' && spokeBoxes.some((b) => overlaps(textBox(t), b, 1));
  // The outer ring's value may give way to the angle labels at the rim (the legend's step gives it).
  const inner = (labels: TextItem[]) => labels.slice(0, -1);
  const qa = quietAngle(
    arrows.filter((a) => a.role !== 'ghost').map((a) => a.angleDeg),
    (deg) => inner(ringLabelsAt(deg)).some(hitsSpokeLabel),
  );
  const ringLabels = ringLabelsAt(qa).map((t, k, all) => (k === all.length - 1 && hitsSpokeLabel(t) ? { ...t, text: '' } : t));

  // Labels: the drawn arrows (not the faint ones) get one each, up to the limit.
  const labelled = arrows.map((a, k) => ({ a, k })).filter(({ a }) => a.role !== 'ghost');
  const obstacles: Box[] = [
    ...spokeBoxes,
    ...ringLabels.filter((t) => t.text !== '').map((t) => textBox(t)),
    ...axisLabels.map((t) => textBox(t)),
  ];
  const notes: string[] = [];
  let labels: PlacedLabel[] = [];
  if (labelled.length <= maxLabels) {
    labels = placeLabels(
      labelled.map(({ a, k }) => ({ arrow: k, text: a.label, x1: a.x1, y1: a.y1, x2: a.x2, y2: a.y2, colour: a.colour, marker: a.marker })),
      obstacles,
      { left: 2, top: 2, right: width - 2, bottom: cy + R + MARGIN - 20 },
      arrows.filter((a) => a.role !== 'ghost'),
    );
  } else {
    notes.push(`${labelled.length} arrows: labels are in each arrow's tooltip and in the table.`);
  }
  const diagramBottom = Math.max(cy + R + 30, ...labels.map((l) => l.box.bottom + 4));

  // Legend: one row per group (dash sample, name, unit, ring step), then the sum.
  const legend: LegendRow[] = [];
  const legendTop = diagramBottom + 8;
  let y = legendTop;
  groups.forEach((g, i) => {
    const unit = g.unit ? ` (${g.unit})` : '';
    const step = formatScaled(scales[i].step, g.unit, scales[i].full);
    legend.push({ kind: 'group', text: `${g.name}${unit}: rings every ${step}`, dash: groupDash(i), colour: '#333333', width: 2.25, y });
    y += LEGEND_ROW;
  });
  if (tipToTail) {
    const sum = arrows[arrows.length - 1];
    legend.push({
      kind: 'sum',
      text: `Sum, tip to tail: ${formatPolar(rect(sumRe, sumIm), 6)}${unitSuffix(unitOf(chainGroup))}`,
      dash: '',
      colour: sum.colour,
      width: sum.width,
      y,
    });
    y += LEGEND_ROW;
  } else if (options.view === 'tipToTail') {
    notes.push(chain.length === 0 ? 'Tick phasors in the table to add them tip to tail.' : 'Tip to tail adds phasors of one group only.');
  }
  const noteItems: TextItem[] = notes.map((text) => {
    const item: TextItem = { text, x: 10, y: y + 12, anchor: 'start' };
    y += LEGEND_ROW;
    return item;
  });
  const height = Math.ceil(y + 8);

  const first = phasors.slice(0, 12).map((p) => `${p.label} ${formatPolar(rect(p.re, p.im), 4)}${unitSuffix(unitOf(p.group))}`);
  const desc =
    phasors.length === 0
      ? 'No phasors.'
      : `${phasors.length} phasor${phasors.length === 1 ? '' : 's'} from the origin, angles counter-clockwise from the positive real axis: ${first.join('; ')}${phasors.length > 12 ? '; …' : ''}.`;

  return {
    width,
    height,
    cx,
    cy,
    radius: R,
    idPrefix,
    title: `Phasor diagram of ${data.source}${tipToTail ? ', tip to tail' : ''}`,
    desc,
    view: tipToTail ? 'tipToTail' : 'origin',
    rings,
    ringLabels,
    spokes,
    axisLabels,
    arrows,
    labels,
    legendTop,
    legend,
    notes: noteItems,
    scales,
  };
}

/** Approximate box of a text item at the label font (≈0.58 em per character of a sans-serif). */
export function textBox(t: TextItem, font = LABEL_FONT - 1): Box {
  const w = t.text.length * font * 0.62;
  const left = t.anchor === 'start' ? t.x : t.anchor === 'end' ? t.x - w : t.x - w / 2;
  return { left, right: left + w, top: t.y - font * 0.85, bottom: t.y + font * 0.25 };
}
