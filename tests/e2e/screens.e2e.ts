import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { seriousAxeProblems, type AxeProblem } from './axe';
import { openBrowser, screenshot, signIn } from './browser';

const baseUrl = inject('baseUrl');

type Role = 'admin' | 'designer' | 'bench' | 'viewer';
const emails: Record<Role, string> = {
  admin: 'owner@greyfield.example',
  designer: 'designer@greyfield.example',
  bench: 'bench@greyfield.example',
  viewer: 'viewer@greyfield.example',
};

interface Ids {
  loft: number;
  flap: number;
  side: number;
}

interface Screen {
  name: string;
  path: (ids: Ids) => string;
  /** Something the screen shows once it has loaded. */
  ready: string;
  roles: readonly Role[];
}

const everyone: readonly Role[] = ['admin', 'designer', 'bench', 'viewer'];
const screens: Screen[] = [
  { name: 'jobs', path: () => '/jobs', ready: 'bw-job-list table', roles: everyone },
  { name: 'job', path: (ids) => `/jobs/${ids.loft}`, ready: 'bw-panel-table table', roles: everyone },
  { name: 'editor-flap', path: (ids) => `/jobs/${ids.loft}/panels/${ids.flap}`, ready: 'bw-panel-stage canvas', roles: everyone },
  { name: 'editor-side', path: (ids) => `/jobs/${ids.loft}/panels/${ids.side}`, ready: 'bw-panel-stage canvas', roles: everyone },
  { name: 'planner', path: (ids) => `/jobs/${ids.loft}/plan`, ready: 'bw-plan-results', roles: ['admin', 'designer'] },
  { name: 'swap', path: (ids) => `/jobs/${ids.loft}/swap`, ready: 'h1', roles: everyone },
  { name: 'catalog', path: () => '/catalog', ready: 'bw-fitting-drawing', roles: everyone },
  { name: 'bench', path: () => '/bench', ready: 'h1', roles: ['admin', 'designer', 'bench'] },
  { name: 'team', path: () => '/team', ready: 'table', roles: ['admin'] },
  { name: 'outbox', path: () => '/outbox', ready: 'h1', roles: ['admin'] },
  { name: 'machine', path: () => '/settings/machine', ready: 'form', roles: ['admin'] },
  { name: 'how-it-works', path: () => '/how-it-works', ready: 'h1', roles: everyone },
];

async function demoIds(page: Page): Promise<Ids> {
  const { jobs } = (await (await page.request.get(`${baseUrl}/api/jobs`)).json()) as { jobs: { id: number; name: string }[] };
  const loft = jobs.find((j) => j.name === 'Loft study bookcase');
  if (!loft) throw new Error('the demo job "Loft study bookcase" is missing');
  const detail = (await (await page.request.get(`${baseUrl}/api/jobs/${loft.id}`)).json()) as { panels: { dbId: number; name: string }[] };
  const panel = (name: string) => {
    const found = detail.panels.find((p) => p.name === name);
    if (!found) throw new Error(`the demo panel "${name}" is missing`);
    return found.dbId;
  };
  return { loft: loft.id, flap: panel('Flap unit, left, flap'), side: panel('Flap unit, left, left side') };
}

/** Where the page is wider than the window, the sideways scroll a phone would show. */
function overflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

describe('every main screen for every role', () => {
  let close: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await close?.();
    close = undefined;
  });

  it('the sign-in page loads without a console error and has no serious accessibility problem on a desktop and a phone', async () => {
    const browser = await openBrowser();
    close = browser.close;
    const { page } = browser;
    const consoleErrors: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') consoleErrors.push(message.text());
    });
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    await page.waitForLoadState('networkidle');
    // Nobody signed in is an answer, not an error: no 401 in the console.
    expect(consoleErrors).toEqual([]);
    await screenshot(page, 'screens-sign-in-1280');
    expect(await seriousAxeProblems(page)).toEqual([]);
    // The check can fail: a button without a name is a critical problem.
    await page.evaluate(() => document.body.appendChild(document.createElement('button')));
    expect((await seriousAxeProblems(page)).map((p) => p.id)).toContain('button-name');
    await page.reload();
    await page.getByLabel('E-mail').waitFor();
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'screens-sign-in-390');
    expect(await overflow(page)).toBeLessThanOrEqual(0);
  });

  for (const role of everyone) {
    it(`shows ${role} every screen at 1280 × 800 and 390 × 844 without serious accessibility problems or sideways scrolling`, async () => {
      const browser = await openBrowser();
      close = browser.close;
      const { page } = browser;
      await signIn(page, baseUrl, emails[role]);
      const ids = await demoIds(page);
      const problems: Record<string, AxeProblem[]> = {};
      const wide: Record<string, number> = {};
      for (const viewport of [{ width: 1280, height: 800 }, { width: 390, height: 844 }]) {
        await page.setViewportSize(viewport);
        for (const screen of screens.filter((s) => s.roles.includes(role))) {
          await page.goto(`${baseUrl}${screen.path(ids)}`);
          await page.locator(screen.ready).first().waitFor();
          await page.waitForTimeout(300);
          const shot = `screens-${role}-${screen.name}-${viewport.width}`;
          await screenshot(page, shot);
          const found = await seriousAxeProblems(page);
          if (found.length > 0) problems[shot] = found;
          const extra = await overflow(page);
          if (extra > 0) wide[shot] = extra;
        }
      }
      expect(problems).toEqual({});
      expect(wide).toEqual({});
    }, 300_000);
  }
});
