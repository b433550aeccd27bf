import { PGlite } from '@electric-sql/pglite';
import { eq, sql } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/pglite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listActivity } from '../activity/activity.repository';
import { findAttachment, listAttachments } from '../attachments/attachments.repository';
import { listPeople, updateUnits } from '../auth/users.repository';
import { findShopFittings, jobsUsingFitting, listShopFittings } from '../catalog/catalog.repository';
import { findJob, findJobStamp, findJobSummary, listJobSummaries, loadJobRows, updateJobAtVersion } from '../jobs/jobs.repository';
import { eventsAfter, joinPresence, lastEventId } from '../live/job-events.repository';
import { findOutboxRaw, listOutbox } from '../mail/outbox.repository';
import { PackProgressBoard } from '../packs/pack-progress';
import { deletePanelAtVersion, findPanel, jobPanelRefs, loadPanelRecord } from '../panels/panels.repository';
import { findShopSettings } from '../settings/settings.repository';
import { findMember, findOpenInvitation, listMembers, listOpenInvitations } from '../team/team.repository';
import { addSecondShop, type SecondShop } from '../testing/second-shop';
import { createTestApp, DEMO_SHOP_ID, type TestApp } from '../testing/test-app';
import type { Database } from './client';
import { jobs, panels } from './schema';
import * as schema from './schema';
import { inShop } from './shop-scope';

/**
 * The first wall on its own: the repositories' queries, run for the demo shop on a connection that
 * row-level security does not hold (the tables' owner, a superuser on PGlite, with the shop's scope set
 * only for the filter in the queries), see and change nothing of a second shop. Remove the shop filter
 * from any of these queries and the second shop's rows come back here.
 */
