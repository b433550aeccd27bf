import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** Flags that keep Chromium quiet on a closed network (toolchain.md). */
const args = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const screenshotDir = join(process.cwd(), 'tests/e2e/screenshots');

/** A fresh headless Chromium profile, with a touch screen when asked; close() also removes its folder. */
export async function openBrowser(
  viewport = { width: 1280, height: 800 },
  { touch = false } = {},
): Promise<{ context: BrowserContext; page: Page; close(): Promise<void> }> {
  const profile = mkdtempSync(join(tmpdir(), 'borewright-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env['CHROME_BIN'] ?? '/usr/bin/chromium',
    headless: true,
    args,
    viewport,
    hasTouch: touch,
  });
  // Every content security policy violation is reported by the page itself and by Chromium's console;
  // either fails the test at close(), so a screen that needs what the policy refuses cannot pass.
  const violations: string[] = [];
  await context.addInitScript({
    content:
      "document.addEventListener('securitypolicyviolation', (e) => console.error(`CSP violation: ${e.violatedDirective} blocked ${e.blockedURI || 'inline'} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`));",
  });
  const watch = (page: Page) =>
    page.on('console', (message) => {
      const text = message.text();
      if (/Content Security Policy|CSP violation/.test(text)) violations.push(text);
    });
  context.on('page', watch);
  const page = context.pages()[0] ?? (await context.newPage());
  for (const open of context.pages()) watch(open);
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
      if (violations.length > 0) throw new Error(`The content security policy was violated:\n${violations.join('\n')}`);
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}

/** The demo shop's password for every role (README). */
export const demoPassword = 'greyfield-demo';

export async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}
