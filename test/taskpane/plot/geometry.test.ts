/**
 * The diagram's geometry: every arrow's angle and length, one scale per group, rounded ring
 * values, labels that never overlap (crowded sets too), and the tip-to-tail path closing on
 * the sum. Angles and magnitudes are checked against mathjs (an independent library:
 * math.arg, math.abs, math.add); the trade's convention, angles counter-clockwise from the
 * positive real axis, means a positive angle points up (SVG y grows downwards).
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { layoutPlot, textBox } from '../../../src/taskpane/plot/geometry';
import { overlaps } from '../../../src/taskpane/plot/labels';
import type { PlotData, PlotPhasor } from '../../../src/taskpane/plot/model';
import { niceCeil, ringScales } from '../../../src/taskpane/plot/scale';
import { expectClose } from '../../helpers';

function data(groups: Array<{ name: string; unit: string; values: Array<[number, number, string?]> }>): PlotData {
  const phasors: PlotPhasor[] = [];
  groups.forEach((g, gi) =>
    g.values.forEach(([re, im, label], i) => phasors.push({ label: label ?? `${g.name}${i + 1}`, cell: `${String.fromCharCode(66 + gi)}${i + 2}`, re, im, group: gi, index: i })),
  );
  return { source: 'S!A1:C4', sheet: 'S', groups: groups.map(({ name, unit }) => ({ name, unit })), phasors, unreadable: [], scaleMode: 'columns' };
}

const DEG = 180 / Math.PI;
const currents: Array<[number, number]> = [
  [24.54, -9.28],
  [-14.61, -11.24],
  [-8.04, 12.31],
];
const voltages: Array<[number, number]> = [
  [230, 0],
  [-118.6, -193.5],
  [-112.2, 204.2],
];

describe('layoutPlot: arrows', () => {
  const d = data([
    { name: 'V', unit: 'V', values: voltages },
    { name: 'I', unit: 'A', values: currents },
  ]);
  const drawing = layoutPlot(d);

  it('draws each phasor from the origin at its angle (counter-clockwise from +real) and length (by its group scale)', () => {
    expect(drawing.arrows).toHaveLength(6);
    drawing.arrows.forEach((a, k) => {
      const p = d.phasors[k];
      const z = math.complex(p.re, p.im);
      expect([a.x1, a.y1]).toEqual([drawing.cx, drawing.cy]);
      // drawn direction: screen y is down, so the angle is atan2(−dy, dx)
      const drawnDeg = Math.atan2(-(a.y2 - a.y1), a.x2 - a.x1) * DEG;
      expectClose(drawnDeg, (math.arg(z) as number) * DEG, 1e-9);
      expectClose(a.angleDeg, (math.arg(z) as number) * DEG, 1e-12);
      expectClose(a.magnitude, math.abs(z) as unknown as number, 1e-12);
      const full = drawing.scales[p.group].full;
      expectClose(Math.hypot(a.x2 - a.x1, a.y2 - a.y1), (drawing.radius * (math.abs(z) as unknown as number)) / full, 1e-9);
    });
  });

  it('gives each group its own scale whose outer ring holds its largest phasor', () => {
    expect(drawing.scales).toHaveLength(2);
    const maxV = Math.max(...voltages.map(([re, im]) => Math.hypot(re, im)));
    const maxI = Math.max(...currents.map(([re, im]) => Math.hypot(re, im)));
    expect(drawing.scales[0].full).toBeGreaterThanOrEqual(maxV);
    expect(drawing.scales[1].full).toBeGreaterThanOrEqual(maxI);
    // both fill at least 40 % of the radius: the diagram is not mostly empty rings
    expect(maxV / drawing.scales[0].full).toBeGreaterThan(0.4);
    expect(maxI / drawing.scales[1].full).toBeGreaterThan(0.4);
    expect(drawing.legend.map((l) => l.text)).toEqual([`V (V): rings every ${drawing.rings[0].values[0]}`, `I (A): rings every ${drawing.rings[0].values[1]}`]);
  });

  it('tells the groups apart by dash, and phasors within a group by colour and marker', () => {
    const dashes = new Set(drawing.arrows.map((a) => `${a.group}:${a.dash}`));
    expect(dashes.size).toBe(2);
    expect(drawing.arrows[0].dash).not.toBe(drawing.arrows[3].dash);
    const inGroup = drawing.arrows.filter((a) => a.group === 0);
    expect(new Set(inGroup.map((a) => a.colour)).size).toBe(3);
    expect(new Set(inGroup.map((a) => a.marker)).size).toBe(3);
  });

  it('puts the spokes every 30° and labels them as the functions give angles', () => {
    expect(drawing.spokes.map((s) => s.label)).toEqual(['0°', '30°', '60°', '90°', '120°', '150°', '180°', '−150°', '−120°', '−90°', '−60°', '−30°']);
  });

  it('draws a zero phasor as a point at the origin with angle 0', () => {
    const z = layoutPlot(data([{ name: 'I', unit: 'A', values: [[0, 0], [3, 4]] }]));
    expect(z.arrows[0].magnitude).toBe(0);
    expect(z.arrows[0].angleDeg).toBe(0);
    expect([z.arrows[0].x2, z.arrows[0].y2]).toEqual([z.cx, z.cy]);
  });
});

describe('ring values', () => {
  it.each([
    [0.9, 1],
    [1, 1],
    [1.01, 2],
    [2.2, 2.5],
    [3, 5],
    [7, 10],
    [23, 25],
    [0.0031, 0.005],
  ])('niceCeil(%s) = %s (1–2–2.5–5 steps, common practice for chart scales)', (x, want) => {
    expectClose(niceCeil(x), want, 1e-12);
  });

  it('rounds every ring to a value of the 1–2–2.5–5 series and the outer ring covers the largest phasor', () => {
    for (const max of [0.37, 4.2, 26.24, 230, 233, 11000, 6034.39]) {
      const { count, scales } = ringScales([max]);
      const step = scales[0].step;
      const mantissa = step / 10 ** Math.floor(Math.log10(step));
      expect([1, 2, 2.5, 5].some((m) => Math.abs(m - mantissa) < 1e-9)).toBe(true);
      expect(step * count).toBeGreaterThanOrEqual(max);
      expect(step * (count - 1)).toBeLessThan(max);
    }
  });

  it('formats ring values with the unit and an SI prefix', () => {
    const d = layoutPlot(data([{ name: 'V', unit: 'V', values: [[11000, 0], [-5500, -9526]] }]));
    expect(d.rings.map((r) => r.values[0])).toEqual(['2.5 kV', '5 kV', '7.5 kV', '10 kV', '12.5 kV']);
  });
});

describe('labels', () => {
  function assertNoOverlap(drawing: ReturnType<typeof layoutPlot>): void {
    const boxes = drawing.labels.map((l) => l.box);
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(overlaps(boxes[i], boxes[j]), `${drawing.labels[i].text} / ${drawing.labels[j].text}`).toBe(false);
    const fixed = [...drawing.spokes.map((s) => textBox({ text: s.label, x: s.lx, y: s.ly, anchor: s.anchor })), ...drawing.ringLabels.filter((t) => t.text).map((t) => textBox(t))];
    for (const b of boxes) for (const f of fixed) expect(overlaps(b, f)).toBe(false);
  }

  it('places a label for every arrow without overlap in a crowded set (24 phasors within 40°)', () => {
    const values: Array<[number, number, string]> = Array.from({ length: 24 }, (_, k) => {
      const deg = 10 + (k * 40) / 23;
      const m = 100 + (k % 3);
      return [m * Math.cos(deg / DEG), m * Math.sin(deg / DEG), `Feeder ${k + 1} current`];
    });
    const drawing = layoutPlot(data([{ name: 'I', unit: 'A', values }]));
    expect(drawing.labels).toHaveLength(24);
    assertNoOverlap(drawing);
  });

  it('places labels without overlap when three groups point the same way', () => {
    const same: Array<[number, number]> = [
      [10, 1],
      [10, 0],
      [10, -1],
    ];
    const drawing = layoutPlot(
      data([
        { name: 'current', unit: 'A', values: same },
        { name: 'voltage', unit: 'V', values: same.map(([a, b]) => [a * 23, b * 23] as [number, number]) },
        { name: 'power', unit: 'VA', values: same.map(([a, b]) => [a * 230, b * 2] as [number, number]) },
      ]),
    );
    expect(drawing.labels).toHaveLength(9);
    assertNoOverlap(drawing);
  });

  it('leaves labels to tooltips and the table above the limit, and says so', () => {
    const values = Array.from({ length: 60 }, (_, k) => [Math.cos(k), Math.sin(k)] as [number, number]);
    const drawing = layoutPlot(data([{ name: 'I', unit: 'A', values }]));
    expect(drawing.labels).toHaveLength(0);
    expect(drawing.notes[0].text).toMatch(/60 arrows: labels are in each arrow's tooltip and in the table/);
  });
});

describe('tip to tail', () => {
  const d = data([
    { name: 'V', unit: 'V', values: voltages },
    { name: 'I', unit: 'A', values: currents },
  ]);
  const drawing = layoutPlot(d, { view: 'tipToTail', chain: [3, 4, 5] });

  it('chains the chosen phasors head to tail and closes on their sum (checked with math.add)', () => {
    const chain = drawing.arrows.filter((a) => a.role === 'chain');
    const sum = drawing.arrows.find((a) => a.role === 'sum')!;
    expect(chain.map((a) => a.label)).toEqual(['I1', 'I2', 'I3']);
    expect([chain[0].x1, chain[0].y1]).toEqual([drawing.cx, drawing.cy]);
    for (let k = 1; k < chain.length; k++) {
      expectClose(chain[k].x1, chain[k - 1].x2, 1e-12);
      expectClose(chain[k].y1, chain[k - 1].y2, 1e-12);
    }
    // the chain ends where the sum arrow ends
    expectClose(chain[2].x2, sum.x2, 1e-9);
    expectClose(chain[2].y2, sum.y2, 1e-9);
    const expected = math.add(math.add(math.complex(...currents[0]), math.complex(...currents[1])), math.complex(...currents[2])) as math.Complex;
    expectClose(sum.magnitude, math.abs(expected) as unknown as number, 1e-12);
    expectClose(sum.angleDeg, (math.arg(expected) as number) * DEG, 1e-9);
    const full = drawing.scales[1].full;
    expectClose(sum.x2 - drawing.cx, (expected.re / full) * drawing.radius, 1e-9);
    expectClose(drawing.cy - sum.y2, (expected.im / full) * drawing.radius, 1e-9);
  });

  it('draws the sum distinctly (heavier, its own colour, hollow head) and says its value in the legend', () => {
    const sum = drawing.arrows.find((a) => a.role === 'sum')!;
    const others = drawing.arrows.filter((a) => a.role !== 'sum');
    expect(sum.width).toBeGreaterThan(Math.max(...others.map((a) => a.width)));
    expect(others.map((a) => a.colour)).not.toContain(sum.colour);
    expect(drawing.legend.at(-1)!.text).toMatch(/^Sum, tip to tail: 8\.\d+∠-\d+\.\d+° A$/);
  });

  it('keeps the whole path inside the outer ring', () => {
    for (const a of drawing.arrows) {
      expect(Math.hypot(a.x1 - drawing.cx, a.y1 - drawing.cy)).toBeLessThanOrEqual(drawing.radius + 1e-9);
      expect(Math.hypot(a.x2 - drawing.cx, a.y2 - drawing.cy)).toBeLessThanOrEqual(drawing.radius + 1e-9);
    }
  });

  it('refuses to add phasors of different groups and says why', () => {
    const mixed = layoutPlot(d, { view: 'tipToTail', chain: [0, 3] });
    expect(mixed.arrows.some((a) => a.role === 'sum')).toBe(false);
    expect(mixed.notes.map((n) => n.text)).toContain('Tip to tail adds phasors of one group only.');
  });
});
