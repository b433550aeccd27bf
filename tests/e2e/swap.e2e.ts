import { readFileSync } from 'node:fs';
import JSZip from 'jszip';
import Papa from 'papaparse';
import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** Sets a panel's status through the API in the page's own session, as the panel table would; returns the status it had. */
function setStatus(page: Page, jobId: string, panelId: string, status: string): Promise<string> {
  return page.evaluate(
    async ({ jobId, panelId, status }) => {
      const token = decodeURIComponent(document.cookie.split('; ').find((c) => c.startsWith('XSRF-TOKEN='))?.split('=')[1] ?? '');
      const detail = await (await fetch(`/api/jobs/${jobId}`)).json();
      const panel = detail.panels.find((p: { id: string }) => p.id === panelId);
      if (panel.status !== status) {
        const res = await fetch(`/api/panels/${panel.dbId}/status`, {
          method: 'PATCH',
          headers: { 'content-type': 'application/json', 'x-xsrf-token': token },
          body: JSON.stringify({ version: panel.version, status }),
        });
        if (!res.ok) throw new Error(`status ${status}: ${res.status}`);
      }
      return panel.status as string;
    },
    { jobId, panelId, status },
  );
}

async function choose(page: Page, field: string, option: RegExp): Promise<void> {
  await page.getByLabel(field).click();
  await page.getByRole('option', { name: option }).click();
}

describe('the swap check in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it("lets a designer check a 48/6 hinge for the kitchen's 45/9.5 ones and download a retrofit pack", async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    const jobId = /\/jobs\/(\d+)$/.exec(page.url())![1];
    await page.getByRole('link', { name: 'Swap check' }).click();
    await page.waitForURL(/\/jobs\/\d+\/swap$/);

    await choose(page, 'Fitting in this job', /45\/9\.5 · 6 on 3 panels/);
    await choose(page, 'Replace with', /48\/6/);
    await expect.poll(() => page.getByText('6 placements on 3 panels.').count()).toBe(1);
    // The worked example (trade-reference §2, common practice): each door keeps its two cups and cannot take
    // the 48/6 screw holes, 3.81 mm from the 45/9.5 ones, two Ø8 holes overlapping by 4.2 mm.
    await expect.poll(() => page.getByText(/6\s+reused as they are · 0\s+new to drill · 12\s+new that clash/).count()).toBe(1);
    const door = page.getByRole('article', { name: 'Sink base, door' });
    await expect.poll(() => door.getByRole('row').count()).toBe(1 + 2 + 4 + 4);
    const clash = door.getByRole('row').filter({ hasText: 'hinge-1/fix-1' }).first();
    expect(await clash.textContent()).toContain('Clashes');
    expect(await clash.textContent()).toContain('overlap by 4.2 mm; keep at least 3 mm');
    expect(await door.getByRole('img').count()).toBe(2);
    await screenshot(page, 'swap-hinges');

    // A drilled side with shorter runners: only new holes, so the retrofit pack holds it.
    const had = await setStatus(page, jobId, 'drawer-base-left', 'drilled');
    try {
      await page.reload();
      await choose(page, 'Fitting in this job', /runner, 500 mm/);
      await choose(page, 'Replace with', /runner, 400 mm/);
      const pack = page.getByRole('link', { name: /Retrofit pack \(\d panels?\)/ });
      await pack.waitFor();
      const side = page.getByRole('article', { name: 'Drawer base, left side' });
      expect(await side.getByText(/^to drill$/i).count()).toBe(1);
      const [download] = await Promise.all([page.waitForEvent('download'), pack.click()]);
      const zip = await JSZip.loadAsync(readFileSync((await download.path())!));
      const schedule = zip.file(/hole schedule\.csv$/)[0];
      const rows = Papa.parse<Record<string, string>>((await schedule.async('string')).trim(), { header: true }).data;
      // Runners: the rear screws 160 and 320 behind the front one on the 37 mm row (trade-reference §6, common practice).
      const left = rows.filter((r) => r['panel'] === 'drawer-base-left');
      expect(left.map((r) => r['x'])).toEqual(['197', '357', '197', '357', '197', '357']);
      expect(rows.every((r) => r['bores'].includes('/rear-'))).toBe(true);

      await page.getByRole('button', { name: 'Apply swap…' }).click();
      const dialog = page.getByRole('alertdialog');
      expect(await dialog.textContent()).toContain('6 placements on 2 panels become Drawer runner, 400 mm.');
      await screenshot(page, 'swap-apply-confirmation');
      await dialog.getByRole('button', { name: 'Cancel' }).click();
      await screenshot(page, 'swap-runners');
    } finally {
      await setStatus(page, jobId, 'drawer-base-left', had);
    }
  });

  it('fits a phone', async () => {
    const browser = await openBrowser({ width: 390, height: 844 });
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'viewer@greyfield.example');
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.getByRole('link', { name: 'Swap check' }).click();
    await choose(page, 'Fitting in this job', /45\/9\.5/);
    await choose(page, 'Replace with', /48\/6/);
    await page.getByRole('article', { name: 'Sink base, door' }).waitFor();
    // A viewer reads the report but cannot apply it.
    expect(await page.getByRole('button', { name: 'Apply swap…' }).count()).toBe(0);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await screenshot(page, 'swap-phone');
  });
});
