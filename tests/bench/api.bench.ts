/**
 * Job reads under load: `GET /api/jobs/:id` of the largest demo job at 10 connections, beside
 * `/api/health` in the same run (the ratio of their requests/s is the figure), as a client without a
 * cached copy (every answer whole) and as a browser revalidating its copy (If-None-Match, 304); then the
 * same whole reads while a generated 300-panel job's bench pack is made again and again. Starts a
 * throwaway server (tests/throwaway-server.ts) and signs in as the demo designer.
 *
 *   npm run bench:api                      BENCH_SECONDS=10 by default, per run
 *   npm run bench:api -- --cpu-prof        the server writes a CPU profile into bench-profiles/ when it stops
 *
 * Each run also gives the server's CPU time per answer (all its threads, the pack's workers included), and
 * of it the main thread's, which answers every request.
 */
import { readFileSync } from 'node:fs';
import autocannon from 'autocannon';
import { generateJob } from '../../shared/bench/generate-job';
import { PROGRESS_POLL_MS } from '../../shared/api/pack-contract';
import { ApiSession } from '../api-session';
import { startThrowawayServer } from '../throwaway-server';

const SECONDS = Number(process.env['BENCH_SECONDS'] ?? 10);
const CONNECTIONS = 10;
const GOAL_P99_MS = 50;
const GOAL_RATIO = 0.3;

interface Run {
  label: string;
  rps: number;
  p50: number;
  p99: number;
  statuses: string;
  /** The server process's CPU time (all its threads) per answer: on a busy machine it says more than the clock. */
  cpuMs: number;
  /** Of it, the main thread's, which answers every request. */
  mainCpuMs: number;
}

/**
 * CPU time used so far, in ms, by the whole process and by its main thread alone (Linux: utime + stime
 * of /proc/<pid>/stat and of /proc/<pid>/task/<pid>/stat, in clock ticks of 10 ms).
 */
function cpuOf(pid: number): { all: number; main: number } {
  const ticks = (file: string) => {
    const fields = readFileSync(file, 'utf8').split(') ')[1].split(' ');
    return (Number(fields[11]) + Number(fields[12])) * 10;
  };
  return { all: ticks(`/proc/${pid}/stat`), main: ticks(`/proc/${pid}/task/${pid}/stat`) };
}

async function load(pid: number, label: string, url: string, headers: Record<string, string>, expect: number, seconds = SECONDS): Promise<Run> {
  const cpuBefore = cpuOf(pid);
  const result = await autocannon({ url, connections: CONNECTIONS, duration: seconds, headers });
  const cpuAfter = cpuOf(pid);
  const counts = { '2xx': result['2xx'], '3xx': result['3xx'], '4xx': result['4xx'], '5xx': result['5xx'] };
  const wanted = `${String(expect)[0]}xx` as keyof typeof counts;
  // Timeouts (10 s) are counted and shown, not fatal: on a crowded machine they are the figure.
  const others = result.requests.total - counts[wanted];
  if (result.errors > result.timeouts || others > CONNECTIONS) {
    throw new Error(`${label}: expected ${expect} answers, got ${JSON.stringify(counts)}, ${result.errors} errors, ${result.timeouts} timeouts`);
  }
  return {
    label,
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    cpuMs: (cpuAfter.all - cpuBefore.all) / Math.max(1, result.requests.total),
    mainCpuMs: (cpuAfter.main - cpuBefore.main) / Math.max(1, result.requests.total),
    statuses: [...Object.entries(counts).filter(([, n]) => n > 0).map(([k, n]) => `${k} ${n}`), ...(result.timeouts ? [`timeouts ${result.timeouts}`] : [])].join(', '),
  };
}

function line(run: Run, health: Run): string {
  const ratio = run === health ? '' : `  ${(run.rps / health.rps).toFixed(2)}× health`;
  return `  ${run.label.padEnd(46)} ${run.rps.toFixed(0).padStart(6)}/s  p50 ${String(run.p50).padStart(4)} ms  p99 ${String(run.p99).padStart(4)} ms  server CPU ${run.cpuMs.toFixed(2)} ms an answer (main thread ${run.mainCpuMs.toFixed(2)})${ratio}   (${run.statuses})`;
}

