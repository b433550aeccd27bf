import { createInterface } from 'node:readline';
import { parseArgs } from 'node:util';
import { password as passwordRule, role as roleSchema } from '../../shared/api/contract';
import { memberAddress, memberName } from '../../shared/api/team-contract';
import { recordActivity } from '../activity/activity.repository';
import { hashPassword } from '../auth/passwords';
import { ConfigError, loadConfig } from '../config';
import { databaseTarget, openDatabase, type Database } from '../db/client';
import { inShop } from '../db/shop-scope';
import { insertShop, listShops } from '../shops/shops.repository';
import { acquireDataLock, DataFolderLockedError } from '../db/data-lock';
import * as team from '../team/team.repository';
import { EXIT, type CliIo } from './cli-io';

export const ADMIN_USAGE = `Usage: borewright admin add --email <address> --name "<name>" [--role admin|designer|bench|viewer]

Adds a member to the shop's database, as the server finds it (DATA_DIR, or DATABASE_URL): the first
admin of a production install, where the demo accounts are off. Others are then invited from the
Team page. The password is read from BOREWRIGHT_PASSWORD, or asked for twice in the terminal.
With the embedded database, stop the server first.`;

/** Where the password comes from: the environment, or the terminal (not echoed). */
export interface PasswordSource {
  fromEnvironment?: string;
  ask?: (question: string) => Promise<string>;
}

/** The member cannot be added as asked; the message says why. */
class RefusedMember extends Error {}

function problem(io: CliIo, message: string): number {
  io.err(`borewright admin: ${message}`);
  return EXIT.unusable;
}

/** The shop a member added here joins: the installation's one shop, made as "Workshop" when there is none yet. */
async function installationShop(db: Database): Promise<number> {
  const shops = await listShops(db);
  if (shops.length > 1) throw new RefusedMember('this database holds several shops, and adding a member to one of them is not offered here; nothing was added.');
  return shops[0]?.id ?? insertShop(db, 'Workshop');
}

/** Stores the member and its activity entry in one transaction, in the installation's shop; refuses an address already taken in any shop. */
export async function addMember(db: Database, member: { email: string; name: string; role: 'admin' | 'designer' | 'bench' | 'viewer'; password: string }): Promise<void> {
  const passwordHash = await hashPassword(member.password);
  if (await team.findMemberByEmail(db, member.email)) throw new RefusedMember(`${member.email} is already a member of the shop; nothing was added.`);
  await inShop(await installationShop(db), () => db.transaction(async (tx) => {
    const added = await team.insertMember(tx, { email: member.email, name: member.name, role: member.role, passwordHash });
    await recordActivity(tx, { userId: null, action: 'member.added', details: { member: added.id, name: added.name, email: added.email, role: added.role, via: 'command line' } });
  }));
}

/** `borewright admin add`: a member without an invitation, for a database without an admin. */
export async function adminCommand(args: string[], io: CliIo, env: Record<string, string | undefined> = process.env, source: PasswordSource = defaultSource(env)): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: { email: { type: 'string' }, name: { type: 'string' }, role: { type: 'string', default: 'admin' }, help: { type: 'boolean', short: 'h' } },
  });
  if (values.help) {
    io.out(ADMIN_USAGE);
    return EXIT.ok;
  }
  if (positionals.length !== 1 || positionals[0] !== 'add') return problem(io, `say "add".\n\n${ADMIN_USAGE}`);

  const email = memberAddress.safeParse(values.email ?? '');
  if (!email.success) return problem(io, `--email ${values.email === undefined ? 'is required' : email.error.issues[0].message}.`);
  const name = memberName.safeParse(values.name ?? '');
  if (!name.success) return problem(io, `--name ${values.name === undefined ? 'is required' : name.error.issues[0].message}.`);
  const role = roleSchema.safeParse(values.role);
  if (!role.success) return problem(io, '--role must be admin, designer, bench or viewer.');

  let password = source.fromEnvironment;
  if (password === undefined) {
    if (!source.ask) return problem(io, 'set BOREWRIGHT_PASSWORD, or run the command in a terminal to be asked for the password.');
    password = await source.ask(`Password for ${email.data}: `);
    if ((await source.ask('The same password again: ')) !== password) return problem(io, 'the two passwords differ; nothing was added.');
  }
  const checked = passwordRule.safeParse(password);
  if (!checked.success) return problem(io, `the password ${checked.error.issues[0].message}.`);

  let lock;
  try {
    const config = loadConfig({ DATA_DIR: env['DATA_DIR'], DATABASE_URL: env['DATABASE_URL'] });
    const target = databaseTarget(config);
    lock = target.engine === 'pglite' ? acquireDataLock(config.dataDir) : undefined;
    const database = await openDatabase(target);
    try {
      await database.migrate();
      await addMember(database.db, { email: email.data, name: name.data, role: role.data, password: checked.data });
    } finally {
      await database.close();
    }
  } catch (err) {
    if (err instanceof ConfigError || err instanceof DataFolderLockedError || err instanceof RefusedMember) return problem(io, err.message);
    throw err;
  } finally {
    lock?.release();
  }
  io.out(`Added ${name.data} <${email.data}> as ${role.data}. They can sign in now.`);
  return EXIT.ok;
}

function defaultSource(env: Record<string, string | undefined>): PasswordSource {
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
