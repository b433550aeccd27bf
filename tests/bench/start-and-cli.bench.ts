/**
 * Whole-process times of what a person waits for at the terminal: `borewright check` on a generated job
 * of 300 panels against `node -e` only parsing the same file (medians of 5, taking turns), and a restart
 * of `npm start` on an unchanged checkout, spawn to the first successful /api/health, on a throwaway data
 * folder and a free port (median of 3, after one warm start that builds whatever is stale and seeds the
 * demo shop). Each figure with its goal and the machine's load beside it.
 *
 *   npm run bench (or tsx tests/bench/start-and-cli.bench.ts)
 */
import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateJob } from '../../shared/bench/generate-job';
import { freshBundle } from '../../scripts/server-bundle.mjs';
import { freePort } from '../free-port';

const root = fileURLToPath(new URL('../..', import.meta.url));
const CLI_RUNS = 5;
const STARTS = 3;
const GOALS = { checkMs: 500, checkRatio: 5, startMs: 3000 };

const median = (list: number[]) => [...list].sort((a, b) => a - b)[Math.floor(list.length / 2)];
const ms = (n: number) => `${Math.round(n)} ms`;
const load = () => `load ${loadavg().map((n) => n.toFixed(2)).join(' ')}`;
const verdict = (met: boolean) => (met ? 'met' : 'NOT met');

/** Wall time of one process from spawn to exit, in ms; its exit code must be one of `codes`. */
function timeProcess(args: string[], codes: number[]): number {
  const start = performance.now();
  const run = spawnSync(process.execPath, args, { cwd: root, stdio: ['ignore', 'ignore', 'pipe'] });
  const took = performance.now() - start;
  if (!codes.includes(run.status ?? -1)) throw new Error(`node ${args.join(' ')} exited with ${run.status}: ${run.stderr}`);
  return took;
}

async function commandLine(dir: string): Promise<void> {
  const job = generateJob(100);
  const file = join(dir, 'job-300.json');
  writeFileSync(file, JSON.stringify(job));
  // The bundle is built before the clock starts: the goal is a command on an unchanged checkout.
  await freshBundle('cli');
  const parse = [`-e`, `JSON.parse(require('node:fs').readFileSync(${JSON.stringify(file)}, 'utf8'))`];
  // The generated job has plates without a hinge on its right sides: the check exits 1 (errors found).
  const check = ['bin/borewright.mjs', 'check', file];
  timeProcess(check, [1]);
  const times = { parse: [] as number[], check: [] as number[] };
  for (let i = 0; i < CLI_RUNS; i++) {
    times.parse.push(timeProcess(parse, [0]));
    times.check.push(timeProcess(check, [1]));
  }
  const [parsed, checked] = [median(times.parse), median(times.check)];
  console.log(`Command line: borewright check on ${job.panels.length} panels (${(JSON.stringify(job).length / 1e6).toFixed(1)} MB), medians of ${CLI_RUNS}, ${load()}`);
  console.log(`  node -e parsing the file  ${ms(parsed)}   (runs ${times.parse.map(ms).join(', ')})`);
  console.log(`  borewright check          ${ms(checked)}   (runs ${times.check.map(ms).join(', ')})`);
  console.log(`  goal ≤ ${GOALS.checkMs} ms: ${verdict(checked <= GOALS.checkMs)}; ratio ${(checked / parsed).toFixed(1)}×, goal ≤ ${GOALS.checkRatio}×: ${verdict(checked <= GOALS.checkRatio * parsed)}`);
}

/** Starts `npm start`'s script and gives the time to the first 200 from /api/health, then stops it cleanly. */
async function timeStart(env: NodeJS.ProcessEnv, port: number): Promise<{ ms: number; ready: string }> {
  const start = performance.now();
  const server = spawn(process.execPath, ['scripts/start.mjs'], { cwd: root, env, stdio: ['ignore', 'pipe', 'inherit'] });
  let output = '';
  server.stdout.on('data', (chunk: Buffer) => (output += chunk));
  const exited = new Promise<number | null>((resolve) => server.once('exit', resolve));
  let took = 0;
  while (!took) {
    if (server.exitCode !== null) throw new Error(`the server exited with ${server.exitCode}:\n${output}`);
    if (performance.now() - start > 600_000) throw new Error('the server did not answer in 10 minutes');
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) took = performance.now() - start;
    } catch {
      // not listening yet
    }
    if (!took) await new Promise((resolve) => setTimeout(resolve, 20));
  }
  server.kill('SIGTERM');
  if ((await exited) !== 0) throw new Error(`the server did not stop cleanly:\n${output}`);
  return { ms: took, ready: output.match(/ready in (\d+ ms)/)?.[1] ?? '?' };
}

async function restart(dir: string): Promise<void> {
  const port = await freePort();
  const env = { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: join(dir, 'data'), LOG_LEVEL: 'warn' };
  const warm = await timeStart(env, port);
  const starts = [];
  for (let i = 0; i < STARTS; i++) starts.push(await timeStart(env, port));
  const took = median(starts.map((s) => s.ms));
  console.log(`Restart: npm start on an unchanged checkout to the first /api/health, median of ${STARTS} after a warm start (${ms(warm.ms)}), ${load()}`);
  console.log(`  to serving                ${ms(took)}   (runs ${starts.map((s) => `${ms(s.ms)}, server's own "ready in" ${s.ready}`).join('; ')})`);
  console.log(`  goal ≤ ${GOALS.startMs} ms: ${verdict(took <= GOALS.startMs)}`);
}

const dir = mkdtempSync(join(tmpdir(), 'borewright-bench-'));
try {
  await commandLine(dir);
  await restart(dir);
} finally {
  rmSync(dir, { recursive: true, force: true });
}
