import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { makeJob, makePanel } from '../testing/make-job';
import { nearestNeighbourTour, tourLength } from './drill-tour';
import { holeTool, PECK_RATIO, planProgram, programText } from './drilling-program';
import { DEFAULT_MACHINE_SETTINGS, machineSettings, type MachineSettings } from './machine-settings';
import { jobDrilling } from './panel-drilling';
import { programViews } from './program-views';

const side = makePanel('left', {
  name: 'Left side',
  bores: [
    { id: 'pin-low', x: 37, y: 105, face: 'A', diameter: 5, depth: 13 },
    { id: 'pin-high', x: 37, y: 649, face: 'A', diameter: 5, depth: 13 },
    { id: 'cup', x: 22.5, y: 100, face: 'B', diameter: 35, depth: 13 },
    { id: 'screw', x: 100, y: 300, face: 'A', diameter: 5, depth: 18 },
    { id: 'odd', x: 200, y: 300, face: 'A', diameter: 12, depth: 10 },
    { id: 'dowel', edge: 'y0', at: 100, z: 9, diameter: 8, depth: 30 },
  ],
});
const job = makeJob([side]);
const ctx = { job, catalog: builtinCatalog(), date: new Date('2026-03-14T09:30:00Z'), generator: { name: 'Borewright', version: 'test' } };
const [drilling] = jobDrilling(job, ctx.catalog, []);
const views = programViews(drilling);
const withSpoilboard: MachineSettings = { ...DEFAULT_MACHINE_SETTINGS, breakthrough: 1 };

describe('the drilling tour', () => {
  it('visits points on a line in order from one end: the shortest path, its length the span (arithmetic)', () => {
    const points = [40, 8, 32, 0, 16, 24].map((u) => ({ u, v: 0 }));
    const tour = nearestNeighbourTour(points, { u: 0, v: 0 });
    expect(tour.map((p) => p.u)).toEqual([0, 8, 16, 24, 32, 40]);
    expect(tourLength(tour, { u: 0, v: 0 })).toBe(40);
    // The list's own order goes back and forth: 40 + 32 + 24 + 32 + 16 + 8.
    expect(tourLength(points, { u: 0, v: 0 })).toBe(152);
  });
});

