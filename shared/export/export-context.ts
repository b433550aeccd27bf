import type { Catalog } from '../catalog/fitting';
import type { Face, JobDocument, Panel, PanelRole } from '../model/job-document';
import type { LengthUnit } from '../units/length-unit';

/** Who made a file: printed in title blocks and recorded in the manifest. */
export interface Generator {
  name: string;
  version: string;
}

/** Everything an export needs besides the panel: the job it belongs to and the facts of this run. */
export interface ExportContext {
  job: JobDocument;
  catalog: Catalog;
  /** When the export is made. */
  date: Date;
  generator: Generator;
  /** A panel's stored version, where the job comes from the database; a job file has none. */
  panelVersion?: (panelId: string) => number | undefined;
  /**
   * The unit of the person the files are made for: drawings dimension and label in it (`12 3/8"`) and the
   * hole schedule adds inch columns. Millimetres unless given; the DXF is always in millimetres.
   */
  unit?: LengthUnit;
}

/** The unit the files are made in: the context's, else millimetres. */
export function exportUnit(ctx: Pick<ExportContext, 'unit'>): LengthUnit {
  return ctx.unit ?? 'mm';
}

/** The date as printed on a drawing: ISO 8601, `2026-03-14`, the same everywhere in the world. */
export function dateText(date: Date): string {
  return date.toISOString().slice(0, 10);
}

const INSIDE: readonly PanelRole[] = ['side', 'top', 'bottom', 'shelf', 'back'];
const BACK: readonly PanelRole[] = ['door', 'flap', 'drawer-front'];

/** What a face is on a panel of this role: face A is the inside face of a carcass part and the back face of a door or flap (design.md §2). */
export function faceName(role: PanelRole, face: Face): string | undefined {
  const which = INSIDE.includes(role) ? ['inside face', 'outside face'] : BACK.includes(role) ? ['back face', 'front face'] : undefined;
  return which?.[face === 'A' ? 0 : 1];
}

/** A face as the bench knows it: `A (inside face)`, or the letter alone where the role gives the face no name. */
export function faceText(role: PanelRole, face: Face): string {
  const name = faceName(role, face);
  return name ? `${face} (${name})` : face;
}

/** The name of the carcass a panel belongs to, or `none`. */
export function carcassName(ctx: ExportContext, panel: Panel): string {
  return ctx.job.carcasses.find((c) => c.id === panel.carcass)?.name ?? 'none';
}

/** The name of a panel's material, or its id when the job does not list it. */
export function materialName(ctx: ExportContext, panel: Panel): string {
  return ctx.job.materials.find((m) => m.id === panel.material)?.name ?? panel.material;
}

/** How a placement's fitting is named in a drawing or a list: the catalog's name, else its id marked unknown. */
export function fittingNameOf(ctx: ExportContext, panel: Panel): (placementId: string) => string {
  return (placementId) => {
    const id = panel.placements.find((p) => p.id === placementId)?.fitting ?? placementId;
    return ctx.catalog.get(id)?.name ?? `${id} (not in the catalog)`;
  };
}
