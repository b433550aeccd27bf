import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

describe('the carcass planner in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('plans a wall-hung carcass with a lift-up flap, finds its panels in the job and opens one in the editor', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');

    const jobName = `Hallway flap unit ${Date.now()}`;
    await page.getByRole('button', { name: /new job/i }).click();
    await page.getByLabel('Name', { exact: true }).fill(jobName);
    await page.getByRole('button', { name: /^create$/i }).click();
    await page.getByRole('link', { name: jobName }).click();
    await page.getByRole('link', { name: /plan a carcass/i }).click();
    await page.waitForURL(/\/jobs\/\d+\/plan$/);

    await page.getByLabel('Id', { exact: true }).fill('hall');
    await page.getByLabel('Name', { exact: true }).fill('Hall flap');
    await page.getByRole('radio', { name: 'Lift-up flap' }).click();
    await page.getByRole('radio', { name: 'Wall-hung' }).click();
    // Both cautions in plain words beside the choices: the spring-loaded mechanism and the wall fixings.
    await expect.poll(() => page.getByRole('note').allInnerTexts()).toEqual([
      expect.stringMatching(/lift mechanisms are spring-loaded/i),
      expect.stringMatching(/wall-hung unit puts its whole load on its wall fixings/i),
    ]);
    await expect.poll(() => page.locator('bw-plan-results').innerText()).toMatch(/power factor/i);
    await screenshot(page, 'planner-flap');

    await page.getByRole('button', { name: /add to job/i }).click();
    await page.getByRole('button', { name: /open the job/i }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    for (const name of ['Hall flap, left side', 'Hall flap, right side', 'Hall flap, top', 'Hall flap, bottom', 'Hall flap, flap']) {
      await expect.poll(() => page.getByRole('link', { name, exact: true }).count(), { message: name }).toBe(1);
    }
    await screenshot(page, 'planner-flap-in-job');

    await page.getByRole('link', { name: 'Hall flap, left side', exact: true }).click();
    await page.waitForURL(/\/panels\/\d+$/);
    await page.locator('bw-panel-stage canvas').first().waitFor();
    await expect.poll(() => page.locator('bw-placement-list').textContent()).toMatch(/lift mechanism/i);
    await screenshot(page, 'planner-flap-side-in-editor');
  });
});
