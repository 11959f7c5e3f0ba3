/** The WorkbookPort for Excel, on the Office.js workbook API. */
import type { ActiveCell, WorkbookPort } from '../port';
import { excelPlotPort } from './excel-plot';

/** Strips the sheet part of an Excel address: `'My sheet'!B2` → `B2`. */
export function localAddress(address: string): string {
  const bang = address.lastIndexOf('!');
  return bang >= 0 ? address.slice(bang + 1) : address;
}

export const excelPort: WorkbookPort = {
  hostName: 'Excel',
  ...excelPlotPort,

  getActiveCell(): Promise<ActiveCell> {
    return Excel.run(async (context) => {
      const cell = context.workbook.getActiveCell();
      cell.load('address,formulas,worksheet/name');
      await context.sync();
      const formula = cell.formulas[0]?.[0];
      return {
        sheet: cell.worksheet.name,
        address: localAddress(cell.address),
        formula: formula === undefined || formula === null ? '' : String(formula),
      };
    });
  },

  setActiveCellFormula(formula: string): Promise<void> {
    return Excel.run(async (context) => {
      context.workbook.getActiveCell().formulas = [[formula]];
      await context.sync();
    });
  },
};
