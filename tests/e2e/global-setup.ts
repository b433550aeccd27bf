import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { startThrowawayServer } from '../throwaway-server';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

/** Builds the app, starts the real server as a user would (same entry point) and hands its URL to the tests. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const root = process.cwd();
  if (!process.env['E2E_SKIP_BUILD'] || !existsSync(join(root, 'dist/borewright/browser/index.html'))) {
    // `npm run build`: the icon font cut to the icons the sources name, then `ng build`.
    execFileSync('npm', ['run', 'build'], { cwd: root, stdio: 'inherit', env: { ...process.env, NG_CLI_ANALYTICS: 'false' } });
  }
  const server = await startThrowawayServer();
  project.provide('baseUrl', server.baseUrl);
  return server.stop;
}
