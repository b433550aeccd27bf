import type { Panel, Placement } from '../model/job-document';
import type { JobSite } from './job-site';

/** A cup and its plate meet when their heights agree this closely (mm). */
export const PAIRING_TOLERANCE = 0.5;

/** A panel's placements of hinge cups or of mounting plates. */
export function withPurpose(site: JobSite, panel: Panel, purpose: 'hinge-cup' | 'mounting-plate'): Placement[] {
  return panel.placements.filter((p) => site.catalog.get(p.fitting)?.purpose === purpose);
}

/** The plates on the panels a door or flap hangs on that meet one of its cups: at the cup's height plus `hang.dy`. */
export function platesMeeting(site: JobSite, front: Panel, cup: Placement): { panel: Panel; plate: Placement }[] {
  if (!front.hang) return [];
  const wanted = cup.y + front.hang.dy;
  return front.hang.on.flatMap((id) => {
    const panel = site.panels.get(id);
    if (!panel) return [];
    return withPurpose(site, panel, 'mounting-plate')
      .filter((plate) => Math.abs(plate.y - wanted) <= PAIRING_TOLERANCE)
      .map((plate) => ({ panel, plate }));
  });
}

/** The cups of the doors and flaps hanging on a panel that meet one of its plates. */
export function cupsMeeting(site: JobSite, panel: Panel, plate: Placement): { front: Panel; cup: Placement }[] {
  return (site.hungOn.get(panel.id) ?? []).flatMap((front) =>
    withPurpose(site, front, 'hinge-cup')
      .filter((cup) => Math.abs(cup.y + (front.hang?.dy ?? 0) - plate.y) <= PAIRING_TOLERANCE)
      .map((cup) => ({ front, cup })),
  );
}
