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
    // The description is kept to plan the carcass again, without the job's own materials, system and limits.
    expect(planned.carcass.plannedFrom).toMatchObject({ width: 700, fronts: { type: 'flap', reveal: 3 }, shelves: { type: 'adjustable', count: 1 } });
    expect(planned.carcass.plannedFrom).not.toHaveProperty('materials');
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
    expect((await designer.get(`/api/jobs/${jobId}`).expect(200)).body.panels).toHaveLength(before);
  });
});

describe('planning a carcass again', () => {
  let t: TestApp;
  let designer: ApiClient;

  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
  });
  afterAll(() => t.close());

  async function jobWithFlapUnit() {
    const jobId: number = (await designer.post('/api/jobs').send({ name: 'Re-plan' }).expect(201)).body.id;
    const first = plannedCarcass.parse((await designer.post(`/api/jobs/${jobId}/plan`).send(FLAP_UNIT).expect(201)).body);
    return { jobId, first };
  }

  it('writes the new plan over untouched panels, keeping their database ids', async () => {
    const { jobId, first } = await jobWithFlapUnit();
    const again = plannedCarcass.parse((await designer.post(`/api/jobs/${jobId}/plan`).send({ ...FLAP_UNIT, width: 800 }).expect(201)).body);
    expect(again.carcass.width).toBe(800);
    expect(again.kept).toEqual([]);
    expect(again.panels.map((p) => p.dbId)).toEqual(first.panels.map((p) => p.dbId));
    expect(again.panels.find((p) => p.role === 'flap')!.height).toBeGreaterThan(first.panels.find((p) => p.role === 'flap')!.height);
    const { body: log } = await designer.get(`/api/activity?jobId=${jobId}`).expect(200);
    expect(log.entries[0]).toMatchObject({ action: 'carcass.replanned', details: { updated: first.panels.length, added: 0, removed: 0 } });
  });

  it('asks before writing over a panel changed by hand, then keeps it or replaces it as chosen', async () => {
    const { jobId, first } = await jobWithFlapUnit();
    const side = first.panels.find((p) => p.role === 'side')!;
    const moved = side.placements.map((p, i) => (i === 0 ? { ...p, y: p.y + 32 } : p));
    await designer.put(`/api/panels/${side.dbId}/drilling`).send({ version: side.version, placements: moved, bores: side.bores }).expect(200);

    const asked = await designer.post(`/api/jobs/${jobId}/plan`).send({ ...FLAP_UNIT, width: 800 }).expect(409);
    expect(asked.body.error).toMatchObject({ code: 'replan-changed', details: [`${side.name} (${side.id}), planned`] });
    const unchanged = (await designer.get(`/api/jobs/${jobId}`).expect(200)).body;
    expect(unchanged.carcasses[0].width).toBe(FLAP_UNIT.width);

    const kept = plannedCarcass.parse((await designer.post(`/api/jobs/${jobId}/plan?changed=keep`).send({ ...FLAP_UNIT, width: 800 }).expect(201)).body);
    expect(kept.kept).toEqual([side.id]);
    expect(kept.panels.find((p) => p.id === side.id)!.placements[0].y).toBe(moved[0].y);
    expect(kept.carcass.width).toBe(800);

    const replaced = plannedCarcass.parse((await designer.post(`/api/jobs/${jobId}/plan?changed=replace`).send(FLAP_UNIT).expect(201)).body);
    expect(replaced.kept).toEqual([]);
    expect(replaced.panels.find((p) => p.id === side.id)!.placements[0].y).toBe(side.placements[0].y);
  });
});
