import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { freePort } from '../free-port';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
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

/** Builds the app, starts the real server as a user would (same entry point) and hands its URL to the tests. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const root = process.cwd();
  if (!process.env['E2E_SKIP_BUILD'] || !existsSync(join(root, 'dist/borewright/browser/index.html'))) {
    // `npm run build`: the icon font cut to the icons the sources name, then `ng build`.
    execFileSync('npm', ['run', 'build'], { cwd: root, stdio: 'inherit', env: { ...process.env, NG_CLI_ANALYTICS: 'false' } });
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'borewright-e2e-'));
  const port = await freePort();
  // Node itself with tsx as a loader, not through npx, so that SIGTERM reaches the server and not a wrapper.
  const server = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    cwd: root,
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, NODE_ENV: 'test', LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  await waitForHealth(baseUrl, server, 90);
  project.provide('baseUrl', baseUrl);
  return async () => {
    const exited = new Promise((resolve) => server.once('exit', resolve));
    server.kill('SIGTERM');
    await exited;
    rmSync(dataDir, { recursive: true, force: true });
  };
}
