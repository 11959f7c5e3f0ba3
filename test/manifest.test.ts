/**
 * Checks manifest/manifest.xml, and the manifest a production build writes with
 * STARPOINT_PUBLIC_URL, against the rules of the add-in only (XML) manifest that Office
 * enforces when sideloading and that its XML schemas state, as documented in the Office
 * Add-ins manifest reference (learn.microsoft.com/javascript/api/manifest: OfficeApp,
 * Runtime, SourceLocation, Namespace and String elements), "Configure your Office Add-in to
 * use a shared runtime" (learn.microsoft.com/office/dev/add-ins/develop/configure-your-add-in-to-use-a-shared-runtime),
 * the schema types "OfficeApp complexType (apps for Office 1.1)" and "TaskPaneApp complexType
 * (apps for Office 1.1)", and [MS-OWEMXML] Office Web Extensibility Manifest Format §5.6
 * (OfficeAppBasicTypes: ShortString 1–125, LongString 1–250, ReferenceId 1–32, URL 1–2048
 * characters). The schema files are not vendored here: these tests parse the manifest and
 * check what those schemas state.
 */
import { readFileSync, existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { XMLParser, XMLValidator } from 'fast-xml-parser';

const ROOT = resolve(__dirname, '..');
const DEV_BASE = 'https://localhost:3000';
const source = readFileSync(resolve(ROOT, 'manifest/manifest.xml'), 'utf8');
const load = createRequire(import.meta.url);

/** scripts/public-url.js (CommonJS, shared with webpack.config.js). */
const publicUrlModule = load(resolve(ROOT, 'scripts/public-url.js')) as {
  publicUrl(raw: string | undefined): string | null;
  rewriteManifest(xml: string, base: string): string;
};

/** A public address with characters XML must escape (& and ') in its path. */
const PUBLIC_BASE = publicUrlModule.publicUrl("https://addins.example.org/tools/r&d's/starpoint/")!;

/** The manifest a production build writes: the copy step of webpack.config.js itself, run on the source. */
function builtManifest(base: string): string {
  const previous = process.env.STARPOINT_PUBLIC_URL;
  process.env.STARPOINT_PUBLIC_URL = base;
  try {
    const config = load(resolve(ROOT, 'webpack.config.js'))({}, { mode: 'production' });
    const copy = config.plugins.find((p: any) => Array.isArray(p.patterns));
    const pattern = copy.patterns.find((q: any) => q.from === 'manifest/manifest.xml');
    return String(pattern.transform(Buffer.from(source, 'utf8')));
  } finally {
    if (previous === undefined) delete process.env.STARPOINT_PUBLIC_URL;
    else process.env.STARPOINT_PUBLIC_URL = previous;
  }
}

interface El {
  readonly tag: string;
  readonly attrs: Readonly<Record<string, string>>;
  readonly children: El[];
  readonly text: string;
  readonly parent: El | null;
}

/** The manifest as a plain element tree (fast-xml-parser's ordered output, reshaped; entities decoded). */
function parse(text: string): El {
  const parser = new XMLParser({ preserveOrder: true, ignoreAttributes: false, attributeNamePrefix: '' });
  const build = (nodes: any[], parent: El | null): El[] =>
    nodes
      .filter((n) => !('#text' in n) && !Object.keys(n).some((k) => k.startsWith('?')))
      .map((n) => {
        const tag = Object.keys(n).find((k) => k !== ':@')!;
        const kids: any[] = n[tag];
        const el: El = {
          tag,
          attrs: n[':@'] ?? {},
          children: [],
          text: kids
            .filter((k) => '#text' in k)
            .map((k) => String(k['#text']))
            .join('')
            .trim(),
          parent,
        };
        el.children.push(...build(kids, el));
        return el;
      });
  const roots = build(parser.parse(text), null);
  expect(roots).toHaveLength(1);
  return roots[0];
}

function* walk(el: El): Generator<El> {
  yield el;
  for (const c of el.children) yield* walk(c);
}

const child = (el: El, tag: string) => el.children.find((c) => c.tag === tag);

type Kind = 'image' | 'url' | 'short' | 'long';
const RESOURCE_GROUPS: Record<string, Kind> = {
  'bt:Images': 'image',
  'bt:Urls': 'url',
  'bt:ShortStrings': 'short',
  'bt:LongStrings': 'long',
};

/** What kind of resource each referencing element needs. */
function expectedKind(el: El): Kind | null {
  if (el.tag === 'bt:Image') return 'image';
  if (['SourceLocation', 'Runtime', 'FunctionFile', 'LearnMoreUrl'].includes(el.tag)) return 'url';
  if (['Namespace', 'Label', 'Title'].includes(el.tag)) return 'short';
  if (el.tag === 'Description') return 'long';
  return null;
}

/** True when `tags` (the children's tags) follow `order`, with only tags of `order` present. */
function inSchemaOrder(tags: readonly string[], order: readonly string[]): boolean {
  let at = 0;
  for (const t of tags) {
    const i = order.indexOf(t, at);
    if (i < 0) return false;
    at = i;
  }
  return true;
}

/** Every attribute value that is a URL Office loads (namespace names are identifiers, not addresses). */
function urlsOf(all: readonly El[]): string[] {
  return all
    .flatMap((e) => Object.entries(e.attrs))
    .filter(([name, v]) => !name.startsWith('xmlns') && /^[a-z][a-z0-9+.-]*:\/\//i.test(v))
    .map(([, v]) => v);
}

const VARIANTS: ReadonlyArray<readonly [string, string, string]> = [
  ['manifest/manifest.xml', source, DEV_BASE],
  [`the built manifest (STARPOINT_PUBLIC_URL=${PUBLIC_BASE})`, builtManifest(PUBLIC_BASE), PUBLIC_BASE],
];

describe.each(VARIANTS)('%s', (_, xml, base) => {
  const root = `${base}/`;
  const doc = parse(xml);
  const all = [...walk(doc)];
  const find = (pred: (e: El) => boolean) => all.filter(pred);
  const one = (pred: (e: El) => boolean, what: string): El => {
    const found = find(pred);
    expect(found, what).toHaveLength(1);
    return found[0];
  };
  const resources = new Map<string, { kind: Kind; value: string }>();
  const duplicateIds: string[] = [];
  for (const group of find((e) => e.tag in RESOURCE_GROUPS && e.parent?.tag === 'Resources')) {
    for (const r of group.children) {
      if (resources.has(r.attrs.id)) duplicateIds.push(r.attrs.id);
      resources.set(r.attrs.id, { kind: RESOURCE_GROUPS[group.tag], value: r.attrs.DefaultValue });
    }
  }
  const references = find((e) => 'resid' in e.attrs);
  const urlOf = (resid: string) => resources.get(resid)?.value ?? '';

  it('is well-formed XML', () => {
    expect(XMLValidator.validate(xml)).toBe(true);
  });

  it('is a task pane add-in for the Workbook host with our identity', () => {
    expect(doc.tag).toBe('OfficeApp');
    expect(doc.attrs['xsi:type']).toBe('TaskPaneApp');
    expect(child(doc, 'Id')?.text).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(child(doc, 'ProviderName')?.text).toBe('Starpoint');
    expect(child(doc, 'DisplayName')?.attrs.DefaultValue).toBe('Starpoint phasors');
    expect(child(doc, 'Permissions')?.text).toBe('ReadWriteDocument');
    expect(child(child(doc, 'Hosts')!, 'Host')?.attrs.Name).toBe('Workbook');
  });

  it('has the elements the schema requires, in the order it requires', () => {
    // OfficeApp complexType (apps for Office 1.1), then the TaskPaneApp extension of it.
    const order = [
      'Id', 'AlternateId', 'Version', 'ProviderName', 'DefaultLocale', 'DisplayName', 'Description', 'IconUrl',
      'HighResolutionIconUrl', 'SupportUrl', 'AppDomains', 'Hosts',
      'Requirements', 'DefaultSettings', 'Permissions', 'Dictionary', 'VersionOverrides',
    ];
    const tags = doc.children.map((c) => c.tag);
    expect(inSchemaOrder(tags, order), tags.join(', ')).toBe(true);
    for (const required of ['Id', 'Version', 'ProviderName', 'DefaultLocale', 'DisplayName', 'Description', 'DefaultSettings', 'Permissions']) {
      expect(tags.filter((t) => t === required), required).toHaveLength(1);
    }
    expect(child(child(doc, 'DefaultSettings')!, 'SourceLocation'), 'DefaultSettings/SourceLocation').toBeDefined();
    // VersionOverrides (TaskPaneAppVersionOverrides V1_0): Hosts before Resources; a Host's
    // Runtimes, AllFormFactors, DesktopFormFactor in that order; GetStarted, FunctionFile,
    // then the extension points of a DesktopFormFactor.
    const overrides = child(doc, 'VersionOverrides')!;
    expect(inSchemaOrder(overrides.children.map((c) => c.tag), ['Description', 'Requirements', 'Hosts', 'Resources'])).toBe(true);
    const host = child(child(overrides, 'Hosts')!, 'Host')!;
    expect(inSchemaOrder(host.children.map((c) => c.tag), ['Runtimes', 'AllFormFactors', 'DesktopFormFactor'])).toBe(true);
    const desktop = child(host, 'DesktopFormFactor')!;
    expect(inSchemaOrder(desktop.children.map((c) => c.tag), ['GetStarted', 'FunctionFile', 'ExtensionPoint'])).toBe(true);
    expect(inSchemaOrder(child(overrides, 'Resources')!.children.map((c) => c.tag), Object.keys(RESOURCE_GROUPS))).toBe(true);
  });

  it('resolves every resid to a resource of the right kind', () => {
    expect(references.length).toBeGreaterThan(10);
    for (const el of references) {
      const resid = el.attrs.resid;
      const resource = resources.get(resid);
      expect(resource, `<${el.tag} resid="${resid}"> has no resource`).toBeDefined();
      expect(resource!.kind, `<${el.tag} resid="${resid}">`).toBe(expectedKind(el));
    }
  });

  it('keeps every resid and resource id within 32 characters, ids unique', () => {
    // ReferenceId: 1 to 32 characters (MS-OWEMXML §5.6; manifest reference: Runtime, SourceLocation, Namespace).
    expect(duplicateIds).toEqual([]);
    for (const id of [...resources.keys(), ...references.map((e) => e.attrs.resid)]) {
      expect(id.length, id).toBeGreaterThanOrEqual(1);
      expect(id.length, id).toBeLessThanOrEqual(32);
    }
  });

  it('keeps strings within the schema lengths (ShortString 125, LongString 250)', () => {
    // ShortString 1–125 and LongString 1–250 characters (MS-OWEMXML §5.6; manifest reference, String element).
    for (const [id, r] of resources) {
      if (r.kind === 'short') expect(r.value.length, id).toBeLessThanOrEqual(125);
      if (r.kind === 'long') expect(r.value.length, id).toBeLessThanOrEqual(250);
      expect(r.value.length, id).toBeGreaterThanOrEqual(1);
    }
    expect(child(doc, 'ProviderName')!.text.length).toBeLessThanOrEqual(125);
    expect(child(doc, 'DisplayName')!.attrs.DefaultValue.length).toBeLessThanOrEqual(125);
    expect(child(doc, 'Description')!.attrs.DefaultValue.length).toBeLessThanOrEqual(250);
  });

  it('runs functions, ribbon and pane in one long-lived shared runtime', () => {
    const runtime = one((e) => e.tag === 'Runtime', 'one <Runtime>');
    expect(runtime.parent?.tag).toBe('Runtimes');
    expect(runtime.attrs.lifetime).toBe('long');
    const resid = runtime.attrs.resid;

    const functionsPoint = one((e) => e.tag === 'ExtensionPoint' && e.attrs['xsi:type'] === 'CustomFunctions', 'CustomFunctions point');
    expect(functionsPoint.parent?.tag).toBe('AllFormFactors');
    expect(child(child(functionsPoint, 'Page')!, 'SourceLocation')?.attrs.resid).toBe(resid);

    const showPane = one((e) => e.tag === 'Action' && e.attrs['xsi:type'] === 'ShowTaskpane', 'ShowTaskpane action');
    expect(child(showPane, 'SourceLocation')?.attrs.resid).toBe(resid);
    expect(one((e) => e.tag === 'FunctionFile', 'FunctionFile').attrs.resid).toBe(resid);

    // The base manifest's pane page is the same page.
    const defaultPage = child(child(doc, 'DefaultSettings')!, 'SourceLocation')!.attrs.DefaultValue;
    expect(defaultPage).toBe(urlOf(resid));
    expect(urlOf(resid)).toBe(`${root}taskpane.html`);
  });

  it('requires the shared runtime and custom functions runtime requirement sets', () => {
    const sets = find((e) => e.tag === 'Set' && e.parent?.parent?.tag === 'Requirements');
    const names = Object.fromEntries(sets.map((s) => [s.attrs.Name, s.attrs.MinVersion]));
    expect(names.SharedRuntime).toBe('1.1');
    // CustomFunctions.Error (messages on #VALUE! / #N/A) is CustomFunctionsRuntime 1.2.
    expect(names.CustomFunctionsRuntime).toBe('1.2');
  });

  it('declares the PHZ namespace and the functions.json metadata', () => {
    const point = one((e) => e.tag === 'ExtensionPoint' && e.attrs['xsi:type'] === 'CustomFunctions', 'CustomFunctions point');
    const ns = child(point, 'Namespace')!.attrs.resid;
    expect(resources.get(ns)?.value).toBe('PHZ');
    const metadata = child(child(point, 'Metadata')!, 'SourceLocation')!.attrs.resid;
    expect(urlOf(metadata)).toBe(`${root}functions.json`);
  });

  it('opens the pane from a button on the Home tab', () => {
    const tab = one((e) => e.tag === 'OfficeTab', 'OfficeTab');
    expect(tab.attrs.id).toBe('TabHome');
    const showPane = one((e) => e.tag === 'Action' && e.attrs['xsi:type'] === 'ShowTaskpane', 'ShowTaskpane');
    let up: El | null = showPane;
    while (up && up.tag !== 'OfficeTab') up = up.parent;
    expect(up).toBe(tab);
  });

  it('uses https for every URL, all on this address, each within 2048 characters', () => {
    // URL: 1 to 2048 characters (MS-OWEMXML §5.6); Office loads add-in pages over HTTPS only.
    const urls = urlsOf(all);
    expect(urls.length).toBeGreaterThan(5);
    for (const url of urls) {
      expect(url, url).toMatch(/^https:\/\//);
      expect(url.startsWith(root), url).toBe(true);
      expect(() => new URL(url), url).not.toThrow();
      expect(url.length, url).toBeLessThanOrEqual(2048);
    }
  });

  it('points every icon at a PNG in assets/ of the declared size', () => {
    const pngSize = (file: string) => {
      const bytes = readFileSync(file);
      expect(bytes.subarray(1, 4).toString('latin1'), file).toBe('PNG');
      return [bytes.readUInt32BE(16), bytes.readUInt32BE(20)];
    };
    const icons: [url: string, px: number][] = [
      [child(doc, 'IconUrl')!.attrs.DefaultValue, 32],
      [child(doc, 'HighResolutionIconUrl')!.attrs.DefaultValue, 64],
      ...find((e) => e.tag === 'bt:Image' && 'resid' in e.attrs).map((e): [string, number] => [urlOf(e.attrs.resid), Number(e.attrs.size)]),
    ];
    expect(icons.length).toBeGreaterThanOrEqual(5);
    for (const [url, px] of icons) {
      expect(url.startsWith(`${root}assets/`), url).toBe(true);
      const file = resolve(ROOT, url.slice(root.length));
      expect(existsSync(file), `${url} → ${file}`).toBe(true);
      expect(pngSize(file), url).toEqual([px, px]);
    }
  });

  it('names only files the build emits (pages, entry bundles, functions.json, assets)', () => {
    // Ask the webpack config itself what it emits, so a renamed entry or page fails here.
    const config = load(resolve(ROOT, 'webpack.config.js'))({}, { mode: 'development' });
    const emitted = new Set<string>([
      ...Object.keys(config.entry).map((name) => `${name}.js`),
      ...config.plugins.flatMap((p: any) => [p.userOptions?.filename, p.options?.output]).filter(Boolean),
    ]);
    const localUrls = urlsOf(all).map((v) => v.slice(root.length));
    for (const file of localUrls) {
      if (file.startsWith('assets/')) expect(existsSync(resolve(ROOT, file)), file).toBe(true);
      else expect(emitted.has(file), `${file} is not produced by webpack.config.js`).toBe(true);
    }
  });
});

describe('the built manifest with a public URL', () => {
  const built = builtManifest(PUBLIC_BASE);

  it('keeps no dev server address', () => {
    expect(source).toContain(DEV_BASE);
    expect(built).not.toContain(DEV_BASE);
  });

  it('escapes the address for XML where it is written', () => {
    expect(built).toContain('https://addins.example.org/tools/r&amp;d&apos;s/starpoint/taskpane.html');
    expect(built).not.toMatch(/&(?!amp;|apos;|quot;|lt;|gt;)/);
  });

  it('differs from the source only in the addresses', () => {
    expect(built.split('https://addins.example.org/tools/r&amp;d&apos;s/starpoint').join(DEV_BASE)).toBe(source);
  });

  it('is what rewriteManifest writes (the build uses the module the unit tests check)', () => {
    expect(built).toBe(publicUrlModule.rewriteManifest(source, PUBLIC_BASE));
  });
});
