// Whether something built is older than what it was built from, by modification times: the test that
// `npm start` and the command line make on every run before deciding to build, so it reads only
// file times (a few hundred stat calls, some milliseconds) and never a file's content.
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** The newest modification time under a file or folder, the folder's own included (a file removed changes it). */
export function newest(path) {
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return readdirSync(path).reduce((latest, entry) => Math.max(latest, newest(join(path, entry))), stat.mtimeMs);
}

/**
 * Whether `built` exists and nothing of `inputs` (files or folders under `root`) has changed since it was
 * written. A missing input counts as changed: it was moved or deleted since.
 */
export function builtAfter(built, inputs, root) {
  try {
    const time = statSync(built).mtimeMs;
    return inputs.every((input) => newest(join(root, input)) <= time);
  } catch {
    return false;
  }
}

/** npm's record of the installed packages, rewritten by every `npm install` and `npm ci`. */
export const INSTALLED_PACKAGES = 'node_modules/.package-lock.json';

/**
 * What a bundle's freshness is judged by, from esbuild's list of the files it read: its own sources, and
 * for the packages compiled into it npm's record of the installed tree, not each of their files.
 */
export function bundleInputs(files) {
  const own = files.filter((file) => !file.split('/').includes('node_modules'));
  return own.length < files.length ? [...own, INSTALLED_PACKAGES] : own;
}
