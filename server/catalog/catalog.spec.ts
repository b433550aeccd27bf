import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { catalogList, fittingsImported } from '../../shared/api/catalog-contract';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { makeJob, makePanel } from '../../shared/testing/make-job';
import { shopHinge } from '../../shared/testing/shop-fitting';
import { ApiClient, signedIn } from '../testing/api-client';
import { binaryBody } from '../testing/binary-body';
import { createTestApp, type TestApp } from '../testing/test-app';

describe('the catalog API', () => {
  let t: TestApp;
  let admin: ApiClient;
  let viewer: ApiClient;

  const list = async (client = viewer) => catalogList.parse((await client.get('/api/catalog').expect(200)).body).fittings;
  const shopIds = async () => (await list()).filter((e) => e.origin === 'shop').map((e) => e.fitting.id);

  beforeAll(async () => {
    t = await createTestApp();
    admin = await signedIn(t.app, 'owner@greyfield.example');
    viewer = await signedIn(t.app, 'viewer@greyfield.example');
  });
  afterAll(() => t.close());

  it('lists every built-in fitting, marked built-in, to every role', async () => {
    const entries = await list();
    expect(entries.map((e) => e.fitting.id)).toEqual([...builtinCatalog().keys()]);
    expect(entries.every((e) => e.origin === 'built-in' && e.imported === undefined)).toBe(true);
  });

  it('imports one fitting sent as JSON, marks it as the shop’s with who and when, and logs it', async () => {
    const res = await admin.post('/api/catalog/fittings').send(shopHinge()).expect(201);
    const [added] = fittingsImported.parse(res.body).fittings;
    expect(added).toMatchObject({ origin: 'shop', fitting: { id: 'shop-hinge-52', name: 'Cup hinge, full overlay, 52/5.5' }, imported: { by: 'Ruth Greyfield' } });

    const entry = (await list()).find((e) => e.fitting.id === 'shop-hinge-52');
    expect(entry).toEqual(added);
    expect(entry?.fitting.bores.map((b) => [b.id, b.x, b.y, b.diameter])).toEqual([
      ['cup', 0, 0, 35],
      ['fix-1', 5.5, -26, 8],
      ['fix-2', 5.5, 26, 8],
    ]);
    const { body } = await admin.get('/api/activity').expect(200);
    expect(body.entries[0]).toMatchObject({ action: 'catalog.imported', jobId: null, details: { fittings: ['shop-hinge-52'] } });
  });

  it('imports an uploaded catalog file, all its fittings at once', async () => {
    const file = { fittings: [shopHinge('upload-hinge-a'), shopHinge('upload-hinge-b')] };
    const res = await admin.post('/api/catalog/fittings').attach('file', Buffer.from(`\uFEFF${JSON.stringify(file)}`), 'hinges.json').expect(201);
    expect(fittingsImported.parse(res.body).fittings.map((e) => e.fitting.id)).toEqual(['upload-hinge-a', 'upload-hinge-b']);
    expect(await shopIds()).toEqual(expect.arrayContaining(['upload-hinge-a', 'upload-hinge-b']));
    const { body } = await admin.get('/api/activity').expect(200);
    expect(body.entries[0]).toMatchObject({ action: 'catalog.imported', details: { fittings: ['upload-hinge-a', 'upload-hinge-b'], file: 'hinges.json' } });
  });

  it('refuses an invalid fitting with every problem by its path, and a file with one bad fitting imports none', async () => {
    const before = await shopIds();
    const hinge = shopHinge('bad-hinge');
    const bad = { ...hinge, name: ' ', bores: [{ ...(hinge['bores'] as object[])[0], diameter: 0 }, { id: 'fix', kind: 'face', x: 5.5, y: 26, diameter: 8, depth: 'deep', source: 'x' }] };
    const res = await admin.post('/api/catalog/fittings').send(bad).expect(400);
    expect(res.body.error.code).toBe('invalid-fitting');
    expect(res.body.error.details).toEqual([
      'name: must not be empty',
      'bores[0].diameter: must be greater than 0',
      'bores[1].depth: must be a depth in mm, "system" or "through"',
    ]);
    expect(res.body.error.fields).toMatchObject({ 'bores[0].diameter': 'must be greater than 0' });

    const file = { fittings: [shopHinge('good-one'), { ...shopHinge('bad-one'), hinge: { ...(shopHinge()['hinge'] as object), boringDistance: { min: 7, max: 3 } } }] };
    const upload = await admin.post('/api/catalog/fittings').attach('file', Buffer.from(JSON.stringify(file)), 'mixed.json').expect(400);
    expect(upload.body.error.details).toEqual(['fittings[1].hinge.boringDistance.max: min must not exceed max']);
    const notJson = await admin.post('/api/catalog/fittings').attach('file', Buffer.from('{"fittings": ['), 'broken.json').expect(400);
    expect(notJson.body.error.details[0]).toMatch(/^the file is not JSON: /);
    expect(await shopIds()).toEqual(before);
  });

  it('refuses an id a built-in fitting has, saying so, and changes nothing', async () => {
    const res = await admin.post('/api/catalog/fittings').send(shopHinge('hinge-full-overlay-45')).expect(409);
    expect(res.body.error).toMatchObject({
      code: 'fitting-id-taken',
      message: 'id: "hinge-full-overlay-45" is a built-in fitting (Cup hinge, full overlay, 45/9.5); a shop\'s fitting cannot replace it, give it an id of its own. Nothing was imported.',
      fields: { id: expect.stringContaining('is a built-in fitting') },
    });
    const builtin = (await list()).find((e) => e.fitting.id === 'hinge-full-overlay-45');
    expect(builtin).toMatchObject({ origin: 'built-in', fitting: { name: 'Cup hinge, full overlay, 45/9.5' } });
  });

  it('refuses an id the shop already has, and a file with one such fitting imports none of its others', async () => {
    const res = await admin.post('/api/catalog/fittings').send(shopHinge()).expect(409);
    expect(res.body.error.message).toMatch(/^id: "shop-hinge-52" is already a shop fitting \(Cup hinge, full overlay, 52\/5\.5, imported \d{4}-\d\d-\d\d\); give this one an id of its own, or delete that one first\./);

    const file = { fittings: [shopHinge('fresh-hinge'), shopHinge('shop-hinge-52'), shopHinge('plate-0')] };
    const upload = await admin.post('/api/catalog/fittings').attach('file', Buffer.from(JSON.stringify(file)), 'clash.json').expect(409);
    expect(upload.body.error.message).toBe('2 fitting ids are already in the catalog; nothing was imported.');
    expect(upload.body.error.details).toEqual([
      expect.stringMatching(/^fittings\[1\]\.id: "shop-hinge-52" is already a shop fitting/),
      expect.stringMatching(/^fittings\[2\]\.id: "plate-0" is a built-in fitting/),
    ]);
    expect(await shopIds()).not.toContain('fresh-hinge');

    const twice = await admin.post('/api/catalog/fittings').send({ fittings: [shopHinge('twin'), shopHinge('twin')] }).expect(400);
    expect(twice.body.error.details).toEqual(['fittings[1].id: duplicate id "twin"']);
  });

  it('puts a shop fitting’s bores into the drilling map and the bench pack of a job that places it', async () => {
    // A door with the shop's 52/5.5 hinge at (21.5, 100): the cup there, its fixing holes 5.5 mm further
    // from the hinge edge and 26 mm either side, at (27, 74) and (27, 126) (the fitting's own offsets).
    const doc = makeJob([makePanel('door', { name: 'Door', role: 'door', width: 396, height: 716, placements: [{ id: 'hinge', fitting: 'shop-hinge-52', x: 21.5, y: 100, face: 'A' }] })], {
      name: 'Shop hinge job',
    });
    const { body: job } = await admin.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(doc)), 'door.json').expect(201);
    const { body: detail } = await admin.get(`/api/jobs/${job.id}`).expect(200);
    const download = (url: string) => admin.get(url).buffer(true).parse(binaryBody).expect(200);

    const svg = (await download(`/api/panels/${detail.panels[0].dbId}/drilling-map.svg`)).body.toString('utf8');
    expect(svg).toContain('Cup hinge, full overlay, 52/5.5');

    const zip = await JSZip.loadAsync((await download(`/api/jobs/${job.id}/pack.zip`)).body);
    const csv = await zip.file('Shop hinge job bench pack/hole schedule.csv')!.async('string');
    const rows = csv
      .split(/\r?\n/)
      .filter((line) => line.includes('hinge/'))
      .map((line) => line.split(',').slice(3, 9));
    // Each hole by its key (face, x, y, diameter); the last column names the bore it drills.
    expect(rows).toEqual([
      ['A:21.5:100:35', 'A', '21.5', '100', '', '35'],
      ['A:27:74:8', 'A', '27', '74', '', '8'],
      ['A:27:126:8', 'A', '27', '126', '', '8'],
    ]);
    expect(csv).toContain('hinge/fix-2');
    expect(csv).toContain('Cup hinge, full overlay, 52/5.5');
  }, 60_000);

  it('refuses to delete a shop fitting a job still uses, naming the job; deletes one no job uses', async () => {
    const res = await admin.delete('/api/catalog/fittings/shop-hinge-52').expect(409);
    expect(res.body.error).toMatchObject({
      code: 'fitting-in-use',
      message: '"Cup hinge, full overlay, 52/5.5" is still placed in 1 job: Shop hinge job. Remove it from their panels first; nothing was deleted.',
      details: ['Shop hinge job: 1 placement on 1 panel'],
    });
    expect(await shopIds()).toContain('shop-hinge-52');

    await admin.delete('/api/catalog/fittings/upload-hinge-a').expect(204);
    expect(await shopIds()).not.toContain('upload-hinge-a');
    const { body } = await admin.get('/api/activity').expect(200);
    expect(body.entries[0]).toMatchObject({ action: 'catalog.deleted', details: { fitting: 'upload-hinge-a', name: 'Cup hinge, full overlay, 52/5.5' } });
  });

  it('never deletes a built-in fitting, and says when there is no such fitting', async () => {
    const res = await admin.delete('/api/catalog/fittings/plate-0').expect(409);
    expect(res.body.error).toMatchObject({ code: 'built-in-fitting', message: '"plate-0" (Mounting plate, 0 mm) is a built-in fitting; built-in fittings cannot be deleted.' });
    await admin.delete('/api/catalog/fittings/no-such-fitting').expect(404);
    const bad = await admin.delete('/api/catalog/fittings/Not%20An%20Id').expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['fittingId']);
  });
});
