import { readFileSync } from 'node:fs';
import { PDFDocument } from 'pdf-lib';
import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** The progress bar's words, which say how many panels of the selection are checked, drilled and to drill. */
function progress(page: Page): Promise<string> {
  return page.locator('bw-panel-progress .bar').getAttribute('aria-label').then((label) => label ?? '');
}

async function chooseOption(page: Page, field: string, option: string): Promise<void> {
  await page.getByRole('combobox', { name: field }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

describe('the bench in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('lets a bench user pick a job, filter by carcass, mark a panel drilled then checked, undo a mark, and keeps the marks', async () => {
    const browser = await openBrowser({ width: 1280, height: 800 });
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'bench@greyfield.example');
    await page.getByRole('link', { name: 'Bench' }).click();
    await page.waitForURL(/\/bench$/);
    // The drilling caution of design.md §8, once, at the top.
    expect(await page.getByRole('note', { name: 'Caution' }).innerText()).toContain('check the 100 mm bar on every page before drilling');

    await page.getByRole('button', { name: /Larch Lane kitchen/ }).click();
    await page.waitForURL(/\/bench\?job=\d+$/);
    await chooseOption(page, 'Carcass', 'Sink base');
    await page.waitForURL(/carcass=sink-base/);
    await expect.poll(() => progress(page)).toMatch(/^Panels of Sink base: \d+ of \d+ checked/);
    const [, checkedBefore, total, drilledBefore] = /(\d+) of (\d+) checked, (\d+) drilled/.exec(await progress(page))!.map(Number);
    expect(total).toBeGreaterThan(2);

    // Every card listed is of the sink base and still to drill.
    const cards = page.locator('bw-bench-panel-card');
    await expect.poll(() => cards.count()).toBeGreaterThan(1);
    expect(await cards.locator('.where').allInnerTexts()).toEqual(expect.arrayContaining([expect.stringMatching(/^Sink base · /)]));
    const name = (await cards.first().locator('.name').innerText()).trim();
    const card = cards.filter({ has: page.getByRole('heading', { name, exact: true }) });
    expect(await card.getByRole('button', { name: `Checked: ${name}` }).isDisabled()).toBe(true);

    await card.getByRole('button', { name: `Drilled: ${name}` }).click();
    await expect.poll(() => card.locator('.state').innerText()).toMatch(/^Drilled by Ada Keel, /);
    await expect.poll(() => progress(page)).toContain(`${checkedBefore} of ${total} checked, ${drilledBefore + 1} drilled`);
    await card.getByRole('button', { name: `Checked: ${name}` }).click();
    await expect.poll(() => card.locator('.state').innerText()).toMatch(/^Checked by Ada Keel, /);
    await expect.poll(() => progress(page)).toContain(`${checkedBefore + 1} of ${total} checked, ${drilledBefore} drilled`);
    expect(await page.getByRole('status').filter({ hasText: `Marked “${name}” checked.` }).count()).toBe(1);
    await screenshot(page, 'bench-1280');

    // A second panel marked by mistake, then undone: back to planned, the progress as before.
    const other = (await cards.nth(1).locator('.name').innerText()).trim();
    await page.getByRole('button', { name: `Drilled: ${other}` }).click();
    await expect.poll(() => progress(page)).toContain(`${drilledBefore + 1} drilled`);
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => progress(page)).toContain(`${checkedBefore + 1} of ${total} checked, ${drilledBefore} drilled`);
    expect(await page.getByRole('button', { name: `Drilled: ${other}` }).isEnabled()).toBe(true);

    // Kept: after a reload the address still names the job and carcass, and the checked panel is counted.
    await page.reload();
    await expect.poll(() => progress(page)).toContain(`${checkedBefore + 1} of ${total} checked`);
    expect(await page.getByRole('heading', { name, exact: true }).count()).toBe(0); // checked panels are hidden…
    await page.getByText('Show drilled and checked').click();
    await expect.poll(() => card.locator('.state').innerText()).toMatch(/^Checked by Ada Keel, /); // …until asked for
    expect(await card.getByRole('button', { name: `Drilled: ${name}` }).getAttribute('aria-pressed')).toBe('true');

    // The labels of the sink base: one A4 sheet, since it has fewer than 15 panels.
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Labels' }).click()]);
    expect(download.suggestedFilename()).toBe('Larch Lane kitchen labels.pdf');
    const pdf = await PDFDocument.load(readFileSync((await download.path())!));
    expect(pdf.getPageCount()).toBe(Math.ceil(total / 14));
  });

  it('opens one panel with its drilling map from the address on its label, at tablet and phone widths', async () => {
    for (const [width, height, shot] of [
      [1024, 768, 'bench-tablet'],
      [390, 844, 'bench-phone'],
    ] as const) {
      const browser = await openBrowser({ width, height });
      close = browser.close;
      const { page } = browser;
      await signIn(page, baseUrl, 'bench@greyfield.example');
      const jobs = await page.evaluate(async () => (await (await fetch('/api/jobs')).json()).jobs as { id: number; name: string }[]);
      const kitchen = jobs.find((j) => j.name === 'Larch Lane kitchen')!;
      const detail = await page.evaluate(async (id) => (await fetch(`/api/jobs/${id}`)).json(), kitchen.id);
      const door = detail.panels.find((p: { name: string }) => p.name === 'Sink base, door');
      // The address a label's QR code holds (shared/api/label-contract.ts benchPanelPath).
      await page.goto(`${baseUrl}/bench?job=${kitchen.id}&panel=${door.dbId}`);
      await page.getByText('Showing one panel, as its label asks.').waitFor();
      await expect.poll(() => page.locator('bw-bench-panel-card').count()).toBe(1);
      const map = page.getByRole('img', { name: 'Drilling map of Sink base, door, face A' });
      // The map is drawn when asked for (svgdom loads on first use), so it may take a few seconds.
      await expect.poll(() => map.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0), { timeout: 15_000 }).toBe(true);
      // Large targets for a tablet in the workshop: the mark buttons are at least 56 px high.
      const button = await page.getByRole('button', { name: 'Drilled: Sink base, door' }).boundingBox();
      expect(button!.height).toBeGreaterThanOrEqual(56);
      // Nothing wider than the screen.
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      await page.getByRole('button', { name: 'Show all panels' }).click();
      await expect.poll(() => page.locator('bw-bench-panel-card').count()).toBeGreaterThan(1);
      await screenshot(page, shot);
      await browser.close();
      close = undefined;
    }
  });
});
