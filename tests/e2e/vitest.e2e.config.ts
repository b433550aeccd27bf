import { defineConfig } from 'vitest/config';

// Browser tests: one server for the whole run (started by global-setup.ts on a free port with a
// throwaway data folder), Debian's chromium driven by playwright-core, files run one at a time.
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    globalSetup: ['tests/e2e/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
