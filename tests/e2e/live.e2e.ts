import { afterEach, describe, expect, inject, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** A change made by the member of this browser, through their own session, as their editor's save would send it. */
async function renamePanel(context: BrowserContext, jobId: string, panelId: string, name: string): Promise<void> {
  const detail = await context.request.get(`${baseUrl}/api/jobs/${jobId}`);
  const panel = ((await detail.json()) as { panels: { dbId: number; version: number }[] }).panels.find((p) => p.dbId === Number(panelId))!;
  const token = (await context.cookies(baseUrl)).find((c) => c.name === 'XSRF-TOKEN')!.value;
  const res = await context.request.patch(`${baseUrl}/api/panels/${panelId}`, {
    headers: { 'X-XSRF-TOKEN': decodeURIComponent(token) },
    data: { version: panel.version, name },
  });
  expect(res.status()).toBe(200);
}

describe('two members on one job, live', () => {
  const closers: (() => Promise<void>)[] = [];
  afterEach(async () => {
    for (const close of closers.splice(0)) await close();
  });

  it('shows each who else is on the job and in the panel, and offers the editor a reload the moment the other saves its panel', async () => {
    const tomas = await openBrowser();
    closers.push(tomas.close);
    const ruth = await openBrowser();
    closers.push(ruth.close);
    await signIn(tomas.page, baseUrl, 'designer@greyfield.example');
    await signIn(ruth.page, baseUrl, 'owner@greyfield.example');

    for (const { page } of [tomas, ruth]) {
      await page.getByRole('link', { name: 'Loft study bookcase' }).click();
      await page.waitForURL(/\/jobs\/\d+$/);
    }
    // Each job page names the other member, not its own.
    await expect.poll(() => tomas.page.locator('bw-present-members').innerText(), { timeout: 15_000 }).toContain('Ruth Greyfield');
    await expect.poll(() => ruth.page.locator('bw-present-members').innerText(), { timeout: 15_000 }).toContain('Tomas Ward');
    expect(await tomas.page.locator('bw-present-members').innerText()).not.toContain('Tomas Ward');
    await screenshot(tomas.page, 'live-job-presence');

    // Ruth opens a panel: Tomas's job page says which.
    await ruth.page.getByRole('link', { name: 'Flap unit, left, flap', exact: true }).click();
    await ruth.page.locator('bw-panel-stage canvas').first().waitFor();
    await expect.poll(() => tomas.page.locator('bw-present-members').innerText(), { timeout: 15_000 }).toContain('editing “Flap unit, left, flap”');

    // Tomas opens the same panel: his editor names Ruth as having it open too.
    await tomas.page.getByRole('link', { name: 'Flap unit, left, flap', exact: true }).click();
    await tomas.page.locator('bw-panel-stage canvas').first().waitFor();
    await expect.poll(() => tomas.page.locator('.title h1 bw-present-members').innerText(), { timeout: 15_000 }).toContain('Ruth Greyfield');
    await screenshot(tomas.page, 'live-editor-presence');

    // Ruth saves the panel: Tomas's editor says so at once, before he saves anything.
    const [, , jobId, , panelId] = new URL(ruth.page.url()).pathname.split('/');
    await renamePanel(ruth.context, jobId, panelId, 'Flap unit, left, flap (renamed)');
    const snack = tomas.page.locator('mat-snack-bar-container');
    await expect.poll(() => snack.innerText(), { timeout: 15_000 }).toContain('This panel was changed by Ruth Greyfield.');
    expect(await tomas.page.locator('.status .bw-alert').innerText()).toContain('This panel was changed by Ruth Greyfield.');
    await screenshot(tomas.page, 'live-editor-changed');

    // Reload: Tomas's editor shows Ruth's change, and the notice is gone.
    await snack.getByRole('button', { name: 'Reload' }).click();
    await expect.poll(() => tomas.page.locator('.title h1').innerText(), { timeout: 15_000 }).toContain('Flap unit, left, flap (renamed)');
    expect(await tomas.page.locator('.status .bw-alert').count()).toBe(0);
    await renamePanel(ruth.context, jobId, panelId, 'Flap unit, left, flap');
  });
});
