import { edgeLength, edgeSpan, type PanelBore } from '../layout/bore';
import { EDGE_NAME, edgeClearance, nearestEdge } from './edges';
import type { DraftFinding } from './finding';
import { isMeasurable, report, type PanelSite } from './panel-site';
import { boreName, capitalize } from './wording';

/** Why a bore does not fit in the panel, or null when it does. */
function outsideBy(site: PanelSite, bore: PanelBore): string | null {
  if (!isMeasurable(bore)) return 'has no valid position or size';
  const { panel } = site;
  if (bore.kind === 'face') {
    if (edgeClearance(bore, panel) >= 0) return null;
    const nearest = nearestEdge(bore, panel);
    return -nearest.distance >= bore.diameter
      ? `lies off the panel, beyond ${EDGE_NAME[nearest.edge]}`
      : `reaches ${site.job.length(-nearest.distance)} past ${EDGE_NAME[nearest.edge]}`;
  }
  const r = bore.diameter / 2;
  if (bore.depth >= edgeSpan(bore.edge, panel)) return 'runs right through to the opposite edge';
  const along = edgeLength(bore.edge, panel);
  if (bore.at - r < 0 || bore.at + r > along) return `does not fit within the ${site.job.length(along)} length of its edge`;
  if (bore.z - r < 0 || bore.z + r > panel.thickness) return `does not fit within the ${site.job.length(panel.thickness)} thickness`;
  return null;
}

/**
 * outside-panel: a bore that does not lie wholly within the panel, or has no valid numbers. One finding per
 * loose bore and one per placement, naming all of its bores that stray. A panel without a drillable size
 * gets a single finding, since nothing on it can be placed.
 */
export function checkOutsidePanel(site: PanelSite): DraftFinding[] {
  const { panel } = site;
  if (!site.sized) {
    const message = `Panel ${panel.id} has no drillable size (${panel.width} × ${panel.height} × ${panel.thickness} mm); set its width, height and thickness first.`;
    return [report(site, 'outside-panel', 'error', message, [], {}, panel.placements.map((p) => p.id))];
  }
  const strays = new Map<string, { bore: PanelBore; why: string }[]>();
  for (const bore of site.layout.bores) {
    const why = outsideBy(site, bore);
    if (why === null) continue;
    const key = bore.placement ?? `\n${bore.id}`;
    strays.set(key, [...(strays.get(key) ?? []), { bore, why }]);
  }
  return [...strays.values()].map((unsorted) => {
    // Named by the first bore id, so the words do not depend on the order of the document.
    const list = unsorted.sort((a, b) => (a.bore.id < b.bore.id ? -1 : 1));
    const [{ bore, why }] = list;
    const more = list.length > 1 ? ` (and ${list.length - 1} more of its bores)` : '';
    const owner = bore.placement ? `Placement ${bore.placement}: ` : '';
    const message = `${owner}${owner ? boreName(bore) : capitalize(boreName(bore))} ${why}${more}.`;
    const advice = bore.placement ? 'Move the placement onto the panel.' : 'Move the bore onto the panel or correct its numbers.';
    return report(site, 'outside-panel', 'error', message, list.map((s) => s.bore), { advice });
  });
}
