import type { LengthWording } from '../checks/wording';
import { holeHeights } from '../grid/system-grid';
import type { Panel } from '../model/job-document';
import type { SectionFrontInput, SectionsInput } from './carcass-plan-input';
import { planDoors, type DoorPlan } from './doors-plan';
import { planDrawers, type DrawerPlan } from './drawers-plan';
import { explain, type Explained } from './explained';
import { planFlap, type FlapPlan } from './flap-plan';
import { noPlacements, type PartPlacements, type PlanContext } from './plan-parts';
import { fixedShelf, type ShelfPlan } from './shelves-plan';

/** One section of a divided carcass: the side heights it spans and the front it has. */
export interface SectionPlan {
  /** The carcass's lower edge or the centre of the dividing shelf below. */
  from: Explained;
  /** The centre of the dividing shelf above or the carcass's height. */
  to: Explained;
  front: SectionFrontInput['type'];
}

/** Every front of a carcass, whole or divided, with what they put on its parts. */
export interface FrontsPlan {
  panels: Panel[];
  parts: PartPlacements;
  notes: string[];
  doors: DoorPlan[];
  flap?: FlapPlan;
  drawers: DrawerPlan[];
  /** The fixed shelves that divide the carcass into sections. */
  dividers: ShelfPlan[];
  sections: SectionPlan[];
}

function merge(into: PartPlacements, from: PartPlacements): void {
  into.left.push(...from.left);
  into.right.push(...from.right);
  into.top.push(...from.top);
}

/** One kind of front over the context's opening: doors, a flap, drawers or none. */
export function planOpening(ctx: PlanContext, front: SectionFrontInput): FrontsPlan | { errors: string[] } {
  const empty: FrontsPlan = { panels: [], parts: noPlacements(), notes: [], doors: [], drawers: [], dividers: [], sections: [] };
  switch (front.type) {
    case 'none':
      return empty;
    case 'doors': {
      const step = planDoors(ctx, front);
      return 'errors' in step ? step : { ...empty, panels: step.panels, parts: step.parts, notes: step.notes, doors: step.plans };
    }
    case 'flap': {
      const step = planFlap(ctx, front);
      return 'errors' in step ? step : { ...empty, panels: step.panels, parts: step.parts, notes: step.notes, flap: step.plans[0] };
    }
    case 'drawers': {
      const step = planDrawers(ctx, front);
      return 'errors' in step ? step : { ...empty, panels: step.panels, parts: step.parts, notes: step.notes, drawers: step.plans };
    }
  }
}

/**
 * A carcass divided by fixed shelves into sections from the bottom up, each with its own front. Each
 * dividing shelf is centred on the system hole nearest the height asked, and joined like a fixed shelf;
 * each section's fronts are planned over its own span by the same rules as a whole carcass's (hinges,
 * plates, a mechanism, runners), and the sides carry all of them.
 */
export function planSections(ctx: PlanContext, fronts: SectionsInput): FrontsPlan | { errors: string[] } {
  const { input, box } = ctx;
  if (input.shelves.type !== 'none') return { errors: ["shelves: a carcass divided into sections takes no other shelves; make it 'none'"] };
  const { sections } = fronts;
  const holes = holeHeights(box.grid);
  const plan: FrontsPlan = { panels: [], parts: noPlacements(), notes: [], doors: [], drawers: [], dividers: [], sections: [] };
  let from = explain(0, "the carcass's lower edge");
  for (const [i, section] of sections.entries()) {
    const last = i === sections.length - 1;
    let to = explain(input.height, "the carcass's height");
    if (!last) {
      if (section.height === undefined) return { errors: [`fronts.sections[${i}].height: give the height of every section but the last`] };
      const target = from.value + section.height;
      const y = holes.reduce((a, b) => (Math.abs(b - target) < Math.abs(a - target) ? b : a), holes[0]);
      if (y === undefined || y <= from.value + box.thickness || y >= input.height - box.thickness) {
        return { errors: [`fronts.sections[${i}].height: ${ctx.words.length(section.height)} leaves no room for the sections above it`] };
      }
      to = explain(y, `the system hole nearest ${ctx.words.length(target)} (${ctx.words.length(from.value)} + ${ctx.words.length(section.height)}), the centre of dividing shelf ${i + 1}`);
      const divider = fixedShelf(ctx, y, `divider-${i + 1}`, `dividing shelf ${i + 1}`, to.why);
      plan.panels.push(divider.panel);
      plan.parts.left.push(...divider.side);
      plan.parts.right.push(...divider.side);
      plan.dividers.push(divider.plan);
    }
    const opening = { from: from.value, to: to.value, lowerIsBox: i === 0, upperIsBox: last, part: `section-${i + 1}`, label: `section ${i + 1}` };
    const planned = planOpening({ ...ctx, opening }, section.front);
    if ('errors' in planned) return { errors: planned.errors.map((e) => `fronts.sections[${i}]: ${e}`) };
    plan.panels.push(...planned.panels);
    merge(plan.parts, planned.parts);
    plan.notes.push(...planned.notes.map((n) => `Section ${i + 1}: ${n}`));
    plan.doors.push(...planned.doors);
    plan.drawers.push(...planned.drawers);
    plan.flap ??= planned.flap;
    plan.sections.push({ from, to, front: section.front.type });
    from = to;
  }
  return plan;
}
