import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { WALL_CARCASS } from '../testing/planned-carcass';
import type { LengthUnit } from '../units/length-unit';
import { planCarcass, type CarcassPlan } from './plan-carcass';

const doors = { type: 'doors', count: 2, overlay: 'full', reveal: 3 } as const;

/** The worked example of plan-carcass.spec.ts (600 × 723 × 320, two full-overlay doors) planned for a reader of `unit`. */
function plannedFor(unit?: LengthUnit): CarcassPlan {
  const result = planCarcass({ ...WALL_CARCASS, fronts: doors }, builtinCatalog(), unit ? { unit } : {});
  if (!result.ok) throw new Error(result.errors.join('; '));
  return result.plan;
}

// The international inch is exactly 25.4 mm (NIST SP 811, the 1959 international yard and pound agreement: published).
describe("the planner's reasons in the reader's units", () => {
  it('speak millimetres unless told, as the command line prints them', () => {
    const plan = plannedFor();
    expect(plan.doors[0].width.why).toBe('the 600 mm width less 6 mm (full overlay; half a 3 mm reveal at each outer edge; 1 gap of 3 mm between fronts), shared by 2');
    expect(plan.box.rows.front.why).toBe('the front row at the setback, 37 mm from the front edge');
  });

  it('print lengths in inches for an inch reader, and the system figures in mm with their inches', () => {
    const plan = plannedFor('in-32');
    // 600 mm = 23.622 in = 755.9/32 → 756/32 = 23 5/8; 6 mm = 0.2362 in = 7.56/32 → 8/32 = 1/4; 3 mm = 3.78/32 → 4/32 = 1/8.
    expect(plan.doors[0].width.why).toBe('the 23 5/8" width less 1/4" (full overlay; half a 1/8" reveal at each outer edge; 1 gap of 1/8" between fronts), shared by 2');
    // The cup 88 mm up = 3.4646 in = 110.87/32 → 3 15/32; the rule's 76 mm = 95.75/32 → 3; 100 mm = 125.98/32 → 3 15/16.
    expect(plan.doors[0].hinges[0].cup.why).toBe(`3 15/32" from the end at y = 0 (3" to 3 15/16"), its plate's holes on system holes`);
    // The setback and pitch are the system's own: 37 mm = 1.4567 in = 93.23/64 → 1 29/64; 32 mm = 80.63/64 → 1 17/64.
    expect(plan.box.rows.front.why).toBe('the front row at the setback, 37 mm (1 29/64") from the front edge');
    expect(plan.box.rows.rear.why).toBe('the furthest whole 32 mm (1 17/64") pitch behind the front row that keeps 37 mm (1 29/64") clear of the back');
    // The hinge rule's 900 mm = 35.433 in = 1133.86/32 → 1134/32 = 35 7/16 (trade-reference §2, common practice).
    expect(plan.doors[0].hingeCount.why).toContain('up to 35 7/16" and 6 kg: 2;');
  });

  it('word a refusal in the reader\'s units', () => {
    const result = planCarcass({ ...WALL_CARCASS, depth: 90 }, builtinCatalog(), { unit: 'in' });
    // 90 mm = 3.5433 in; at least 2 × 37 + 32 = 106 mm = 4.1732 in.
    expect(result.ok ? [] : result.errors).toEqual([
      'depth: 3.543" leaves no room for the rear system row: it sits a whole 32 mm (1.26") pitch behind the front row at 37 mm (1.457") and keeps 37 mm (1.457") clear of the back (no back); make the carcass at least 4.173" deep',
    ]);
  });

  it('plan the same carcass whatever the unit: only the words change', () => {
    const numbers = (plan: CarcassPlan) => JSON.stringify(plan, (key, value: unknown) => (key === 'why' || key === 'notes' ? undefined : value));
    expect(numbers(plannedFor('in-64'))).toBe(numbers(plannedFor()));
  });
});
