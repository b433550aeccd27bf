import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { activityList, type ActivityEntry } from '../../shared/api/contract';
import { activity } from '../db/schema';
import { ApiClient, signedIn } from '../testing/api-client';
import { createTestApp, type TestApp } from '../testing/test-app';

describe('activity', () => {
  let t: TestApp;
  let designer: ApiClient;
  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
  });
  afterAll(() => t.close());

  const actions = async (jobId: number) =>
    ((await designer.get(`/api/activity?jobId=${jobId}`).expect(200)).body.entries as ActivityEntry[]).map((e) => e.action);

  it('records who did what to which job and panel, newest first', async () => {
    const { body: job } = await designer.post('/api/jobs').send({ name: 'Activity job' }).expect(201);
    await designer.post(`/api/jobs/${job.id}/carcasses`).send({ name: 'Box', width: 500, height: 690, depth: 300, material: 'mdf-19' }).expect(201);
    const { body: panel } = await designer.post(`/api/jobs/${job.id}/panels`).send({ name: 'Shelf', role: 'shelf', width: 280, height: 460, thickness: 19, material: 'mdf-19' }).expect(201);
    await designer.patch(`/api/panels/${panel.dbId}`).send({ version: 1, name: 'Shelf 1' }).expect(200);
    await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: 2, placements: [], bores: [] }).expect(200);
    await designer.patch(`/api/panels/${panel.dbId}/status`).send({ version: 3, status: 'drilled' }).expect(200);
    await designer.delete(`/api/panels/${panel.dbId}?version=4`).expect(204);
    await designer.patch(`/api/jobs/${job.id}`).send({ archived: true, version: 1 }).expect(200);

    const res = await designer.get(`/api/activity?jobId=${job.id}`).expect(200);
    expect(activityList.parse(res.body)).toEqual(res.body);
    expect(res.body.entries.map((e: ActivityEntry) => e.action)).toEqual([
      'job.archived',
      'panel.deleted',
      'panel.status-changed',
      'panel.drilling-saved',
      'panel.updated',
      'panel.created',
      'carcass.created',
      'job.created',
    ]);
    const status = res.body.entries[2];
    expect(status).toMatchObject({ jobId: job.id, panelId: panel.dbId, user: { name: 'Tomas Ward' }, details: { from: 'planned', to: 'drilled' } });
    expect(res.body.entries[1]).toMatchObject({ panelId: panel.dbId, details: { name: 'Shelf 1' } });
  });

  it('writes nothing when the change is refused', async () => {
    const before = await t.database.db.$count(activity);
    await designer.patch('/api/jobs/1').send({ name: '' }).expect(400);
    await designer.post('/api/jobs/1/carcasses').send({ name: 'Box', width: 500, height: 690, depth: 300, material: 'none' }).expect(400);
    expect(await t.database.db.$count(activity)).toBe(before);
  });

  it('lists the whole shop without a job, and the seeded imports', async () => {
    const all = (await designer.get('/api/activity').expect(200)).body.entries as ActivityEntry[];
    expect(all.filter((e) => e.action === 'job.imported').map((e) => e.details.name)).toEqual(
      expect.arrayContaining(['Larch Lane kitchen', 'Loft study bookcase', 'Clinic storage wall']),
    );
    expect(await actions(1)).toContain('job.imported');
    await designer.get('/api/activity?jobId=999999').expect(404);
  });
});
