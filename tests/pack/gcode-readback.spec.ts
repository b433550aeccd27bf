// Every drilling program of every panel, read back as a machine would run it (gcode-reader.ts: the words by
// gcode-parser from npm, their meaning by ISO 6983 / RS-274, published, from memory), drills each hole of
// the panel's one hole list once, at its place after the zero point's shift, to its depth, with the tool
// the machine settings give its diameter, and cuts nothing else. The expected place is worked here from
// the way each header says the panel lies, not from the program's own code.
import { describe, expect, it } from 'vitest';
import { DEMO_JOBS } from '../../server/demo/seed-demo';
import { generateJob } from '../../shared/bench/generate-job';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { PROGRAM_CAUTION } from '../../shared/export/cautions';
import { drillingPrograms } from '../../shared/export/drilling-programs';
import { DEFAULT_MACHINE_SETTINGS, type MachineSettings } from '../../shared/export/machine-settings';
import { jobDrilling, type PanelDrilling } from '../../shared/export/panel-drilling';
import type { PanelHole } from '../../shared/export/panel-holes';
import type { JobDocument } from '../../shared/model/job-document';
import { parseJobDocument } from '../../shared/model/parse-job';
import { readProgram } from './gcode-reader';

const catalog = builtinCatalog();
const ctx = (job: JobDocument) => ({ job, catalog, date: new Date('2026-03-14T09:30:00Z'), generator: { name: 'Borewright', version: '0.0.0-test' } });

/** Settings that drill every hole of the demo jobs: a spoilboard allowance and a 7 mm through bit besides the defaults. */
const EVERY_HOLE: MachineSettings = {
  ...DEFAULT_MACHINE_SETTINGS,
  breakthrough: 1,
  tools: [...DEFAULT_MACHINE_SETTINGS.tools, { diameter: 7, through: true, tool: 8, feed: 1000, speed: 3500 }],
};
/** The same with the zero at the back right and Z0 on the table, so that every shift is exercised. */
const BACK_RIGHT_TABLE: MachineSettings = { ...EVERY_HOLE, origin: 'back-right', zZero: 'table', retract: 3, clearance: 40 };

/**
 * Where a hole lies in a program's plane, as the header's "Lay the panel with … at the left" says the panel
 * lies (u along X from the left, v along Y from the front), the side's size and how high the side up
 * stands: a face up with the lower edge at the front, an edge up with face A toward the front.
 */
function expectedPlace(atLeft: string, hole: PanelHole, panel: { width: number; height: number; thickness: number }) {
  const { width: W, height: H, thickness: T } = panel;
  if (hole.kind === 'face') return { u: atLeft === 'the reference edge' ? hole.x : W - hole.x, v: hole.y, L: W, A: H, top: T };
  const along = hole.edge === 'x0' || hole.edge === 'x1';
  const fromLeft = atLeft === (along ? 'the end at the lower edge' : 'the end at the reference edge');
  const length = along ? H : W;
  return { u: fromLeft ? hole.at : length - hole.at, v: hole.z, L: length, A: T, top: along ? W : H };
}

/** What a program's header says lies at the left of the machine. */
function atLeftIn(comments: readonly string[]): string {
  const lay = comments.map((c) => /^Lay the panel with (.+?) at the left,/.exec(c.trim())).find((m) => m !== null);
  expect(lay, 'a header that says how the panel lies').toBeDefined();
  return lay![1];
}

const sideOf = (hole: PanelHole) => (hole.kind === 'face' ? `face-${hole.face.toLowerCase()}` : `edge-${hole.edge}`);
const close = (a: number, b: number) => Math.abs(a - b) < 0.0015;

