/**
 * Browser tests of the preview workbook (`npm run test:browser`), kept apart from
 * `npm test`: they build dist/, start the dev server and drive Debian's Chromium
 * through playwright-core.
 */
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  root: fileURLToPath(new URL('../..', import.meta.url)),
  test: {
    include: ['test/browser/**/*.browser.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 60_000,
    // The first hook builds dist/ with webpack.
    hookTimeout: 300_000,
  },
});
