import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { jobDetail, jobSummary } from '../../shared/api/contract';
import { DEFAULT_MATERIALS } from '../../shared/model/default-materials';
import { parseJobDocument } from '../../shared/model/parse-job';
import { larchLaneKitchen } from '../demo/larch-lane-kitchen';
import { activity, bores, jobs, panels } from '../db/schema';
import { ApiClient, signedIn } from '../testing/api-client';
import { createTestApp, type TestApp } from '../testing/test-app';

describe('jobs', () => {
  let t: TestApp;
  let designer: ApiClient;
  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
  });
  afterAll(() => t.close());

  const counts = async () => ({
    jobs: await t.database.db.$count(jobs),
    panels: await t.database.db.$count(panels),
    bores: await t.database.db.$count(bores),
    activity: await t.database.db.$count(activity),
  });

  it('lists the demo jobs, most recently changed first', async () => {
    const res = await designer.get('/api/jobs').expect(200);
    expect(res.body.jobs.map((j: { name: string }) => j.name)).toEqual(['Clinic storage wall', 'Loft study bookcase', 'Larch Lane kitchen']);
    for (const job of res.body.jobs) expect(jobSummary.parse(job)).toEqual(job);
  });

  it('creates a job with the default materials and the system and limit defaults', async () => {
    const created = await designer.post('/api/jobs').send({ name: 'Hall wardrobe', client: 'Mrs Idris' }).expect(201);
    expect(created.body).toMatchObject({ name: 'Hall wardrobe', client: 'Mrs Idris', archived: false, carcassCount: 0, panelCount: 0 });
    const detail = await designer.get(`/api/jobs/${created.body.id}`).expect(200);
    expect(jobDetail.parse(detail.body)).toEqual(detail.body);
    expect(detail.body.materials).toEqual(DEFAULT_MATERIALS);
    const doc = await designer.get(`/api/jobs/${created.body.id}/document`).expect(200);
    expect(doc.body.system).toEqual({ pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 });
    expect(doc.body.limits).toEqual({ minWeb: 3, minEdge: 3, minFloor: 3, sagRatio: 144 });
  });

  it('renames, archives and unarchives', async () => {
    const { body: job } = await designer.post('/api/jobs').send({ name: 'Old name' }).expect(201);
    expect((await designer.patch(`/api/jobs/${job.id}`).send({ name: 'New name', notes: 'Measured on site', version: 1 }).expect(200)).body.name).toBe('New name');
    await designer.patch(`/api/jobs/${job.id}`).send({ archived: true, version: 2 }).expect(200);
    const active = (await designer.get('/api/jobs').expect(200)).body.jobs.map((j: { id: number }) => j.id);
    const archived = (await designer.get('/api/jobs?archived=true').expect(200)).body.jobs.map((j: { id: number }) => j.id);
    expect(active).not.toContain(job.id);
    expect(archived).toContain(job.id);
    await designer.patch(`/api/jobs/${job.id}`).send({ archived: false, version: 3 }).expect(200);
    expect((await designer.get(`/api/jobs/${job.id}`).expect(200)).body.job).toMatchObject({ name: 'New name', notes: 'Measured on site', archived: false, version: 4 });
  });

  it('refuses an empty change and an unknown job', async () => {
    const empty = await designer.patch('/api/jobs/1').send({ version: 1 }).expect(400);
    expect(empty.body.error.fields).toEqual({ '(body)': 'nothing to change: send at least one field besides version' });
    expect((await designer.get('/api/jobs/999999').expect(404)).body.error.code).toBe('not-found');
    await designer.patch('/api/jobs/999999').send({ name: 'x', version: 1 }).expect(404);
  });

  it('downloads a job as a borewright.job/1 file that imports as the same job', async () => {
    const res = await designer.get('/api/jobs/1/document').expect(200);
    expect(res.headers['content-disposition']).toBe('attachment; filename=larch-lane-kitchen.borewright.json');
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    const parsed = parseJobDocument(res.body);
    expect(parsed.ok).toBe(true);
    expect(res.body).toEqual((parseJobDocument(larchLaneKitchen) as { value: unknown }).value);

    const imported = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(res.body)), 'kitchen.json').expect(201);
    expect(imported.body).toMatchObject({ name: 'Larch Lane kitchen', carcassCount: 3, panelCount: 24 });
    expect((await designer.get(`/api/jobs/${imported.body.id}/document`).expect(200)).body).toEqual(res.body);
  });

  it('refuses a bad document with every problem by its path, and writes nothing', async () => {
    const before = await counts();
    // Through JSON, as an uploaded file would arrive: the planner's panels may share placement objects.
    const bad = JSON.parse(JSON.stringify(larchLaneKitchen)) as { panels: { width: unknown; material: string; placements: { face: string }[] }[] };
    bad.panels[0].width = -560;
    bad.panels[0].placements[3].face = 'C';
    const res = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(bad)), 'bad.json').expect(400);
    expect(res.body.error.code).toBe('invalid-document');
    expect(res.body.error.details).toEqual([
      'panels[0].width: must be greater than 0',
      'panels[0].placements[3].face: Invalid option: expected one of "A"|"B"',
    ]);
    // References are checked once every field is valid (a zod object refinement waits for its fields).
    const badReference = JSON.parse(JSON.stringify(larchLaneKitchen)) as { panels: { material: string }[] };
    badReference.panels[1].material = 'oak-44';
    const refused = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(badReference)), 'bad.json').expect(400);
    expect(refused.body.error.details).toEqual(['panels[1].material: no material with id "oak-44"']);
    const notJson = await designer.post('/api/jobs/import').attach('file', Buffer.from('{"format": '), 'torn.json').expect(400);
    expect(notJson.body.error.details[0]).toMatch(/^the file is not JSON/);
    expect(await counts()).toEqual(before);
  });

  it('refuses text PostgreSQL cannot store, naming where it is', async () => {
    const doc = structuredClone(larchLaneKitchen) as { panels: { placements?: unknown[] }[] };
    doc.panels[4].placements = [{ id: 'p1', fitting: 'f', x: 1, y: 1, face: 'A', params: { 'a\u0000b': 1 } }];
    const res = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(doc)), 'nul.json').expect(400);
    expect(res.body.error.details).toEqual(['panels[4].placements[0].params.a\u0000b: must not contain the NUL character (\\u0000)']);
    const body = await designer.post('/api/jobs').send({ name: 'ok', client: 'a\u0000b' }).expect(400);
    expect(body.body.error.fields).toEqual({ client: 'must not contain the NUL character (\\u0000)' });
  });

  it('imports nothing when storing fails halfway', async () => {
    const before = await counts();
    // A database failure after the job, its carcasses and most panels are written: a trigger refuses one placement.
    await t.database.db.execute(`create function refuse_placement() returns trigger language plpgsql as $$
      begin raise exception 'refused for the test'; end $$`);
    await t.database.db.execute(`create trigger refuse_placement before insert on placements
      for each row when (new.fitting = 'refuse-me') execute function refuse_placement()`);
    const doc = structuredClone(larchLaneKitchen) as { panels: { placements?: unknown[] }[] };
    doc.panels[9].placements = [{ id: 'p1', fitting: 'refuse-me', x: 1, y: 1, face: 'A' }];
    const res = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(doc)), 'x.json').expect(500);
    expect(res.body).toEqual({ error: { code: 'internal', message: expect.any(String) } });
    expect(JSON.stringify(res.body)).not.toMatch(/refused for the test|at /);
    expect(await counts()).toEqual(before);
    await t.database.db.execute('drop trigger refuse_placement on placements');
  });

  it('asks for the file when the upload has none, and refuses a file over 5 MB with 413', async () => {
    const none = await designer.post('/api/jobs/import').field('name', 'x').expect(400);
    expect(none.body.error.fields).toHaveProperty('file');
    const big = await designer.post('/api/jobs/import').attach('file', Buffer.alloc(6 * 1024 * 1024, 32), 'big.json').expect(413);
    expect(big.body.error.code).toBe('too-large');
  });

  it('adds carcasses with a given or a made id, checking material and duplicates', async () => {
    const { body: job } = await designer.post('/api/jobs').send({ name: 'Carcass test' }).expect(201);
    const box = { name: 'Base 1', width: 600, height: 722, depth: 560, material: 'particleboard-18' };
    expect((await designer.post(`/api/jobs/${job.id}/carcasses`).send(box).expect(201)).body).toEqual({ ...box, id: 'carcass-1', mounting: 'floor' });
    expect((await designer.post(`/api/jobs/${job.id}/carcasses`).send({ ...box, id: 'b2', mounting: 'wall' }).expect(201)).body.id).toBe('b2');
    const duplicate = await designer.post(`/api/jobs/${job.id}/carcasses`).send({ ...box, id: 'b2' }).expect(409);
    expect(duplicate.body.error.fields).toEqual({ id: 'is already used in this job' });
    const material = await designer.post(`/api/jobs/${job.id}/carcasses`).send({ ...box, material: 'oak-44' }).expect(400);
    expect(material.body.error.fields).toEqual({ material: 'this job has no material with id "oak-44"' });
    expect((await designer.get(`/api/jobs/${job.id}`).expect(200)).body.carcasses).toHaveLength(2);
  });
});
