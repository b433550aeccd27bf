import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { findAccountByEmail } from '../auth/users.repository';
import { verifyPassword } from '../auth/passwords';
import { databaseTarget, openDatabase } from '../db/client';
import { activity, sessions } from '../db/schema';
import { adminCommand } from './admin-command';
import type { CliIo } from './cli-io';
import { main } from './main';
import { shopCommand } from './shop-command';

function captured(): CliIo & { lines: { out: string[]; err: string[] } } {
  const lines = { out: [] as string[], err: [] as string[] };
  return { lines, out: (t) => lines.out.push(t), err: (t) => lines.err.push(t) };
}

describe('borewright shop', () => {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'borewright-shop-'));
  const env = { DATA_DIR: dataDir };
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  const run = async (args: string[], password = 'a long admin password') => {
    const io = captured();
    const code = await shopCommand(args, io, env, { fromEnvironment: password });
    return { code, out: io.lines.out.join('\n'), err: io.lines.err.join('\n') };
  };

  it('adds shops with their first admins, lists them, suspends one (ending its sessions) and resumes it', async () => {
    expect(await run(['list'])).toEqual({ code: 0, out: 'No shops yet.', err: '' });
    expect(await run(['add', '--name', 'Birch Yard', '--admin-email', 'Hal@Birch.example', '--admin-name', 'Hal Birch'])).toEqual({
      code: 0,
      out: 'Made shop 1 "Birch Yard" with Hal Birch <hal@birch.example> as its admin. They can sign in now.',
      err: '',
    });
    expect((await run(['add', '--name', 'Cedar Loft', '--admin-email', 'ivy@cedar.example', '--admin-name', 'Ivy Cedar'])).code).toBe(0);
    const taken = await run(['add', '--name', 'Copy', '--admin-email', 'hal@birch.example', '--admin-name', 'Hal Again']);
    expect(taken).toEqual({ code: 2, out: '', err: 'borewright shop: hal@birch.example is already a member of a shop; nothing was added.' });

    // admin add on a database of several shops takes the shop by --shop, and refuses without it.
    const io = captured();
    expect(await adminCommand(['add', '--email', 'jo@cedar.example', '--name', 'Jo Cedar', '--role', 'bench'], io, env, { fromEnvironment: 'a long bench password' })).toBe(2);
    expect(io.lines.err.join('\n')).toContain('name one with --shop <id>');
    expect(await adminCommand(['add', '--email', 'jo@cedar.example', '--name', 'Jo Cedar', '--role', 'bench', '--shop', '2'], captured(), env, { fromEnvironment: 'a long bench password' })).toBe(0);
    const none = captured();
    expect(await adminCommand(['add', '--email', 'x@cedar.example', '--name', 'X', '--shop', '9'], none, env, { fromEnvironment: 'a long password' })).toBe(2);
    expect(none.lines.err).toEqual(['borewright admin: there is no shop 9; nothing was added.']);

    const today = new Date().toISOString().slice(0, 10);
    expect((await run(['list'])).out.split('\n')).toEqual([
      'id  name        status  members  created',
      ` 1  Birch Yard  active        1  ${today}`,
      ` 2  Cedar Loft  active        2  ${today}`,
    ]);

    // Two stored sessions of shop 2's members and one of shop 1's; suspending shop 2 ends only its own.
    let database = await openDatabase(databaseTarget({ dataDir }));
    const ivy = await findAccountByEmail(database.db, 'ivy@cedar.example');
    const jo = await findAccountByEmail(database.db, 'jo@cedar.example');
    const hal = await findAccountByEmail(database.db, 'hal@birch.example');
    expect(ivy).toMatchObject({ shopId: 2, role: 'admin', shopStatus: 'active' });
    expect(jo).toMatchObject({ shopId: 2, role: 'bench' });
    expect(await verifyPassword('a long admin password', hal!.passwordHash)).toBe(true);
    const expire = new Date(Date.now() + 3_600_000);
    await database.db.insert(sessions).values([ivy, jo, hal].map((a, i) => ({ sid: `s${i}`, sess: { passport: { user: a!.id } }, expire })));
    const created = await database.db.select().from(activity);
    expect(created.filter((e) => e.action === 'shop.created').map((e) => e.details)).toEqual([
      expect.objectContaining({ name: 'Birch Yard', email: 'hal@birch.example', via: 'command line' }),
      expect.objectContaining({ name: 'Cedar Loft', email: 'ivy@cedar.example', via: 'command line' }),
    ]);
    await database.close();

    expect(await run(['suspend', '2'])).toEqual({ code: 0, out: 'Suspended shop 2 "Cedar Loft": its members can no longer sign in; 2 sessions ended.', err: '' });
    expect((await run(['list'])).out).toContain(' 2  Cedar Loft  suspended        2');
    database = await openDatabase(databaseTarget({ dataDir }));
    expect((await database.db.select().from(sessions)).map((s) => s.sid)).toEqual(['s2']);
    expect(await findAccountByEmail(database.db, 'ivy@cedar.example')).toMatchObject({ shopStatus: 'suspended' });
    await database.close();

    expect(await run(['resume', '2'])).toEqual({ code: 0, out: 'Resumed shop 2 "Cedar Loft": its members may sign in again.', err: '' });
    expect((await run(['list'])).out).toContain(' 2  Cedar Loft  active        2');
  }, 120_000);

  it('names what is wrong, with exit code 2, and prints its usage on --help', async () => {
    expect(await run(['suspend', '7'])).toEqual({ code: 2, out: '', err: 'borewright shop: there is no shop 7.' });
    expect((await run(['suspend', 'abc'])).err).toBe('borewright shop: "abc" is not a shop id (borewright shop list shows them).');
    expect((await run(['add', '--admin-email', 'a@b.example', '--admin-name', 'A'])).err).toBe('borewright shop: --name is required.');
    expect((await run(['add', '--name', 'S', '--admin-email', 'nope', '--admin-name', 'A'])).err).toBe('borewright shop: --admin-email must be an e-mail address.');
    expect((await run(['add', '--name', 'S', '--admin-email', 'a@b.example', '--admin-name', 'A'], 'short')).err).toBe('borewright shop: the password must be at least 8 bytes long.');
    expect((await run(['remove', '1'])).err).toContain('say list, add, suspend <id> or resume <id>');
    const help = captured();
    expect(await main(['shop', '--help'], help)).toBe(0);
    expect(help.lines.out.join('\n')).toContain('borewright shop suspend <id>');
    const unknown = captured();
    expect(await main(['shop', 'list', '--colour'], unknown)).toBe(2);
  });
});
