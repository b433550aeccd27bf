import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');
const PHONE = { width: 390, height: 844 };
const NEW_PASSWORD = 'sawdust and sharp bits';

/** The first link in the newest outbox message that mentions this text, as the admin reads it. */
async function linkFromOutbox(admin: Page, mentioning: string, subject: string): Promise<string> {
  await admin.goto(`${baseUrl}/outbox`);
  const message = admin.locator('mat-expansion-panel', { hasText: mentioning }).filter({ hasText: subject }).first();
  await message.waitFor();
  const body = (await message.locator('.body').textContent()) ?? '';
  const link = /https?:\/\/\S+/.exec(body)?.[0];
  expect(link, `a link in "${subject}"`).toBeDefined();
  return link!;
}

/** A look at a page on a phone, in a browser of its own. */
async function phoneShot(url: string, name: string, ready: (page: Page) => Promise<unknown>): Promise<void> {
  const phone = await openBrowser(PHONE);
  try {
    await phone.page.goto(url);
    await ready(phone.page);
    await screenshot(phone.page, name);
  } finally {
    await phone.close();
  }
}

describe('the team in the browser', () => {
  const closers: (() => Promise<void>)[] = [];
  afterEach(async () => {
    for (const close of closers.splice(0)) await close();
  });

  /** The member the first test invites; the later ones use them. */
  const member = { email: `nia.${Date.now()}@example.com`, name: 'Nia Holt' };

  it('an admin invites; the mailed link, opened in a fresh browser, makes the member and signs them in', async () => {
    const admin = await openBrowser();
    closers.push(admin.close);
    await signIn(admin.page, baseUrl, 'owner@greyfield.example');
    await admin.page.getByRole('link', { name: 'Team' }).click();
    await admin.page.waitForURL(/\/team$/);
    await admin.page.getByRole('cell', { name: /Ada Keel/ }).waitFor();

    await admin.page.getByRole('textbox', { name: 'E-mail' }).fill(member.email);
    await admin.page.getByRole('combobox', { name: 'Role', exact: true }).click();
    await admin.page.getByRole('option', { name: 'bench' }).click();
    await admin.page.getByRole('textbox', { name: 'Name (for the greeting)' }).fill('Nia');
    await admin.page.getByRole('button', { name: 'Send invitation' }).click();
    await admin.page.getByRole('status').filter({ hasText: `Invitation sent to ${member.email} as bench` }).waitFor();
    await admin.page.locator('.invitation', { hasText: member.email }).waitFor();
    await screenshot(admin.page, 'team-page');

    const link = await linkFromOutbox(admin.page, member.email, 'invites you to Borewright');
    expect(new URL(link).pathname).toBe('/accept-invitation');
    await phoneShot(link, 'accept-invitation-phone', (page) => page.getByText(member.email).waitFor());

    const invited = await openBrowser();
    closers.push(invited.close);
    const { page } = invited;
    await page.goto(link);
    await page.getByText(member.email).waitFor();
    expect(await page.locator('.role').textContent()).toBe('bench');
    await page.getByRole('textbox', { name: 'Your name' }).fill(member.name);
    await page.getByRole('textbox', { name: 'Choose a password' }).fill(NEW_PASSWORD);
    await page.getByRole('textbox', { name: 'The same password again' }).fill('not the same');
    await page.getByRole('button', { name: 'Join and sign in' }).click();
    await page.getByText('The two passwords differ.').waitFor();
    // The error fades in; the screenshot is taken once it has.
    await page.waitForTimeout(300);
    await screenshot(page, 'accept-invitation');
    await page.getByRole('textbox', { name: 'The same password again' }).fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Join and sign in' }).click();
    await page.waitForURL(/\/jobs$/);
    await page.getByText(member.name).first().waitFor();
    await expect.poll(() => page.getByText('Larch Lane kitchen').count()).toBeGreaterThan(0);

    // The same link a second time says it was used.
    const again = await openBrowser();
    closers.push(again.close);
    await again.page.goto(link);
    await again.page.getByRole('alert').filter({ hasText: 'already been accepted' }).waitFor();
    await screenshot(again.page, 'accept-invitation-used');

    await admin.page.goto(`${baseUrl}/team`);
    await admin.page.getByRole('cell', { name: new RegExp(member.name) }).waitFor();
    await screenshot(admin.page, 'team-page-with-new-member');
    await phoneShot(`${baseUrl}/sign-in`, 'sign-in-phone', (p) => p.getByText('Forgot your password?').waitFor());
  });

  it('the member resets a forgotten password by mail, and the old one stops working', async () => {
    const browser = await openBrowser();
    closers.push(browser.close);
    const { page } = browser;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.waitForURL(/\/forgot-password$/);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(member.email);
    await page.getByRole('button', { name: 'Mail me a link' }).click();
    await page.getByRole('status').filter({ hasText: 'on its way' }).waitFor();
    await screenshot(page, 'forgot-password-asked');

    const admin = await openBrowser();
    closers.push(admin.close);
    await signIn(admin.page, baseUrl, 'owner@greyfield.example');
    const link = await linkFromOutbox(admin.page, member.email, 'Reset your Borewright password');
    expect(new URL(link).pathname).toBe('/reset-password');
    await phoneShot(link, 'reset-password-phone', (p) => p.getByText(member.email).waitFor());

    await page.goto(link);
    await page.getByText(member.email).waitFor();
    await page.getByRole('textbox', { name: 'New password' }).fill('a fresh password');
    await page.getByRole('textbox', { name: 'The same password again' }).fill('a fresh password');
    await screenshot(page, 'reset-password');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.waitForURL(/\/sign-in\?passwordChanged=true$/);
    await page.getByText('Your password is changed.').waitFor();

    await page.getByRole('textbox', { name: 'E-mail' }).fill(member.email);
    await page.getByRole('textbox', { name: 'Password' }).fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').filter({ hasText: 'do not match' }).waitFor();
    await page.getByRole('textbox', { name: 'Password' }).fill('a fresh password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/jobs$/);

    // The link is used up.
    await page.goto(link);
    await page.getByRole('alert').filter({ hasText: 'already been used' }).waitFor();
  });

  it('deactivating a member sends their open page back to sign-in, and keeps them out', async () => {
    const memberBrowser = await openBrowser();
    closers.push(memberBrowser.close);
    const { page } = memberBrowser;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(member.email);
    await page.getByRole('textbox', { name: 'Password' }).fill('a fresh password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/jobs$/);

    const admin = await openBrowser();
    closers.push(admin.close);
    await signIn(admin.page, baseUrl, 'owner@greyfield.example');
    await admin.page.goto(`${baseUrl}/team`);
    const row = admin.page.getByRole('row', { name: new RegExp(member.name) });
    await row.getByRole('switch').click();
    await admin.page.getByRole('alertdialog').getByText('signed out everywhere now').waitFor();
    await screenshot(admin.page, 'team-deactivate-confirmation');
    await admin.page.getByRole('button', { name: 'Deactivate and sign out' }).click();
    await row.getByText('Deactivated').waitFor();

    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(member.email);
    await page.getByRole('textbox', { name: 'Password' }).fill('a fresh password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').filter({ hasText: 'deactivated' }).waitFor();
  });

  it('looks right on a phone', async () => {
    const phone = await openBrowser(PHONE);
    closers.push(phone.close);
    await signIn(phone.page, baseUrl, 'owner@greyfield.example');
    await phone.page.goto(`${baseUrl}/team`);
    await phone.page.getByRole('cell', { name: /Ada Keel/ }).waitFor();
    await screenshot(phone.page, 'team-page-phone');
  });
});
