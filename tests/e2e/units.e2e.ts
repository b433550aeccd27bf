import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** Chooses how lengths read in the top bar's menu and waits until the server has stored it. */
async function chooseUnits(page: Page, units: string): Promise<void> {
  const stored = page.waitForResponse((res) => res.url().endsWith('/api/auth/me/preferences') && res.ok());
  await page.getByRole('combobox', { name: /lengths in/i }).selectOption(units);
  await stored;
}

/** The words of a label the stage paints (its Konva node's name), read from Konva's own node tree. */
async function stageLabel(page: Page, name: string): Promise<string | undefined> {
  return page.evaluate((n) => {
    const konva = (window as unknown as { Konva: { stages: { find(selector: string): { getText(): { text(): string } }[] }[] } }).Konva;
    return konva.stages[0]?.find(`.${n}`)[0]?.getText().text();
  }, name);
}

describe('inches on screen, millimetres in the system', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('shows the job page, the editor and the planner in fractional inches and stores a typed 12 3/8" as 314.325 mm', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await chooseUnits(page, 'in-32');

    // The job page: carcass and panel sizes in inches.
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    const jobUrl = page.url();
    await expect.poll(() => page.locator('.carcass-size').allInnerTexts()).toContainEqual(expect.stringMatching(/^\d[\d /]*" × \d[\d /]*" × \d[\d /]*"$/));
    expect(await page.getByRole('columnheader', { name: /W × H × T/ }).innerText()).toContain('(in)');
    await screenshot(page, 'units-job-page');

    // The editor: size line, placement list and fields in inches; the pitch is the system's own figure.
    await page.getByRole('table').getByRole('link', { name: 'Sink base, door', exact: true }).click();
    await page.waitForURL(/\/panels\/\d+$/);
    await page.locator('bw-panel-stage canvas').first().waitFor();
    const panelId = Number(/\/panels\/(\d+)$/.exec(page.url())![1]);
    expect(await page.locator('.title .size').innerText()).toMatch(/^[\d /]+" × [\d /]+" × [\d /]+"/);
    // The pitch joins the tip once the job's system has loaded.
    await expect.poll(() => page.locator('.status .tip').innerText()).toContain('32 mm (1 17/64")');
    const list = page.getByRole('button', { name: /^Placements \(/ });
    if ((await list.getAttribute('aria-expanded')) !== 'true') await list.click();
    await page.locator('bw-placement-list .placement').first().click();
    const y = page.getByLabel('y (in)');
    await expect.poll(() => y.inputValue()).toMatch(/"$/);

    // Garbage is refused in words, and the placement stays where it was.
    const before = await y.inputValue();
    await y.fill('twelve');
    await y.press('Tab');
    await expect.poll(() => page.locator('bw-properties-form [role="alert"]').innerText()).toContain('"twelve" is not a length');
    await screenshot(page, 'units-editor-refused');

    // 12 3/8 in = 12.375 × 25.4 = 314.325 mm exactly.
    await y.fill('12 3/8"');
    await y.press('Tab');
    await expect.poll(() => y.inputValue()).toBe('12 3/8"');
    expect(before).not.toBe('12 3/8"');
    await expect.poll(() => page.locator('bw-placement-list .placement').first().innerText()).toContain('y 12 3/8"');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    const saveAnyway = page.getByRole('button', { name: 'Save anyway' });
    if (await saveAnyway.isVisible({ timeout: 3000 }).catch(() => false)) await saveAnyway.click();
    await expect.poll(() => page.locator('.save-state').innerText()).toContain('All changes saved');
    const jobId = Number(/\/jobs\/(\d+)$/.exec(jobUrl)![1]);
    const job = await page.evaluate(async (id) => (await (await fetch(`/api/jobs/${id}`)).json()) as { panels: { dbId: number; placements: { y: number }[] }[] }, jobId);
    expect(job.panels.find((p) => p.dbId === panelId)!.placements[0].y).toBe(314.325);

    // The stage's own dimension of the selected placement, and the Step menu, in inches: the steps are the
    // marks of an inch rule, 1/16" = 1.5875 mm to start with.
    await expect.poll(() => stageLabel(page, 'dimension-y')).toBe('y 12 3/8"');
    expect(await stageLabel(page, 'dimension-x')).toMatch(/^x [\d /]+"$/);
    const step = page.locator('label.step select');
    expect(await step.locator('option').allInnerTexts()).toEqual(['1/32"', '1/16"', '1/8"', '1/4"', '1/2"']);
    expect(await step.inputValue()).toBe('1.5875');
    await screenshot(page, 'units-editor');
    await page.setViewportSize({ width: 390, height: 844 });
    await expect.poll(() => stageLabel(page, 'dimension-y')).toBe('y 12 3/8"');
    await screenshot(page, 'units-editor-phone');
    await page.setViewportSize({ width: 1280, height: 800 });

    // The planner: its fields and its summary in inches. Its starting width, 600 mm, is 600 / 25.4 = 23.622 in
    // = 755.9/32 → 756/32 = 23 5/8 (the international inch, 25.4 mm: NIST SP 811, published); its front row,
    // the system's 37 mm, is 1.4567 in = 93.2/64 → 93/64 = 1 29/64.
    await page.goto(jobUrl);
    await page.getByRole('link', { name: /plan a carcass/i }).first().click();
    await page.waitForURL(/\/plan$/);
    await expect.poll(() => page.getByLabel('Width').inputValue()).toBe('23 5/8"');
    await expect.poll(() => page.locator('bw-plan-results').innerText()).toMatch(/Front row\s+37 mm \(1 29\/64"\)/);
    // The reasons ("why") the planner gives are worded in inches too, the system's own figures in mm with their inches.
    const results = await page.locator('bw-plan-results').innerText();
    expect(results).toContain('the front row at the setback, 37 mm (1 29/64") from the front edge');
    expect(results).toContain('the furthest whole 32 mm (1 17/64") pitch behind the front row');
    expect(results).toMatch(/the highest whole pitch above the first hole; [\d /]+" below the top/);
    expect(results).not.toMatch(/\d mm below the top/);
    await page.getByLabel('Height').fill('28 1/2"');
    await page.getByLabel('Height').press('Tab');
    // 28 1/2 in = 723.9 mm; the planner takes the mm and the drawing names it back in inches.
    await expect.poll(() => page.locator('bw-carcass-drawing').innerText()).toContain('23 5/8" × 28 1/2"');
    await screenshot(page, 'units-planner');
    await page.setViewportSize({ width: 390, height: 844 });
    await expect.poll(() => page.locator('bw-plan-results').innerText()).toContain('37 mm (1 29/64") from the front edge');
    await screenshot(page, 'units-planner-phone');
    await page.setViewportSize({ width: 1280, height: 800 });

    await chooseUnits(page, 'mm');
    await expect.poll(() => page.getByLabel('Width').inputValue()).toBe('600');
  });
});
