import { defineConfig } from 'vitest/config';

// Test layout mirrors src/. Console output during a test is treated as a failure
// (see test/setup.ts) unless the test captures it deliberately.
export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    setupFiles: ['test/setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
