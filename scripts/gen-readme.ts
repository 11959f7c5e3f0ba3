/** Writes the function reference into README.md from the registry (npm run gen:readme). */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { specs } from '../src/functions';
import { withReference } from './reference';

const path = join(__dirname, '..', 'README.md');
const before = readFileSync(path, 'utf8');
const after = withReference(before, specs);
if (after !== before) {
  writeFileSync(path, after);
  console.log(`README.md: reference rewritten (${specs.length} functions)`);
} else {
  console.log(`README.md: reference already current (${specs.length} functions)`);
}
