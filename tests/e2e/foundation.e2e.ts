import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

describe('a designer and a viewer in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('lets a designer create a job, add a panel and see it listed', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await expect.poll(() => page.getByText('Larch Lane kitchen').count()).toBeGreaterThan(0);
    await screenshot(page, 'designer-jobs');

    const jobName = `Boot room bench ${Date.now()}`;
    await page.getByRole('button', { name: /new job/i }).click();
    await page.getByLabel('Name', { exact: true }).fill(jobName);
    await page.getByRole('button', { name: /^create$/i }).click();
    await page.getByRole('link', { name: jobName }).click();
    await page.waitForURL(/\/jobs\/\d+/);

    await page.getByRole('button', { name: /add panel/i }).click();
    await page.getByLabel('Name', { exact: true }).fill('Left side');
    await page.getByLabel(/width/i).fill('560');
    await page.getByLabel(/height/i).fill('720');
    await page.getByLabel(/thickness/i).fill('18');
    await page.getByRole('button', { name: /^save$/i }).click();
    await expect.poll(() => page.getByRole('cell', { name: 'Left side', exact: true }).count()).toBe(1);
    await screenshot(page, 'designer-job-with-panel');

    // The job's notes, saved with the job's version; someone else's change in between is never written over.
    await page.getByRole('button', { name: /details/i }).click();
    await page.getByLabel('Notes').fill('Measured on site');
    await page.getByRole('button', { name: /^save$/i }).click();
    await expect.poll(() => page.getByRole('dialog').count()).toBe(0);
    await page.getByRole('button', { name: /details/i }).click();
    const jobId = Number(/\/jobs\/(\d+)/.exec(page.url())![1]);
    const renamed = await page.evaluate(async (id) => {
      const token = document.cookie.split('; ').find((c) => c.startsWith('XSRF-TOKEN='))?.split('=')[1] ?? '';
      const job = await (await fetch(`/api/jobs/${id}`)).json();
      const res = await fetch(`/api/jobs/${id}`, {
        method: 'PATCH',
        headers: { 'content-type': 'application/json', 'x-xsrf-token': decodeURIComponent(token) },
        body: JSON.stringify({ name: 'Renamed in another tab', version: job.job.version }),
      });
      return res.status;
    }, jobId);
    expect(renamed).toBe(200);
    await page.getByLabel('Notes').fill('Measured twice');
    await page.getByRole('button', { name: /^save$/i }).click();
    await expect.poll(() => page.getByRole('alert').textContent()).toContain('Someone else changed this job since you opened it.');
    await screenshot(page, 'job-details-stale');
    await page.getByRole('button', { name: 'Reload' }).click();
    await expect.poll(() => page.getByRole('heading', { name: 'Renamed in another tab' }).count()).toBeGreaterThan(0);
  });

  it('shows a viewer no edit controls, and the API refuses the viewer an edit', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'viewer@greyfield.example');
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.waitForURL(/\/jobs\/\d+/);
    await expect.poll(() => page.getByRole('row').count()).toBeGreaterThan(1);
    await screenshot(page, 'viewer-job');
    expect(await page.getByRole('button', { name: /new job|add panel|edit|delete|import/i }).count()).toBe(0);

    // The same session, asking the API directly with a valid CSRF token: refused by role, not by CSRF.
    const status = await page.evaluate(async () => {
      const token = document.cookie.split('; ').find((c) => c.startsWith('XSRF-TOKEN='))?.split('=')[1] ?? '';
      const res = await fetch('/api/jobs', {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-xsrf-token': decodeURIComponent(token) },
        body: JSON.stringify({ name: 'Not allowed' }),
      });
      return res.status;
    });
    expect(status).toBe(403);
  });
});
