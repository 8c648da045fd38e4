import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  root: fileURLToPath(new URL('..', import.meta.url)),
  test: {
    include: ['tests/**/*.test.ts'],
    testTimeout: 60_000,
    setupFiles: ['tests/setup.ts'],
    coverage: {
      provider: 'v8',
      include: ['src/**/*.ts'],
      // The project's own scripts (calibrate, validate, bench, schema) are run, not imported: not library code.
      // The workbench page and its worker's message loop run only in a browser: tests/workbench/browser.test.ts drives
      // them in Chromium (its panels' computations, src/workbench/*View.ts, run in Node too and count here).
      exclude: ['src/node/scripts/**', 'src/workbench/page.ts', 'src/workbench/worker.ts'],
      reporter: ['text-summary', 'json-summary'],
      reportsDirectory: 'coverage',
      // Enforced by `npm run coverage` (issue 7: line coverage of src/ at least 90 %).
      thresholds: { lines: 90 },
    },
  },
});
