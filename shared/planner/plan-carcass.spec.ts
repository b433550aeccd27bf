import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { checkJob } from '../checks/index';
import type { CarcassPlanInputData } from './carcass-plan-input';
import { planCarcass } from './plan-carcass';
import { planToJob } from './plan-job';
import { planned, refused, WALL_CARCASS } from '../testing/planned-carcass';

const doors = { type: 'doors', count: 2, overlay: 'full', reveal: 3 } as const;

describe('planCarcass: the worked example', () => {
  /*
   * Worked by hand. Wall carcass 600 × 723 × 320 of 19 mm MDF (700 kg/m³, EN 622-5), two full-overlay doors,
   * reveal 3 mm (half of it at each outer edge):
   *   door width  = (600 − 3 − 3) / 2 = 297 mm; door height = 723 − 3 = 720 mm; the door starts 1.5 mm up the side.
   *   overlay = 19 − 1.5 = 17.5 mm = hinge constant 13 + B − plate height (trade-reference §2, common practice):
   *     plate 0 mm gives B = 4.5, plate 2 mm gives B = 6.5; 4.5 is nearer the middle of 3 to 7, so plate-0, B = 4.5;
   *     cup centre = B + 17.5 = 22 mm from the hinge edge (trade-reference §2, common practice).
   *   mass = 297 × 720 × 19 mm × 700 kg/m³ = 2.84 kg; up to 900 mm and 6 kg: 2 hinges (trade-reference §2, common practice).
   *   system holes at 9.5 + 32k (half the 19 mm board; 723 = 32 × 22 + 19 is balanced: WOODWEB, "Panel and Door
   *     Balancing with 32mm Systems", published). A plate's two holes 32 mm apart fall on holes when its centre is at
   *     25.5 + 32k; the cup sits 1.5 mm lower on the door: 24 + 32k. Within 76 to 100 mm of the lower end: 88
   *     (plate at 89.5, holes 73.5 and 105.5). From the upper end 720 − c in 76 to 100: c = 632 (88 from the top,
   *     plate at 633.5, holes 617.5 and 649.5).
   *   rows: front 37 (Wikipedia, "32 mm cabinetmaking system", published); rear 37 + 32 × 7 = 261, the last whole
   *     pitch that keeps 37 mm to the back edge (320 − 261 = 59; one more pitch would leave 27).
   */
  const plan = planned({ fronts: doors });

  it('sizes the doors from overlay and reveal', () => {
    expect(plan.doors.map((d) => [d.width.value, d.height.value, d.dy.value])).toEqual([
      [297, 720, 1.5],
      [297, 720, 1.5],
    ]);
    expect(plan.doors[0].hinge.overlay.value).toBe(17.5);
    expect(plan.doors[0].hinge.plate.id).toBe('plate-0');
    expect(plan.doors[0].hinge.boringDistance.value).toBe(4.5);
    expect(plan.doors[0].hinge.cupFromEdge.value).toBe(22);
    expect(plan.doors[0].mass.value).toBeCloseTo(2.844, 3);
  });

  it('puts two hinges 88 mm from each end, each plate on system holes', () => {
    for (const door of plan.doors) {
      expect(door.hingeCount.value).toBe(2);
      expect(door.hinges.map((h) => [h.cup.value, h.plate])).toEqual([
        [88, 89.5],
        [632, 633.5],
      ]);
    }
    const left = plan.panels.find((p) => p.id === 'wall-left')!;
    expect(left.placements.filter((p) => p.fitting === 'plate-0').map((p) => [p.x, p.y])).toEqual([
      [37, 89.5],
      [37, 633.5],
    ]);
    const door = plan.panels.find((p) => p.id === 'wall-door-left')!;
    expect(door.hang).toEqual({ on: ['wall-left'], dy: 1.5 });
    expect(door.placements.map((p) => [p.fitting, p.x, p.y, p.params?.boringDistance])).toEqual([
      ['hinge-full-overlay-45', 22, 88, 4.5],
      ['hinge-full-overlay-45', 22, 632, 4.5],
    ]);
  });

  it('lays the rows and finds the height balanced', () => {
    expect([plan.box.rows.front.value, plan.box.rows.rear.value, plan.box.rows.firstHole.value, plan.box.rows.lastHole.value]).toEqual([37, 261, 9.5, 713.5]);
    expect(plan.box.balance.balanced).toBe(true);
    expect(plan.notes).toEqual([]);
  });

  it('offers the nearest balanced heights when the asked one is not', () => {
    const plan = planned({ fronts: doors, height: 730 });
    expect(plan.box.balance).toMatchObject({ balanced: false, below: 723, above: 755 });
    // Said once: the note is the balance's own words, not a heading repeating them.
    expect(plan.notes[0]).toMatch(/^The sides are not balanced \(a side is balanced when .*; the nearest balanced heights are 723 mm and 755 mm\.$/);
  });

  it('gives a document every check passes, for every construction and front', () => {
    const cases: Partial<CarcassPlanInputData>[] = [
      { fronts: doors, shelves: { type: 'adjustable', count: 2, play: 1 } },
      { construction: 'cams', back: { type: 'inset' }, fronts: { ...doors, count: 1, hingeSide: 'right' }, shelves: { type: 'fixed', count: 1 } },
      { construction: 'screws', fronts: { type: 'flap', reveal: 3 }, shelves: { type: 'adjustable', count: 1, play: 1 } },
      { construction: 'cams', depth: 560, height: 755, mounting: { type: 'kickboard', height: 100, setBack: 50 }, fronts: { type: 'drawers', count: 3, reveal: 3 } },
      { back: { type: 'grooved', material: 'plywood-18', setIn: 10, grooveDepth: 8 }, fronts: { ...doors, overlay: 'half' } },
    ];
    for (const fields of cases) {
      const findings = checkJob(planToJob(planned(fields)), builtinCatalog());
      expect(findings.filter((f) => f.severity === 'error')).toEqual([]);
    }
  });

  it('joins top and bottom to the sides with the chosen connectors on the system columns', () => {
    const cams = planned({ construction: 'cams' });
    const side = cams.panels.find((p) => p.id === 'wall-left')!;
    expect(side.placements.filter((p) => p.fitting === 'cam-bolt').map((p) => [p.x, p.y])).toEqual([
      [37, 9.5],
      [165, 9.5],
      [261, 9.5],
      [37, 713.5],
      [165, 713.5],
      [261, 713.5],
    ]);
    const bottom = cams.panels.find((p) => p.id === 'wall-bottom')!;
    // Cam centre 24 mm from the part's end (trade-reference §6, common practice); the bottom is 600 − 2 × 19 = 562 long.
    expect(bottom.placements.filter((p) => p.x === 37).map((p) => [p.fitting, p.y, p.rotation])).toEqual([
      ['cam-15', 24, 0],
      ['cam-15', 538, 180],
    ]);
  });

  it('keeps the shelf pins clear of the plates', () => {
    const { pins } = planned({ fronts: doors, shelves: { type: 'adjustable', count: 2, play: 1 } });
    // The plate bodies reach 25 mm either side of 89.5 and 633.5; a Ø5 pin at 105.5 or 617.5 would meet them.
    expect(pins?.heights.some((y) => Math.abs(y - 89.5) < 30 || Math.abs(y - 633.5) < 30)).toBe(false);
    expect(pins?.skipped.length).toBeGreaterThan(0);
  });
});

describe('planCarcass: inset doors', () => {
  /*
   * Worked by hand. The wall carcass with two inset doors and a 3 mm reveal all round:
   *   door width  = (600 − 2 × 19 − 3 × 3) / 2 = 276.5 mm; door height = 723 − 2 × 19 − 2 × 3 = 679 mm;
   *   the door starts 19 + 3 = 22 mm up the side.
   *   overlay −3 mm (the door sits 3 mm inside the side) = hinge constant −8 + B − plate 0 → B = 5, the middle of 3 to 7
   *     (trade-reference §2, common practice; the constant is the catalog's estimate).
   *   plates 37 + 19 = 56 mm from the front edge (trade-reference §2: for inset doors 37 mm + door thickness, published).
   *   plate centres on 25.5 + 32k (holes at 9.5 + 32k, 16 mm either side), the cup 22 mm lower: c = 3.5 + 32k.
   *   From the lower end, 76 to 100: c = 99.5 (plate 121.5). From the upper end 679 − c in 76 to 100: c = 579.5 (plate 601.5).
   */
  const plan = planned({ fronts: { ...doors, overlay: 'inset' } });

  it('sizes the doors inside the box and hangs them on inset plates', () => {
    const [door] = plan.doors;
    expect([door.width.value, door.height.value, door.dy.value]).toEqual([276.5, 679, 22]);
    expect([door.hinge.hinge.id, door.hinge.plate.id, door.hinge.boringDistance.value]).toEqual(['hinge-inset-45', 'plate-0', 5]);
    expect(door.hinges.map((h) => [h.cup.value, h.plate])).toEqual([
      [99.5, 121.5],
      [579.5, 601.5],
    ]);
    const left = plan.panels.find((p) => p.id === 'wall-left')!;
    expect(left.placements.filter((p) => p.fitting === 'plate-0').map((p) => [p.x, p.y])).toEqual([
      [56, 121.5],
      [56, 601.5],
    ]);
  });

  it('checks with no off-grid finding: the plates are on their own row, 37 mm plus the 19 mm door', () => {
    // Mounting plates for inset doors: 37 mm + door thickness (trade-reference §2, Popular Woodworking no. 155, published).
    const findings = checkJob(planToJob(plan), builtinCatalog());
    expect(findings.filter((f) => f.code === 'off-grid')).toEqual([]);
  });
});

describe('planCarcass: a flap hung from the top', () => {
  it('puts the flap\'s cups 76 to 100 mm from its ends on a 900 mm wide carcass, plates where the cups land', () => {
    // Outer cup centres 76 to 100 mm from the front's ends (trade-reference §2, common practice). The top is not
    // line-bored, so its plates follow the cups rather than a system hole counted from the top's end.
    const plan = planned({ width: 900, fronts: { type: 'flap', reveal: 3 } });
    const flap = plan.panels.find((p) => p.role === 'flap')!;
    const cups = flap.placements.map((p) => p.y).sort((a, b) => a - b);
    const fromEnds = [cups[0], flap.height - cups[cups.length - 1]];
    for (const d of fromEnds) {
      expect(d).toBeGreaterThanOrEqual(76);
      expect(d).toBeLessThanOrEqual(100);
    }
    const findings = checkJob(planToJob(plan), builtinCatalog());
    expect(findings.filter((f) => ['hinge-end-distance', 'hinge-unpaired', 'off-grid', 'hole-shared', 'sides-mismatched'].includes(f.code))).toEqual([]);
  });
});

describe('planCarcass: bad input', () => {
  it('refuses a box too small for its doors', () => {
    // Two inset doors between 19 mm sides with 3 mm reveals: (120 − 2 × 19 − 3 × 3) / 2 = 36.5 mm each.
    expect(refused({ width: 120, fronts: { ...doors, overlay: 'inset' } })[0]).toMatch(/^width: the carcass is too small for 2 inset doors: each would be 36\.5 mm × /);
  });

  it('refuses inset doors when the catalog has no inset hinge, and says what to do', () => {
    const catalog = new Map([...builtinCatalog()].filter(([, f]) => f.purpose !== 'hinge-cup' || f.hinge.overlay !== 'inset'));
    const result = planCarcass({ ...WALL_CARCASS, fronts: { ...doors, overlay: 'inset' } }, catalog);
    expect(result.ok ? [] : result.errors).toEqual(["fronts.overlay: the catalog has no inset hinge; import one from the hinge maker's data"]);
  });

  it('refuses a depth too shallow for the rear row', () => {
    expect(refused({ depth: 100 })).toEqual([
      'depth: 100 mm leaves no room for the rear system row: it sits a whole 32 mm pitch behind the front row at 37 mm and keeps 37 mm clear of the back (no back); make the carcass at least 106 mm deep',
    ]);
  });

  it('refuses a thickness the material does not come in', () => {
    expect(refused({ thickness: 18 })).toEqual([
      'thickness: MDF 19 comes in 19 mm only, not 18 mm; 18 mm board: particleboard-18, plywood-18, lightweight-18',
    ]);
  });

  it('refuses a flap too heavy for every mechanism', () => {
    const [error] = refused({ width: 1200, height: 915, depth: 400, fronts: { type: 'flap', reveal: 3, mechanisms: 1 } });
    expect(error).toMatch(/^fronts: the flap asks for a power factor of .*; it is too heavy for every mechanism of the catalog \(the strongest goes to 4000\)/);
  });

  it('leads each problem of the input with its path', () => {
    expect(refused({ width: -5, fronts: { type: 'doors', count: 3 } as never })).toEqual(
      expect.arrayContaining(['width: must be greater than 0', expect.stringMatching(/^fronts\.count: /)]),
    );
  });
});
