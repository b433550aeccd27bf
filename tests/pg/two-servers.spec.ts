import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { JobDetail, PanelRecord } from '../../shared/api/contract';
import { createApp } from '../../server/app';
import { openDatabase, type DatabaseHandle } from '../../server/db/client';
import { createLogger } from '../../server/logger';
import { HttpMember, type LiveReader } from '../../server/testing/live-stream-reader';
import { TEST_SESSION_SECRET, testConfig } from '../../server/testing/test-app';
import { freshDemoDatabase } from './demo-database';

const url = process.env.PG_TEST_URL;

/** One app server as main.ts starts it: a database handle of its own (its pool, its LISTEN connection), listening on a free port. */
async function startServer(database: DatabaseHandle): Promise<{ base: string; server: Server }> {
  const app = createApp({
    db: database.db,
    jobEvents: database.jobEvents,
    config: testConfig(),
    sessionSecret: TEST_SESSION_SECRET,
    logger: createLogger('silent'),
    mailer: { send: () => Promise.reject(new Error('no mail in the PostgreSQL tests')) },
  });
  const server = createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return { base: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, server };
}

describe.skipIf(!url)('two app servers on one PostgreSQL', () => {
  const handles: DatabaseHandle[] = [];
  const servers: Server[] = [];
  const readers: LiveReader[] = [];
  let first: string;
  let second: string;

  beforeAll(async () => {
    handles.push(await freshDemoDatabase(url!), await openDatabase({ engine: 'postgres', url: url! }));
    for (const handle of handles) servers.push((await startServer(handle)).server);
    [first, second] = servers.map((s) => `http://127.0.0.1:${(s.address() as AddressInfo).port}`);
  });
  afterAll(async () => {
    readers.forEach((r) => r.close());
    for (const server of servers) {
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
    }
    for (const handle of handles) await handle.close();
  });

  it('sends a panel saved through the second server to a stream open on the first, with who else is there', async () => {
    const designer = await HttpMember.signIn(first, 'designer@greyfield.example');
    const { panels } = await designer.json<JobDetail>('/api/jobs/1');
    const panel = panels.find((p) => p.status === 'planned')!;
    const watching = await designer.stream(`/api/jobs/1/events?panel=${panel.dbId}`);
    readers.push(watching);
    const designerName = (await watching.next('presence', (e) => e.data.member.panelId === panel.dbId)).data.member.name;

    // Another member, on the other server, opens the same panel: the first server's stream names them.
    const bench = await HttpMember.signIn(second, 'bench@greyfield.example');
    const benchStream = await bench.stream(`/api/jobs/1/events?panel=${panel.dbId}`);
    readers.push(benchStream);
    const benchJoined = await watching.next('presence', (e) => e.data.change === 'joined' && e.data.member.name !== designerName);
    expect(benchJoined.data.members.filter((m) => m.panelId === panel.dbId)).toHaveLength(2);

    // The designer's own session, signed in on the first server, saves through the second.
    const saved = await designer.at(second).json<PanelRecord>(`/api/panels/${panel.dbId}`, { method: 'PATCH', body: { version: panel.version, name: 'Saved on the second server' } });
    const event = await watching.next('panel-saved', (e) => e.data.panelId === panel.dbId);
    expect(event.data).toMatchObject({ version: saved.version, by: { name: designerName } });
    // The bench on the second server hears its own server's change too, under the same id.
    expect((await benchStream.next('panel-saved', (e) => e.data.panelId === panel.dbId)).id).toBe(event.id);

    // The bench leaves (its stream on the second server closes): the first server's stream says so.
    benchStream.close();
    const left = await watching.next('presence', (e) => e.data.change === 'left');
    expect(left.data.member.name).toBe(benchJoined.data.member.name);

    // A browser that reconnects to the other server resumes after the last id it saw.
    watching.close();
    const marked = await bench.json<PanelRecord>(`/api/panels/${panel.dbId}/status`, { method: 'PATCH', body: { version: saved.version, status: 'drilled' } });
    const resumed = await designer.at(second).stream('/api/jobs/1/events', event.id);
    readers.push(resumed);
    expect((await resumed.next('panel-marked')).data).toMatchObject({ panelId: panel.dbId, version: marked.version });
    expect(resumed.events.some((e) => e.kind === 'panel-saved')).toBe(false);
  });

  it('answers a pack progress poll on the server that is not making the pack', async () => {
    const viewer = await HttpMember.signIn(first, 'viewer@greyfield.example');
    const ticket = 'two-servers-pack-0123456789';
    // The smallest demo job: the point is where the poll is answered, not the pack.
    const { jobs } = await viewer.json<{ jobs: { id: number; panelCount: number }[] }>('/api/jobs');
    const smallest = jobs.filter((j) => j.panelCount > 0).sort((x, y) => x.panelCount - y.panelCount)[0];
    const download = viewer.fetch(`/api/jobs/${smallest.id}/pack.zip?progress=${ticket}`).then((res) => res.arrayBuffer().then(() => res.status));
    let done = false;
    void download.then(() => (done = true));
    const heard: { panel: number; panels: number }[] = [];
    while (!done) {
      const res = await viewer.at(second).fetch(`/api/pack-progress/${ticket}`);
      if (res.status === 200) heard.push((await res.json()) as { panel: number; panels: number });
      else await res.arrayBuffer();
      await new Promise((r) => setTimeout(r, 5));
    }
    expect(await download).toBe(200);
    expect(heard.length).toBeGreaterThan(0);
    expect((await viewer.at(second).fetch(`/api/pack-progress/${ticket}`)).status).toBe(404);
  }, 120_000);
});

