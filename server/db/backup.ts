/**
 * `npm run backup` writes every table of the configured database to backups/borewright-<time>.json.
 * `npm run backup -- restore <file>` loads such a file into an empty database (a new DATA_DIR, or
 * an empty DATABASE_URL database). With PGlite, stop the server first: the data folder is locked.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { ConfigError, loadConfig } from '../config';
import { databaseTarget, openDatabase } from './client';
import { acquireDataLock, DataFolderLockedError } from './data-lock';
import { dumpTables, restoreTables, RestoreError, type Backup } from './table-dump';

const BACKUP_DIR = 'backups';

async function run(args: string[]): Promise<string> {
  const [command = 'backup', file] = args;
  if (command !== 'backup' && command !== 'restore') throw new ConfigError(`unknown command "${command}": use no argument to back up, or "restore <file>"`);
  if (command === 'restore' && !file) throw new ConfigError('restore needs the backup file: npm run backup -- restore backups/borewright-….json');
  const config = loadConfig(process.env);
  const target = databaseTarget(config);
  const lock = target.engine === 'pglite' ? acquireDataLock(config.dataDir) : undefined;
  const database = await openDatabase(target);
  try {
    await database.migrate();
    if (command === 'restore') {
      await restoreTables(database.db, JSON.parse(readFileSync(file!, 'utf8')) as Backup);
      return `Restored ${file}.`;
    }
    const now = new Date();
    const backup = await dumpTables(database.db, now);
    mkdirSync(BACKUP_DIR, { recursive: true });
    const out = path.join(BACKUP_DIR, `borewright-${now.toISOString().replace(/[:.]/g, '-')}.json`);
    writeFileSync(out, JSON.stringify(backup));
    const counts = Object.entries(backup.tables).map(([name, rows]) => `${name} ${rows.length}`);
    return `Wrote ${out} (${counts.join(', ')}).`;
  } finally {
    await database.close();
    lock?.release();
  }
}

try {
  console.log(await run(process.argv.slice(2)));
} catch (err) {
  if (!(err instanceof ConfigError || err instanceof DataFolderLockedError || err instanceof RestoreError || err instanceof SyntaxError)) throw err;
  console.error(`Backup failed: ${err.message}`);
  process.exitCode = 1;
}
