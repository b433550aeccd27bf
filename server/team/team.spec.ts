import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ActivityEntry } from '../../shared/api/contract';
import { invitationAnswer, pendingInvitation, teamAnswer, type TeamMember } from '../../shared/api/team-contract';
import { mailTokens, users } from '../db/schema';
import { ApiClient, signedIn } from '../testing/api-client';
import { mailsTo } from '../testing/caught-mail';
import { createTestApp, type TestApp } from '../testing/test-app';
import { hashMailToken } from './mail-tokens';

const NEW_PASSWORD = 'a long enough new password';

describe('invitations', () => {
  let t: TestApp;
  let owner: ApiClient;

  /** Invites an address as the owner and returns the token the mail carries. */
  async function invite(email: string, role = 'bench'): Promise<string> {
    await owner.post('/api/team/invitations').send({ email, role }).expect(201);
    const [mail] = await mailsTo(t.database.db, email.toLowerCase());
    return mail.token;
  }

  /** A browser that has only the link: not signed in, with the XSRF token the app fetches at start. */
  async function stranger(): Promise<ApiClient> {
    const client = new ApiClient(t.app);
    await client.me();
    return client;
  }

  beforeAll(async () => {
    t = await createTestApp({ config: { mailLinks: { invitationMs: 7 * 86_400_000, passwordResetMs: 3_600_000, signUpMs: 86_400_000 } } });
    owner = await signedIn(t.app, 'owner@greyfield.example');
  });
  afterAll(() => t.close());

  it('mails a link; accepting it makes the member, signs them in, and they can sign in again', async () => {
    const res = await owner.post('/api/team/invitations').send({ email: ' New.Fitter@Example.com ', role: 'bench', name: 'Nia' }).expect(201);
    const sent = pendingInvitation.parse(res.body);
    expect(sent).toMatchObject({ email: 'new.fitter@example.com', role: 'bench', expired: false, invitedBy: 'Ruth Greyfield' });
    // The app's clock stands still in tests: the link expires exactly seven days after it was made.
    expect(Date.parse(sent.expiresAt) - Date.parse(sent.createdAt)).toBe(7 * 86_400_000);

    const [mail] = await mailsTo(t.database.db, 'new.fitter@example.com');
    expect(mail.subject).toBe('Ruth Greyfield invites you to Borewright');
    expect(mail.sender).toContain('Ruth Greyfield via Borewright');
    expect(mail.text).toContain('Hello Nia,');
    expect(mail.text).toContain('as a bench: read jobs, download and print packs and templates, mark panels drilled or checked.');
    expect(mail.text).toContain(`until ${sent.expiresAt.slice(0, 10)}`);
    expect(new URL(mail.link).pathname).toBe('/accept-invitation');
    expect(mail.token).toMatch(/^[\w-]{43}$/);

    // Only the token's hash is kept.
    const [stored] = await t.database.db.select().from(mailTokens).where(eq(mailTokens.id, sent.id));
    expect(stored.tokenHash).toBe(hashMailToken(mail.token));
    expect(JSON.stringify(stored)).not.toContain(mail.token);

    const team = teamAnswer.parse((await owner.get('/api/team').expect(200)).body);
    expect(team.invitations.map((i) => i.email)).toContain('new.fitter@example.com');

    const browser = await stranger();
    const shown = invitationAnswer.parse((await browser.get(`/api/invitations/${mail.token}`).expect(200)).body);
    expect(shown).toEqual({ email: 'new.fitter@example.com', role: 'bench', expiresAt: sent.expiresAt });

    const accepted = await browser.post(`/api/invitations/${mail.token}/accept`).send({ name: ' Nia Holt ', password: NEW_PASSWORD }).expect(201);
    expect(accepted.body.user).toEqual({ id: expect.any(Number), email: 'new.fitter@example.com', name: 'Nia Holt', role: 'bench', units: 'mm' });
    expect((await browser.me().expect(200)).body.user.name).toBe('Nia Holt');
    await browser.get('/api/jobs').expect(200);
    // The new session has its own XSRF token, and changes go through with it.
    await browser.post('/api/auth/sign-out').expect(204);

    const again = new ApiClient(t.app);
    expect((await again.signIn('new.fitter@example.com', NEW_PASSWORD)).status).toBe(200);

    const after = teamAnswer.parse((await owner.get('/api/team').expect(200)).body);
    expect(after.members).toContainEqual(expect.objectContaining({ email: 'new.fitter@example.com', role: 'bench', active: true }));
    expect(after.invitations.map((i) => i.email)).not.toContain('new.fitter@example.com');

    const log = (await owner.get('/api/activity').expect(200)).body.entries as ActivityEntry[];
    expect(log.find((e) => e.action === 'member.joined')).toMatchObject({ user: { name: 'Nia Holt' }, details: { email: 'new.fitter@example.com', role: 'bench' } });
    expect(log.find((e) => e.action === 'invitation.sent')).toMatchObject({ user: { name: 'Ruth Greyfield' }, details: { email: 'new.fitter@example.com', role: 'bench' } });
  });

  it('says a used link has been used, and never makes a second member', async () => {
    const token = await invite('twice@example.com');
    await (await stranger()).post(`/api/invitations/${token}/accept`).send({ name: 'First', password: NEW_PASSWORD }).expect(201);

    const browser = await stranger();
    const shown = await browser.get(`/api/invitations/${token}`).expect(410);
    expect(shown.body.error).toMatchObject({ code: 'link-used', message: expect.stringContaining('already been accepted') });
    const second = await browser.post(`/api/invitations/${token}/accept`).send({ name: 'Second', password: NEW_PASSWORD }).expect(410);
    expect(second.body.error.code).toBe('link-used');
    const members = teamAnswer.parse((await owner.get('/api/team').expect(200)).body).members.filter((m) => m.email === 'twice@example.com');
    expect(members.map((m) => m.name)).toEqual(['First']);
  });

  it('lets only one of two accepts racing with the same link through', async () => {
    const token = await invite('race@example.com');
    const [a, b] = [await stranger(), await stranger()];
    const answers = await Promise.all([
      a.post(`/api/invitations/${token}/accept`).send({ name: 'Racer A', password: NEW_PASSWORD }),
      b.post(`/api/invitations/${token}/accept`).send({ name: 'Racer B', password: NEW_PASSWORD }),
    ]);
    expect(answers.map((r) => r.status).sort()).toEqual([201, 410]);
    const members = teamAnswer.parse((await owner.get('/api/team').expect(200)).body).members.filter((m) => m.email === 'race@example.com');
    expect(members).toHaveLength(1);
  });

  it('says a withdrawn link is not valid', async () => {
    const token = await invite('withdrawn@example.com');
    const { invitations } = teamAnswer.parse((await owner.get('/api/team').expect(200)).body);
    const id = invitations.find((i) => i.email === 'withdrawn@example.com')!.id;
    await owner.delete(`/api/team/invitations/${id}`).expect(204);
    await owner.delete(`/api/team/invitations/${id}`).expect(404);

    const browser = await stranger();
    const shown = await browser.get(`/api/invitations/${token}`).expect(404);
    expect(shown.body.error).toMatchObject({ code: 'link-unknown', message: expect.stringContaining('withdrawn') });
    await browser.post(`/api/invitations/${token}/accept`).send({ name: 'Too late', password: NEW_PASSWORD }).expect(404);
    expect((await owner.get('/api/activity').expect(200)).body.entries[0]).toMatchObject({ action: 'invitation.withdrawn', details: { email: 'withdrawn@example.com' } });
  });

  it('replaces an earlier invitation to the same address: only the newest link works', async () => {
    const first = await invite('again@example.com', 'viewer');
    const second = await invite('Again@Example.com', 'designer');
    const browser = await stranger();
    await browser.get(`/api/invitations/${first}`).expect(404);
    expect((await browser.get(`/api/invitations/${second}`).expect(200)).body.role).toBe('designer');
    const { invitations } = teamAnswer.parse((await owner.get('/api/team').expect(200)).body);
    expect(invitations.filter((i) => i.email === 'again@example.com')).toHaveLength(1);
  });

  it('answers a malformed or made-up token as unknown', async () => {
    const browser = await stranger();
    expect((await browser.get('/api/invitations/nonsense').expect(404)).body.error.code).toBe('link-unknown');
    await browser.get(`/api/invitations/${'x'.repeat(43)}`).expect(404);
  });

  it('refuses an address that already has an account, whatever its case, naming the field', async () => {
    const res = await owner.post('/api/team/invitations').send({ email: 'Designer@Greyfield.example', role: 'viewer' }).expect(409);
    expect(res.body.error).toMatchObject({ code: 'already-member', fields: { email: 'is already a member of the shop' } });
    expect(await mailsTo(t.database.db, 'designer@greyfield.example')).toEqual([]);

    const { members } = teamAnswer.parse((await owner.get('/api/team').expect(200)).body);
    const viewer = members.find((m) => m.email === 'viewer@greyfield.example')!;
    await owner.patch(`/api/team/members/${viewer.id}`).send({ active: false }).expect(200);
    const inactive = await owner.post('/api/team/invitations').send({ email: 'viewer@greyfield.example', role: 'viewer' }).expect(409);
    expect(inactive.body.error.fields).toEqual({ email: 'belongs to a deactivated member: switch them back on instead' });
    await owner.patch(`/api/team/members/${viewer.id}`).send({ active: true }).expect(200);
  });

  it('names the fields of a malformed invitation or acceptance, and keeps the link usable', async () => {
    const bad = await owner.post('/api/team/invitations').send({ email: 'not an address', role: 'owner' }).expect(400);
    expect(bad.body.error.fields).toEqual({ email: 'must be an e-mail address', role: expect.any(String) });

    const token = await invite('careful@example.com');
    const browser = await stranger();
    const short = await browser.post(`/api/invitations/${token}/accept`).send({ name: '  ', password: 'short' }).expect(400);
    expect(short.body.error.fields).toEqual({ name: 'must not be empty', password: 'must be at least 8 bytes long' });
    const long = await browser.post(`/api/invitations/${token}/accept`).send({ name: 'Careful', password: 'ü'.repeat(37) }).expect(400);
    expect(long.body.error.fields).toEqual({ password: 'must be at most 72 bytes long (UTF-8)' });
    await browser.get(`/api/invitations/${token}`).expect(200);
  });
});

