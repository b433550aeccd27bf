import JSZip from 'jszip';
import { simpleParser } from 'mailparser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outboxList, packSent, type OutboxMessage } from '../../shared/api/pack-contract';
import { outbox } from '../db/schema';
import { signPackLink } from '../packs/pack-links';
import { ApiClient, signedIn } from '../testing/api-client';
import { binaryBody } from '../testing/binary-body';
import { createTestApp, DEMO_SHOP_ID, TEST_SESSION_SECRET, type TestApp } from '../testing/test-app';

const MANIFEST = /bench pack\/manifest\.json$/;

async function manifestOf(zipBytes: Buffer): Promise<{ format: string }> {
  const zip = await JSZip.loadAsync(zipBytes);
  const entry = zip.file(MANIFEST)[0];
  expect(entry, 'manifest.json').toBeDefined();
  return JSON.parse(await entry.async('string'));
}

describe('sending a pack by mail through the local catcher', () => {
  let t: TestApp;
  let designer: ApiClient;
  let owner: ApiClient;
  let jobId: number;

  const latest = async (): Promise<OutboxMessage> => outboxList.parse((await owner.get('/api/outbox').expect(200)).body).messages[0];

  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
    owner = await signedIn(t.app, 'owner@greyfield.example');
    const { body } = await designer.get('/api/jobs').expect(200);
    jobId = body.jobs.find((j: { name: string }) => j.name === 'Larch Lane kitchen').id;
  });
  afterAll(() => t.close());

  it('attaches the zip, keeps the message in the outbox, and logs the send', async () => {
    const res = await designer
      .post(`/api/jobs/${jobId}/pack/send`)
      .send({ to: ['bench@greyfield.example', 'Fitter@Example.com', 'bench@greyfield.example'], paper: 'letter', message: 'For Monday.' })
      .expect(200);
    const sent = packSent.parse(res.body);
    expect(sent).toMatchObject({ to: ['bench@greyfield.example', 'fitter@example.com'], delivery: 'attached' });

    const message = await latest();
    expect(message).toMatchObject({
      sender: expect.stringContaining('Tomas Ward via Borewright'),
      recipients: ['bench@greyfield.example', 'fitter@example.com'],
      subject: 'Bench pack: Larch Lane kitchen',
      attachments: [{ name: 'Larch Lane kitchen bench pack.zip', contentType: 'application/zip', bytes: sent.bytes }],
    });
    expect(message.text).toContain('For Monday.');
    expect(message.text).toContain('US Letter');

    // The attachment as the catcher received it, read back by mailparser, is the zip that was sent.
    const download = await owner.get(`/api/outbox/${message.id}/attachments/0`).buffer(true).parse(binaryBody).expect(200);
    expect(download.headers['content-type']).toBe('application/zip');
    expect(download.body.length).toBe(sent.bytes);
    expect((await manifestOf(download.body)).format).toBe('borewright.pack/1');
    const [stored] = await t.database.db.select({ raw: outbox.raw }).from(outbox);
    const parsed = await simpleParser(stored.raw);
    expect(Buffer.compare(parsed.attachments[0].content, download.body)).toBe(0);

    const { body: log } = await designer.get(`/api/activity?jobId=${jobId}`).expect(200);
    expect(log.entries[0]).toMatchObject({ action: 'pack.sent', user: { name: 'Tomas Ward' }, details: { delivery: 'attached', paper: 'letter' } });
  }, 60_000);

  it('refuses bad recipients, naming the field', async () => {
    const bad = await designer.post(`/api/jobs/${jobId}/pack/send`).send({ to: ['bench@greyfield.example', 'not an address'], paper: 'a4' }).expect(400);
    expect(bad.body.error.fields).toEqual({ 'to[1]': 'must be an e-mail address' });
    const none = await designer.post(`/api/jobs/${jobId}/pack/send`).send({ to: [], paper: 'a4' }).expect(400);
    expect(none.body.error.fields).toEqual({ to: 'must name at least one recipient' });
    const many = Array.from({ length: 21 }, (_, i) => `p${i}@example.com`);
    const tooMany = await designer.post(`/api/jobs/${jobId}/pack/send`).send({ to: many, paper: 'a4' }).expect(400);
    expect(tooMany.body.error.fields).toEqual({ to: 'must name at most 20 recipients' });
  });

  it('lists the shop people a pack can be sent to, and no longer a member deactivated', async () => {
    const { body } = await designer.get('/api/mail/recipients').expect(200);
    expect(body.people).toContainEqual({ name: 'Tomas Ward', email: 'designer@greyfield.example' });
    const viewer = body.people.find((p: { email: string }) => p.email === 'viewer@greyfield.example');
    expect(viewer).toBeDefined();
    const { body: team } = await owner.get('/api/team').expect(200);
    const member = team.members.find((m: { email: string }) => m.email === 'viewer@greyfield.example');
    await owner.patch(`/api/team/members/${member.id}`).send({ active: false }).expect(200);
    const after = await designer.get('/api/mail/recipients').expect(200);
    expect(after.body.people).not.toContainEqual(viewer);
    await owner.patch(`/api/team/members/${member.id}`).send({ active: true }).expect(200);
  });

  it('refuses a link it did not sign with 403, and an expired one with 410', async () => {
    const anyone = new ApiClient(t.app);
    const forged = signPackLink('another secret that is long enough to sign', { shopId: DEMO_SHOP_ID, jobId, paper: 'a4', expiresAt: Date.now() + 60_000 });
    expect((await anyone.get(`/api/pack-links/${forged}`).expect(403)).body.error.code).toBe('bad-link');
    expect((await anyone.get('/api/pack-links/nonsense').expect(403)).body.error.code).toBe('bad-link');
    // The app's clock stands at its start, so the link expired a day before that.
    const expired = signPackLink(TEST_SESSION_SECRET, { shopId: DEMO_SHOP_ID, jobId, paper: 'a4', expiresAt: Date.now() - 86_400_000 });
    const res = await anyone.get(`/api/pack-links/${expired}`).expect(410);
    expect(res.body.error).toMatchObject({ code: 'link-expired', message: expect.stringContaining('expired') });
  });
});

describe('a pack too large to attach', () => {
  let t: TestApp;
  afterAll(() => t.close());

  it('goes as a signed link that downloads without signing in, for a week', async () => {
    t = await createTestApp({ config: { packAttachLimitBytes: 10_000 } });
    const designer = await signedIn(t.app, 'designer@greyfield.example');
    const { body } = await designer.get('/api/jobs').expect(200);
    const jobId = body.jobs.find((j: { name: string }) => j.name === 'Larch Lane kitchen').id;

    const sent = packSent.parse((await designer.post(`/api/jobs/${jobId}/pack/send`).send({ to: ['bench@greyfield.example'], paper: 'a4' }).expect(200)).body);
    expect(sent.delivery).toBe('link');
    expect(Date.parse(sent.expiresAt!) - Date.now()).toBeGreaterThan(6.9 * 86_400_000);

    const [stored] = await t.database.db.select().from(outbox);
    expect(stored.attachments).toEqual([]);
    const link = /http:\/\/\S+\/api\/pack-links\/\S+/.exec(stored.text)?.[0];
    expect(link).toBeDefined();

    const res = await new ApiClient(t.app).get(new URL(link!).pathname).buffer(true).parse(binaryBody).expect(200);
    expect(res.headers['content-type']).toBe('application/zip');
    expect((await manifestOf(res.body)).format).toBe('borewright.pack/1');
  }, 60_000);
});
