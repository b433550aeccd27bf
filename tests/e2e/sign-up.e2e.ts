import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startThrowawayServer, type ThrowawayServer } from '../throwaway-server';
import { openBrowser, screenshot, signIn } from './browser';

const PHONE = { width: 390, height: 844 };

/** A mail server of the test's own (SMTP_URL): what the server sends before any shop exists has no outbox to go to. */
async function startMailbox(): Promise<{ url: string; mails: { to: string; subject: string; text: string }[]; close(): Promise<void> }> {
  const mails: { to: string; subject: string; text: string }[] = [];
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream).then(
        (mail) => {
          mails.push({ to: session.envelope.rcptTo.map((r) => r.address).join(','), subject: mail.subject ?? '', text: mail.text ?? '' });
          callback();
        },
        (err: Error) => callback(err),
      );
    },
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.server.address() as AddressInfo;
  return { url: `smtp://127.0.0.1:${port}`, mails, close: () => new Promise((done) => server.close(() => done())) };
}

async function mailTo(mails: { to: string; text: string; subject: string }[], address: string) {
  await expect.poll(() => mails.some((m) => m.to === address), { timeout: 15_000 }).toBe(true);
  return mails.filter((m) => m.to === address).at(-1)!;
}

describe('creating a shop in the browser (SIGNUP=open)', () => {
  let server: ThrowawayServer;
  let mailbox: Awaited<ReturnType<typeof startMailbox>>;
  beforeAll(async () => {
    mailbox = await startMailbox();
    server = await startThrowawayServer({ env: { SIGNUP: 'open', SMTP_URL: mailbox.url } });
  }, 120_000);
  afterAll(async () => {
    await server?.stop();
    await mailbox?.close();
  });

  it('asks for a shop from the sign-in screen, follows the mailed link and lands signed in as admin of an empty shop', async () => {
    const email = `mara.${Date.now()}@example.com`;
    const browser = await openBrowser();
    try {
      const { page } = browser;
      await page.goto(`${server.baseUrl}/sign-in`);
      await page.getByRole('link', { name: 'Create a shop' }).click();
      await page.waitForURL('**/create-shop');
      await page.getByRole('heading', { name: 'Create a shop' }).waitFor();
      // Sent empty first: each field says what it needs.
      await page.getByRole('button', { name: 'Mail me the link' }).click();
      await page.getByText('Enter the name of the shop.').waitFor();
      await screenshot(page, 'create-shop-empty');

      await page.getByRole('textbox', { name: 'Shop name' }).fill('Harrow Bench Works');
      await page.getByRole('textbox', { name: 'Your name' }).fill('Mara Voss');
      await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
      await page.getByRole('textbox', { name: 'Choose a password' }).fill('chisels and clamps');
      await page.getByRole('textbox', { name: 'The same password again' }).fill('chisels and clamps');
      await screenshot(page, 'create-shop-filled');
      await page.getByRole('button', { name: 'Mail me the link' }).click();
      await page.getByRole('status').filter({ hasText: 'Check your mail' }).waitFor();
      await screenshot(page, 'create-shop-asked');

      const mail = await mailTo(mailbox.mails, email);
      expect(mail.subject).toBe('Confirm your new Borewright shop');
      const link = /https?:\/\/\S+/.exec(mail.text)![0];
      expect(link).toContain(`${server.baseUrl}/create-shop/confirm?token=`);

      await page.goto(link);
      await page.getByText('Harrow Bench Works').waitFor();
      await screenshot(page, 'create-shop-confirm');
      await page.getByRole('button', { name: 'Open my shop' }).click();
      await page.waitForURL('**/jobs');
      await page.getByText('Mara Voss').first().waitFor();
      // An empty shop: none of the demo shop's jobs.
      await page.getByText('No jobs yet.').waitFor();
      const jobs = await page.evaluate(async () => (await (await fetch('/api/jobs')).json()) as { jobs: { name: string }[] });
      expect(jobs.jobs).toEqual([]);
      await expect.poll(() => page.getByText('Larch Lane').count()).toBe(0);
      await screenshot(page, 'create-shop-landed');
      const team = await page.evaluate(async () => (await (await fetch('/api/team')).json()) as { members: { email: string; role: string }[] });
      expect(team.members).toEqual([expect.objectContaining({ email, role: 'admin' })]);

      // The link works once: opened again, it says so.
      const again = await openBrowser(PHONE);
      try {
        await again.page.goto(link);
        await again.page.getByRole('alert').filter({ hasText: 'already been used' }).waitFor();
        await screenshot(again.page, 'create-shop-used-link-phone');
      } finally {
        await again.close();
      }
    } finally {
      await browser.close();
    }
  });

  it('answers an address in use as any other, and mails its owner instead', async () => {
    const browser = await openBrowser(PHONE);
    try {
      const { page } = browser;
      await page.goto(`${server.baseUrl}/create-shop`);
      await page.getByRole('textbox', { name: 'Shop name' }).fill('Copycat Joinery');
      await page.getByRole('textbox', { name: 'Your name' }).fill('Not The Owner');
      await page.getByRole('textbox', { name: 'E-mail' }).fill('owner@greyfield.example');
      await page.getByRole('textbox', { name: 'Choose a password' }).fill('anything long enough');
      await page.getByRole('textbox', { name: 'The same password again' }).fill('anything long enough');
      await page.getByRole('button', { name: 'Mail me the link' }).click();
      await page.getByRole('status').filter({ hasText: 'Check your mail' }).waitFor();
      await screenshot(page, 'create-shop-asked-phone');
      const mail = await mailTo(mailbox.mails, 'owner@greyfield.example');
      expect(mail.subject).toBe('Someone tried to open a Borewright shop with your address');
      // The owner's shop is as it was: the demo owner still signs in to it.
      await signIn(page, server.baseUrl, 'owner@greyfield.example');
      const jobs = await page.evaluate(async () => (await (await fetch('/api/jobs')).json()) as { jobs: unknown[] });
      expect(jobs.jobs.length).toBeGreaterThan(0);
    } finally {
      await browser.close();
    }
  });
});
