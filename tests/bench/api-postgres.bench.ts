/**
 * Many shops, two app servers, one PostgreSQL: a throwaway cluster (tests/pg/cluster.ts), migrated and
 * seeded with 50 shops of demo size (each the demo's four people, under addresses of its own, and its
 * three jobs: server/demo/seed-demo.ts `addDemoShop`), and two servers started on it as separate
 * processes (tests/throwaway-server.ts with DATABASE_URL and one SESSION_SECRET). Then:
 *
 * - job reads: `GET /api/jobs/:id` of the largest demo job of 10 shops, each request as that shop's
 *   signed-in designer, 20 connections spread over both servers, beside `/api/health` at the same
 *   connections in the same run (the ratio of their requests/s);
 * - a live update's delay: a panel saved on server 1 by a shop's designer, until its `panel-saved`
 *   event arrives on the job's stream held open on server 2 by the shop's bench member; BENCH_SAVES
 *   saves (100) one after another, while the job reads run and while nothing else does.
 *
 *   npm run bench:api                    runs it after tests/bench/api.bench.ts
 *   tsx tests/bench/api-postgres.bench.ts alone; BENCH_SECONDS (10) a read run, BENCH_SAVES (100), BENCH_SHOPS (50)
 *
 * Without PostgreSQL's binaries (/usr/lib/postgresql/<version>/bin) it says so and skips. Every figure is
 * printed with the load average, as other work on the machine sways them all.
 */
import { randomBytes } from 'node:crypto';
import { loadavg } from 'node:os';
import autocannon from 'autocannon';
import type { JobDetail, PanelRecord } from '../../shared/api/contract';
import { hashPassword } from '../../server/auth/passwords';
import { openDatabase } from '../../server/db/client';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../server/demo/greyfield-people';
import { addDemoShop } from '../../server/demo/seed-demo';
import { HttpMember, type LiveReader } from '../../server/testing/live-stream-reader';
import { findPostgresBin, startCluster } from '../pg/cluster';
import { startThrowawayServer } from '../throwaway-server';

const SECONDS = Number(process.env['BENCH_SECONDS'] ?? 10);
const SAVES = Number(process.env['BENCH_SAVES'] ?? 100);
const SHOPS = Number(process.env['BENCH_SHOPS'] ?? 50);
const CONNECTIONS = 20;
/** Shops whose designers read (every fifth shop), and of those the ones whose panels are saved. */
const READING_SHOPS = 10;
const SAVING_SHOPS = 2;

const load = () => `load ${loadavg().map((l) => l.toFixed(2)).join(' ')}`;

/** Shop n's people: the demo's names and roles, at shop-nn.example. */
const peopleOf = (n: number) => DEMO_PEOPLE.map((p) => ({ ...p, email: p.email.replace('@greyfield.example', `@shop-${String(n).padStart(2, '0')}.example`) }));

interface Reading {
  /** The shop's number (its people's addresses). */
  shop: number;
  designer: HttpMember;
  jobId: number;
  jobName: string;
  panelCount: number;
}

interface Reads {
  label: string;
  rps: number;
  p50: number;
  p99: number;
  statuses: string;
  load: string;
}

/** autocannon over both servers for `seconds`, or longer, until `until` settles, when given. */
function cannon(label: string, options: autocannon.Options, seconds: number, until?: Promise<unknown>): Promise<Reads> {
  return new Promise((resolve, reject) => {
    const started = Date.now();
    const instance = autocannon({ ...options, connections: CONNECTIONS, duration: until ? 24 * 3600 : seconds }, (err, result) => {
      if (err) return reject(err);
      const counts = { '2xx': result['2xx'], '3xx': result['3xx'], '4xx': result['4xx'], '5xx': result['5xx'] };
      // Timeouts (10 s) are counted and shown, not fatal: on a crowded machine they are the figure.
      if (result.errors > result.timeouts || result.non2xx > 0) {
        return reject(new Error(`${label}: expected 200 answers, got ${JSON.stringify(counts)}, ${result.errors} errors, ${result.timeouts} timeouts`));
      }
      resolve({
        label,
        rps: result.requests.average,
        p50: result.latency.p50,
        p99: result.latency.p99,
        statuses: [`2xx ${counts['2xx']}`, ...(result.timeouts ? [`timeouts ${result.timeouts}`] : [])].join(', '),
        load: load(),
      });
    });
    // Stopped once the work it runs beside is done, and not before a whole run's seconds.
    const stopSoon = () => setTimeout(() => instance.stop(), Math.max(0, seconds * 1000 - (Date.now() - started)));
    until?.then(stopSoon, stopSoon);
  });
}

