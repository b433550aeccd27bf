import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const BIN = fileURLToPath(new URL('../../bin/borewright.mjs', import.meta.url));

/** Runs the `borewright` command as a user would, in its own process; for the specs. */
export function runCli(...args: string[]): { code: number | null; stdout: string; stderr: string } {
  const result = spawnSync(process.execPath, [BIN, ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** Writes files into a fresh temporary folder and returns their paths; for the specs. */
export function tempFiles(files: Record<string, string>): Record<string, string> {
  const dir = mkdtempSync(join(tmpdir(), 'borewright-cli-'));
  return Object.fromEntries(
    Object.entries(files).map(([name, content]) => {
      const path = join(dir, name);
      writeFileSync(path, content);
      return [name, path];
    }),
  );
}
