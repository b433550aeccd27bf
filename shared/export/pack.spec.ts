import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { packTools } from '../../server/export/export-platform';
import { clashPanel, exportContext, exportJob } from '../testing/export-job';
import { readPdfPage } from '../testing/pdf-page';
import type { PackManifest } from './manifest';
import { planPack, type PackInput } from './pack';

const tools = await packTools();

function input(ctx = exportContext(), onProgress?: PackInput['onProgress']): PackInput {
  return { ctx, paper: 'a4', ...tools, ...(onProgress ? { onProgress } : {}) };
}

/** Makes every file in order, as a zip writer would. */
async function makeAll(files: ReturnType<typeof planPack>['files']): Promise<Map<string, Uint8Array>> {
  const made = new Map<string, Uint8Array>();
  for (const file of files) made.set(file.path, await file.bytes());
  return made;
}

describe('planPack', () => {
  it('puts each panel in its carcass folder, the lists and the cover beside them, the manifest last', () => {
    const { root, files } = planPack(input());
    expect(root).toBe('Larch Lane kitchen bench pack');
    const paths = files.map((f) => f.path.slice(root.length + 1));
    expect(paths.slice(0, 5)).toEqual(['cover sheet.pdf', 'panel labels.pdf', 'README.txt', 'hole schedule.csv', 'hardware list.csv']);
    expect(paths.at(-1)).toBe('manifest.json');
    expect(paths).toEqual(
      expect.arrayContaining([
        'Base unit/Base unit, left side face A.svg',
        'Base unit/Base unit, left side face B.svg',
        'Base unit/Base unit, left side.dxf',
        'Base unit/Base unit, left side templates A4.pdf',
        'Base unit/Base unit, door face A.svg',
        'no carcass/Back.dxf',
      ]),
    );
    expect(paths).not.toContain('Base unit/Base unit, door face B.svg');
  });

  it('never lets a name leave its folder: slashes, dots and control characters are made safe', () => {
    const job = exportJob();
    job.name = '../../etc/passwd';
    job.carcasses[0].name = '..';
    job.panels[0].name = 'a/b\\c';
    job.panels[1].name = '.\u0000.';
    job.panels[2].name = 'C:\\door\u0007';
    const { root, files } = planPack(input(exportContext(job)));
    for (const { path } of files) {
      const segments = path.split('/');
      expect(segments[0]).toBe(root);
      expect(segments.length).toBeLessThanOrEqual(3);
      for (const segment of segments) {
        expect(segment).not.toMatch(/^\.{1,2}$|^$|[\u0000-\u001f\\:]/);
        expect(segment).not.toMatch(/^[.\s]|[.\s]$/);
      }
    }
    expect(root).toBe('etc-passwd bench pack');
    expect(files.map((f) => f.path)).toContain('etc-passwd bench pack/base/a-b-c.dxf');
  });

  it('names two panels of the same name apart', () => {
    const job = exportJob();
    job.panels[1].name = job.panels[0].name;
    const paths = planPack(input(exportContext(job))).files.map((f) => f.path);
    expect(paths).toContain('Larch Lane kitchen bench pack/Base unit/Base unit, left side (2).dxf');
  });

  it('tells progress once per file, in order, ending with the manifest', async () => {
    const calls: [number, number, string][] = [];
    const { files } = planPack(input(exportContext(), (done, total, label) => calls.push([done, total, label])));
    await makeAll(files);
    expect(calls.map(([done]) => done)).toEqual(files.map((_, i) => i + 1));
    expect(new Set(calls.map(([, total]) => total))).toEqual(new Set([files.length]));
    expect(calls[0][2]).toBe('cover sheet');
    expect(calls.at(-1)![2]).toBe('manifest');
  }, 60_000);

  it('records every other file with its SHA-256 in manifest.json', async () => {
    const { root, files } = planPack(input());
    const made = await makeAll(files);
    const manifest = JSON.parse(new TextDecoder().decode(made.get(`${root}/manifest.json`))) as PackManifest;
    expect(manifest).toMatchObject({
      format: 'borewright.pack/1',
      job: { name: 'Larch Lane kitchen', carcasses: 1, panels: 4 },
      createdAt: '2026-03-14T09:30:00.000Z',
      generator: { name: 'Borewright', version: '0.0.0-test' },
      paper: 'a4',
      findings: { error: 0, warning: 0, note: 0 },
    });
    expect(manifest.files).toHaveLength(files.length - 1);
    for (const entry of manifest.files) {
      const bytes = made.get(`${root}/${entry.path}`)!;
      // node:crypto recomputes each hash from the bytes themselves.
      expect(entry.sha256).toBe(createHash('sha256').update(bytes).digest('hex'));
      expect(entry.bytes).toBe(bytes.length);
    }
    expect(manifest.panels.find((p) => p.id === 'door')!.files).toEqual(['Base unit/Base unit, door face A.svg', 'Base unit/Base unit, door.dxf', 'Base unit/Base unit, door templates A4.pdf']);
  }, 60_000);

  it('refuses to write the manifest before the files it lists', async () => {
    const { files } = planPack(input());
    await expect(files.at(-1)!.bytes()).rejects.toThrow(/manifest.json is written last/);
  });

  it('lists the labels, the README sheet and our DXF layer scheme in the manifest, and every panel with its holes and side', async () => {
    const { root, files } = planPack(input());
    const made = await makeAll(files);
    const manifest = JSON.parse(new TextDecoder().decode(made.get(`${root}/manifest.json`))) as PackManifest;
    expect(manifest.sheets).toEqual({ cover: 'cover sheet.pdf', labels: 'panel labels.pdf', readme: 'README.txt', holeSchedule: 'hole schedule.csv', hardwareList: 'hardware list.csv' });
    expect(manifest.files.map((f) => f.path)).toEqual(expect.arrayContaining(['panel labels.pdf', 'README.txt']));
    expect(manifest.dxfLayers.pattern).toBe('<where>-DIA_<diameter mm>-<DEPTH_<depth mm> | THROUGH>-<purpose>');
    expect(manifest.dxfLayers.used).toEqual(expect.arrayContaining(['FACE_A-DIA_35-DEPTH_13-HINGE_CUP', 'FACE_A-DIA_5-DEPTH_13-SHELF_PIN', 'EDGE_X0-DIA_8-DEPTH_30-LOOSE']));
    expect(manifest.panels.find((p) => p.id === 'side-l')).toMatchObject({ side: 'left', hasErrors: false });
    const readme = new TextDecoder().decode(made.get(`${root}/README.txt`));
    expect(readme).toContain('READ ME FIRST');
    expect(readme).toContain('Hole layers are named <where>-DIA_<diameter mm>-<DEPTH_<depth mm> | THROUGH>-<purpose>:');
    expect(readme).toContain('purpose: what the hole is for: CONSTRUCTION, HINGE_CUP, MOUNTING_PLATE, SHELF_PIN, LIFT_MECHANISM, RUNNER');
    // The labels come on the pack's paper, a label per panel (14 to a sheet: one sheet here).
    const labels = await readPdfPage(made.get(`${root}/panel labels.pdf`)!, 1);
    expect(labels.pages).toBe(1);
    expect(labels.text).toContain('Base unit, left side');
    expect(labels.text).toContain('LEFT side (seen from the front)');
  }, 60_000);

  it('still makes the pack of a job with errors: cover, README and manifest carry the findings, the panel says "has errors"', async () => {
    const { root, files, errors } = planPack(input(exportContext(exportJob({}, [clashPanel()]))));
    expect(errors).toBe(1);
    const made = await makeAll(files);
    const manifest = JSON.parse(new TextDecoder().decode(made.get(`${root}/manifest.json`))) as PackManifest;
    expect(manifest.findings.error).toBe(1);
    expect(manifest.findingList).toEqual([expect.objectContaining({ severity: 'error', code: 'bores-overlap', panel: 'clash' })]);
    expect(manifest.panels.find((p) => p.id === 'clash')!.hasErrors).toBe(true);
    expect(manifest.panels.find((p) => p.id === 'door')!.hasErrors).toBe(false);
    expect(new TextDecoder().decode(made.get(`${root}/README.txt`))).toContain('THIS PACK CONTAINS ERRORS (1)');
    const cover = await readPdfPage(made.get(`${root}/cover sheet.pdf`)!, 1);
    expect(cover.text).toContain('CONTAINS ERRORS');
    const svg = new TextDecoder().decode(made.get(`${root}/no carcass/Clash face A.svg`));
    expect(svg).toContain('HAS ERRORS (1): see the cover sheet');
    const templates = await readPdfPage(made.get(`${root}/no carcass/Clash templates A4.pdf`)!, 1);
    expect(templates.text).toContain('HAS ERRORS');
    const tile = await readPdfPage(made.get(`${root}/no carcass/Clash templates A4.pdf`)!, 2);
    expect(tile.text).toContain('HAS ERRORS (1): see the cover sheet · A1');
    expect(new TextDecoder().decode(made.get(`${root}/no carcass/Clash.dxf`))).toContain('HAS ERRORS (1): SEE THE COVER SHEET');
    // A panel without errors says so, and nothing more.
    expect(new TextDecoder().decode(made.get(`${root}/Base unit/Base unit, door face A.svg`))).not.toContain('HAS ERRORS');
  }, 60_000);

  it('counts the errors the checks found, for the screen to confirm', () => {
    expect(planPack(input(exportContext(exportJob({}, [clashPanel()])))).errors).toBe(1);
    expect(planPack(input()).errors).toBe(0);
  });
});
