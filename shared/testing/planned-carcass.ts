import { builtinCatalog } from '../catalog/builtin-catalog';
import type { CarcassPlanInputData } from '../planner/carcass-plan-input';
import { planCarcass, type CarcassPlan } from '../planner/plan-carcass';

/**
 * A wall carcass of 19 mm MDF, 600 wide, 723 high (32 × 22 + 19: balanced), 320 deep, doweled, with no back,
 * fronts or shelves unless the test gives them: the worked example of the specs.
 */
export const WALL_CARCASS: CarcassPlanInputData = {
  id: 'wall',
  name: 'Wall unit',
  width: 600,
  height: 723,
  depth: 320,
  material: 'mdf-19',
  back: { type: 'none' },
  construction: 'dowels',
  fronts: { type: 'none' },
  shelves: { type: 'none' },
  mounting: { type: 'wall' },
};

/** Plans a carcass against the built-in catalog and fails the test with the planner's errors if it refuses. */
export function planned(fields: Partial<CarcassPlanInputData> = {}): CarcassPlan {
  const result = planCarcass({ ...WALL_CARCASS, ...fields }, builtinCatalog());
  if (!result.ok) throw new Error(`the planner refused: ${result.errors.join('; ')}`);
  return result.plan;
}

/** The planner's errors for an input it must refuse. */
export function refused(fields: Partial<CarcassPlanInputData>): string[] {
  const result = planCarcass({ ...WALL_CARCASS, ...fields }, builtinCatalog());
  return result.ok ? [] : result.errors;
}
