import type { Catalog } from '../catalog/fitting';
import type { Material, Panel, PanelRole, Placement } from '../model/job-document';
import type { CarcassBox } from './carcass-box';
import type { CarcassPlanInput } from './carcass-plan-input';

/** What every step of the planner reads: the checked input, the box and the catalog. */
export interface PlanContext {
  input: CarcassPlanInput;
  box: CarcassBox;
  catalog: Catalog;
  materials: ReadonlyMap<string, Material>;
}

/** The placements a step puts on the carcass's own parts, by part. */
export interface PartPlacements {
  left: Placement[];
  right: Placement[];
  top: Placement[];
}

/** No placements on any part. */
export function noPlacements(): PartPlacements {
  return { left: [], right: [], top: [] };
}

/** The id of one of the carcass's panels: the carcass id and the part, `wall-1-left`. */
export function partId(ctx: PlanContext, part: string): string {
  return `${ctx.input.id}-${part}`;
}

/** A panel of this carcass, of its board unless another material is named. */
export function carcassPanel(
  ctx: PlanContext,
  part: string,
  label: string,
  role: PanelRole,
  size: { width: number; height: number },
  fields: Partial<Panel> = {},
): Panel {
  const material = ctx.materials.get(fields.material ?? ctx.box.board.id) ?? ctx.box.board;
  return {
    id: partId(ctx, part),
    name: `${ctx.input.name}, ${label}`,
    role,
    carcass: ctx.input.id,
    width: size.width,
    height: size.height,
    thickness: material.thickness,
    material: material.id,
    status: 'planned',
    placements: [],
    bores: [],
    ...fields,
  };
}
