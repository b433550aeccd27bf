/**
 * The crash test (`npm run test:crash`): starts the real server on a throwaway data folder, fires
 * concurrent writes at it, kills it with SIGKILL at a random moment, starts it again on the same folder
 * and checks that it opens and that every write it acknowledged is there. CRASH_ROUNDS rounds (20
 * unless set); exits 1 when a round fails to reopen or an acknowledged write is missing.
 *
 * Two kinds of write: new jobs (each acknowledged one must exist with its name) and, per worker, a
 * chain of notes on one job of its own sent with the job's version (the stored notes must be the last
 * acknowledged ones, or the one in flight when the server died, never older).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ApiSession } from '../api-session';
import { freePort } from '../free-port';

const ROUNDS = Number(process.env.CRASH_ROUNDS ?? 20);
const WORKERS = 6;
const root = path.resolve(import.meta.dirname, '../..');

function startServer(dataDir: string, port: number): ChildProcess {
  // Node itself with tsx as its loader: SIGKILL then reaches the server, not a wrapper.
  return spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    cwd: root,
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, NODE_ENV: 'test', LOG_LEVEL: 'error' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
}

async function opened(base: string, server: ChildProcess, seconds: number): Promise<boolean> {
  const until = Date.now() + seconds * 1000;
  while (Date.now() < until) {
    if (server.exitCode !== null) return false;
    const ok = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) return true;
    await new Promise((r) => setTimeout(r, 100));
  }
  return false;
}

function kill(server: ChildProcess): Promise<void> {
  if (server.exitCode !== null || server.signalCode !== null) return Promise.resolve();
  const exited = new Promise<void>((resolve) => server.once('exit', () => resolve()));
  server.kill('SIGKILL');
  return exited;
}

interface NotesChain {
  jobId: number;
  version: number;
  acknowledged: string | null;
  inFlight?: string;
}

async function main(): Promise<void> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'borewright-crash-'));
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const jobs = new Map<number, string>();
  const chains: NotesChain[] = [];
  let reopened = 0;
  let acknowledged = 0;
  let lost = 0;
  let server = startServer(dataDir, port);
  try {
    if (!(await opened(base, server, 120))) throw new Error('the server did not start on a fresh data folder');
    for (let round = 1; round <= ROUNDS; round++) {
      const client = new ApiSession(base);
      await client.signIn('designer@greyfield.example');
      while (chains.length < WORKERS) {
        const { body } = await client.request('POST', '/api/jobs', { name: `Notes chain ${chains.length + 1}` });
        jobs.set(body.id, body.name);
        chains.push({ jobId: body.id, version: body.version, acknowledged: null });
      }
      let stop = false;
      const worker = async (w: number) => {
        const chain = chains[w];
        for (let n = 0; !stop; n++) {
          const name = `Crash round ${round} worker ${w} job ${n}`;
          const created = await client.request('POST', '/api/jobs', { name }).catch(() => undefined);
          if (created?.status !== 201) break;
          jobs.set(created.body.id, name);
          acknowledged++;
          const notes = `round ${round} note ${n}`;
          chain.inFlight = notes;
          const edited = await client.request('PATCH', `/api/jobs/${chain.jobId}`, { notes, version: chain.version }).catch(() => undefined);
          if (edited?.status !== 200) break;
          Object.assign(chain, { version: edited.body.version, acknowledged: notes, inFlight: undefined });
          acknowledged++;
        }
      };
      const running = Array.from({ length: WORKERS }, (_, w) => worker(w));
      // Killed at a random moment once writes are flowing, most often mid-transaction.
      const before = acknowledged;
      let finished = false;
      void Promise.all(running).then(() => (finished = true));
      while (acknowledged === before && !finished) await new Promise((r) => setTimeout(r, 10));
      await new Promise((r) => setTimeout(r, 300 + Math.random() * 1200));
      await kill(server);
      stop = true;
      await Promise.all(running);

      server = startServer(dataDir, port);
      if (!(await opened(base, server, 60))) {
        console.error(`round ${round}: the server did not open its data folder again`);
        continue;
      }
      reopened++;
      const reader = new ApiSession(base);
      await reader.signIn('designer@greyfield.example');
      const listed = new Map<number, string>((await reader.request('GET', '/api/jobs?archived=false')).body.jobs.map((j: { id: number; name: string }) => [j.id, j.name]));
      for (const [id, name] of jobs) {
        if (listed.get(id) !== name) {
          lost++;
          console.error(`round ${round}: job ${id} "${name}" was acknowledged but is ${listed.has(id) ? `named "${listed.get(id)}"` : 'missing'}`);
        }
      }
      for (const chain of chains) {
        const { body } = await reader.request('GET', `/api/jobs/${chain.jobId}`);
        const stored = body.job.notes as string | null;
        if (stored !== chain.acknowledged && stored !== (chain.inFlight ?? chain.acknowledged)) {
          lost++;
          console.error(`round ${round}: job ${chain.jobId} has notes "${stored}", acknowledged "${chain.acknowledged}"`);
        }
        Object.assign(chain, { version: body.job.version, acknowledged: stored, inFlight: undefined });
      }
      process.stdout.write(`round ${round}/${ROUNDS}: reopened, ${jobs.size} jobs checked\n`);
    }
  } finally {
    await kill(server);
    rmSync(dataDir, { recursive: true, force: true });
  }
  const percent = ((100 * reopened) / ROUNDS).toFixed(1);
  console.log(`Crash test: ${ROUNDS} rounds, reopened ${reopened} (${percent} %), ${acknowledged} acknowledged writes, ${lost} lost.`);
  if (reopened < ROUNDS || lost > 0) process.exitCode = 1;
}

await main();
