import type { LengthWording } from '../checks/wording';
import { flapMoment, maxFlapMoment } from '../compute/power-factor';
import { holeHeights, systemGrid } from '../grid/system-grid';
import type { Placement } from '../model/job-document';
import type { FlapInput } from './carcass-plan-input';
import { frontHinging, type FrontsStep } from './doors-plan';
import { explain, type Explained } from './explained';
import { frontSizes, openingBand } from './front-sizes';
import { chooseHinge, type HingeChoice } from './hinge-choice';
import { hingeHeights, type HingeHeight } from './hinge-heights';
import { cupPlacements, platePlacements } from './hinge-placements';
import { chooseLift, type LiftChoice } from './lift-choice';
import { clearOfBodies } from './clear-of-bodies';
import { connectorColumns, jointPlacements } from './construction';
import { carcassPanel, frontName, noPlacements, openingInside, partId, type PlanContext } from './plan-parts';

/** The planned flap: its size, mass, power factor, mechanism, hinges in the top and its moment curve. */
export interface FlapPlan {
  panel: string;
  /** Hinge edge to free edge: the flap height a mechanism's power factor uses (its width in its frame). */
  height: Explained;
  /** Along the hinge edge. */
  length: Explained;
  mass: Explained;
  lift: LiftChoice;
  mechanisms: { side: string; x: number; y: Explained }[];
  hingeCount: Explained;
  hinge: HingeChoice;
  hinges: HingeHeight[];
  /** M(θ) in N·m about the hinge, θ in degrees from closed, for a plot. */
  moment: { angle: number; moment: number }[];
  maxMoment: Explained;
}

/** The moment curve is drawn from closed to level in steps of this many degrees. */
const ANGLE_STEP = 5;

/**
 * A lift-up flap over the whole front: it hangs on cup hinges in the top (cups on the flap's back at the
 * cup-boring distance, plates under the top on its front row) and is held by one or two lift mechanisms on
 * the sides, chosen by power factor. The flap's `hang` names the top and the sides: the top for the
 * hinges' pairing, the sides for the mechanisms that act on it.
 */
export function planFlap(ctx: PlanContext, flap: FlapInput): FrontsStep<FlapPlan> | { errors: string[] } {
  const { input, box, catalog } = ctx;
  const T = box.thickness;
  if (!ctx.opening.upperIsBox) return { errors: [`fronts: a lift-up flap hangs from the carcass's top, so only the top section can have one`] };
  const whole = frontSizes(ctx.words, 'full', 1, flap.reveal, { width: input.width, height: input.height, thickness: T });
  const inside = openingInside(ctx);
  const sizes = { ...whole, ...openingBand(ctx.words, 'full', flap.reveal, ctx.opening, inside, whole) };
  const material = ctx.materials.get(flap.material ?? box.board.id) ?? box.board;
  const size = { width: sizes.height.value, height: sizes.width.value, thickness: material.thickness };
  const hinging = frontHinging(ctx.words, size, material.density, flap.handleMass, size.height);
  if ('error' in hinging) return { errors: [hinging.error] };
  const board = hinging.mass.value - flap.handleMass;
  const lift = chooseLift(catalog, { height: size.width, mass: board, handleMass: flap.handleMass }, flap.mechanisms);
  if ('error' in lift) return { errors: [lift.error] };
  const choice = chooseHinge(ctx.words, catalog, 'full', sizes.overlay, flap.hinge);
  if ('error' in choice) return { errors: [choice.error] };
  // The top runs between the sides: its y = 0 is the left side's inside face.
  const dy = sizes.left - T;
  const topGrid = systemGrid({ width: box.partDepth.value, height: box.innerWidth.value }, T, input.system);
  // The plates share the top with its joints to the sides: they keep clear of those bores.
  const columns = connectorColumns(box.grid);
  const joint = jointPlacements(input.construction, columns, input.height - T / 2, box.innerWidth.value, 'top');
  const topSize = { width: box.partDepth.value, height: box.innerWidth.value, thickness: T };
  const clear = clearOfBodies(joint.part, catalog, topSize, input.system, input.limits.minWeb);
  // The top is not line-bored: its plates go where the cups land 76 to 100 mm from the flap's ends.
  const heights = hingeHeights(ctx.words, hinging.count.value, size.height, dy, topGrid, choice.hinge, choice.plate, clear, 'free');
  if ('error' in heights) return { errors: [heights.error] };
  const top = lift.fitting.keepOuts.reduce((m, k) => Math.max(m, k.y + k.height), 0);
  const bottom = lift.fitting.keepOuts.reduce((m, k) => Math.min(m, k.y), 0);
  const anchor = holeHeights(box.grid).filter((y) => y + top <= inside.high && y + bottom >= inside.low).at(-1);
  if (anchor === undefined) return { errors: [`height: ${ctx.words.length(inside.high - inside.low)} inside is too low for the lift mechanism's body`] };
  const parts = noPlacements();
  const hands = flap.mechanisms === 2 ? (['left', 'right'] as const) : (['left'] as const);
  const mechanisms = hands.map((hand) => {
    const placement: Placement = { id: 'lift', fitting: lift.fitting.id, x: box.rows.front.value, y: anchor, face: 'A', rotation: 0 };
    parts[hand].push(placement);
    return {
      side: partId(ctx, hand),
      x: placement.x,
      y: explain(anchor, `the highest system hole that keeps the mechanism's body (${ctx.words.length(bottom)} to ${ctx.words.length(top)} about its top hole) under the top`),
    };
  });
  parts.top.push(...platePlacements(choice, heights.hinges, topGrid.rows[0]));
  const name = frontName(ctx, 'flap', 'flap');
  const panel = carcassPanel(ctx, name.part, name.label, 'flap', size, {
    material: material.id,
    hang: { on: [partId(ctx, 'top'), ...hands.map((hand) => partId(ctx, hand))], dy },
    handleMass: flap.handleMass > 0 ? flap.handleMass : undefined,
    placements: cupPlacements(choice, heights.hinges),
  });
  const load = { height: size.width, mass: board, handleMass: flap.handleMass };
  const moment = Array.from({ length: 90 / ANGLE_STEP + 1 }, (_, i) => ({ angle: i * ANGLE_STEP, moment: flapMoment(load, i * ANGLE_STEP) }));
  return {
    panels: [panel],
    parts,
    notes: [],
    plans: [
      {
        panel: panel.id,
        height: explain(size.width, `${sizes.height.why}; hinge edge to free edge`),
        length: explain(size.height, sizes.width.why),
        mass: hinging.mass,
        lift,
        mechanisms,
        hingeCount: hinging.count,
        hinge: choice,
        hinges: heights.hinges,
        moment,
        maxMoment: explain(maxFlapMoment(lift.powerFactor.value), 'PF × g / 2000, with the flap level (trade-reference §3)'),
      },
    ],
  };
}
