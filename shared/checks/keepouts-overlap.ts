import Flatbush from 'flatbush';
import type { PanelKeepOut } from '../layout/keep-out';
import { pairKey } from '../layout/panel-layout';
import type { Finding } from './finding';
import { report, type PanelSite } from './panel-site';
import { mm, placementName } from './wording';

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
  const index = new Flatbush(keepOuts.length);
  for (const k of keepOuts) index.add(...k.box);
  index.finish();
  const largest = new Map<string, Overlap>();
  keepOuts.forEach((k, i) => {
    for (const j of index.search(...k.box)) {
      const other = keepOuts[j];
      if (j <= i || other.face !== k.face || other.placement === k.placement) continue;
      const width = Math.min(k.box[2], other.box[2]) - Math.max(k.box[0], other.box[0]);
      const height = Math.min(k.box[3], other.box[3]) - Math.max(k.box[1], other.box[1]);
      if (width <= TOUCH || height <= TOUCH) continue;
      const key = pairKey(k.placement, other.placement);
      const seen = largest.get(key);
      const [a, b] = [k.placement, other.placement].sort();
      if (!seen || width * height > seen.width * seen.height) largest.set(key, { a, b, face: k.face, width, height });
    }
  });
  return [...largest.values()];
}

/**
 * keepouts-overlap: the bodies of two placed fittings on the same face need the same area
 * (design.md §2: two keep-outs must not overlap). One finding per pair of placements.
 */
export function checkKeepOutsOverlap(site: PanelSite): Finding[] {
  const keepOuts = site.layout.placed.flatMap((p) => p.keepOuts).filter((k) => k.box.every(Number.isFinite));
  if (keepOuts.length < 2) return [];
  const names = new Map(site.layout.placed.map((p) => [p.placement.id, placementName(p)]));
  return overlaps(keepOuts).map(({ a, b, face, width, height }) => {
    const message = `The bodies of ${names.get(a)} and ${names.get(b)} on face ${face} overlap by ${mm(width)} × ${mm(height)}.`;
    const fix = { message: `Move one of them ${mm(Math.min(width, height))} away from the other.` };
    return report(site, 'keepouts-overlap', 'error', message, [], fix, [a, b]);
  });
}
