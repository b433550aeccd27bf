import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ActivityEntry } from '../../shared/api/contract';
import { passwordResetAnswer, passwordResetRequested } from '../../shared/api/team-contract';
import { createApp } from '../app';
import { mailTokens } from '../db/schema';
import { createLogger } from '../logger';
import { ApiClient, signedIn } from '../testing/api-client';
import { mailsTo, waitForMail } from '../testing/caught-mail';
import { createTestApp, TEST_SESSION_SECRET, testConfig, type TestApp } from '../testing/test-app';

const NEW_PASSWORD = 'a brand new bench password';

/** A browser on the forgot-password page: not signed in, with the XSRF token the app fetches at start. */
async function stranger(t: TestApp): Promise<ApiClient> {
  const client = new ApiClient(t.app);
  await client.me();
  return client;
}

describe('password reset by mail', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ config: { mailLinks: { invitationMs: 86_400_000, passwordResetMs: 60 * 60_000, signUpMs: 86_400_000 } } });
  });
  afterAll(() => t.close());

  it('mails a link that sets a new password once, and signs out every other session', async () => {
    const elsewhere = await signedIn(t.app, 'viewer@greyfield.example');
    const browser = await stranger(t);
    const asked = await browser.post('/api/auth/password-reset').send({ email: ' Viewer@Greyfield.example ' }).expect(202);
    expect(passwordResetRequested.parse(asked.body).message).toContain('If this address belongs to a member');

    const mail = await waitForMail(t.database.db, 'viewer@greyfield.example');
    expect(mail.subject).toBe('Reset your Borewright password');
    expect(mail.text).toContain('within 60 minutes');
    expect(new URL(mail.link).pathname).toBe('/reset-password');

    const shown = passwordResetAnswer.parse((await browser.get(`/api/auth/password-reset/${mail.token}`).expect(200)).body);
    expect(shown.email).toBe('viewer@greyfield.example');

    const weak = await browser.post(`/api/auth/password-reset/${mail.token}`).send({ password: 'short' }).expect(400);
    expect(weak.body.error.fields).toEqual({ password: 'must be at least 8 bytes long' });
    await browser.post(`/api/auth/password-reset/${mail.token}`).send({ password: NEW_PASSWORD }).expect(204);

    await elsewhere.get('/api/jobs').expect(401);
    expect((await new ApiClient(t.app).signIn('viewer@greyfield.example')).status).toBe(401);
    expect((await new ApiClient(t.app).signIn('viewer@greyfield.example', NEW_PASSWORD)).status).toBe(200);

    const reused = await browser.post(`/api/auth/password-reset/${mail.token}`).send({ password: 'yet another password' }).expect(410);
    expect(reused.body.error).toMatchObject({ code: 'link-used', message: expect.stringContaining('already been used') });
    await browser.get(`/api/auth/password-reset/${mail.token}`).expect(410);
    expect((await new ApiClient(t.app).signIn('viewer@greyfield.example', NEW_PASSWORD)).status).toBe(200);

    const owner = await signedIn(t.app, 'owner@greyfield.example');
    const log = (await owner.get('/api/activity').expect(200)).body.entries as ActivityEntry[];
    expect(log[0]).toMatchObject({ action: 'member.password-reset', user: { name: 'Sam Fitter' }, details: { sessionsEnded: 1 } });
  });

  it('answers an unknown address exactly as a member\'s, and sends it nothing', async () => {
    const browser = await stranger(t);
    const unknown = await browser.post('/api/auth/password-reset').send({ email: 'stranger@example.com' }).expect(202);
    const known = await browser.post('/api/auth/password-reset').send({ email: 'designer@greyfield.example' }).expect(202);
    expect(unknown.body).toEqual(known.body);
    expect(unknown.headers['content-type']).toBe(known.headers['content-type']);
    // The member's mail arrives; by then the unknown address, asked first, has long been looked up.
    await waitForMail(t.database.db, 'designer@greyfield.example');
    expect(await mailsTo(t.database.db, 'stranger@example.com')).toEqual([]);
    expect(await t.database.db.select().from(mailTokens).where(eq(mailTokens.email, 'stranger@example.com'))).toEqual([]);
  });

  it('replaces an earlier link with a newer one', async () => {
    const browser = await stranger(t);
    await browser.post('/api/auth/password-reset').send({ email: 'owner@greyfield.example' }).expect(202);
    const first = await waitForMail(t.database.db, 'owner@greyfield.example');
    await browser.post('/api/auth/password-reset').send({ email: 'owner@greyfield.example' }).expect(202);
    const second = await waitForMail(t.database.db, 'owner@greyfield.example', first.id);
    expect((await browser.get(`/api/auth/password-reset/${first.token}`).expect(404)).body.error.code).toBe('link-unknown');
    await browser.get(`/api/auth/password-reset/${second.token}`).expect(200);
  });

  it('keeps the session of the request itself signed in', async () => {
    const bench = await signedIn(t.app, 'bench@greyfield.example');
    await bench.post('/api/auth/password-reset').send({ email: 'bench@greyfield.example' }).expect(202);
    const mail = await waitForMail(t.database.db, 'bench@greyfield.example');
    await bench.post(`/api/auth/password-reset/${mail.token}`).send({ password: NEW_PASSWORD }).expect(204);
    await bench.get('/api/jobs').expect(200);
  });

  it('points the link at the server\'s own address, whatever Host header the request carries', async () => {
    const browser = await stranger(t);
    await browser.post('/api/auth/password-reset').set('Host', 'evil.example').send({ email: 'designer@greyfield.example' }).expect(202);
    const [before] = await mailsTo(t.database.db, 'designer@greyfield.example');
    const mail = await waitForMail(t.database.db, 'designer@greyfield.example', before?.id);
    // The test app's configuration: HOST 127.0.0.1, PORT 3000 (config.ts defaults).
    expect(new URL(mail.link).origin).toBe('http://127.0.0.1:3000');
  });

  it('answers a made-up token as unknown', async () => {
    const browser = await stranger(t);
    expect((await browser.get('/api/auth/password-reset/made-up').expect(404)).body.error).toMatchObject({ code: 'link-unknown', message: expect.stringContaining('not valid') });
    await browser.post(`/api/auth/password-reset/${'Q'.repeat(43)}`).send({ password: NEW_PASSWORD }).expect(404);
  });
});

