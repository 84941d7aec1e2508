import { defineConfig } from 'vitest/config';

// End-to-end tests against the built app (run `npm run build` first; `npm run test:e2e` does).
export default defineConfig({
  test: {
    include: ['test/e2e/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    // One browser at a time: 2 cores, and each file starts its own Chromium.
    fileParallelism: false,
  },
});
