/**
 * The preview's formula engine: HyperFormula with the whole PHZ registry registered
 * through the generic adapter (`./adapter`). Used by the preview workbook in the
 * browser and by node tests (`evaluateFormula`).
 */
import { DetailedCellError, HyperFormula } from 'hyperformula';
import type { CellValue, RawCellContent, SimpleCellAddress } from 'hyperformula';
import { functions as registryFunctions, specs as registrySpecs } from '../functions';
import { registerRegistry, spillingFormulas, takePendingResizes } from './adapter';
import type { Registry } from './adapter';

export { NAMESPACE, functionId, createPhzPlugin } from './adapter';
export type { Registry } from './adapter';

/** The project registry, as the adapter takes it. */
export const defaultRegistry: Registry = { specs: registrySpecs, functions: registryFunctions };

/** HyperFormula's licence for GPL v3 use (the preview is a development tool). */
export const LICENSE_KEY = 'gpl-v3';

/** One displayed cell: a value, `null` for empty, or an error with its message. */
export type DisplayValue = number | string | boolean | null | DisplayError;
export interface DisplayError {
  /** As the cell shows it: `#VALUE!`, `#N/A`, `#SPILL!`, … */
  readonly error: string;
  /** The message behind it (for PHZ functions, the engineer-facing text). */
  readonly message: string;
}

export function isDisplayError(v: unknown): v is DisplayError {
  return typeof v === 'object' && v !== null && 'error' in v && 'message' in v;
}

/** Engine value → display value. */
export function toDisplay(v: CellValue): DisplayValue {
  if (v instanceof DetailedCellError) return { error: v.value, message: v.message ?? '' };
  return v as DisplayValue;
}

/**
 * The engine knows TRUE and FALSE only as functions (`TRUE()`); spreadsheet users
 * write them bare (`=PHZ.COMPLEXPOWER(8000, 0.8, TRUE)`), so both names are defined.
 */
const LOGICAL_NAMES = [
  { name: 'TRUE', expression: '=TRUE()' },
  { name: 'FALSE', expression: '=FALSE()' },
];

export interface EngineOptions {
  readonly registry?: Registry;
  /** Initial sheets by name, rows of raw contents (numbers, text, `=formulas`). */
  readonly sheets?: Record<string, RawCellContent[][]>;
}

/**
 * A workbook engine. Every change goes through `change`, which lets the engine settle
 * spill areas whose size followed a change of inputs.
 */
export class PhzEngine {
  readonly hf: HyperFormula;

  constructor(options: EngineOptions = {}) {
    registerRegistry(options.registry ?? defaultRegistry);
    // Excel keeps 15 significant figures of a number; the engine's default hands out 11
    // (precisionRounding 10), which would make PHZ.REAL(…, 15) look like 11 figures.
    const config = { licenseKey: LICENSE_KEY, undoLimit: 0, useArrayArithmetic: true, precisionRounding: 14 };
    const sheets = options.sheets ?? {};
    this.hf =
      Object.keys(sheets).length > 0
        ? HyperFormula.buildFromSheets(sheets, config, LOGICAL_NAMES)
        : HyperFormula.buildEmpty(config, LOGICAL_NAMES);
    this.settle();
  }

  /**
   * Re-enters formulas whose result no longer fits the area the engine reserved for it
   * (the engine fixes a spill size when a formula is entered). Bounded, because a
   * re-entered formula can change the inputs of another.
   */
  settle(): void {
    this.reviveBlockedSpills();
    for (let round = 0; round < 8; round++) {
      const pending = takePendingResizes(this.hf);
      if (pending.length === 0) return;
      this.reenter(pending);
    }
    takePendingResizes(this.hf);
  }

  private reenter(addresses: readonly SimpleCellAddress[]): void {
    this.hf.batch(() => {
      for (const address of addresses) {
        const formula = this.hf.getCellFormula(address);
        if (formula !== undefined) this.hf.setCellContents(address, [[formula]]);
      }
    });
  }

