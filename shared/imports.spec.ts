import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

// shared/ runs in the browser, on the server and in the CLI alike (design.md §5), so its code may import
// only itself, the hardware catalog and the framework-free packages listed here. Specs, benchmarks and test
// builders run in Node and may import more.
const allowedPackages = ['zod', 'zod/mini', 'flatbush', '@svgdotjs/svg.js', '@tarikjabiri/dxf', 'pdf-lib', '@pdf-lib/fontkit', 'jszip', 'papaparse', 'qrcode'];
const root = new URL('.', import.meta.url).pathname;

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === 'bench' || entry.name === 'testing' ? [] : sources(path);
    return entry.name.endsWith('.ts') && !entry.name.endsWith('.spec.ts') ? [path] : [];
  });
}

const files = sources(root).map((path) => ({ name: relative(root, path), text: readFileSync(path, 'utf8') }));

describe("shared/'s imports", () => {
  it('reach only shared/, the catalog and framework-free packages', () => {
    const outside = files.flatMap(({ name, text }) =>
      [...text.matchAll(/from '([^']+)'/g)]
        .map((m) => m[1])
        .filter((spec) => !spec.startsWith('.') && !allowedPackages.includes(spec))
        .map((spec) => `${name}: ${spec}`),
    );
    expect(outside).toEqual([]);
  });

  it("take zod as a namespace, so the browser bundle carries only the parts in use", () => {
    const named = files.filter(({ text }) => /import \{[^}]*\} from 'zod'/.test(text)).map(({ name }) => name);
    expect(named).toEqual([]);
  });
});
