// The weight of the first page: every script and stylesheet the built index.html loads before any route's
// lazy chunk (its scripts, stylesheets and module preloads, and every module those import statically),
// gzipped as a server would send them, and the fonts its stylesheets name. Reads dist/borewright/browser
// (run `npm run build` first).
//
//   npm run bench:page            [--max-kb=120] exits 1 when the first page weighs more
import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

const browser = fileURLToPath(new URL('../dist/borewright/browser/', import.meta.url));
if (!existsSync(join(browser, 'index.html'))) {
  console.error('No built app in dist/borewright/browser: run `npm run build` first.');
  process.exit(1);
}

/** A module's static imports (`import … from "./x.js"`, `import "./x.js"`, `export … from "./x.js"`), not `import("./x.js")`. */
function staticImports(source) {
  const found = new Set();
  for (const m of source.matchAll(/(?:\bimport|\bexport)\s*(?:[\w${}\s,*]*?\s*from\s*)?["'](\.\/[^"']+\.js)["']/g)) found.add(m[1].slice(2));
  return [...found];
}

const html = readFileSync(join(browser, 'index.html'), 'utf8');
const entries = [...html.matchAll(/<(?:script[^>]*\ssrc|link[^>]*\shref)="([^"]+\.(?:js|css))"/g)].map((m) => m[1]);
const files = new Set();
const queue = [...entries];
while (queue.length > 0) {
  const file = queue.shift();
  if (files.has(file)) continue;
  files.add(file);
  if (file.endsWith('.js')) queue.push(...staticImports(readFileSync(join(browser, file), 'utf8')));
}

const kb = (bytes) => (bytes / 1000).toFixed(1).padStart(7);
const rows = [...files].map((file) => {
  const bytes = readFileSync(join(browser, file));
  return { file, raw: bytes.length, gzip: gzipSync(bytes, { level: 9 }).length };
});
rows.sort((a, b) => b.gzip - a.gzip);
const total = rows.reduce((sum, r) => sum + r.gzip, 0);
console.log('First page: what index.html loads before any lazy chunk (kB = 1000 bytes, gzip level 9)');
for (const r of rows) console.log(`  ${r.file.padEnd(32)} ${kb(r.raw)} kB raw ${kb(r.gzip)} kB gzip`);
console.log(`  ${'JS and CSS'.padEnd(32)} ${kb(rows.reduce((s, r) => s + r.raw, 0))} kB raw ${kb(total)} kB gzip`);

// Fonts the stylesheets name: fetched as soon as text in them is shown, so part of the first page too.
const fonts = new Set(rows.filter((r) => r.file.endsWith('.css')).flatMap((r) => [...readFileSync(join(browser, r.file), 'utf8').matchAll(/url\(["']?([^"')]+\.woff2)["']?\)/g)].map((m) => m[1])));
const icons = [...fonts].filter((f) => f.includes('material-symbols'));
for (const font of icons) console.log(`  icon font ${font.padEnd(22)} ${kb(statSync(join(browser, font)).size)} kB woff2`);

const limit = process.argv.find((a) => a.startsWith('--max-kb='));
if (limit && total / 1000 > Number(limit.slice('--max-kb='.length))) {
  console.log(`The first page is over ${limit.slice('--max-kb='.length)} kB gzip.`);
  process.exit(1);
}