describe('an invitation that expires', () => {
  it('says so by the app\'s clock, and the team page marks it expired', async () => {
    const t = await createTestApp({ config: { mailLinks: { invitationMs: 60_000, passwordResetMs: 60_000, signUpMs: 60_000 } } });
    const owner = await signedIn(t.app, 'owner@greyfield.example');
    await owner.post('/api/team/invitations').send({ email: 'late@example.com', role: 'viewer' }).expect(201);
    const [mail] = await mailsTo(t.database.db, 'late@example.com');
    t.advance(59_000);
    await owner.get(`/api/invitations/${mail.token}`).expect(200);
    t.advance(2_000);

    const browser = new ApiClient(t.app);
    await browser.me();
    const shown = await browser.get(`/api/invitations/${mail.token}`).expect(410);
    expect(shown.body.error).toMatchObject({ code: 'link-expired', message: expect.stringMatching(/^This invitation expired on \d{4}-\d\d-\d\d\. Ask an admin/) });
    await browser.post(`/api/invitations/${mail.token}/accept`).send({ name: 'Late', password: NEW_PASSWORD }).expect(410);
    const { invitations } = teamAnswer.parse((await owner.get('/api/team').expect(200)).body);
    expect(invitations.find((i) => i.email === 'late@example.com')).toMatchObject({ expired: true });
    await t.close();
  });
});

