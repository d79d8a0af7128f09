import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    // Two cores in CI: forks keep worker_threads tests isolated from each other.
    pool: 'forks',
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
