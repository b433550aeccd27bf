import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PanelRecord } from '../../shared/api/contract';
import { createApiRouter } from '../../server/api-router';
import { createLogger } from '../../server/logger';
import { ApiClient, signedIn } from '../../server/testing/api-client';
import { minimalPng } from '../../server/testing/sample-files';
import { createTestApp, testConfig, type TestApp } from '../../server/testing/test-app';
import { PLANNED_CARCASS } from './planned-carcass';

/** A job with one side carrying a mounting plate (so a swap has something to swap) and one attachment. */
interface ArchivedFixture {
  jobId: number;
  panel: PanelRecord;
  attachmentId: number;
  /** The job's version now: archiving and restoring each bump it. */
  jobVersion: () => Promise<number>;
}

interface WriteRow {
  request: (client: ApiClient, f: ArchivedFixture) => Promise<Response>;
  /** The status once the job is restored: the write goes through again. */
  restored: number;
  /** Who sends it: marking drilled is the bench's write. */
  as?: 'bench';
}

const CUT_LIST = Buffer.from('panel name,width,height,thickness,material,quantity\r\nShelf,540,300,19,mdf-19,1\r\n');

/**
 * Every write to a job or to anything below it, refused while the job is archived and answered again once it
 * is restored. A route that writes below a job (its path names a job, a panel or an attachment) and has no row
 * here fails the first test; sending a job's pack is the one such route that writes nothing of the job.
 */
const WRITES: Record<string, WriteRow> = {
  'PATCH /api/jobs/:jobId': { request: async (c, f) => c.patch(`/api/jobs/${f.jobId}`).send({ name: 'Renamed', version: await f.jobVersion() }), restored: 200 },
  'POST /api/jobs/:jobId/carcasses': {
    request: async (c, f) => c.post(`/api/jobs/${f.jobId}/carcasses`).send({ name: 'Box', width: 600, height: 722, depth: 560, material: 'mdf-19' }),
    restored: 201,
  },
  'POST /api/jobs/:jobId/plan': { request: async (c, f) => c.post(`/api/jobs/${f.jobId}/plan`).send(PLANNED_CARCASS), restored: 201 },
  'POST /api/jobs/:jobId/panels': {
    request: async (c, f) => c.post(`/api/jobs/${f.jobId}/panels`).send({ name: 'Shelf', role: 'shelf', width: 540, height: 562, thickness: 19, material: 'mdf-19' }),
    restored: 201,
  },
  'PATCH /api/panels/:panelId': { request: async (c, f) => c.patch(`/api/panels/${f.panel.dbId}`).send({ version: f.panel.version, name: 'Renamed' }), restored: 200 },
  'DELETE /api/panels/:panelId': { request: async (c, f) => c.delete(`/api/panels/${f.panel.dbId}?version=${f.panel.version}`), restored: 204 },
  'PUT /api/panels/:panelId/drilling': {
    request: async (c, f) => c.put(`/api/panels/${f.panel.dbId}/drilling`).send({ version: f.panel.version, placements: [], bores: [] }),
    restored: 200,
  },
  'PATCH /api/panels/:panelId/status': {
    request: async (c, f) => c.patch(`/api/panels/${f.panel.dbId}/status`).send({ version: f.panel.version, status: 'drilled' }),
    restored: 200,
    as: 'bench',
  },
  'POST /api/jobs/:jobId/cut-list/preview': { request: async (c, f) => c.post(`/api/jobs/${f.jobId}/cut-list/preview`).attach('file', CUT_LIST, 'cut-list.csv'), restored: 200 },
  'POST /api/jobs/:jobId/cut-list': { request: async (c, f) => c.post(`/api/jobs/${f.jobId}/cut-list`).attach('file', CUT_LIST, 'cut-list.csv'), restored: 201 },
  'POST /api/jobs/:jobId/attachments': { request: async (c, f) => c.post(`/api/jobs/${f.jobId}/attachments`).attach('file', minimalPng(), 'site.png'), restored: 201 },
  'DELETE /api/attachments/:attachmentId': { request: async (c, f) => c.delete(`/api/attachments/${f.attachmentId}`), restored: 204 },
  'POST /api/jobs/:jobId/swap': { request: async (c, f) => c.post(`/api/jobs/${f.jobId}/swap`).send({ from: 'plate-0', to: 'plate-2' }), restored: 200 },
};