interface Saving {
  designer: HttpMember;
  panel: PanelRecord;
  /** The bench member's stream of the job, on the other server. */
  stream: LiveReader;
}

interface Delays {
  /** From sending the save to its answer, ms. */
  answer: number[];
  /** From sending the save to its event arriving on the other server's stream, ms. */
  event: number[];
}

/** `count` saves one after another, taking turns over the shops; each waits for its event before the next. */
async function saveAndHear(savers: Saving[], count: number, first: number): Promise<Delays> {
  const delays: Delays = { answer: [], event: [] };
  for (let i = 0; i < count; i++) {
    const s = savers[i % savers.length];
    const sent = performance.now();
    const saved = await s.designer.json<PanelRecord>(`/api/panels/${s.panel.dbId}`, { method: 'PATCH', body: { version: s.panel.version, name: `Side, save ${first + i}` } });
    const answered = performance.now();
    const event = await s.stream.next('panel-saved', (e) => e.data.panelId === saved.dbId && e.data.version === saved.version, 30_000);
    delays.answer.push(answered - sent);
    delays.event.push(s.stream.arrivals.get(event)! - sent);
    s.panel = saved;
  }
  return delays;
}

function percentile(values: number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.max(0, Math.ceil(q * sorted.length) - 1)];
}

const ms = (v: number) => `${v.toFixed(1).padStart(6)} ms`;

function readsLine(run: Reads, health: Reads): string {
  const ratio = run === health ? '' : `  ${(run.rps / health.rps).toFixed(2)}× health`;
  return `  ${run.label.padEnd(44)} ${run.rps.toFixed(0).padStart(6)}/s  p50 ${String(run.p50).padStart(4)} ms  p99 ${String(run.p99).padStart(4)} ms${ratio}   (${run.statuses}; ${run.load})`;
}

function delaysLine(label: string, d: Delays, at: string): string {
  // What the other server adds to the save itself (negative when the event came before the answer).
  const after = d.event.map((e, i) => e - d.answer[i]);
  const pair = (v: number[]) => `p50 ${ms(percentile(v, 0.5))}  p95 ${ms(percentile(v, 0.95))}`;
  return `  ${label.padEnd(30)} event ${pair(d.event)}   the save's answer ${pair(d.answer)}   event after the answer ${pair(after)}   (${d.event.length} saves; ${at})`;
}

