// Times the checks from one process: a generated job of 300 panels against a plain pass over the same
// bores, and one 5,000-bore panel against a naive all-pairs check. Run with `npm run bench`.
import { builtinCatalog } from '../catalog/builtin-catalog';
import { checkJob, checkPanel } from '../checks/index';
import { TRIALS_PER_PANEL } from '../checks/settle-fixes';
import { panelBores } from '../layout/panel-layout';
import type { JobDocument } from '../model/job-document';
import { generateJob, perforatedJob } from './generate-job';

const WARM_UP = 5;
const RUNS = 21;

/**
 * Median times in ms of each run, over `RUNS` rounds after `WARM_UP` unmeasured ones. The runs take turns
 * within each round, so a machine busy with other work slows them alike and their ratio holds.
 */
function race(runs: Record<string, () => unknown>): Record<string, number> {
  const entries = Object.entries(runs);
  for (let i = 0; i < WARM_UP; i++) for (const [, run] of entries) run();
  const times = new Map(entries.map(([name]) => [name, [] as number[]]));
  for (let i = 0; i < RUNS; i++) {
    for (const [name, run] of entries) {
      const start = performance.now();
      run();
      times.get(name)!.push(performance.now() - start);
    }
  }
  const median = (list: number[]) => list.sort((a, b) => a - b)[Math.floor(list.length / 2)];
  return Object.fromEntries(entries.map(([name]) => [name, median(times.get(name)!)]));
}

/** Reads every bore of the document once, as it stands: the least any pass over the job can do. */
function readDocument(job: JobDocument): number {
  let sum = 0;
  for (const panel of job.panels) {
    for (const b of panel.bores) sum += b.diameter + b.depth;
    for (const p of panel.placements) sum += p.x + p.y;
  }
  return sum;
}

/** Lays out every panel (loose bores and expanded placements) and reads each bore once: what any export does. */
function readBores(job: JobDocument): number {
  const catalog = builtinCatalog();
  let sum = 0;
  for (const panel of job.panels) for (const b of panelBores(panel, catalog, job.system)) sum += b.diameter + b.depth;
  return sum;
}

/** The bores-overlap rule alone, comparing every pair: the baseline a spatial index must beat. */
function allPairs(job: JobDocument): number {
  const bores = panelBores(job.panels[0], builtinCatalog(), job.system).filter((b) => b.kind === 'face');
  const { minWeb } = job.limits;
  let found = 0;
  for (let i = 0; i < bores.length; i++) {
    const a = bores[i];
    for (let j = i + 1; j < bores.length; j++) {
      const b = bores[j];
      const dx = a.x - b.x;
      const dy = a.y - b.y;
      if (a.face === b.face && Math.sqrt(dx * dx + dy * dy) - a.diameter / 2 - b.diameter / 2 < minWeb) found++;
    }
  }
  return found;
}

const f = (ms: number) => `${ms.toFixed(2)} ms`;
const catalog = builtinCatalog();

const job = generateJob(100);
const boreCount = job.panels.reduce((n, p) => n + panelBores(p, catalog, job.system).length, 0);
const findings = checkJob(job, catalog).length;
const offered = checkJob(job, catalog).reduce((n, x) => n + x.fixes.length, 0);
const jobTimes = race({
  check: () => checkJob(job, catalog, { fixes: false }),
  fixes: () => checkJob(job, catalog),
  plain: () => readBores(job),
  bare: () => readDocument(job),
});
console.log(`Job: ${job.panels.length} panels, ${boreCount} bores, ${findings} findings, ${offered} checked fixes (medians of ${RUNS} rounds after ${WARM_UP} warm-up)`);
console.log(`  checkJob, findings only           ${f(jobTimes.check)}`);
console.log(`  plain pass (lay out, read bores)  ${f(jobTimes.plain)}   checkJob takes ${(jobTimes.check / jobTimes.plain).toFixed(1)}x`);
console.log(`  bare read of the document         ${f(jobTimes.bare)}   checkJob takes ${(jobTimes.check / jobTimes.bare).toFixed(0)}x`);
console.log(`  checkJob with every fix tried     ${f(jobTimes.fixes)}   ${(jobTimes.fixes / jobTimes.check).toFixed(1)}x the findings alone`);

const perforated = perforatedJob();
const panel = perforated.panels[0];
const overlapping = checkPanel(perforated, panel, catalog).filter((x) => x.code === 'bores-overlap').length;
const panelTimes = race({
  indexed: () => checkPanel(perforated, panel, catalog, { fixes: false }),
  fixes: () => checkPanel(perforated, panel, catalog),
  naive: () => allPairs(perforated),
});
console.log(`Perforated panel: ${panel.bores.length} bores, ${overlapping} bores-overlap findings (all-pairs counts ${allPairs(perforated)})`);
console.log(`  checkPanel, every check           ${f(panelTimes.indexed)}`);
console.log(`  all-pairs bores-overlap alone     ${f(panelTimes.naive)}   ${(panelTimes.naive / panelTimes.indexed).toFixed(1)}x slower`);
console.log(`  checkPanel with every fix tried   ${f(panelTimes.fixes)}   ${(panelTimes.fixes / panelTimes.indexed).toFixed(1)}x the findings alone (at most ${TRIALS_PER_PANEL} full trials a panel)`);

// How fast this machine is, to read the figures above by: a tight loop of 10^8 additions.
const loop = race({ loop: () => { let s = 0; for (let i = 0; i < 1e8; i++) s += i; return s; } });
console.log(`Machine: 10^8 additions take ${f(loop.loop)}`);
