import type { PanelKeepOut } from '../layout/keep-out';
import { pairKey } from '../layout/panel-layout';
import { indexBoxes } from './box-index';
import type { DraftFinding } from './finding';
import { report, type PanelSite } from './panel-site';
import { placementName } from './wording';

/** Rectangles that merely touch do not overlap. */
const TOUCH = 1e-6;

interface Overlap {
  a: string;
  b: string;
  face: string;
  width: number;
  height: number;
}

/** Every overlap of keep-outs of two placements on one face, the largest per pair of placements. */
function overlaps(keepOuts: PanelKeepOut[]): Overlap[] {
  const boxes = new Float64Array(4 * keepOuts.length);
  keepOuts.forEach((k, i) => boxes.set(k.box, 4 * i));
  const index = indexBoxes(boxes);
  const largest = new Map<string, Overlap>();
  keepOuts.forEach((k, i) => {
    index.search(k.box[0], k.box[1], k.box[2], k.box[3], (j) => {
      const other = keepOuts[j];
      if (j <= i || other.face !== k.face || other.placement === k.placement) return;
      const width = Math.min(k.box[2], other.box[2]) - Math.max(k.box[0], other.box[0]);
      const height = Math.min(k.box[3], other.box[3]) - Math.max(k.box[1], other.box[1]);
      if (width <= TOUCH || height <= TOUCH) return;
      const key = pairKey(k.placement, other.placement);
      const seen = largest.get(key);
      const [a, b] = [k.placement, other.placement].sort();
      if (!seen || width * height > seen.width * seen.height) largest.set(key, { a, b, face: k.face, width, height });
    });
  });
  return [...largest.values()];
}

/**
 * keepouts-overlap: the bodies of two placed fittings on the same face need the same area
 * (design.md §2: two keep-outs must not overlap). One finding per pair of placements.
 */
export function checkKeepOutsOverlap(site: PanelSite): DraftFinding[] {
  const keepOuts: PanelKeepOut[] = [];
  for (const placed of site.layout.placed) for (const k of placed.keepOuts) if (k.box.every(Number.isFinite)) keepOuts.push(k);
  if (keepOuts.length < 2) return [];
  const name = (id: string) => placementName(site.layout.placed.find((p) => p.placement.id === id)!);
  return overlaps(keepOuts).map(({ a, b, face, width, height }) => {
    const message = `The bodies of ${name(a)} and ${name(b)} on face ${face} overlap by ${site.job.length(width)} × ${site.job.length(height)}.`;
    const advice = `Move one of them ${site.job.length(Math.min(width, height))} away from the other.`;
    return report(site, 'keepouts-overlap', 'error', message, [], { advice }, [a, b]);
  });
}
