import type { Catalog } from '../catalog/fitting';
import type { JobDocument, Material, Panel } from '../model/job-document';
import type { LengthUnit } from '../units/length-unit';
import { lengthWording, type LengthWording } from './wording';

/** What the checks look up across a job, built once per run, and how its messages word lengths. */
export interface JobSite extends LengthWording {
  job: JobDocument;
  catalog: Catalog;
  materials: ReadonlyMap<string, Material>;
  /** For each panel id, the flaps that hang on it (a flap's `hang.on`). */
  flapsOn: ReadonlyMap<string, Panel[]>;
  /** For each panel id, every panel that hangs on it (doors and flaps): whose cups its plates meet. */
  hungOn: ReadonlyMap<string, Panel[]>;
  /** Every panel by id. */
  panels: ReadonlyMap<string, Panel>;
  /** For each flap id, the lift mechanisms placed on the panels it hangs on. */
  liftsFor: ReadonlyMap<string, number>;
  /** For each carcass id, the thickness of its material: the board that adjoins its sides. */
  carcassBoard: ReadonlyMap<string, number>;
  /** For each carcass id, its side panels in document order. */
  sidesOf: ReadonlyMap<string, Panel[]>;
}

function liftCount(panel: Panel | undefined, catalog: Catalog): number {
  return panel?.placements.filter((p) => catalog.get(p.fitting)?.purpose === 'lift-mechanism').length ?? 0;
}

/** Builds the job-wide lookups the panel checks share. */
export function jobSite(job: JobDocument, catalog: Catalog, unit: LengthUnit = 'mm'): JobSite {
  const materials = new Map(job.materials.map((m) => [m.id, m]));
  const panels = new Map(job.panels.map((p) => [p.id, p]));
  const flapsOn = new Map<string, Panel[]>();
  const liftsFor = new Map<string, number>();
  const hungOn = new Map<string, Panel[]>();
  for (const front of job.panels) for (const target of front.hang?.on ?? []) hungOn.set(target, [...(hungOn.get(target) ?? []), front]);
  for (const flap of job.panels) {
    if (flap.role !== 'flap' || !flap.hang) continue;
    for (const side of flap.hang.on) flapsOn.set(side, [...(flapsOn.get(side) ?? []), flap]);
    liftsFor.set(flap.id, flap.hang.on.reduce((n, side) => n + liftCount(panels.get(side), catalog), 0));
  }
  const carcassBoard = new Map<string, number>();
  for (const c of job.carcasses) {
    const thickness = materials.get(c.material)?.thickness;
    if (thickness !== undefined) carcassBoard.set(c.id, thickness);
  }
  const sidesOf = new Map<string, Panel[]>();
  for (const p of job.panels) if (p.role === 'side' && p.carcass !== undefined) sidesOf.set(p.carcass, [...(sidesOf.get(p.carcass) ?? []), p]);
  return { job, catalog, materials, flapsOn, hungOn, panels, liftsFor, carcassBoard, sidesOf, ...lengthWording(unit) };
}

/** The other side of a panel's carcass, when the panel is one of exactly two sides. */
export function otherSide(site: JobSite, panel: Panel): Panel | undefined {
  const sides = panel.role === 'side' && panel.carcass !== undefined ? site.sidesOf.get(panel.carcass) : undefined;
  return sides?.length === 2 ? sides.find((s) => s.id !== panel.id) : undefined;
}
