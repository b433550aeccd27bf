import type { Catalog, Fitting } from '../catalog/fitting';
import type { LengthWording } from '../checks/wording';
import { cupCentreFromEdge, overlayFor } from '../compute/hinge-geometry';
import { explain, type Explained } from './explained';

export type HingeFitting = Extract<Fitting, { purpose: 'hinge-cup' }>;
export type PlateFitting = Extract<Fitting, { purpose: 'mounting-plate' }>;
export type OverlayKind = HingeFitting['hinge']['overlay'];

/** A hinge and plate of the catalog that give a wanted overlay, and the cup-boring distance that does it. */
export interface HingeChoice {
  hinge: HingeFitting;
  plate: PlateFitting;
  overlay: Explained;
  boringDistance: Explained;
  plateHeight: Explained;
  cupFromEdge: Explained;
}

function hingesOf(catalog: Catalog, kind: OverlayKind): HingeFitting[] {
  return [...catalog.values()].filter((f): f is HingeFitting => f.purpose === 'hinge-cup' && f.hinge.overlay === kind);
}

/**
 * Chooses the hinge, the mounting plate and the cup-boring distance B for an overlay, from
 * overlay = hinge constant + B − plate height (trade-reference §2, common practice): of the pairs whose B
 * falls in the hinge's range, the one with B nearest the middle of that range, leaving the bench room to
 * adjust either way. Returns the reason as an error when the catalog has none.
 */
export function chooseHinge(
  words: LengthWording,
  catalog: Catalog,
  kind: OverlayKind,
  wanted: Explained,
  hingeId: string | undefined,
): HingeChoice | { error: string } {
  const what = kind === 'inset' ? 'an inset' : `a ${kind}-overlay`;
  const named = hingeId === undefined ? undefined : catalog.get(hingeId);
  if (hingeId !== undefined && (named?.purpose !== 'hinge-cup' || named.hinge.overlay !== kind)) {
    return { error: `fronts.hinge: "${hingeId}" is not ${what} hinge of the catalog` };
  }
  const hinges = named ? [named as HingeFitting] : hingesOf(catalog, kind);
  if (hinges.length === 0) {
    return { error: `fronts.overlay: the catalog has no ${kind === 'inset' ? 'inset' : `${kind}-overlay`} hinge; import one from the hinge maker's data` };
  }
  const plates = [...catalog.values()].filter((f): f is PlateFitting => f.purpose === 'mounting-plate');
  let best: { hinge: HingeFitting; plate: PlateFitting; b: number; off: number } | undefined;
  for (const hinge of hinges) {
    const { min, max } = hinge.hinge.boringDistance;
    for (const plate of plates) {
      const b = wanted.value - overlayFor(hinge.hinge.constant, 0, plate.plate.height);
      const off = Math.abs(b - (min + max) / 2);
      if (b >= min && b <= max && (!best || off < best.off)) best = { hinge, plate, b, off };
    }
  }
  if (!best) {
    const [hinge] = hinges;
    const heights = plates.map((p) => p.plate.height);
    const lowest = overlayFor(hinge.hinge.constant, hinge.hinge.boringDistance.min, Math.max(...heights));
    const highest = overlayFor(hinge.hinge.constant, hinge.hinge.boringDistance.max, Math.min(...heights));
    return {
      error: `fronts.reveal: the fronts need ${words.length(wanted.value)} overlay (${wanted.why}), but ${hinge.name} with the catalog's plates gives ${words.length(lowest)} to ${words.length(highest)}; change the reveal or import a hinge or plate that reaches it`,
    };
  }
  const { hinge, plate, b } = best;
  const cupBore = hinge.bores.find((bore) => bore.id === hinge.hinge.cupBore);
  const cupDiameter = cupBore?.diameter;
  return {
    hinge,
    plate,
    overlay: wanted,
    boringDistance: explain(
      b,
      `overlay ${words.length(wanted.value)} = hinge constant ${words.length(hinge.hinge.constant)} + B − plate ${words.length(plate.plate.height)}, B within ${words.length(hinge.hinge.boringDistance.min)} to ${words.length(hinge.hinge.boringDistance.max)} and nearest its middle`,
    ),
    plateHeight: explain(plate.plate.height, `the plate that puts B nearest the middle of the hinge's range (${plate.name})`),
    cupFromEdge: explain(cupCentreFromEdge(b, cupDiameter), `B ${words.length(b)} plus half the Ø${cupDiameter} cup`),
  };
}