describe('the shop filter in every repository, without row-level security', () => {
  let t: TestApp;
  let second: SecondShop;
  let ownerClient: PGlite;
  /** The same data as the app's database, on a connection as the owner: no role switch, no policies. */
  let owner: Database;
  let app: Database;

  beforeAll(async () => {
    t = await createTestApp();
    second = await addSecondShop(t);
    app = t.database.db;
    // The second shop's job gets a live event and a presence row, and a pack of its own under way.
    await inShop(second.shopId, () => joinPresence(app, 'second-shop-stream', second.jobId, { id: second.adminId, name: 'Second Admin', panelId: null }));
    await inShop(second.shopId, () => new PackProgressBoard(app, (err) => { throw err; }).start('second-shop-ticket', 3));
    ownerClient = await PGlite.create({ loadDataDir: new Blob([await t.database.dumpDataDir!()]) });
    owner = drizzle({ client: ownerClient, schema }) as unknown as Database;
  }, 120_000);
  afterAll(async () => {
    await ownerClient?.close();
    await t.close();
  });

  it('reads as a connection that row-level security does not hold, which sees both shops', async () => {
    const [role] = ((await owner.execute(sql`select rolsuper from pg_roles where rolname = current_user`)) as unknown as { rows: { rolsuper: boolean }[] }).rows;
    expect(role.rolsuper).toBe(true);
    const seen = await owner.selectDistinct({ shopId: jobs.shopId }).from(jobs).orderBy(jobs.shopId);
    expect(seen.map((r) => r.shopId)).toEqual([DEMO_SHOP_ID, second.shopId]);
  });

  it("lists for the demo shop exactly what the two walls together give it, with nothing of the second shop", async () => {
    const lists: Record<string, (db: Database) => Promise<unknown>> = {
      jobs: (db) => listJobSummaries(db, false),
      activity: (db) => listActivity(db, { limit: 1000 }),
      members: (db) => listMembers(db),
      people: (db) => listPeople(db),
      invitations: (db) => listOpenInvitations(db),
      outbox: (db) => listOutbox(db, 1000),
      'shop fittings': (db) => listShopFittings(db),
      'shop fittings by id': (db) => findShopFittings(db, [second.fittingId]),
      settings: (db) => findShopSettings(db),
      // The demo shop has the same kitchen, with the same catalog fittings, as the second shop.
      'jobs using a fitting': async (db) => jobsUsingFitting(db, (await inShop(second.shopId, () => loadJobRows(app, second.jobId)))!.placements[0].fitting),
    };
    for (const [name, list] of Object.entries(lists)) {
      const bothWalls = await inShop(DEMO_SHOP_ID, () => list(app));
      const filterAlone = await inShop(DEMO_SHOP_ID, () => list(owner));
      expect(filterAlone, name).toEqual(bothWalls);
      expect(JSON.stringify(filterAlone ?? null), name).not.toMatch(/second-shop|Second Admin/i);
    }
    const jobIds = (await inShop(DEMO_SHOP_ID, () => listJobSummaries(owner, false))).map((j) => j.id);
    expect(jobIds).not.toContain(second.jobId);
    expect(jobIds.length).toBeGreaterThan(0);
  });

  it("finds none of the second shop's rows by their ids", async () => {
    const reads: Record<string, (db: Database) => Promise<unknown>> = {
      job: (db) => findJob(db, second.jobId),
      'job summary': (db) => findJobSummary(db, second.jobId),
      'job stamp': (db) => findJobStamp(db, second.jobId),
      'job rows': (db) => loadJobRows(db, second.jobId),
      panel: (db) => findPanel(db, second.panel.dbId),
      'panel record': (db) => loadPanelRecord(db, second.panel.dbId),
      attachment: (db) => findAttachment(db, second.attachmentId),
      member: (db) => findMember(db, second.adminId),
      invitation: (db) => findOpenInvitation(db, second.invitationId),
      'outbox message': (db) => findOutboxRaw(db, second.outboxId),
      'pack progress': (db) => new PackProgressBoard(db, (err) => { throw err; }).get('second-shop-ticket'),
    };
    for (const [name, read] of Object.entries(reads)) {
      // The owner sees the row in the second shop's scope: it is there, and only the filter hides it.
      expect(await inShop(second.shopId, () => read(owner)), name).toBeDefined();
      expect(await inShop(DEMO_SHOP_ID, () => read(owner)), name).toBeUndefined();
    }
    const lists: Record<string, (db: Database) => Promise<unknown[]>> = {
      'panels of the job': (db) => jobPanelRefs(db, second.jobId),
      attachments: (db) => listAttachments(db, second.jobId),
      activity: (db) => listActivity(db, { jobId: second.jobId, limit: 1000 }),
      'live events': (db) => eventsAfter(db, second.jobId, 0),
    };
    for (const [name, list] of Object.entries(lists)) {
      expect((await inShop(second.shopId, () => list(owner))).length, name).toBeGreaterThan(0);
      expect(await inShop(DEMO_SHOP_ID, () => list(owner)), name).toEqual([]);
    }
    expect(await inShop(DEMO_SHOP_ID, () => lastEventId(owner, second.jobId))).toBe(0);
  });

  it("changes and deletes none of the second shop's rows named by their ids", async () => {
    const [{ version }] = await owner.select({ version: jobs.version }).from(jobs).where(eq(jobs.id, second.jobId));
    expect(await inShop(DEMO_SHOP_ID, () => updateJobAtVersion(owner, second.jobId, version, { name: 'Taken over' }))).toBeUndefined();
    expect(await inShop(DEMO_SHOP_ID, () => deletePanelAtVersion(owner, second.panel.dbId, second.panel.version))).toBe(false);
    expect(await inShop(DEMO_SHOP_ID, () => updateUnits(owner, second.adminId, 'in'))).toBeUndefined();
    const [job] = await owner.select({ name: jobs.name, version: jobs.version }).from(jobs).where(eq(jobs.id, second.jobId));
    expect(job).toEqual({ name: 'Larch Lane kitchen', version });
    expect(await owner.$count(panels, eq(panels.id, second.panel.dbId))).toBe(1);
  });
});
