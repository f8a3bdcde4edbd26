// Mutation testing of the core engine (issue 13): `npm run test:mutation`, outside `npm test`.
// Incremental: results of unchanged code and tests are reused from test/mutation/incremental.json,
// so a run after a small change only tests the mutants it touches. One file at a time, with the
// test files that check it (BEAMWARDEN_MUTATION_TESTS, see vitest.config.ts):
//   npm run test:mutation -- --mutate core/eyewear/od.ts
// The engine only: the limit tables (core/limits/tables) are data, checked by the table tests.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'test/mutation/vitest.config.ts' },
  checkers: ['typescript'],
  tsconfigFile: 'core/tsconfig.json',
  typescriptChecker: { prioritizePerformanceOverAccuracy: true },
  // 'all': every mutant runs every selected test. With 'perTest' the vitest runner credited the
  // core's shared code (reached through evaluateBeam from many files) to too few tests, and mutants
  // that a table case plainly kills were reported as survivors (seen on core/hazard/diffuse.ts).
  coverageAnalysis: 'all',
  // String literals in the core are trace and note wording (checked by the trace-text tests where it
  // matters); their mutants say nothing about the numbers. See test/mutation/EQUIVALENT.md.
  mutator: { excludedMutations: ['StringLiteral'] },
  mutate: [
    'core/beam/**/*.ts',
    'core/hazard/**/*.ts',
    'core/eyewear/**/*.ts',
    'core/classes/**/*.ts',
    'core/room/**/*.ts',
    'core/limits/*.ts',
    '!core/limits/tables/**',
  ],
  // The machine is shared: one worker.
  concurrency: 1,
  incremental: true,
  incrementalFile: 'test/mutation/incremental.json',
  reporters: ['clear-text', 'progress', 'html'],
  htmlReporter: { fileName: 'test/artifacts/mutation/index.html' },
  tempDirName: '.stryker-tmp',
  thresholds: { high: 90, low: 80, break: null },
  timeoutMS: 20000,
};
