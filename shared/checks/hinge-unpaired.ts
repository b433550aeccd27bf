import type { Placement } from '../model/job-document';
import type { Finding } from './finding';
import { report, type PanelSite } from './panel-site';
import { formatNumber, mm } from './wording';

/** A cup and its plate meet when their heights agree this closely (mm). */
export const PAIRING_TOLERANCE = 0.5;

function withPurpose(site: PanelSite, placements: readonly Placement[], purpose: 'hinge-cup' | 'mounting-plate'): Placement[] {
  return placements.filter((p) => site.job.catalog.get(p.fitting)?.purpose === purpose);
}

/** The nearest of some heights to a height, or undefined when there are none. */
function nearest(heights: number[], y: number): number | undefined {
  return heights.reduce<number | undefined>((best, h) => (best === undefined || Math.abs(h - y) < Math.abs(best - y) ? h : best), undefined);
}

/** Each cup on a door or flap that no plate on the panels it hangs on meets at its height plus `hang.dy`. */
function unpairedCups(site: PanelSite): Finding[] {
  const { panel } = site;
  if (!panel.hang) return [];
  const { on, dy } = panel.hang;
  const plates = on.flatMap((id) => {
    const target = site.job.panels.get(id);
    return target ? withPurpose(site, target.placements, 'mounting-plate').map((p) => p.y) : [];
  });
  return withPurpose(site, panel.placements, 'hinge-cup').flatMap((cup) => {
    const wanted = cup.y + dy;
    const plate = nearest(plates, wanted);
    if (plate !== undefined && Math.abs(plate - wanted) <= PAIRING_TOLERANCE) return [];
    const message = `Hinge ${cup.id} at ${mm(cup.y)} on ${panel.id} meets no mounting plate: with the ${panel.role} ${mm(dy)} up on ${on.join(', ')}, its plate belongs at ${mm(wanted)}${plate === undefined ? ', and there is none' : `, the nearest is at ${mm(plate)}`}.`;
    const fix =
      plate === undefined
        ? { message: `Put a mounting plate at height ${formatNumber(wanted)} on ${on[0]}.` }
        : { message: `Move the hinge to y ${formatNumber(plate - dy)}, or its plate to ${formatNumber(wanted)}.`, at: { x: cup.x, y: plate - dy } };
    return [report(site, 'hinge-unpaired', 'error', message, [], fix, [cup.id])];
  });
}

/** Each plate on a panel that no cup of the doors and flaps hanging on it meets. */
function unpairedPlates(site: PanelSite): Finding[] {
  const { panel } = site;
  const fronts = site.job.hungOn.get(panel.id) ?? [];
  const cups = fronts.flatMap((front) => withPurpose(site, front.placements, 'hinge-cup').map((c) => c.y + (front.hang?.dy ?? 0)));
  return withPurpose(site, panel.placements, 'mounting-plate').flatMap((plate) => {
    const cup = nearest(cups, plate.y);
    if (cup !== undefined && Math.abs(cup - plate.y) <= PAIRING_TOLERANCE) return [];
    const message =
      fronts.length === 0
        ? `Mounting plate ${plate.id} at ${mm(plate.y)} on ${panel.id} has no hinge: no door or flap hangs on this panel.`
        : `Mounting plate ${plate.id} at ${mm(plate.y)} on ${panel.id} meets no hinge of ${fronts.map((f) => f.id).sort().join(', ')}${cup === undefined ? '' : `; the nearest cup comes to ${mm(cup)}`}.`;
    const fix =
      fronts.length === 0
        ? { message: "Name this panel in the door's or flap's hang.on, or remove the plate." }
        : { message: cup === undefined ? 'Add the hinge it carries, or remove the plate.' : `Move the plate to y ${formatNumber(cup)}.`, at: cup === undefined ? undefined : { x: plate.x, y: cup } };
    return [report(site, 'hinge-unpaired', 'error', message, [], fix.at ? fix : { message: fix.message }, [plate.id])];
  });
}

/**
 * hinge-unpaired: every cup on a door or flap has its mounting plate on a panel it hangs on, at the cup's
 * height plus the front's `hang.dy` (within 0.5 mm), and every mounting plate its cup. A front that names no
 * panel it hangs on is not paired, since nothing says where its plates belong.
 */
export function checkHingeUnpaired(site: PanelSite): Finding[] {
  return [...unpairedCups(site), ...unpairedPlates(site)];
}
