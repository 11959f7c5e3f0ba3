/**
 * Worked sheets in the preview: a sheet plan becomes one new sheet of the preview
 * workbook (cells, styles by role, names scoped to the sheet as engine named
 * expressions), as one undoable step. The preview port calls this; engine tests call it
 * directly, without a grid.
 */
import type { RawCellContent } from 'hyperformula';
import type { SheetWriteResult } from '../taskpane/port';
import type { CellRole, SheetPlan } from '../taskpane/sheets/plan';
import { planGrid, uniqueSheetName } from '../taskpane/sheets/plan';
import type { CellStyle, Workbook } from './workbook';

/** How each role of a plan looks in the preview (roles left out look as their content does). */
const STYLE_OF: Partial<Record<CellRole, CellStyle>> = {
  title: 'title',
  subtitle: 'subtitle',
  note: 'note',
  scenario: 'scenario',
  heading: 'heading',
  header: 'header',
  input: 'input',
  verdict: 'verdict',
  caution: 'caution',
  chart: 'chart',
  formulaText: 'formulaText',
  symbol: 'symbol',
  label: 'label',
  unit: 'label',
  // constants that are not inputs: a check's tolerance, the orders of a function's table
  check: 'label',
  value: 'label',
};

/** Writes `plan` to a new sheet (a free name made from `plan.sheetName`); never touches another sheet. */
export function writePlanToWorkbook(workbook: Workbook, plan: SheetPlan): SheetWriteResult {
  const name = uniqueSheetName(plan.sheetName, workbook.sheetNames());
  const rows = planGrid(plan) as RawCellContent[][];
  const styles = plan.cells.flatMap((c) => {
    const style = STYLE_OF[c.role];
    return style ? [{ row: c.row, col: c.col, style }] : [];
  });
  workbook.addSheetWith({ name, rows, styles, names: plan.names, columnWidths: plan.columnWidths }, `Write sheet ${name}`);
  return { sheet: name, cells: plan.cells.length, names: plan.names.length };
}
