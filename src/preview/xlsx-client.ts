/**
 * Opening and building .xlsx files for the page: in the file worker (xlsx-worker.ts) when the
 * browser runs one, so reading a 40,000-row file (about a second of ExcelJS's work) leaves the
 * grid usable; in the page itself otherwise (no Worker, or the worker failed to start).
 *
 * The page keeps the workbook: the worker only turns bytes into a document and data into
 * bytes, so nothing typed meanwhile can be lost or put out of order by it.
 */
import { buildXlsx, FileError, readXlsx } from './xlsx';
import type { SaveData } from './xlsx';
import type { WorkbookDocument } from './workbook';

export interface ReadResult {
  readonly doc: WorkbookDocument;
  readonly cells: number;
  readonly skipped: number;
}

/** The work the page asks for. */
export type XlsxWork = { readonly kind: 'read'; readonly data: ArrayBuffer; readonly fileName: string } | { readonly kind: 'build'; readonly data: SaveData };

/** What the page sends the worker. */
export type XlsxRequest = XlsxWork & { readonly id: number };

/** What the worker sends back. */
export type XlsxReply =
  | { readonly id: number; readonly ok: true; readonly kind: 'read'; readonly result: ReadResult }
  | { readonly id: number; readonly ok: true; readonly kind: 'build'; readonly bytes: ArrayBuffer }
  | { readonly id: number; readonly ok: false; readonly fileError: boolean; readonly message: string };

export interface XlsxTasks {
  /** Reads an .xlsx file; rejects with `FileError` (its message says why) when it cannot. */
  read(data: ArrayBuffer, fileName: string): Promise<ReadResult>;
  /** Builds the .xlsx file from what `prepareSave` read. */
  build(data: SaveData): Promise<ArrayBuffer>;
  /** True while the work goes to a worker (false once it runs in the page). */
  readonly inWorker: boolean;
}

/** The work done in the page itself. */
export const inPage: XlsxTasks = {
  read: (data, fileName) => readXlsx(data, fileName),
  build: (data) => buildXlsx(data),
  inWorker: false,
};

/** The worker did not start or stopped: the work goes to the page. */
class WorkerLost extends Error {}

/**
 * The tasks in a worker made by `start` (the page passes one that makes the file worker);
 * without one, or once the worker fails, in the page.
 */
export function xlsxTasks(start: (() => Worker) | undefined): XlsxTasks {
  let worker: Worker | undefined;
  let lost = start === undefined;
  let next = 1;
  const waiting = new Map<number, { resolve: (reply: XlsxReply) => void; reject: (e: Error) => void }>();

  const giveUp = (why: string) => {
    lost = true;
    worker?.terminate();
    worker = undefined;
    for (const w of waiting.values()) w.reject(new WorkerLost(why));
    waiting.clear();
  };

  const ensure = (): Worker | undefined => {
    if (lost || !start) return undefined;
    if (worker) return worker;
    try {
      worker = start();
    } catch (e) {
      console.warn('preview: the file worker could not start; files are read in the page', e);
      giveUp('not started');
      return undefined;
    }
    worker.onmessage = (e: MessageEvent<XlsxReply>) => {
      const w = waiting.get(e.data.id);
      waiting.delete(e.data.id);
      w?.resolve(e.data);
    };
    worker.onerror = (e) => {
      console.warn('preview: the file worker stopped; files are read in the page', e.message);
      e.preventDefault();
      giveUp(e.message);
    };
    worker.onmessageerror = () => giveUp('a message could not be read');
    return worker;
  };

  /** Sends a request to the worker; `undefined` when the work must be done in the page. */
  const send = async (request: XlsxWork): Promise<XlsxReply | undefined> => {
    const w = ensure();
    if (!w) return undefined;
    const id = next++;
    try {
      return await new Promise<XlsxReply>((resolve, reject) => {
        waiting.set(id, { resolve, reject });
        const message: XlsxRequest = { ...request, id };
        w.postMessage(message);
      });
    } catch (e) {
      if (e instanceof WorkerLost) return undefined;
      throw e;
    }
  };

  const failed = (reply: XlsxReply & { ok: false }): Error => (reply.fileError ? new FileError(reply.message) : new Error(reply.message));

  return {
    get inWorker() {
      return !lost;
    },
    async read(data, fileName) {
      // a copy goes to the worker, so the page still has the bytes should the worker fail
      const reply = await send({ kind: 'read', data, fileName });
      if (!reply) return inPage.read(data, fileName);
      if (!reply.ok) throw failed(reply);
      if (reply.kind !== 'read') throw new Error('the file worker answered another request');
      return reply.result;
    },
    async build(data) {
      const reply = await send({ kind: 'build', data });
      if (!reply) return inPage.build(data);
      if (!reply.ok) throw failed(reply);
      if (reply.kind !== 'build') throw new Error('the file worker answered another request');
      return reply.bytes;
    },
  };
}
