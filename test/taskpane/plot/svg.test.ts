/**
 * The SVG text: well-formed XML (parsed with fast-xml-parser's validator), one element per
 * drawn phasor carrying data-label, data-magnitude and data-angle in degrees, a tooltip per
 * phasor, text escaped, and a title and description for screen readers.
 */
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { layoutPlot } from '../../../src/taskpane/plot/geometry';
import type { PlotData } from '../../../src/taskpane/plot/model';
import { STARPOINT_PALETTE, IEC_60445, phasorStyle, conductorOf } from '../../../src/taskpane/plot/palette';
import { renderSvg } from '../../../src/taskpane/plot/svg';
import { expectClose } from '../../helpers';

const plot: PlotData = {
  source: 'Load & "feeder"!A1:B3',
  sheet: 'Load & "feeder"',
  groups: [{ name: 'I <rms>', unit: 'A' }],
  phasors: [
    { label: 'L1 & <x>', cell: 'B1', re: 24.54, im: -9.28, group: 0, index: 0 },
    { label: 'L2', cell: 'B2', re: -14.61, im: -11.24, group: 0, index: 1 },
    { label: 'L3', cell: 'B3', re: -8.04, im: 12.31, group: 0, index: 2 },
  ],
  unreadable: [],
  scaleMode: 'columns',
};

interface Node {
  [k: string]: unknown;
}

function phasorElements(svg: string): Node[] {
  const doc = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '@' }).parse(svg) as { svg: { g: Node[] } };
  const groups = doc.svg.g;
  const phasors = groups.find((g) => g['@class'] === 'phasors') as { g: Node | Node[] };
  return Array.isArray(phasors.g) ? phasors.g : [phasors.g];
}

describe('renderSvg', () => {
  const svg = renderSvg(layoutPlot(plot));

  it('is well-formed XML with escaped text', () => {
    expect(XMLValidator.validate(svg)).toBe(true);
    expect(svg).toContain('L1 &amp; &lt;x&gt;');
    expect(svg).toContain('Phasor diagram of Load &amp; &quot;feeder&quot;!A1:B3');
  });

  it('makes every drawn phasor an element with its label, magnitude and angle in degrees', () => {
    const els = phasorElements(svg);
    expect(els.map((e) => e['@data-label'])).toEqual(['L1 & <x>', 'L2', 'L3']);
    els.forEach((e, i) => {
      const z = math.complex(plot.phasors[i].re, plot.phasors[i].im);
      expectClose(Number(e['@data-magnitude']), math.abs(z) as unknown as number, 1e-12);
      expectClose(Number(e['@data-angle']), ((math.arg(z) as number) * 180) / Math.PI, 1e-12);
      expect(e['@data-cell']).toBe(plot.phasors[i].cell);
      expect(String(e.title)).toMatch(/A \(cell B\d\)$/);
    });
  });

  it('names the picture for screen readers', () => {
    expect(svg).toMatch(/<svg [^>]*role="img"[^>]*aria-labelledby="phz-plot-title phz-plot-desc"/);
    expect(svg).toMatch(/<desc id="phz-plot-desc">3 phasors from the origin, angles counter-clockwise/);
  });

  it('marks the tip-to-tail roles', () => {
    const t = renderSvg(layoutPlot(plot, { view: 'tipToTail', chain: [0, 1, 2] }));
    expect(XMLValidator.validate(t)).toBe(true);
    expect(phasorElements(t).map((e) => e['@data-role'])).toEqual(['ghost', 'ghost', 'ghost', 'chain', 'chain', 'chain', 'sum']);
  });
});

describe('palette', () => {
  /** WCAG 2.x relative luminance and contrast ratio. */
  function contrast(hex: string): number {
    const lin = (c: number) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
    const [r, g, b] = [1, 3, 5].map((i) => lin(parseInt(hex.slice(i, i + 2), 16) / 255));
    const l = 0.2126 * r + 0.7152 * g + 0.0722 * b;
    return 1.05 / (l + 0.05);
  }

  it('has six colours of at least 4.5:1 contrast on white (WCAG 2.x), each with its own marker', () => {
    for (const s of STARPOINT_PALETTE) expect(contrast(s.colour)).toBeGreaterThanOrEqual(4.5);
    expect(new Set(STARPOINT_PALETTE.map((s) => s.marker)).size).toBe(STARPOINT_PALETTE.length);
  });

  it('offers the IEC 60445 conductor colours by conductor name, else by position', () => {
    expect(conductorOf('L2')).toBe('L2');
    expect(conductorOf('phase 3 (A)')).toBe('L3');
    expect(conductorOf("neutral: I_N, V_N'N, total S (A)")).toBe('N');
    expect(phasorStyle('iec60445', 0, 'L3')).toBe(IEC_60445.L3);
    expect(phasorStyle('iec60445', 1, 'B7')).toBe(IEC_60445.L2);
    expect(phasorStyle('iec60445', 5, 'B9')).toBe(STARPOINT_PALETTE[5]);
  });
});