/** Sending the pack mails what the job is; it changes nothing of the job, so an archived job's pack can still go out. */
const WRITES_NOTHING_OF_THE_JOB = ['POST /api/jobs/:jobId/pack/send'];

describe('an archived job is read-only on the server', () => {
  let t: TestApp;
  let designer: ApiClient;
  let bench: ApiClient;

  async function archivedFixture(): Promise<ArchivedFixture> {
    const { body: job } = await designer.post('/api/jobs').send({ name: 'Finished hall unit' }).expect(201);
    const { body: side } = await designer
      .post(`/api/jobs/${job.id}/panels`)
      .send({ name: 'Side', role: 'side', width: 560, height: 722, thickness: 19, material: 'mdf-19' })
      .expect(201);
    const plate = { id: 'p1', fitting: 'plate-0', x: 37, y: 96, face: 'A', rotation: 0 };
    const { body: panel } = await designer.put(`/api/panels/${side.dbId}/drilling`).send({ version: side.version, placements: [plate], bores: [] }).expect(200);
    const { body: attachment } = await designer.post(`/api/jobs/${job.id}/attachments`).attach('file', minimalPng(), 'site.png').expect(201);
    const jobVersion = async () => (await designer.get(`/api/jobs/${job.id}`).expect(200)).body.job.version as number;
    await designer.patch(`/api/jobs/${job.id}`).send({ archived: true, version: await jobVersion() }).expect(200);
    return { jobId: job.id, panel, attachmentId: attachment.id, jobVersion };
  }

  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
    bench = await signedIn(t.app, 'bench@greyfield.example');
  });
  afterAll(() => t.close());

  it('has a row for every route that writes to a job or below it', () => {
    const router = createApiRouter({ db: t.database.db, config: testConfig(), sessionSecret: 'x'.repeat(32), logger: createLogger('silent'), mailer: t.mailer, jobEvents: t.database.jobEvents });
    const below = router.stack.flatMap((layer) =>
      layer.route && /:(jobId|panelId|attachmentId)/.test(layer.route.path)
        ? [...new Set(layer.route.stack.map((h) => h.method.toUpperCase()))].filter((m) => m !== 'GET').map((m) => `${m} /api${layer.route!.path}`)
        : [],
    );
    expect(below.sort()).toEqual([...Object.keys(WRITES), ...WRITES_NOTHING_OF_THE_JOB].sort());
  });

  for (const [route, row] of Object.entries(WRITES)) {
    it(`${route}: 409 job-archived, nothing changed, and served again once the job is restored`, async () => {
      const f = await archivedFixture();
      const client = row.as === 'bench' ? bench : designer;
      const before = (await designer.get(`/api/jobs/${f.jobId}/document`).expect(200)).text;
      const attachmentsBefore = (await designer.get(`/api/jobs/${f.jobId}/attachments`).expect(200)).body.attachments.length;

      const refused = await row.request(client, f);
      expect(refused.status).toBe(409);
      expect(refused.body).toMatchObject({ error: { code: 'job-archived' } });
      expect(refused.body.error.message).toMatch(/restore the job first/);
      expect((await designer.get(`/api/jobs/${f.jobId}/document`).expect(200)).text).toBe(before);
      expect((await designer.get(`/api/jobs/${f.jobId}/attachments`).expect(200)).body.attachments).toHaveLength(attachmentsBefore);

      await designer.patch(`/api/jobs/${f.jobId}`).send({ archived: false, version: await f.jobVersion() }).expect(200);
      expect((await row.request(client, f)).status).toBe(row.restored);
    });
  }

  it('lets an archived job be restored, renamed in the same change, by whoever may edit jobs but not by a viewer', async () => {
    const f = await archivedFixture();
    const viewer = await signedIn(t.app, 'viewer@greyfield.example');
    await viewer.patch(`/api/jobs/${f.jobId}`).send({ archived: false, version: await f.jobVersion() }).expect(403);
    const { body } = await designer.patch(`/api/jobs/${f.jobId}`).send({ archived: false, name: 'Hall unit, altered', version: await f.jobVersion() }).expect(200);
    expect(body).toMatchObject({ archived: false, name: 'Hall unit, altered' });
  });

  it("still sends an archived job's pack, which changes nothing of the job", async () => {
    const f = await archivedFixture();
    await designer.post(`/api/jobs/${f.jobId}/pack/send`).send({ to: ['bench@greyfield.example'], paper: 'a4' }).expect(200);
  });
});
