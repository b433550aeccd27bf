import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sessions } from '../db/schema';
import { ApiClient, signedIn } from '../testing/api-client';
import { createTestApp, type TestApp } from '../testing/test-app';
import { SESSION_COOKIE } from './sessions';
import { SEEN_STEP_MS } from './session-timeouts';

describe('sign-in and sessions', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('answers 401 when signed out and hands out an XSRF token on the way', async () => {
    const client = new ApiClient(t.app);
    const res = await client.me();
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'unauthenticated', message: 'Not signed in.' } });
    expect(client.xsrfToken).toMatch(/^[\w-]{40,}$/);
  });

  it('signs in whatever the case of the address, with a fresh session and a fresh token', async () => {
    const client = new ApiClient(t.app);
    await client.me();
    const before = client.xsrfToken;
    const res = await client.signIn('Designer@Greyfield.example');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ user: { id: expect.any(Number), email: 'designer@greyfield.example', name: 'Tomas Ward', role: 'designer', units: 'mm' } });
    expect(client.xsrfToken).toBeDefined();
    expect(client.xsrfToken).not.toBe(before);
    const cookie = ([] as string[]).concat(res.headers['set-cookie']).find((c) => c.startsWith(`${SESSION_COOKIE}=`));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
    expect((await client.me()).body.user.role).toBe('designer');
  });

  it("lets each member choose their own units, kept across sign-ins and sent with the session's user", async () => {
    const bench = await signedIn(t.app, 'bench@greyfield.example');
    const res = await bench.patch('/api/auth/me/preferences').send({ units: 'in-32' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: 'bench@greyfield.example', units: 'in-32' });
    expect((await bench.get('/api/auth/session')).body.user.units).toBe('in-32');
    const again = new ApiClient(t.app);
    await again.me();
    expect((await again.signIn('bench@greyfield.example')).body.user.units).toBe('in-32');
    // Nobody else's choice moves with it.
    const viewer = await signedIn(t.app, 'viewer@greyfield.example');
    expect((await viewer.get('/api/auth/session')).body.user.units).toBe('mm');
    await bench.patch('/api/auth/me/preferences').send({ units: 'mm' }).expect(200);
  });

  it('refuses units it does not know, and a preference change from nobody', async () => {
    const viewer = await signedIn(t.app, 'viewer@greyfield.example');
    const bad = await viewer.patch('/api/auth/me/preferences').send({ units: 'cubits' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['units']);
    const stranger = new ApiClient(t.app);
    await stranger.me();
    expect((await stranger.patch('/api/auth/me/preferences').send({ units: 'in' })).status).toBe(401);
  });

  it('refuses a wrong password and an unknown address alike', async () => {
    const client = new ApiClient(t.app);
    const wrong = await client.signIn('viewer@greyfield.example', 'not-the-password');
    const unknown = await client.signIn('nobody@greyfield.example', 'not-the-password');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('bad-credentials');
  });

  it('names the field of a malformed sign-in', async () => {
    const client = new ApiClient(t.app);
    const res = await client.signIn('not an address', '');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ email: 'must be an e-mail address', password: 'must not be empty' });
  });

  it('destroys the session at sign-out and hands out a fresh token for the next sign-in', async () => {
    const client = await signedIn(t.app, 'bench@greyfield.example');
    const sids = async () => (await t.database.db.select({ sid: sessions.sid }).from(sessions)).map((r) => r.sid);
    const before = await sids();
    const oldToken = client.xsrfToken;
    const res = await client.post('/api/auth/sign-out');
    expect(res.status).toBe(204);
    const after = await sids();
    expect(before.filter((sid) => !after.includes(sid))).toHaveLength(1);
    expect(client.xsrfToken).toBeDefined();
    expect(client.xsrfToken).not.toBe(oldToken);
    expect((await client.get('/api/auth/me')).status).toBe(401);
    expect((await client.post('/api/auth/sign-in').send({ email: 'bench@greyfield.example', password: 'greyfield-demo' })).status).toBe(200);
  });

  it('refuses a mutating request without the XSRF header, or with another session\'s', async () => {
    const client = await signedIn(t.app, 'designer@greyfield.example');
    const other = await signedIn(t.app, 'designer@greyfield.example');
    const bare = await client.agent.post('/api/jobs').send({ name: 'Sneaky' });
    expect(bare.status).toBe(403);
    expect(bare.body.error.code).toBe('csrf');
    const crossed = await client.agent.post('/api/jobs').set('X-XSRF-TOKEN', other.xsrfToken!).send({ name: 'Sneaky' });
    expect(crossed.status).toBe(403);
    expect((await client.get('/api/jobs').expect(200)).body.jobs.map((j: { name: string }) => j.name)).not.toContain('Sneaky');
  });
});

