import { linkSync, mkdirSync, readFileSync, rmSync, unlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/** The lock file's name inside the data folder. */
export const LOCK_FILE = 'borewright.lock';

/** Another live process holds the data folder; the message says which and what to do. */
export class DataFolderLockedError extends Error {}

export interface DataLock {
  readonly file: string;
  /** Removes the lock file if it is still ours. Safe to call twice. */
  release(): void;
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    // EPERM: the process exists but belongs to someone else.
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Creates the lock file with our PID already in it: a hard link appears whole or not at all, so no one reads it half-written. */
function createExclusive(file: string): boolean {
  const draft = `${file}.${process.pid}`;
  writeFileSync(draft, `${process.pid}\n`);
  try {
    linkSync(draft, file);
    return true;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'EEXIST') return false;
    throw err;
  } finally {
    unlinkSync(draft);
  }
}

function readPid(file: string): number | undefined {
  try {
    const pid = Number.parseInt(readFileSync(file, 'utf8'), 10);
    return Number.isInteger(pid) && pid > 0 ? pid : undefined;
  } catch {
    return undefined;
  }
}

/**
 * Takes the data folder for this process. PGlite does not lock its folder, and a second process
 * on the same folder corrupts it silently, so we hold a file created exclusively with our PID;
 * a lock whose process has died is taken over.
 */
export function acquireDataLock(dataDir: string): DataLock {
  mkdirSync(dataDir, { recursive: true });
  const file = path.resolve(dataDir, LOCK_FILE);
  if (!createExclusive(file)) {
    const holder = readPid(file);
    if (holder !== undefined && isAlive(holder)) {
      throw new DataFolderLockedError(
        `The data folder ${path.dirname(file)} is in use by another Borewright process (PID ${holder}). ` +
          `Stop that process first, or set DATA_DIR to another folder. If no such process runs, delete ${file}.`,
      );
    }
    // The holder died without cleaning up. Remove its file (unless another taker replaced it meanwhile) and retry
    // once: if another process wins that race, it holds the lock.
    if (readPid(file) === holder) rmSync(file, { force: true });
    if (!createExclusive(file)) {
      throw new DataFolderLockedError(`Another Borewright process took the data folder ${path.dirname(file)} at the same moment; try again.`);
    }
  }
  let held = true;
  const onExit = () => lock.release();
  const lock: DataLock = {
    file,
    release() {
      if (!held) return;
      held = false;
      process.off('exit', onExit);
      if (readPid(file) === process.pid) unlinkSync(file);
    },
  };
  // A crash that still runs exit handlers should not leave the lock behind for the next start.
  process.on('exit', onExit);
  return lock;
}