async function main(): Promise<void> {
  const bin = findPostgresBin();
  if (!bin) {
    console.log('bench:api on PostgreSQL: skipped, no PostgreSQL binaries in /usr/lib/postgresql/*/bin (apt-get install postgresql to run it)');
    return;
  }
  // Whatever was started is stopped, newest first: on success, on failure and on Ctrl-C.
  const started: (() => Promise<void>)[] = [];
  const stopAll = async () => {
    for (const stop of started.splice(0).reverse()) await stop().catch((err: unknown) => console.error('stopping:', err));
  };
  const interrupted = () => void stopAll().finally(() => process.exit(130));
  process.once('SIGINT', interrupted);
  process.once('SIGTERM', interrupted);
  const readers: LiveReader[] = [];
  try {
    const cluster = await startCluster(bin, ['borewright_bench']);
    started.push(cluster.stop);
    const url = cluster.url('borewright_bench');

    const seeding = performance.now();
    const database = await openDatabase({ engine: 'postgres', url });
    try {
      await database.migrate();
      const passwordHash = await hashPassword(DEMO_PASSWORD);
      for (let n = 1; n <= SHOPS; n++) await addDemoShop(database.db, `Bench Shop ${String(n).padStart(2, '0')}`, peopleOf(n), passwordHash);
    } finally {
      await database.close();
    }
    const seedSeconds = (performance.now() - seeding) / 1000;

    const env = { DATABASE_URL: url, SESSION_SECRET: randomBytes(32).toString('base64url') };
    const servers = await Promise.all([1, 2].map(() => startThrowawayServer({ env, logLevel: 'error', seconds: 300 })));
    for (const server of servers) started.push(server.stop);
    const [first, second] = servers.map((s) => s.baseUrl);

    console.log(
      `Many shops on PostgreSQL ${cluster.version}: ${SHOPS} shops of demo size seeded (migrated, people and jobs) in ${seedSeconds.toFixed(1)} s; two app servers; ${load()}`,
    );

    // The designers of every fifth shop, signed in on either server (a session serves both).
    const reading: Reading[] = [];
    for (let i = 0; i < READING_SHOPS; i++) {
      const n = 1 + ((i * 5) % SHOPS);
      const designer = await HttpMember.signIn(i % 2 ? second : first, peopleOf(n).find((p) => p.role === 'designer')!.email);
      const { jobs } = await designer.json<{ jobs: { id: number; name: string; panelCount: number }[] }>('/api/jobs?archived=false');
      const largest = jobs.reduce((a, b) => (b.panelCount > a.panelCount ? b : a));
      reading.push({ shop: n, designer, jobId: largest.id, jobName: largest.name, panelCount: largest.panelCount });
    }
    console.log(`  reads: ${READING_SHOPS} shops' designers, each its shop's largest job ("${reading[0].jobName}", ${reading[0].panelCount} panels), ${CONNECTIONS} connections over both servers, ${SECONDS} s a run`);

    // Each request names the next shop's job with that shop's session, whichever server it goes to.
    let turn = 0;
    const jobReads: autocannon.Options = {
      url: [first, second] as unknown as string,
      requests: [
        {
          setupRequest: (request) => {
            const r = reading[turn++ % reading.length];
            return { ...request, method: 'GET', path: `/api/jobs/${r.jobId}`, headers: { ...request.headers, cookie: r.designer.cookie } };
          },
        },
      ],
    };
    const health: autocannon.Options = { url: [`${first}/api/health`, `${second}/api/health`] as unknown as string };

    // A panel of each saving shop's read job, saved by its designer on server 1 and heard by its bench member on server 2.
    const savers: Saving[] = [];
    for (const r of reading.slice(0, SAVING_SHOPS)) {
      const { panels } = await r.designer.at(first).json<JobDetail>(`/api/jobs/${r.jobId}`);
      const bench = await HttpMember.signIn(second, peopleOf(r.shop).find((p) => p.role === 'bench')!.email);
      const stream = await bench.stream(`/api/jobs/${r.jobId}/events`);
      readers.push(stream);
      await stream.next('presence');
      savers.push({ designer: r.designer.at(first), panel: panels[0], stream });
    }

    // Warm-up: neither route pays for compiling in the figures.
    await cannon('warm-up', health, 2);
    await cannon('warm-up', jobReads, 2);
    const healthRun = await cannon('/api/health', health, SECONDS);
    const readRun = await cannon('job reads', jobReads, SECONDS);
    const saving = saveAndHear(savers, SAVES, 0);
    const readsWhileSaving = await cannon('job reads while the saves run', jobReads, SECONDS, saving);
    const loaded = await saving;
    const loadedAt = load();
    const quiet = await saveAndHear(savers, SAVES, SAVES);
    const quietAt = load();

    console.log(readsLine(healthRun, healthRun));
    console.log(readsLine(readRun, healthRun));
    console.log(readsLine(readsWhileSaving, healthRun));
    console.log(`Live update, saved on server 1, heard on server 2 by another member of the shop (${SAVING_SHOPS} shops taking turns):`);
    console.log(delaysLine('while the job reads run', loaded, loadedAt));
    console.log(delaysLine('without the read load', quiet, quietAt));
  } finally {
    readers.forEach((r) => r.close());
    await stopAll();
    process.off('SIGINT', interrupted);
    process.off('SIGTERM', interrupted);
  }
}

await main();
