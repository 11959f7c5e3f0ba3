/**
 * The file worker: opens and builds .xlsx files with ExcelJS away from the page, so the
 * grid stays usable while a large file is read or written (xlsx-client.ts sends the work).
 * It holds no workbook: it gets the bytes of a file or the data `prepareSave` read, and
 * sends back the document or the bytes of the file.
 */
import type { XlsxReply, XlsxRequest } from './xlsx-client';
import { buildXlsx, FileError, readXlsx } from './xlsx';

/** The part of the worker's global scope used here (the project's typings are the page's). */
interface WorkerScope {
  onmessage: ((e: MessageEvent<XlsxRequest>) => void) | null;
  postMessage(message: XlsxReply, transfer?: Transferable[]): void;
}
const scope = self as unknown as WorkerScope;

async function handle(request: XlsxRequest): Promise<void> {
  try {
    if (request.kind === 'read') {
      const result = await readXlsx(request.data, request.fileName);
      scope.postMessage({ id: request.id, ok: true, kind: 'read', result });
    } else {
      const bytes = await buildXlsx(request.data);
      scope.postMessage({ id: request.id, ok: true, kind: 'build', bytes }, [bytes]);
    }
  } catch (e) {
    scope.postMessage({ id: request.id, ok: false, fileError: e instanceof FileError, message: e instanceof Error ? e.message : String(e) });
  }
}

scope.onmessage = (e) => void handle(e.data);
