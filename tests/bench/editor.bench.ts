/**
 * Frame times of the panel editor while a fitting is dragged across a panel of 500 bores, with live
 * checks and, as the baseline in the same run, without them (`?checks=off`). Starts the server as the
 * browser tests do (E2E_SKIP_BUILD=1 reuses the last build), or uses BENCH_URL with the demo accounts.
 *
 *   npm run bench:editor
 */
import type { CDPSession, Page } from 'playwright-core';
import type { TestProject } from 'vitest/node';
import { makeJob, makePanel } from '../../shared/testing/make-job';
import { fitView, toScreen } from '../../src/app/editor/stage/view';
import { openBrowser, signIn } from '../e2e/browser';
import startServer from '../e2e/global-setup';

const PANEL = { width: 900, height: 1600 };
const PLATE = { x: 837, y: 521 };
const MOVES = 240;

/** A tall side: ten line-bored columns of 50 holes (500 bores) and one mounting plate clear of them. */
function benchJob() {
  const bores = Array.from({ length: 500 }, (_, n) => ({ id: `h${n}`, x: 37 + 64 * (n % 10), y: 9 + 32 * Math.floor(n / 10), face: 'A' as const, diameter: 5, depth: 13 }));
  const placements = [{ id: 'plate', fitting: 'plate-0', x: PLATE.x, y: PLATE.y, face: 'A' as const }];
  return makeJob([makePanel('tall-side', { name: 'Bench side', ...PANEL, bores, placements })], { name: `Editor bench ${Date.now()}` });
}

async function importJob(page: Page, baseUrl: string): Promise<{ jobId: number; panelId: number }> {
  const xsrf = (await page.context().cookies()).find((c) => c.name === 'XSRF-TOKEN')?.value ?? '';
  const upload = await page.request.post(`${baseUrl}/api/jobs/import`, {
    headers: { 'X-XSRF-TOKEN': xsrf },
    multipart: { file: { name: 'bench.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(benchJob())) } },
  });
  if (!upload.ok()) throw new Error(`import failed: ${upload.status()} ${await upload.text()}`);
  const { id } = (await upload.json()) as { id: number };
  const detail = (await (await page.request.get(`${baseUrl}/api/jobs/${id}`)).json()) as { panels: { dbId: number }[] };
  return { jobId: id, panelId: detail.panels[0].dbId };
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

interface DragRun {
  /** Intervals between animation frames during the drag, ms. */
  frames: number[];
  /** Main-thread task time per pointer move (Chromium's TaskDuration), ms. */
  taskPerMove: number;
}

async function taskSeconds(cdp: CDPSession): Promise<number> {
  const { metrics } = (await cdp.send('Performance.getMetrics')) as { metrics: { name: string; value: number }[] };
  return metrics.find((m) => m.name === 'TaskDuration')?.value ?? 0;
}

/** Drags the plate up and down the row, MOVES pointer moves, and returns the frame intervals seen meanwhile. */
async function dragFrames(page: Page, url: string): Promise<DragRun> {
  await page.goto(url);
  await page.locator('bw-panel-stage canvas').first().waitFor();
  await page.locator('bw-placement-list').waitFor({ state: 'attached' });
  const box = await page.locator('bw-panel-stage').boundingBox();
  if (!box) throw new Error('no stage');
  const at = toScreen(fitView(PANEL, box, false), PLATE);
  const start = { x: box.x + at.x, y: box.y + at.y };
  // As source text: tsx would wrap a function's inner functions in a helper the page does not have.
  await page.evaluate(`(() => {
    window.benchFrames = [];
    window.benchRun = true;
    let last = performance.now();
    const tick = (now) => {
      window.benchFrames.push(now - last);
      last = now;
      if (window.benchRun) requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
  })()`);
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Performance.enable');
  const taskBefore = await taskSeconds(cdp);
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  for (let i = 1; i <= MOVES; i++) {
    // A triangle wave over about 300 mm, so the plate keeps snapping from hole to hole.
    const phase = (i % 80) / 40;
    const dy = (phase <= 1 ? phase : 2 - phase) * 300 * (box.height / PANEL.height);
    await page.mouse.move(start.x, start.y - dy);
  }
  await page.mouse.up();
  const frames = (await page.evaluate('(window.benchRun = false, window.benchFrames.slice(2))')) as number[];
  const taskPerMove = ((await taskSeconds(cdp)) - taskBefore) * 1000 / MOVES;
  await cdp.detach();
  const moved = await page.locator('bw-placement-list .placement').first().textContent();
  if (moved?.includes(`y ${PLATE.y},`)) throw new Error(`the drag did not move the plate: ${moved}`);
  await page.keyboard.press('Control+z');
  return { frames, taskPerMove };
}

function summary(label: string, runs: DragRun[]): string {
  const sorted = runs.flatMap((r) => r.frames).sort((a, b) => a - b);
  const task = runs.reduce((sum, r) => sum + r.taskPerMove, 0) / runs.length;
  // A frame that took longer than 20 ms missed a 60 Hz refresh; 16.8 ms is the same frame with timer jitter.
  const late = sorted.filter((f) => f > 20).length;
  const lateShare = ((100 * late) / sorted.length).toFixed(1);
  return `${label.padEnd(22)} frames ${String(sorted.length).padStart(4)}  median ${percentile(sorted, 50).toFixed(1).padStart(5)} ms  p95 ${percentile(sorted, 95).toFixed(1).padStart(5)} ms  max ${sorted.at(-1)!.toFixed(1).padStart(6)} ms  over 20 ms ${late} (${lateShare} %)  main-thread work ${task.toFixed(1).padStart(5)} ms a move`;
}

async function main(): Promise<void> {
  let baseUrl = process.env['BENCH_URL'] ?? '';
  const stop = baseUrl ? undefined : await startServer({ provide: (_key: string, url: string) => (baseUrl = url) } as unknown as TestProject);
  const browser = await openBrowser({ width: 1280, height: 800 });
  try {
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    const { jobId, panelId } = await importJob(page, baseUrl);
    const url = `${baseUrl}/jobs/${jobId}/panels/${panelId}`;
    // A warm-up run first, so that neither measured run pays for loading and compiling.
    await dragFrames(page, `${url}?checks=off`);
    // Taken in turns, so that a busy moment of the machine falls on both.
    const withChecks: DragRun[] = [];
    const baseline: DragRun[] = [];
    for (let round = 0; round < 2; round++) {
      withChecks.push(await dragFrames(page, url));
      baseline.push(await dragFrames(page, `${url}?checks=off`));
    }
    console.log(`Panel editor, 500 bores, 2 × ${MOVES} pointer moves while dragging a mounting plate (headless Chromium)`);
    console.log(summary('live checks on', withChecks));
    console.log(summary('baseline: checks off', baseline));
    const p95 = percentile(withChecks.flatMap((r) => r.frames).sort((a, b) => a - b), 95);
    console.log(`p95 with checks ${p95 <= 16.7 ? 'meets' : 'misses'} the 16.7 ms aim.`);
  } finally {
    await browser.close();
    stop?.();
  }
}

await main();
