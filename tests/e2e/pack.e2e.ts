import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** A job document whose one panel holds two overlapping bores: a `bores-overlap` error the checks find. */
function jobWithErrors(name: string): string {
  return JSON.stringify({
    format: 'borewright.job/1',
    name,
    materials: [{ id: 'pb18', name: 'Particleboard 18', thickness: 18, density: 650, modulus: 1600 }],
    panels: [
      {
        id: 'clash',
        name: 'Hall unit, left side',
        role: 'side',
        width: 320,
        height: 723,
        thickness: 18,
        material: 'pb18',
        bores: [
          { id: 'a', x: 50, y: 50, face: 'A', diameter: 10, depth: 10 },
          { id: 'b', x: 52, y: 50, face: 'A', diameter: 10, depth: 10 },
        ],
      },
    ],
  });
}

describe('the bench pack in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('warns before downloading the pack of a job with errors, says what the pack will carry, and still makes it', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');

    const jobName = `Harbour Road hall unit ${Date.now()}`;
    await page.getByRole('button', { name: /import/i }).first().click();
    await page.getByLabel('Job document file').setInputFiles({ name: 'hall.json', mimeType: 'application/json', buffer: Buffer.from(jobWithErrors(jobName)) });
    // The imported job is offered to open beside the note that says so.
    await page.getByRole('button', { name: 'Open' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);

    await expect.poll(() => page.locator('.verdict').innerText()).toContain('The checks found 1 error');
    await page.getByRole('button', { name: 'Download pack' }).click();
    const dialog = page.getByRole('alertdialog');
    await dialog.waitFor();
    const words = await dialog.innerText();
    expect(words).toContain('This job has 1 error');
    expect(words).toContain('The pack is still made: its cover sheet and manifest list the findings');
    expect(words).toContain('say “has errors” in the title block');
    await screenshot(page, 'pack-download-warning');

    const download = page.waitForEvent('download');
    await dialog.getByRole('button', { name: 'Download anyway' }).click();
    expect((await download).suggestedFilename()).toBe(`${jobName} bench pack.zip`);
  });
});
