import { defineConfig } from 'vitest/config';

// Browser tests: real Chromium against production builds made by scripts/run-e2e.mjs.
// One file at a time: each starts a browser, and the machines have two cores.
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.test.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
