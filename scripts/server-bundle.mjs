// The server and the command line as compiled JavaScript: esbuild bundles their TypeScript (and shared/)
// into dist/server/<name>/, leaving the npm packages to node_modules. A bundle is rebuilt only when one of
// the files it was made from has changed since, so a restart or a command costs no compiling.
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const outRoot = join(root, 'dist/server');

/** The entry points, by the name of their bundle. */
export const ENTRIES = { main: 'server/main.ts', cli: 'server/cli/main.ts' };

/**
 * Worker threads' modules built beside a bundle's entry point, by their file name. The bundle's code finds
 * them through BUNDLED_WORKERS_URL, its own folder's address (server/packs/pack-pool.ts).
 */
const WORKERS = { main: { 'pack-worker': 'server/packs/pack-worker.ts' } };

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

const bundleDir = (name) => join(outRoot, name);
const entryFile = (dir, name) => join(dir, `${name}.mjs`);
const inputsFile = (dir) => join(dir, 'inputs.json');

/** Whether the bundle exists and no file it was made from is newer than it. */
export function isFresh(name) {
  try {
    const dir = bundleDir(name);
    const built = statSync(entryFile(dir, name)).mtimeMs;
    const made = JSON.parse(readFileSync(inputsFile(dir), 'utf8'));
    // The bundle names its sources' own addresses: a checkout moved elsewhere builds anew.
    return made.root === root && made.inputs.every((file) => statSync(join(root, file)).mtimeMs <= built);
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
    packages: 'external',
    sourcemap: 'linked',
    metafile: true,
    logLevel: 'warning',
    plugins: [ownUrl],
  });
  writeFileSync(inputsFile(fresh), JSON.stringify({ root, inputs: Object.keys(result.metafile.inputs) }));
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
