import type { LengthWording } from '../checks/wording';
import { HINGE_RULE, hingesNeeded } from '../compute/hinge-count';
import { panelMass } from '../compute/panel-mass';
import type { Panel } from '../model/job-document';
import type { DoorsInput } from './carcass-plan-input';
import { explain, type Explained } from './explained';
import { frontSizes, openingBand } from './front-sizes';
import { chooseHinge, type HingeChoice } from './hinge-choice';
import { hingeHeights, type HingeHeight } from './hinge-heights';
import { cupPlacements, platePlacements } from './hinge-placements';
import { carcassPanel, frontName, noPlacements, openingInside, partId, type PartPlacements, type PlanContext } from './plan-parts';

/** One planned door and why it is as it is. */
export interface DoorPlan {
  panel: string;
  hangsOn: string;
  width: Explained;
  height: Explained;
  dy: Explained;
  mass: Explained;
  hingeCount: Explained;
  hinge: HingeChoice;
  hinges: HingeHeight[];
}

/** What a step that plans fronts gives: its panels, what it puts on the carcass's parts, and notes. */
export interface FrontsStep<T> {
  panels: Panel[];
  parts: PartPlacements;
  plans: T[];
  notes: string[];
}

/** The mass of a front with its handle, and the number of hinges it needs by the hinge rule. */
export function frontHinging(
  words: LengthWording,
  size: { width: number; height: number; thickness: number },
  density: number,
  handleMass: number,
  along: number,
): { mass: Explained; count: Explained } | { error: string } {
  const mass = panelMass(size, density) + handleMass;
  const count = hingesNeeded(along, mass);
  const last = HINGE_RULE[HINGE_RULE.length - 1];
  if (count === null) {
    return { error: `fronts: a front ${words.length(along)} along its hinge edge weighing ${Math.round(mass * 10) / 10} kg is beyond the hinge rule (${words.length(last.height)}, ${last.mass} kg); ask the hinge maker` };
  }
  return {
    mass: explain(mass, `${words.length(size.width)} × ${words.length(size.height)} × ${words.length(size.thickness)} at ${density} kg/m³${handleMass > 0 ? ` plus a ${handleMass} kg handle` : ''}`),
    count: explain(count, `the hinge rule for ${words.length(along)} along the hinge edge and ${Math.round(mass * 10) / 10} kg (${HINGE_RULE.map((row) => `up to ${words.length(row.height)} and ${row.mass} kg: ${row.hinges}`).join('; ')})`),
  };
}

/**
 * One or two doors: sizes from overlay and reveal, the hinge count from height and mass, a cup on each
 * door's back at the cup-boring distance, and its plate on the inside of the side the door hangs on, on
 * the front row, at the cup's height plus the door's `dy`.
 */
export function planDoors(ctx: PlanContext, doors: DoorsInput): FrontsStep<DoorPlan> | { errors: string[] } {
  const { input, box, catalog } = ctx;
  const whole = frontSizes(ctx.words, doors.overlay, doors.count, doors.reveal, { width: input.width, height: input.height, thickness: box.thickness });
  const sizes = { ...whole, ...openingBand(ctx.words, doors.overlay, doors.reveal, ctx.opening, openingInside(ctx), whole) };
  const material = ctx.materials.get(doors.material ?? box.board.id) ?? box.board;
  const minWidth = 2 * input.system.pitch;
  if (sizes.width.value < minWidth || sizes.height.value < minWidth) {
    return { errors: [`width: the carcass is too small for ${doors.count} ${doors.overlay === 'inset' ? 'inset' : `${doors.overlay}-overlay`} door${doors.count > 1 ? 's' : ''}: each would be ${ctx.words.length(sizes.width.value)} × ${ctx.words.length(sizes.height.value)} (${sizes.width.why})`] };
  }
  const choice = chooseHinge(ctx.words, catalog, doors.overlay, sizes.overlay, doors.hinge);
  if ('error' in choice) return { errors: [choice.error] };
  const size = { width: sizes.width.value, height: sizes.height.value, thickness: material.thickness };
  const hinging = frontHinging(ctx.words, size, material.density, doors.handleMass, size.height);
  if ('error' in hinging) return { errors: [hinging.error] };
  const cupReach = choice.cupFromEdge.value + choice.hinge.bores.reduce((r, b) => Math.max(r, b.kind === 'face' ? b.x + b.diameter / 2 : 0), 0);
  if (size.width < cupReach + input.limits.minEdge) return { errors: [`width: each door would be ${ctx.words.length(size.width)} wide, too narrow for its hinge cup`] };
  const heights = hingeHeights(ctx.words, hinging.count.value, size.height, sizes.dy.value, box.grid, choice.hinge, choice.plate);
  if ('error' in heights) return { errors: [heights.error] };
  // Inset doors sit within the box, so their plates go back by the door's thickness: the 37 mm row plus the door
  // thickness (trade-reference §2, published).
  const plateX = box.rows.front.value + (doors.overlay === 'inset' ? material.thickness : 0);
  const hands: ('left' | 'right')[] = doors.count === 2 ? ['left', 'right'] : [doors.hingeSide];
  const parts = noPlacements();
  const plans: DoorPlan[] = [];
  const panels = hands.map((hand) => {
    const name = frontName(ctx, doors.count === 2 ? `door-${hand}` : 'door', doors.count === 2 ? `${hand} door` : 'door');
    const sideId = partId(ctx, hand);
    parts[hand].push(...platePlacements(choice, heights.hinges, plateX, ctx.opening.part));
    const panel = carcassPanel(ctx, name.part, name.label, 'door', size, {
      material: material.id,
      hang: { on: [sideId], dy: sizes.dy.value },
      handleMass: doors.handleMass > 0 ? doors.handleMass : undefined,
      placements: cupPlacements(choice, heights.hinges),
    });
    plans.push({ panel: panel.id, hangsOn: sideId, width: sizes.width, height: sizes.height, dy: sizes.dy, mass: hinging.mass, hingeCount: hinging.count, hinge: choice, hinges: heights.hinges });
    return panel;
  });
  const cups = heights.hinges.map((h) => h.cup.value);
  const spread = Math.max(...cups) - Math.min(...cups);
  // The hinge rule wants the outer hinges further apart than the door is wide (trade-reference §2).
  const sag = spread <= size.width ? [`The outer hinges are ${ctx.words.length(spread)} apart, no more than the ${ctx.words.length(size.width)} door width: the door may sag; two narrower doors would not.`] : [];
  return { panels, parts, plans, notes: sag };
}
