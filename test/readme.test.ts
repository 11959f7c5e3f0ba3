import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { specs } from '../src/functions';
import { withReference, renderReference } from '../scripts/reference';

const readme = readFileSync(join(__dirname, '..', 'README.md'), 'utf8');

describe('README', () => {
  it('opens with one paragraph stating the job', () => {
    const first = readme.split('\n').find((l) => l.trim() !== '' && !l.startsWith('#')) ?? '';
    expect(first.length).toBeGreaterThan(200);
  });
  it('has a function reference equal to the registry (run npm run gen:readme when this fails)', () => {
    expect(readme).toBe(withReference(readme, specs));
  });
  it('documents every registry function and none that does not exist', () => {
    const documented = [...renderReference(specs).matchAll(/^#### `PHZ\.([A-Z0-9]+)\(/gm)].map((m) => m[1]);
    const inReadme = [...readme.matchAll(/^#### `PHZ\.([A-Z0-9]+)\(/gm)].map((m) => m[1]);
    expect(inReadme).toEqual(documented);
    expect(inReadme).toEqual(specs.map((s) => s.name));
  });
  it('gives the quick-start commands and the cautions', () => {
    expect(readme).toMatch(/npm install/);
    expect(readme).toMatch(/npm start/);
    expect(readme).toMatch(/npm test/);
    expect(readme).toMatch(/competent, licensed person/);
  });
});
