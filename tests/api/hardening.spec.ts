import { gzipSync } from 'node:zlib';
import { pino } from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { larchLaneKitchen } from '../../server/demo/larch-lane-kitchen';
import { dumpTables } from '../../server/db/table-dump';
import { ApiClient, signedIn } from '../../server/testing/api-client';
import { minimalPng } from '../../server/testing/sample-files';
import { createTestApp, type TestApp } from '../../server/testing/test-app';

/**
 * Requests a stranger or a careless client can send, each of which once took the server down or
 * answered 500: every one now answers a 4xx JSON error naming what is wrong, and changes nothing.
 */
describe('hardening', () => {
  let t: TestApp;
  let stranger: ApiClient;
  let designer: ApiClient;
  const snapshot = () => dumpTables(t.database.db, new Date(0));

  beforeAll(async () => {
    t = await createTestApp();
    stranger = new ApiClient(t.app);
    await stranger.me();
    designer = await signedIn(t.app, 'designer@greyfield.example');
  });
  afterAll(() => t.close());

  function expectJsonError(res: { status: number; headers: Record<string, string>; body: { error?: { code?: string } } }, status: number, code?: string) {
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    if (code) expect(res.body.error?.code).toBe(code);
  }

  it('refuses a JSON body nested deeper than the limit before reading it, signed out, and stays up', async () => {
    const deep = `${'['.repeat(3500)}${']'.repeat(3500)}`;
    const res = await stranger.post('/api/auth/sign-in').set('Content-Type', 'application/json').send(deep);
    expectJsonError(res, 400, 'too-deep');
    // An object nest, and one hidden behind a string that merely holds brackets, which is fine.
    expectJsonError(await designer.post('/api/jobs').set('Content-Type', 'application/json').send(`${'{"a":'.repeat(100)}1${'}'.repeat(100)}`), 400, 'too-deep');
    const bracketsInText = await designer.post('/api/jobs').send({ name: `Job ${'['.repeat(150)}` });
    expect(bracketsInText.status).toBe(201);
    await stranger.get('/api/health').expect(200);
  });

  it('refuses an uploaded job document nested deeper than the limit', async () => {
    // A carcass's planner description is free-form to the document schema, so only the depth limit stands in the way.
    const kitchen = { ...larchLaneKitchen, carcasses: larchLaneKitchen.carcasses!.map((c, i) => (i === 0 ? { ...c, plannedFrom: { deep: 'NEST' } } : c)) };
    const deep = Buffer.from(JSON.stringify(kitchen).replace('"NEST"', `${'['.repeat(20_000)}${']'.repeat(20_000)}`));
    const res = await designer.post('/api/jobs/import').attach('file', deep, 'deep.json');
    expectJsonError(res, 400, 'invalid-document');
    expect(res.body.error.details).toEqual([expect.stringMatching(/^the file nests arrays or objects more than 64 deep/)]);
    await stranger.get('/api/health').expect(200);
  });

  it('answers 400 for a malformed percent-encoding in a path, on every kind of route', async () => {
    for (const url of ['/api/jobs/%E0%A4%A', '/api/panels/%E0%A4%A', '/api/attachments/%ZZ', '/api/invitations/%E0%A4%A']) {
      expectJsonError(await stranger.get(url), 400, 'malformed-url');
      expectJsonError(await designer.get(url), 400, 'malformed-url');
    }
  });

  it('logs such a refusal at warn, never as a server error', async () => {
    const lines: { level: number; msg?: string }[] = [];
    const logger = pino({ level: 'info' }, { write: (line: string) => void lines.push(JSON.parse(line)) });
    const logged = await createTestApp({ logger });
    try {
      await request(logged.app).get('/api/jobs/%E0%A4%A').expect(400);
      // pino's levels: 40 warn, 50 error (pino documentation, published).
      expect(lines.map((l) => l.level)).toEqual([40]);
    } finally {
      await logged.close();
    }
  });

  it('answers 400 for a body declared compressed that is not, and reads one that is', async () => {
    for (const encoding of ['gzip', 'deflate', 'br']) {
      const res = await designer.post('/api/jobs').set({ 'Content-Type': 'application/json', 'Content-Encoding': encoding }).send('{"name":"Plain"}');
      expectJsonError(res, 400, 'malformed-body');
    }
    const zipped = await designer
      .post('/api/jobs')
      .set({ 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' })
      // superagent would turn a Buffer sent as JSON into JSON of its bytes; this sends them as they are.
      .serialize((bytes: unknown) => bytes as string)
      .send(gzipSync(Buffer.from('{"name":"Zipped"}')));
    expect(zipped.status, JSON.stringify(zipped.body)).toBe(201);
  });

  it('refuses a lone UTF-16 surrogate in a name with a 400 naming the field, changing nothing', async () => {
    const before = await snapshot();
    const lone = 'a\udfffb';
    const job = (await designer.get('/api/jobs/1').expect(200)).body;
    const cases: [string, () => Promise<{ status: number; headers: Record<string, string>; body: { error?: { code?: string; fields?: Record<string, string>; details?: string[] } } }>, string][] = [
      ['job create', () => designer.post('/api/jobs').send({ name: lone }), 'name'],
      ['job notes', () => designer.post('/api/jobs').send({ name: 'Fine', notes: `x${'\ud800'}` }), 'notes'],
      ['job rename', () => designer.patch('/api/jobs/1').send({ name: lone, version: job.job.version }), 'name'],
      ['panel create', () => designer.post('/api/jobs/1/panels').send({ name: lone, role: 'shelf', width: 500, height: 300, thickness: 19, material: job.materials[0].id }), 'name'],
      ['carcass create', () => designer.post('/api/jobs/1/carcasses').send({ name: lone, width: 600, height: 722, depth: 560, material: job.materials[0].id }), 'name'],
      ['plan', () => designer.post('/api/jobs/1/plan').send({ name: lone, width: 600, height: 723, depth: 320, material: job.materials[0].id, back: { type: 'none' }, construction: 'dowels', fronts: { type: 'doors', count: 2, overlay: 'full', reveal: 3 }, shelves: { type: 'none' }, mounting: { type: 'wall' } }), 'name'],
      ['fitting parameter name', () => designer.put(`/api/panels/${job.panels[0].dbId}/drilling`).send({ version: job.panels[0].version, placements: [{ id: 'p1', fitting: 'shelf-pin-5', x: 37, y: 100, face: 'A', params: { [lone]: 1 } }], bores: [] }), 'placements[0].params'],
    ];
    const wrong: string[] = [];
    for (const [label, send, field] of cases) {
      const res = await send();
      // The planner names its problems in details, one line each led by the path.
      const paths = [...Object.keys(res.body.error?.fields ?? {}), ...(res.body.error?.details ?? [])];
      const named = paths.some((f) => f.startsWith(field));
      if (res.status !== 400 || !named || !/surrogate/.test(JSON.stringify(res.body))) wrong.push(`${label}: ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`);
    }
    expect(wrong).toEqual([]);
    const imported = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify({ ...larchLaneKitchen, name: lone })), 'kitchen.json');
    expectJsonError(imported, 400, 'invalid-document');
    expect(imported.body.error.details.join('\n')).toMatch(/^name: .*surrogate/m);
    const admin = await signedIn(t.app, 'owner@greyfield.example');
    const fitting = (await admin.get('/api/catalog').expect(200)).body.fittings[0].fitting;
    const catalog = await admin.post('/api/catalog/fittings').send({ ...fitting, id: 'own-fitting', name: lone });
    expect(catalog.status).toBe(400);
    expect(JSON.stringify(catalog.body)).toMatch(/surrogate/);
    expect(await snapshot()).toEqual(before);
  });

  it('names an accepted attachment for the type its content was found to be', async () => {
    const { body } = await designer.post('/api/jobs/1/attachments').attach('file', minimalPng(), { filename: 'invoice.html', contentType: 'text/html' }).expect(201);
    expect(body.filename).toBe('invoice.png');
    const download = await designer.get(`/api/attachments/${body.id}`).expect(200);
    expect(download.headers['content-disposition']).toBe('attachment; filename=invoice.png');
    expect(download.headers['content-type']).toBe('image/png');
    const { body: jpegNamed } = await designer.post('/api/jobs/1/attachments').attach('file', minimalPng(), 'site photo.JPEG').expect(201);
    expect(jpegNamed.filename).toBe('site photo.png');
    const { body: kept } = await designer.post('/api/jobs/1/attachments').attach('file', minimalPng(), 'plan.PNG').expect(201);
    expect(kept.filename).toBe('plan.PNG');
  });

  it('refuses a job edit made from a stale version with 409, keeping the first edit', async () => {
    const { body: job } = await designer.post('/api/jobs').send({ name: 'Two editors' }).expect(201);
    expect(job.version).toBe(1);
    const first = await designer.patch(`/api/jobs/${job.id}`).send({ name: 'Renamed by one', version: 1 }).expect(200);
    expect(first.body.version).toBe(2);
    const second = await designer.patch(`/api/jobs/${job.id}`).send({ notes: 'Notes from the other', version: 1 });
    expectJsonError(second, 409, 'stale-version');
    expect(second.body.error.fields).toHaveProperty('version');
    const detail = (await designer.get(`/api/jobs/${job.id}`).expect(200)).body.job;
    expect(detail).toMatchObject({ name: 'Renamed by one', notes: null, version: 2 });
    expectJsonError(await designer.patch(`/api/jobs/${job.id}`).send({ name: 'No version' }), 400, 'invalid-input');
  });
});
