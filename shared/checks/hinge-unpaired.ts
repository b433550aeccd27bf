import type { Panel, Placement } from '../model/job-document';
import type { DraftFinding, Fix } from './finding';
import { PAIRING_TOLERANCE, withPurpose } from './hinge-pairs';
import { report, type PanelSite } from './panel-site';

/** The nearest of some placements by height, or undefined when there are none. */
function nearest<T extends { y: number }>(items: readonly T[], y: number): T | undefined {
  return items.reduce<T | undefined>((best, p) => (best === undefined || Math.abs(p.y - y) < Math.abs(best.y - y) ? p : best), undefined);
}

function move(site: PanelSite, panel: Panel, placement: Placement, y: number, what: string): Fix {
  return {
    message: `Move ${what} ${placement.id} on ${panel.id} to y ${site.job.coordinate(y)}.`,
    edits: [{ kind: 'move-placement', panel: panel.id, placement: placement.id, x: placement.x, y }],
  };
}

/** Each cup on a door or flap that no plate on the panels it hangs on meets at its height plus `hang.dy`. */
function unpairedCups(site: PanelSite): DraftFinding[] {
  const { panel } = site;
  if (!panel.hang) return [];
  const { on, dy } = panel.hang;
  const plates = on.flatMap((id) => {
    const target = site.job.panels.get(id);
    return target ? withPurpose(site.job, target, 'mounting-plate').map((plate) => ({ y: plate.y, plate, target })) : [];
  });
  return withPurpose(site.job, panel, 'hinge-cup').flatMap((cup) => {
    const wanted = cup.y + dy;
    const plate = nearest(plates, wanted);
    if (plate !== undefined && Math.abs(plate.y - wanted) <= PAIRING_TOLERANCE) return [];
    const message = `Hinge ${cup.id} at ${site.job.length(cup.y)} on ${panel.id} meets no mounting plate: with the ${panel.role} ${site.job.length(dy)} up on ${on.join(', ')}, its plate belongs at ${site.job.length(wanted)}${plate === undefined ? ', and there is none' : `, the nearest is at ${site.job.length(plate.y)}`}.`;
    const remedy =
      plate === undefined
        ? { advice: `Put a mounting plate at height ${site.job.coordinate(wanted)} on ${on[0]}.` }
        : {
            candidates: () => [[move(site, panel, cup, plate.y - dy, 'hinge')], [move(site, plate.target, plate.plate, wanted, 'plate')]],
            advice: `Put a mounting plate at height ${site.job.coordinate(wanted)} on ${on[0]}, or move the hinge to meet a plate no other hinge uses.`,
          };
    return [report(site, 'hinge-unpaired', 'error', message, [], remedy, [cup.id])];
  });
}

/** Each plate on a panel that no cup of the doors and flaps hanging on it meets. */
function unpairedPlates(site: PanelSite): DraftFinding[] {
  const { panel } = site;
  const fronts = site.job.hungOn.get(panel.id) ?? [];
  const cups = fronts.flatMap((front) => withPurpose(site.job, front, 'hinge-cup').map((cup) => ({ y: cup.y + (front.hang?.dy ?? 0), cup, front })));
  return withPurpose(site.job, panel, 'mounting-plate').flatMap((plate) => {
    const cup = nearest(cups, plate.y);
    if (cup !== undefined && Math.abs(cup.y - plate.y) <= PAIRING_TOLERANCE) return [];
    const message =
      fronts.length === 0
        ? `Mounting plate ${plate.id} at ${site.job.length(plate.y)} on ${panel.id} has no hinge: no door or flap hangs on this panel.`
        : `Mounting plate ${plate.id} at ${site.job.length(plate.y)} on ${panel.id} meets no hinge of ${fronts.map((f) => f.id).sort().join(', ')}${cup === undefined ? '' : `; the nearest cup comes to ${site.job.length(cup.y)}`}.`;
    const remedy =
      fronts.length === 0
        ? { advice: "Name this panel in the door's or flap's hang.on, or remove the plate." }
        : cup === undefined
          ? { advice: 'Add the hinge it carries, or remove the plate.' }
          : {
              candidates: () => [[move(site, panel, plate, cup.y, 'plate')], [move(site, cup.front, cup.cup, plate.y - (cup.front.hang?.dy ?? 0), 'hinge')]],
              advice: 'Add the hinge it carries, or remove the plate.',
            };
    return [report(site, 'hinge-unpaired', 'error', message, [], remedy, [plate.id])];
  });
}

/**
 * hinge-unpaired: every cup on a door or flap has its mounting plate on a panel it hangs on, at the cup's
 * height plus the front's `hang.dy` (within 0.5 mm), and every mounting plate its cup. A front that names no
 * panel it hangs on is not paired, since nothing says where its plates belong.
 */
export function checkHingeUnpaired(site: PanelSite): DraftFinding[] {
  return [...unpairedCups(site), ...unpairedPlates(site)];
}
