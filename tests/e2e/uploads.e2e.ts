import { afterEach, describe, expect, inject, it } from 'vitest';
import { minimalPng, smallPdf } from '../../server/testing/sample-files';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** A semicolon file as a spreadsheet with decimal commas saves it, with one row whose board the job does not have. */
const BAD_LIST = ['Panel name;Width;Height;Thickness;Material;Qty', 'Left side;560;720;19;mdf-19;1', 'Shelf;540;300,5;18;plywood-18;3', 'Worktop;600;3200;38;oak-38;1'].join('\r\n');
const GOOD_LIST = ['panel name,width,height,thickness,material,quantity', 'Left side,560,720,19,mdf-19,1', 'Shelf,540,300.5,18,plywood-18,3'].join('\r\n');
const csv = (name: string, text: string) => ({ name, mimeType: 'text/csv', buffer: Buffer.from(text) });

describe('cut list and attachments in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('previews a cut list with a bad row and creates nothing, then imports a good one; attaches a photo and a PDF and refuses a fake PNG', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');

    const jobName = `Utility room ${Date.now()}`;
    await page.getByRole('button', { name: /new job/i }).click();
    await page.getByLabel('Name', { exact: true }).fill(jobName);
    await page.getByRole('button', { name: /^create$/i }).click();
    await page.getByRole('link', { name: jobName }).click();
    await page.waitForURL(/\/jobs\/\d+$/);

    await page.getByRole('button', { name: 'Import cut list' }).click();
    await page.getByLabel('Cut list file').setInputFiles(csv('utility.csv', BAD_LIST));
    await expect.poll(() => page.locator('.summary').innerText()).toContain('3 rows, 1 with errors, 4 panels would be created.');
    await expect.poll(() => page.locator('tr.row-error').innerText()).toMatch(/this job has no material "oak-38"/);
    expect(await page.getByRole('button', { name: 'Create 4 panels' }).isDisabled()).toBe(true);
    await screenshot(page, 'cut-list-preview-with-errors');

    await page.getByLabel('Cut list file').setInputFiles(csv('utility.csv', GOOD_LIST));
    await page.getByRole('button', { name: 'Create 4 panels' }).click();
    await page.getByText('Created 4 panels from utility.csv.').waitFor();
    for (const name of ['Left side', 'Shelf 1', 'Shelf 2', 'Shelf 3']) {
      await expect.poll(() => page.getByRole('link', { name, exact: true }).count(), { message: name }).toBe(1);
    }

    const picker = page.getByLabel('Photo or PDF to attach');
    await picker.setInputFiles({ name: 'site wall.png', mimeType: 'image/png', buffer: minimalPng() });
    await page.getByText('site wall.png', { exact: true }).waitFor();
    await picker.setInputFiles({ name: 'drawing.pdf', mimeType: 'application/pdf', buffer: await smallPdf() });
    await page.getByText('drawing.pdf', { exact: true }).waitFor();
    await picker.setInputFiles({ name: 'fake.png', mimeType: 'image/png', buffer: Buffer.from('not a picture') });
    await expect.poll(() => page.getByRole('alert').innerText()).toMatch(/fake\.png was not attached\. This file is named or sent as a PNG image, but it is not one/);
    await expect.poll(() => page.getByRole('link', { name: 'Download drawing.pdf' }).count()).toBe(1);
    // The import's message would cover the list in the picture.
    await page.getByText('Created 4 panels from utility.csv.').waitFor({ state: 'hidden' });
    await screenshot(page, 'job-attachments');
  });
});
