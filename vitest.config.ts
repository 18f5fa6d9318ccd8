import { defineConfig } from 'vitest/config';

// Unit tests: pure Node, no browser. Browser tests live in tests/e2e and use vitest.e2e.config.ts.
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    testTimeout: 60_000,
  },
});
