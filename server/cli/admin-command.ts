import { parseArgs } from 'node:util';
import { role as roleSchema } from '../../shared/api/contract';
import { memberAddress, memberName } from '../../shared/api/team-contract';
import { recordActivity } from '../activity/activity.repository';
import { hashPassword } from '../auth/passwords';
import type { Database } from '../db/client';
import { inShop } from '../db/shop-scope';
import { findShop, insertShop, listShops } from '../shops/shops.repository';
import * as team from '../team/team.repository';
import { EXIT, type CliIo } from './cli-io';
import { defaultPasswordSource, readPassword, Refused, withOperatorDatabase, type PasswordSource } from './operator-database';

export type { PasswordSource } from './operator-database';

export const ADMIN_USAGE = `Usage: borewright admin add --email <address> --name "<name>" [--role admin|designer|bench|viewer] [--shop <id>]

Adds a member to the shop's database, as the server finds it (DATA_DIR, or DATABASE_URL): the first
admin of a production install, where the demo accounts are off. Others are then invited from the
Team page. The password is read from BOREWRIGHT_PASSWORD, or asked for twice in the terminal.
Where the database holds several shops, --shop names the one (borewright shop list shows their ids).
With the embedded database, stop the server first.`;

function problem(io: CliIo, message: string): number {
  io.err(`borewright admin: ${message}`);
  return EXIT.unusable;
}

/**
 * The shop a member added here joins: the one named, or the installation's one shop (made as "Workshop"
 * when there is none yet); several shops and none named is refused.
 */
async function memberShop(db: Database, shopId: number | undefined): Promise<number> {
  if (shopId !== undefined) {
    if (!(await findShop(db, shopId))) throw new Refused(`there is no shop ${shopId}; nothing was added.`);
    return shopId;
  }
  const shops = await listShops(db);
  if (shops.length > 1) throw new Refused('this database holds several shops: name one with --shop <id> (borewright shop list shows them); nothing was added.');
  return shops[0]?.id ?? insertShop(db, 'Workshop');
}

/** Stores the member and its activity entry in one transaction, in its shop; refuses an address already taken in any shop. */
export async function addMember(db: Database, member: { email: string; name: string; role: 'admin' | 'designer' | 'bench' | 'viewer'; password: string; shopId?: number }): Promise<void> {
  const passwordHash = await hashPassword(member.password);
  if (await team.findMemberByEmail(db, member.email)) throw new Refused(`${member.email} is already a member of a shop; nothing was added.`);
  await inShop(await memberShop(db, member.shopId), () => db.transaction(async (tx) => {
    const added = await team.insertMember(tx, { email: member.email, name: member.name, role: member.role, passwordHash });
    await recordActivity(tx, { userId: null, action: 'member.added', details: { member: added.id, name: added.name, email: added.email, role: added.role, via: 'command line' } });
  }));
}

/** A shop id as the operator types it. */
export function shopIdArgument(value: string | undefined): number | undefined | 'bad' {
  if (value === undefined) return undefined;
  return /^[1-9]\d{0,9}$/.test(value) && Number.isSafeInteger(Number(value)) && Number(value) <= 2_147_483_647 ? Number(value) : 'bad';
}

/** `borewright admin add`: a member without an invitation, for a database without an admin. */
export async function adminCommand(args: string[], io: CliIo, env: Record<string, string | undefined> = process.env, source: PasswordSource = defaultPasswordSource(env)): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: { email: { type: 'string' }, name: { type: 'string' }, role: { type: 'string', default: 'admin' }, shop: { type: 'string' }, help: { type: 'boolean', short: 'h' } },
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
  const shopId = shopIdArgument(values.shop);
  if (shopId === 'bad') return problem(io, '--shop must be a shop id, a whole number (borewright shop list shows them).');

  const password = await readPassword(source, email.data);
  if ('problem' in password) return problem(io, password.problem);
  const result = await withOperatorDatabase(env, (db) => addMember(db, { email: email.data, name: name.data, role: role.data, password: password.password, shopId }));
  if ('problem' in result) return problem(io, result.problem);
  io.out(`Added ${name.data} <${email.data}> as ${role.data}. They can sign in now.`);
  return EXIT.ok;
}
