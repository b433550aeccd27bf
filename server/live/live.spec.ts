import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { JobDetail, PanelRecord, User } from '../../shared/api/contract';
import { createApp } from '../app';
import { deleteSessionsOf } from '../auth/sessions.repository';
import { createLogger } from '../logger';
import { HttpMember, type LiveReader } from '../testing/live-stream-reader';
import { createTestApp, TEST_SESSION_SECRET, testConfig, type TestApp } from '../testing/test-app';
import { LiveStreams } from './live-streams';

describe('the live stream of a job', () => {
  let t: TestApp;
  let server: Server;
  let base: string;
  let designer: HttpMember;
  let bench: HttpMember;
  let panels: PanelRecord[];
  const open: LiveReader[] = [];
  const stream = async (member: HttpMember, path: string, lastEventId?: number) => {
    const reader = await member.stream(path, lastEventId);
    open.push(reader);
    return reader;
  };

  beforeAll(async () => {
    t = await createTestApp();
    server = createServer(t.app);
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    designer = await HttpMember.signIn(base, 'designer@greyfield.example');
    bench = await HttpMember.signIn(base, 'bench@greyfield.example');
    panels = (await designer.json<JobDetail>('/api/jobs/1')).panels.filter((p) => p.status === 'planned');
  });
  afterAll(async () => {
    open.forEach((r) => r.close());
    server.closeAllConnections();
    await new Promise((resolve) => server.close(resolve));
    await t.close();
  });

  it('is for members who may read the job: 401 signed out, 404 for a job or panel that is not there, 400 for a bad Last-Event-ID', async () => {
    expect((await new HttpMember(base).fetch('/api/jobs/1/events')).status).toBe(401);
    expect((await designer.fetch('/api/jobs/9999/events')).status).toBe(404);
    const otherJob = (await designer.json<JobDetail>('/api/jobs/2')).panels[0];
    expect((await designer.fetch(`/api/jobs/1/events?panel=${otherJob.dbId}`)).status).toBe(404);
    expect((await designer.fetch('/api/jobs/1/events', { headers: { 'Last-Event-ID': 'soon' } })).status).toBe(400);
    const viewer = await HttpMember.signIn(base, 'viewer@greyfield.example');
    const reader = await stream(viewer, '/api/jobs/1/events');
    expect(reader.response.status).toBe(200);
    expect(reader.response.headers.get('content-type')).toMatch(/^text\/event-stream/);
    // The security headers apply to the stream as to every answer.
    expect(reader.response.headers.get('x-content-type-options')).toBe('nosniff');
    reader.close();
  });

  it('tells who joins and leaves, with what they have open', async () => {
    const panel = panels[0];
    const watching = await stream(designer, `/api/jobs/1/events?panel=${panel.dbId}`);
    const joined = await watching.next('presence', (e) => e.data.change === 'joined' && e.data.member.panelId === panel.dbId);
    expect(joined.data.members).toContainEqual(expect.objectContaining({ panelId: panel.dbId }));
    const benchReader = await stream(bench, '/api/jobs/1/events');
    const benchJoined = await watching.next('presence', (e) => e.data.change === 'joined' && e.data.member.panelId === null);
    const benchName = benchJoined.data.member.name;
    expect(benchJoined.data.members.map((m) => m.name)).toContain(benchName);
    expect(benchJoined.data.members.length).toBeGreaterThanOrEqual(2);
    benchReader.close();
    const left = await watching.next('presence', (e) => e.data.change === 'left' && e.data.member.name === benchName);
    expect(left.data.members.map((m) => m.name)).not.toContain(benchName);
    watching.close();
  });

  it('sends a panel saved or marked by someone else, with its new version and who did it', async () => {
    const [panel] = panels;
    const watching = await stream(designer, `/api/jobs/1/events?panel=${panel.dbId}`);
    await watching.next('presence');
    const saved = await bench.json<PanelRecord>(`/api/panels/${panel.dbId}/status`, { method: 'PATCH', body: { version: panel.version, status: 'drilled' } });
    const marked = await watching.next('panel-marked', (e) => e.data.panelId === panel.dbId);
    expect(marked.data).toMatchObject({ version: saved.version, status: 'drilled', by: { name: expect.any(String) } });
    panel.version = saved.version;
    watching.close();
  });

  it('replays the events after Last-Event-ID to a reconnecting stream, in order, and none it already had', async () => {
    const panel = panels[1];
    const first = await stream(designer, '/api/jobs/1/events');
    const { id: seen } = await first.next('presence');
    first.close();
    const renamed = await designer.json<PanelRecord>(`/api/panels/${panel.dbId}`, { method: 'PATCH', body: { version: panel.version, name: 'Renamed while away' } });
    const marked = await bench.json<PanelRecord>(`/api/panels/${panel.dbId}/status`, { method: 'PATCH', body: { version: renamed.version, status: 'drilled' } });
    const again = await stream(designer, '/api/jobs/1/events', seen);
    await again.next('panel-marked', (e) => e.data.panelId === panel.dbId);
    const panelEvents = again.events.filter((e) => e.kind === 'panel-saved' || e.kind === 'panel-marked');
    expect(panelEvents.map((e) => [e.kind, 'version' in e.data ? e.data.version : 0])).toEqual([
      ['panel-saved', renamed.version],
      ['panel-marked', marked.version],
    ]);
    expect(again.events.every((e) => e.id > seen)).toBe(true);
    const ids = again.events.map((e) => e.id);
    expect(ids).toEqual([...ids].sort((a, b) => a - b));
    again.close();
  });

  it('sends a carcass planned, and ends the stream when its member signs out', async () => {
    const member = await HttpMember.signIn(base, 'designer@greyfield.example');
    const watching = await stream(member, '/api/jobs/2/events');
    await watching.next('presence');
    const { PLANNED_CARCASS } = await import('../../tests/api/planned-carcass');
    await designer.json('/api/jobs/2/plan', { method: 'POST', body: { ...PLANNED_CARCASS, id: 'live-box' } });
    const planned = await watching.next('job-planned');
    expect(planned.data.carcass).toBe('live-box');
    expect(planned.data.panelIds.length).toBeGreaterThan(0);
    await member.json('/api/auth/sign-out', { method: 'POST' });
    await watching.untilEnded();
  });
});

describe('the heartbeat of a live stream', () => {
  let t: TestApp;
  let server: Server;
  let base: string;

  beforeAll(async () => {
    t = await createTestApp();
    // A beat every 100 ms instead of 25 s, so the test need not wait.
    const liveStreams = new LiveStreams(t.database.db, t.database.jobEvents, 100);
    const app = createApp({ db: t.database.db, jobEvents: t.database.jobEvents, liveStreams, config: testConfig(), sessionSecret: TEST_SESSION_SECRET, logger: createLogger('silent'), mailer: t.mailer });
    server = createServer(app);
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    server.closeAllConnections();
    await new Promise((resolve) => server.close(resolve));
    await t.close();
  });

  it('beats with a comment, and ends the stream once the session is gone from the database (a sign-out on another server)', async () => {
    const member = await HttpMember.signIn(base, 'viewer@greyfield.example');
    const { user } = await member.json<{ user: User }>('/api/auth/me');
    const reader = await member.stream('/api/jobs/1/events');
    await reader.next('presence');
    await expect.poll(() => reader.comments.includes('heartbeat'), { timeout: 5000 }).toBe(true);
    expect(reader.ended).toBe(false);
    await deleteSessionsOf(t.database.db, user.id);
    await reader.untilEnded();
  });
});
