import type { LengthWording } from '../checks/wording';
import { maxShelfSpan, shelfDeflection } from '../compute/shelf-sag';
import { holeHeights } from '../grid/system-grid';
import type { Panel, Placement } from '../model/job-document';
import type { ShelvesInput } from './carcass-plan-input';
import { clearOfBodies } from './clear-of-bodies';
import { connectorColumns, jointPlacements } from './construction';
import { explain, type Explained } from './explained';
import { carcassPanel, noPlacements, type PartPlacements, type PlanContext } from './plan-parts';

/** One planned shelf, where it sits and how far it sags. */
export interface ShelfPlan {
  panel: string;
  kind: 'fixed' | 'adjustable';
  /** Side height of the shelf's centre (fixed) or of the pins it rests on (adjustable). */
  y: Explained;
  span: Explained;
  depth: Explained;
  sag: Explained;
  limit: Explained;
  maxSpan: Explained;
  ok: boolean;
}

/** The shelf-pin rows: the heights drilled on both rows of both sides, and those left out and why. */
export interface PinRows {
  heights: number[];
  skipped: { y: number; why: string }[];
}

const SHELF_PIN = 'shelf-pin-5';

/** The sag of a shelf under the AWS general load against span / sagRatio (trade-reference §5). */
function sagOf(ctx: PlanContext, span: number, depth: number): Pick<ShelfPlan, 'sag' | 'limit' | 'maxSpan' | 'ok'> {
  const { thickness, board } = ctx.box;
  const ratio = ctx.input.limits.sagRatio;
  const sag = shelfDeflection({ span, depth, thickness, modulus: board.modulus });
  const longest = maxShelfSpan({ thickness, modulus: board.modulus }, ratio);
  return {
    sag: explain(sag, `δ = 5wL⁴/(384EI) under 40 lb/ft² (1.9 kPa), ${board.name} E = ${board.modulus} N/mm²`),
    limit: explain(span / ratio, `span / ${ratio}`),
    maxSpan: explain(longest, `the longest ${ctx.words.length(thickness)} ${board.name} span within span / ${ratio}`),
    ok: sag <= span / ratio,
  };
}

/**
 * A fixed shelf joined between the sides like top and bottom, centred at side height `y`: its panel with
 * the joint's bores in its ends, the bores it puts in each side, and its sag.
 */
export function fixedShelf(ctx: PlanContext, y: number, part: string, label: string, why: string): { panel: Panel; side: Placement[]; plan: ShelfPlan } {
  const { input, box } = ctx;
  const span = box.innerWidth.value;
  const depth = box.shelfDepth.value;
  const joint = jointPlacements(input.construction, connectorColumns(box.grid), y, span, part);
  const panel = carcassPanel(ctx, part, label, 'shelf', { width: depth, height: span }, { placements: joint.part });
  return {
    panel,
    side: joint.side,
    plan: { panel: panel.id, kind: 'fixed', y: explain(y, why), span: box.innerWidth, depth: box.shelfDepth, ...sagOf(ctx, span, depth) },
  };
}

/** The side heights a shelf may take, nearest first to evenly spaced targets, one per shelf. */
function spread(count: number, heights: number[], low: number, high: number): number[] {
  return Array.from({ length: count }, (_, i) => {
    const target = low + ((high - low) * (i + 1)) / (count + 1);
    return heights.reduce((a, b) => (Math.abs(b - target) < Math.abs(a - target) ? b : a));
  });
}

/**
 * Shelves between the sides. Adjustable ones rest on shelf pins drilled at every system hole of the asked
 * range on both rows of both sides, leaving out the heights where a pin would meet a plate, a mechanism,
 * a runner or a joint; they drop in with the asked play at each end. Fixed ones are joined like top and
 * bottom at a system hole clear of the same. Each shelf's sag is worked out.
 */
export function planShelves(
  ctx: PlanContext,
  shelves: Exclude<ShelvesInput, { type: 'none' }>,
  sides: PartPlacements,
): { panels: Panel[]; parts: PartPlacements; plans: ShelfPlan[]; pins?: PinRows } | { errors: string[] } {
  const { input, box, catalog } = ctx;
  const T = box.thickness;
  const side = { width: input.depth, height: input.height, thickness: T };
  const clear = [sides.left, sides.right].map((p) => clearOfBodies(p, catalog, side, input.system, input.limits.minWeb));
  const [front, rear] = box.grid.rows;
  const columns = shelves.type === 'fixed' ? connectorColumns(box.grid) : [front, rear];
  const diameter = shelves.type === 'fixed' ? 8 : input.system.holeDiameter;
  const free = (y: number) => clear.every((c) => columns.every((x) => c({ x, y, diameter })));
  const low = shelves.type === 'adjustable' ? (shelves.from ?? T + input.system.pitch) : T + input.system.pitch;
  const high = shelves.type === 'adjustable' ? (shelves.to ?? input.height - T - input.system.pitch) : input.height - T - input.system.pitch;
  const inRange = holeHeights(box.grid).filter((y) => y >= low && y <= high);
  const heights = inRange.filter(free);
  if (heights.length < shelves.count) return { errors: [`shelves: ${shelves.count} shelves do not fit the free system holes between ${ctx.words.length(low)} and ${ctx.words.length(high)}`] };
  const parts = noPlacements();
  const panels: Panel[] = [];
  const plans: ShelfPlan[] = [];
  const ys = spread(shelves.count, heights, T, input.height - T);
  ys.forEach((y, i) => {
    if (shelves.type === 'fixed') {
      const shelf = fixedShelf(ctx, y, `shelf-${i + 1}`, `fixed shelf ${i + 1}`, 'the free system hole nearest an even spacing; the joint is centred on it');
      parts.left.push(...shelf.side);
      parts.right.push(...shelf.side);
      panels.push(shelf.panel);
      plans.push(shelf.plan);
      return;
    }
    const span = box.innerWidth.value - 2 * shelves.play;
    const depth = box.shelfDepth.value;
    const panel = carcassPanel(ctx, `shelf-${i + 1}`, `adjustable shelf ${i + 1}`, 'shelf', { width: depth, height: span });
    panels.push(panel);
    plans.push({
      panel: panel.id,
      kind: shelves.type,
      y: explain(y, 'the pin height nearest an even spacing; it can be moved to any drilled height'),
      span: explain(span, `${box.innerWidth.why}, less ${ctx.words.length(shelves.play)} play at each end`),
      depth: box.shelfDepth,
      ...sagOf(ctx, span, depth),
    });
  });
  if (shelves.type === 'fixed') return { panels, parts, plans };
  const pins = (y: number, k: number): Placement[] =>
    [front, rear].map((x, j) => ({ id: `pin-${j === 0 ? 'front' : 'rear'}-${k + 1}`, fitting: SHELF_PIN, x, y, face: 'A', rotation: 0 }));
  const placements = heights.flatMap(pins);
  parts.left.push(...placements);
  parts.right.push(...placements);
  const skipped = inRange.filter((y) => !free(y)).map((y) => ({ y, why: 'a pin here would meet a plate, mechanism, runner or joint' }));
  return { panels, parts, plans, pins: { heights, skipped } };
}
