// npm start: builds the app only when a file it is made from has changed since its last build (or it was
// never built), then runs the server from its compiled bundle (scripts/server-bundle.mjs), so that a
// restart on an unchanged checkout costs no compiling.
import { spawnSync } from 'node:child_process';
import { utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { builtAfter } from './freshness.mjs';
import { freshBundle } from './server-bundle.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
/** What the app is built from: its sources, the shared code it imports, the build's settings and the packages. */
const APP_INPUTS = ['src', 'shared', 'hardware-catalog', 'scripts/icon-font.mjs', 'angular.json', 'tsconfig.json', 'tsconfig.app.json', 'package-lock.json'];
const STAMP = join(root, 'dist/borewright/.built-from-sources');

if (builtAfter(STAMP, APP_INPUTS, root)) {
  console.log('The app is built and its sources are unchanged: no build needed.');
} else {
  // The stamp takes the time the build started, so a file changed during the build counts as changed.
  const started = new Date();
  // `npm run build`: the icon font cut to the icons the sources name (scripts/icon-font.mjs), then `ng build`.
  const build = spawnSync('npm', ['run', 'build'], { cwd: root, stdio: 'inherit', env: { NG_CLI_ANALYTICS: 'false', ...process.env } });
  if (build.status !== 0) process.exit(build.status ?? 1);
  writeFileSync(STAMP, 'The app in this folder was built from the sources as they were at this file\'s time.\n');
  utimesSync(STAMP, started, started);
}

await import(await freshBundle('main'));
