// Mutation testing of the core engine (issue 13): `npm run test:mutation`, outside `npm test`, runs
// the groups of test/mutation/groups.json one by one (test/mutation/run.ts), each with its own
// incremental file and only its test files, and records the scores in test/mutation/scores.json.
// By hand, one file with the test files that check it (BEAMWARDEN_MUTATION_TESTS, see vitest.config.ts):
//   BEAMWARDEN_MUTATION_TESTS=test/core/part2/od-seen.test.ts npx stryker run test/mutation/stryker.config.mjs \
//     --mutate core/eyewear/od.ts --incrementalFile test/mutation/incremental/mine.json --reporters clear-text,json
//   npm run test:mutation:record -- reports/mutation/mutation.json
// The engine only: the limit tables (core/limits/tables) are data, checked by the table tests.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'test/mutation/vitest.config.ts' },
  checkers: ['typescript'],
  tsconfigFile: 'core/tsconfig.json',
  typescriptChecker: { prioritizePerformanceOverAccuracy: true },
  // 'perTest': each mutant runs the selected tests that reached it in the first (unmutated) run.
  // Measured 2026-12-03 on core/hazard/diffuse.ts with its three test files (85 tests, 107 mutants):
  // 'all', 'perTest' and 'off' gave the same status for every mutant id (7 killed, 29 survived,
  // 32 rejected by the type checker, 39 ignored), about 100 s each, and 3.1 tests per mutant in all
  // three: the vitest runner reports per-test coverage whatever this option says, and Stryker then
  // runs only the covering tests (@stryker-mutator/core 9.6 mutant-test-planner). The memo worry of
  // the earlier comment is handled by test/mutation/setup.ts (memos cleared before every test). A
  // survivor was checked by hand (the diffuse zero rule, line 60 -> false): the three files pass
  // with it, so coverage did not hide a kill; test/core/officer-numbers.test.ts kills it and is now
  // in the hazard-diffuse group. A test file left out of a group is the way a kill gets lost.
  coverageAnalysis: 'perTest',
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
  incrementalFile: 'test/mutation/incremental/all.json',
  reporters: ['clear-text', 'progress', 'html'],
  htmlReporter: { fileName: 'test/artifacts/mutation/index.html' },
  tempDirName: '.stryker-tmp',
  thresholds: { high: 90, low: 80, break: null },
  timeoutMS: 20000,
};
