import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort } from './free-port';

/** A real server on a free port of 127.0.0.1 with a data folder of its own, removed when it stops. */
export interface ThrowawayServer {
  baseUrl: string;
  /** The server's process id (benches read its CPU time). */
  pid: number;
  stop(): Promise<void>;
}

async function waitForHealth(url: string, server: ChildProcess, seconds: number): Promise<void> {
  const until = Date.now() + seconds * 1000;
  while (Date.now() < until) {
    if (server.exitCode !== null) throw new Error(`the server exited with code ${server.exitCode} before it answered`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the server did not answer ${url}/api/health within ${seconds} s`);
}

/**
 * Starts the server as a user would (same entry point, the demo shop seeded into a fresh data folder) and
 * waits until it answers. `nodeArgs` go to Node before the entry point (e.g. `--cpu-prof`); `env` adds to
 * the server's environment (e.g. SIGNUP or SMTP_URL; DATABASE_URL and SESSION_SECRET for one of several
 * servers on one PostgreSQL, which then seeds nothing the database already holds).
 */
export async function startThrowawayServer(
  options: { nodeArgs?: string[]; logLevel?: string; seconds?: number; env?: Record<string, string> } = {},
): Promise<ThrowawayServer> {
  const dataDir = mkdtempSync(join(tmpdir(), 'borewright-server-'));
  const port = await freePort();
  // Node itself with tsx as a loader, not through npx, so that SIGTERM reaches the server and not a wrapper.
  const server = spawn(process.execPath, [...(options.nodeArgs ?? []), '--import', 'tsx', 'server/main.ts'], {
    cwd: process.cwd(),
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, NODE_ENV: 'test', LOG_LEVEL: options.logLevel ?? 'warn', ...options.env },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  const stop = async () => {
    if (server.exitCode === null && server.signalCode === null) {
      const exited = new Promise((resolve) => server.once('exit', resolve));
      server.kill('SIGTERM');
      await exited;
    }
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitForHealth(baseUrl, server, options.seconds ?? 90);
  } catch (err) {
    await stop();
    throw err;
  }
  return { baseUrl, pid: server.pid!, stop };
}
