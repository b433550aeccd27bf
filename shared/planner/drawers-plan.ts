import type { Fitting } from '../catalog/fitting';
import type { LengthWording } from '../checks/wording';
import { holeHeights } from '../grid/system-grid';
import type { Placement } from '../model/job-document';
import type { DrawersInput } from './carcass-plan-input';
import type { FrontsStep } from './doors-plan';
import { explain, type Explained } from './explained';
import { frontSizes } from './front-sizes';
import { carcassPanel, frontName, noPlacements, openingInside, type PlanContext } from './plan-parts';

type Runner = Extract<Fitting, { purpose: 'runner' }>;

/** One planned drawer: its front and the runner that carries it. */
export interface DrawerPlan {
  panel: string;
  width: Explained;
  height: Explained;
  runner: { fitting: string; y: Explained };
}

/** The body of a fitting as [lowest x, highest x, lowest y, highest y] about its anchor. */
function reach(f: Fitting): [number, number, number, number] {
  return f.keepOuts.reduce<[number, number, number, number]>(
    ([x0, x1, y0, y1], k) => [Math.min(x0, k.x), Math.max(x1, k.x + k.width), Math.min(y0, k.y), Math.max(y1, k.y + k.height)],
    [0, 0, 0, 0],
  );
}

/**
 * A stack of full-overlay drawer fronts of equal height, and for each a pair of runners: the longest of the
 * catalog whose body stays clear of the back, screwed on the front row (trade-reference §6) at the lowest
 * system hole above the front's lower edge, so the drawer box sits behind its front. The drawer boxes
 * themselves are left to the shop's drawer system.
 */
export function planDrawers(ctx: PlanContext, drawers: DrawersInput): FrontsStep<DrawerPlan> | { errors: string[] } {
  const { input, box, catalog } = ctx;
  const T = box.thickness;
  const n = drawers.count;
  const one = frontSizes(ctx.words, 'full', 1, drawers.reveal, { width: input.width, height: input.height, thickness: T });
  // Down to half a millimetre, a size a bench can cut; what is left widens the top reveal.
  const { from, to, part: section } = ctx.opening;
  const span = to - from;
  const inside = openingInside(ctx);
  const frontHeight = Math.floor(((span - n * drawers.reveal) / n) * 2) / 2;
  if (frontHeight < 2 * input.system.pitch) return { errors: [`fronts.count: ${n} drawers leave fronts of ${ctx.words.length(frontHeight)}, too low for a drawer`] };
  const front = box.rows.front.value;
  const runners = [...catalog.values()]
    .filter((f): f is Runner => f.purpose === 'runner' && front + reach(f)[1] <= box.shelfDepth.value)
    .sort((a, b) => b.runner.length - a.runner.length);
  const [runner] = runners;
  if (!runner) return { errors: [`depth: no runner of the catalog fits the ${ctx.words.length(box.shelfDepth.value)} inside depth`] };
  const [, , below, above] = reach(runner);
  const holes = holeHeights(box.grid);
  const material = ctx.materials.get(drawers.material ?? box.board.id) ?? box.board;
  const parts = noPlacements();
  const plans: DrawerPlan[] = [];
  const panels = [];
  for (let i = 0; i < n; i++) {
    const lower = from + drawers.reveal / 2 + i * (frontHeight + drawers.reveal);
    const y = holes.find((h) => h + below >= Math.max(lower, inside.low));
    if (y === undefined || y + above > lower + frontHeight) return { errors: [`height: no system hole carries the runner of drawer ${i + 1}`] };
    const placement: Placement = { id: `${section ? `${section}-` : ''}runner-${i + 1}`, fitting: runner.id, x: front, y, face: 'A', rotation: 0 };
    parts.left.push(placement);
    parts.right.push(placement);
    const name = frontName(ctx, `drawer-${i + 1}`, `drawer front ${i + 1}`);
    const panel = carcassPanel(ctx, name.part, name.label, 'drawer-front', { width: one.width.value, height: frontHeight }, { material: material.id });
    panels.push(panel);
    plans.push({
      panel: panel.id,
      width: one.width,
      height: explain(frontHeight, `the ${ctx.words.length(span)} height less ${n} reveals of ${ctx.words.length(drawers.reveal)}, shared by ${n}, down to 0.5 mm`),
      runner: { fitting: runner.id, y: explain(y, `the lowest system hole that keeps the runner's body above ${ctx.words.length(Math.max(lower, inside.low))}, behind its front; ${runner.name}, the longest that clears the back`) },
    });
  }
  return { panels, parts, plans, notes: [] };
}
