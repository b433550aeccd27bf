/**
 * `npm run test:pg`: runs tests/pg/ against a throwaway PostgreSQL cluster (tests/pg/cluster.ts) and
 * stops it afterwards, also when the tests fail or the run is interrupted. Installs Debian's postgresql
 * only when no PostgreSQL binaries are found.
 */
import { spawn } from 'node:child_process';
import { findPostgresBin, installPostgres, startCluster } from './cluster';

let bin = findPostgresBin();
if (!bin) {
  console.log("test:pg: no PostgreSQL binaries found; installing Debian's postgresql");
  bin = installPostgres();
}
const cluster = await startCluster(bin, ['borewright_test', 'borewright_restore']);
console.log(`test:pg: PostgreSQL ${cluster.version} on 127.0.0.1:${cluster.port}`);

const vitest = spawn('npx', ['vitest', 'run', '--config', 'tests/pg/vitest.config.ts'], {
  stdio: 'inherit',
  env: { ...process.env, PG_TEST_URL: cluster.url('borewright_test'), PG_TEST_RESTORE_URL: cluster.url('borewright_restore') },
});
// Ctrl-C reaches vitest too (same process group); the cluster is stopped once it has exited.
for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => vitest.kill(signal));
const code = await new Promise<number>((resolve) => vitest.on('exit', (status, signal) => resolve(status ?? (signal ? 1 : 0))));
await cluster.stop();
process.exit(code);
