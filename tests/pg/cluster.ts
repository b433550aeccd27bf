import { execFileSync, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort } from '../free-port';

/**
 * A throwaway PostgreSQL cluster on 127.0.0.1, on a free port, in a temporary folder, started with
 * Debian's binaries (/usr/lib/postgresql/<version>/bin) and stopped by its PID. `npm run test:pg`
 * (tests/pg/run.ts) and the PostgreSQL bench (tests/bench/api-postgres.bench.ts) both start theirs here.
 */
export interface PostgresCluster {
  /** The server's version, as `postgres --version` gives it (e.g. 15.14). */
  version: string;
  port: number;
  /** A URL that connects to `database` as the cluster's superuser (no password: trust on 127.0.0.1). */
  url(database: string): string;
  /** Fast shutdown (sessions ended, a checkpoint written), then the folder removed. Safe to call twice. */
  stop(): Promise<void>;
}

const DEBIAN_ROOT = '/usr/lib/postgresql';

/** The bin folder of the newest PostgreSQL Debian installed, or undefined when there is none. */
export function findPostgresBin(): string | undefined {
  if (!existsSync(DEBIAN_ROOT)) return undefined;
  const versions = readdirSync(DEBIAN_ROOT)
    .filter((v) => existsSync(join(DEBIAN_ROOT, v, 'bin', 'postgres')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(DEBIAN_ROOT, versions[0], 'bin') : undefined;
}

/** Installs Debian's postgresql package (CI's fresh machines) and returns its bin folder. */
export function installPostgres(): string {
  const quiet = { stdio: 'ignore' as const };
  if (spawnSync('apt-cache', ['show', 'postgresql'], quiet).status !== 0) execFileSync('apt-get', ['update', '-qq'], quiet);
  execFileSync('apt-get', ['install', '-y', '-qq', 'postgresql'], { ...quiet, env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  const bin = findPostgresBin();
  if (!bin) throw new Error('postgresql was installed, but no binaries are in /usr/lib/postgresql/*/bin');
  return bin;
}

const asRoot = process.getuid?.() === 0;

/** PostgreSQL refuses to run as root: as root, the cluster runs as the postgres user. */
function asOwner(command: string, args: string[]): void {
  const [file, argv] = asRoot ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
  execFileSync(file, argv, { stdio: ['ignore', 'ignore', 'pipe'] });
}

function running(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/**
 * Starts a cluster with the given databases made empty. `settings` are extra server settings
 * (`-c name=value`); fsync is always off, as the cluster lives for one run.
 */
export async function startCluster(bin: string, databases: string[], settings: Record<string, string> = {}): Promise<PostgresCluster> {
  const work = mkdtempSync(join(tmpdir(), 'borewright-pg.'));
  if (asRoot) {
    const uid = Number(execFileSync('id', ['-u', 'postgres'], { encoding: 'utf8' }));
    chownSync(work, uid, -1);
  }
  const port = await freePort();
  const version = execFileSync(join(bin, 'postgres'), ['--version'], { encoding: 'utf8' }).trim().split(' ')[2];
  let pid: number | undefined;
  const stop = async () => {
    if (pid !== undefined && running(pid)) {
      // Fast shutdown, waited for (a busy machine can take seconds to write the last checkpoint), so the
      // folder is removed only once nothing writes in it; should that fail, no checkpoint at all.
      try {
        asOwner(join(bin, 'pg_ctl'), ['-D', `${work}/data`, '-m', 'fast', '-w', '-t', '60', 'stop']);
      } catch {
        process.kill(pid, 'SIGQUIT');
        for (let i = 0; i < 100 && running(pid); i++) await new Promise((r) => setTimeout(r, 100));
      }
    }
    pid = undefined;
    rmSync(work, { recursive: true, force: true, maxRetries: 5 });
  };
  try {
    asOwner(join(bin, 'initdb'), ['-D', `${work}/data`, '-U', 'postgres', '-A', 'trust', '-E', 'UTF8', '--no-sync']);
    const options = ['-h 127.0.0.1', `-p ${port}`, `-k ${work}`, '-c fsync=off', ...Object.entries(settings).map(([k, v]) => `-c ${k}=${v}`)];
    asOwner(join(bin, 'pg_ctl'), ['-D', `${work}/data`, '-l', `${work}/server.log`, '-w', '-o', options.join(' '), 'start']);
    pid = Number(readFileSync(`${work}/data/postmaster.pid`, 'utf8').split('\n')[0]);
    for (const database of databases) asOwner(join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-q', '-c', `create database ${database}`]);
  } catch (err) {
    await stop();
    throw err;
  }
  return { version, port, url: (database) => `postgres://postgres@127.0.0.1:${port}/${database}`, stop };
}
