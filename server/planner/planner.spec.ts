import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { plannedCarcass } from '../../shared/api/plan-contract';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { checkJob } from '../../shared/checks/index';
import { jobDocument } from '../../shared/model/job-document';
import { ApiClient, signedIn } from '../testing/api-client';
import { createTestApp, type TestApp } from '../testing/test-app';

/** A wall carcass of 19 mm MDF with a lift-up flap and an adjustable shelf. */
const FLAP_UNIT = {
  id: 'flap-unit',
  name: 'Flap unit',
  width: 700,
  height: 403,
  depth: 350,
  material: 'mdf-19',
  back: { type: 'inset' },
  construction: 'cams',
  fronts: { type: 'flap', reveal: 3 },
  shelves: { type: 'adjustable', count: 1, play: 1 },
  mounting: { type: 'wall' },
};

describe('POST /api/jobs/:jobId/plan', () => {
  let t: TestApp;
  let designer: ApiClient;
  let jobId: number;

  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
    jobId = (await designer.post('/api/jobs').send({ name: 'Planner tests' }).expect(201)).body.id;
  });
  afterAll(() => t.close());

  it('adds the carcass and its panels with drilling and hang relations, and the job checks clean of errors', async () => {
    const res = await designer.post(`/api/jobs/${jobId}/plan`).send(FLAP_UNIT).expect(201);
    const planned = plannedCarcass.parse(res.body);
    expect(planned.carcass).toMatchObject({ id: 'flap-unit', mounting: 'wall' });
    const flap = planned.panels.find((p) => p.role === 'flap');
    expect(flap?.hang?.on).toEqual(['flap-unit-top', 'flap-unit-left', 'flap-unit-right']);
    const doc = jobDocument.parse((await designer.get(`/api/jobs/${jobId}/document`).expect(200)).body);
    expect(doc.panels.map((p) => p.id)).toEqual(planned.panels.map((p) => p.id));
    expect(checkJob(doc, builtinCatalog()).filter((f) => f.severity === 'error')).toEqual([]);
  });

  it('refuses a description it cannot plan with every problem by its path, and adds nothing', async () => {
    const before = (await designer.get(`/api/jobs/${jobId}`).expect(200)).body.panels.length;
    const res = await designer.post(`/api/jobs/${jobId}/plan`).send({ ...FLAP_UNIT, id: 'shallow', depth: 100, thickness: 18 }).expect(400);
    expect(res.body.error.details).toEqual([expect.stringMatching(/^thickness: MDF 19 comes in 19 mm only/)]);
    const again = await designer.post(`/api/jobs/${jobId}/plan`).send(FLAP_UNIT).expect(409);
    expect(again.body.error.code).toBe('duplicate-id');
    expect((await designer.get(`/api/jobs/${jobId}`).expect(200)).body.panels).toHaveLength(before);
  });
});
