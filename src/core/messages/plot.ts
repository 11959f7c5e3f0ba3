/** Messages of the task pane's phasor plot and chart insertion (part of the one catalogue). */
import { excerpt } from './quote';

function count(n: number): string {
  return n.toLocaleString('en-US');
}

export const plotMessages = {
  halfPair(cells: string): string {
    return `${cells} has one part of a real/imaginary pair but not the other: enter 0 for a zero part`;
  },
  noWorkbook: 'The plot needs a workbook: open this pane from Excel, or use the preview workbook (npm start).',
  pick:
    'Select cells that hold phasors — text such as 230∠-120 or 7+j5, numbers, two columns of real and imaginary parts, or a PHZ result — and the plot follows the selection.',
  noPhasors(source: string, unreadable: number): string {
    return unreadable > 0
      ? `${source} holds no phasor that can be read: ${unreadable === 1 ? 'the cell listed below needs' : `the ${unreadable} cells listed below need`} fixing first.`
      : `${source} holds no phasors: select text such as 230∠-120 or 7+j5, numbers, two columns of real and imaginary parts, or a PHZ result.`;
  },
  tooManyCells(source: string, cells: number, max: number): string {
    return `${source} uses ${count(cells)} cells; the plot reads at most ${count(max)}. Select a smaller block.`;
  },
  tooManyPhasors(source: string, n: number, max: number): string {
    return `${source} holds ${count(n)} phasors; the plot draws at most ${count(max)}. Select a smaller block.`;
  },
  plotted(source: string, n: number, groups: number): string {
    return `${source}: ${n} phasor${n === 1 ? '' : 's'}${groups > 1 ? ` in ${groups} groups, each with its own scale` : ''}.`;
  },
  readFailed(host: string, detail: string): string {
    return `Could not read the selection from ${host}: ${detail}. Select one block of cells and try again.`;
  },
  tipToTailMixed: 'Tip to tail adds phasors of one group only (one unit, one scale): tick phasors of one group.',
  tipToTailNone: 'Tick two or more phasors in the table (column “Sum”) to add them tip to tail.',
  missingSets(what: string, sets: string): string {
    return `${what} needs ${sets}, which this version of Excel does not offer.`;
  },
  chartTooMany(n: number, max: number): string {
    return `A chart takes at most ${max} phasors (one series each, for a chart that stays readable); this request has ${n}. Select fewer.`;
  },
  chartEmpty: 'There is nothing to chart: the request names no phasor cells.',
  chartAreaUsed(area: string): string {
    return `The helper cells would go at ${area}, but cells there hold data; nothing was written. Choose an empty area.`;
  },
  chartBadCell(cell: string): string {
    return `“${excerpt(cell)}” is not a cell address (like B22) or a one-row pair of cells (like B5:C5).`;
  },
  chartNoSheet(sheet: string): string {
    return `There is no sheet named “${excerpt(sheet)}”.`;
  },
};
