/**
 * The dev server `npm start` runs: Ctrl-C stops it cleanly, PORT picks the port, it
 * serves only dist/, and it switches to HTTPS when office-addin-dev-certs
 * certificates are present (made here with openssl in a throwaway home folder).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import https from 'node:https';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { repoRoot, startServer } from './server';

const built = () => existsSync(path.join(repoRoot, 'dist/preview.html'));

function hasOpenssl(): boolean {
  try {
    execFileSync('openssl', ['version'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

describe('dev server', () => {
  const homes: string[] = [];
  afterAll(() => {
    for (const h of homes) rmSync(h, { recursive: true, force: true });
  });

  it('serves plain HTTP without certificates, says how to make them, and stops on Ctrl-C', async () => {
    const home = mkdtempSync(path.join(os.tmpdir(), 'starpoint-home-'));
    homes.push(home);
    const server = await startServer({ build: !built(), env: { HOME: home } });
    expect(server.origin).toMatch(/^http:\/\/localhost:\d+$/);
    expect(server.output()).toContain(`${server.origin}/manifest.xml`);
    expect(server.output()).toContain('npx office-addin-dev-certs install');

    const page = await fetch(`${server.origin}/preview.html`);
    expect(page.status).toBe(200);
    expect(page.headers.get('content-security-policy')).toContain("default-src 'self'");
    expect((await fetch(`${server.origin}/manifest.xml`)).status).toBe(200);
    const root = await fetch(`${server.origin}/`, { redirect: 'manual' });
    expect(root.status).toBe(302);
    expect(root.headers.get('location')).toBe('/preview.html');
    expect((await fetch(`${server.origin}/..%2fpackage.json`)).status).toBe(403);
    expect((await fetch(`${server.origin}/no-such-file.js`)).status).toBe(404);

    expect(await server.stop()).toBe(0);
    expect(server.output()).toContain('Server stopped.');
  });

  it.runIf(hasOpenssl())('serves HTTPS when localhost certificates exist in ~/.office-addin-dev-certs', async () => {
    const home = mkdtempSync(path.join(os.tmpdir(), 'starpoint-home-'));
    homes.push(home);
    const dir = path.join(home, '.office-addin-dev-certs');
    mkdirSync(dir);
    execFileSync(
      'openssl',
      ['req', '-x509', '-newkey', 'rsa:2048', '-nodes', '-days', '1', '-subj', '/CN=localhost',
        '-keyout', path.join(dir, 'localhost.key'), '-out', path.join(dir, 'localhost.crt')],
      { stdio: 'ignore' },
    );
    const server = await startServer({ build: !built(), env: { HOME: home } });
    try {
      expect(server.origin).toMatch(/^https:\/\/localhost:\d+$/);
      expect(server.output()).toContain(dir);
      const status = await new Promise<number>((resolve, reject) => {
        https
          .get(`${server.origin}/preview.html`, { rejectUnauthorized: false }, (res) => {
            res.resume();
            resolve(res.statusCode ?? 0);
          })
          .on('error', reject);
      });
      expect(status).toBe(200);
    } finally {
      expect(await server.stop()).toBe(0);
    }
  });
});
