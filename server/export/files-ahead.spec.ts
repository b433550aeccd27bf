import { createHash } from 'node:crypto';
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { DEFAULT_MACHINE_SETTINGS } from '../../shared/export/machine-settings';
import type { PackManifest } from '../../shared/export/manifest';
import type { JobDocument } from '../../shared/model/job-document';
import { parseJobDocument } from '../../shared/model/parse-job';
import { larchLaneKitchen } from '../demo/larch-lane-kitchen';
import { GENERATOR, packTools } from './export-platform';
import { planPackAhead } from './files-ahead';
import { packZipStream } from './pack-zip';

const job = (parseJobDocument(larchLaneKitchen) as { value: JobDocument }).value;
const date = new Date('2026-03-14T09:00:00Z');
const versions = Object.fromEntries(job.panels.map((p, i) => [p.id, i + 1]));

/** The demo job's pack with drilling programs, zipped, by `threads` threads; and how many SVG maps this thread drew. */
async function zipBy(threads: number): Promise<{ zip: Buffer; drawnHere: number; svgs: number }> {
  const tools = await packTools();
  let drawnHere = 0;
  const pack = planPackAhead(
    {
      ctx: { job, catalog: builtinCatalog(), date, generator: GENERATOR, panelVersion: (id) => versions[id], unit: 'in-32' },
      paper: 'letter',
      machine: DEFAULT_MACHINE_SETTINGS,
      ...tools,
      svgWindow: () => (drawnHere++, tools.svgWindow()),
    },
    threads,
  );
  const chunks: Buffer[] = [];
  await pipeline(packZipStream(pack, date), new Writable({ write: (chunk: Buffer, _encoding, done) => (chunks.push(chunk), done()) }));
  return { zip: Buffer.concat(chunks), drawnHere, svgs: pack.files.filter((f) => f.path.endsWith('.svg')).length };
}

describe('planPackAhead', () => {
  it('zips the same bytes with panels made by a second thread as by one thread alone', async () => {
    const one = await zipBy(1);
    const two = await zipBy(2);
    // With one thread every map is drawn here; with two, the helper drew some: the comparison is of two ways of making.
    expect(one.drawnHere).toBe(one.svgs);
    expect(two.drawnHere).toBeGreaterThan(0);
    expect(two.drawnHere).toBeLessThan(two.svgs);
    expect(two.zip.equals(one.zip)).toBe(true);

    // Read back with jszip, every file's SHA-256 (node:crypto) is the one the manifest records.
    const zip = await JSZip.loadAsync(two.zip);
    const [manifestName] = Object.keys(zip.files).filter((name) => name.endsWith('/manifest.json'));
    const root = manifestName.slice(0, -'/manifest.json'.length);
    const manifest = JSON.parse(await zip.file(manifestName)!.async('string')) as PackManifest;
    expect(manifest.files.length).toBe(Object.keys(zip.files).length - 1);
    for (const file of manifest.files) {
      const bytes = await zip.file(`${root}/${file.path}`)!.async('uint8array');
      expect(createHash('sha256').update(bytes).digest('hex'), file.path).toBe(file.sha256);
    }
    // Two whole packs, one with a worker thread to start, on a busy machine.
  }, 180_000);
});
