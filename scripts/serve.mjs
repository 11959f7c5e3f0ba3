#!/usr/bin/env node
/**
 * `npm start`: builds dist/ (webpack, development mode) and serves it from this small
 * static server, for the preview workbook in a browser and for sideloading the add-in.
 *
 *   node scripts/serve.mjs            build, then serve on PORT (default 3000)
 *   node scripts/serve.mjs --no-build serve the existing dist/
 *
 * HTTPS is used when office-addin-dev-certs certificates exist in
 * ~/.office-addin-dev-certs (localhost.crt, localhost.key); otherwise plain HTTP, which
 * the preview needs no certificate for. Listens on the loopback interface only.
 */
import { spawn } from 'node:child_process';
import { createReadStream, existsSync, readFileSync, statSync } from 'node:fs';
import http from 'node:http';
import https from 'node:https';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const dist = path.join(root, 'dist');
const require = createRequire(import.meta.url);

const args = new Set(process.argv.slice(2));
const port = Number(process.env.PORT ?? 3000);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`PORT must be a whole number from 0 to 65535; got "${process.env.PORT}".`);
  process.exit(2);
}

/** Same policy as the meta tag in src/preview/preview.html (read from the built page when present). */
const FALLBACK_CSP =
  "default-src 'self'; script-src 'self'; worker-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; font-src 'self'; connect-src 'self'; object-src 'none'; base-uri 'self'; form-action 'self'";

const TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.xml': 'application/xml; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
  '.png': 'image/png',
  '.svg': 'image/svg+xml',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
};

function build() {
  return new Promise((resolve) => {
    const cli = require.resolve('webpack-cli/bin/cli.js');
    console.log('Building dist/ (webpack --mode development)…');
    const child = spawn(process.execPath, [cli, '--mode', 'development'], { cwd: root, stdio: 'inherit' });
    const forward = (signal) => child.kill(signal);
    process.once('SIGINT', forward);
    child.on('exit', (code, signal) => {
      process.removeListener('SIGINT', forward);
      if (signal) process.exit(130);
      resolve(code ?? 1);
    });
  });
}

