import { mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { builtAfter, bundleInputs, INSTALLED_PACKAGES } from './freshness.mjs';

let root: string;
const HOUR = 3_600_000;
const at = (path: string, ms: number) => utimesSync(join(root, path), ms / 1000, ms / 1000);
const write = (path: string, ms: number) => {
  mkdirSync(join(root, path, '..'), { recursive: true });
  writeFileSync(join(root, path), path);
  at(path, ms);
};

// A checkout as a build left it: sources an hour older than what was built from them.
const built = Date.now() - HOUR;
beforeEach(() => {
  root = mkdtempSync(join(tmpdir(), 'borewright-freshness-'));
  write('src/app/a.ts', built - HOUR);
  write('src/app/deep/b.ts', built - HOUR);
  at('src/app/deep', built - HOUR);
  at('src/app', built - HOUR);
  at('src', built - HOUR);
  write('angular.json', built - HOUR);
  write('dist/out.mjs', built);
});
afterEach(() => rmSync(root, { recursive: true, force: true }));

describe('builtAfter', () => {
  const inputs = ['src', 'angular.json'];

  it('finds an untouched tree built', () => {
    expect(builtAfter(join(root, 'dist/out.mjs'), inputs, root)).toBe(true);
  });

  it('finds it stale when a source deep in a folder was saved since', () => {
    at('src/app/deep/b.ts', built + 1000);
    expect(builtAfter(join(root, 'dist/out.mjs'), inputs, root)).toBe(false);
  });

  it('finds it stale when a file was added or removed (the folder changes)', () => {
    at('src/app', built + 1000);
    expect(builtAfter(join(root, 'dist/out.mjs'), inputs, root)).toBe(false);
  });

  it('finds it stale when a file it was made from is gone, or it was never built', () => {
    rmSync(join(root, 'angular.json'));
    expect(builtAfter(join(root, 'dist/out.mjs'), inputs, root)).toBe(false);
    expect(builtAfter(join(root, 'dist/none.mjs'), ['src'], root)).toBe(false);
  });

  it('counts a source saved during the build as changed', () => {
    at('src/app/a.ts', built + 1);
    expect(builtAfter(join(root, 'dist/out.mjs'), ['src/app/a.ts'], root)).toBe(false);
  });
});

describe('bundleInputs', () => {
  it("judges compiled-in packages by npm's record of the install, not by their files", () => {
    const files = ['server/main.ts', 'node_modules/zod/v4/core/core.js', 'node_modules/pdf-lib/cjs/index.js', 'shared/model/job-document.ts'];
    expect(bundleInputs(files)).toEqual(['server/main.ts', 'shared/model/job-document.ts', INSTALLED_PACKAGES]);
    expect(bundleInputs(['server/main.ts'])).toEqual(['server/main.ts']);
  });

  it('makes a bundle stale after an install, and not otherwise', () => {
    write(INSTALLED_PACKAGES, built - HOUR);
    const inputs = bundleInputs(['src/app/a.ts', 'node_modules/zod/index.js']);
    expect(builtAfter(join(root, 'dist/out.mjs'), inputs, root)).toBe(true);
    at(INSTALLED_PACKAGES, built + 1000);
    expect(builtAfter(join(root, 'dist/out.mjs'), inputs, root)).toBe(false);
  });
});
