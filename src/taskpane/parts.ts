/**
 * The pane's parts beside the function reference (worked sheets, the phasor plot). Each
 * part is one module that mounts into its own tab panel and talks to the workbook only
 * through the WorkbookPort, so the same part runs in Excel and in the preview.
 */
import type { WorkbookPort } from './port';
import { sheetsPart } from './sheets/part';
import { plotPart } from './plot/part';

/** What a mounted part can be told; every member is optional. */
export interface PartHandle {
  /** The part's panel became visible (e.g. start following the selection). */
  show?(): void;
  /** The part's panel was hidden (stop listening to workbook events). */
  hide?(): void;
  /** The pane is going away. */
  dispose?(): void;
}

export interface PanePart {
  /** Stable id, used in element ids and `data-part` (e.g. `sheets`, `plot`). */
  readonly id: string;
  /** The tab's label, e.g. `Worked sheet`. */
  readonly label: string;
  /**
   * Builds the part inside `panel` (mounted the first time its tab is shown). `port` is
   * null outside a workbook: the part then explains what it needs.
   */
  mount(panel: HTMLElement, port: WorkbookPort | null): PartHandle | void;
}

/** The parts, in tab order after the function reference. */
export const paneParts: readonly PanePart[] = [sheetsPart, plotPart];