/** Reads back every program of a panel and checks it hole by hole; gives the holes drilled and the holes named as left out. */
async function checkPanel(job: JobDocument, d: PanelDrilling, machine: MachineSettings): Promise<{ drilled: number; leftOut: number }> {
  const programs = drillingPrograms(ctx(job), d, d.panel.id, machine);
  // A program for each face and edge with holes, and for nothing else.
  expect(programs.map((p) => p.name.split('.')[1]).sort(), d.panel.id).toEqual([...new Set(d.holes.map(sideOf))].sort());
  const seen = new Map<string, number>();
  let leftOut = 0;
  for (const program of programs) {
    const side = program.name.split('.')[1];
    const holes = d.holes.filter((h) => sideOf(h) === side);
    const text = new TextDecoder().decode(await program.produce());
    const atLeft = atLeftIn(readProgram(text, 0).comments);
    const { top } = expectedPlace(atLeft, holes[0], d.panel);
    const surface = machine.zZero === 'top' ? 0 : top;
    const read = readProgram(text, surface);
    const where = `${d.panel.id} ${program.name}`;
    expect(read.ended, where).toBe(true);
    expect(read.cuts, `${where}: a move into the panel outside a hole`).toEqual([]);
    for (const height of read.traverseHeights) expect(height, `${where}: a move across the panel below the clearance height`).toBeGreaterThanOrEqual(surface + machine.clearance - 0.001);
    expect(read.comments).toContain(`CAUTION: ${PROGRAM_CAUTION}`);
    for (const drill of read.drilled) {
      const hole = holes.find((h) => {
        const at = expectedPlace(atLeft, h, d.panel);
        const x = at.u - (machine.origin.endsWith('right') ? at.L : 0);
        const y = at.v - (machine.origin.startsWith('back') ? at.A : 0);
        return close(x, drill.x) && close(y, drill.y);
      });
      expect(hole, `${where}: a hole drilled where the panel has none, at X${drill.x} Y${drill.y}`).toBeDefined();
      const through = hole!.kind === 'face' && hole!.through;
      const depth = through ? d.panel.thickness + machine.breakthrough! : hole!.depth;
      expect(drill.bottom, `${where} ${hole!.key}: depth`).toBeCloseTo(surface - depth, 3);
      expect(drill.r, `${where}: the R plane`).toBeCloseTo(surface + machine.retract, 3);
      const tool = machine.tools.find((t) => t.through === through && Math.abs(t.diameter - hole!.diameter) < 0.01)!;
      expect(drill.tool, `${where} ${hole!.key}: the tool of its diameter`).toBe(tool.tool);
      expect([drill.feed, drill.speed]).toEqual([tool.feed, tool.speed]);
      // Peck drilling past three diameters deep (common practice, from memory), by one diameter.
      expect(drill.cycle, `${where} ${hole!.key}: cycle`).toBe(depth > 3 * hole!.diameter ? 83 : 81);
      if (drill.cycle === 83) expect(drill.peck).toBe(hole!.diameter);
      seen.set(hole!.key, (seen.get(hole!.key) ?? 0) + 1);
    }
    // What the program does not drill, its header names, one comment line per hole.
    const named = read.comments.filter((c) => /^\s*\S+: (no tool|a through hole)/.test(c)).map((c) => c.trim().split(': ')[0]);
    for (const key of named) seen.set(key, (seen.get(key) ?? 0) + 1);
    leftOut += named.length;
  }
  for (const hole of d.holes) expect(seen.get(hole.key), `${d.panel.id} ${hole.key}: drilled or named once`).toBe(1);
  expect([...seen.keys()].length).toBe(d.holes.length);
  return { drilled: d.holes.length - leftOut, leftOut };
}

async function checkJob(job: JobDocument, machine: MachineSettings): Promise<{ drilled: number; leftOut: number }> {
  const total = { drilled: 0, leftOut: 0 };
  for (const d of jobDrilling(job, catalog, [])) {
    if (d.holes.length === 0) continue;
    const { drilled, leftOut } = await checkPanel(job, d, machine);
    total.drilled += drilled;
    total.leftOut += leftOut;
  }
  return total;
}

const demoJobs = DEMO_JOBS.map((input) => {
  const parsed = parseJobDocument(input);
  if (!parsed.ok) throw new Error(parsed.errors.join('; '));
  return parsed.value;
});

describe('drilling programs read back with gcode-parser', () => {
  for (const job of demoJobs) {
    it(`drill every hole of ${job.name} once, in place, to depth, with its tool, and cut nothing else`, async () => {
      for (const machine of [EVERY_HOLE, BACK_RIGHT_TABLE]) {
        const { drilled, leftOut } = await checkJob(job, machine);
        expect(leftOut).toBe(0);
        expect(drilled).toBeGreaterThan(100);
      }
    }, 120_000);
  }

  it('with the default settings, leave out the through holes and the holes of a diameter with no tool, and name each', async () => {
    // The loft study's 7 mm through holes have no tool by default, and no through hole is drilled before a spoilboard allowance is set.
    const loft = demoJobs.find((j) => j.name.startsWith('Loft'))!;
    const { leftOut } = await checkJob(loft, DEFAULT_MACHINE_SETTINGS);
    const through = jobDrilling(loft, catalog, []).flatMap((d) => d.holes).filter((h) => h.kind === 'face' && h.through);
    expect(through.length).toBeGreaterThan(0);
    expect(leftOut).toBe(through.length);
  }, 120_000);

  it('drill every hole of the 300-panel bench job', async () => {
    const job = generateJob(100);
    const { drilled, leftOut } = await checkJob(job, EVERY_HOLE);
    expect(leftOut).toBe(0);
    expect(drilled).toBeGreaterThan(300 * 20);
  }, 600_000);
});
