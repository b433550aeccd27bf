import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { panelBores } from '../layout/panel-layout';
import { jobDocument } from '../model/job-document';
import { makeJob, makePanel } from '../testing/make-job';
import { checkSwap } from './check-swap';
import { retrofitJob } from './retrofit-job';

const catalog = builtinCatalog();
const runnerSide = (id: string, status: 'planned' | 'drilled', y = 105) =>
  makePanel(id, { carcass: 'base', status, placements: [{ id: 'runner-1', fitting: 'runner-500', x: 37, y, face: 'A' }] });

describe('retrofitJob', () => {
  // Runners 500 for 400 (trade-reference §6, common practice: front screw on the 37 mm row, rear screws 32·k
  // behind): the front hole stays, the rear ones go to x = 37 + 160 = 197 and 37 + 320 = 357.
  const job = makeJob([runnerSide('left', 'drilled'), runnerSide('right', 'planned'), runnerSide('spare', 'drilled', 300)], {
    carcasses: [{ id: 'base', name: 'Drawer base', width: 500, height: 722, depth: 560, material: 'pb18' }],
  });
  const result = checkSwap(job, catalog, 'runner-500', 'runner-400');
  if (!result.ok) throw new Error(result.message);
  const retrofit = retrofitJob(job, catalog, result.report);

  it('holds only the drilled panels to drill, each with only its new holes', () => {
    expect(retrofit.job.panels.map((p) => p.id)).toEqual(['left', 'spare']);
    const [left] = retrofit.job.panels;
    const bores = panelBores(left, retrofit.catalog, retrofit.job.system);
    expect(bores.map((b) => [b.id, b.kind === 'face' ? b.x : null, b.kind === 'face' ? b.y : null, b.purpose])).toEqual([
      ['runner-1/rear-1', 197, 105, 'runner'],
      ['runner-1/rear-2', 357, 105, 'runner'],
    ]);
    expect(left.status).toBe('drilled');
  });

  it('names the cut-down fitting for the hole schedule and the hardware list, once for the same holes', () => {
    expect([...retrofit.catalog.keys()]).toEqual(['runner-400-retrofit']);
    expect(retrofit.catalog.get('runner-400-retrofit')!.name).toBe('Drawer runner, 400 mm, retrofit: rear-1, rear-2');
    expect(retrofit.job.panels.every((p) => p.placements.every((pl) => pl.fitting === 'runner-400-retrofit'))).toBe(true);
  });

  it('is a valid job document that keeps its carcass and says what it is', () => {
    expect(jobDocument.safeParse(retrofit.job).success).toBe(true);
    expect(retrofit.job.carcasses.map((c) => c.id)).toEqual(['base']);
    expect(retrofit.job.name).toBe('Test job, retrofit runner-500 to runner-400');
    expect(job.panels).toHaveLength(3);
  });

  it('drops the hang of a front, which the pack has no use for', () => {
    const front = makePanel('door', {
      role: 'door',
      status: 'drilled',
      hang: { on: ['left'], dy: 2 },
      placements: [{ id: 'runner-1', fitting: 'runner-500', x: 37, y: 105, face: 'A' }],
    });
    const withDoor = makeJob([makePanel('left'), front]);
    const swap = checkSwap(withDoor, catalog, 'runner-500', 'runner-400');
    if (!swap.ok) throw new Error(swap.message);
    const [door] = retrofitJob(withDoor, catalog, swap.report).job.panels;
    expect(door.id).toBe('door');
    expect(door.hang).toBeUndefined();
  });
});