async function main(): Promise<void> {
  const profile = process.argv.includes('--cpu-prof');
  // A busy machine can take minutes to migrate and seed a fresh data folder.
  const server = await startThrowawayServer({ logLevel: 'error', seconds: 300, nodeArgs: profile ? ['--cpu-prof', '--cpu-prof-dir=bench-profiles'] : [] });
  const { baseUrl } = server;
  try {
    const session = new ApiSession(baseUrl);
    await session.signIn('designer@greyfield.example');
    const listed = (await session.request('GET', '/api/jobs?archived=false')).body.jobs as { id: number; name: string; panelCount: number }[];
    const demo = listed.reduce((a, b) => (b.panelCount > a.panelCount ? b : a));
    const form = new FormData();
    form.append('file', new Blob([JSON.stringify({ ...generateJob(100), name: 'Bench job, 300 panels' })], { type: 'application/json' }), 'bench.json');
    const imported = await session.request('POST', '/api/jobs/import', form);
    if (imported.status !== 201) throw new Error(`importing the 300-panel job answered ${imported.status}`);

    const jobUrl = `${baseUrl}/api/jobs/${demo.id}`;
    const cookie = { cookie: session.cookieHeader() };
    const first = await fetch(jobUrl, { headers: cookie });
    const body = await first.text();
    const etag = first.headers.get('etag');
    console.log(`Job reads, ${CONNECTIONS} connections, ${SECONDS} s a run, signed in as the demo designer; load ${(await import('node:os')).loadavg().map((l) => l.toFixed(2)).join(' ')}`);
    console.log(`  job: "${demo.name}" (${demo.panelCount} panels, ${(Buffer.byteLength(body) / 1024).toFixed(1)} KB)`);

    // A short warm-up of each route, so that neither pays for compiling.
    await load(server.pid, 'warm-up', jobUrl, cookie, 200, 2);
    await load(server.pid, 'warm-up', `${baseUrl}/api/health`, {}, 200, 2);

    const health = await load(server.pid, '/api/health', `${baseUrl}/api/health`, {}, 200);
    const whole = await load(server.pid, 'job, whole answer (no cached copy)', jobUrl, cookie, 200);
    const revalidated = etag ? await load(server.pid, 'job, revalidated (If-None-Match, 304)', jobUrl, { ...cookie, 'if-none-match': etag }, 304) : undefined;

    // The same whole reads while the 300-panel job's pack is made, one after another, by one downloader
    // that follows its progress as the browser does (a ticket, and a poll every PROGRESS_POLL_MS).
    let packing = true;
    let packs = 0;
    // Its failure is reported after the reads, never left unheard.
    const downloader = (async () => {
      while (packing) {
        const ticket = `bench-pack-${Date.now()}-${packs}`;
        const poll = setInterval(() => void fetch(`${baseUrl}/api/pack-progress/${ticket}`, { headers: cookie }).then((r) => r.arrayBuffer()), PROGRESS_POLL_MS);
        try {
          const res = await fetch(`${baseUrl}/api/jobs/${imported.body.id}/pack.zip?progress=${ticket}`, { headers: cookie });
          if (!res.ok) throw new Error(`the pack answered ${res.status}`);
          await res.arrayBuffer();
        } finally {
          clearInterval(poll);
        }
        packs++;
      }
    })();
    await new Promise((r) => setTimeout(r, 500));
    downloader.catch(() => undefined);
    const underPack = await load(server.pid, 'job, whole answer, a 300-panel pack running', jobUrl, cookie, 200).finally(() => (packing = false));
    await downloader;

    console.log(line(health, health));
    console.log(line(whole, health));
    if (revalidated) console.log(line(revalidated, health));
    else console.log('  (the job route sends no ETag: no revalidated run)');
    console.log(line(underPack, health));
    console.log(`  300-panel packs made meanwhile: ${packs}`);
    const meets = (run: Run) => run.p99 <= GOAL_P99_MS;
    console.log(
      `Goals: p99 ≤ ${GOAL_P99_MS} ms ${meets(whole) && meets(underPack) ? 'met' : 'missed'} (whole ${whole.p99} ms, under a pack ${underPack.p99} ms); ` +
        `≥ ${GOAL_RATIO}× health ${whole.rps / health.rps >= GOAL_RATIO ? 'met' : 'missed'} (${(whole.rps / health.rps).toFixed(2)}×).`,
    );
  } finally {
    await server.stop();
  }
}

await main();
