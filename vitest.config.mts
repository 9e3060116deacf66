import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    environment: 'node',
    pool: 'forks',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // CI asks for a JSON report beside the console output, to print its own pass/fail line.
    reporters: process.env.CW_VITEST_JSON ? ['default', 'json'] : ['default'],
    outputFile: process.env.CW_VITEST_JSON ? { json: process.env.CW_VITEST_JSON } : undefined,
  },
});
