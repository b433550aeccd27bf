import type { APIRequestContext, BrowserContext, Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

interface Panel {
  dbId: number;
  name: string;
  carcass?: string;
  status: string;
  statusBy: string | null;
  version: number;
  width: number;
}

/** A job no other browser test marks, so its panels are still to drill. */
const JOB = 'Clinic storage wall';

/**
 * Waits until the offline worker controls the page and has kept this version of the app (ngsw's own
 * debug page, /ngsw/state, names the version once every file of the shell is in its cache).
 */
async function workerReady(page: Page): Promise<void> {
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
  await expect.poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 30_000 }).toBe(true);
  await expect.poll(() => page.evaluate(async () => (await fetch('/ngsw/state')).text()), { timeout: 60_000 }).toMatch(/Latest manifest hash: [0-9a-f]{40}/);
}

/** The job's panels as the server has them, read outside the browser's (offline) network with its cookies. */
async function serverPanels(request: APIRequestContext, jobId: number): Promise<Panel[]> {
  const res = await request.get(`${baseUrl}/api/jobs/${jobId}`);
  expect(res.status()).toBe(200);
  return ((await res.json()) as { panels: Panel[] }).panels;
}

async function jobId(context: BrowserContext): Promise<number> {
  const { jobs } = (await (await context.request.get(`${baseUrl}/api/jobs`)).json()) as { jobs: { id: number; name: string }[] };
  return jobs.find((j) => j.name === JOB)!.id;
}

/** Signs in, lets the worker settle, and opens the job on the bench online, so that its reads are kept. */
async function openBenchOnline(page: Page, context: BrowserContext, carcass: string): Promise<number> {
  await signIn(page, baseUrl, 'bench@greyfield.example');
  await workerReady(page);
  const id = await jobId(context);
  // Loaded again under the worker, so that who is signed in and the job's reads go through it and are kept.
  await page.goto(`${baseUrl}/bench?job=${id}&carcass=${carcass}`);
  await expect.poll(() => page.locator('bw-bench-panel-card').count(), { timeout: 20_000 }).toBeGreaterThan(3);
  await page.getByRole('note', { name: 'Caution' }).first().waitFor();
  return id;
}

/** The banner's words, spaces made single. */
async function banner(page: Page): Promise<string> {
  const box = page.locator('.connection');
  return (await box.count()) === 0 ? '' : (await box.innerText()).replace(/\s+/g, ' ');
}

async function markDrilled(page: Page, name: string): Promise<void> {
  await page.getByRole('button', { name: `Drilled: ${name}`, exact: true }).click();
  const card = page.locator('bw-bench-panel-card').filter({ has: page.getByRole('heading', { name, exact: true }) });
  await expect.poll(() => card.locator('.state').innerText()).toContain('Drilled, waiting to send');
}

