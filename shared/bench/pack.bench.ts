// Times the bench pack of a generated 300-panel job, streamed as the server and the command line stream it,
// with its peak memory: made by one thread alone (as the server makes it) and by two threads (as the
// command line does on a machine of three cores or more), each in a process of its own so that neither
// inherits the other's memory, the zips checked to be the same; then, as the baseline, jszip alone
// zipping the same files already made. Run with `npm run bench:pack`.
import JSZip from 'jszip';
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { loadavg } from 'node:os';
import { Writable } from 'node:stream';
import { promisify } from 'node:util';
import { fileURLToPath } from 'node:url';
import { pipeline } from 'node:stream/promises';
import { GENERATOR, packTools } from '../../server/export/export-platform';
import { planPackAhead } from '../../server/export/files-ahead';
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

/** A sink that counts and hashes what a zip stream writes and keeps nothing. */
function counter(): { sink: Writable; bytes: () => number; sha256: () => string } {
  let bytes = 0;
  const hash = createHash('sha256');
  const sink = new Writable({ write: (chunk: Buffer, _encoding, done) => ((bytes += chunk.length), hash.update(chunk), done()) });
  return { sink, bytes: () => bytes, sha256: () => hash.digest('hex') };
}

const job = generateJob(100);
const tools = await packTools();
// With the drilling programs, as the server's pack carries them (by the default machine settings).
const machine = DEFAULT_MACHINE_SETTINGS;
// One date for every run, so that the zips of one and of two threads can be compared byte for byte: a run
// by a number of threads (`--threads <n> <date>`) is told the date by the run that started it.
const [, , flag, threadsArg, dateArg] = process.argv;
const date = flag === '--threads' ? new Date(dateArg) : new Date();
const plan = (threads = 1): Pack => planPackAhead({ ctx: { job, catalog: builtinCatalog(), date, generator: GENERATOR }, paper: 'a4', machine, ...tools }, threads);

// One small pack first, so that loading and compiling the libraries is not counted.
{
  const warm = generateJob(1);
  const { sink } = counter();
  await pipeline(packZipStream(planPack({ ctx: { job: warm, catalog: builtinCatalog(), date: new Date(), generator: GENERATOR }, paper: 'a4', machine, ...tools }), new Date()), sink);
}

async function packWith(threads: number) {
  const before = process.memoryUsage.rss();
  const packed = await measure(async () => {
    const pack = plan(threads);
    const out = counter();
    await pipeline(packZipStream(pack, date), out.sink);
    return { files: pack.files.length, bytes: out.bytes(), sha256: out.sha256() };
  });
  return { ...packed, before };
}

type Run = Awaited<ReturnType<typeof packWith>>;

if (flag === '--threads') {
  process.stdout.write(JSON.stringify(await packWith(Number(threadsArg))));
  process.exit(0);
}

const runs: (Run & { threads: number })[] = [];
for (const threads of [1, 2]) {
  const { stdout } = await promisify(execFile)(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url), '--threads', String(threads), date.toISOString()], { maxBuffer: 1e6 });
  runs.push({ threads, ...(JSON.parse(stdout) as Run) });
}
if (runs[1].result.sha256 !== runs[0].result.sha256) throw new Error('the zips made by one and by two threads differ');

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

const [one] = runs;
console.log(`Pack of a generated job: ${job.panels.length} panels, ${one.result.files} files, zip ${mb(one.result.bytes)}, the same bytes by 1 and 2 threads`);
for (const run of runs) {
  console.log(`  threads=${run.threads}: pack, streamed (make every file, hash, zip)   ${s(run.ms)} (CPU ${s(run.cpu)})   ${(run.ms / job.panels.length).toFixed(1)} ms a panel`);
  console.log(`  threads=${run.threads}: peak RSS while packing                         ${mb(run.peak)} (${mb(run.before)} before it began)`);
}
console.log(`  jszip alone, the same files already made                 ${s(zipped.ms)} (CPU ${s(zipped.cpu)})`);
console.log(`  load average (1, 5, 15 min) at the end                   ${loadavg().map((l) => l.toFixed(2)).join(', ')}`);
