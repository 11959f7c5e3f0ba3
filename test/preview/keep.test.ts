/**
 * Keeping the workbook in the browser (src/preview/keep.ts), with in-memory stand-ins for
 * IndexedDB and localStorage: the whole workbook comes back (cells, roles, widths, scoped
 * names, charts); typing is journalled at once and replayed over the last copy, so an edit
 * made just before the page closed is not lost; the journal is trimmed once a copy holds it;
 * a large block is not journalled but gets the copy written; an unreadable copy is refused.
 */
import { describe, expect, it } from 'vitest';
import { Keeper, JOURNAL_BLOCK_CELLS } from '../../src/preview/keep';
import type { DocumentStore, JournalStorage, KeptCopy } from '../../src/preview/keep';
import { PhzEngine } from '../../src/preview/engine';
import { Workbook } from '../../src/preview/workbook';
import type { ChartPlan } from '../../src/taskpane/plot/chart-plan';

function memoryStore(): DocumentStore & { copy?: KeptCopy; saves: number } {
  const store = {
    copy: undefined as KeptCopy | undefined,
    saves: 0,
    load: async () => (store.copy === undefined ? undefined : structuredClone(store.copy)),
    save: async (c: KeptCopy) => {
      store.copy = structuredClone(c);
      store.saves++;
    },
  };
  return store;
}

function memoryJournal(): JournalStorage & { items: Map<string, string> } {
  const items = new Map<string, string>();
  return { items, getItem: (k) => items.get(k) ?? null, setItem: (k, v) => void items.set(k, v), removeItem: (k) => void items.delete(k) };
}

function book(): Workbook {
  const wb = new Workbook(new PhzEngine({ sheets: { Board: [['Supply', '230∠0'], ['Load', '8+j6'], ['Current', '=PHZ.DIV(B1,B2)']] } }));
  wb.setStyle('Board', 0, 1, 'input');
  wb.addSheetWith({ name: 'Worked', rows: [['3+j4', '=PHZ.MAG(Z_a)']], names: [{ name: 'Z_a', row: 0, col: 0 }], columnWidths: [14, 22], styles: [{ row: 0, col: 0, style: 'input' }] });
  wb.addChart({ name: 'Phasor chart 1', sheet: 'Board', at: { row: 4, col: 3 }, plan: { title: 'Currents' } as unknown as ChartPlan });
  return wb;
}

const tick = () => new Promise((r) => setTimeout(r, 5));

