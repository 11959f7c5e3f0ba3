/**
 * Messages of the preview workbook: formulas the engine is not given, files that cannot be
 * opened, keeping the work in the browser, and the undo history.
 */
import { excerpt } from './quote';

function count(n: number): string {
  return n.toLocaleString('en-US');
}

export const workbookMessages = {
  formulaTooLong(length: number, limit: number): string {
    return `This formula is ${count(length)} characters long; a formula may have at most ${count(limit)} (as in Excel): split it over several cells`;
  },
  formulaTooDeep(depth: number, limit: number): string {
    return `This formula nests brackets ${count(depth)} deep; at most ${limit} levels are read (Excel allows 64 nested functions): split it over several cells`;
  },
  formulaTooManyOperators(operators: number, limit: number): string {
    return `This formula has ${count(operators)} operators; at most ${count(limit)} are read in one formula: add the terms in several cells, or use SUM over a range`;
  },
  /** The engine stopped on the formula after all (a case the checks above did not foresee). */
  formulaTooComplex: 'This formula is too complex for the preview’s engine to read: split it over several cells',
  doubledQuote:
    'Text in a formula cannot hold a doubled quote ("") in the preview: write a quote as CHAR(34), e.g. ="say "&CHAR(34)&"hi"&CHAR(34), or put the text in a cell and refer to it',
  /** The engine's own reading error, with the start of what it said. */
  unreadable(detail: string): string {
    return `The formula could not be read (${excerpt(detail, 80)}): check brackets, quotes and commas; phasor text goes in quotes, e.g. "3+j4"`;
  },
  notFiniteValue: 'This value is not a finite number (an overflow or 0/0): check the inputs of the formula',
  sheetFull(rows: number, cols: number, maxRows: number, maxCols: string): string {
    return `That does not fit: it would reach row ${count(rows)} or column ${count(cols)}, and a sheet ends at row ${count(maxRows)} and column ${maxCols}`;
  },
  undoDropped(limit: number): string {
    return `The undo history keeps the last ${limit} steps; the oldest step was let go and can no longer be undone`;
  },
  // --- keeping the work in the browser -------------------------------------------------
  restored(when: string): string {
    return `Your workbook was restored from this browser (saved ${when}).`;
  },
  storageUnavailable(why: string): string {
    return `This browser does not let the preview keep the workbook (${excerpt(why, 80)}): your edits last only until the page is closed; save it as .xlsx to keep it`;
  },
  storageFailed(why: string): string {
    return `The workbook could not be saved in this browser (${excerpt(why, 80)}): save it as .xlsx to keep your work`;
  },
  restoreFailed(why: string): string {
    return `The workbook kept in this browser could not be read back (${excerpt(why, 80)}), so the demo workbook was opened; the saved copy is left as it was`;
  },
  confirmNew:
    'Start a new workbook? The demo workbook replaces the one kept in this browser. Ctrl+Z brings the current one back; to keep a copy elsewhere, save it as .xlsx first.',
  confirmOpen(file: string): string {
    return `Open ${excerpt(file, 60)}? It replaces the workbook kept in this browser. Ctrl+Z brings the current one back; to keep a copy elsewhere, save it as .xlsx first.`;
  },
  // --- .xlsx files -----------------------------------------------------------------------
  fileNotXlsx(file: string): string {
    return `${excerpt(file, 60)} is not an .xlsx workbook (it is not a zip package of sheets): nothing was changed. Open a file saved as "Excel Workbook (*.xlsx)"; save .xls or .ods files as .xlsx first`;
  },
  fileUnreadable(file: string, why: string): string {
    return `${excerpt(file, 60)} could not be read (${excerpt(why, 100)}): nothing was changed. Check that it opens in a spreadsheet program and save it again as .xlsx`;
  },
  fileTooLarge(file: string, megabytes: number, limit: number): string {
    return `${excerpt(file, 60)} is ${megabytes.toFixed(1)} MB; the preview opens files up to ${limit} MB: nothing was changed`;
  },
  fileNoSheets(file: string): string {
    return `${excerpt(file, 60)} holds no worksheet: nothing was changed`;
  },
  fileTooBig(file: string, sheet: string, rows: number, cols: number, maxRows: number, maxCols: number): string {
    return `${excerpt(file, 60)}: sheet ${excerpt(sheet, 40)} reaches row ${count(rows)} and column ${count(cols)}, beyond the preview’s ${count(maxRows)} rows × ${count(maxCols)} columns: nothing was changed`;
  },
  opened(file: string, sheets: number, cells: number, skipped: number): string {
    const s = `Opened ${excerpt(file, 60)}: ${count(sheets)} sheet${sheets === 1 ? '' : 's'}, ${count(cells)} cells.`;
    return skipped === 0 ? s : `${s} ${count(skipped)} cell${skipped === 1 ? '' : 's'} held something the preview does not keep (pictures, rich text formatting, comments): their values were kept.`;
  },
  reading(file: string, megabytes: number, seconds: number): string {
    return `Reading ${excerpt(file, 60)} (${megabytes.toFixed(1)} MB)… ${seconds} s. The grid stays usable meanwhile; the file replaces this workbook only once you confirm`;
  },
  opening(file: string, cells: number): string {
    return `Opening ${excerpt(file, 60)}: calculating ${count(cells)} cells…`;
  },
  saving(seconds: number): string {
    return `Saving as .xlsx… ${seconds} s. The grid stays usable meanwhile; what you change now goes into the next save`;
  },
  saved(file: string): string {
    return `Saved ${excerpt(file, 60)}. PHZ formulas calculate in Excel once the Starpoint add-in is loaded.`;
  },
};
