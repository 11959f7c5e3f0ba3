/** Starts `scripts/serve.mjs` for a test, on a free port, and stops it again. */
import { execSync, spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import path from 'node:path';

export const repoRoot = path.resolve(__dirname, '../..');

export interface RunningServer {
  readonly process: ChildProcess;
  /** e.g. `http://localhost:41234` */
  readonly origin: string;
  /** Everything the server printed so far. */
  output(): string;
  /** Sends Ctrl-C (SIGINT) and resolves with the exit code. */
  stop(): Promise<number | null>;
}

/**
 * Runs the server with `PORT=0` (the system picks a free port) and waits for the
 * preview address it prints. `build: false` serves the existing dist/.
 */
export function startServer(options: { build?: boolean; env?: NodeJS.ProcessEnv; timeoutMs?: number } = {}): Promise<RunningServer> {
  const args = [path.join(repoRoot, 'scripts/serve.mjs'), ...(options.build === false ? ['--no-build'] : [])];
  const child = spawn(process.execPath, args, {
    cwd: repoRoot,
    env: { ...process.env, ...options.env, PORT: '0' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout!.on('data', (d) => (out += String(d)));
  child.stderr!.on('data', (d) => (out += String(d)));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`server did not start within ${options.timeoutMs ?? 240_000} ms:\n${out}`));
    }, options.timeoutMs ?? 240_000);
    const check = () => {
      const m = /Preview workbook:\s+(https?:\/\/localhost:\d+)\/preview\.html/.exec(out);
      if (m && out.includes('Ctrl-C')) {
        clearTimeout(timer);
        resolve({
          process: child,
          origin: m[1],
          output: () => out,
          stop: () => {
            if (child.exitCode === null) child.kill('SIGINT');
            return exited;
          },
        });
      }
    };
    child.stdout!.on('data', check);
    child.on('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with ${code} before it was ready:\n${out}`));
    });
  });
}

/** Debian's Chromium (installed by apt); playwright's own browser download is never used. */
export function chromiumPath(): string {
  try {
    return execSync('command -v chromium', { shell: '/bin/sh', encoding: 'utf8' }).trim() || '/usr/bin/chromium';
  } catch {
    return '/usr/bin/chromium';
  }
}

export const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking'];