/** The policy in a built page's meta tag, or null when the page or the tag is missing. */
function metaCsp(page) {
  try {
    const html = readFileSync(path.join(dist, page), 'utf8');
    // the production build minifies the page and drops the quotes around http-equiv's value
    const m = /<meta\s+http-equiv=["']?Content-Security-Policy["']?\s+content="([^"]+)"/i.exec(html);
    if (m) return m[1].replace(/\s+/g, ' ').trim();
  } catch {
    // page not built
  }
  return null;
}

/** Each page's policy, sent as a header too: the same as its meta tag. */
function pagePolicies() {
  const policies = { 'preview.html': metaCsp('preview.html') ?? FALLBACK_CSP };
  const pane = metaCsp('taskpane.html');
  if (pane) policies['taskpane.html'] = pane;
  return policies;
}

function certificates() {
  const dir = path.join(os.homedir(), '.office-addin-dev-certs');
  const cert = path.join(dir, 'localhost.crt');
  const key = path.join(dir, 'localhost.key');
  const ca = path.join(dir, 'ca.crt');
  if (!existsSync(cert) || !existsSync(key)) return null;
  try {
    return {
      dir,
      options: { cert: readFileSync(cert), key: readFileSync(key), ...(existsSync(ca) ? { ca: readFileSync(ca) } : {}) },
    };
  } catch (e) {
    console.warn(`Certificates in ${dir} could not be read (${e.message}); serving plain HTTP.`);
    return null;
  }
}

function handler(policies) {
  return (req, res) => {
    const send = (status, text, headers = {}) => {
      res.writeHead(status, { 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store', ...headers });
      res.end(text);
    };
    if (req.method !== 'GET' && req.method !== 'HEAD') return send(405, 'Only GET and HEAD are served.\n', { Allow: 'GET, HEAD' });
    let pathname;
    try {
      pathname = decodeURIComponent(new URL(req.url ?? '/', 'http://localhost').pathname);
    } catch {
      return send(400, 'Bad address.\n');
    }
    if (pathname === '/') return send(302, 'See /preview.html\n', { Location: '/preview.html' });
    const file = path.normalize(path.join(dist, pathname));
    if (file !== dist && !file.startsWith(dist + path.sep)) return send(403, 'Outside dist/.\n');
    let stat;
    try {
      stat = statSync(file);
    } catch {
      return send(404, `Not found: ${pathname}\n`);
    }
    if (!stat.isFile()) return send(404, `Not found: ${pathname}\n`);
    const headers = {
      'Content-Type': TYPES[path.extname(file).toLowerCase()] ?? 'application/octet-stream',
      'Content-Length': stat.size,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
    };
    // The preview and the add-in's page get the same policy as their meta tags.
    const csp = path.dirname(file) === dist ? policies[path.basename(file)] : undefined;
    if (csp) headers['Content-Security-Policy'] = csp;
    res.writeHead(200, headers);
    if (req.method === 'HEAD') return res.end();
    createReadStream(file).pipe(res);
  };
}

function listen(server, host, onPort) {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(onPort, host, () => {
      server.removeListener('error', reject);
      resolve(server.address().port);
    });
  });
}

async function main() {
  if (!args.has('--no-build')) {
    const code = await build();
    if (code !== 0) {
      if (existsSync(path.join(dist, 'preview.html'))) {
        console.warn('\nThe build reported errors (see above); serving what it produced in dist/.\n');
      } else {
        console.error('\nThe build failed (see above) and dist/ has no preview page to serve.');
        process.exit(code);
      }
    }
  }
  if (!existsSync(dist)) {
    console.error('dist/ does not exist: run without --no-build.');
    process.exit(1);
  }

  const certs = certificates();
  const policies = pagePolicies();
  const make = () => (certs ? https.createServer(certs.options, handler(policies)) : http.createServer(handler(policies)));
  const servers = [make()];
  let actualPort;
  try {
    actualPort = await listen(servers[0], '127.0.0.1', port);
  } catch (e) {
    if (e.code === 'EADDRINUSE') {
      console.error(`Port ${port} is already in use. Stop the other server, or choose another port: PORT=3001 npm start`);
    } else {
      console.error(`Could not listen on port ${port}: ${e.message}`);
    }
    process.exit(1);
  }
  // Browsers may try ::1 for "localhost" first; serve it too where the machine has IPv6.
  const v6 = make();
  await listen(v6, '::1', actualPort).then(
    () => servers.push(v6),
    () => undefined,
  );

  const scheme = certs ? 'https' : 'http';
  const base = `${scheme}://localhost:${actualPort}`;
  console.log('');
  console.log(`Starpoint is served from dist/ over ${scheme.toUpperCase()}${certs ? ` (certificates from ${certs.dir})` : ' (no certificate needed)'}.`);
  console.log('');
  console.log(`  Preview workbook:  ${base}/preview.html`);
  console.log(`  Add-in manifest:   ${base}/manifest.xml`);
  console.log('');
  if (!certs) {
    console.log('  To sideload the add-in into Excel you need HTTPS on https://localhost:3000 (the');
    console.log('  manifest points there). Create and trust localhost certificates once with');
    console.log('      npx office-addin-dev-certs install');
    console.log('  then run npm start again; the server finds them and serves HTTPS on the same port.');
  } else if (actualPort !== 3000) {
    console.log('  Note: the manifest points at https://localhost:3000; sideloading needs PORT=3000.');
  }
  console.log('');
  console.log('Press Ctrl-C to stop.');

  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    for (const s of servers) {
      s.close();
      s.closeAllConnections?.();
    }
    console.log('\nServer stopped.');
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
