/**
 * Keeps the preview workbook in the browser, so a reload, a crash or closing the tab loses
 * nothing typed.
 *
 * Two stores, because they fail differently:
 * - the whole workbook (`WorkbookDocument`) in IndexedDB, written shortly after the last
 *   change (debounced) and when the page is hidden. IndexedDB holds large workbooks but
 *   writes asynchronously: a page closed right after an edit may not finish the write.
 * - a journal in localStorage of the cell blocks written since that copy (typing, small
 *   pastes, clears, undo). localStorage writes at once, so an edit is kept the moment it
 *   is made; it holds little, so a large block makes the workbook copy be written at once
 *   instead. On restore the journal is replayed over the copy.
 */
import type { RawCellContent } from 'hyperformula';
import { createStore, get, set } from 'idb-keyval';
import type { UseStore } from 'idb-keyval';
import type { Workbook, WorkbookDocument } from './workbook';

/** Where the whole workbook goes (IndexedDB in the page; a map in tests). */
export interface DocumentStore {
  load(): Promise<KeptCopy | undefined>;
  save(copy: KeptCopy): Promise<void>;
}

/** The whole workbook as kept, with the journal position it includes. */
export interface KeptCopy {
  readonly doc: WorkbookDocument;
  /** The journal entries up to this number are in `doc`. */
  readonly seq: number;
  /** When it was written (ms since 1970). */
  readonly savedAt: number;
}

/** One block of cells written, in the journal. */
export interface JournalEntry {
  readonly seq: number;
  readonly sheet: string;
  readonly top: number;
  readonly left: number;
  readonly rows: RawCellContent[][];
}

/** The part of `Storage` (localStorage) the journal uses. */
export type JournalStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

const JOURNAL_KEY = 'starpoint-preview-journal';
/** Cells one journal entry may hold; a larger block gets the whole workbook written at once. */
export const JOURNAL_BLOCK_CELLS = 5_000;
/** Characters the journal may hold in all (localStorage keeps about 5 million per site). */
export const JOURNAL_CHARS = 1_000_000;
/** Wait before writing the workbook after a change too large for the journal (ms). */
const BIG_CHANGE_DELAY_MS = 150;

export function indexedDbStore(): DocumentStore {
  let store: UseStore | undefined;
  const open = () => (store ??= createStore('starpoint-preview', 'workbook'));
  return {
    load: () => get<KeptCopy>('workbook', open()),
    save: (copy) => set('workbook', copy, open()),
  };
}

function isDocument(v: unknown): v is WorkbookDocument {
  const d = v as WorkbookDocument | undefined;
  return d?.format === 'starpoint-preview-workbook' && d.version === 1 && Array.isArray(d.sheets) && d.sheets.length > 0;
}

export interface KeeperOptions {
  readonly store: DocumentStore;
  readonly journal?: JournalStorage;
  /** Quiet time after the last change before the workbook is written (ms). */
  readonly delayMs?: number;
  /** Called when writing fails (the message says what to do). */
  readonly onProblem?: (why: string) => void;
}

export class Keeper {
  private seq = 0;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private urgent = false;
  private writing: Promise<void> = Promise.resolve();
  private journalChars = 0;
  private readonly delayMs: number;
  private problem = false;
  /** Something changed since the copy last written (true until a copy is known to hold the workbook). */
  private changed = true;

  constructor(
    private readonly workbook: Workbook,
    private readonly options: KeeperOptions,
  ) {
    this.delayMs = options.delayMs ?? 400;
  }

  /**
   * Loads the kept workbook (when there is one) and replays the journal over it (or over
   * the workbook `loadBase` loads, the demo, when only a journal was kept). Returns what was
   * found. Throws when a copy is kept but cannot be read; the caller says so and leaves it.
   */
  async restore(loadBase: () => void): Promise<{ copy: KeptCopy | undefined; replayed: number } | undefined> {
    const copy = await this.options.store.load();
    const entries = this.readJournal();
    if (copy === undefined && entries.length === 0) return undefined;
    if (copy !== undefined && !isDocument(copy.doc)) throw new Error('the kept copy is not a workbook of this preview');
    if (copy !== undefined) this.workbook.load(copy.doc);
    else loadBase();
    const after = copy?.seq ?? 0;
    let replayed = 0;
    for (const e of entries) {
      if (e.seq <= after || !this.workbook.sheetNames().includes(e.sheet)) continue;
      this.workbook.setBlock(e.sheet, e.top, e.left, e.rows, 'Restore');
      replayed++;
    }
    // the copy and the journal hold all of it: leaving the page need not write it again
    this.changed = copy === undefined;
    this.workbook.clearHistory();
    this.seq = Math.max(after, ...entries.map((e) => e.seq));
    return { copy, replayed };
  }

