/**
 * Writes src/functions/excel/declarations.ts from the function registry.
 *
 *   npx tsx scripts/gen-declarations.ts           (npm run gen) write the file
 *   npx tsx scripts/gen-declarations.ts --check   exit 1 when the file is stale
 */
import { readFileSync, writeFileSync, existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { specs } from '../src/functions/index';
import { DECLARATIONS_PATH, renderDeclarations } from '../src/functions/excel/render-declarations';

const target = resolve(__dirname, '..', DECLARATIONS_PATH);
const fresh = renderDeclarations(specs);
const current = existsSync(target) ? readFileSync(target, 'utf8') : null;

if (process.argv.includes('--check')) {
  if (current !== fresh) {
    console.error(`${DECLARATIONS_PATH} is stale or missing: run \`npm run gen\` and commit the result.`);
    process.exit(1);
  }
  console.log(`${DECLARATIONS_PATH} is up to date (${specs.length} functions).`);
} else if (current === fresh) {
  console.log(`${DECLARATIONS_PATH} unchanged (${specs.length} functions).`);
} else {
  writeFileSync(target, fresh);
  console.log(`wrote ${DECLARATIONS_PATH} (${specs.length} functions).`);
}
