import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { panelRecord, type PanelRecord } from '../../shared/api/contract';
import { ApiClient, signedIn } from '../testing/api-client';
import { createTestApp, type TestApp } from '../testing/test-app';

describe('panels', () => {
  let t: TestApp;
  let designer: ApiClient;
  let bench: ApiClient;
  let jobId: number;
  let panel: PanelRecord;
  const side = { name: 'Left side', role: 'side', carcass: 'carcass-1', width: 560, height: 722, thickness: 18, material: 'particleboard-18' };

  beforeAll(async () => {
    t = await createTestApp();
    [designer, bench] = await Promise.all([signedIn(t.app, 'designer@greyfield.example'), signedIn(t.app, 'bench@greyfield.example')]);
    jobId = (await designer.post('/api/jobs').send({ name: 'Panel tests' }).expect(201)).body.id;
    await designer.post(`/api/jobs/${jobId}/carcasses`).send({ name: 'Base', width: 600, height: 722, depth: 560, material: 'particleboard-18' }).expect(201);
  });
  beforeEach(async () => {
    panel = (await designer.post(`/api/jobs/${jobId}/panels`).send(side).expect(201)).body;
  });
  afterAll(() => t.close());

  it('adds a panel with an id made from its role, at version 1', async () => {
    expect(panelRecord.parse(panel)).toEqual(panel);
    expect(panel).toMatchObject({ ...side, id: expect.stringMatching(/^side-\d+$/), status: 'planned', version: 1, placements: [], bores: [] });
  });

  it('changes board fields and bumps the version', async () => {
    const res = await designer.patch(`/api/panels/${panel.dbId}`).send({ version: 1, name: 'Right side', height: 690, carcass: null }).expect(200);
    expect(res.body).toMatchObject({ name: 'Right side', height: 690, version: 2 });
    expect(res.body).not.toHaveProperty('carcass');
  });

  it('refuses a change made on a stale version with 409 and keeps the other change', async () => {
    await designer.patch(`/api/panels/${panel.dbId}`).send({ version: 1, name: 'First writer' }).expect(200);
    const late = await designer.patch(`/api/panels/${panel.dbId}`).send({ version: 1, name: 'Second writer' }).expect(409);
    expect(late.body.error).toMatchObject({ code: 'stale-version', message: expect.stringMatching(/^Someone else changed this panel/), fields: { version: expect.any(String) } });
    await bench.patch(`/api/panels/${panel.dbId}/status`).send({ version: 1, status: 'drilled' }).expect(409);
    await designer.delete(`/api/panels/${panel.dbId}?version=1`).expect(409);
    await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: 1, placements: [], bores: [] }).expect(409);
    const detail = await designer.get(`/api/jobs/${jobId}`).expect(200);
    expect(detail.body.panels.find((p: PanelRecord) => p.dbId === panel.dbId)).toMatchObject({ name: 'First writer', version: 2, status: 'planned' });
  });

  it('lets one of two simultaneous writers win, never both', async () => {
    const answers = await Promise.all(
      ['A', 'B', 'C'].map((name) => designer.patch(`/api/panels/${panel.dbId}`).send({ version: 1, name })),
    );
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409, 409]);
  });

  it('checks the material and carcass against the job', async () => {
    const material = await designer.patch(`/api/panels/${panel.dbId}`).send({ version: 1, material: 'walnut-20' }).expect(400);
    expect(material.body.error.fields).toEqual({ material: 'this job has no material with id "walnut-20"' });
    const carcass = await designer.post(`/api/jobs/${jobId}/panels`).send({ ...side, carcass: 'nope' }).expect(400);
    expect(carcass.body.error.fields).toEqual({ carcass: 'this job has no carcass with id "nope"' });
    await designer.patch(`/api/panels/${panel.dbId}`).send({ version: 1 }).expect(400);
  });

  it('saves drilling from the editor: placements and face and edge bores, replacing what was there', async () => {
    const drilling = {
      placements: [{ id: 'pl-1', fitting: 'plate-a', x: 37, y: 105, face: 'A', rotation: 90, params: { boringDistance: 5 } }],
      bores: [
        { id: 'b-1', x: 37, y: 9, face: 'A', diameter: 5, depth: 13 },
        { id: 'e-1', edge: 'y0', at: 100, z: 9, diameter: 8, depth: 30 },
      ],
    };
    const saved = await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: 1, ...drilling }).expect(200);
    expect(saved.body).toMatchObject({ ...drilling, version: 2 });
    const replaced = await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: 2, placements: [], bores: [drilling.bores[1]] }).expect(200);
    expect(replaced.body).toMatchObject({ placements: [], bores: [drilling.bores[1]], version: 3 });
    const duplicate = await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: 3, placements: [], bores: [drilling.bores[0], drilling.bores[0]] }).expect(400);
    expect(duplicate.body.error.fields).toEqual({ 'bores[1].id': 'duplicate id "b-1"' });
  });

  it('lets the bench mark a panel drilled, then checked, saying who and when', async () => {
    expect(panel).toMatchObject({ statusBy: null, statusAt: null });
    const drilled = (await bench.patch(`/api/panels/${panel.dbId}/status`).send({ version: 1, status: 'drilled' }).expect(200)).body;
    expect(drilled).toMatchObject({ status: 'drilled', version: 2, statusBy: 'Ada Keel', statusAt: expect.any(String) });
    expect(panelRecord.parse(drilled)).toEqual(drilled);
    expect(Math.abs(Date.parse(drilled.statusAt) - Date.now())).toBeLessThan(60_000);
    const checked = (await designer.patch(`/api/panels/${panel.dbId}/status`).send({ version: 2, status: 'checked' }).expect(200)).body;
    expect(checked).toMatchObject({ status: 'checked', statusBy: 'Tomas Ward' });
    const unknown = await bench.patch(`/api/panels/${panel.dbId}/status`).send({ version: 3, status: 'painted' }).expect(400);
    expect(Object.keys(unknown.body.error.fields)).toEqual(['status']);
    // The job page reads the same names through the job's detail.
    const detail = await bench.get(`/api/jobs/${jobId}`).expect(200);
    expect(detail.body.panels.find((p: PanelRecord) => p.dbId === panel.dbId)).toMatchObject({ status: 'checked', statusBy: 'Tomas Ward', statusAt: checked.statusAt });
  });

  it('refuses to check a panel that is not drilled, or to mark a status it already has, with 409', async () => {
    const skipped = await bench.patch(`/api/panels/${panel.dbId}/status`).send({ version: 1, status: 'checked' }).expect(409);
    expect(skipped.body.error).toMatchObject({
      code: 'status-order',
      message: '“Left side” is planned: a panel is checked only after it is drilled, so mark it drilled first.',
      fields: { status: 'cannot follow "planned"' },
    });
    const same = await bench.patch(`/api/panels/${panel.dbId}/status`).send({ version: 1, status: 'planned' }).expect(409);
    expect(same.body.error).toMatchObject({ code: 'status-unchanged', fields: { status: 'is already "planned"' } });
    // Neither refusal changed the panel.
    await bench.patch(`/api/panels/${panel.dbId}/status`).send({ version: 1, status: 'drilled' }).expect(200);
  });

  it('goes back a step or two, clearing who and when at planned, and logs each mark with its direction', async () => {
    const at = async (version: number, status: string) => (await bench.patch(`/api/panels/${panel.dbId}/status`).send({ version, status }).expect(200)).body;
    await at(1, 'drilled');
    await at(2, 'checked');
    expect(await at(3, 'drilled')).toMatchObject({ status: 'drilled', statusBy: 'Ada Keel', statusAt: expect.any(String) });
    await at(4, 'checked');
    expect(await at(5, 'planned')).toMatchObject({ status: 'planned', statusBy: null, statusAt: null, version: 6 });
    const owner = await signedIn(t.app, 'owner@greyfield.example');
    const { entries } = (await owner.get(`/api/activity?jobId=${jobId}`).expect(200)).body;
    const marks = entries
      .filter((e: { panelId: number; action: string }) => e.panelId === panel.dbId && e.action === 'panel.status-changed')
      .reverse()
      .map((e: { details: object; user: { name: string } }) => ({ ...e.details, by: e.user.name }));
    expect(marks).toEqual([
      { panel: panel.id, from: 'planned', to: 'drilled', direction: 'forward', by: 'Ada Keel' },
      { panel: panel.id, from: 'drilled', to: 'checked', direction: 'forward', by: 'Ada Keel' },
      { panel: panel.id, from: 'checked', to: 'drilled', direction: 'back', by: 'Ada Keel' },
      { panel: panel.id, from: 'drilled', to: 'checked', direction: 'forward', by: 'Ada Keel' },
      { panel: panel.id, from: 'checked', to: 'planned', direction: 'back', by: 'Ada Keel' },
    ]);
  });

  it('deletes a panel at its version, with its drilling', async () => {
    await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: 1, placements: [], bores: [{ id: 'b', x: 37, y: 9, face: 'A', diameter: 5, depth: 13 }] }).expect(200);
    await designer.delete(`/api/panels/${panel.dbId}?version=2`).expect(204);
    await designer.delete(`/api/panels/${panel.dbId}?version=3`).expect(404);
    const missing = await designer.delete(`/api/panels/${panel.dbId}`).expect(400);
    expect(missing.body.error.fields).toEqual({ version: 'is required' });
  });

  it('refuses to delete a side a door hangs on', async () => {
    const demoJob = (await designer.get('/api/jobs/1').expect(200)).body;
    const left = demoJob.panels.find((p: PanelRecord) => p.id === 'sink-base-left');
    const res = await designer.delete(`/api/panels/${left.dbId}?version=${left.version}`).expect(409);
    expect(res.body.error).toMatchObject({ code: 'in-use', message: '"Sink base, door" hangs on this panel: re-hang or delete it first.' });
  });

  it('answers 404 for a panel or job that does not exist', async () => {
    await designer.patch('/api/panels/999999').send({ version: 1, name: 'x' }).expect(404);
    await designer.post('/api/jobs/999999/panels').send(side).expect(404);
  });
});
