import JSZip from 'jszip';
import { readFile } from 'node:fs/promises';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

describe('the machine settings and drilling programs in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it("lets the admin set the machine's tools from the top bar, and a panel's download menu gives programs that follow them", async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'owner@greyfield.example');

    await page.getByRole('link', { name: 'Machine' }).click();
    await page.waitForURL(/\/settings\/machine$/);
    await page.getByRole('heading', { name: 'Machine' }).waitFor();
    await expect.poll(() => page.locator('.tool').count()).toBe(7);
    expect(await page.getByRole('note').innerText()).toContain('Prove every new drilling program in the air or on scrap first');
    await screenshot(page, 'machine-settings');

    // Tool 1 (the 5 mm blind bit) becomes tool 11, and the settings are saved.
    const toolNumber = page.getByRole('group', { name: 'Tool 1' }).getByLabel('Tool number');
    await toolNumber.fill('11');
    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => page.getByRole('status').innerText()).toContain('by Ruth Greyfield');

    await page.goto(`${baseUrl}/jobs`);
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).first().click();
    await page.waitForURL(/\/jobs\/\d+$/);
    await page.getByRole('button', { name: /^Drilling files of .*left side/i }).first().click();
    const item = page.getByRole('menuitem', { name: 'Drilling programs, G-code (zip)' });
    await item.waitFor();
    await screenshot(page, 'machine-panel-downloads');
    const download = page.waitForEvent('download');
    await item.click();
    const zip = await JSZip.loadAsync(await readFile((await (await download).path())!));
    const faceA = Object.keys(zip.files).find((name) => name.endsWith('.face-a.nc'))!;
    const program = await zip.file(faceA)!.async('string');
    expect(program).toContain('T11 M6');
    expect(program).toContain('(CAUTION: Prove every new drilling program');
  }, 120_000);
});
