// The server and the command line as compiled JavaScript: esbuild bundles their TypeScript (and shared/)
// into dist/server/<name>/, with the npm packages that are plain script (INLINE) and leaving the rest to
// node_modules. A bundle is rebuilt only when one of the files it was made from has changed since, so a
// restart or a command costs no compiling.
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { builtAfter, bundleInputs } from './freshness.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const outRoot = join(root, 'dist/server');

/** The entry points, by the name of their bundle. */
export const ENTRIES = { main: 'server/main.ts', cli: 'server/cli/main.ts' };

/**
 * Worker threads' modules built beside a bundle's entry point, by their file name. The bundle's code finds
 * them through BUNDLED_WORKERS_URL, its own folder's address (server/export/worker-module.ts).
 */
const PANEL_FILES_WORKER = { 'panel-files-worker': 'server/export/panel-files-worker.ts' };
const WORKERS = { main: { 'pack-worker': 'server/packs/pack-worker.ts', ...PANEL_FILES_WORKER }, cli: PANEL_FILES_WORKER };

/**
 * Sources find their files (fonts, migrations, the built app) relative to themselves: each keeps its own
 * import.meta.url inside the bundle, as the file it was compiled from.
 */
const ownUrl = {
  name: 'own-import-meta-url',
  setup(build) {
    build.onLoad({ filter: /\.ts$/ }, (args) => ({
      contents: readFileSync(args.path, 'utf8').replaceAll('import.meta.url', JSON.stringify(pathToFileURL(args.path).href)),
      loader: 'ts',
    }));
  },
};

/**
 * Packages compiled into the bundles, with what they import: loading each from node_modules costs Node a
 * file lookup and a compile per module (pdf-lib alone is 139 files), which was half of a start and a
 * third of a `borewright check`. These are plain script that find no file beside themselves.
 */
const INLINE = ['zod', 'flatbush', 'pdf-lib', '@pdf-lib/fontkit', 'jszip', 'qrcode', 'papaparse', '@svgdotjs/svg.js', 'drizzle-orm', 'express', 'mailparser'];
/**
 * Packages always loaded from node_modules, even when an inlined one imports them: they read files beside
 * themselves (PGlite's WebAssembly and data, svgdom's fonts), start workers from their own files (pino),
 * or may load a native addon (pg).
 */
const KEEP_EXTERNAL = ['@electric-sql/pglite', 'pg', 'pino', 'svgdom', 'esbuild'];

const packageName = (specifier) => specifier.split('/').slice(0, specifier.startsWith('@') ? 2 : 1).join('/');

/** Which bare imports become part of the bundle and which stay imports of node_modules. */
const inlinePackages = {
  name: 'inline-packages',
  setup(build) {
    build.onResolve({ filter: /^[^./]/ }, (args) => {
      const name = packageName(args.path);
      if (args.path.startsWith('node:') || KEEP_EXTERNAL.includes(name)) return { external: true };
      // What an inlined package imports comes along with it; the sources' own imports only when listed.
      const fromPackage = args.importer.split(/[\\/]/).includes('node_modules');
      return fromPackage || INLINE.includes(name) ? undefined : { external: true };
    });
  },
};

/**
 * Script compiled in from CommonJS packages calls require() for Node's own modules: give the bundle's
 * modules a require of their own.
 */
const REQUIRE_BANNER = "import { createRequire as __bundleRequire } from 'node:module'; const require = __bundleRequire(import.meta.url);";

const bundleDir = (name) => join(outRoot, name);
const entryFile = (dir, name) => join(dir, `${name}.mjs`);
const inputsFile = (dir) => join(dir, 'inputs.json');

/** Whether the bundle exists, was built in this folder, and no file it was made from is newer than it. */
export function isFresh(name) {
  const dir = bundleDir(name);
  try {
    const made = JSON.parse(readFileSync(inputsFile(dir), 'utf8'));
    // The bundle names its sources' own addresses: a checkout moved elsewhere builds anew.
    return made.root === root && builtAfter(entryFile(dir, name), made.inputs, root);
  } catch {
    return false;
  }
}

/**
 * Builds one bundle into a folder of its own and puts it in place in one rename, so that two commands
 * started at once never import a half-written bundle: the one that renames second keeps the first's.
 */
export async function buildBundle(name) {
  const { build } = await import('esbuild');
  const dir = bundleDir(name);
  const fresh = `${dir}.${process.pid}.new`;
  rmSync(fresh, { recursive: true, force: true });
  const result = await build({
    absWorkingDir: root,
    entryPoints: {
      [name]: join(root, ENTRIES[name]),
      ...Object.fromEntries(Object.entries(WORKERS[name] ?? {}).map(([file, source]) => [file, join(root, source)])),
    },
    define: { BUNDLED_WORKERS_URL: JSON.stringify(pathToFileURL(`${dir}/`).href) },
    // Split, so that what a command imports only when it runs (pdf-lib for a pack, say) loads only then.
    outdir: fresh,
    entryNames: '[name]',
    chunkNames: 'chunks/[name]-[hash]',
    outExtension: { '.js': '.mjs' },
    splitting: true,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    banner: { js: REQUIRE_BANNER },
    sourcemap: 'linked',
    metafile: true,
    logLevel: 'warning',
    plugins: [inlinePackages, ownUrl],
  });
  writeFileSync(inputsFile(fresh), JSON.stringify({ root, inputs: bundleInputs(Object.keys(result.metafile.inputs)) }));
  mkdirSync(outRoot, { recursive: true });
  const stale = `${dir}.${process.pid}.old`;
  if (existsSync(dir)) renameSync(dir, stale);
  try {
    renameSync(fresh, dir);
  } catch {
    // Another process put its bundle in place first: the same sources, so keep it.
    rmSync(fresh, { recursive: true, force: true });
  }
  rmSync(stale, { recursive: true, force: true });
}

/** The bundle's address to import, built first when it is missing or older than its sources. */
export async function freshBundle(name) {
  if (!isFresh(name)) await buildBundle(name);
  return pathToFileURL(entryFile(bundleDir(name), name)).href;
}
