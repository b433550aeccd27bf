import { defineConfig } from 'vitest/config';

// The root run covers shared/, server/, the build scripts and the node-side tests; the Angular specs under src/
// run through `ng test`, which brings the Angular compiler. The include list is split in two
// projects: the server's specs share database templates made once per run
// (server/testing/global-setup.ts), and a run of shared/ specs alone need not wait for them.
// tests/pg/ runs only against a real PostgreSQL server, through `npm run test:pg`.
export default defineConfig({
  test: {
    exclude: ['tests/e2e/**', 'tests/pg/**', 'node_modules/**'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    projects: [
      { extends: true, test: { name: 'shared', include: ['shared/**/*.spec.ts'] } },
      { extends: true, test: { name: 'scripts', include: ['scripts/**/*.spec.ts'] } },
      {
        extends: true,
        test: {
          name: 'server',
          include: ['server/**/*.spec.ts', 'tests/**/*.spec.ts'],
          globalSetup: ['server/testing/global-setup.ts'],
        },
      },
    ],
  },
});