describe('roles and deactivation', () => {
  let t: TestApp;
  let owner: ApiClient;
  let people: TeamMember[];
  const idOf = (email: string) => people.find((p) => p.email === email)!.id;

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signedIn(t.app, 'owner@greyfield.example');
    people = teamAnswer.parse((await owner.get('/api/team').expect(200)).body).members;
  });
  afterAll(() => t.close());

  it('changes a role, and the member\'s next request already has it', async () => {
    const designer = await signedIn(t.app, 'designer@greyfield.example');
    const res = await owner.patch(`/api/team/members/${idOf('designer@greyfield.example')}`).send({ role: 'viewer' }).expect(200);
    expect(res.body).toMatchObject({ email: 'designer@greyfield.example', role: 'viewer', active: true });
    expect((await designer.me().expect(200)).body.user.role).toBe('viewer');
    await designer.post('/api/jobs').send({ name: 'Not any more' }).expect(403);
    await owner.patch(`/api/team/members/${idOf('designer@greyfield.example')}`).send({ role: 'designer' }).expect(200);
    const log = (await owner.get('/api/activity').expect(200)).body.entries as ActivityEntry[];
    expect(log.slice(0, 2).map((e) => e.details)).toEqual([
      expect.objectContaining({ name: 'Tomas Ward', from: 'viewer', to: 'designer' }),
      expect.objectContaining({ name: 'Tomas Ward', from: 'designer', to: 'viewer' }),
    ]);
  });

  it('ends every session of a deactivated member at once, and refuses their sign-in', async () => {
    const bench = idOf('bench@greyfield.example');
    const onPhone = await signedIn(t.app, 'bench@greyfield.example');
    const atBench = await signedIn(t.app, 'bench@greyfield.example');
    await atBench.get('/api/jobs').expect(200);
    const sessionsOfBench = async () => (await t.database.db.query.sessions.findMany()).filter((s) => (s.sess as { passport?: { user?: number } }).passport?.user === bench);
    expect(await sessionsOfBench()).toHaveLength(2);

    const res = await owner.patch(`/api/team/members/${bench}`).send({ active: false }).expect(200);
    expect(res.body).toMatchObject({ active: false, role: 'bench' });
    expect(await sessionsOfBench()).toEqual([]);
    expect((await onPhone.get('/api/jobs').expect(401)).body.error.code).toBe('unauthenticated');
    await atBench.get('/api/auth/me').expect(401);

    const refused = await new ApiClient(t.app).signIn('bench@greyfield.example');
    expect(refused.status).toBe(403);
    expect(refused.body.error).toMatchObject({ code: 'account-deactivated', message: expect.stringContaining('deactivated') });
    // Without the password, a deactivated account looks like any wrong guess.
    expect((await new ApiClient(t.app).signIn('bench@greyfield.example', 'not the password')).body.error.code).toBe('bad-credentials');
    expect((await owner.get('/api/activity').expect(200)).body.entries[0]).toMatchObject({ action: 'member.deactivated', details: { name: 'Ada Keel', sessionsEnded: 2 } });

    await owner.patch(`/api/team/members/${bench}`).send({ active: true }).expect(200);
    await signedIn(t.app, 'bench@greyfield.example');
  });

  it('refuses a deactivated member on a session whose row was not deleted', async () => {
    const viewer = await signedIn(t.app, 'viewer@greyfield.example');
    await t.database.db.update(users).set({ active: false }).where(eq(users.id, idOf('viewer@greyfield.example')));
    await viewer.get('/api/jobs').expect(401);
    await t.database.db.update(users).set({ active: true }).where(eq(users.id, idOf('viewer@greyfield.example')));
    // The refused request dropped the sign-in from that session: it stays signed out.
    await viewer.get('/api/jobs').expect(401);
  });

  it('never lets the shop lose its last active admin, nor an admin deactivate themselves', async () => {
    const ownerId = idOf('owner@greyfield.example');
    const demote = await owner.patch(`/api/team/members/${ownerId}`).send({ role: 'designer' }).expect(409);
    expect(demote.body.error).toMatchObject({ code: 'last-admin', fields: { role: 'would leave the shop without an active admin' } });
    const self = await owner.patch(`/api/team/members/${ownerId}`).send({ active: false }).expect(409);
    expect(self.body.error).toMatchObject({ code: 'own-account', fields: { active: expect.any(String) } });

    // A second admin who is deactivated does not count.
    const tomas = idOf('designer@greyfield.example');
    await owner.patch(`/api/team/members/${tomas}`).send({ role: 'admin', active: false }).expect(200);
    await owner.patch(`/api/team/members/${ownerId}`).send({ role: 'designer' }).expect(409);
    // Active again, the second admin may demote the owner; then the second admin is the last one.
    await owner.patch(`/api/team/members/${tomas}`).send({ active: true }).expect(200);
    const tomasClient = await signedIn(t.app, 'designer@greyfield.example');
    await tomasClient.patch(`/api/team/members/${ownerId}`).send({ role: 'designer' }).expect(200);
    await owner.get('/api/team').expect(403);
    expect((await tomasClient.patch(`/api/team/members/${tomas}`).send({ role: 'viewer' }).expect(409)).body.error.code).toBe('last-admin');
    await tomasClient.patch(`/api/team/members/${ownerId}`).send({ role: 'admin' }).expect(200);
    await owner.patch(`/api/team/members/${tomas}`).send({ role: 'designer' }).expect(200);
  });

  it('names what is wrong with a change', async () => {
    expect((await owner.patch(`/api/team/members/${idOf('viewer@greyfield.example')}`).send({}).expect(400)).body.error.message).toContain(
      'name a role or whether the member is active',
    );
    expect((await owner.patch(`/api/team/members/${idOf('viewer@greyfield.example')}`).send({ role: 'owner' }).expect(400)).body.error.fields).toHaveProperty('role');
    await owner.patch('/api/team/members/999999').send({ role: 'viewer' }).expect(404);
  });
});
