import { eq } from 'drizzle-orm';
import JSZip from 'jszip';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { jobDetail, type JobDetail } from '../../shared/api/contract';
import { swapAnswer, swapApplied } from '../../shared/api/swap-contract';
import { fitting } from '../../shared/catalog/fitting';
import type { PackManifest } from '../../shared/export/manifest';
import { activity, panels, shopFittings } from '../db/schema';
import { larchLaneKitchen } from '../demo/larch-lane-kitchen';
import { ApiClient, signedIn } from '../testing/api-client';
import { attachmentName, binaryBody } from '../testing/binary-body';
import { createTestApp, DEMO_SHOP_ID, type TestApp } from '../testing/test-app';

const HINGES = 'from=hinge-full-overlay-45&to=hinge-full-overlay-48';
const RUNNERS = 'from=runner-500&to=runner-400';
const DOORS = ['sink-base-door', 'wall-unit-door-left', 'wall-unit-door-right'];

describe('swap check API', () => {
  let t: TestApp;
  let designer: ApiClient;
  let bench: ApiClient;
  let viewer: ApiClient;

  /** A Larch Lane kitchen of the test's own, imported as the designer: a swap applied to it changes no other test's job. */
  async function kitchen(): Promise<JobDetail> {
    const { body } = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(larchLaneKitchen)), 'kitchen.json').expect(201);
    return detail(body.id);
  }
  const detail = async (jobId: number) => jobDetail.parse((await viewer.get(`/api/jobs/${jobId}`).expect(200)).body);
  const panel = (job: JobDetail, id: string) => job.panels.find((p) => p.id === id)!;
  /** The bench marks a panel drilled, as at the machine. */
  const markDrilled = async (job: JobDetail, id: string) =>
    bench.patch(`/api/panels/${panel(job, id).dbId}/status`).send({ version: panel(job, id).version, status: 'drilled' }).expect(200);

  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
    bench = await signedIn(t.app, 'bench@greyfield.example');
    viewer = await signedIn(t.app, 'viewer@greyfield.example');
  });
  afterAll(() => t.close());

  describe('the report', () => {
    it('tells a viewer what a 48/6 hinge does to the three doors of the demo kitchen', async () => {
      const { body } = await viewer.get('/api/jobs').expect(200);
      const id = body.jobs.find((j: { name: string }) => j.name === 'Larch Lane kitchen').id;
      const { report, versions } = swapAnswer.parse((await viewer.get(`/api/jobs/${id}/swap?${HINGES}`).expect(200)).body);
      expect(report.panels.map((p) => p.panel.id)).toEqual(DOORS);
      // Each door: two cups reused, the four 48/6 screw holes overlap the 45/9.5 ones by 4.2 mm (the worked
      // example of shared/swap/check-swap.spec.ts, trade-reference §2, common practice). None is drilled yet.
      for (const p of report.panels) expect([p.verdict, p.drilled, p.reused.length, p.new.length, p.clashing.length, p.unused.length]).toEqual(['to-remake', false, 2, 0, 4, 4]);
      expect(report.summary).toMatchObject({ panels: 3, placements: 6, fine: 0, toDrill: 0, toRemake: 0, notDrilled: 3 });
      expect(Object.keys(versions).sort()).toEqual([...DOORS].sort());
    });

    it('refuses a replacement of another kind and fittings nobody knows, naming the field', async () => {
      const job = await kitchen();
      const other = await viewer.get(`/api/jobs/${job.job.id}/swap?from=hinge-full-overlay-45&to=plate-2`).expect(400);
      expect(other.body.error).toMatchObject({ code: 'different-kind', fields: { to: '"plate-2" is a mounting plate and "hinge-full-overlay-45" a cup hinge; a swap replaces a fitting by one of the same kind.' } });
      const unknown = await viewer.get(`/api/jobs/${job.job.id}/swap?from=hinge-99&to=hinge-full-overlay-48`).expect(400);
      expect(unknown.body.error).toMatchObject({ code: 'unknown-fitting', fields: { from: '"hinge-99": no fitting of the catalog has this id.' } });
      const missing = await viewer.get(`/api/jobs/${job.job.id}/swap?to=hinge-full-overlay-48`).expect(400);
      expect(Object.keys(missing.body.error.fields)).toEqual(['from']);
      const twice = await viewer.get(`/api/jobs/${job.job.id}/swap?from=runner-500&from=runner-400&to=runner-300`).expect(400);
      expect(Object.keys(twice.body.error.fields)).toEqual(['from']);
      await viewer.get(`/api/jobs/999999/swap?${HINGES}`).expect(404);
    });

    it("takes a shop's own fitting as the replacement", async () => {
      // A 52/5.5 hinge (trade-reference §2, common practice): its screw holes at (5.5, ±26) from the cup
      // centre against the 45/9.5 ones at (9.5, ±22.5) are √(4² + 3.5²) = 5.32 mm apart, less than the
      // 8 mm two Ø8 holes need: every one clashes.
      const source = 'trade-reference §2 (common practice)';
      const shop = fitting.parse({
        id: 'shop-hinge-52',
        name: 'Cup hinge, full overlay, 52/5.5',
        purpose: 'hinge-cup',
        onSystemRow: false,
        bores: [
          { id: 'cup', kind: 'face', x: 0, y: 0, diameter: 35, depth: 13, source },
          { id: 'fix-1', kind: 'face', x: 5.5, y: -26, diameter: 8, depth: 11, source },
          { id: 'fix-2', kind: 'face', x: 5.5, y: 26, diameter: 8, depth: 11, source },
        ],
        hinge: { cupBore: 'cup', overlay: 'full', constant: 13, boringDistance: { min: 3, max: 7 }, openingAngle: 110, source },
      });
      await t.database.db.insert(shopFittings).values({ shopId: DEMO_SHOP_ID, fittingId: shop.id, fitting: shop });
      try {
        const job = await kitchen();
        const { report } = swapAnswer.parse((await viewer.get(`/api/jobs/${job.job.id}/swap?from=hinge-full-overlay-45&to=shop-hinge-52`).expect(200)).body);
        expect(report.to).toEqual({ id: 'shop-hinge-52', name: 'Cup hinge, full overlay, 52/5.5', purpose: 'hinge-cup' });
        expect(report.summary).toMatchObject({ panels: 3, reused: 6, clashing: 12 });
      } finally {
        await t.database.db.delete(shopFittings).where(eq(shopFittings.fittingId, shop.id));
      }
    });
  });

  describe('the retrofit pack', () => {
    it('holds only the new holes of the drilled panels to drill, read back with jszip', async () => {
      const job = await kitchen();
      await markDrilled(job, 'drawer-base-left');
      await markDrilled(job, 'drawer-base-right');
      await markDrilled(job, 'sink-base-door');
      const res = await bench.get(`/api/jobs/${job.job.id}/swap/retrofit.zip?${RUNNERS}`).buffer(true).parse(binaryBody).expect(200);
      expect(res.headers['content-type']).toBe('application/zip');
      const root = 'Larch Lane kitchen, retrofit runner-500 to runner-400 bench pack';
      expect(attachmentName(res)).toBe(`${root}.zip`);
      const zip = await JSZip.loadAsync(res.body);
      const manifest = JSON.parse(await zip.file(`${root}/manifest.json`)!.async('string')) as PackManifest;
      expect(manifest.panels.map((p) => [p.id, p.status])).toEqual([
        ['drawer-base-left', 'drilled'],
        ['drawer-base-right', 'drilled'],
      ]);
      // Three runners a side at y 41, 265 and 521; the 400 runner's rear screws 160 and 320 behind the
      // front one on the 37 mm row (trade-reference §6, common practice): x = 197 and 357. Nothing else.
      const schedule = Papa.parse<Record<string, string>>((await zip.file(`${root}/hole schedule.csv`)!.async('string')).trim(), { header: true }).data;
      const holes = schedule.map((row) => [row['panel'], row['bores'], row['x'], row['y']]);
      const expected = ['drawer-base-left', 'drawer-base-right'].flatMap((side) =>
        ['runner-1', 'runner-2', 'runner-3'].flatMap((runner, i) =>
          [['rear-1', '197'], ['rear-2', '357']].map(([hole, x]) => [side, `${runner}/${hole}`, x, String([41, 265, 521][i])]),
        ),
      );
      expect(holes).toEqual(expected);
      const hardware = await zip.file(`${root}/hardware list.csv`)!.async('string');
      expect(hardware).toContain('Drawer runner, 400 mm, retrofit: rear-1, rear-2');
    });

    it('holds no panel when nothing drilled needs new holes', async () => {
      const job = await kitchen();
      const res = await viewer.get(`/api/jobs/${job.job.id}/swap/retrofit.zip?${HINGES}`).buffer(true).parse(binaryBody).expect(200);
      const zip = await JSZip.loadAsync(res.body);
      const manifest = zip.file(/manifest\.json$/)[0];
      expect((JSON.parse(await manifest.async('string')) as PackManifest).panels).toEqual([]);
    });
  });

  describe('applying', () => {
    it('swaps every placement in one go, bumps each panel, sends drilled panels back to planned and logs the counts', async () => {
      const job = await kitchen();
      await markDrilled(job, 'drawer-base-left');
      const { versions } = swapAnswer.parse((await designer.get(`/api/jobs/${job.job.id}/swap?${RUNNERS}`).expect(200)).body);
      const applied = swapApplied.parse((await designer.post(`/api/jobs/${job.job.id}/swap`).send({ from: 'runner-500', to: 'runner-400', versions }).expect(200)).body);
      expect(applied).toEqual({ from: 'runner-500', to: 'runner-400', panels: 2, placements: 6, backToPlanned: ['drawer-base-left'] });

      const after = await detail(job.job.id);
      for (const id of ['drawer-base-left', 'drawer-base-right']) {
        expect(panel(after, id).placements.filter((p) => p.fitting.startsWith('runner-')).map((p) => p.fitting)).toEqual(['runner-400', 'runner-400', 'runner-400']);
        expect(panel(after, id).version).toBe(versions[id] + 1);
      }
      expect(panel(after, 'drawer-base-left').status).toBe('planned');
      const [mark] = await t.database.db.select({ by: panels.statusBy, at: panels.statusAt }).from(panels).where(eq(panels.id, panel(after, 'drawer-base-left').dbId));
      expect(mark).toEqual({ by: null, at: null });
      expect(panel(after, 'sink-base-door').version).toBe(panel(job, 'sink-base-door').version);

      const entries = await t.database.db.select().from(activity).where(eq(activity.jobId, job.job.id));
      const swapped = entries.filter((e) => e.action === 'job.fitting-swapped');
      expect(swapped).toHaveLength(1);
      expect(swapped[0].details).toMatchObject({ from: 'runner-500', to: 'runner-400', panels: 2, placements: 6, toDrill: 1, notDrilled: 1, reused: 6, new: 12, unused: 12, backToPlanned: ['drawer-base-left'] });

      // Done already: the job has no runner-500 left.
      const again = await designer.post(`/api/jobs/${job.job.id}/swap`).send({ from: 'runner-500', to: 'runner-400' }).expect(409);
      expect(again.body.error.code).toBe('nothing-to-swap');
    });

    it('refuses a panel changed since the report, and changes nothing at all', async () => {
      const job = await kitchen();
      const { versions } = swapAnswer.parse((await designer.get(`/api/jobs/${job.job.id}/swap?${RUNNERS}`).expect(200)).body);
      // The second of the two sides changes after the report: the first must not be swapped alone.
      await markDrilled(job, 'drawer-base-right');
      const res = await designer.post(`/api/jobs/${job.job.id}/swap`).send({ from: 'runner-500', to: 'runner-400', versions }).expect(409);
      expect(res.body.error).toMatchObject({ code: 'stale-version', fields: { versions: 'drawer-base-right is not at the version seen' } });
      const after = await detail(job.job.id);
      expect(panel(after, 'drawer-base-left')).toMatchObject({ version: versions['drawer-base-left'] });
      expect(after.panels.flatMap((p) => p.placements).filter((p) => p.fitting === 'runner-400')).toEqual([]);
      const entries = await t.database.db.select().from(activity).where(eq(activity.jobId, job.job.id));
      expect(entries.filter((e) => e.action === 'job.fitting-swapped')).toEqual([]);
    });

    it('refuses a replacement of another kind and a bad body with 400', async () => {
      const job = await kitchen();
      const kind = await designer.post(`/api/jobs/${job.job.id}/swap`).send({ from: 'runner-500', to: 'shelf-pin-5' }).expect(400);
      expect(kind.body.error.code).toBe('different-kind');
      const bad = await designer.post(`/api/jobs/${job.job.id}/swap`).send({ from: 'runner-500', to: 'runner-400', versions: { 'drawer-base-left': 'one' } }).expect(400);
      expect(Object.keys(bad.body.error.fields)).toEqual(['versions.drawer-base-left']);
      await designer.post('/api/jobs/999999/swap').send({ from: 'runner-500', to: 'runner-400' }).expect(404);
    });
  });
});
