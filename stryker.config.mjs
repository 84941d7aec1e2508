// Mutation testing of the core (`npm run mutate`; slow, not part of `npm test` or CI).
// Run one folder or a few files at a time on a small machine, with the tests aimed at them, e.g.
//   MUTATE_TESTS='test/thermo/root.test.ts' npm run mutate -- --mutate 'thermo/solvers/root.ts'
// The tests run through vitest.mutate.config.ts (core tests only, properties capped at
// PROP_RUNS cases). Reports go to .reports/mutation/ (ignored by git), and so does the
// incremental file: `npm run mutate -- --incremental …` reruns only mutants whose code or tests
// changed since the last run on this machine. Nothing is fetched at run time.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'vitest.mutate.config.ts' },
  plugins: ['@stryker-mutator/vitest-runner'],
  mutate: ['thermo/**/*.ts', '!thermo/data/fitted.ts', '!thermo/data/kij-fitted.ts'],
  coverageAnalysis: 'perTest',
  ignoreStatic: true,
  concurrency: 2,
  timeoutMS: 60000,
  timeoutFactor: 2,
  reporters: ['clear-text', 'progress', 'json'],
  incrementalFile: '.reports/mutation/stryker-incremental.json',
  jsonReporter: { fileName: '.reports/mutation/mutation.json' },
  tempDirName: '.stryker-tmp',
  cleanTempDir: true,
};
