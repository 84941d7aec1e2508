// Mutation testing of the core (`npm run mutate`; slow, not part of `npm test` or CI).
// Run one folder at a time on a small machine, e.g.
//   npm run mutate -- --mutate 'thermo/rules/**/*.ts'
// Reports go to .reports/mutation/ (ignored by git). Nothing is fetched at run time.
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: 'vitest',
  vitest: { configFile: 'vitest.config.ts' },
  plugins: ['@stryker-mutator/vitest-runner'],
  mutate: ['thermo/**/*.ts', '!thermo/data/fitted.ts', '!thermo/data/kij-fitted.ts'],
  coverageAnalysis: 'perTest',
  ignoreStatic: true,
  concurrency: 2,
  timeoutMS: 60000,
  timeoutFactor: 2,
  reporters: ['clear-text', 'progress', 'json'],
  jsonReporter: { fileName: '.reports/mutation/mutation.json' },
  tempDirName: '.stryker-tmp',
  cleanTempDir: true,
};
