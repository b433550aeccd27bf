import { eq, getTableName, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { findSession } from '../auth/sessions.repository';
import { joinPresence } from '../live/job-events.repository';
import { PackProgressBoard } from '../packs/pack-progress';
import { addSecondShop, type SecondShop } from '../testing/second-shop';
import { createTestApp, DEMO_SHOP_ID, type TestApp } from '../testing/test-app';
import { activity, attachments, bores, carcasses, jobEvents, jobPresence, jobs, mailTokens, outbox, packProgress, panels, placements, sessions, shopFittings, shopSettings, users } from './schema';
import { inAnyScope, inShop } from './shop-scope';

const SHOP_OWNED = [users, jobs, carcasses, panels, placements, bores, activity, attachments, shopFittings, shopSettings, mailTokens, outbox, jobEvents, jobPresence, packProgress];


/**
 * The second wall: queries that name no shop at all (as a repository that forgot its filter would)
 * still see and change only the scope's shop, because the app's role is held to row-level security.
 */
describe('row-level security on PGlite', () => {
  let t: TestApp;
  let second: SecondShop;

  beforeAll(async () => {
    t = await createTestApp();
    second = await addSecondShop(t);
    // Someone has the second shop's job open (a presence row and its event), and a pack of it is being made.
    await inShop(second.shopId, () => joinPresence(t.database.db, 'second-shop-stream', second.jobId, { id: second.adminId, name: 'Second Admin', panelId: null }));
    await inShop(second.shopId, () => new PackProgressBoard(t.database.db, (err) => { throw err; }).start('second-shop-ticket', 3));
  }, 120_000);
  afterAll(() => t.close());

  const rows = async (query: ReturnType<typeof sql>) => ((await t.database.db.execute(query)) as unknown as { rows: Record<string, unknown>[] }).rows;

  it("runs a shop's queries as a role that is neither a superuser nor able to bypass row-level security", async () => {
    const [role] = await inShop(DEMO_SHOP_ID, () => rows(sql`select current_user as name, rolsuper, rolbypassrls from pg_roles where rolname = current_user`));
    expect(role).toEqual({ name: 'borewright_app', rolsuper: false, rolbypassrls: false });
    for (const table of ['shops', ...SHOP_OWNED.map(getTableName)]) {
      const [rls] = await rows(sql`select relrowsecurity, relforcerowsecurity from pg_class where relname = ${table}`);
      expect({ table, ...rls }).toEqual({ table, relrowsecurity: true, relforcerowsecurity: true });
    }
  });

  it('gives a query without any shop filter only the rows of the shop in scope, for every shop-owned table', async () => {
    for (const table of SHOP_OWNED) {
      const name = getTableName(table);
      for (const shopId of [DEMO_SHOP_ID, second.shopId]) {
        // Outside any scope (the owner, as migrations and backups run) the shop's rows are counted by their column.
        const [{ n: own }] = await rows(sql`select count(*)::int as n from ${table} where shop_id = ${shopId}`);
        // The second shop has rows in every table but loose bores (its kitchen drills through placements alone).
        if (shopId === second.shopId && table !== bores) expect(own, `${name} of shop ${shopId}`).toBeGreaterThan(0);
        const seen = await inShop(shopId, () => t.database.db.select({ shopId: table.shopId }).from(table));
        expect({ name, shopId, n: seen.length, others: seen.filter((r) => r.shopId !== shopId).length }).toEqual({ name, shopId, n: own, others: 0 });
      }
      expect(await inShop(null, () => t.database.db.$count(table)), `${name} as no shop`).toBe(0);
    }
  });

  it("neither changes nor deletes another shop's row named by its id, and refuses a row written for another shop", async () => {
    const db = t.database.db;
    const changed = await inShop(DEMO_SHOP_ID, () => db.update(jobs).set({ name: 'Taken over' }).where(eq(jobs.id, second.jobId)).returning({ id: jobs.id }));
    expect(changed).toEqual([]);
    const deleted = await inShop(DEMO_SHOP_ID, () => db.delete(panels).where(eq(panels.id, second.panel.dbId)).returning({ id: panels.id }));
    expect(deleted).toEqual([]);
    const [job] = await db.select({ name: jobs.name }).from(jobs).where(eq(jobs.id, second.jobId));
    expect(job.name).toBe('Larch Lane kitchen');
    expect(await db.$count(panels, eq(panels.id, second.panel.dbId))).toBe(1);
    const planted = inShop(DEMO_SHOP_ID, () => db.insert(jobs).values({ shopId: second.shopId, name: 'Planted', system: {} as never, limits: {} as never, materials: [] }));
    await expect(planted).rejects.toMatchObject({ cause: { message: expect.stringMatching(/row-level security/) } });
  });

  it('lets a shop read its own shop row only, and change none', async () => {
    const seen = await inShop(second.shopId, () => rows(sql`select id from shops`));
    expect(seen).toEqual([{ id: second.shopId }]);
    await expect(inShop(second.shopId, () => rows(sql`update shops set status = 'active'`))).rejects.toMatchObject({ cause: { message: expect.stringMatching(/permission denied/) } });
  });

  it('runs each of many queries and transactions started at once, in different scopes, in its own scope', async () => {
    const db = t.database.db;
    const who = sql`select current_user as role, nullif(current_setting('borewright.shop_id', true), '') as shop, (select count(*)::int from jobs) as jobs`;
    const [{ n: demoJobs }] = await rows(sql`select count(*)::int as n from jobs where shop_id = ${DEMO_SHOP_ID}`);
    const [{ n: secondJobs }] = await rows(sql`select count(*)::int as n from jobs where shop_id = ${second.shopId}`);
    const [{ n: allJobs }] = await rows(sql`select count(*)::int as n from jobs`);
    const expected = {
      demo: { role: 'borewright_app', shop: String(DEMO_SHOP_ID), jobs: demoJobs },
      second: { role: 'borewright_app', shop: String(second.shopId), jobs: secondJobs },
      none: { role: 'borewright_app', shop: null, jobs: 0 },
      owner: { role: 'postgres', shop: null, jobs: allJobs },
    };
    const asked = Array.from({ length: 24 }, (_, i) => {
      const scope = (['demo', 'second', 'none', 'owner'] as const)[i % 4];
      const inTransaction = i % 3 === 0;
      const first = (result: unknown) => (result as { rows: Record<string, unknown>[] }).rows[0];
      const read = () => (inTransaction ? db.transaction(async (tx) => first(await tx.execute(who))) : db.execute(who).then(first));
      const answer =
        scope === 'owner' ? read() : inShop(scope === 'demo' ? DEMO_SHOP_ID : scope === 'second' ? second.shopId : null, read);
      return answer.then((row) => ({ i, row, want: expected[scope] }));
    });
    for (const { i, row, want } of await Promise.all(asked)) expect({ i, ...row }).toEqual({ i, ...want });
  });

  it("reads any shop's session with its account from any scope, leaves the connection's scope as it was, and lets no other role read it", async () => {
    const db = t.database.db;
    await db.insert(sessions).values({ sid: 'second-shop-session', sess: { passport: { user: second.adminId } }, expire: new Date(Date.now() + 60_000) });
    const found = await inShop(DEMO_SHOP_ID, async () => {
      await db.$count(jobs);
      const read = await findSession(db, 'second-shop-session', new Date());
      // The read changed neither the role nor the shop of PGlite's one connection.
      const [connection] = await inAnyScope(() => rows(sql`select current_user as role, current_setting('borewright.shop_id', true) as shop`));
      return { read, connection };
    });
    expect(found.connection).toEqual({ role: 'borewright_app', shop: String(DEMO_SHOP_ID) });
    expect(found.read?.account).toMatchObject({ id: second.adminId, shopId: second.shopId, shopStatus: 'active' });
    expect(await findSession(db, 'second-shop-session', new Date(Date.now() + 120_000))).toBeUndefined();
    const [privilege] = await rows(sql`select has_function_privilege('public', 'session_with_account(text, timestamptz)', 'execute') as granted`);
    expect(privilege).toEqual({ granted: false });
  });
});
