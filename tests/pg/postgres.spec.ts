import { eq, sql } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/node-postgres';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PanelRecord } from '../../shared/api/contract';
import { createApp } from '../../server/app';
import { openDatabase, type Database, type DatabaseHandle } from '../../server/db/client';
import * as schema from '../../server/db/schema';
import { jobs, sessions, shops } from '../../server/db/schema';
import { inShop } from '../../server/db/shop-scope';
import { insertShop } from '../../server/shops/shops.repository';
import { dumpTables, restoreTables } from '../../server/db/table-dump';
import { seedDemoShop } from '../../server/demo/seed-demo';
import { findJobStamp, listJobSummaries } from '../../server/jobs/jobs.repository';
import { jobAsDocument, listJobs } from '../../server/jobs/jobs.service';
import { createLogger } from '../../server/logger';
import { ApiClient, signedIn } from '../../server/testing/api-client';
import { testConfig } from '../../server/testing/test-app';
import { freshDemoDatabase } from './demo-database';

const url = process.env.PG_TEST_URL;
const restoreUrl = process.env.PG_TEST_RESTORE_URL;
if (!url) console.warn('tests/pg: PG_TEST_URL is not set, so the PostgreSQL tests are skipped. Run them with `npm run test:pg`.');

describe.skipIf(!url)('on PostgreSQL (DATABASE_URL)', () => {
  let database: DatabaseHandle;
  let app: ReturnType<typeof createApp>;
  let designer: ApiClient;

  beforeAll(async () => {
    database = await freshDemoDatabase(url!);
    app = createApp({
      db: database.db,
      config: testConfig(),
      jobEvents: database.jobEvents,
      sessionSecret: 'a test secret that is long enough to sign cookies',
      logger: createLogger('silent'),
      // These tests send no mail; the outbox is tested on PGlite (server/mail).
      mailer: { send: () => Promise.reject(new Error('no mail in the PostgreSQL tests')) },
    });
    designer = await signedIn(app, 'designer@greyfield.example');
  });
  afterAll(() => database?.close());

  it('migrates idempotently', async () => {
    await database.migrate();
    const result = (await database.db.execute(sql`select count(*)::int as n from drizzle.__drizzle_migrations`)) as unknown as { rows: { n: number }[] };
    expect(result.rows[0].n).toBeGreaterThanOrEqual(2);
  });

  it('signs in with sessions kept in the database, and refuses a wrong password', async () => {
    expect((await designer.get('/api/auth/me').expect(200)).body.user.role).toBe('designer');
    expect(await database.db.$count(sessions)).toBeGreaterThan(0);
    expect((await new ApiClient(app).signIn('designer@greyfield.example', 'wrong-password')).status).toBe(401);
  });

  it('round-trips a job and a panel through the API', async () => {
    const { body: job } = await designer.post('/api/jobs').send({ name: 'Postgres job' }).expect(201);
    expect(job).toMatchObject({ carcassCount: 0, panelCount: 0 });
    await designer.post(`/api/jobs/${job.id}/carcasses`).send({ id: 'c1', name: 'Box', width: 600, height: 2131, depth: 560, material: 'mdf-19' }).expect(201);
    const { body: panel } = await designer
      .post(`/api/jobs/${job.id}/panels`)
      .send({ name: 'Side', role: 'side', carcass: 'c1', width: 560, height: 2131, thickness: 19, material: 'mdf-19' })
      .expect(201);
    const bores = [
      { id: 'f1', x: 37, y: 9.5, face: 'A', diameter: 5, depth: 13 },
      { id: 'f2', x: 0.1 + 0.2, y: 2121.5, face: 'B', diameter: 5, depth: 13 },
      { id: 'e1', edge: 'y0', at: 280, z: 9.5, diameter: 8, depth: 30 },
    ];
    const placements = [{ id: 'p1', fitting: 'plate-a', x: 37, y: 105, face: 'A', rotation: 270, mirrored: false, params: { boringDistance: 4.5 } }];
    const saved = await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: 1, placements, bores }).expect(200);
    expect(saved.body).toMatchObject({ version: 2, bores, placements });
    await designer.patch(`/api/panels/${panel.dbId}/status`).send({ version: 1, status: 'drilled' }).expect(409);
    await designer.patch(`/api/panels/${panel.dbId}/status`).send({ version: 2, status: 'drilled' }).expect(200);

    const detail = await designer.get(`/api/jobs/${job.id}`).expect(200);
    expect(detail.body.job).toMatchObject({ carcassCount: 1, panelCount: 1 });
    const { body: doc } = await designer.get(`/api/jobs/${job.id}/document`).expect(200);
    expect(doc.panels[0]).toMatchObject({ carcass: 'c1', status: 'drilled', bores, placements });
    const imported = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(doc)), 'doc.json').expect(201);
    expect((await designer.get(`/api/jobs/${imported.body.id}/document`).expect(200)).body).toEqual(doc);
  });

  it('lets one of several simultaneous writers win, the others get 409', async () => {
    const { body: detail } = await designer.get('/api/jobs/1').expect(200);
    const panel: PanelRecord = detail.panels[0];
    const answers = await Promise.all(
      ['A', 'B', 'C', 'D'].map((name) => designer.patch(`/api/panels/${panel.dbId}`).send({ version: panel.version, name })),
    );
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409, 409, 409]);
  });

  it.skipIf(!restoreUrl)('restores a backup into another database with the same jobs', async () => {
    const target = await openDatabase({ engine: 'postgres', url: restoreUrl! });
    await target.migrate();
    const backup = JSON.parse(JSON.stringify(await dumpTables(database.db, new Date())));
    await restoreTables(target.db, backup);
    // Read as each shop, as the app reads them.
    for (const { id: shopId } of backup.tables.shops as { id: number }[]) {
      const jobs = await inShop(shopId, () => listJobs(database.db, false));
      expect(await inShop(shopId, () => listJobs(target.db, false))).toEqual(jobs);
      for (const { id } of jobs) expect(await inShop(shopId, () => jobAsDocument(target.db, id))).toEqual(await inShop(shopId, () => jobAsDocument(database.db, id)));
    }
    await target.close();
  });

  it('ends a deactivated member\'s sessions, and keeps one active admin when two admins demote each other at once', async () => {
    const owner = await signedIn(app, 'owner@greyfield.example');
    const bench = await signedIn(app, 'bench@greyfield.example');
    const { members } = (await owner.get('/api/team').expect(200)).body as { members: { id: number; email: string }[] };
    const idOf = (email: string) => members.find((m) => m.email === email)!.id;
    await owner.patch(`/api/team/members/${idOf('bench@greyfield.example')}`).send({ active: false }).expect(200);
    await bench.get('/api/jobs').expect(401);

    const [ownerId, tomasId] = [idOf('owner@greyfield.example'), idOf('designer@greyfield.example')];
    await owner.patch(`/api/team/members/${tomasId}`).send({ role: 'admin' }).expect(200);
    const tomas = await signedIn(app, 'designer@greyfield.example');
    // Each on a connection of its own: the row locks queue the second behind the first, which it then sees.
    const answers = await Promise.all([
      owner.patch(`/api/team/members/${tomasId}`).send({ role: 'designer' }),
      tomas.patch(`/api/team/members/${ownerId}`).send({ role: 'designer' }),
    ]);
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409]);
    expect(answers.find((r) => r.status === 409)!.body.error.code).toBe('last-admin');
    const admins = await database.db.execute(sql`select count(*)::int as n from users where role = 'admin' and active`);
    expect((admins as unknown as { rows: { n: number }[] }).rows[0].n).toBe(1);
  });

  it("keeps each shop's rows to itself with row-level security, even for a query that names no shop", async () => {
    const db = database.db;
    const [{ id: demoShop }] = await db.select({ id: shops.id }).from(shops);
    const otherShop = await insertShop(db, 'Other Shop');
    const [{ id: otherJob }] = await inShop(otherShop, () => db.insert(jobs).values({ name: 'Other job', system: {} as never, limits: {} as never, materials: [] }).returning({ id: jobs.id }));
    // The app's role on PostgreSQL too: not a superuser, not the owner, no way around the policies.
    const role = await inShop(demoShop, () => db.execute(sql`select current_user as name, rolsuper, rolbypassrls from pg_roles where rolname = current_user`));
    expect((role as unknown as { rows: unknown[] }).rows).toEqual([{ name: 'borewright_app', rolsuper: false, rolbypassrls: false }]);
    // No filter on shop at all, as a forgetful repository would write it, both outside and inside a transaction.
    const seen = await inShop(demoShop, () => db.select({ id: jobs.id, shopId: jobs.shopId }).from(jobs));
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.filter((j) => j.shopId !== demoShop)).toEqual([]);
    const inTransaction = await inShop(demoShop, () => db.transaction((tx) => tx.select({ id: jobs.id }).from(jobs).where(eq(jobs.id, otherJob))));
    expect(inTransaction).toEqual([]);
    expect(await inShop(null, () => db.$count(jobs))).toBe(0);
    expect(await inShop(otherShop, () => db.$count(jobs))).toBe(1);
    // And from outside: the other shop's job is not there for the demo shop's designer, and is left as it was.
    await designer.get(`/api/jobs/${otherJob}`).expect(404);
    await designer.patch(`/api/jobs/${otherJob}`).send({ name: 'Taken over', version: 1 }).expect(404);
    expect((await db.select({ name: jobs.name }).from(jobs).where(eq(jobs.id, otherJob)))[0].name).toBe('Other job');
    // A pooled connection goes back as the connecting role: outside any shop it sees every shop's rows again.
    expect(await db.$count(jobs)).toBe(seen.length + 1);
  });

  it("keeps each shop's rows to itself with the repositories' shop filter alone, on a connection the policies do not hold", async () => {
    const { default: pg } = await import('pg');
    const pool = new pg.Pool({ connectionString: url, max: 2 });
    try {
      // The connecting role with no role switch: the tables' owner, which row-level security does not hold.
      const owner = drizzle({ client: pool, schema }) as unknown as Database;
      const [{ id: demoShop }] = await owner.select({ id: shops.id }).from(shops).orderBy(shops.id).limit(1);
      const otherShop = await insertShop(owner, 'Filtered Shop');
      const [{ id: otherJob }] = await owner.insert(jobs).values({ shopId: otherShop, name: 'Filtered job', system: {} as never, limits: {} as never, materials: [] }).returning({ id: jobs.id });
      expect(await owner.$count(jobs, eq(jobs.id, otherJob))).toBe(1);
      const listed = await inShop(demoShop, () => listJobSummaries(owner, false));
      expect(listed.length).toBeGreaterThan(0);
      expect(listed.map((j) => j.id)).not.toContain(otherJob);
      // The prepared stamp read, too, fills in the scope's shop.
      expect(await inShop(demoShop, () => findJobStamp(owner, otherJob))).toBeUndefined();
      expect(await inShop(otherShop, () => findJobStamp(owner, otherJob))).toMatchObject({ version: 1 });
    } finally {
      await pool.end();
    }
  });

  it('restores a backup made with PGlite, so a shop can move to a PostgreSQL server', async () => {
    const local = await openDatabase({ engine: 'pglite' });
    await local.migrate();
    await seedDemoShop(local.db);
    const backup = JSON.parse(JSON.stringify(await dumpTables(local.db, new Date())));
    await database.db.execute(sql`truncate shops, users, sessions, jobs, carcasses, panels, placements, bores, activity restart identity cascade`);
    await restoreTables(database.db, backup);
    const [{ id: shopId }] = backup.tables.shops as { id: number }[];
    for (const { id } of await inShop(shopId, () => listJobs(local.db, false))) {
      expect(await inShop(shopId, () => jobAsDocument(database.db, id))).toEqual(await inShop(shopId, () => jobAsDocument(local.db, id)));
    }
    await local.close();
  }, 120_000);
});
