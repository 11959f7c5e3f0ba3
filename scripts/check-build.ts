/**
 * After `npm run build`: the built dist/functions.json lists every registry entry, in
 * order, with matrix phasor parameters and matrix results, and the production add-in
 * bundle holds no HyperFormula. Run by .ci/run; exits non-zero on any mismatch.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { specs } from '../src/functions';

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
  if (/HyperFormula|hyperformula/.test(readFileSync(join(dist, file), 'utf8'))) problems.push(`${file} contains HyperFormula`);
}
if (problems.length > 0) {
  console.error(`dist check failed:\n- ${problems.join('\n- ')}`);
  process.exit(1);
}
console.log(`dist check: functions.json lists all ${names.length} registry functions with matrix parameters; no HyperFormula in the add-in bundle`);
