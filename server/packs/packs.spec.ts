import DxfParser from 'dxf-parser';
import JSZip from 'jszip';
import { PDFDocument } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { JobDetail } from '../../shared/api/contract';
import { jobFindings } from '../../shared/api/pack-contract';
import type { PackManifest } from '../../shared/export/manifest';
import { clashPanel, exportJob } from '../../shared/testing/export-job';
import { ApiClient, signedIn } from '../testing/api-client';
import { attachmentName, binaryBody } from '../testing/binary-body';
import { createTestApp, type TestApp } from '../testing/test-app';

describe('bench pack downloads', () => {
  let t: TestApp;
  let viewer: ApiClient;
  let kitchen: JobDetail;

  const download = (url: string) => viewer.get(url).buffer(true).parse(binaryBody);
  const panelId = (name: string) => kitchen.panels.find((p) => p.name === name)!.dbId;
  /** A panel with bores to draw: the first with loose bores or fittings. */
  const drilledPanel = () => kitchen.panels.find((p) => p.bores.length + p.placements.length > 0)!;

  beforeAll(async () => {
    t = await createTestApp();
    viewer = await signedIn(t.app, 'viewer@greyfield.example');
    const { body } = await viewer.get('/api/jobs').expect(200);
    const id = body.jobs.find((j: { name: string }) => j.name === 'Larch Lane kitchen').id;
    kitchen = (await viewer.get(`/api/jobs/${id}`).expect(200)).body;
  });
  afterAll(() => t.close());

  it("gives a panel's drilling map as SVG at full size, in mm", async () => {
    const res = await download(`/api/panels/${panelId('Sink base, door')}/drilling-map.svg`).expect(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(attachmentName(res)).toBe('Sink base, door face A.svg');
    const svg = res.body.toString('utf8');
    expect(svg).toMatch(/<svg[^>]* width="[\d.]+mm"/);
    expect(svg).toMatch(/<circle /);
  });

  it('has no face B map for a panel without face B bores', async () => {
    const res = await viewer.get(`/api/panels/${panelId('Sink base, door')}/drilling-map.svg?face=B`).expect(404);
    expect(res.body.error.code).toBe('no-such-map');
  });

  it("gives a panel's DXF in millimetres, read back by dxf-parser", async () => {
    const res = await download(`/api/panels/${drilledPanel().dbId}/drilling-map.dxf`).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/dxf/);
    const parsed = new DxfParser().parseSync(res.body.toString('utf8')) as unknown as { header: Record<string, unknown>; entities: { type: string }[] };
    expect(parsed.header.$INSUNITS).toBe(4);
    expect(parsed.entities.filter((e) => e.type === 'CIRCLE').length).toBeGreaterThan(0);
  });

  it('gives template sheets as PDF on A4 or US Letter, read back by pdf-lib', async () => {
    const id = panelId('Sink base, door');
    for (const [paper, size] of [['a4', [595.28, 841.89]], ['letter', [612, 792]]] as const) {
      const res = await download(`/api/panels/${id}/template.pdf?paper=${paper}`).expect(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      const pdf = await PDFDocument.load(res.body);
      const { width, height } = pdf.getPage(0).getSize();
      expect([Math.min(width, height), Math.max(width, height)].map((n) => Math.round(n * 100) / 100)).toEqual(size);
    }
  });

  it('refuses a paper it does not know, naming the field', async () => {
    const res = await viewer.get(`/api/panels/${panelId('Sink base, door')}/template.pdf?paper=a3`).expect(400);
    expect(res.body.error.fields).toEqual({ paper: 'must be "a4" or "letter"' });
  });

  it('answers 404 for a panel that does not exist', async () => {
    await viewer.get('/api/panels/999999/drilling-map.dxf').expect(404);
  });

  it('streams the whole pack as a zip whose manifest lists every file with its SHA-256', async () => {
    const res = await download(`/api/jobs/${kitchen.job.id}/pack.zip?paper=letter`).expect(200);
    expect(res.headers['content-type']).toBe('application/zip');
    expect(attachmentName(res)).toBe('Larch Lane kitchen bench pack.zip');
    const zip = await JSZip.loadAsync(res.body);
    const manifest = JSON.parse(await zip.file('Larch Lane kitchen bench pack/manifest.json')!.async('string')) as PackManifest;
    expect(manifest).toMatchObject({ format: 'borewright.pack/1', paper: 'letter', job: { name: 'Larch Lane kitchen', panels: kitchen.panels.length } });
    for (const file of manifest.files) expect(zip.file(`Larch Lane kitchen bench pack/${file.path}`), file.path).not.toBeNull();
  }, 60_000);

  it('counts the findings of a job, and still packs a job with errors, saying so', async () => {
    const designer = await signedIn(t.app, 'designer@greyfield.example');
    const doc = exportJob({ name: 'Clash / job' }, [clashPanel()]);
    const { body: job } = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(doc)), 'clash.json').expect(201);

    const findings = jobFindings.parse((await viewer.get(`/api/jobs/${job.id}/findings`).expect(200)).body);
    expect(findings.errors).toBeGreaterThan(0);
    expect(findings.errors).toBe(findings.findings.filter((f) => f.severity === 'error').length);
    expect(findings.findings.some((f) => f.code === 'bores-overlap' && f.panel === 'clash')).toBe(true);

    const res = await download(`/api/jobs/${job.id}/pack.zip`).expect(200);
    expect(attachmentName(res)).toBe('Clash - job bench pack.zip');
    const manifest = JSON.parse(await (await JSZip.loadAsync(res.body)).file('Clash - job bench pack/manifest.json')!.async('string')) as PackManifest;
    expect(manifest.findings.error).toBe(findings.errors);
  }, 60_000);

  it("makes the files and words the findings in the units of whoever asks", async () => {
    const designer = await signedIn(t.app, 'designer@greyfield.example');
    const doc = exportJob({ name: 'Inch job' }, [clashPanel()]);
    const { body: job } = await designer.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(doc)), 'inch.json').expect(201);
    const bench = await signedIn(t.app, 'bench@greyfield.example');
    await bench.patch('/api/auth/me/preferences').send({ units: 'in-32' }).expect(200);
    const get = (url: string) => bench.get(url).buffer(true).parse(binaryBody);

    // Two Ø10 bores 2 mm apart overlap by 8 mm; with the international inch of 25.4 mm (NIST SP 811,
    // published) 8 mm = 0.315 in = 10.08/32 → 10/32 = 5/16.
    const findings = jobFindings.parse((await bench.get(`/api/jobs/${job.id}/findings`).expect(200)).body);
    expect(findings.findings.find((f) => f.code === 'bores-overlap')!.message).toContain('overlap by 5/16"');
    expect(jobFindings.parse((await viewer.get(`/api/jobs/${job.id}/findings`).expect(200)).body).findings.find((f) => f.code === 'bores-overlap')!.message).toContain('overlap by 8 mm');

    // The 200 mm panel is 7.874 in = 251.97/32 → 252/32 = 7 7/8; its bore at 50 mm is 1.9685 in = 62.99/32 → 63/32 = 1 31/32.
    const clashId = (await bench.get(`/api/jobs/${job.id}`).expect(200)).body.panels.find((p: { name: string }) => p.name === 'Clash').dbId;
    const svg = (await get(`/api/panels/${clashId}/drilling-map.svg`).expect(200)).body.toString('utf8');
    expect(svg).toContain('7 7/8&quot; × 7 7/8&quot;');
    expect(svg).toContain('1 31/32&quot;');

    const zip = await JSZip.loadAsync((await get(`/api/jobs/${job.id}/pack.zip`).expect(200)).body);
    const schedule = await zip.file('Inch job bench pack/hole schedule.csv')!.async('string');
    expect(schedule.split('\r\n')[0]).toMatch(/,x in inches,y in inches,z from face A in inches$/);
    expect(schedule).toContain('"1 31/32"""');
    await bench.patch('/api/auth/me/preferences').send({ units: 'mm' }).expect(200);
  }, 60_000);
});