  /** Starts following the workbook: every change is journalled or scheduled. */
  start(): void {
    this.workbook.onCells((sheet, top, left, rows) => this.journalBlock(sheet, top, left, rows));
    this.workbook.onChange(() => {
      this.changed = true;
      this.schedule(this.delayMs);
    });
  }

  /**
   * Writes the whole workbook when something changed since the last copy (the page is
   * hidden or left: a reload then waits for no copy that is already kept).
   */
  flushIfChanged(): Promise<void> {
    return this.changed ? this.flush() : this.writing;
  }

  /** Writes the whole workbook now (page hidden, or a large change). */
  flush(): Promise<void> {
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = undefined;
    this.urgent = false;
    const seq = this.seq;
    let doc: WorkbookDocument;
    try {
      doc = this.workbook.toDocument();
    } catch (e) {
      this.report(e);
      return this.writing;
    }
    this.changed = false;
    this.writing = this.writing
      .then(() => this.options.store.save({ doc, seq, savedAt: Date.now() }))
      .then(() => {
        this.trimJournal(seq);
        this.problem = false;
      })
      .catch((e: unknown) => {
        this.changed = true;
        this.report(e);
      });
    return this.writing;
  }

  /**
   * Writes the copy after `ms`. Quiet-time writes move with each change (debounce); a write
   * asked for soon (`urgent`: a change too large for the journal) is not put off by them.
   */
  private schedule(ms: number, urgent = false): void {
    if (this.timer !== undefined) {
      if (this.urgent && !urgent) return;
      clearTimeout(this.timer);
    }
    this.urgent = urgent;
    this.timer = setTimeout(() => void this.flush(), ms);
  }

  private report(e: unknown): void {
    if (this.problem) return;
    this.problem = true;
    this.options.onProblem?.(e instanceof Error ? e.message : String(e));
  }

  private journalBlock(sheet: string, top: number, left: number, rows: RawCellContent[][]): void {
    this.seq++;
    const journal = this.options.journal;
    const cells = rows.length * (rows[0]?.length ?? 0);
    if (!journal || cells > JOURNAL_BLOCK_CELLS) {
      // soon, but after the grid has shown the change (the page-hide handler writes it sooner)
      this.schedule(BIG_CHANGE_DELAY_MS, true);
      return;
    }
    const entry: JournalEntry = { seq: this.seq, sheet, top, left, rows };
    const line = JSON.stringify(entry);
    if (this.journalChars + line.length > JOURNAL_CHARS) {
      this.schedule(0, true);
      return;
    }
    try {
      const before = journal.getItem(JOURNAL_KEY) ?? '';
      const next = before === '' ? line : `${before}\n${line}`;
      journal.setItem(JOURNAL_KEY, next);
      this.journalChars = next.length;
    } catch {
      // full or refused: the whole workbook goes to IndexedDB at once instead
      this.schedule(0, true);
    }
  }

  private readJournal(): JournalEntry[] {
    const text = this.options.journal?.getItem(JOURNAL_KEY) ?? '';
    const out: JournalEntry[] = [];
    for (const line of text.split('\n')) {
      if (line.trim() === '') continue;
      try {
        const e = JSON.parse(line) as JournalEntry;
        if (typeof e.seq === 'number' && typeof e.sheet === 'string' && Array.isArray(e.rows)) out.push(e);
      } catch {
        // a line cut short by a full store: the lines before it still count
      }
    }
    this.journalChars = text.length;
    return out;
  }

  /** Drops the journal entries the kept copy now includes. */
  private trimJournal(seq: number): void {
    const journal = this.options.journal;
    if (!journal) return;
    const rest = this.readJournal().filter((e) => e.seq > seq);
    try {
      if (rest.length === 0) journal.removeItem(JOURNAL_KEY);
      else journal.setItem(JOURNAL_KEY, rest.map((e) => JSON.stringify(e)).join('\n'));
      this.journalChars = rest.reduce((n, e) => n + JSON.stringify(e).length + 1, 0);
    } catch {
      // left as it was: replaying entries the copy already holds writes the same cells again
    }
  }
}
