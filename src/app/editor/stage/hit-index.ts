import Flatbush from 'flatbush';
import { planBox, type Box } from '../../../../shared/layout/bore';
import type { PanelLayout } from '../../../../shared/layout/panel-layout';
import type { Face, Panel } from '../../../../shared/model/job-document';

/** Something the pointer can take hold of: a placement (by its whole footprint) or a loose bore. */
export interface Hit {
  kind: 'placement' | 'bore';
  id: string;
  face: Face | 'edge';
  box: Box;
}

/** Half the side of the square drawn for a placement whose fitting is not in the catalog, mm. */
export const PLACEHOLDER_HALF = 12;

function union(boxes: Box[]): Box {
  return boxes.reduce<Box>((u, b) => [Math.min(u[0], b[0]), Math.min(u[1], b[1]), Math.max(u[2], b[2]), Math.max(u[3], b[3])], [Infinity, Infinity, -Infinity, -Infinity]);
}

/**
 * Every item the pointer can pick on a panel, with its plan box in mm; or only those of `only` (the
 * selection, outlined on every move of a drag without boxing the panel's other bores).
 */
export function hitItems(panel: Panel, layout: PanelLayout, only?: { placements: ReadonlySet<string>; bores: ReadonlySet<string> }): Hit[] {
  const items: Hit[] = [];
  // With only placements selected (a drag of fittings), the panel's loose bores, thousands on a perforated panel, are not walked.
  if (!only || only.bores.size > 0)
    for (const bore of layout.bores)
      if (!bore.placement && (!only || only.bores.has(bore.id))) items.push({ kind: 'bore', id: bore.id, face: bore.kind === 'face' ? bore.face : 'edge', box: planBox(bore, panel) });
  for (const placed of layout.placed) {
    if (only && !only.placements.has(placed.placement.id)) continue;
    const boxes = [...placed.bores.map((b) => planBox(b, panel)), ...placed.keepOuts.map((k) => k.box)];
    items.push({ kind: 'placement', id: placed.placement.id, face: placed.placement.face, box: union(boxes) });
  }
  for (const p of layout.unknown)
    if (!only || only.placements.has(p.id))
      items.push({ kind: 'placement', id: p.id, face: p.face, box: [p.x - PLACEHOLDER_HALF, p.y - PLACEHOLDER_HALF, p.x + PLACEHOLDER_HALF, p.y + PLACEHOLDER_HALF] });
  return items;
}

/**
 * A spatial index of the pickable items (flatbush), so that picking and box selection cost a search,
 * not a walk over every bore, and never Konva's hit canvas.
 */
export class HitIndex {
  private readonly index: Flatbush | undefined;

  constructor(private readonly items: readonly Hit[]) {
    const finite = items.every((h) => h.box.every(Number.isFinite));
    if (items.length === 0 || !finite) return;
    this.index = new Flatbush(items.length);
    for (const { box } of items) this.index.add(box[0], box[1], box[2], box[3]);
    this.index.finish();
  }

  /** The item under a point (within `reach` mm): on the face shown first, then the smallest. */
  pick(x: number, y: number, reach: number, face: Face): Hit | undefined {
    const found = this.search(x - reach, y - reach, x + reach, y + reach);
    const area = (h: Hit) => (h.box[2] - h.box[0]) * (h.box[3] - h.box[1]);
    const rank = (h: Hit) => (h.face === face || h.face === 'edge' ? 0 : 1);
    return found.sort((a, b) => rank(a) - rank(b) || area(a) - area(b))[0];
  }

  /** Every item wholly inside a box, as a box selection takes them. */
  inside(minX: number, minY: number, maxX: number, maxY: number): Hit[] {
    return this.search(minX, minY, maxX, maxY).filter((h) => h.box[0] >= minX && h.box[1] >= minY && h.box[2] <= maxX && h.box[3] <= maxY);
  }

  private search(minX: number, minY: number, maxX: number, maxY: number): Hit[] {
    return this.index ? this.index.search(minX, minY, maxX, maxY).map((i) => this.items[i]) : [];
  }
}
