import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { findAccountByEmail } from '../auth/users.repository';
import { verifyPassword } from '../auth/passwords';
import { databaseTarget, openDatabase } from '../db/client';
import { activity } from '../db/schema';
import { adminCommand } from './admin-command';
import type { CliIo } from './cli-io';

const BIN = fileURLToPath(new URL('../../bin/borewright.mjs', import.meta.url));

function captured(): CliIo & { out: (t: string) => void; lines: { out: string[]; err: string[] } } {
  const lines = { out: [] as string[], err: [] as string[] };
  return { lines, out: (t) => lines.out.push(t), err: (t) => lines.err.push(t) };
}

describe('borewright admin add', () => {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'borewright-admin-'));
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  it('adds the first admin to a fresh database, with the password from BOREWRIGHT_PASSWORD, once', async () => {
    const env = { DATA_DIR: dataDir };
    const io = captured();
    const args = ['add', '--email', 'Owner@Shop.example', '--name', 'Ines Mora'];
    expect(await adminCommand(args, io, env, { fromEnvironment: 'a long admin password' })).toBe(0);
    expect(io.lines.out).toEqual(['Added Ines Mora <owner@shop.example> as admin. They can sign in now.']);

    const again = captured();
    expect(await adminCommand(args, again, env, { fromEnvironment: 'another long password' })).toBe(2);
    expect(again.lines.err.join('\n')).toContain('owner@shop.example is already a member of a shop; nothing was added.');

    const database = await openDatabase(databaseTarget({ dataDir }));
    const account = await findAccountByEmail(database.db, 'owner@shop.example');
    expect(account).toMatchObject({ name: 'Ines Mora', role: 'admin', demo: false, active: true });
    expect(await verifyPassword('a long admin password', account!.passwordHash)).toBe(true);
    const [entry] = await database.db.select().from(activity);
    expect(entry).toMatchObject({ action: 'member.added', userId: null, details: { email: 'owner@shop.example', role: 'admin', via: 'command line' } });
    await database.close();
  }, 60_000);

  it('asks twice in a terminal, and adds nothing when the two differ', async () => {
    const io = captured();
    const answers = ['first password', 'second password'];
    const code = await adminCommand(['add', '--email', 'a@shop.example', '--name', 'A'], io, { DATA_DIR: dataDir }, { ask: async () => answers.shift()! });
    expect(code).toBe(2);
    expect(io.lines.err).toEqual(['borewright admin: the two passwords differ; nothing was added.']);
  });

  it('names what is wrong before touching the database', async () => {
    const run = async (args: string[], password = 'long enough password') => {
      const io = captured();
      const code = await adminCommand(args, io, {}, { fromEnvironment: password });
      return { code, err: io.lines.err.join('\n') };
    };
    expect(await run(['add', '--name', 'X'])).toEqual({ code: 2, err: 'borewright admin: --email is required.' });
    expect(await run(['add', '--email', 'nope', '--name', 'X'])).toEqual({ code: 2, err: 'borewright admin: --email must be an e-mail address.' });
    expect(await run(['add', '--email', 'x@shop.example'])).toEqual({ code: 2, err: 'borewright admin: --name is required.' });
    expect(await run(['add', '--email', 'x@shop.example', '--name', 'X', '--role', 'owner'])).toMatchObject({ code: 2, err: expect.stringContaining('--role must be') });
    expect(await run(['add', '--email', 'x@shop.example', '--name', 'X'], 'short')).toEqual({ code: 2, err: 'borewright admin: the password must be at least 8 bytes long.' });
    expect((await run(['remove'])).err).toContain('say "add"');
  });

  it('asks for BOREWRIGHT_PASSWORD when there is no terminal to ask in', () => {
    const env = { ...process.env, DATA_DIR: dataDir, BOREWRIGHT_PASSWORD: undefined };
    const result = spawnSync(process.execPath, [BIN, 'admin', 'add', '--email', 'x@shop.example', '--name', 'X'], { encoding: 'utf8', env, stdio: ['ignore', 'pipe', 'pipe'], timeout: 60_000 });
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('set BOREWRIGHT_PASSWORD, or run the command in a terminal');
  });
});
