import type { Catalog } from '../catalog/fitting';
import type { LengthWording } from '../checks/wording';
import type { Material, Panel, PanelRole, Placement } from '../model/job-document';
import type { CarcassBox } from './carcass-box';
import type { CarcassPlanInput } from './carcass-plan-input';

/**
 * The side heights one set of fronts covers: the whole carcass, or one section of it between the carcass's
 * own bottom or top and a dividing fixed shelf, whose thickness the fronts above and below it share.
 */
export interface Opening {
  /** Lower end: the carcass's lower edge (0) or the centre of the dividing shelf below. */
  from: number;
  /** Upper end: the carcass's height or the centre of the dividing shelf above. */
  to: number;
  lowerIsBox: boolean;
  upperIsBox: boolean;
  /** What the section's fronts are called apart from another section's ('' for the whole carcass): `section-2`. */
  part: string;
  label: string;
}

/**
 * What every step of the planner reads: the checked input, the box, the catalog, the opening its fronts
 * cover, and how its reasons word lengths (the reader's unit, as the checks word their findings).
 */
export interface PlanContext {
  input: CarcassPlanInput;
  box: CarcassBox;
  catalog: Catalog;
  materials: ReadonlyMap<string, Material>;
  opening: Opening;
  words: LengthWording;
}

/** The whole front of the carcass, top to bottom. */
export function wholeOpening(height: number): Opening {
  return { from: 0, to: height, lowerIsBox: true, upperIsBox: true, part: '', label: '' };
}

/** A front's own part name and label, with its section's before them when the carcass is divided. */
export function frontName(ctx: PlanContext, part: string, label: string): { part: string; label: string } {
  const { opening } = ctx;
  return opening.part ? { part: `${opening.part}-${part}`, label: `${opening.label} ${label}` } : { part, label };
}

/** The inside faces the fronts of the opening sit between: a carcass's bottom or top board, or half a dividing shelf. */
export function openingInside(ctx: PlanContext): { low: number; high: number } {
  const { opening, box } = ctx;
  const T = box.thickness;
  return { low: opening.from + (opening.lowerIsBox ? T : T / 2), high: opening.to - (opening.upperIsBox ? T : T / 2) };
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
