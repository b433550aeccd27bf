import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { LOCK_FILE } from './db/data-lock';

const main = fileURLToPath(new URL('./main.ts', import.meta.url));
const dir = mkdtempSync(path.join(tmpdir(), 'borewright-main-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function start(env: Record<string, string>) {
  // An empty DATABASE_URL counts as unset: the server uses the data folder whatever the caller's environment holds.
  return spawnSync(process.execPath, ['--import', 'tsx', main], { env: { ...process.env, DATABASE_URL: '', ...env }, encoding: 'utf8', timeout: 60_000 });
}

describe('server/main.ts', () => {
  it('refuses to start on a data folder another live process holds, naming it, and leaves its lock alone', () => {
    // This test process stands in for the first server: its PID is alive.
    writeFileSync(path.join(dir, LOCK_FILE), `${process.pid}\n`);
    const second = start({ DATA_DIR: dir, PORT: '3999', NODE_ENV: 'development' });
    expect(second.status).toBe(1);
    expect(second.stderr).toContain(`Borewright cannot start: The data folder ${dir} is in use by another Borewright process (PID ${process.pid})`);
    expect(readFileSync(path.join(dir, LOCK_FILE), 'utf8').trim()).toBe(String(process.pid));
  });

  it('names the bad variable and stops before touching any data', () => {
    const bad = start({ DATA_DIR: path.join(dir, 'never'), PORT: 'eighty', NODE_ENV: 'development' });
    expect(bad.status).toBe(1);
    expect(bad.stderr).toContain('PORT: must be a whole number');
    expect(() => readFileSync(path.join(dir, 'never', LOCK_FILE))).toThrow();
  });
});
