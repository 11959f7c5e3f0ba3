/**
 * Excel's own custom-functions runtime, driven the way Excel drives it.
 *
 * Loads the shipped `@microsoft/office-js/dist/custom-functions-runtime.debug.js` into a
 * node `vm` context with a minimal window stub and a fake native bridge
 * (`_richApiNativeBridge`, which the runtime's HostBridge picks up at load). Host messages
 * go in through the bridge as Excel sends them (type 3, `{entries: [...]}` with metadata
 * entries of messageType 1002 and invocation entries of messageType 1000); the runtime
 * dispatches them to the associated functions, appending its InvocationContext to the
 * parameter values, and sends the results back to the host as a `SetInvocationArrayResults`
 * request, which this harness reads off the bridge and answers.
 *
 * The internal names used here (message types, the result array layout
 * `[invocationId, succeeded, value, errorCode?, outboundData?]`, the error codes) are those of
 * the office-js version pinned in package.json (@microsoft/office-js 1.1.110); a test pins
 * that version so a change of runtime is noticed rather than silently misread.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import vm from 'node:vm';

/** The runtime's result codes for a failed invocation (custom-functions-runtime.debug.js). */
export const RUNTIME_ERROR = {
  /** #N/A (ErrorCode.notAvailable). */
  notAvailable: 1,
  /** An exception that was not a CustomFunctions.Error: Excel shows #VALUE! without our message. */
  exceptionThrown: 2,
  /** #VALUE! (ErrorCode.invalidValue). */
  invalidValue: 7,
} as const;

export interface HostCall {
  readonly functionName: string;
  /** One value per declared parameter, `null` for one left out; a repeating parameter as one array. */
  readonly parameterValues: unknown[];
  readonly address?: string;
  /**
   * Invocation flags as Excel sends them; 8 marks rich (data-type) parameter values, which the
   * runtime unwraps from `{value: "<json>"}` (`_transferCustomFunctionRichData`). Left out, the
   * runtime reads the function's options from the metadata entries instead.
   */
  readonly flags?: number;
}

export type HostOutcome =
  | { readonly ok: true; readonly value: unknown }
  | { readonly ok: false; readonly errorCode: number; readonly message: string };

/** What functions.json says of one function (the fields the runtime and this harness read). */
export interface MetaFunction {
  readonly id: string;
  readonly name: string;
  readonly parameters: ReadonlyArray<{ name: string; dimensionality?: string; repeating?: boolean; optional?: boolean }>;
  readonly options?: { stream?: boolean; cancelable?: boolean };
}

const officeRequire = createRequire(__filename);

/** The folder of the pinned office-js package and its version. */
export function officeJsPackage(): { dir: string; version: string } {
  const pkgPath = officeRequire.resolve('@microsoft/office-js/package.json');
  return { dir: dirname(pkgPath), version: JSON.parse(readFileSync(pkgPath, 'utf8')).version };
}

interface Bridge {
  sendMessageToHost(text: string): void;
  onMessageFromHost?: (text: string) => void;
}

interface SentMessage {
  id: number;
  type: number;
  message: { body?: { Actions?: Array<{ Name?: string; ArgumentInfo?: { Arguments?: unknown[] } }> } };
}

/** A fresh runtime in its own context. */
export class ExcelRuntime {
  private readonly bridge: Bridge;
  private readonly context: vm.Context;
  private readonly results = new Map<number, HostOutcome>();
  private readonly waiters: Array<() => void> = [];
  private nextInvocationId = 1;

