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
    // What the page should come to show, waited for up to 10 s (not Vitest's 1 s): a save and the reload
    // after it can take seconds on a busy CI machine, and a poll that gives up early fails a right page.
    expect: { poll: { timeout: 10_000 } },
  },
});
