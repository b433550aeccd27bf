/**
 * Frame times and main-thread work of the panel editor while a fitting is dragged across a panel of 500
 * bores and a perforated panel of 5,000, with live checks and, as the baseline in the same run, without
 * them (`?checks=off`). Starts the server as the browser tests do (E2E_SKIP_BUILD=1 reuses the last
 * build), or uses BENCH_URL with the demo accounts. BENCH_PROFILE=1 adds a CPU profile of one drag with
 * checks on per panel and prints where its time went, by function; with BENCH_SCREENSHOT=1 too, a
 * screenshot of each panel after that drag (tests/e2e/screenshots/editor-bench-*.png).
 *
 *   npm run bench:editor
 */
import type { CDPSession, Page } from 'playwright-core';
import type { TestProject } from 'vitest/node';
import { writeFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { makeJob, makePanel } from '../../shared/testing/make-job';
import { fitView, toScreen } from '../../src/app/editor/stage/view';
import { openBrowser, screenshot, signIn } from '../e2e/browser';
import startServer from '../e2e/global-setup';
import { profileSummary, traceSummary, type CpuProfile, type TraceEvent } from './cpu-profile';

const PLATE = { x: 837, y: 521 };
/** Three and a quarter strokes of the triangle wave below, so that the drag ends away from where it began. */
const MOVES = 260;
/** The goals: main-thread work a pointer move on the 500-bore panel, and the p95 frame while dragging (one 60 Hz refresh). */
const WORK_GOAL_MS = 4;
const FRAME_GOAL_MS = 16.7;
/** How finely the page's clock reads: a page that is not cross-origin isolated gets performance.now in steps of 0.1 ms. */
const CLOCK_TICK_MS = 0.1;

/** A panel to drag on: its size and its holes in columns and rows, all clear of the mounting plate. */
interface BenchPanel {
  label: string;
  size: { width: number; height: number };
  columns: number;
  rows: number;
  /** Centre distances of the columns and of the rows, mm. */
  pitch: { x: number; y: number };
}

const PANELS: BenchPanel[] = [
  // A tall side: ten line-bored columns of 50 holes.
  { label: '500 bores', size: { width: 900, height: 1600 }, columns: 10, rows: 50, pitch: { x: 64, y: 32 } },
  // A perforated back or door: 25 columns of 200 holes, 24 mm apart across and 12 mm up.
  { label: '5,000 bores (perforated)', size: { width: 900, height: 2400 }, columns: 25, rows: 200, pitch: { x: 24, y: 12 } },
];

function benchJob(bench: BenchPanel) {
  const { columns, rows, pitch } = bench;
  const bores = Array.from({ length: columns * rows }, (_, n) => ({ id: `h${n}`, x: 37 + pitch.x * (n % columns), y: 9 + pitch.y * Math.floor(n / columns), face: 'A' as const, diameter: 5, depth: 13 }));
  const placements = [{ id: 'plate', fitting: 'plate-0', x: PLATE.x, y: PLATE.y, face: 'A' as const }];
  return makeJob([makePanel('tall-side', { name: 'Bench side', ...bench.size, bores, placements })], { name: `Editor bench ${Date.now()}` });
}

async function importJob(page: Page, baseUrl: string, bench: BenchPanel): Promise<{ jobId: number; panelId: number }> {
  const xsrf = (await page.context().cookies()).find((c) => c.name === 'XSRF-TOKEN')?.value ?? '';
  const upload = await page.request.post(`${baseUrl}/api/jobs/import`, {
    headers: { 'X-XSRF-TOKEN': xsrf },
    multipart: { file: { name: 'bench.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(benchJob(bench))) } },
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
  /** Main-thread task time per pointer move (Chromium's TaskDuration, wall-clock), ms. */
  taskPerMove: number;
  /** The main thread's CPU time per pointer move (Chromium's ThreadTime), ms: what a busy machine inflates least. */
  cpuPerMove: number;
  /** Of the task time, script (ScriptDuration) and style and layout (RecalcStyleDuration + LayoutDuration) per move, ms. */
  scriptPerMove: number;
  stylePerMove: number;
}

/** Chromium's main-thread task time, CPU time, script time and style-and-layout time so far, s. */
async function threadSeconds(cdp: CDPSession): Promise<{ task: number; cpu: number; script: number; style: number }> {
  const { metrics } = (await cdp.send('Performance.getMetrics')) as { metrics: { name: string; value: number }[] };
  const metric = (name: string) => metrics.find((m) => m.name === name)?.value ?? 0;
  return { task: metric('TaskDuration'), cpu: metric('ThreadTime'), script: metric('ScriptDuration'), style: metric('RecalcStyleDuration') + metric('LayoutDuration') };
}

/** Chromium's trace of the main thread from now until `stop`. */
function startTrace(cdp: CDPSession): { stop(): Promise<TraceEvent[]> } {
  const events: TraceEvent[] = [];
  cdp.on('Tracing.dataCollected', ({ value }) => events.push(...(value as unknown as TraceEvent[])));
  const started = cdp.send('Tracing.start', { categories: 'devtools.timeline,disabled-by-default-devtools.timeline,v8.execute,blink,cc', transferMode: 'ReportEvents' });
  return {
    stop: async () => {
      await started;
      const done = new Promise((resolve) => cdp.once('Tracing.tracingComplete', resolve));
      await cdp.send('Tracing.end');
      await done;
      return events;
    },
  };
}

/**
 * Where the plate is on screen, found by clicking it until the properties name it: the stage may still
 * settle its size after it first shows its zoom, and on the perforated panel (18 %) the plate is a few
 * pixels across.
 */
async function pickPlate(page: Page, bench: BenchPanel): Promise<{ start: { x: number; y: number }; view: ReturnType<typeof fitView> }> {
  for (let attempt = 0; attempt < 20; attempt++) {
    const box = await page.locator('bw-panel-stage').boundingBox();
    if (!box) throw new Error('no stage');
    const view = fitView(bench.size, box, false);
    const at = toScreen(view, PLATE);
    const start = { x: box.x + at.x, y: box.y + at.y };
    await page.mouse.click(start.x, start.y);
    if ((await page.locator('bw-properties-form .what strong', { hasText: 'plate' }).count()) > 0) return { start, view };
    await page.waitForTimeout(500);
  }
  throw new Error('the plate could not be picked on the stage');
}

/** Drags the plate up and down the row, MOVES pointer moves, and returns the frame intervals seen meanwhile. */
async function dragFrames(page: Page, url: string, bench: BenchPanel, profile = false, press = true): Promise<DragRun> {
  await page.goto(url);
  await page.locator('bw-panel-stage canvas').first().waitFor();
  await page.locator('bw-placement-list').waitFor({ state: 'attached' });
  // The stage has its view (it shows the zoom) only once it has measured itself: a press before that picks nothing.
  await page.locator('.zoom', { hasText: '%' }).waitFor();
  const { start, view } = await pickPlate(page, bench);
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
  if (profile) {
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
    await cdp.send('Profiler.start');
  }
  const trace = profile && process.env['BENCH_TRACE'] ? startTrace(cdp) : undefined;
  const before = await threadSeconds(cdp);
  await page.mouse.move(start.x, start.y);
  if (press) await page.mouse.down();
  for (let i = 1; i <= MOVES; i++) {
    // A triangle wave over about 300 mm, so the plate keeps snapping from hole to hole.
    const phase = (i % 80) / 40;
    const dy = (phase <= 1 ? phase : 2 - phase) * 300 * view.scale;
    await page.mouse.move(start.x, start.y - dy);
  }
  if (press) await page.mouse.up();
  const frames = (await page.evaluate('(window.benchRun = false, window.benchFrames.slice(2))')) as number[];
  const after = await threadSeconds(cdp);
  const perMove = (key: keyof typeof after) => ((after[key] - before[key]) * 1000) / MOVES;
  if (trace) for (const line of traceSummary(await trace.stop(), MOVES)) console.log(`    ${line}`);
  if (profile) {
    const { profile: cpu } = (await cdp.send('Profiler.stop')) as { profile: CpuProfile };
    if (process.env['BENCH_PROFILE_OUT']) writeFileSync(`${process.env['BENCH_PROFILE_OUT']}-${bench.columns * bench.rows}.cpuprofile`, JSON.stringify(cpu));
    console.log(`  where a drag's main-thread time went (self time, ${bench.label}, checks on):`);
    for (const line of profileSummary(cpu, MOVES)) console.log(`    ${line}`);
  }
  await cdp.detach();
  const run = { frames, taskPerMove: perMove('task'), cpuPerMove: perMove('cpu'), scriptPerMove: perMove('script'), stylePerMove: perMove('style') };
  if (!press) return run;
  // The list shows the drop once the page has caught up with the moves (later on a busy machine than the release).
  const plate = page.locator('bw-placement-list .placement').first();
  await plate.filter({ hasNotText: `y ${PLATE.y},` }).waitFor({ state: 'attached', timeout: 60_000 }).catch(async () => {
    await screenshot(page, `editor-bench-${bench.columns * bench.rows}-not-moved`);
    throw new Error(`the drag did not move the plate (see the screenshot editor-bench-${bench.columns * bench.rows}-not-moved): ${await plate.textContent()}`);
  });
  if (profile && process.env['BENCH_SCREENSHOT']) await screenshot(page, `editor-bench-${bench.columns * bench.rows}`);
  await page.keyboard.press('Control+z');
  // On a busy machine autosave may have stored the moved plate before the undo: wait until the undo is
  // stored too, so that the next run finds the plate where it began.
  await page.getByText('All changes saved').waitFor({ timeout: 60_000 });
  return run;
}

function summary(label: string, runs: DragRun[]): string {
  const sorted = runs.flatMap((r) => r.frames).sort((a, b) => a - b);
  const mean = (key: 'taskPerMove' | 'cpuPerMove' | 'scriptPerMove' | 'stylePerMove') => runs.reduce((sum, r) => sum + r[key], 0) / runs.length;
  const [task, cpu, script, style] = [mean('taskPerMove'), mean('cpuPerMove'), mean('scriptPerMove'), mean('stylePerMove')];
  // A frame that took longer than 20 ms missed a 60 Hz refresh; 16.8 ms is the same frame with timer jitter.
  const late = sorted.filter((f) => f > 20).length;
  const lateShare = ((100 * late) / sorted.length).toFixed(1);
  return `${label.padEnd(26)} frames ${String(sorted.length).padStart(4)}  median ${percentile(sorted, 50).toFixed(1).padStart(5)} ms  p95 ${percentile(sorted, 95).toFixed(1).padStart(5)} ms  max ${sorted.at(-1)!.toFixed(1).padStart(6)} ms  over 20 ms ${late} (${lateShare} %)  main-thread work ${task.toFixed(1).padStart(5)} ms a move (CPU ${cpu.toFixed(1).padStart(5)} ms; script ${script.toFixed(1)}, style and layout ${style.toFixed(1)})`;
}

async function benchPanel(page: Page, baseUrl: string, bench: BenchPanel): Promise<void> {
  const { jobId, panelId } = await importJob(page, baseUrl, bench);
  const url = `${baseUrl}/jobs/${jobId}/panels/${panelId}`;
  // A warm-up run first, so that neither measured run pays for loading and compiling.
  await dragFrames(page, `${url}?checks=off`, bench);
  if (process.env['BENCH_PROFILE']) await dragFrames(page, url, bench, true);
  const rounds = Number(process.env['BENCH_ROUNDS'] ?? 2);
  if (rounds === 0) return;
  // Taken in turns, so that a busy moment of the machine falls on each.
  const withChecks: DragRun[] = [];
  const baseline: DragRun[] = [];
  const hover: DragRun[] = [];
  for (let round = 0; round < rounds; round++) {
    withChecks.push(await dragFrames(page, url, bench));
    baseline.push(await dragFrames(page, `${url}?checks=off`, bench));
    hover.push(await dragFrames(page, url, bench, false, false));
  }
  const [load] = loadavg();
  console.log(`Panel editor, ${bench.label}, ${rounds} × ${MOVES} pointer moves while dragging a mounting plate (headless Chromium; load average ${load.toFixed(2)} on ${availableParallelism()} cores)`);
  console.log(summary('live checks on', withChecks));
  console.log(summary('baseline: checks off', baseline));
  // What a pointer move costs the page without a drag (the cursor readout only): the browser's own share of a move.
  console.log(summary('floor: moves, no press', hover));
  const work = (runs: DragRun[]) => runs.reduce((sum, r) => sum + r.taskPerMove, 0) / runs.length;
  const [on, off, floor] = [work(withChecks), work(baseline), work(hover)];
  console.log(
    `main-thread work a move: ${on.toFixed(1)} ms with checks, ${off.toFixed(1)} ms without (${(on / off).toFixed(2)}×), ${floor.toFixed(1)} ms for a move with no drag; ` +
      `${on <= WORK_GOAL_MS ? 'at' : 'over'} the ${WORK_GOAL_MS} ms goal; the drag itself ${(on - floor).toFixed(1)} ms above the floor.`,
  );
  // The page's clock ticks in 0.1 ms (performance.now in a page that is not cross-origin isolated), so a
  // frame of one 60 Hz refresh (16.67 ms) reads 16.6 to 16.8 ms: the goal is met within that tick.
  const frames = withChecks.flatMap((r) => r.frames).sort((a, b) => a - b);
  const p95 = percentile(frames, 95);
  // (and a thousandth for the difference of two clock readings in floating point, 16.8000000001)
  const limit = FRAME_GOAL_MS + CLOCK_TICK_MS + 0.001;
  const late = frames.filter((f) => f > limit).length;
  console.log(
    `p95 frame with checks ${p95.toFixed(1)} ms: ${p95 <= limit ? 'at' : 'over'} the ${FRAME_GOAL_MS} ms goal (to the clock's ${CLOCK_TICK_MS} ms); ${late} of ${frames.length} frames longer than a refresh.`,
  );
}

async function main(): Promise<void> {
  let baseUrl = process.env['BENCH_URL'] ?? '';
  const stop = baseUrl ? undefined : await startServer({ provide: (_key: string, url: string) => (baseUrl = url) } as unknown as TestProject);
  const browser = await openBrowser({ width: 1280, height: 800 });
  try {
    const { page } = browser;
    await signIn(page, baseUrl, 'designer@greyfield.example');
    const only = process.env['BENCH_ONLY'];
    for (const bench of PANELS.filter((p) => !only || String(p.columns * p.rows) === only)) await benchPanel(page, baseUrl, bench);
  } finally {
    await browser.close();
    stop?.();
  }
}

await main();
