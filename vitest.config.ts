import { defineConfig } from 'vitest/config';

// Unit tests: pure Node, no browser. Browser tests live in tests/e2e and use vitest.e2e.config.ts.
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    // Both cores of the CI machine: the default leaves one idle. Threads start faster than forked
    // processes; each test file still gets its own module graph (isolation stays on).
    pool: 'threads',
    maxWorkers: 2,
    // Property tests run on a fixed seed per test (printed on failure); `npm run fuzz` draws fresh ones.
    setupFiles: ['tests/setup/propertySeed.ts'],
    // Not a speed limit (speed goals are in `npm run bench`): a stop for a test that never ends, set so generous
    // (about 20× the slowest test file on a shared 2-core machine) that a busy machine cannot trip it.
    testTimeout: 600_000,
  },
});
