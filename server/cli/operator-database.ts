import { createInterface } from 'node:readline';
import { password as passwordRule } from '../../shared/api/contract';
import { ConfigError, loadConfig } from '../config';
import { databaseTarget, openDatabase, type Database } from '../db/client';
import { acquireDataLock, DataFolderLockedError } from '../db/data-lock';

/**
 * What the operator's commands (`admin`, `shop`) share: the database as the server finds it, and a new
 * member's password from the environment or the terminal.
 */

/** The operator's request cannot be done as asked; the message says why, and nothing was changed. */
export class Refused extends Error {}

/**
 * Opens the database as the server finds it (DATA_DIR, or DATABASE_URL), migrated, runs `work` on it as
 * the connecting role (outside any shop's scope) and closes it. With the embedded database its folder is
 * locked meanwhile, so a running server makes this refuse rather than corrupt it. Returns the problem's
 * message when the environment, the lock or `work` refused.
 */
export async function withOperatorDatabase<T>(env: Record<string, string | undefined>, work: (db: Database) => Promise<T>): Promise<{ done: T } | { problem: string }> {
  let lock;
  try {
    const config = loadConfig({ DATA_DIR: env['DATA_DIR'], DATABASE_URL: env['DATABASE_URL'] });
    const target = databaseTarget(config);
    lock = target.engine === 'pglite' ? acquireDataLock(config.dataDir) : undefined;
    const database = await openDatabase(target);
    try {
      await database.migrate();
      return { done: await work(database.db) };
    } finally {
      await database.close();
    }
  } catch (err) {
    if (err instanceof ConfigError || err instanceof DataFolderLockedError || err instanceof Refused) return { problem: err.message };
    throw err;
  } finally {
    lock?.release();
  }
}

/** Where a new member's password comes from: the environment, or the terminal (not echoed). */
export interface PasswordSource {
  fromEnvironment?: string;
  ask?: (question: string) => Promise<string>;
}

/** The password for `email`, checked against the app's rule; or the problem to print. */
export async function readPassword(source: PasswordSource, email: string): Promise<{ password: string } | { problem: string }> {
  let password = source.fromEnvironment;
  if (password === undefined) {
    if (!source.ask) return { problem: 'set BOREWRIGHT_PASSWORD, or run the command in a terminal to be asked for the password.' };
    password = await source.ask(`Password for ${email}: `);
    if ((await source.ask('The same password again: ')) !== password) return { problem: 'the two passwords differ; nothing was added.' };
  }
  const checked = passwordRule.safeParse(password);
  return checked.success ? { password: checked.data } : { problem: `the password ${checked.error.issues[0].message}.` };
}

export function defaultPasswordSource(env: Record<string, string | undefined>): PasswordSource {
  return { fromEnvironment: env['BOREWRIGHT_PASSWORD'], ask: process.stdin.isTTY ? askHidden : undefined };
}

/** Asks in the terminal without echoing what is typed. */
function askHidden(question: string): Promise<string> {
  const terminal = createInterface({ input: process.stdin, output: process.stdout, terminal: true });
  // readline echoes through this method; while the answer is typed it writes nothing.
  const write = (terminal as unknown as { _writeToOutput: (text: string) => void })._writeToOutput.bind(terminal);
  let asking = true;
  (terminal as unknown as { _writeToOutput: (text: string) => void })._writeToOutput = (text) => {
    if (!asking || text === question) write(text);
  };
  return new Promise((resolve) =>
    terminal.question(question, (answer) => {
      asking = false;
      process.stdout.write('\n');
      terminal.close();
      resolve(answer);
    }),
  );
}