describe('keeping the workbook in the browser', () => {
  it('brings the whole workbook back: cells, results, roles, widths, scoped names, charts', async () => {
    const store = memoryStore();
    const first = book();
    await new Keeper(first, { store }).flush();
    const second = new Workbook(new PhzEngine());
    const found = await new Keeper(second, { store }).restore(() => undefined);
    expect(found?.copy).toBeDefined();
    expect(second.sheetNames()).toEqual(['Board', 'Worked']);
    expect(second.engine.display({ sheet: second.sheetId('Board'), row: 2, col: 1 })).toBe(first.engine.display({ sheet: first.sheetId('Board'), row: 2, col: 1 }));
    expect(second.styleOf('Board', 0, 1)).toBe('input');
    expect(second.columnWidths('Worked')).toEqual([14, 22]);
    expect(second.sheetNamesDefined('Worked')).toEqual(['Z_a']);
    expect(second.engine.display({ sheet: second.sheetId('Worked'), row: 0, col: 1 })).toBe(5);
    expect(second.charts.map((c) => c.name)).toEqual(['Phasor chart 1']);
    expect(second.canUndo()).toBe(false);
  });

  it('keeps a cell typed just before the page closed (journalled at once, before any copy is written)', async () => {
    const store = memoryStore();
    const journal = memoryJournal();
    const wb = book();
    const keeper = new Keeper(wb, { store, journal, delayMs: 60_000 });
    await keeper.flush();
    keeper.start();
    wb.setCell('Board', 1, 1, '4+j3');
    wb.setCell('Board', 5, 0, 'typed last');
    expect(store.copy?.doc.sheets[0].rows[1][1]).toBe('8+j6'); // the copy is not written yet
    const after = new Workbook(new PhzEngine());
    const found = await new Keeper(after, { store, journal }).restore(() => undefined);
    expect(found?.replayed).toBe(2);
    expect(after.raw('Board', 1, 1)).toBe('4+j3');
    expect(after.raw('Board', 5, 0)).toBe('typed last');
    expect(after.engine.display({ sheet: after.sheetId('Board'), row: 2, col: 1 })).toBe(String(new PhzEngine({ sheets: { S: [['=PHZ.DIV("230∠0","4+j3")']] } }).display({ sheet: 0, row: 0, col: 0 })));
  });

  it('replays the journal over the demo when no copy was written yet', async () => {
    const journal = memoryJournal();
    const wb = book();
    const keeper = new Keeper(wb, { store: memoryStore(), journal, delayMs: 60_000 });
    keeper.start();
    wb.setCell('Board', 6, 0, 'first edit');
    const after = new Workbook(new PhzEngine());
    await new Keeper(after, { store: memoryStore(), journal }).restore(() => after.load(book().toDocument()));
    expect(after.raw('Board', 6, 0)).toBe('first edit');
  });

  it('empties the journal once a copy holds what it recorded', async () => {
    const store = memoryStore();
    const journal = memoryJournal();
    const wb = book();
    const keeper = new Keeper(wb, { store, journal, delayMs: 60_000 });
    keeper.start();
    wb.setCell('Board', 6, 0, 'x');
    expect(journal.items.size).toBe(1);
    await keeper.flush();
    expect(journal.items.size).toBe(0);
    expect(store.copy?.doc.sheets[0].rows[6][0]).toBe('x');
  });

  it('writes the copy for a block too large for the journal instead of journalling it', async () => {
    const store = memoryStore();
    const journal = memoryJournal();
    const wb = book();
    const keeper = new Keeper(wb, { store, journal, delayMs: 60_000 });
    keeper.start();
    const rows = Array.from({ length: JOURNAL_BLOCK_CELLS + 1 }, (_, i) => [i]);
    wb.setBlock('Board', 10, 4, rows, 'Paste');
    expect(journal.items.size).toBe(0);
    await new Promise((r) => setTimeout(r, 300));
    await tick();
    expect(store.saves).toBe(1);
    expect(store.copy?.doc.sheets[0].rows[10 + JOURNAL_BLOCK_CELLS][4]).toBe(JOURNAL_BLOCK_CELLS);
  });

  it('writes the copy on leaving the page only when something changed since the last one', async () => {
    const store = memoryStore();
    const journal = memoryJournal();
    await new Keeper(book(), { store, journal }).flush();
    const wb = new Workbook(new PhzEngine());
    const keeper = new Keeper(wb, { store, journal, delayMs: 60_000 });
    await keeper.restore(() => undefined);
    keeper.start();
    const saves = store.saves;
    await keeper.flushIfChanged();
    expect(store.saves, 'nothing changed since the copy was restored').toBe(saves);
    wb.setCell('Board', 7, 0, 'changed');
    await keeper.flushIfChanged();
    expect(store.saves).toBe(saves + 1);
    expect(store.copy?.doc.sheets[0].rows[7][0]).toBe('changed');
    await keeper.flushIfChanged();
    expect(store.saves, 'the copy holds the change').toBe(saves + 1);
    // a fresh workbook (the demo, nothing kept yet) is written on leaving
    const fresh = memoryStore();
    await new Keeper(book(), { store: fresh }).flushIfChanged();
    expect(fresh.saves).toBe(1);
  });

  it('refuses a kept copy that is not a workbook of the preview, and says why', async () => {
    const store = memoryStore();
    store.copy = { doc: { format: 'something else' } as never, seq: 0, savedAt: 0 };
    await expect(new Keeper(new Workbook(new PhzEngine()), { store }).restore(() => undefined)).rejects.toThrow(/not a workbook of this preview/);
  });

  it('reports a store that fails, once, with its reason', async () => {
    const problems: string[] = [];
    const store: DocumentStore = { load: async () => undefined, save: async () => Promise.reject(new Error('QuotaExceededError')) };
    const keeper = new Keeper(book(), { store, onProblem: (w) => problems.push(w) });
    await keeper.flush();
    await keeper.flush();
    expect(problems).toEqual(['QuotaExceededError']);
  });
});
