import { hingesNeeded } from '../compute/hinge-count';
import { panelMass } from '../compute/panel-mass';
import type { DraftFinding } from './finding';
import { report, type PanelSite } from './panel-site';
import { formatNumber } from './wording';

/**
 * hinge-count: a door or flap with fewer hinges than its hinge-edge length and mass need (trade-reference §2,
 * common practice); beyond the rule, a warning to ask the hinge maker; and, on a door, a warning when the
 * outer hinges are no further apart than the door is wide.
 */
export function checkHingeCount(site: PanelSite): DraftFinding[] {
  const { panel } = site;
  const material = site.job.materials.get(panel.material);
  if ((panel.role !== 'door' && panel.role !== 'flap') || !material) return [];
  const what = panel.role === 'door' ? 'Door' : 'Flap';
  const mass = panelMass(panel, material.density) + (panel.handleMass ?? 0);
  const hinges = site.layout.placed.filter((p) => p.fitting.purpose === 'hinge-cup').map((p) => p.placement);
  const ids = hinges.map((h) => h.id);
  const size = `${site.job.length(panel.height)} along its hinge edge, ${formatNumber(mass)} kg`;
  const needed = hingesNeeded(panel.height, mass);
  if (needed === null) {
    const message = `${what} ${panel.id} (${size}) is beyond the hinge rule of 2400 mm and 22 kg.`;
    return [report(site, 'hinge-count', 'warning', message, [], { advice: 'Ask the hinge maker how many hinges it needs.' }, ids)];
  }
  if (hinges.length < needed) {
    const message = `${what} ${panel.id} (${size}) has ${hinges.length} hinge${hinges.length === 1 ? '' : 's'}; it needs ${needed}.`;
    return [report(site, 'hinge-count', 'error', message, [], { advice: `Add ${needed - hinges.length} more, spread along the hinge edge.` }, ids)];
  }
  const ys = hinges.map((h) => h.y);
  const spread = Math.max(...ys) - Math.min(...ys);
  if (panel.role === 'door' && spread <= panel.width) {
    const message = `The outer hinges of door ${panel.id} are ${site.job.length(spread)} apart, no more than its ${site.job.length(panel.width)} width: the door may sag.`;
    return [report(site, 'hinge-count', 'warning', message, [], { advice: 'Spread the top and bottom hinges further apart.' }, ids)];
  }
  return [];
}
