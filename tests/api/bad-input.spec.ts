import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PanelRecord } from '../../shared/api/contract';
import { dumpTables } from '../../server/db/table-dump';
import { ApiClient, signedIn } from '../../server/testing/api-client';
import { createTestApp, type TestApp } from '../../server/testing/test-app';

describe('bad input', () => {
  let t: TestApp;
  let designer: ApiClient;
  let panel: PanelRecord;
  const snapshot = () => dumpTables(t.database.db, new Date(0));

  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
    panel = (await designer.get('/api/jobs/1').expect(200)).body.panels[0];
  });
  afterAll(() => t.close());

  /** Each case: the request, its status, and the fields (or error code) the answer must name. */
  const cases: [string, () => Promise<{ status: number; body: { error?: { code: string; fields?: Record<string, string> } } }>, number, string][] = [
    ['negative width', () => designer.post('/api/jobs/1/panels').send({ name: 'P', role: 'side', width: -560, height: 722, thickness: 18, material: 'mdf-19' }), 400, 'width'],
    ['NaN height as text', () => designer.post('/api/jobs/1/panels').send({ name: 'P', role: 'side', width: 560, height: 'NaN', thickness: 18, material: 'mdf-19' }), 400, 'height'],
    ['infinite thickness (1e999)', () => designer.post('/api/jobs/1/panels').set('Content-Type', 'application/json').send('{"name":"P","role":"side","width":560,"height":722,"thickness":1e999,"material":"mdf-19"}'), 400, 'thickness'],
    ['zero carcass depth', () => designer.post('/api/jobs/1/carcasses').send({ name: 'B', width: 600, height: 722, depth: 0, material: 'mdf-19' }), 400, 'depth'],
    ['unknown panel role', () => designer.post('/api/jobs/1/panels').send({ name: 'P', role: 'roof', width: 560, height: 722, thickness: 18, material: 'mdf-19' }), 400, 'role'],
    ['unknown status', () => designer.patch(`/api/panels/${panel.dbId}/status`).send({ version: panel.version, status: 'lost' }), 400, 'status'],
    ['empty job name', () => designer.post('/api/jobs').send({ name: '   ' }), 400, 'name'],
    ['name with control characters', () => designer.post('/api/jobs').send({ name: 'a\u0007b' }), 400, 'name'],
    ['no body at all', () => designer.post('/api/jobs'), 400, '(body)'],
    ['an array for a body', () => designer.post('/api/jobs').send([{ name: 'x' }]), 400, '(body)'],
    ['bore with a face and an edge', () => designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: panel.version, placements: [], bores: [{ id: 'b', x: 1, y: 1, face: 'C', diameter: 5, depth: 13 }] }), 400, 'bores[0]'],
    ['version as text', () => designer.patch(`/api/panels/${panel.dbId}`).send({ version: '1', name: 'x' }), 400, 'version'],
    ['job id that is not a number', () => designer.get('/api/jobs/abc'), 400, 'jobId'],
    ['job id beyond an integer', () => designer.get('/api/jobs/99999999999'), 400, 'jobId'],
    ['negative panel id', () => designer.patch('/api/panels/-1').send({ version: 1, name: 'x' }), 400, 'panelId'],
    ['archived neither true nor false', () => designer.get('/api/jobs?archived=maybe'), 400, 'archived'],
    ['archived given twice', () => designer.get('/api/jobs?archived=true&archived=false'), 400, 'archived'],
    ['delete version not a number', () => designer.delete(`/api/panels/${panel.dbId}?version=x`), 400, 'version'],
    ['malformed JSON', () => designer.post('/api/jobs').set('Content-Type', 'application/json').send('{"name": '), 400, 'code:malformed-json'],
    ['form data where JSON is expected', () => designer.post('/api/jobs').type('form').send('name=x'), 415, 'code:unsupported-media-type'],
    ['plain text where JSON is expected', () => designer.patch('/api/jobs/1').set('Content-Type', 'text/plain').send('{"name":"x"}'), 415, 'code:unsupported-media-type'],
    ['JSON where a file upload is expected', () => designer.post('/api/jobs/import').send({ file: 'x' }), 415, 'code:unsupported-media-type'],
    ['a 10 MB string', () => designer.post('/api/jobs').send({ name: 'x'.repeat(10 * 1024 * 1024) }), 413, 'code:too-large'],
    ['a torn multipart body', () => designer.post('/api/jobs/import').set('Content-Type', 'multipart/form-data; boundary=zzz').send('--zzz\r\nContent-Disposition: form-data; name="file"; filename="a.json"\r\n\r\n{'), 400, 'file'],
    ['a file named and sent as a PNG that is not one', () => designer.post('/api/jobs/1/attachments').attach('file', Buffer.from('not a picture'), { filename: 'photo.png', contentType: 'image/png' }), 415, 'file'],
    ['a cut list with one bad row among good ones', () => designer.post('/api/jobs/1/cut-list').attach('file', Buffer.from('name,width,height,thickness,material,qty\nShelf,540,300,18,plywood-18,2\nDoor,-1,700,19,mdf-19,1\n'), 'cut.csv'), 400, 'code:invalid-cut-list'],
    ['unknown API route', () => designer.get('/api/nothing-here'), 404, 'code:not-found'],
    ['unknown method on a known path', () => designer.put('/api/jobs'), 404, 'code:not-found'],
  ];

  it('answers each with its status and names the field, changing nothing', async () => {
    const before = await snapshot();
    const wrong: string[] = [];
    for (const [label, send, status, field] of cases) {
      const res = await send();
      const error = res.body.error;
      const named = field.startsWith('code:') ? error?.code === field.slice(5) : Object.keys(error?.fields ?? {}).some((f) => f.startsWith(field));
      if (res.status !== status || !named) wrong.push(`${label}: ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`);
    }
    expect(wrong).toEqual([]);
    expect(await snapshot()).toEqual(before);
  });

  it('keeps script tags in names as text', async () => {
    const name = '<script>alert("x")</script> & <b>bold</b>';
    const { body: job } = await designer.post('/api/jobs').send({ name, client: '<img src=x onerror=alert(1)>' }).expect(201);
    const res = await designer.get(`/api/jobs/${job.id}`).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.body.job).toMatchObject({ name, client: '<img src=x onerror=alert(1)>' });
    const download = await designer.get(`/api/jobs/${job.id}/document`).expect(200);
    expect(download.headers['content-disposition']).toBe('attachment; filename=script-alert-x-script-b-bold-b.borewright.json');
  });

  it('never answers 500 for what a client sends', async () => {
    const bodies: unknown[] = [null, 0, 'text', true, {}, { name: null }, { name: { $gt: '' } }, { name: ['a'] }, { version: 1e308 }];
    for (const body of bodies) {
      for (const url of ['/api/jobs', '/api/jobs/1/panels', '/api/jobs/1/carcasses']) {
        const res = await designer.post(url).set('Content-Type', 'application/json').send(JSON.stringify(body));
        expect(res.status, `${url} ${JSON.stringify(body)}`).toBeLessThan(500);
      }
      const patch = await designer.patch(`/api/panels/${panel.dbId}`).set('Content-Type', 'application/json').send(JSON.stringify(body));
      expect(patch.status, `patch ${JSON.stringify(body)}`).toBeLessThan(500);
    }
  });
});
