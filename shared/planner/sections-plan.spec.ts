import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { checkJob } from '../checks/index';
import { planToJob } from './plan-job';
import { planned, refused } from '../testing/planned-carcass';

const doors = { type: 'doors', count: 2, overlay: 'full', reveal: 3 } as const;
const flap = { type: 'flap', reveal: 3, mechanisms: 2 } as const;

describe('planSections: two doors below a lift-up flap in one carcass', () => {
  /*
   * Worked by hand. Wall carcass 700 × 1011 × 350 of 19 mm MDF (700 kg/m³, EN 622-5), cams, an inset back;
   * 1011 = 32 × 31 + 19 is balanced (WOODWEB, "Panel and Door Balancing with 32mm Systems", published).
   * System holes at 9.5 + 32k. Lower section asked 600 mm high: the dividing shelf is centred on the nearest
   * hole, 585.5 (k = 18; k = 19 would be 617.5, 17.5 away against 14.5).
   * Lower section, 0 to 585.5, two full-overlay doors, reveal 3:
   *   door width = (700 − 3 − 3) / 2 = 347 (as for a whole carcass: the sides are the same);
   *   door height = 585.5 − 3 = 582.5: half the reveal above the carcass's lower edge, half below the dividing
   *     shelf's centre, so the flap above starts a whole reveal higher (common practice, as fronts meet on a
   *     shared side); the door starts 1.5 mm up the side.
   *   mass = 347 × 582.5 × 19 mm × 700 kg/m³ = 2.688 kg: 2 hinges (up to 900 mm and 6 kg, trade-reference §2).
   *   plates on holes at 25.5 + 32k, cups 1.5 lower at 24 + 32k; 76 to 100 mm from the lower end: 88 (plate 89.5);
   *     from the upper end 582.5 − c in 76 to 100: c = 504 (78.5 from the top; 472 would be 110.5), plate 505.5.
   * Upper section, 585.5 to 1011, a lift-up flap: hinge edge to free edge 1011 − 585.5 − 3 = 422.5; along the
   *   hinge 700 − 3 = 697; mass 697 × 422.5 × 19 mm × 700 kg/m³ = 3.917 kg.
   *   The mechanism's body stays inside the section: above the dividing shelf's upper face at 585.5 + 9.5 = 595
   *   and under the top's lower face at 1011 − 19 = 992.
   */
  const plan = planned({
    width: 700,
    height: 1011,
    depth: 350,
    construction: 'cams',
    back: { type: 'inset' },
    fronts: { type: 'sections', sections: [{ height: 600, front: doors }, { front: flap }] },
  });

  it('centres the dividing shelf on the system hole nearest the asked height and joins it like a fixed shelf', () => {
    expect(plan.sections.map((s) => [s.from.value, s.to.value, s.front])).toEqual([
      [0, 585.5, 'doors'],
      [585.5, 1011, 'flap'],
    ]);
    expect(plan.shelves.map((s) => [s.panel, s.kind, s.y.value])).toEqual([['wall-divider-1', 'fixed', 585.5]]);
    const left = plan.panels.find((p) => p.id === 'wall-left')!;
    expect(left.placements.filter((p) => p.id.startsWith('divider-1-')).map((p) => p.y)).toEqual(expect.arrayContaining([585.5]));
    expect(left.placements.filter((p) => p.id.startsWith('divider-1-')).every((p) => p.y === 585.5)).toBe(true);
  });

  it('sizes and hangs the doors of the lower section within it', () => {
    expect(plan.doors.map((d) => [d.panel, d.width.value, d.height.value, d.dy.value, d.hingeCount.value])).toEqual([
      ['wall-section-1-door-left', 347, 582.5, 1.5, 2],
      ['wall-section-1-door-right', 347, 582.5, 1.5, 2],
    ]);
    expect(plan.doors[0].mass.value).toBeCloseTo(2.688, 3);
    expect(plan.doors[0].hinges.map((h) => [h.cup.value, h.plate])).toEqual([
      [88, 89.5],
      [504, 505.5],
    ]);
    const right = plan.panels.find((p) => p.id === 'wall-right')!;
    expect(right.placements.filter((p) => p.fitting.startsWith('plate-')).map((p) => [p.id, p.y])).toEqual([
      ['section-1-plate-1', 89.5],
      ['section-1-plate-2', 505.5],
    ]);
  });

  it('sizes the flap of the upper section and keeps its mechanisms inside it', () => {
    const flapPlan = plan.flap!;
    expect([flapPlan.panel, flapPlan.height.value, flapPlan.length.value]).toEqual(['wall-section-2-flap', 422.5, 697]);
    expect(flapPlan.mass.value).toBeCloseTo(3.917, 3);
    const body = flapPlan.lift.fitting.keepOuts;
    const lowest = Math.min(...body.map((k) => k.y));
    const highest = Math.max(...body.map((k) => k.y + k.height));
    for (const m of flapPlan.mechanisms) {
      expect(m.y.value + lowest).toBeGreaterThanOrEqual(595);
      expect(m.y.value + highest).toBeLessThanOrEqual(992);
    }
    expect(plan.panels.filter((p) => p.role === 'flap' || p.role === 'door').map((p) => p.name)).toEqual([
      'Wall unit, section 1 left door',
      'Wall unit, section 1 right door',
      'Wall unit, section 2 flap',
    ]);
  });

  it('gives a document the checks pass with no error or warning', () => {
    const findings = checkJob(planToJob(plan), builtinCatalog()).filter((f) => f.severity !== 'note');
    expect(findings).toEqual([]);
  });

  it('refuses a flap below another section, a section without its height, and shelves besides the dividing ones', () => {
    expect(refused({ height: 1011, fronts: { type: 'sections', sections: [{ height: 400, front: flap }, { front: doors }] } })).toEqual([
      "fronts.sections[0]: fronts: a lift-up flap hangs from the carcass's top, so only the top section can have one",
    ]);
    expect(refused({ height: 1011, fronts: { type: 'sections', sections: [{ front: doors }, { front: flap }] } })).toEqual([
      'fronts.sections[0].height: give the height of every section but the last',
    ]);
    expect(refused({ height: 1011, shelves: { type: 'fixed', count: 1 }, fronts: { type: 'sections', sections: [{ height: 500, front: doors }, { front: flap }] } })[0]).toMatch(/^shelves:/);
  });
});
