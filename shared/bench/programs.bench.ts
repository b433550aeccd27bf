// The drilling programs of a generated 300-panel job: how long the tool travels between holes in the
// nearest-neighbour order the programs use, against the order of the panels' hole lists, and the time
// it takes to work out and write every program. Run with `npm run bench` (after the checks and the pack).
import { builtinCatalog } from '../catalog/builtin-catalog';
import { panelProgramPlans } from '../export/drilling-programs';
import { programText } from '../export/drilling-program';
import { DEFAULT_MACHINE_SETTINGS } from '../export/machine-settings';
import { jobDrilling } from '../export/panel-drilling';
import { generateJob } from './generate-job';

const job = generateJob(100);
const catalog = builtinCatalog();
const ctx = { job, catalog, date: new Date(), generator: { name: 'Borewright', version: 'bench' } };
// A spoilboard allowance, so that the through holes are drilled and counted too.
const machine = { ...DEFAULT_MACHINE_SETTINGS, breakthrough: 1 };
const drilling = jobDrilling(job, catalog, []);

const start = performance.now();
let programs = 0;
let bytes = 0;
let toured = 0;
let listed = 0;
let holes = 0;
for (const d of drilling) {
  for (const plan of panelProgramPlans(d, machine)) {
    programs++;
    toured += plan.travel.toured;
    listed += plan.travel.listed;
    holes += plan.groups.reduce((sum, g) => sum + g.holes.length, 0);
    bytes += programText(ctx, d, plan, machine, { self: 'bench.nc', others: [] }).length;
  }
}
const ms = performance.now() - start;
const m = (mm: number) => `${(mm / 1000).toFixed(1)} m`;
console.log(`Drilling programs of ${job.panels.length} panels: ${programs} programs, ${holes} holes, ${(bytes / 1e6).toFixed(1)} MB of G-code in ${ms.toFixed(0)} ms (machine load ${(await import('node:os')).loadavg()[0].toFixed(1)})`);
console.log(`Travel between holes: nearest-neighbour ${m(toured)}, hole-list order ${m(listed)}: ${((1 - toured / listed) * 100).toFixed(0)} % shorter`);
