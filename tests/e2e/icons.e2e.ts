import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

/**
 * Every icon on the page as drawn: its name and whether it is one glyph. An icon is a ligature of the cut
 * Material Symbols font; a name the font lacks is drawn as its letters, wider than the icon's square.
 */
const ICONS_DRAWN = `(async () => {
  await document.fonts.ready;
  return [...document.querySelectorAll('mat-icon')]
    .filter((icon) => icon.getClientRects().length > 0)
    .map((icon) => {
      const probe = document.createElement('span');
      probe.className = 'material-icons';
      probe.textContent = icon.textContent.trim();
      document.body.append(probe);
      const width = probe.getBoundingClientRect().width;
      probe.remove();
      return { name: icon.textContent.trim(), glyph: width <= 24.5 };
    });
})()`;

describe('icons', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('draw as icons, not as their names, on the sign-in page, the jobs and a job', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await expect.poll(() => page.getByText('Larch Lane kitchen').count()).toBeGreaterThan(0);
    expect(await page.evaluate(`document.fonts.check('24px "Material Symbols Outlined"')`)).toBe(true);
    const onJobs = (await page.evaluate(ICONS_DRAWN)) as { name: string; glyph: boolean }[];
    expect(onJobs.length).toBeGreaterThan(3);
    expect(onJobs.filter((i) => !i.glyph)).toEqual([]);
    await screenshot(page, 'icons-jobs');

    await page.getByRole('link', { name: 'Larch Lane kitchen' }).first().click();
    await page.waitForURL(/\/jobs\/\d+/);
    await expect.poll(async () => ((await page.evaluate(ICONS_DRAWN)) as unknown[]).length).toBeGreaterThan(onJobs.length);
    expect(((await page.evaluate(ICONS_DRAWN)) as { glyph: boolean }[]).filter((i) => !i.glyph)).toEqual([]);
    await screenshot(page, 'icons-job');
  });

  it('would show a name the font lacks as text, wider than an icon', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    const width = (name: string) =>
      page.evaluate(`(async () => {
        await document.fonts.load('24px "Material Symbols Outlined"', 'delete');
        const probe = document.createElement('span');
        probe.className = 'material-icons';
        probe.textContent = ${JSON.stringify(name)};
        document.body.append(probe);
        const width = probe.getBoundingClientRect().width;
        probe.remove();
        return width;
      })()`) as Promise<number>;
    expect(await width('delete')).toBeLessThanOrEqual(24.5);
    // An icon the app names nowhere, so the cut font lacks it.
    expect(await width('settings')).toBeGreaterThan(40);
  });
});
