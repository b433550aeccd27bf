// Times the bench pack of a generated 300-panel job, streamed as the server and the command line stream it,
// with its peak memory; then, as the baseline, jszip alone zipping the same files already made.
// The ratio of the two is the figure. Run with `npm run bench:pack`.
import JSZip from 'jszip';
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { GENERATOR, packTools } from '../../server/export/export-platform';
import { packZipStream } from '../../server/export/pack-zip';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { DEFAULT_MACHINE_SETTINGS } from '../export/machine-settings';
import { planPack, type Pack } from '../export/pack';
import { generateJob } from './generate-job';

const mb = (bytes: number) => `${(bytes / 1e6).toFixed(0)} MB`;
const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

/**
 * Wall time, CPU time (this process's, all threads: on a busy machine it says more than the clock) and
 * peak resident memory, sampled every 20 ms, while `run` runs.
 */
async function measure<T>(run: () => Promise<T>): Promise<{ ms: number; cpu: number; peak: number; result: T }> {
  let peak = process.memoryUsage.rss();
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage.rss())), 20);
  const start = performance.now();
  const cpuStart = process.cpuUsage();
  const result = await run();
  const ms = performance.now() - start;
  const cpu = process.cpuUsage(cpuStart);
  clearInterval(timer);
  return { ms, cpu: (cpu.user + cpu.system) / 1000, peak: Math.max(peak, process.memoryUsage.rss()), result };
}

/** A sink that counts what a zip stream writes and keeps nothing. */
function counter(): { sink: Writable; bytes: () => number } {
  let bytes = 0;
  const sink = new Writable({ write: (chunk: Buffer, _encoding, done) => ((bytes += chunk.length), done()) });
  return { sink, bytes: () => bytes };
}

const job = generateJob(100);
const tools = await packTools();
// With the drilling programs, as the server's pack carries them (by the default machine settings).
const machine = DEFAULT_MACHINE_SETTINGS;
const plan = (): Pack =>
  planPack({ ctx: { job, catalog: builtinCatalog(), date: new Date(), generator: GENERATOR }, paper: 'a4', machine, ...tools });

// One small pack first, so that loading and compiling the libraries is not counted.
{
  const warm = generateJob(1);
  const { sink } = counter();
  await pipeline(packZipStream(planPack({ ctx: { job: warm, catalog: builtinCatalog(), date: new Date(), generator: GENERATOR }, paper: 'a4', machine, ...tools }), new Date()), sink);
}

const before = process.memoryUsage.rss();
const packed = await measure(async () => {
  const pack = plan();
  const out = counter();
  await pipeline(packZipStream(pack, new Date()), out.sink);
  return { files: pack.files.length, bytes: out.bytes() };
});

// The baseline: every file made first and held, then zipped by jszip alone, streamed the same way.
const made = plan().files;
const contents: { path: string; compress: boolean; bytes: Uint8Array }[] = [];
for (const file of made) contents.push({ path: file.path, compress: file.compress, bytes: await file.bytes() });
const zipped = await measure(async () => {
  const zip = new JSZip();
  for (const c of contents) zip.file(c.path, c.bytes, { binary: true, createFolders: false, compression: c.compress ? 'DEFLATE' : 'STORE' });
  const out = counter();
  await pipeline(zip.generateNodeStream({ type: 'nodebuffer', streamFiles: true, compression: 'DEFLATE', compressionOptions: { level: 6 } }), out.sink);
  return out.bytes();
});

console.log(`Pack of a generated job: ${job.panels.length} panels, ${packed.result.files} files, zip ${mb(packed.result.bytes)}`);
console.log(`  pack, streamed (make every file, hash, zip)   ${s(packed.ms)} (CPU ${s(packed.cpu)})   ${(packed.ms / job.panels.length).toFixed(1)} ms a panel`);
console.log(`  peak RSS while packing                         ${mb(packed.peak)} (${mb(before)} before it began)`);
console.log(`  jszip alone, the same files already made       ${s(zipped.ms)} (CPU ${s(zipped.cpu)})   ratio ${(packed.ms / zipped.ms).toFixed(1)}x (CPU ${(packed.cpu / zipped.cpu).toFixed(1)}x)`);