describe('a panel’s drilling programs', () => {
  it('are one per face and edge with holes', () => {
    expect(views.map((v) => v.side)).toEqual(['face-a', 'face-b', 'edge-y0']);
  });

  it('give each hole the tool of its diameter, blind or through, and name those with none', () => {
    const tool = (key: string) => holeTool(drilling.holes.find((h) => h.key.startsWith(key))!, DEFAULT_MACHINE_SETTINGS);
    expect(tool('A:37:105:5')).toEqual({ tool: DEFAULT_MACHINE_SETTINGS.tools[0] });
    expect(tool('A:200:300:12')).toEqual({ why: 'no tool for blind holes of 12 mm in the machine settings' });
    // An 18 mm bore in 18 mm board is a through hole: not drilled until a spoilboard allowance is set.
    expect(tool('A:100:300:5')).toEqual({ why: 'a through hole: no spoilboard allowance is set in the machine settings' });
    expect(holeTool(drilling.holes.find((h) => h.key.startsWith('A:100:300:5'))!, withSpoilboard)).toEqual({ tool: DEFAULT_MACHINE_SETTINGS.tools[5] });
  });

  it('peck a hole deeper than three diameters, by one diameter, and drill the rest in one feed', () => {
    const faceA = planProgram(views[0], 18, withSpoilboard);
    const through = faceA.groups.find((g) => g.tool.through)!;
    // 18 + 1 = 19 mm deep, more than 3 × 5 mm (common practice, from memory).
    expect([through.depth, through.peck]).toEqual([19, 5]);
    expect(faceA.groups.find((g) => !g.tool.through)!.peck).toBeUndefined();
    const edge = planProgram(views[2], 18, withSpoilboard);
    expect(edge.groups[0].depth > PECK_RATIO * 8).toBe(true);
    expect(edge.groups[0].peck).toBe(8);
  });

  it('lay face B turned over sideways and an edge on end, the zero at the corner the settings name', () => {
    // Face B: x mirrored about the panel's middle (560 − 22.5), y unchanged.
    expect(views[1].place(views[1].holes[0])).toEqual({ u: 537.5, v: 100 });
    // Edge y0 up, face A to the front: along the edge from the far end (560 − 100), across from face A.
    expect(views[2].place(views[2].holes[0])).toEqual({ u: 460, v: 9 });
    const backRight = programText(ctx, drilling, planProgram(views[0], 18, { ...withSpoilboard, origin: 'back-right' }), { ...withSpoilboard, origin: 'back-right' }, { self: 'a.nc', others: [] });
    // X = 37 − 560, Y = 105 − 720 from the back-right corner.
    expect(backRight).toContain('X-523.000 Y-615.000');
  });

  it('lay a right side as its face is truly seen, the reference edge at the right, as its drilling map does', () => {
    // A carcass's two sides are mirror images (trade-reference §8a, common practice): the same x from the
    // front edge lies at the other hand, so face A up with the lower edge at the front puts the front edge
    // of a right side at the right.
    const rightJob = makeJob([{ ...side, id: 'right', name: 'Right side' }]);
    const [right] = jobDrilling(rightJob, ctx.catalog, []);
    const [faceA, faceB, edge] = programViews(right);
    expect(faceA.place(faceA.holes[0])).toEqual({ u: 560 - 37, v: 105 });
    expect([faceA.left, faceA.reference]).toEqual(['the far edge', 'at the right']);
    expect(faceB.place(faceB.holes[0])).toEqual({ u: 22.5, v: 100 });
    // Edge y0 up, face A to the front: the reference edge's end now at the left.
    expect(edge.place(edge.holes[0])).toEqual({ u: 100, v: 9 });
    expect(edge.left).toBe('the end at the reference edge');
  });

  it('state the zero, Z zero, heights, tools, holes left out and the caution in the header', () => {
    const text = programText(ctx, drilling, planProgram(views[0], 18, DEFAULT_MACHINE_SETTINGS), DEFAULT_MACHINE_SETTINGS, { self: 'Left side.face-a.nc', others: ['Left side.face-b.nc'] });
    expect(text.startsWith('%\n(Left side.face-a.nc: drilling program')).toBe(true);
    expect(text).toContain('(Zero X0 Y0: the front-left corner of the side up, where the reference edge meets the lower edge; X to the right, Y to the back)');
    expect(text).toContain('(Z0: on the side up)');
    expect(text).toContain('(Heights: clearance Z25.000, R plane Z5.000; after each hole back to the clearance height [G98])');
    expect(text).toContain('(  T1 D5 blind, 4000 rpm, feed 1500 mm/min: 2 holes 13 deep)');
    expect(text).toContain('(  A:200:300:12: no tool for blind holes of 12 mm in the machine settings)');
    expect(text).toContain("(CAUTION: Prove every new drilling program in the air or on scrap first; the machine maker's instructions decide");
    expect(text.trimEnd().endsWith('M30\n%')).toBe(true);
    // Comments hold printable ASCII and no parentheses of their own, so every control reads each as one.
    for (const line of text.split('\n').filter((l) => l.startsWith('('))) expect(line).toMatch(/^\([\x20-\x27\x2a-\x7e]*\)$/);
  });
});

describe('the machine settings', () => {
  it('refuse a second tool for the same holes, a repeated tool number and a clearance below the R plane', () => {
    const first = DEFAULT_MACHINE_SETTINGS.tools[0];
    expect(machineSettings.safeParse({ ...DEFAULT_MACHINE_SETTINGS, tools: [first, { ...first, tool: 9 }] }).success).toBe(false);
    expect(machineSettings.safeParse({ ...DEFAULT_MACHINE_SETTINGS, tools: [first, { ...first, diameter: 6 }] }).success).toBe(false);
    expect(machineSettings.safeParse({ ...DEFAULT_MACHINE_SETTINGS, clearance: 4 }).success).toBe(false);
    expect(machineSettings.safeParse(DEFAULT_MACHINE_SETTINGS).success).toBe(true);
  });
});
