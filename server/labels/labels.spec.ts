import { PDFDocument } from 'pdf-lib';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { JobDetail } from '../../shared/api/contract';
import { LABELS_PER_SHEET } from '../../shared/export/labels';
import { ApiClient, signedIn } from '../testing/api-client';
import { attachmentName, binaryBody } from '../testing/binary-body';
import { createTestApp, type TestApp } from '../testing/test-app';

/** The address each label's QR code (and its link) opens, page by page, read back with pdfjs-dist. */
async function labelLinks(bytes: Buffer): Promise<string[][]> {
  const doc = await getDocument({ data: new Uint8Array(bytes), disableFontFace: true, useSystemFonts: false }).promise;
  const pages: string[][] = [];
  for (let n = 1; n <= doc.numPages; n++) pages.push((await (await doc.getPage(n)).getAnnotations()).map((a: { url: string }) => a.url));
  return pages;
}

describe('panel labels', () => {
  let t: TestApp;
  let bench: ApiClient;
  let kitchen: JobDetail;
  const download = (client: ApiClient, url: string) => client.get(url).buffer(true).parse(binaryBody);

  beforeAll(async () => {
    t = await createTestApp();
    bench = await signedIn(t.app, 'bench@greyfield.example');
    const { jobs } = (await bench.get('/api/jobs').expect(200)).body;
    kitchen = (await bench.get(`/api/jobs/${jobs.find((j: { name: string }) => j.name === 'Larch Lane kitchen').id}`).expect(200)).body;
  });
  afterAll(() => t.close());

  it('gives every panel of a job a label, 14 to an A4 sheet, carcass by carcass, each opening its bench page', async () => {
    const res = await download(bench, `/api/jobs/${kitchen.job.id}/labels.pdf`).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(attachmentName(res)).toBe('Larch Lane kitchen labels.pdf');
    const pdf = await PDFDocument.load(res.body);
    expect(pdf.getPageCount()).toBe(Math.ceil(kitchen.panels.length / LABELS_PER_SHEET));
    const links = (await labelLinks(res.body)).flat();
    // supertest reaches the app on 127.0.0.1 at a port of its own; the link takes the Host header it sent.
    expect(links).toHaveLength(kitchen.panels.length);
    const carcassOrder = kitchen.carcasses.map((c) => c.id);
    const expected = [...kitchen.panels].sort((a, b) => carcassOrder.indexOf(a.carcass!) - carcassOrder.indexOf(b.carcass!) || a.dbId - b.dbId);
    expect(links.map((l) => l.replace(/^http:\/\/127\.0\.0\.1:\d+/, ''))).toEqual(expected.map((p) => `/bench?job=${kitchen.job.id}&panel=${p.dbId}`));
  });

  it('labels only the panels asked for, by id or by carcass', async () => {
    const sink = kitchen.panels.filter((p) => p.carcass === 'sink-base');
    const byCarcass = await download(bench, `/api/jobs/${kitchen.job.id}/labels.pdf?carcass=sink-base`).expect(200);
    expect((await labelLinks(byCarcass.body)).flat().map((l) => Number(l.split('panel=').pop()))).toEqual(sink.map((p) => p.dbId));
    const two = [kitchen.panels[3].dbId, kitchen.panels[0].dbId];
    const byId = await download(bench, `/api/jobs/${kitchen.job.id}/labels.pdf?panels=${two.join(',')}`).expect(200);
    expect((await labelLinks(byId.body)).flat().map((l) => Number(l.split('panel=').pop()))).toEqual([...two].sort((a, b) => a - b));
  });

  it('builds the QR address from the proxy’s forwarded scheme and host only when TRUST_PROXY trusts it', async () => {
    const forwarded = { 'X-Forwarded-Proto': 'https', 'X-Forwarded-Host': 'workshop.greyfield.example' };
    const panel = kitchen.panels[0].dbId;
    const url = `/api/jobs/${kitchen.job.id}/labels.pdf?panels=${panel}`;
    const untrusted = await download(bench, url).set(forwarded).expect(200);
    expect((await labelLinks(untrusted.body))[0][0]).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/bench\?job=\d+&panel=\d+$/);

    const proxied = await createTestApp({ config: { trustProxy: 'loopback' } });
    try {
      const client = await signedIn(proxied.app, 'bench@greyfield.example');
      const res = await download(client, url).set(forwarded).expect(200);
      expect((await labelLinks(res.body))[0]).toEqual([`https://workshop.greyfield.example/bench?job=${kitchen.job.id}&panel=${panel}`]);
    } finally {
      await proxied.close();
    }
  });

  it('says what is wrong with a filter, and that there is nothing to label', async () => {
    const base = `/api/jobs/${kitchen.job.id}/labels.pdf`;
    expect((await bench.get(`${base}?panels=12,x`).expect(400)).body.error.fields).toEqual({ panels: 'must be panel ids separated by commas, as in panels=12,13,14' });
    expect((await bench.get(`${base}?panels=1&panels=2`).expect(400)).body.error.fields).toEqual({ panels: 'must be one comma-separated list: panels=12,13,14' });
    expect((await bench.get(`${base}?carcass=tall-unit`).expect(400)).body.error.fields).toEqual({ carcass: 'this job has no carcass with id "tall-unit"' });
    expect((await bench.get(`${base}?panels=999999`).expect(400)).body.error.fields).toEqual({ panels: 'this job has no panel 999999' });
    const owner = await signedIn(t.app, 'owner@greyfield.example');
    const empty = (await owner.post('/api/jobs').send({ name: 'Empty' }).expect(201)).body.id;
    expect((await bench.get(`/api/jobs/${empty}/labels.pdf`).expect(400)).body.error).toMatchObject({
      code: 'nothing-to-label',
      message: 'There is nothing to label: this job has no panels yet.',
    });
    await bench.get('/api/jobs/999999/labels.pdf').expect(404);
  });
});
