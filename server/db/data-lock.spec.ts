import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { acquireDataLock, DataFolderLockedError, LOCK_FILE } from './data-lock';

const folders: string[] = [];
function freshFolder(): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'borewright-lock-'));
  folders.push(dir);
  return dir;
}
afterEach(() => folders.splice(0).forEach((dir) => rmSync(dir, { recursive: true, force: true })));

/** A PID that is certainly dead: a child that has already exited. */
function deadPid(): number {
  const child = spawnSync(process.execPath, ['-e', 'process.exit(0)']);
  return child.pid ?? 0;
}

describe('acquireDataLock', () => {
  it('writes our PID and removes the file on release', () => {
    const dir = freshFolder();
    const lock = acquireDataLock(dir);
    expect(readFileSync(path.join(dir, LOCK_FILE), 'utf8').trim()).toBe(String(process.pid));
    lock.release();
    expect(existsSync(path.join(dir, LOCK_FILE))).toBe(false);
    lock.release();
  });

  it('refuses a second holder while the first lives, naming the folder and the PID', () => {
    const dir = freshFolder();
    const first = acquireDataLock(dir);
    expect(() => acquireDataLock(dir)).toThrow(DataFolderLockedError);
    expect(() => acquireDataLock(dir)).toThrow(`(PID ${process.pid})`);
    first.release();
    acquireDataLock(dir).release();
  });

  it('takes over a lock whose process has died', () => {
    const dir = freshFolder();
    writeFileSync(path.join(dir, LOCK_FILE), `${deadPid()}\n`);
    const lock = acquireDataLock(dir);
    expect(readFileSync(path.join(dir, LOCK_FILE), 'utf8').trim()).toBe(String(process.pid));
    lock.release();
  });

  it('takes over a garbled lock file', () => {
    const dir = freshFolder();
    writeFileSync(path.join(dir, LOCK_FILE), 'not a pid');
    acquireDataLock(dir).release();
    expect(existsSync(path.join(dir, LOCK_FILE))).toBe(false);
  });
});