  private constructor() {
    this.bridge = { sendMessageToHost: (text) => this.fromRuntime(JSON.parse(text) as SentMessage) };
    const runtimeUrl = 'https://localhost:3000/office-js/custom-functions-runtime.debug.js';
    const head = { appendChild() {} };
    const document = {
      readyState: 'complete',
      cookie: '',
      head,
      body: null,
      addEventListener() {},
      getElementById: () => null,
      // The loader finds its own <script> to learn its base path, and adds script tags to <head>.
      getElementsByTagName: (tag: string) =>
        tag === 'script' ? [{ src: runtimeUrl, getAttribute: () => null }] : tag === 'head' ? [head] : [],
      createElement: () => ({ style: {}, setAttribute() {}, appendChild() {}, addEventListener() {} }),
    };
    const sandbox: Record<string, unknown> = {
      console: { log() {}, info() {}, debug() {}, warn: console.warn, error: console.error },
      setTimeout,
      clearTimeout,
      setInterval,
      clearInterval,
      _richApiNativeBridge: this.bridge,
      navigator: { userAgent: 'node' },
      history: { replaceState() {}, pushState() {} },
      location: { href: 'https://localhost:3000/taskpane.html', search: '', hash: '', protocol: 'https:', host: 'localhost:3000', hostname: 'localhost' },
      document,
    };
    sandbox.window = sandbox;
    sandbox.self = sandbox;
    this.context = vm.createContext(sandbox);
    const file = join(officeJsPackage().dir, 'dist', 'custom-functions-runtime.debug.js');
    vm.runInContext(readFileSync(file, 'utf8'), this.context, { filename: file });
    if (typeof this.bridge.onMessageFromHost !== 'function') throw new Error('the runtime did not take up the host bridge');
  }

  static load(): ExcelRuntime {
    return new ExcelRuntime();
  }

  /** The runtime's `CustomFunctions` global (associate, Error, ErrorCode). */
  get CustomFunctions(): typeof CustomFunctions {
    return (this.context as { CustomFunctions: typeof CustomFunctions }).CustomFunctions;
  }

  /** Runs a script (e.g. the built add-in bundle) in the runtime's page, as a second <script>. */
  runScript(code: string, filename: string): void {
    vm.runInContext(code, this.context, { filename });
  }

  /** Sends the metadata entries Excel sends before the first invocation. */
  sendMetadata(functions: readonly MetaFunction[]): void {
    this.send(
      functions.map((f) => ({
        messageCategory: 1,
        messageType: 1002,
        message: JSON.stringify({ functionName: f.id, isStream: Boolean(f.options?.stream), isCancelable: Boolean(f.options?.cancelable) }),
      })),
    );
  }

  /** Sends the calls as one host message and waits for every result. */
  async invoke(calls: readonly HostCall[], timeoutMs = 20_000): Promise<HostOutcome[]> {
    const ids = calls.map(() => this.nextInvocationId++);
    this.send(
      calls.map((c, i) => ({
        messageCategory: 1,
        messageType: 1000,
        message: JSON.stringify({
          invocationId: ids[i],
          functionName: c.functionName,
          parameterValues: c.parameterValues,
          address: c.address ?? 'Sheet1!A1',
          ...(c.flags === undefined ? {} : { flags: c.flags }),
        }),
      })),
    );
    const deadline = Date.now() + timeoutMs;
    while (!ids.every((id) => this.results.has(id))) {
      if (Date.now() > deadline) throw new Error(`the runtime gave no result for ${ids.filter((id) => !this.results.has(id)).length} of ${ids.length} calls`);
      await new Promise<void>((resolve) => {
        this.waiters.push(resolve);
        setTimeout(resolve, 50);
      });
    }
    return ids.map((id) => this.results.get(id)!);
  }

  private send(entries: unknown[]): void {
    this.bridge.onMessageFromHost!(JSON.stringify({ type: 3, message: { entries } }));
  }

  /** A request from the runtime: record invocation results, then answer it as the host does. */
  private fromRuntime(msg: SentMessage): void {
    for (const action of msg.message?.body?.Actions ?? []) {
      if (action.Name !== 'SetInvocationArrayResults') continue;
      const rows = (action.ArgumentInfo?.Arguments?.[0] ?? []) as unknown[][];
      for (const [id, succeeded, value, errorCode] of rows) {
        this.results.set(
          id as number,
          succeeded ? { ok: true, value } : { ok: false, errorCode: errorCode as number, message: String(value ?? '') },
        );
      }
    }
    if (typeof msg.id === 'number') {
      // Answer the request (success, no action results) so the runtime's context.sync() settles.
      const reply = { id: msg.id, type: 2, message: { statusCode: 200, headers: {}, body: { Results: [] } } };
      setTimeout(() => this.bridge.onMessageFromHost!(JSON.stringify(reply)), 0);
    }
    for (const w of this.waiters.splice(0)) w();
  }
}
