import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { userAnswer } from '../../shared/api/contract';
import { signUpLinkAnswer, signUpRequested } from '../../shared/api/sign-up-contract';
import { verifyPassword } from '../auth/passwords';
import { findAccountByEmail } from '../auth/users.repository';
import { activity, shops, signUps, users } from '../db/schema';
import { currentShop } from '../db/shop-scope';
import type { OutgoingMail } from '../mail/mailer';
import { ApiClient } from '../testing/api-client';
import { createTestApp, DEMO_SHOP_ID, type TestApp } from '../testing/test-app';

const PASSWORD = 'a password for the new shop';

/** What the app sent, with the shop whose work sent it (the outbox a catcher would keep it in). */
function recordingMailer() {
  const sent: (OutgoingMail & { shop: number | null | undefined })[] = [];
  return { sent, mailer: { send: async (mail: OutgoingMail) => void sent.push({ ...mail, shop: currentShop() }) } };
}

async function waitForSent(sent: OutgoingMail[], to: string, count = 1): Promise<OutgoingMail> {
  await expect.poll(() => sent.filter((m) => m.to.includes(to)).length, { timeout: 10_000 }).toBe(count);
  return sent.filter((m) => m.to.includes(to)).at(-1)!;
}

const tokenOf = (mail: OutgoingMail) => new URL(/https?:\/\/\S+/.exec(mail.text)![0]).searchParams.get('token')!;

/** A browser on the sign-up page: not signed in, with the XSRF token the app fetches at start. */
async function visitor(t: TestApp): Promise<ApiClient> {
  const client = new ApiClient(t.app);
  await client.get('/api/auth/session').expect(200);
  return client;
}

