import JSZip from 'jszip';
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { afterAll, describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { planPack } from '../../shared/export/pack';
import { parseJobDocument } from '../../shared/model/parse-job';
import type { JobDocument } from '../../shared/model/job-document';
import { larchLaneKitchen } from '../demo/larch-lane-kitchen';
import { GENERATOR, packTools } from '../export/export-platform';
import { packZipStream } from '../export/pack-zip';
import { createLogger } from '../logger';
import type { PackOrder, PackProgress } from './pack-order';
import { PackPool } from './pack-pool';

const job = (parseJobDocument(larchLaneKitchen) as { value: JobDocument }).value;
const order: PackOrder = {
  job,
  catalog: builtinCatalog(),
  date: new Date('2026-03-14T09:00:00Z'),
  paper: 'a4',
  unit: 'mm',
  panelVersions: Object.fromEntries(job.panels.map((p, i) => [p.id, i + 1])),
  labelLinks: Object.fromEntries(job.panels.map((p, i) => [p.id, `https://shop.example/bench?job=1&panel=${i + 1}`])),
};

async function collect(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  await pipeline(stream, new Writable({ write: (chunk: Buffer, _encoding, done) => (chunks.push(chunk), done()) }));
  return Buffer.concat(chunks);
}

describe('the pack worker pool', () => {
  const pool = new PackPool(createLogger('silent'), 1);
  afterAll(() => pool.close());

  it('gives the same zip, byte for byte, as the pack made on the request thread, and tells each panel it reaches', async () => {
    const heard: PackProgress[] = [];
    const making = pool.make(order, (progress) => heard.push(progress));
    const fromWorker = await collect(making.zip);
    const { labelLinks } = order;
    const here = planPack({
      ctx: { job, catalog: order.catalog, date: order.date, generator: GENERATOR, panelVersion: (id) => order.panelVersions[id] },
      paper: 'a4',
      labelLink: (panel) => labelLinks![panel.id],
      ...(await packTools()),
    });
    expect(await making.planned).toEqual({ root: here.root, errors: here.errors });
    const fromHere = await collect(packZipStream(here, order.date));
    expect(fromWorker.equals(fromHere)).toBe(true);
    // The manifest, read back by jszip, lists every file of the zip with its SHA-256.
    const zip = await JSZip.loadAsync(fromWorker);
    const manifest = JSON.parse(await zip.file(`${here.root}/manifest.json`)!.async('string')) as { files: { path: string }[] };
    expect(manifest.files.length).toBe(Object.values(zip.files).length - 1);
    expect(heard.map((p) => p.panel)).toEqual(job.panels.map((_p, i) => i + 1));
    expect(new Set(heard.map((p) => p.panels))).toEqual(new Set([job.panels.length]));
    // Two whole packs on a busy machine: more time than a plain test is given.
  }, 120_000);

  it('stops making a pack whose download was dropped, and goes on with the next', async () => {
    const dropped = pool.make(order);
    await new Promise<void>((resolve) => dropped.zip.once('data', () => resolve()));
    dropped.zip.destroy();
    const next = await collect(pool.make({ ...order, job: { ...job, panels: job.panels.slice(0, 2) } }).zip);
    const zip = await JSZip.loadAsync(next);
    expect(Object.keys(zip.files).filter((name) => name.endsWith('.dxf'))).toHaveLength(2);
  });
});
