/**
 * The generated declarations file: fresh against the registry, and read by the host's
 * metadata generator (custom-functions-metadata, the copy the webpack plugin uses) into
 * exactly the functions.json the registry describes.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { specs } from '../../../src/functions/index';
import type { FunctionSpec, ParamSpec } from '../../../src/functions/spec';
import { DECLARATIONS_PATH, renderDeclarations } from '../../../src/functions/excel/render-declarations';

const ROOT = resolve(__dirname, '../../..');
const pluginRequire = createRequire(createRequire(import.meta.url).resolve('custom-functions-metadata-plugin'));
const { generateCustomFunctionsMetadata } = pluginRequire('custom-functions-metadata') as {
  generateCustomFunctionsMetadata(input: string): Promise<{ metadataJson: string; errors: string[] }>;
};

const scratch = mkdtempSync(join(tmpdir(), 'starpoint-decl-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

interface MetaParam {
  name: string;
  description?: string;
  dimensionality?: string;
  optional?: boolean;
  repeating?: boolean;
  type?: string;
}
interface MetaFunction {
  id: string;
  name: string;
  description: string;
  parameters: MetaParam[];
  result: { dimensionality?: string; type?: string };
}

async function metadataOf(file: string): Promise<MetaFunction[]> {
  const result = await generateCustomFunctionsMetadata(file);
  expect(result.errors).toEqual([]);
  return result.metadataJson === '' ? [] : JSON.parse(result.metadataJson).functions;
}

async function metadataOfText(text: string): Promise<MetaFunction[]> {
  const file = join(scratch, `decl-${Math.random().toString(36).slice(2)}.ts`);
  writeFileSync(file, text);
  return metadataOf(file);
}

/** What functions.json must say for one spec. */
function expectMetadataMatches(meta: MetaFunction, spec: FunctionSpec): void {
  expect(meta.id).toBe(spec.name);
  expect(meta.name).toBe(spec.name);
  expect(meta.description).toBe(spec.summary.replace(/\s+/g, ' ').trim());
  // Always a matrix result: a scalar declaration would stop spills.
  expect(meta.result).toEqual({ dimensionality: 'matrix' });
  expect(meta.parameters.map((p) => p.name)).toEqual(spec.params.map((p) => p.name));
  meta.parameters.forEach((mp, i) => {
    const p: ParamSpec = spec.params[i];
    expect(mp.type, `${spec.name}.${p.name}`).toBe('any');
    expect(mp.dimensionality, `${spec.name}.${p.name}`).toBe(p.type === 'scalar' ? undefined : 'matrix');
    expect(mp.repeating, `${spec.name}.${p.name}`).toBe(p.type === 'repeat' ? true : undefined);
    expect(mp.optional, `${spec.name}.${p.name}`).toBe(p.optional ? true : undefined);
    expect(mp.description).toBe(p.description.replace(/\s+/g, ' ').trim());
  });
}

describe(DECLARATIONS_PATH, () => {
  it('matches a fresh generation from the registry (run `npm run gen` when this fails)', () => {
    const committed = readFileSync(resolve(ROOT, DECLARATIONS_PATH), 'utf8');
    expect(committed === renderDeclarations(specs), `${DECLARATIONS_PATH} is stale: run \`npm run gen\``).toBe(true);
  });

  it('is marked as generated', () => {
    expect(renderDeclarations(specs)).toMatch(/^\/\/ Generated .* do not edit\./);
  });

  it('gives functions.json every registry entry, in order, with matching parameters', async () => {
    expect(specs.length).toBeGreaterThan(0);
    const meta = await metadataOf(resolve(ROOT, DECLARATIONS_PATH));
    expect(meta.map((f) => f.id)).toEqual(specs.map((s) => s.name));
    meta.forEach((f, i) => expectMetadataMatches(f, specs[i]));
  });
});

const param = (name: string, type: ParamSpec['type'], optional = false): ParamSpec => ({
  name,
  type,
  optional,
  description: `The ${name} argument (${type}), e.g. 230∠-120° or {1,2}.`,
});

const spec = (name: string, params: ParamSpec[], extra: Partial<FunctionSpec> = {}): FunctionSpec => ({
  name,
  group: 'arithmetic',
  summary: `Does ${name.toLowerCase()} to phasors like 7+j5; angle in degrees.`,
  params,
  result: 'Polar text, one row per phasor.',
  errors: [],
  examples: [{ formula: `=PHZ.${name}(1)`, result: [['1∠0°']] }],
  implementation: () => [['1∠0°']],
  ...extra,
});

describe('renderDeclarations', () => {
  it('declares matrix, repeating, scalar and optional parameters the way the host reads them', async () => {
    const sample = [
      spec('ALPHA', [param('z', 'matrix'), param('digits', 'scalar', true)]),
      spec('BETA', [param('z', 'repeat')]),
      spec('GAMMA', [param('voltage', 'matrix'), param('mode', 'scalar'), param('line', 'matrix', true), param('digits', 'scalar', true)]),
      spec('DELTA', []),
    ];
    const text = renderDeclarations(sample);
    expect(text).toContain("export function BETA(z: any[][][]): any[][] {\n  return invoke('BETA', [z]);\n}");
    expect(text).toContain(' * @param {any} [digits] ');
    const meta = await metadataOfText(text);
    expect(meta.map((f) => f.id)).toEqual(['ALPHA', 'BETA', 'GAMMA', 'DELTA']);
    meta.forEach((f, i) => expectMetadataMatches(f, sample[i]));
  });

  it('writes a valid module with no functions for an empty registry', () => {
    const text = renderDeclarations([]);
    expect(text).toContain('export {};');
    expect(text).not.toContain('@customfunction');
  });

  it.each([
    ['a word starting with @ (JSDoc would read a tag)', spec('A', [], { summary: 'Adds @phasors.' }), /starting with "@"/],
    ['a comment terminator', spec('A', [], { result: 'Text */ more' }), /"\*\/"/],
    ['a repeating parameter that is not last', spec('A', [param('z', 'repeat'), param('digits', 'scalar', true)]), /must be the last/],
    ['a required parameter after an optional one', spec('A', [param('a', 'matrix', true), param('b', 'matrix')]), /follows an optional one/],
    ['a lower-case name', spec('div', []), /upper case/],
    ['a reserved parameter name', spec('A', [param('function', 'matrix')]), /reserved word/],
    ['an empty summary', spec('A', [], { summary: ' ' }), /summary is empty/],
  ])('refuses %s', (_label, bad, message) => {
    expect(() => renderDeclarations([bad])).toThrow(message);
  });

  it('refuses a name registered twice', () => {
    expect(() => renderDeclarations([spec('A', []), spec('A', [])])).toThrow(/registered twice/);
  });
});
