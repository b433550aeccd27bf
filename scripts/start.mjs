// npm start: builds the app only when a file it is made from has changed since its last build (or it was
// never built), then runs the server from its compiled bundle (scripts/server-bundle.mjs), so that a
// restart on an unchanged checkout costs no compiling.
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { freshBundle } from './server-bundle.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
/** What the app is built from: its sources, the shared code it imports, the build's settings and the packages. */
const APP_INPUTS = ['src', 'shared', 'hardware-catalog', 'scripts/icon-font.mjs', 'angular.json', 'tsconfig.json', 'tsconfig.app.json', 'package-lock.json'];
const STAMP = join(root, 'dist/borewright/.built-from-sources');

/** The newest modification time under a file or folder. */
function newest(path) {
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return readdirSync(path).reduce((latest, entry) => Math.max(latest, newest(join(path, entry))), stat.mtimeMs);
}

function appIsFresh() {
  if (!existsSync(STAMP)) return false;
  const built = statSync(STAMP).mtimeMs;
  return APP_INPUTS.every((input) => newest(join(root, input)) <= built);
}

if (appIsFresh()) {
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
