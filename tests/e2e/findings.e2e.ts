import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

async function openPanel(page: Page, job: string, panel: string): Promise<void> {
  await page.getByRole('link', { name: job }).click();
  await page.getByRole('link', { name: panel, exact: true }).click();
  await page.waitForURL(/\/panels\/\d+/);
  await page.locator('bw-panel-stage canvas').first().waitFor();
  const header = page.getByRole('button', { name: /^Placements \(/ });
  if ((await header.getAttribute('aria-expanded')) !== 'true') await header.click();
  await page.locator('bw-placement-list .placement').first().waitFor({ state: 'visible' });
}

/** Selects a placement from the list and types a new height into its y field. */
async function setHeight(page: Page, placement: string, y: number): Promise<void> {
  await page.locator('bw-placement-list .placement').filter({ has: page.getByText(placement, { exact: true }) }).click();
  const field = page.locator('bw-properties-form input').nth(1);
  await field.fill(String(y));
  await field.press('Enter');
}

/** Saves the panel, unless autosave already has: a warning does not hold autosave back. */
async function saved(page: Page): Promise<void> {
  const save = page.getByRole('button', { name: 'Save', exact: true });
  if (await save.isEnabled()) await save.click({ timeout: 2000 }).catch(() => undefined);
  await expect.poll(() => page.locator('.save-state').innerText()).toContain('All changes saved');
}

/** Rings the stage draws for findings of this code, read from Konva's own node tree. */
function ringsOnStage(page: Page, code: string): Promise<number> {
  return page.evaluate((name) => {
    const konva = (window as unknown as { Konva: { stages: { find(selector: string): unknown[] }[] } }).Konva;
    return konva.stages.reduce((n, stage) => n + stage.find(`.${name}`).length, 0);
  }, `finding-${code}`);
}

const findingOf = (page: Page, code: string) => page.locator(`bw-findings-list .finding[data-code="${code}"]`);
/** A finding's item in the editor's list: the finding, its checked fixes and its advice. */
const itemOf = (page: Page, code: string) => page.locator('bw-findings-list .item', { has: page.locator(`.finding[data-code="${code}"]`) });

describe('findings and their fixes in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('rings a shelf pin put in a plate\'s screw hole, and its checked fix clears the panel in one undoable step', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await openPanel(page, 'Larch Lane kitchen', 'Wall unit, left side');
    await expect.poll(() => page.locator('bw-findings-list').innerText()).toContain('No findings');
    const pins = page.locator('bw-placement-list .placement', { hasText: 'Shelf pin' });
    const pin = ((await pins.first().locator('strong').textContent()) ?? '').trim();
    expect(pin).not.toBe('');
    const plates = page.locator('bw-placement-list .placement', { hasText: 'Mounting plate' });
    const [, plateY] = /, y ([\d.]+)/.exec((await plates.first().textContent()) ?? '') ?? [];
    expect(Number(plateY)).toBeGreaterThan(0);

    // The plate's upper screw hole is 16 mm above its anchor (two holes 32 mm apart, trade-reference §2).
    await setHeight(page, pin, Number(plateY) + 16);
    await expect.poll(() => findingOf(page, 'hole-shared').count()).toBe(1);
    expect(await ringsOnStage(page, 'hole-shared')).toBeGreaterThan(0);
    await screenshot(page, 'findings-hole-shared');

    // Opening the finding tries its fixes on a copy of the job.
    await findingOf(page, 'hole-shared').click();
    const item = itemOf(page, 'hole-shared');
    await expect.poll(() => item.locator('.fix').count()).toBeGreaterThan(0);
    await item.getByRole('button', { name: 'Apply fix' }).first().click();
    await expect.poll(() => findingOf(page, 'hole-shared').count()).toBe(0);
    // The fix was checked before it was offered: no error is left on the panel.
    expect(await page.locator('bw-findings-list .finding[data-severity="error"]').count()).toBe(0);
    await screenshot(page, 'findings-fixed');

    // One undo brings the shared hole back, one redo the fix.
    await page.locator('bw-panel-stage').focus();
    await page.keyboard.press('Control+z');
    await expect.poll(() => findingOf(page, 'hole-shared').count()).toBe(1);
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(() => findingOf(page, 'hole-shared').count()).toBe(0);
  });

  it('lists a saved panel\'s findings on the job page, and a finding opens the editor with its placements selected', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await openPanel(page, 'Loft study bookcase', 'Flap unit, left, left side');
    const pins = page.locator('bw-placement-list .placement', { hasText: 'Shelf pin' });
    const pin = ((await pins.first().locator('strong').textContent()) ?? '').trim();
    expect(pin).not.toBe('');
    const [, pinY] = /, y ([\d.]+)/.exec((await pins.first().textContent()) ?? '') ?? [];
    // One pitch down on the left side only: the other side no longer mirrors it (a warning, so autosave goes on).
    await setHeight(page, pin, Number(pinY) - 32);
    await expect.poll(() => findingOf(page, 'sides-mismatched').count()).toBe(1);
    await saved(page);

    await page.goBack();
    await page.waitForURL(/\/jobs\/\d+$/);
    const list = page.locator('bw-job-findings');
    await expect.poll(() => list.textContent()).toContain('sides-mismatched');
    await expect.poll(() => page.locator('bw-panel-table').innerText()).toContain('1 warning');
    await screenshot(page, 'job-findings');
    await list.getByRole('link', { name: 'Flap unit, left, left side' }).first().click();
    await page.waitForURL(/\/panels\/\d+\?placements=/);
    await page.locator('bw-panel-stage canvas').first().waitFor();
    await expect.poll(() => page.locator(`bw-placement-list .placement[aria-pressed="true"]`).count()).toBeGreaterThan(0);
    await screenshot(page, 'job-findings-opened');

    // Put it back for the other browser tests, through the mirror fix the finding offers.
    await findingOf(page, 'sides-mismatched').click();
    const item = itemOf(page, 'sides-mismatched');
    await item.getByRole('button', { name: 'Apply fix' }).first().click();
    await expect.poll(() => findingOf(page, 'sides-mismatched').count()).toBe(0);
    await saved(page);
  });
});
