import { maxShelfSpan, shelfDeflection } from '../compute/shelf-sag';
import type { DraftFinding } from './finding';
import { report, type PanelSite } from './panel-site';
import { formatNumber } from './wording';

/**
 * shelf-sag: a shelf that sags more than span/sagRatio (L/144 by default, AWS) under the AWS general load
 * of 40 lb/ft², resting on its two ends. In a shelf's frame its span is its height and its depth its width.
 */
export function checkShelfSag(site: PanelSite): DraftFinding[] {
  const { panel } = site;
  const material = site.job.materials.get(panel.material);
  if (panel.role !== 'shelf' || !material) return [];
  const ratio = site.limits.sagRatio;
  const sag = shelfDeflection({ span: panel.height, depth: panel.width, thickness: panel.thickness, modulus: material.modulus });
  const limit = panel.height / ratio;
  if (sag <= limit) return [];
  const longest = maxShelfSpan({ thickness: panel.thickness, modulus: material.modulus }, ratio);
  const message = `Shelf ${panel.id} (${site.job.length(panel.height)} span, ${site.job.length(panel.thickness)} ${material.name}) sags ${site.job.length(sag)} under 40 lb/ft² (1.9 kPa), more than L/${formatNumber(ratio)} = ${site.job.length(limit)}.`;
  const advice = `Keep its span under ${site.job.length(Math.floor(longest))}, support it in the middle, or use a thicker or stiffer board.`;
  return [report(site, 'shelf-sag', 'warning', message, [], { advice })];
}