describe('session timeouts', () => {
  const idleMs = 60 * 60_000;
  const absoluteMs = 5 * idleMs;
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ config: { session: { idleMs, absoluteMs } } });
  });
  afterAll(() => t.close());

  it('ends a session idle for longer than the idle timeout', async () => {
    const client = await signedIn(t.app, 'viewer@greyfield.example');
    t.advance(idleMs - 1000);
    expect((await client.get('/api/jobs')).status).toBe(200);
    t.advance(idleMs - 1000);
    expect((await client.get('/api/jobs')).status).toBe(200);
    t.advance(idleMs + 1000);
    expect((await client.get('/api/jobs')).status).toBe(401);
  });

  it('sends the session cookie again when a minute of use has changed the session, and not with every answer', async () => {
    const client = await signedIn(t.app, 'viewer@greyfield.example');
    const sessionCookie = (res: { headers: Record<string, unknown> }) =>
      ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith(`${SESSION_COOKIE}=`));
    const soon = await client.get('/api/jobs').expect(200);
    expect(sessionCookie(soon)).toBeUndefined();
    t.advance(SEEN_STEP_MS);
    const later = await client.get('/api/jobs').expect(200);
    // It lapses one idle timeout after this answer (Expires is to the second).
    const expires = Date.parse(/Expires=([^;]+)/.exec(sessionCookie(later) ?? '')?.[1] ?? '');
    expect(Math.abs(expires - (Date.now() + idleMs))).toBeLessThan(5_000);
  });

  it('ends a busy session once the absolute timeout has passed since sign-in', async () => {
    const client = await signedIn(t.app, 'viewer@greyfield.example');
    let elapsed = 0;
    while (elapsed + idleMs / 2 < absoluteMs) {
      t.advance(idleMs / 2);
      elapsed += idleMs / 2;
      expect((await client.get('/api/jobs')).status).toBe(200);
    }
    // Half the idle timeout since the last request, but past the absolute one since sign-in.
    t.advance(idleMs / 2 + 1000);
    expect((await client.get('/api/jobs')).status).toBe(401);
  });

  it('answers a mutating request from an expired session with 401, not a CSRF refusal', async () => {
    const client = await signedIn(t.app, 'designer@greyfield.example');
    t.advance(idleMs + 1000);
    const res = await client.post('/api/jobs').send({ name: 'Late' });
    expect(res.status).toBe(401);
  });
});

describe('production settings', () => {
  it('refuse demo accounts unless ALLOW_DEMO_IN_PRODUCTION is set (config.demoAccounts, see config.spec.ts)', async () => {
    const t = await createTestApp({ config: { demoAccounts: false } });
    const client = new ApiClient(t.app);
    const res = await client.signIn('owner@greyfield.example');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('demo-accounts-off');
    await t.close();
  });

  it('mark both cookies Secure, behind a TLS proxy', async () => {
    const t = await createTestApp({ config: { secureCookies: true, trustProxy: 'true' } });
    const res = await new ApiClient(t.app).agent.get('/api/auth/me').set('X-Forwarded-Proto', 'https');
    const cookies = ([] as string[]).concat(res.headers['set-cookie']);
    expect(cookies.map((c) => c.split('=')[0]).sort()).toEqual(['XSRF-TOKEN', SESSION_COOKIE]);
    for (const cookie of cookies) expect(cookie).toMatch(/; Secure/);
    await t.close();
  });
});