describe('password reset limits and lifetimes', () => {
  it('expires a link by the app\'s clock', async () => {
    const t = await createTestApp({ config: { mailLinks: { invitationMs: 86_400_000, passwordResetMs: 5 * 60_000, signUpMs: 86_400_000 } } });
    const browser = await stranger(t);
    await browser.post('/api/auth/password-reset').send({ email: 'viewer@greyfield.example' }).expect(202);
    const mail = await waitForMail(t.database.db, 'viewer@greyfield.example');
    t.advance(5 * 60_000 + 1000);
    const res = await browser.get(`/api/auth/password-reset/${mail.token}`).expect(410);
    expect(res.body.error).toMatchObject({ code: 'link-expired', message: expect.stringMatching(/^This password reset link expired at \d{4}-\d\d-\d\d \d\d:\d\d UTC\. Ask for a new link\.$/) });
    await browser.post(`/api/auth/password-reset/${mail.token}`).send({ password: NEW_PASSWORD }).expect(410);
    expect((await new ApiClient(t.app).signIn('viewer@greyfield.example')).status).toBe(200);
    await t.close();
  });

  it('sends nothing to a deactivated member, and withdraws their open link', async () => {
    const t = await createTestApp();
    const owner = await signedIn(t.app, 'owner@greyfield.example');
    const browser = await stranger(t);
    await browser.post('/api/auth/password-reset').send({ email: 'bench@greyfield.example' }).expect(202);
    const open = await waitForMail(t.database.db, 'bench@greyfield.example');
    const { body } = await owner.get('/api/team').expect(200);
    const bench = body.members.find((m: { email: string }) => m.email === 'bench@greyfield.example');
    await owner.patch(`/api/team/members/${bench.id}`).send({ active: false }).expect(200);
    await browser.get(`/api/auth/password-reset/${open.token}`).expect(404);

    await browser.post('/api/auth/password-reset').send({ email: 'bench@greyfield.example' }).expect(202);
    await browser.post('/api/auth/password-reset').send({ email: 'viewer@greyfield.example' }).expect(202);
    await waitForMail(t.database.db, 'viewer@greyfield.example');
    expect(await mailsTo(t.database.db, 'bench@greyfield.example')).toHaveLength(1);
    await t.close();
  });

  it('limits requests per address asked about with 429, members and strangers alike', async () => {
    const t = await createTestApp({ config: { passwordResetLimits: { windowMs: 60_000, perAccount: 2, perAddress: 100 } } });
    const browser = await stranger(t);
    for (const email of ['viewer@greyfield.example', 'stranger@example.com']) {
      for (let i = 0; i < 2; i++) await browser.post('/api/auth/password-reset').send({ email }).expect(202);
      const limited = await browser.post('/api/auth/password-reset').send({ email }).expect(429);
      expect(limited.body.error.code).toBe('too-many-attempts');
    }
    await browser.post('/api/auth/password-reset').send({ email: 'designer@greyfield.example' }).expect(202);
    await waitForMail(t.database.db, 'designer@greyfield.example');
    // Two for the viewer: the third request was refused before anything was looked up.
    await expect.poll(async () => (await mailsTo(t.database.db, 'viewer@greyfield.example')).length).toBe(2);
    await t.close();
  });

  it('counts on the database: two servers on one database share the counts', async () => {
    const limits = { windowMs: 60_000, perAccount: 3, perAddress: 100 };
    const t = await createTestApp({ config: { passwordResetLimits: limits } });
    const start = Date.now();
    let offset = 0;
    // A second server on the same database, with a clock of its own the test moves alike.
    const second = createApp({ db: t.database.db, config: testConfig({ passwordResetLimits: limits }), sessionSecret: TEST_SESSION_SECRET, logger: createLogger('silent'), mailer: t.mailer, jobEvents: t.database.jobEvents, clock: () => new Date(start + offset) });
    const one = await stranger(t);
    const other = new ApiClient(second);
    await other.me();
    const email = 'viewer@greyfield.example';
    await one.post('/api/auth/password-reset').send({ email }).expect(202);
    await other.post('/api/auth/password-reset').send({ email }).expect(202);
    await one.post('/api/auth/password-reset').send({ email }).expect(202);
    // The fourth request, on either server, is over the three the address may ask for.
    expect((await other.post('/api/auth/password-reset').send({ email }).expect(429)).body.error.code).toBe('too-many-attempts');
    await one.post('/api/auth/password-reset').send({ email }).expect(429);
    // Once the window has gone by on the app's clock, the address may ask again.
    offset += 60_001;
    await other.post('/api/auth/password-reset').send({ email }).expect(202);
    await t.close();
  });

  it('points the link at PUBLIC_URL when it is set', async () => {
    const t = await createTestApp({ config: { publicUrl: 'https://borewright.shop.example' } });
    await (await stranger(t)).post('/api/auth/password-reset').send({ email: 'viewer@greyfield.example' }).expect(202);
    const mail = await waitForMail(t.database.db, 'viewer@greyfield.example');
    expect(mail.link).toMatch(/^https:\/\/borewright\.shop\.example\/reset-password\?token=[\w-]{43}$/);
    await t.close();
  });

  it('names a malformed address', async () => {
    const t = await createTestApp();
    const res = await (await stranger(t)).post('/api/auth/password-reset').send({ email: 'nobody' }).expect(400);
    expect(res.body.error.fields).toEqual({ email: 'must be an e-mail address' });
    await t.close();
  });
});
