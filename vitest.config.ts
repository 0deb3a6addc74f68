import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    testTimeout: 180_000,
    hookTimeout: 180_000,
    pool: 'forks',
    // Both cores: the default leaves one free, which doubles the suite's wall time on a 2-core machine.
    maxWorkers: 2,
  },
});
