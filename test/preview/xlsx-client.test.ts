/**
 * The page's side of the file worker (src/preview/xlsx-client.ts), with a stand-in worker the
 * test answers by hand: replies reach the request they answer whatever their order; a file
 * the worker cannot read rejects with the worker's message as a FileError; a worker that does
 * not start, stops or cannot read a message hands the work to the page, which then does it
 * (the real ExcelJS), and nothing waits for ever. The real worker runs in the browser test.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { PhzEngine } from '../../src/preview/engine';
import { Workbook } from '../../src/preview/workbook';
import { FileError, prepareSave } from '../../src/preview/xlsx';
import { xlsxTasks } from '../../src/preview/xlsx-client';
import type { XlsxReply, XlsxRequest } from '../../src/preview/xlsx-client';

/** A stand-in for the file worker: keeps what it was sent; the test answers or fails it. */
class FakeWorker {
  sent: XlsxRequest[] = [];
  terminated = false;
  onmessage: ((e: MessageEvent<XlsxReply>) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  onmessageerror: (() => void) | null = null;
  postMessage(m: XlsxRequest): void {
    this.sent.push(m);
  }
  terminate(): void {
    this.terminated = true;
  }
  reply(r: XlsxReply): void {
    this.onmessage?.({ data: r } as MessageEvent<XlsxReply>);
  }
  fail(message: string): void {
    this.onerror?.({ message, preventDefault: () => undefined } as unknown as ErrorEvent);
  }
}

function saveData() {
  const wb = new Workbook(new PhzEngine({ sheets: { S: [['3+j4', '=PHZ.MAG(A1)']] } }));
  return prepareSave({
    doc: wb.toDocument(),
    valueAt: (sheet, row, col) => wb.engine.display({ sheet: wb.sheetId(sheet), row, col }),
    spillAt: (sheet, row, col) => wb.engine.spillSize({ sheet: wb.sheetId(sheet), row, col }),
    widthsPx: (_, n) => new Array<number>(n).fill(84),
  });
}

const tick = () => new Promise((r) => setTimeout(r, 0));

afterEach(() => {
  vi.restoreAllMocks();
});

describe('the file worker, from the page', () => {
  it('gives each reply to the request it answers, in whatever order they come', async () => {
    const fake = new FakeWorker();
    const tasks = xlsxTasks(() => fake as unknown as Worker);
    const first = tasks.build(saveData());
    const second = tasks.read(new ArrayBuffer(8), 'b.xlsx');
    await tick();
    expect(fake.sent.map((m) => m.kind)).toEqual(['build', 'read']);
    const doc = { format: 'starpoint-preview-workbook', version: 1, sheets: [], names: [], charts: [] } as const;
    fake.reply({ id: fake.sent[1].id, ok: true, kind: 'read', result: { doc, cells: 7, skipped: 0 } });
    const bytes = new ArrayBuffer(3);
    fake.reply({ id: fake.sent[0].id, ok: true, kind: 'build', bytes });
    expect((await second).cells).toBe(7);
    expect(await first).toBe(bytes);
    expect(tasks.inWorker).toBe(true);
  });

  it('rejects with the worker’s own message, as a FileError when the file is at fault', async () => {
    const fake = new FakeWorker();
    const tasks = xlsxTasks(() => fake as unknown as Worker);
    const read = tasks.read(new ArrayBuffer(8), 'bad.xlsx');
    await tick();
    fake.reply({ id: fake.sent[0].id, ok: false, fileError: true, message: 'bad.xlsx is not an .xlsx workbook' });
    await expect(read).rejects.toBeInstanceOf(FileError);
    await expect(read).rejects.toThrow('bad.xlsx is not an .xlsx workbook');
  });

  it('does the work in the page when the worker stops, and keeps to the page afterwards', async () => {
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => undefined);
    const fake = new FakeWorker();
    let started = 0;
    const tasks = xlsxTasks(() => {
      started++;
      return fake as unknown as Worker;
    });
    const bytes = tasks.build(saveData());
    await tick();
    fake.fail('worker script could not load');
    // ExcelJS in the page built the file: a zip package
    const file = new Uint8Array(await bytes);
    expect([...file.slice(0, 2)]).toEqual([0x50, 0x4b]);
    expect(fake.terminated).toBe(true);
    expect(tasks.inWorker).toBe(false);
    await expect(tasks.read(new TextEncoder().encode('not a zip').buffer as ArrayBuffer, 'x.xlsx')).rejects.toBeInstanceOf(FileError);
    expect(started).toBe(1);
    expect(warn).toHaveBeenCalledWith(expect.stringContaining('the file worker stopped'), 'worker script could not load');
  });

  it('does the work in the page when the worker cannot start, or none is given', async () => {
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => undefined);
    const cannot = xlsxTasks(() => {
      throw new Error('blocked by the page policy');
    });
    expect([...new Uint8Array(await cannot.build(saveData())).slice(0, 2)]).toEqual([0x50, 0x4b]);
    expect(cannot.inWorker).toBe(false);
    expect(warn).toHaveBeenCalledWith(expect.stringContaining('could not start'), expect.any(Error));
    const none = xlsxTasks(undefined);
    expect(none.inWorker).toBe(false);
    expect([...new Uint8Array(await none.build(saveData())).slice(0, 2)]).toEqual([0x50, 0x4b]);
  });
});