describe('creating a shop (SIGNUP=open)', () => {
  let t: TestApp;
  const mail = recordingMailer();
  beforeAll(async () => {
    t = await createTestApp({ config: { signUpOpen: true }, mailer: mail.mailer });
  });
  afterAll(() => t.close());

  it('mails a new address a link that makes the shop and its admin once, signed in; a second use is refused', async () => {
    const browser = await visitor(t);
    expect((await browser.get('/api/auth/session').expect(200)).body).toEqual({ user: null, signUpOpen: true });
    const asked = await browser
      .post('/api/sign-up')
      .send({ shopName: 'Alder Street Cabinets', name: 'Rosa Quint', email: ' Rosa@Alder.example ', password: PASSWORD })
      .expect(202);
    expect(signUpRequested.parse(asked.body).message).toContain('Check your mail');
    const sent = await waitForSent(mail.sent, 'rosa@alder.example');
    expect(sent.subject).toBe('Confirm your new Borewright shop');
    expect(sent.text).toContain('"Alder Street Cabinets"');
    // Nothing is made before the link is followed.
    expect(await findAccountByEmail(t.database.db, 'rosa@alder.example')).toBeUndefined();

    const token = tokenOf(sent);
    const link = signUpLinkAnswer.parse((await browser.get(`/api/sign-up/${token}`).expect(200)).body);
    expect(link).toMatchObject({ email: 'rosa@alder.example', shopName: 'Alder Street Cabinets', name: 'Rosa Quint' });

    const confirmed = await browser.post(`/api/sign-up/${token}`).expect(201);
    expect(userAnswer.parse(confirmed.body).user).toMatchObject({ email: 'rosa@alder.example', name: 'Rosa Quint', role: 'admin' });
    // Signed in, in a shop of their own with no jobs and themself as its only member.
    const jobs = await browser.get('/api/jobs').expect(200);
    expect(jobs.body.jobs).toHaveLength(0);
    const team = await browser.get('/api/team').expect(200);
    expect(team.body.members.map((m: { email: string }) => m.email)).toEqual(['rosa@alder.example']);

    const account = await findAccountByEmail(t.database.db, 'rosa@alder.example');
    expect(account).toMatchObject({ role: 'admin', active: true, demo: false, shopStatus: 'active' });
    expect(account!.shopId).not.toBe(DEMO_SHOP_ID);
    expect(await verifyPassword(PASSWORD, account!.passwordHash)).toBe(true);
    const [shop] = await t.database.db.select().from(shops).where(eq(shops.id, account!.shopId));
    expect(shop).toMatchObject({ name: 'Alder Street Cabinets', status: 'active' });
    const entries = await t.database.db.select().from(activity).where(eq(activity.shopId, shop.id));
    expect(entries).toEqual([expect.objectContaining({ action: 'shop.created', details: expect.objectContaining({ via: 'sign-up', email: 'rosa@alder.example' }) })]);

    // The link is used up: another browser following it again is refused, saying so.
    const again = await visitor(t);
    const used = await again.post(`/api/sign-up/${token}`).expect(410);
    expect(used.body.error.code).toBe('link-used');
    expect(used.body.error.message).toContain('already been used');
    await again.get(`/api/sign-up/${token}`).expect(410);

    // And the new admin signs in with the password chosen at sign-up.
    const later = new ApiClient(t.app);
    expect((await later.signIn('rosa@alder.example', PASSWORD)).status).toBe(200);
  });

  it('answers an address already in use exactly as a new one, mails its owner instead, and makes nothing', async () => {
    const shopsBefore = await t.database.db.select().from(shops);
    const body = (email: string) => ({ shopName: 'Look-alike Joinery', name: 'Someone Else', email, password: PASSWORD });
    const taken = await (await visitor(t)).post('/api/sign-up').send(body('designer@greyfield.example')).expect(202);
    const fresh = await (await visitor(t)).post('/api/sign-up').send(body('nobody.yet@example.com')).expect(202);
    expect(taken.body).toEqual({ message: expect.any(String) });
    expect(taken.body.message.replace('designer@greyfield.example', '…')).toBe(fresh.body.message.replace('nobody.yet@example.com', '…'));
    expect(Object.keys(taken.headers).sort()).toEqual(Object.keys(fresh.headers).sort());

    const owner = await waitForSent(mail.sent, 'designer@greyfield.example') as OutgoingMail & { shop: number };
    expect(owner.subject).toBe('Someone tried to open a Borewright shop with your address');
    expect(owner.text).toContain('No shop was made');
    expect(owner.text).toMatch(/\/sign-in\n/);
    expect(owner.text).toMatch(/\/forgot-password\n/);
    // It goes out as the owner's shop (its outbox), and carries no link that makes anything.
    expect(owner.shop).toBe(DEMO_SHOP_ID);
    expect(owner.text).not.toContain('token=');
    await waitForSent(mail.sent, 'nobody.yet@example.com');
    expect(await t.database.db.select().from(shops)).toEqual(shopsBefore);
    expect(await t.database.db.select().from(signUps).where(eq(signUps.email, 'designer@greyfield.example'))).toEqual([]);
    const [designer] = await t.database.db.select().from(users).where(eq(users.email, 'designer@greyfield.example'));
    expect(designer.name).not.toBe('Someone Else');
  });

  it('never takes the shop from the body or a header: the link makes a new shop, and the session is its own', async () => {
    const browser = await visitor(t);
    await browser
      .post('/api/sign-up')
      .set('X-Borewright-Shop', String(DEMO_SHOP_ID))
      .set('X-Shop-Id', String(DEMO_SHOP_ID))
      .send({ shopName: 'Pine Row Workshop', name: 'Ada Kell', email: 'ada@pinerow.example', password: PASSWORD, shopId: DEMO_SHOP_ID, shop_id: DEMO_SHOP_ID, role: 'viewer' })
      .expect(202);
    const token = tokenOf(await waitForSent(mail.sent, 'ada@pinerow.example'));
    const confirmed = await browser.post(`/api/sign-up/${token}`).set('X-Borewright-Shop', String(DEMO_SHOP_ID)).send({ shopId: DEMO_SHOP_ID }).expect(201);
    expect(confirmed.body.user.role).toBe('admin');
    const account = await findAccountByEmail(t.database.db, 'ada@pinerow.example');
    expect(account!.shopId).not.toBe(DEMO_SHOP_ID);
    // None of the demo shop's jobs or members is visible to the new admin.
    const jobs = await browser.get('/api/jobs').set('X-Borewright-Shop', String(DEMO_SHOP_ID)).expect(200);
    expect(jobs.body.jobs).toHaveLength(0);
    const team = await browser.get('/api/team').expect(200);
    expect(team.body.members).toHaveLength(1);
  });

  it('refuses an expired link by the app\'s clock, and an unknown one', async () => {
    const browser = await visitor(t);
    await browser.post('/api/sign-up').send({ shopName: 'Late Shop', name: 'Lou Late', email: 'lou@late.example', password: PASSWORD }).expect(202);
    const token = tokenOf(await waitForSent(mail.sent, 'lou@late.example'));
    t.advance(24 * 3_600_000 + 1);
    const expired = await browser.post(`/api/sign-up/${token}`).expect(410);
    expect(expired.body.error.code).toBe('link-expired');
    expect(expired.body.error.message).toContain('expired');
    expect(await findAccountByEmail(t.database.db, 'lou@late.example')).toBeUndefined();
    expect((await browser.post(`/api/sign-up/${'x'.repeat(43)}`).expect(404)).body.error.code).toBe('link-unknown');
    await browser.get('/api/sign-up/not-a-token').expect(404);
  });

  it('names what is wrong in a request, field by field, with the password rule of sign-in', async () => {
    const res = await (await visitor(t)).post('/api/sign-up').send({ shopName: '', name: 'X', email: 'nope', password: 'short' }).expect(400);
    expect(res.body.error.fields).toMatchObject({ shopName: 'must not be empty', email: 'must be an e-mail address', password: 'must be at least 8 bytes long' });
  });
});

describe('sign-up limits', () => {
  it('limits requests per address asked about with 429, as password resets are', async () => {
    const mail = recordingMailer();
    const t = await createTestApp({ config: { signUpOpen: true, signUpLimits: { windowMs: 60_000, perAccount: 2, perAddress: 100 } }, mailer: mail.mailer });
    const browser = await visitor(t);
    const body = { shopName: 'Busy Shop', name: 'Bea Busy', email: 'bea@busy.example', password: PASSWORD };
    for (let i = 0; i < 2; i++) await browser.post('/api/sign-up').send(body).expect(202);
    expect((await browser.post('/api/sign-up').send(body).expect(429)).body.error.code).toBe('too-many-attempts');
    await t.close();
  });
});

describe('with SIGNUP closed (the default)', () => {
  it('answers 404 on every sign-up route', async () => {
    const t = await createTestApp();
    const browser = await visitor(t);
    expect((await browser.get('/api/auth/session').expect(200)).body).toEqual({ user: null, signUpOpen: false });
    await browser.post('/api/sign-up').send({ shopName: 'Closed', name: 'C', email: 'c@closed.example', password: PASSWORD }).expect(404);
    await browser.get(`/api/sign-up/${'x'.repeat(43)}`).expect(404);
    await browser.post(`/api/sign-up/${'x'.repeat(43)}`).expect(404);
    await t.close();
  });
});
