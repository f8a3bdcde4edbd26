// The tests Stryker runs against each mutant of the core engine: the core's own tables of published
// and derived cases, nothing that needs a browser, a database or a PDF. The two randomised property
// files (hundreds of evaluations each) stay in `npm test` only: run per mutant they would make a
// mutation run take hours on this machine, and every case they cover is also in a table.
import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

// BEAMWARDEN_MUTATION_TESTS narrows the run to some test files (comma-separated globs), e.g. the
// tables that check one engine file: every mutant then runs in seconds, not half a minute.
const only = process.env['BEAMWARDEN_MUTATION_TESTS']?.split(',').filter(Boolean);

export default defineConfig({
  root: fileURLToPath(new URL('../..', import.meta.url)),
  test: {
    include: only ?? ['test/core/**/*.test.ts'],
    exclude: ['test/core/part2/properties.test.ts', 'test/core/limit-continuity.test.ts'],
    environment: 'node',
    setupFiles: ['test/mutation/setup.ts'],
    testTimeout: 60_000,
  },
});
