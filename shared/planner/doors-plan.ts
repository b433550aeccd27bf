import { mm } from '../checks/wording';
import { hingesNeeded } from '../compute/hinge-count';
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
  size: { width: number; height: number; thickness: number },
  density: number,
  handleMass: number,
  along: number,
): { mass: Explained; count: Explained } | { error: string } {
  const mass = panelMass(size, density) + handleMass;
  const count = hingesNeeded(along, mass);
  if (count === null) {
    return { error: `fronts: a front ${mm(along)} along its hinge edge weighing ${Math.round(mass * 10) / 10} kg is beyond the hinge rule (2400 mm, 22 kg); ask the hinge maker` };
  }
  return {
    mass: explain(mass, `${mm(size.width)} × ${mm(size.height)} × ${mm(size.thickness)} at ${density} kg/m³${handleMass > 0 ? ` plus a ${handleMass} kg handle` : ''}`),
    count: explain(count, `the hinge rule for ${mm(along)} along the hinge edge and ${Math.round(mass * 10) / 10} kg (up to 900 mm and 6 kg: 2; 1600 and 12: 3; 2000 and 17: 4; 2400 and 22: 5)`),
  };
}

/**
 * One or two doors: sizes from overlay and reveal, the hinge count from height and mass, a cup on each
 * door's back at the cup-boring distance, and its plate on the inside of the side the door hangs on, on
 * the front row, at the cup's height plus the door's `dy`.
 */
export function planDoors(ctx: PlanContext, doors: DoorsInput): FrontsStep<DoorPlan> | { errors: string[] } {
  const { input, box, catalog } = ctx;
  const whole = frontSizes(doors.overlay, doors.count, doors.reveal, { width: input.width, height: input.height, thickness: box.thickness });
  const sizes = { ...whole, ...openingBand(doors.overlay, doors.reveal, ctx.opening, openingInside(ctx), whole) };
  const material = ctx.materials.get(doors.material ?? box.board.id) ?? box.board;
  const minWidth = 2 * input.system.pitch;
  if (sizes.width.value < minWidth || sizes.height.value < minWidth) {
    return { errors: [`width: the carcass is too small for ${doors.count} ${doors.overlay === 'inset' ? 'inset' : `${doors.overlay}-overlay`} door${doors.count > 1 ? 's' : ''}: each would be ${mm(sizes.width.value)} × ${mm(sizes.height.value)} (${sizes.width.why})`] };
  }
  const choice = chooseHinge(catalog, doors.overlay, sizes.overlay, doors.hinge);
  if ('error' in choice) return { errors: [choice.error] };
  const size = { width: sizes.width.value, height: sizes.height.value, thickness: material.thickness };
  const hinging = frontHinging(size, material.density, doors.handleMass, size.height);
  if ('error' in hinging) return { errors: [hinging.error] };
  const cupReach = choice.cupFromEdge.value + choice.hinge.bores.reduce((r, b) => Math.max(r, b.kind === 'face' ? b.x + b.diameter / 2 : 0), 0);
  if (size.width < cupReach + input.limits.minEdge) return { errors: [`width: each door would be ${mm(size.width)} wide, too narrow for its hinge cup`] };
  const heights = hingeHeights(hinging.count.value, size.height, sizes.dy.value, box.grid, choice.hinge, choice.plate);
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
  const sag = spread <= size.width ? [`The outer hinges are ${mm(spread)} apart, no more than the ${mm(size.width)} door width: the door may sag; two narrower doors would not.`] : [];
  return { panels, parts, plans, notes: sag };
}
