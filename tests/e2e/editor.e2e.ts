import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { fitView, toScreen, type Point } from '../../src/app/editor/stage/view';
import { join } from 'node:path';
import { openBrowser, screenshot, screenshotDir, signIn } from './browser';

const baseUrl = inject('baseUrl');

/** The screen point of a panel point, from the stage's box and the editor's fit-to-panel view. */
async function screenPoint(page: Page, panel: { width: number; height: number }, at: Point): Promise<Point> {
  const box = await page.locator('bw-panel-stage').boundingBox();
  if (!box) throw new Error('the stage is not on the page');
  const p = toScreen(fitView(panel, box, false), at);
  return { x: box.x + p.x, y: box.y + p.y };
}

/** Rings the stage draws for findings of this code, read from Konva's own node tree. */
function ringsOnStage(page: Page, code: string): Promise<number> {
  return page.evaluate((name) => {
    const konva = (window as unknown as { Konva: { stages: { find(selector: string): unknown[] }[] } }).Konva;
    return konva.stages.reduce((n, stage) => n + stage.find(`.${name}`).length, 0);
  }, `finding-${code}`);
}

function placementRows(page: Page) {
  return page.locator('bw-placement-list .placement').allTextContents();
}

describe('the panel editor in the browser', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('places two mounting plates, shows their clash on the stage and in the list, undoes it, saves and reloads', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.getByRole('link', { name: 'Sink base, left side' }).click();
    await page.waitForURL(/\/panels\/\d+$/);
    await page.locator('bw-panel-stage canvas').first().waitFor();
    await expect.poll(() => page.locator('bw-findings-list').innerText()).toContain('No findings');
    const size = { width: 560, height: 722 };
    expect(await page.locator('.title .size').innerText()).toContain('560 × 722');

    // The planned side already carries its connectors and the door's plates; new placements come after them.
    const before = (await placementRows(page)).length;
    expect(before).toBeGreaterThan(0);

    // The first plate by a click in the catalog; it snaps onto the front row.
    const plate = page.getByRole('button', { name: /Mounting plate, 0 mm/ });
    await plate.click();
    await expect.poll(() => placementRows(page)).toHaveLength(before + 1);
    const first = (await placementRows(page))[before];
    const [, x, y] = /x ([\d.]+), y ([\d.]+)/.exec(first) ?? [];
    expect(Number(x)).toBe(37);

    // A second one, moved three pitches up the row with the keyboard, then dragged down onto the first.
    await plate.click();
    await page.locator('bw-panel-stage').focus();
    for (let i = 0; i < 3; i++) await page.keyboard.press('Shift+ArrowUp');
    await expect.poll(async () => (await placementRows(page))[before + 1]).toContain(`y ${Number(y) + 96}`);
    const clashes = page.locator('bw-findings-list .finding[data-code="keepouts-overlap"]');
    await expect.poll(() => clashes.count()).toBe(0);
    const from = await screenPoint(page, size, { x: Number(x), y: Number(y) + 96 });
    const to = await screenPoint(page, size, { x: Number(x), y: Number(y) });
    // The stage keeps its box and its zoom under the pointer for the whole drag, while the clash (an
    // error) appears and autosave says it waits: nothing that comes up may push or rescale the canvas.
    const stageState = async () => ({ box: await page.locator('bw-panel-stage').boundingBox(), zoom: await page.locator('.zoom').innerText() });
    const stageBefore = await stageState();
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let k = 1; k <= 10; k++) {
      await page.mouse.move(from.x, from.y + ((to.y - from.y) * k) / 10);
      expect(await stageState(), `step ${k} of the drag`).toEqual(stageBefore);
    }
    await expect.poll(() => clashes.count()).toBeGreaterThan(0);
    await expect.poll(() => page.locator('.held').count()).toBe(1);
    expect(await stageState()).toEqual(stageBefore);
    await page.mouse.up();
    expect(await stageState()).toEqual(stageBefore);
    // The plate landed where the pointer let go: on the first plate's hole, not a stage's shift away.
    await expect.poll(async () => (await placementRows(page))[before + 1]).toContain(`y ${Number(y)},`);
    expect(await ringsOnStage(page, 'bores-overlap') + (await ringsOnStage(page, 'keepouts-overlap'))).toBeGreaterThan(0);
    await screenshot(page, 'editor-finding');

    // One undo takes the whole drag back.
    await page.keyboard.press('Control+z');
    await expect.poll(() => clashes.count()).toBe(0);
    expect(await ringsOnStage(page, 'keepouts-overlap')).toBe(0);
    const placed = await placementRows(page);
    expect(placed[before + 1]).toContain(`y ${Number(y) + 96}`);

    // The plates meet no hinge of the door yet (an error), so saving asks first, naming it.
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => page.getByRole('alertdialog').innerText()).toContain('hinge-unpaired');
    await page.getByRole('button', { name: 'Save anyway' }).click();
    await expect.poll(() => page.locator('.save-state').innerText()).toContain('All changes saved');
    await page.reload();
    await page.locator('bw-panel-stage canvas').first().waitFor();
    await expect.poll(() => placementRows(page)).toEqual(placed);
  });

  it('zooms with a two-finger pinch on a touch screen', async () => {
    const browser = await openBrowser({ width: 1024, height: 768 }, { touch: true });
    close = browser.close;
    const { page, context } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.getByRole('link', { name: 'Sink base, left side' }).click();
    await page.locator('bw-panel-stage canvas').first().waitFor();
    const zoom = async () => parseInt(await page.locator('.zoom').innerText(), 10);
    await expect.poll(zoom).toBeGreaterThan(0);
    const before = await zoom();
    const box = await page.locator('bw-panel-stage').boundingBox();
    if (!box) throw new Error('the stage is not on the page');
    const centre = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    // Two fingers spread from 80 px apart to 240 px apart: three times the scale.
    const cdp = await context.newCDPSession(page);
    const fingers = (apart: number) => [
      { x: centre.x - apart / 2, y: centre.y, id: 1 },
      { x: centre.x + apart / 2, y: centre.y, id: 2 },
    ];
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: fingers(80) });
    for (let apart = 90; apart <= 240; apart += 10) await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: fingers(apart) });
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
    await expect.poll(zoom).toBeGreaterThanOrEqual(before * 3 - 2);
    expect(await zoom()).toBeLessThanOrEqual(before * 3 + 2);
    // The window as the fingers left it (a full-page shot would resize the stage and fit the panel again).
    await page.screenshot({ path: join(screenshotDir, 'editor-pinched.png') });
  });
});

