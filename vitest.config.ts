import { defineConfig } from 'vitest/config';

// The root run covers shared/ and server/ and the node-side tests; the Angular specs under src/
// run through `ng test`, which brings the Angular compiler.
export default defineConfig({
  test: {
    include: ['shared/**/*.spec.ts', 'server/**/*.spec.ts', 'tests/**/*.spec.ts'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
