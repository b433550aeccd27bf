import { parseArgs } from 'node:util';
import { displayName } from '../../shared/model/job-document';
import { memberAddress, memberName } from '../../shared/api/team-contract';
import { hashPassword } from '../auth/passwords';
import type { Database } from '../db/client';
import type { ShopStatus } from '../db/schema/shops';
import { createShopWithAdmin } from '../shops/shops.service';
import { deleteSessionsOfShop, findShop, listShopsWithMembers, setShopStatus } from '../shops/shops.repository';
import * as team from '../team/team.repository';
import { shopIdArgument } from './admin-command';
import { EXIT, type CliIo } from './cli-io';
import { defaultPasswordSource, readPassword, Refused, withOperatorDatabase, type PasswordSource } from './operator-database';

export const SHOP_USAGE = `Usage: borewright shop list
       borewright shop add --name "<shop>" --admin-email <address> --admin-name "<name>"
       borewright shop suspend <id>
       borewright shop resume <id>

The operator's view of the shops in the database, as the server finds it (DATA_DIR, or DATABASE_URL):
  list      every shop: id, name, status, members, when it was made
  add       a new shop with its first admin; the password is read from BOREWRIGHT_PASSWORD, or asked
            for twice in the terminal
  suspend   the shop's members can no longer sign in and their sessions end; nothing is deleted
  resume    a suspended shop's members may sign in again
With the embedded database, stop the server first.`;

function problem(io: CliIo, message: string): number {
  io.err(`borewright shop: ${message}`);
  return EXIT.unusable;
}

/** The shops as lines of a table, widths fitted to what they hold. */
export function shopTable(rows: { id: number; name: string; status: string; members: number; createdAt: Date }[]): string {
  const cells = [['id', 'name', 'status', 'members', 'created'], ...rows.map((r) => [String(r.id), r.name, r.status, String(r.members), r.createdAt.toISOString().slice(0, 10)])];
  const widths = cells[0].map((_, i) => Math.max(...cells.map((row) => row[i].length)));
  return cells.map((row) => row.map((cell, i) => (i === 0 || i === 3 ? cell.padStart(widths[i]) : cell.padEnd(widths[i]))).join('  ').trimEnd()).join('\n');
}

/** Makes the shop and its admin in one transaction; refuses an address already taken in any shop. */
export async function addShop(db: Database, shop: { name: string; admin: { email: string; name: string; password: string } }): Promise<number> {
  const passwordHash = await hashPassword(shop.admin.password);
  if (await team.findMemberByEmail(db, shop.admin.email)) throw new Refused(`${shop.admin.email} is already a member of a shop; nothing was added.`);
  const created = await db.transaction((tx) => createShopWithAdmin(tx, { name: shop.name, admin: { email: shop.admin.email, name: shop.admin.name, passwordHash }, via: 'command line' }));
  return created.shopId;
}

/** Suspends or resumes a shop; suspending also ends its members' sessions. Returns the sessions ended. */
export async function changeShopStatus(db: Database, shopId: number, status: ShopStatus): Promise<{ name: string; ended: number }> {
  const shop = await findShop(db, shopId);
  if (!shop) throw new Refused(`there is no shop ${shopId}.`);
  return db.transaction(async (tx) => {
    await setShopStatus(tx, shopId, status);
    return { name: shop.name, ended: status === 'suspended' ? await deleteSessionsOfShop(tx, shopId) : 0 };
  });
}

/** `borewright shop list|add|suspend|resume`: the operator's commands for an installation of many shops. */
export async function shopCommand(args: string[], io: CliIo, env: Record<string, string | undefined> = process.env, source: PasswordSource = defaultPasswordSource(env)): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: { name: { type: 'string' }, 'admin-email': { type: 'string' }, 'admin-name': { type: 'string' }, help: { type: 'boolean', short: 'h' } },
  });
  if (values.help) {
    io.out(SHOP_USAGE);
    return EXIT.ok;
  }
  const [action, ...rest] = positionals;

  if (action === 'list' && rest.length === 0) {
    const result = await withOperatorDatabase(env, (db) => listShopsWithMembers(db));
    if ('problem' in result) return problem(io, result.problem);
    io.out(result.done.length === 0 ? 'No shops yet.' : shopTable(result.done));
    return EXIT.ok;
  }

  if (action === 'add' && rest.length === 0) {
    const name = displayName.safeParse(values.name ?? '');
    if (!name.success) return problem(io, `--name ${values.name === undefined ? 'is required' : name.error.issues[0].message}.`);
    const email = memberAddress.safeParse(values['admin-email'] ?? '');
    if (!email.success) return problem(io, `--admin-email ${values['admin-email'] === undefined ? 'is required' : email.error.issues[0].message}.`);
    const adminName = memberName.safeParse(values['admin-name'] ?? '');
    if (!adminName.success) return problem(io, `--admin-name ${values['admin-name'] === undefined ? 'is required' : adminName.error.issues[0].message}.`);
    const password = await readPassword(source, email.data);
    if ('problem' in password) return problem(io, password.problem);
    const result = await withOperatorDatabase(env, (db) => addShop(db, { name: name.data, admin: { email: email.data, name: adminName.data, password: password.password } }));
    if ('problem' in result) return problem(io, result.problem);
    io.out(`Made shop ${result.done} "${name.data}" with ${adminName.data} <${email.data}> as its admin. They can sign in now.`);
    return EXIT.ok;
  }

  if ((action === 'suspend' || action === 'resume') && rest.length === 1) {
    const shopId = shopIdArgument(rest[0]);
    if (shopId === 'bad' || shopId === undefined) return problem(io, `"${rest[0]}" is not a shop id (borewright shop list shows them).`);
    const status = action === 'suspend' ? 'suspended' : 'active';
    const result = await withOperatorDatabase(env, (db) => changeShopStatus(db, shopId, status));
    if ('problem' in result) return problem(io, result.problem);
    const { name, ended } = result.done;
    io.out(
      action === 'suspend'
        ? `Suspended shop ${shopId} "${name}": its members can no longer sign in; ${ended} session${ended === 1 ? '' : 's'} ended.`
        : `Resumed shop ${shopId} "${name}": its members may sign in again.`,
    );
    return EXIT.ok;
  }

  return problem(io, `say list, add, suspend <id> or resume <id>.\n\n${SHOP_USAGE}`);
}