describe('the panel editor from the keyboard alone', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('places a hinge cup with its cup-boring distance and the reason, moves, turns, undoes and lets go of it without a mouse', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    await page.getByRole('link', { name: 'Loft study bookcase' }).click();
    await page.getByRole('link', { name: 'Desk hutch, section 1 left door' }).click();
    await page.locator('bw-panel-stage canvas').first().waitFor();
    // A door reads from its hinge edge (design.md §3), on the size line and on the stage.
    expect(await page.locator('.title .size').innerText()).toContain('x from the hinge edge to the opening edge');
    const before = (await placementRows(page)).length;

    // Find the fitting by typing, Tab to it, Enter places it.
    await page.getByLabel('Find a fitting').focus();
    await page.keyboard.type('full overlay, 45');
    await page.keyboard.press('Tab');
    await expect.poll(() => page.evaluate(() => document.activeElement?.textContent ?? '')).toContain('Cup hinge, full overlay, 45/9.5');
    await page.keyboard.press('Enter');
    await expect.poll(() => placementRows(page)).toHaveLength(before + 1);
    // Its cup-boring distance is filled from where it landed, and the form says why it stands there.
    const distance = page.getByLabel('Cup-boring distance (mm)');
    await expect.poll(() => distance.inputValue()).toMatch(/^\d+(\.\d+)?$/);
    expect(await page.locator('bw-properties-form .why').innerText()).toMatch(/cup-boring distance [\d.]+ mm plus half the Ø35 cup; this hinge takes 3 to 7 mm/);

    // Into the drawing by Tab from the catalog list's last control is long; the stage is one focusable element.
    await page.locator('bw-panel-stage').focus();
    await page.keyboard.press('Shift+ArrowUp');
    await page.keyboard.press('r');
    await expect.poll(async () => (await placementRows(page)).at(-1)).toContain('90°');
    await page.keyboard.press('Control+z');
    await expect.poll(async () => (await placementRows(page)).at(-1)).toContain('0°');
    await page.keyboard.press('Control+z');
    await page.keyboard.press('Control+z');
    await expect.poll(() => placementRows(page)).toHaveLength(before);
    // Nothing stays selected that the undo took away.
    expect(await page.locator('bw-properties-form').innerText()).toContain('Select a placement on the panel or in the list');
    await screenshot(page, 'editor-keyboard');
  });

  it('shows a fitting imported while it is open once its tab is back in view, and another when it opens again', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page, context } = browser;
    await signIn(page, baseUrl, 'owner@greyfield.example');
    await page.getByRole('link', { name: 'Larch Lane kitchen' }).click();
    await page.getByRole('link', { name: 'Sink base, left side' }).click();
    await page.waitForURL(/\/panels\/\d+$/);
    const catalogList = page.locator('bw-catalog-list');
    await expect.poll(() => catalogList.innerText()).toMatch(/shelf pin/i);

    // Imported elsewhere (another tab, another member) while the editor stays open: a shelf pin of the shop's own.
    const importPin = async (name: string) => {
      const token = (await context.cookies()).find((c) => c.name === 'XSRF-TOKEN')?.value ?? '';
      const pin = { ...builtinCatalog().get('shelf-pin-5')!, id: name.toLowerCase().replace(/\W+/g, '-'), name };
      const res = await context.request.post(`${baseUrl}/api/catalog/fittings`, { data: pin, headers: { 'X-XSRF-TOKEN': decodeURIComponent(token) } });
      expect(res.status(), await res.text()).toBe(201);
    };
    const stamp = Date.now();
    const back = `Shop pin, back in view ${stamp}`;
    await importPin(back);
    expect(await catalogList.innerText()).not.toContain(back);
    await page.evaluate(() => document.dispatchEvent(new Event('visibilitychange')));
    await expect.poll(() => catalogList.innerText()).toContain(back);

    const reopened = `Shop pin, editor reopened ${stamp}`;
    await importPin(reopened);
    await page.getByRole('link', { name: 'Back to the job' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    await page.locator('bw-panel-table').getByRole('link', { name: 'Sink base, left side' }).click();
    await page.waitForURL(/\/panels\/\d+$/);
    await expect.poll(() => catalogList.innerText()).toContain(reopened);
  });
});

