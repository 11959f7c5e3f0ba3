/**
 * Where the add-in's page loads office.js from, and what its Content-Security-Policy allows
 * (scripts/pane-page.js and the taskpane.html template): Microsoft's CDN in production,
 * the documented address ("Referencing the Office JavaScript API library",
 * learn.microsoft.com/office/dev/add-ins/develop/referencing-the-javascript-api-for-office-library-from-its-cdn:
 * https://appsforoffice.microsoft.com/lib/1/hosted/office.js), and the local copy in
 * development, with a policy that allows that one origin in production and none in development.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { resolve } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';

const ROOT = resolve(__dirname, '../..');
const load = createRequire(import.meta.url);
const { OFFICE_JS_CDN, OFFICE_JS_LOCAL, officeJsSrc, paneCsp } = load(resolve(ROOT, 'scripts/pane-page.js')) as {
  OFFICE_JS_CDN: string;
  OFFICE_JS_LOCAL: string;
  officeJsSrc(production: boolean): string;
  paneCsp(production: boolean): string;
};

/** A policy as directive → sources. */
function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0] !== '')
      .map(([name, ...sources]) => [name, sources]),
  );
}

function config(mode: 'production' | 'development'): any {
  vi.stubEnv('STARPOINT_PUBLIC_URL', 'https://addins.example.org/starpoint');
  return load(resolve(ROOT, 'webpack.config.js'))({}, { mode });
}

const CDN_ORIGIN = 'https://appsforoffice.microsoft.com';

describe('office.js source', () => {
  it('is the documented CDN address in production and the local copy otherwise', () => {
    expect(OFFICE_JS_CDN).toBe('https://appsforoffice.microsoft.com/lib/1/hosted/office.js');
    expect(officeJsSrc(true)).toBe(OFFICE_JS_CDN);
    expect(officeJsSrc(false)).toBe(OFFICE_JS_LOCAL);
    expect(OFFICE_JS_LOCAL).toBe('office-js/office.js');
  });
});

describe('the pane page policy', () => {
  it('allows exactly the CDN origin in production, for scripts and office.js’s own frames', () => {
    const d = directives(paneCsp(true));
    expect(d.get('script-src')).toEqual(["'self'", CDN_ORIGIN]);
    expect(d.get('frame-src')).toEqual(["'self'", CDN_ORIGIN]);
    expect(d.get('default-src')).toEqual(["'self'"]);
    expect(d.get('connect-src')).toEqual(["'self'"]);
    expect(d.get('object-src')).toEqual(["'none'"]);
    const remote = [...d.values()].flat().filter((s) => /^https?:|^\*|^https?$/.test(s));
    expect(new Set(remote)).toEqual(new Set([CDN_ORIGIN]));
  });

  it('allows no other origin at all in development', () => {
    const d = directives(paneCsp(false));
    expect(d.get('script-src')).toEqual(["'self'"]);
    expect([...d.values()].flat().filter((s) => /^https?:|^\*/.test(s))).toEqual([]);
    // otherwise the same policy
    expect(paneCsp(true).split(` ${CDN_ORIGIN}`).join('')).toBe(paneCsp(false));
  });

  it('never allows eval or inline script', () => {
    for (const production of [true, false]) {
      const scripts = directives(paneCsp(production)).get('script-src')!;
      expect(scripts).not.toContain("'unsafe-eval'");
      expect(scripts).not.toContain("'unsafe-inline'");
    }
  });
});

describe('taskpane.html and the webpack config', () => {
  afterEach(() => vi.unstubAllEnvs());

  it('puts the policy before any script, and office.js in the head', () => {
    const html = readFileSync(resolve(ROOT, 'src/taskpane/taskpane.html'), 'utf8');
    const meta = html.indexOf('<meta http-equiv="Content-Security-Policy" content="<%= csp %>"');
    const script = html.indexOf('<script src="<%= officeJs %>"></script>');
    expect(meta).toBeGreaterThan(0);
    expect(script).toBeGreaterThan(meta);
    expect(script).toBeLessThan(html.indexOf('</head>'));
  });

  it.each([
    ['production', true],
    ['development', false],
  ] as const)('fills the page for %s', (mode, production) => {
    const c = config(mode);
    const page = c.plugins.find((p: any) => p.userOptions?.filename === 'taskpane.html');
    expect(page.userOptions.templateParameters).toEqual({ officeJs: officeJsSrc(production), csp: paneCsp(production) });
  });

  it('copies the 26 MB local office.js only for development', () => {
    const copied = (mode: 'production' | 'development') =>
      config(mode)
        .plugins.find((p: any) => Array.isArray(p.patterns))
        .patterns.map((q: any) => q.to);
    expect(copied('development')).toContain('office-js');
    expect(copied('production')).not.toContain('office-js');
  });
});
