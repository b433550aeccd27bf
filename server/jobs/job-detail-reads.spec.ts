import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { jobDetail } from '../../shared/api/contract';
import { createApp } from '../app';
import { createLogger } from '../logger';
import { ApiClient, signedIn } from '../testing/api-client';
import { createTestApp, TEST_SESSION_SECRET, testConfig, type TestApp } from '../testing/test-app';

describe('job reads: entity tags and 304', () => {
  let t: TestApp;
  let designer: ApiClient;
  let bench: ApiClient;
  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
    bench = await signedIn(t.app, 'bench@greyfield.example');
  });
  afterAll(() => t.close());

  const read = (client: ApiClient, jobId: number, etag?: string) => {
    const req = client.get(`/api/jobs/${jobId}`);
    return etag ? req.set('If-None-Match', etag) : req;
  };

  it('answers 304 without a body while the job is unchanged, the same tag every time', async () => {
    const first = await read(designer, 1).expect(200);
    const etag = first.headers['etag'];
    expect(etag).toMatch(/^W\/"job-1-/);
    expect(jobDetail.parse(first.body)).toEqual(first.body);
    const again = await read(designer, 1, etag).expect(304);
    expect(again.text ?? '').toBe('');
    expect(again.headers['etag']).toBe(etag);
    // A list of tags, as a browser may send, matches too; another job's tag does not.
    await read(designer, 1, `W/"job-1-0-0-0", ${etag}`).expect(304);
    expect((await read(bench, 1).expect(200)).headers['etag']).toBe(etag);
    await read(designer, 2, etag).expect(200);
  });

  it('gives a new tag and the changed job after every kind of change', async () => {
    let etag = (await read(designer, 2).expect(200)).headers['etag'];
    const changed = async (expectChange: (body: ReturnType<typeof jobDetail.parse>) => void) => {
      const res = await read(designer, 2, etag).expect(200);
      expect(res.headers['etag']).not.toBe(etag);
      expectChange(jobDetail.parse(res.body));
      etag = res.headers['etag'];
      await read(designer, 2, etag).expect(304);
    };

    const job = (await read(designer, 2).expect(200)).body as ReturnType<typeof jobDetail.parse>;
    await designer.patch('/api/jobs/2').send({ notes: 'Check the wall for plumb', version: job.job.version }).expect(200);
    await changed((body) => expect(body.job.notes).toBe('Check the wall for plumb'));

    const panel = job.panels[0];
    const marked = await bench.patch(`/api/panels/${panel.dbId}/status`).send({ status: 'drilled', version: panel.version }).expect(200);
    await changed((body) => expect(body.panels[0]).toMatchObject({ status: 'drilled', statusBy: 'Ada Keel', version: marked.body.version }));

    const bores = [...panel.bores, { id: 'extra-hole', x: 100, y: 100, face: 'A' as const, diameter: 5, depth: 10 }];
    await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: marked.body.version, placements: panel.placements, bores }).expect(200);
    await changed((body) => expect(body.panels[0].bores.map((b) => b.id)).toContain('extra-hole'));

    const box = { name: 'Loft cupboard', width: 600, height: 722, depth: 560, material: job.materials[0].id };
    await designer.post('/api/jobs/2/carcasses').send(box).expect(201);
    await changed((body) => expect(body.carcasses.map((c) => c.name)).toContain('Loft cupboard'));
  });

  it('checks sign-in before it tells whether a job changed', async () => {
    const etag = (await read(designer, 1).expect(200)).headers['etag'];
    const stranger = new ApiClient(t.app);
    const res = await read(stranger, 1, etag).expect(401);
    expect(res.headers['etag']).not.toMatch(/job-/);
    await read(designer, 999999, etag).expect(404);
  });

  it('never answers from what another server kept once the job changed through it', async () => {
    const other = createApp({ db: t.database.db, config: testConfig(), sessionSecret: TEST_SESSION_SECRET, logger: createLogger('silent'), mailer: t.mailer, jobEvents: t.database.jobEvents });
    const elsewhere = await signedIn(other, 'designer@greyfield.example');
    const before = await read(designer, 3).expect(200);
    await elsewhere.patch('/api/jobs/3').send({ name: 'Clinic storage wall, phase 2', version: before.body.job.version }).expect(200);
    const after = await read(designer, 3, before.headers['etag']).expect(200);
    expect(after.body.job.name).toBe('Clinic storage wall, phase 2');
  });
});
