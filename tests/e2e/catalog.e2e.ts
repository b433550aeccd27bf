import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, screenshotDir, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** The nth input labelled so in the import form (each bore repeats x, y, diameter and depth). */
const field = (page: Page, label: string, nth = 0) => page.locator('bw-fitting-import-dialog').getByLabel(label, { exact: true }).nth(nth);

/** A dialog as the window shows it: the page behind it scrolls, the dialog does not. */
const windowShot = (page: Page, name: string) => page.screenshot({ path: join(screenshotDir, `${name}.png`) });

describe('the catalog in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('lets the admin fill in a fitting with its drawing following the form, see what is wrong, import it and find it in the catalog', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'owner@greyfield.example');
    await page.getByRole('link', { name: 'Catalog' }).click();
    await page.waitForURL(/\/catalog$/);
    await expect.poll(() => page.locator('.card').count()).toBeGreaterThan(20);
    await screenshot(page, 'catalog');

    await page.getByRole('combobox', { name: 'Kind' }).click();
    await page.getByRole('option', { name: /hinge cup/ }).click();
    await expect.poll(() => page.locator('.card').count()).toBeLessThan(6);
    await page.getByRole('button', { name: 'Show all' }).first().click();

    const id = `shop-hinge-52-${Date.now()}`;
    await page.getByRole('button', { name: 'Import' }).click();
    await field(page, 'Id').fill(id);
    await field(page, 'Name').fill('Cup hinge, full overlay, 52/5.5');
    await field(page, 'Where the numbers come from').fill('trade-reference §2: the 52/5.5 pattern, two Ø8 holes 52 mm apart, 5.5 mm behind the cup centre (common practice)');
    await page.getByRole('button', { name: 'Add bore' }).click();
    await page.getByRole('button', { name: 'Add bore' }).click();
    const bores = [
      ['cup', '0', '0', '35', '13'],
      ['fix-1', '5.5', '-26', '8', '11'],
      // A slip of the hand: a fixing hole of no size.
      ['fix-2', '5.5', '26', '0', '11'],
    ];
    for (const [i, [bore, x, y, d, depth]] of bores.entries()) {
      await field(page, 'Bore id', i).fill(bore);
      await field(page, 'x', i).fill(x);
      await field(page, 'y', i).fill(y);
      await field(page, 'Diameter', i).fill(d);
      await field(page, 'Depth', i).fill(depth);
    }
    await page.getByRole('button', { name: 'Add keep-out' }).click();
    for (const [label, value] of [['x', '-17.5'], ['y', '-30'], ['width', '35'], ['height', '60']])
      await page.locator('.keep-out').getByLabel(label, { exact: true }).fill(value);
    await field(page, 'Cup-boring distance from').fill('3');
    await field(page, 'Cup-boring distance to').fill('7');
    await field(page, 'Hinge constant K').fill('13');
    await field(page, 'Opening angle').fill('110');
    await page.getByRole('button', { name: 'Import fitting' }).click();

    const problems = page.getByRole('list', { name: 'Problems in the fitting' });
    await expect.poll(() => problems.innerText()).toContain('bores[2].diameter: must be greater than 0');
    await expect.poll(() => page.locator('mat-error').allInnerTexts()).toEqual(['Must be greater than 0.']);
    // The two bores drawn so far, and the keep-out around them.
    await expect.poll(() => page.locator('bw-fitting-import-dialog bw-fitting-drawing circle.face-bore').count()).toBe(2);
    await page.locator('bw-fitting-import-dialog mat-error').scrollIntoViewIfNeeded();
    await windowShot(page, 'catalog-import-form-error');

    await field(page, 'Diameter', 2).fill('8');
    await expect.poll(() => page.locator('bw-fitting-import-dialog bw-fitting-drawing circle.face-bore').count()).toBe(3);
    await windowShot(page, 'catalog-import-form-ok');
    await page.getByRole('button', { name: 'Import fitting' }).click();
    await expect.poll(() => page.locator('bw-fitting-import-dialog').count()).toBe(0);

    await page.getByRole('radio', { name: /The shop's/ }).click();
    const card = page.locator('.card', { hasText: id });
    await expect.poll(() => card.innerText()).toMatch(/Shop's own[\s\S]*3 bores: Ø35 13 deep, 2 × Ø8 11 deep[\s\S]*Imported by Ruth Greyfield/);
    await screenshot(page, 'catalog-shop-fitting');
  });

  it('lets the admin upload a catalog file, saying what is wrong with it by path, and then import it mended', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'owner@greyfield.example');
    await page.goto(`${baseUrl}/catalog`);
    await page.getByRole('button', { name: 'Import' }).click();
    await page.getByRole('radio', { name: /Upload a JSON file/ }).click();

    const pin = (id: string, diameter: number) => ({
      id,
      name: 'Shelf pin, Ø5, brass sleeve',
      purpose: 'shelf-pin',
      onSystemRow: true,
      bores: [{ id: 'pin', kind: 'face', x: 0, y: 0, diameter, depth: 'system', source: 'trade-reference §1: Ø5 system holes (published)' }],
    });
    const stamp = Date.now();
    const file = (fittings: unknown[]) => ({ name: 'pins.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify({ fittings })) });
    const picker = page.getByLabel('Catalog file');
    await picker.setInputFiles(file([pin(`brass-pin-${stamp}`, 5), pin('shelf-pin-5', 5), pin(`steel-pin-${stamp}`, -5)]));
    const problems = page.getByRole('list', { name: 'Problems in the file' });
    await expect.poll(() => problems.innerText()).toContain('fittings[2].bores[0].diameter: must be greater than 0');
    await windowShot(page, 'catalog-import-file-error');

    await picker.setInputFiles(file([pin(`brass-pin-${stamp}`, 5), pin('shelf-pin-5', 5)]));
    await expect.poll(() => problems.innerText()).toMatch(/fittings\[1\]\.id: "shelf-pin-5" is a built-in fitting/);

    await picker.setInputFiles(file([pin(`brass-pin-${stamp}`, 5)]));
    await expect.poll(() => page.locator('bw-fitting-import-dialog').count()).toBe(0);
    await expect.poll(() => page.locator('.card', { hasText: `brass-pin-${stamp}` }).count()).toBe(1);
  });

  it('shows a viewer the catalog without import or delete', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'viewer@greyfield.example');
    await page.goto(`${baseUrl}/catalog`);
    await expect.poll(() => page.locator('.card').count()).toBeGreaterThan(20);
    expect(await page.getByRole('button', { name: /import|delete/i }).count()).toBe(0);
  });
});
