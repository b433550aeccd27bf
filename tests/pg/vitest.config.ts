import { defineConfig } from 'vitest/config';

// Only `npm run test:pg` (tests/pg/run.ts) runs this, with PG_TEST_URL pointing at its throwaway cluster.
export default defineConfig({
  test: {
    include: ['tests/pg/**/*.spec.ts'],
    environment: 'node',
    // The files share one database, and each starts by emptying it.
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
