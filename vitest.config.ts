import { defineConfig } from 'vitest/config';

// Unit and reference tests of the pure core (Node, no browser).
export default defineConfig({
  test: {
    include: ['test/thermo/**/*.test.ts', 'test/unit/**/*.test.ts', 'test/house/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
  },
});
