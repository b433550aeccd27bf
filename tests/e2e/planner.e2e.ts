import { afterEach, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';

/** Creates a job named after `name` and opens its planner from the empty job's "Plan a carcass"; gives the job's name. */
async function newJobPlanner(page: Page, name: string): Promise<string> {
  const jobName = `${name} ${Date.now()}`;
  await page.getByRole('button', { name: /new job/i }).click();
  await page.getByLabel('Name', { exact: true }).fill(jobName);
  await page.getByRole('button', { name: /^create$/i }).click();
  await page.getByRole('link', { name: jobName }).click();
  await page.getByRole('link', { name: /plan a carcass/i }).click();
  await page.waitForURL(/\/jobs\/\d+\/plan$/);
  return jobName;
}


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

    const jobName = await newJobPlanner(page, 'Hallway flap unit');

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

  it('plans a carcass in sections on screen, two doors below a flap, finds its panels and plans it again from the job page', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');

    const jobName = await newJobPlanner(page, 'Study hutch');

    await page.getByLabel('Id', { exact: true }).fill('hutch');
    await page.getByLabel('Name', { exact: true }).fill('Desk hutch');
    await page.getByLabel('Width', { exact: true }).fill('700');
    await page.getByLabel('Height', { exact: true }).first().fill('1011');
    await page.getByLabel('Depth', { exact: true }).fill('350');
    await page.getByRole('radio', { name: 'Sections' }).click();
    const sections = page.locator('fieldset.section');
    await expect.poll(() => sections.count()).toBe(2);
    await expect.poll(() => page.getByRole('radiogroup', { name: 'Shelves' }).getByRole('radio', { name: 'None' }).getAttribute('aria-checked'), { message: 'no other shelves' }).toBe('true');

    // A height the sections above cannot take is told beside the height, in the shared planner's words.
    const lowerHeight = sections.nth(0).getByLabel('Height');
    await lowerHeight.fill('1000');
    await expect.poll(() => sections.nth(0).locator('.field-error').innerText()).toMatch(/leaves no room for the sections above it/);
    await lowerHeight.fill('600');
    await expect.poll(() => sections.nth(0).locator('.field-error').count()).toBe(0);
    await expect.poll(() => page.locator('bw-plan-results').innerText()).toMatch(/power factor/i);
    await expect.poll(() => page.getByRole('note').allInnerTexts()).toContainEqual(expect.stringMatching(/lift mechanisms are spring-loaded/i));
    await screenshot(page, 'planner-sections-1280');
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'planner-sections-390');
    expect(await page.evaluate(() => document.documentElement.scrollWidth), 'no sideways scroll on a phone').toBeLessThanOrEqual(390);
    await page.setViewportSize({ width: 1280, height: 800 });

    await page.getByRole('button', { name: /add to job/i }).click();
    await page.getByRole('button', { name: /open the job/i }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    const names = ['left side', 'right side', 'top', 'bottom', 'dividing shelf 1', 'section 1 left door', 'section 1 right door', 'section 2 flap'];
    for (const name of names.map((n) => `Desk hutch, ${n}`)) {
      await expect.poll(() => page.getByRole('link', { name, exact: true }).count(), { message: name }).toBe(1);
    }

    // Planning again opens the form filled from the description the carcass was planned from, sections and all.
    await page.getByRole('link', { name: 'Plan Desk hutch again' }).click();
    await page.waitForURL(/\/plan\?carcass=hutch$/);
    await expect.poll(() => sections.count()).toBe(2);
    await expect.poll(() => sections.nth(0).getByLabel('Height').inputValue()).toBe('600');
    await expect.poll(() => sections.nth(1).locator('mat-select').first().innerText()).toMatch(/lift-up flap/i);
    await screenshot(page, 'planner-sections-again');
  });
});

