import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { planPack } from '../../shared/export/pack';
import { exportContext } from '../../shared/testing/export-job';
import { packTools } from './export-platform';
import { packZipStream } from './pack-zip';

describe('packZipStream', () => {
  it('makes each file only when the zip reaches it, so the pack is never in memory whole', async () => {
    const ctx = exportContext();
    const made: number[] = [];
    const pack = planPack({ ctx, paper: 'a4', ...(await packTools()), onProgress: (done) => made.push(done) });
    const chunks: Buffer[] = [];
    let madeAtFirstChunk = -1;
    await new Promise((resolve, reject) => {
      packZipStream(pack, ctx.date)
        .on('data', (chunk: Buffer) => {
          if (madeAtFirstChunk < 0) madeAtFirstChunk = made.length;
          chunks.push(chunk);
        })
        .on('end', resolve)
        .on('error', reject);
    });
    expect(madeAtFirstChunk).toBeLessThan(pack.files.length / 2);
    expect(made).toHaveLength(pack.files.length);

    // Read back with jszip: every planned file is there, dated as the pack, with no folder entries.
    const zip = await JSZip.loadAsync(Buffer.concat(chunks));
    const entries = Object.values(zip.files);
    expect(entries.map((e) => e.name)).toEqual(pack.files.map((f) => f.path));
    expect(entries.every((e) => !e.dir && e.date.getTime() === entries[0].date.getTime())).toBe(true);
  }, 60_000);
});
