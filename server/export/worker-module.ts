declare const BUNDLED_WORKERS_URL: string | undefined;

/**
 * A worker thread's module by its name: in a bundle (scripts/server-bundle.mjs builds each worker beside
 * its entry point and says where) the compiled `<name>.mjs`; from the sources (tests, development, benches)
 * the TypeScript file beside `here`, loaded through tsx.
 */
export function workerModule(name: string, here: string): { filename: string; execArgv: string[] } {
  if (typeof BUNDLED_WORKERS_URL === 'string') return { filename: new URL(`${name}.mjs`, BUNDLED_WORKERS_URL).href, execArgv: [] };
  // Only the loader: a worker takes none of the process's own flags (a profiler's, say) once given these.
  return { filename: new URL(`./${name}.ts`, here).href, execArgv: ['--import', 'tsx'] };
}