describe('the bench offline', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('opens offline from the worker, keeps three marks on the device, sends them when the connection returns, and forgets the job on sign-out', async () => {
    const browser = await openBrowser({ width: 1024, height: 768 });
    close = browser.close;
    const { page, context } = browser;
    const id = await openBenchOnline(page, context, 'tall-1');
    const planned = (await serverPanels(context.request, id)).filter((p) => p.status === 'planned' && p.carcass === 'tall-1');
    const names = planned.slice(0, 3).map((p) => p.name);
    expect(names).toHaveLength(3);
    // The listed panels' templates and maps, read once so that the worker keeps them.
    await page.getByRole('button', { name: 'Keep files for offline' }).click();
    await page.getByRole('button', { name: `Files of ${planned.length} panels kept` }).waitFor({ timeout: 120_000 });

    await context.setOffline(true);
    // Truly offline: a request the worker keeps nothing for does not reach the server.
    expect(await page.evaluate(async () => (await fetch('/api/health')).status)).toBe(504);
    // The page itself comes back from the worker: the shell, who is signed in, the job and its findings.
    await page.reload();
    await expect.poll(() => page.locator('bw-bench-panel-card').count(), { timeout: 20_000 }).toBeGreaterThan(3);
    await expect.poll(() => banner(page)).toContain('The bench is offline.');
    expect(await page.getByRole('heading', { name: 'Bench' }).isVisible()).toBe(true);

    for (const name of names) await markDrilled(page, name);
    expect(await banner(page)).toContain('3 marks waiting to send.');
    // Nothing reached the server yet.
    const before = await serverPanels(context.request, id);
    expect(names.map((n) => before.find((p) => p.name === n)!.status)).toEqual(['planned', 'planned', 'planned']);
    await screenshot(page, 'bench-offline-tablet');

    // At phone size, offline: the banner above the panels, nothing wider than the screen.
    await page.setViewportSize({ width: 390, height: 844 });
    await page.reload();
    await expect.poll(() => banner(page), { timeout: 20_000 }).toContain('3 marks waiting to send.');
    // The panels marked stay listed, waiting, though the reload forgot what this page had marked.
    for (const name of names) expect(await page.getByRole('heading', { name, exact: true }).count()).toBe(1);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await screenshot(page, 'bench-offline-phone');

    // One panel as its label opens it, offline at phone size: its drilling map comes from the worker.
    const first = planned[0];
    await page.goto(`${baseUrl}/bench?job=${id}&panel=${first.dbId}`);
    const map = page.getByRole('img', { name: `Drilling map of ${first.name}, face A` });
    await expect.poll(() => map.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0), { timeout: 20_000 }).toBe(true);
    expect(await page.evaluate(async (dbId) => (await fetch(`/api/panels/${dbId}/template.pdf?paper=a4`)).headers.get('content-type'), first.dbId)).toMatch(/^application\/pdf/);
    await screenshot(page, 'bench-offline-phone-map');

    // Back online, the page open sends the marks by itself.
    await context.setOffline(false);
    await expect
      .poll(async () => (await serverPanels(context.request, id)).filter((p) => names.includes(p.name)).map((p) => `${p.status} by ${p.statusBy}`), { timeout: 30_000 })
      .toEqual(['drilled by Ada Keel', 'drilled by Ada Keel', 'drilled by Ada Keel']);
    await expect.poll(() => banner(page), { timeout: 10_000 }).toBe('');
    await page.goto(`${baseUrl}/bench?job=${id}&carcass=tall-1&done=show`);
    await expect.poll(() => page.locator('bw-bench-panel-card .state').filter({ hasText: /Drilled by Ada Keel, / }).count(), { timeout: 20_000 }).toBe(3);
    expect(await page.getByRole('alert').count()).toBe(0);

    // Signed out, the device keeps no answer of the member's: offline, the job is not there to read.
    await page.setViewportSize({ width: 1024, height: 768 });
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await context.setOffline(true);
    const after = await page.evaluate(async (jobId) => {
      const job = await fetch(`/api/jobs/${jobId}`);
      const session = await (await fetch('/api/auth/session')).json().catch(() => null);
      return { job: job.status, session };
    }, id);
    expect(after.job).toBe(504);
    expect(after.session).toEqual({ user: null, signUpOpen: false });
    await context.setOffline(false);
  });

  it('shows the reason when a mark made offline is refused because the panel changed meanwhile, until it is read', async () => {
    const browser = await openBrowser({ width: 1024, height: 768 });
    close = browser.close;
    const { page, context } = browser;
    const id = await openBenchOnline(page, context, 'tall-2');
    const [changed, other] = (await serverPanels(context.request, id)).filter((p) => p.status === 'planned' && p.carcass === 'tall-2');

    await context.setOffline(true);
    await markDrilled(page, changed.name);
    await markDrilled(page, other.name);

    // Meanwhile a designer changes the first panel on the server, from another browser.
    const designer = await openBrowser();
    try {
      await signIn(designer.page, baseUrl, 'designer@greyfield.example');
      const status = await designer.page.evaluate(async (panel) => {
        const token = decodeURIComponent(document.cookie.split('; ').find((c) => c.startsWith('XSRF-TOKEN='))?.split('=')[1] ?? '');
        const res = await fetch(`/api/panels/${panel.dbId}`, {
          method: 'PATCH',
          headers: { 'content-type': 'application/json', 'x-xsrf-token': token },
          body: JSON.stringify({ version: panel.version, width: panel.width - 1 }),
        });
        return res.status;
      }, changed);
      expect(status).toBe(200);
    } finally {
      await designer.close();
    }

    await context.setOffline(false);
    const alert = page.getByRole('alert').filter({ hasText: `“${changed.name}” was not marked drilled` });
    await alert.waitFor({ timeout: 30_000 });
    expect(await alert.innerText()).toContain('Someone else changed this panel since you loaded it');
    // The other mark went through; the refused one is not on the server.
    await expect
      .poll(async () => (await serverPanels(context.request, id)).filter((p) => p.dbId === changed.dbId || p.dbId === other.dbId).map((p) => p.status), { timeout: 30_000 })
      .toEqual(['planned', 'drilled']);
    await screenshot(page, 'bench-offline-refused');

    // It stays through a reload, until the bench hand says they have read it.
    await page.reload();
    await alert.waitFor();
    await page.getByRole('button', { name: `OK, “${changed.name}” was not marked` }).click();
    await expect.poll(() => alert.count()).toBe(0);
    await page.reload();
    await expect.poll(() => page.locator('bw-bench-panel-card').count(), { timeout: 20_000 }).toBeGreaterThan(0);
    expect(await alert.count()).toBe(0);
  });
});
