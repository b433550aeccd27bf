import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

describe('what a viewer, a bench hand and a new job show', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('shows a viewer the cautions of a wall-hung job with flaps, and a flap editor that reads, titled Panel, with its cautions', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'viewer@greyfield.example');
    await page.getByRole('link', { name: 'Loft study bookcase' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    // design.md §8: the installer hanging the unit sees the wall-hung and lift mechanism cautions.
    const cautions = page.locator('bw-caution-list [data-caution]');
    await expect.poll(() => cautions.evaluateAll((items) => items.map((i) => i.getAttribute('data-caution')))).toEqual(['wall-hung', 'lift-mechanism']);
    expect(await page.locator('bw-caution-list').first().innerText()).toContain('licensed professionals decide');
    expect(await page.locator('.carcass', { hasText: 'Desk hutch' }).innerText()).toContain('Wall-hung');

    await page.getByRole('link', { name: 'Flap unit, left, flap', exact: true }).click();
    await page.locator('bw-panel-stage canvas').first().waitFor();
    await expect.poll(() => page.title()).toBe('Flap unit, left, flap · Panel · Borewright');
    expect(await page.locator('.read-only-mark').innerText()).toContain('Read only');
    expect(await page.locator('bw-catalog-list').count()).toBe(0);
    expect(await page.locator('.title .size').innerText()).toContain('x from the hinge edge to the free edge');
    expect(await page.locator('.side bw-caution-list').innerText()).toMatch(/Lift mechanisms are spring-loaded/);
    // A placement's numbers read as text: nothing to type into, nothing that silently does nothing.
    await page.getByText(/Placements \(\d+\)/).click();
    await page.locator('bw-placement-list .placement').first().click();
    await expect.poll(() => page.locator('bw-properties-form dl.read-only').count()).toBe(1);
    expect(await page.locator('bw-properties-form input').count()).toBe(0);
    expect(await page.locator('bw-properties-form mat-button-toggle-group').count()).toBe(0);
    await screenshot(page, 'viewer-flap-editor');
  });

  it('shows a carcass on a kickboard as standing on one, and an empty job the way to start', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    await expect.poll(() => page.locator('.carcass-meta').first().innerText()).toContain('On a kickboard');

    await page.getByRole('link', { name: 'Jobs', exact: true }).first().click();
    const jobName = `Empty start ${Date.now()}`;
    await page.getByRole('button', { name: /new job/i }).click();
    await page.getByLabel('Name', { exact: true }).fill(jobName);
    await page.getByRole('button', { name: /^create$/i }).click();
    await page.getByRole('link', { name: jobName }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    const start = page.locator('.empty-start');
    await expect.poll(() => start.innerText()).toContain('No carcasses in this job yet');
    expect(await start.getByRole('link', { name: 'Plan a carcass' }).count()).toBe(1);
    expect(await start.getByRole('button', { name: 'Import cut list' }).count()).toBe(1);
    await screenshot(page, 'empty-job');
  });

  it('reaches every destination of an admin from the Menu on a phone', async () => {
    const browser = await openBrowser({ width: 390, height: 844 });
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'owner@greyfield.example');
    await page.getByRole('button', { name: 'Menu' }).click();
    const nav = page.getByRole('navigation', { name: 'Main' });
    for (const name of ['Jobs', 'Catalog', 'Team', 'Bench', 'Outbox', 'How it works']) {
      const link = nav.getByRole('link', { name, exact: true });
      // The list opens on the frame after the tap: the test waits for it as a person's eye does.
      await expect.poll(() => link.isVisible(), { message: name }).toBe(true);
      const box = await link.boundingBox();
      expect(box && box.x >= 0 && box.x + box.width <= 390, `${name} within the screen`).toBe(true);
    }
    await screenshot(page, 'phone-menu');
    await nav.getByRole('link', { name: 'Outbox', exact: true }).click();
    await page.waitForURL(/\/outbox$/);
    await expect.poll(() => nav.isVisible(), { message: 'the list folds once a destination is chosen' }).toBe(false);
  });
});
