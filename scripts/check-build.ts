/**
 * After `npm run build`: the built dist/functions.json lists every registry entry, in
 * order, with matrix phasor parameters and matrix results; the production add-in bundle
 * holds no HyperFormula, ExcelJS or idb-keyval; taskpane.html loads office.js from where its build mode says, with
 * the matching Content-Security-Policy; and the built bundle, loaded beside Excel's own
 * custom-functions runtime and called through it with host messages shaped by
 * dist/functions.json, gives every documented example (test/host/). Run by .ci/run; exits
 * non-zero on any mismatch.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { createRequire } from 'node:module';
import { specs } from '../src/functions';
import { ExcelRuntime } from '../test/host/excel-runtime';
import { HostEvaluator } from '../test/host/host-examples';

// pane-page.js is CommonJS (webpack.config.js requires it too)
const { OFFICE_JS_CDN, OFFICE_JS_LOCAL, paneCsp } = createRequire(__filename)('./pane-page.js') as {
  OFFICE_JS_CDN: string;
  OFFICE_JS_LOCAL: string;
  paneCsp(production: boolean): string;
};

interface MetaParam {
  name: string;
  dimensionality?: string;
  repeating?: boolean;
  optional?: boolean;
}
interface MetaFunction {
  id: string;
  name: string;
  parameters: MetaParam[];
  result: { dimensionality?: string };
}

const dist = join(__dirname, '..', 'dist');
const meta = JSON.parse(readFileSync(join(dist, 'functions.json'), 'utf8')) as { functions: MetaFunction[] };
const problems: string[] = [];
const ids = meta.functions.map((f) => f.id);
const names = specs.map((s) => s.name);
if (ids.join() !== names.join()) problems.push(`functions.json lists ${ids.join(', ')} but the registry has ${names.join(', ')}`);
for (const s of specs) {
  const f = meta.functions.find((m) => m.id === s.name);
  if (!f) continue;
  if (f.result.dimensionality !== 'matrix') problems.push(`${s.name}: result is not a matrix, so it would not spill`);
  s.params.forEach((p, i) => {
    const mp = f.parameters[i];
    if (!mp) return problems.push(`${s.name}: parameter ${p.name} is missing`);
    if (p.type !== 'scalar' && mp.dimensionality !== 'matrix') problems.push(`${s.name}.${p.name}: not a matrix parameter`);
    if (p.type === 'repeat' && !mp.repeating) problems.push(`${s.name}.${p.name}: not repeating`);
    if (Boolean(p.optional) !== Boolean(mp.optional)) problems.push(`${s.name}.${p.name}: optional flag differs`);
  });
}
for (const file of readdirSync(dist).filter((f) => /^taskpane.*\.js$/.test(f))) {
  const text = readFileSync(join(dist, file), 'utf8');
  if (/HyperFormula|hyperformula/.test(text)) problems.push(`${file} contains HyperFormula`);
  // the preview's file and storage libraries (ExcelJS, idb-keyval) stay out of the add-in too
  if (/ExcelJS|exceljs|keyval-store/.test(text)) problems.push(`${file} contains the preview's ExcelJS or idb-keyval`);
}
// The add-in's page: office.js from the CDN with a policy allowing exactly that origin and
// no local copy (production), or the local copy with a policy of this origin only (development).
const pane = readFileSync(join(dist, 'taskpane.html'), 'utf8');
const officeSrc = /<script\s+src=["']?([^"'\s>]*office\.js)["'\s>]/i.exec(pane)?.[1];
const policy = /<meta\s+http-equiv=["']?Content-Security-Policy["']?\s+content="([^"]+)"/i.exec(pane)?.[1];
const production = officeSrc === OFFICE_JS_CDN;
const localCopy = existsSync(join(dist, 'office-js', 'office.js'));
if (officeSrc !== OFFICE_JS_CDN && officeSrc !== OFFICE_JS_LOCAL) problems.push(`taskpane.html loads office.js from ${officeSrc ?? 'nowhere'}`);
if (policy !== paneCsp(production)) problems.push(`taskpane.html's Content-Security-Policy is "${policy}", not "${paneCsp(production)}"`);
if (production && localCopy) problems.push('a production build loads office.js from the CDN but still copies the local office-js folder');
if (!production && !localCopy) problems.push('a development build loads office-js/office.js but dist/office-js/office.js is missing');
const mode = production ? 'production: office.js from the CDN, policy allows that origin only' : 'development: local office.js, policy of this origin only';


/** Same cell text; numbers within 1e-9 relative. */
function sameCells(got: unknown, want: ReadonlyArray<ReadonlyArray<unknown>>): boolean {
  if (!Array.isArray(got) || got.length !== want.length) return false;
  return want.every((row, r) => {
    const g = got[r] as unknown[];
    if (!Array.isArray(g) || g.length !== row.length) return false;
    return row.every((w, c) =>
      typeof w === 'number' ? typeof g[c] === 'number' && Math.abs((g[c] as number) - w) <= 1e-9 * Math.max(1, Math.abs(w)) : g[c] === w,
    );
  });
}

/** Every documented example through Excel's runtime and the built taskpane.js. */
async function examplesThroughBundle(): Promise<number> {
  const runtime = ExcelRuntime.load();
  runtime.runScript(readFileSync(join(dist, 'taskpane.js'), 'utf8'), 'taskpane.js');
  runtime.sendMetadata(meta.functions);
  const evaluator = new HostEvaluator(runtime, meta.functions);
  const examples = specs.flatMap((s) => s.examples);
  const settled = await Promise.allSettled(examples.map((e) => evaluator.formula(e.formula)));
  settled.forEach((r, i) => {
    const e = examples[i];
    if (r.status === 'rejected') problems.push(`${e.formula} failed through the bundle: ${String((r.reason as Error)?.message ?? r.reason)}`);
    else if (!sameCells(r.value, e.result)) problems.push(`${e.formula} gave ${JSON.stringify(r.value)} through the bundle, documented ${JSON.stringify(e.result)}`);
  });
  evaluator.dispose();
  return examples.length;
}

void examplesThroughBundle().then((count) => {
  if (problems.length > 0) {
    console.error(`dist check failed:\n- ${problems.join('\n- ')}`);
    process.exit(1);
  }
  console.log(
    `dist check: functions.json lists all ${names.length} registry functions with matrix parameters; no HyperFormula, ExcelJS or idb-keyval in the add-in bundle; ` +
      `all ${count} documented examples give their results through Excel's custom-functions runtime and the built bundle; ${mode}`,
  );
  process.exit(0);
});
