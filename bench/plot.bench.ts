/**
 * The phasor plot's own work, called by `npm run bench` (bench/run.ts). Targets (issue 10):
 * geometry + SVG for 1,000 phasors ≤ 20 ms; a re-plot after a selection change of 50
 * phasors (read the cells, lay out, render the SVG text) ≤ 5 ms. The DOM update is one
 * innerHTML of that text and is the browser's work, not ours. Figures are printed, never
 * asserted.
 */
import { layoutPlot } from '../src/taskpane/plot/geometry';
import type { PlotData, PlotPhasor, SelectionBlock } from '../src/taskpane/plot/model';
import { readSelection } from '../src/taskpane/plot/read';
import { renderSvg } from '../src/taskpane/plot/svg';

let sink = 0;

/** 1,000 phasors in three groups of different size (voltages, currents, powers), varied angles. */
function thousand(): PlotData {
  const phasors: PlotPhasor[] = [];
  const scale = [230, 26, 6000];
  for (let i = 0; i < 1000; i++) {
    const g = i % 3;
    const m = scale[g] * (0.3 + ((i * 37) % 70) / 100);
    const a = ((i * 53) % 360) * (Math.PI / 180);
    phasors.push({ label: `P${i + 1}`, cell: `B${i + 2}`, re: m * Math.cos(a), im: m * Math.sin(a), group: g, index: Math.floor(i / 3) });
  }
  return {
    source: 'Bench!A1:D335',
    sheet: 'Bench',
    groups: [
      { name: 'voltage', unit: 'V' },
      { name: 'current', unit: 'A' },
      { name: 'complex power', unit: 'VA' },
    ],
    phasors,
    unreadable: [],
    scaleMode: 'columns',
  };
}

/** A labelled block of 50 text phasors (10 feeders × 5 quantities), as a selection hands it over. */
function fifty(): SelectionBlock {
  const header = ['Feeder', 'supply voltage', 'load current', 'line current', 'neutral current', 'complex power'];
  const rows: (string | number | null)[][] = [header];
  for (let r = 0; r < 10; r++) {
    rows.push([
      `F${r + 1}`,
      `${230 + r}∠${-120 * (r % 3)}`,
      `${10 + r * 1.7}-j${3 + (r % 4)}`,
      `${12.5 + r}∠${-30 - r * 11}°`,
      `${0.5 + r / 7}+j${(r % 5) / 3}`,
      `${2300 + 97 * r}∠${15 + r}`,
    ]);
  }
  return { sheet: 'Bench', top: 0, left: 0, values: rows, selected: 'A1:F11', cellCount: 66 };
}

function msBest(f: () => unknown, rounds: number): number {
  for (let i = 0; i < 20; i++) if (f() === undefined) sink++;
  let best = Infinity;
  for (let r = 0; r < rounds; r++) {
    const t0 = process.hrtime.bigint();
    if (f() === undefined) sink++;
    best = Math.min(best, Number(process.hrtime.bigint() - t0) / 1e6);
  }
  if (sink === -1) console.log(sink);
  return best;
}

/** Geometry + SVG text for 1,000 phasors, ms. */
export function benchPlot1000(): number {
  const data = thousand();
  return msBest(() => renderSvg(layoutPlot(data)).length, 30);
}

/** Read 50 phasors from a labelled block, lay out and render, ms. */
export function benchReplot50(): number {
  const block = fifty();
  return msBest(() => renderSvg(layoutPlot(readSelection(block))).length, 200);
}