  /**
   * A spill blocked by a cell shows #SPILL!, and the engine does not look again when
   * that cell is emptied; so every change re-enters the blocked PHZ formulas whose
   * area has become free.
   */
  private reviveBlockedSpills(): void {
    const blocked = spillingFormulas(this.hf).filter((at) => {
      if (!this.hf.doesSheetExist(this.hf.getSheetName(at.sheet) ?? '')) return false;
      const v = this.hf.getCellValue(at);
      return v instanceof DetailedCellError && v.value === '#SPILL!' && this.hf.getCellFormula(at) !== undefined;
    });
    if (blocked.length > 0) this.reenter(blocked);
  }

  /** Runs `fn` as one batch of engine operations, then settles spills. */
  change<T>(fn: (hf: HyperFormula) => T): T {
    let result!: T;
    this.hf.batch(() => {
      result = fn(this.hf);
    });
    this.settle();
    return result;
  }

  /** Sets a block of raw contents with its top-left at `at`. */
  setContents(at: SimpleCellAddress, contents: RawCellContent[][]): void {
    this.change((hf) => hf.setCellContents(at, contents));
  }

  /** What the cell shows. */
  display(at: SimpleCellAddress): DisplayValue {
    return toDisplay(this.hf.getCellValue(at));
  }

  /**
   * What a person typed into the cell: the formula, or the raw value; `null` for an
   * empty cell and for cells that only show part of a spilled result.
   */
  rawContent(at: SimpleCellAddress): RawCellContent {
    const formula = this.hf.getCellFormula(at);
    if (formula !== undefined) return formula;
    if (this.hf.isCellPartOfArray(at)) return null;
    const raw = this.hf.getCellSerialized(at);
    return raw === undefined ? null : raw;
  }

  /** The engine's vertex for a cell (internal; used only for spill geometry). */
  private vertexAt(at: SimpleCellAddress): { width?: number; height?: number; cellAddress?: SimpleCellAddress } | undefined {
    const graph = (this.hf as unknown as { dependencyGraph: { getCell(a: SimpleCellAddress): unknown } }).dependencyGraph;
    return graph.getCell(at) as { width?: number; height?: number; cellAddress?: SimpleCellAddress } | undefined;
  }

  /** The block a formula at `at` fills (1×1 for a scalar result). */
  spillSize(at: SimpleCellAddress): { width: number; height: number } {
    if (this.hf.getCellFormula(at) === undefined || !this.hf.isCellPartOfArray(at)) return { width: 1, height: 1 };
    const vertex = this.vertexAt(at);
    return { width: vertex?.width ?? 1, height: vertex?.height ?? 1 };
  }

  /**
   * The anchor of the spill `at` belongs to, when `at` shows part of another cell's
   * result; `undefined` otherwise.
   */
  spillAnchor(at: SimpleCellAddress): SimpleCellAddress | undefined {
    if (!this.hf.isCellPartOfArray(at) || this.hf.getCellFormula(at) !== undefined) return undefined;
    const a = this.vertexAt(at)?.cellAddress;
    return a ? { sheet: a.sheet, row: a.row, col: a.col } : undefined;
  }
}

/**
 * Evaluates one formula as a cell of a workbook would show it, spill included.
 *
 * @param formula A formula starting with `=`, e.g. `=PHZ.DIV("230∠-120","10∠30")`.
 * @param sheetData Optional rows of raw contents put at A1 of the same sheet, so the
 *   formula can refer to them (`=PHZ.ADD(A1:A3)`).
 * @returns The cells the formula fills, as rows: values, or `{ error, message }`.
 * @example evaluateFormula('=PHZ.MAG("3+j4")') // [[5]]
 */
export function evaluateFormula(formula: string, sheetData: RawCellContent[][] = [], registry: Registry = defaultRegistry): DisplayValue[][] {
  const engine = new PhzEngine({ registry, sheets: { Sheet1: sheetData.length > 0 ? sheetData : [[]] } });
  const sheet = engine.hf.getSheetId('Sheet1') ?? 0;
  const at = { sheet, row: sheetData.length + 1, col: 0 };
  engine.setContents(at, [[formula]]);
  const { width, height } = engine.spillSize(at);
  const rows: DisplayValue[][] = [];
  for (let r = 0; r < height; r++) {
    const row: DisplayValue[] = [];
    for (let c = 0; c < width; c++) row.push(engine.display({ sheet, row: at.row + r, col: at.col + c }));
    rows.push(row);
  }
  engine.hf.destroy();
  return rows;
}
