import { defineConfig } from 'vitest/config';

// The unit suite as Stryker runs it (`npm run mutate`): only the core's tests (test/thermo), the
// fast-check properties capped at PROP_RUNS cases each (test/helpers/prop-runs.ts), no house-size
// check (a mutant never changes a file's length), no app, browser or end-to-end tests.
// MUTATE_TESTS (comma-separated globs) narrows it further to the tests aimed at the files being
// mutated; a score measured so is a lower bound (the whole suite can only kill more).
const narrowed = process.env.MUTATE_TESTS?.split(',')
  .map((s) => s.trim())
  .filter(Boolean);

export default defineConfig({
  test: {
    include: narrowed?.length ? narrowed : ['test/thermo/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
    env: { PROP_RUNS: process.env.PROP_RUNS ?? '10' },
  },
});
