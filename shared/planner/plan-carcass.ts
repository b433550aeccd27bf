import type { Catalog } from '../catalog/fitting';
import { lengthWording } from '../checks/wording';
import type { Carcass, Panel } from '../model/job-document';
import type { LengthUnit } from '../units/length-unit';
import { formatIssues } from '../model/validation-messages';
import { planBox, type CarcassBox } from './carcass-box';
import { carcassPlanInput, type CarcassPlanInput } from './carcass-plan-input';
import { connectorColumns, constructionWhy, jointPlacements } from './construction';
import type { DoorPlan } from './doors-plan';
import type { DrawerPlan } from './drawers-plan';
import { explain, type Explained } from './explained';
import type { FlapPlan } from './flap-plan';
import { carcassPanel, noPlacements, wholeOpening, type PartPlacements, type PlanContext } from './plan-parts';
import { planOpening, planSections, type SectionPlan } from './sections-plan';
import { planShelves, type PinRows, type ShelfPlan } from './shelves-plan';

/** A planned carcass: its record and panels for the job document, and every number with its reason. */
export interface CarcassPlan {
  input: CarcassPlanInput;
  carcass: Carcass;
  panels: Panel[];
  box: CarcassBox;
  construction: Explained<CarcassPlanInput['construction']>;
  doors: DoorPlan[];
  flap?: FlapPlan;
  drawers: DrawerPlan[];
  /** The dividing shelves of a carcass in sections first, then the shelves asked for. */
  shelves: ShelfPlan[];
  pins?: PinRows;
  /** A carcass divided by fixed shelves: each section's span and front; empty for one front over the whole. */
  sections: SectionPlan[];
  /** What the designer should know: hinges outside the usual range, shelves that sag. */
  notes: string[];
}

export type PlanResult = { ok: true; plan: CarcassPlan } | { ok: false; errors: string[] };

function merge(...steps: PartPlacements[]): PartPlacements {
  return {
    left: steps.flatMap((s) => s.left),
    right: steps.flatMap((s) => s.right),
    top: steps.flatMap((s) => s.top),
  };
}

/** The input as the carcass keeps it to be planned again: the job's materials, system and limits come from the job. */
function description(input: CarcassPlanInput): Record<string, unknown> {
  const { materials: _materials, system: _system, limits: _limits, ...own } = input;
  return own;
}

export interface PlanOptions {
  /** The unit the reasons, notes and refusals print lengths in (the reader's choice); millimetres unless told. */
  unit?: LengthUnit;
}

/**
 * Plans one carcass from its description: sides on the 32 mm system with their construction bores, top,
 * bottom, back, kickboard, fronts with their hinges, plates or mechanisms, and shelves. Bad input is
 * refused with one message per problem, each led by the path of the value it concerns; nothing is made.
 * Only the words follow `options.unit`: every number of the plan and its panels is in millimetres.
 */
export function planCarcass(data: unknown, catalog: Catalog, options: PlanOptions = {}): PlanResult {
  const parsed = carcassPlanInput.safeParse(data);
  if (!parsed.success) return { ok: false, errors: formatIssues(parsed.error) };
  const input = parsed.data;
  const words = lengthWording(options.unit);
  const boxed = planBox(input, words);
  if ('errors' in boxed) return { ok: false, errors: boxed.errors };
  const { box } = boxed;
  const ctx: PlanContext = { input, box, catalog, materials: new Map(input.materials.map((m) => [m.id, m])), opening: wholeOpening(input.height), words };
  const fronts = input.fronts.type === 'sections' ? planSections(ctx, input.fronts) : planOpening(ctx, input.fronts);
  if ('errors' in fronts) return { ok: false, errors: fronts.errors };
  const T = box.thickness;
  const columns = connectorColumns(box.grid);
  const partLength = box.innerWidth.value;
  const bottom = jointPlacements(input.construction, columns, T / 2, partLength, 'bottom');
  const top = jointPlacements(input.construction, columns, input.height - T / 2, partLength, 'top');
  const joints: PartPlacements = { left: [...bottom.side, ...top.side], right: [...bottom.side, ...top.side], top: [] };
  const sides = merge(joints, fronts.parts);
  const shelved = input.shelves.type === 'none' ? { panels: [], parts: noPlacements(), plans: [] } : planShelves(ctx, input.shelves, sides);
  if ('errors' in shelved) return { ok: false, errors: shelved.errors };
  const all = merge(sides, shelved.parts);
  const sideSize = { width: input.depth, height: input.height };
  const partSize = { width: box.partDepth.value, height: partLength };
  const panels: Panel[] = [
    carcassPanel(ctx, 'left', 'left side', 'side', sideSize, { placements: all.left }),
    carcassPanel(ctx, 'right', 'right side', 'side', sideSize, { placements: all.right }),
    carcassPanel(ctx, 'bottom', 'bottom', 'bottom', partSize, { placements: bottom.part }),
    carcassPanel(ctx, 'top', 'top', 'top', partSize, { placements: [...top.part, ...all.top] }),
  ];
  const { back, mounting } = input;
  if (back.type === 'inset') panels.push(carcassPanel(ctx, 'back', 'back', 'back', { width: partLength, height: input.height - 2 * T }));
  if (back.type === 'grooved') {
    const size = { width: partLength + 2 * back.grooveDepth, height: input.height - 2 * T + 2 * back.grooveDepth };
    panels.push(carcassPanel(ctx, 'back', 'back', 'back', size, { material: back.material }));
  }
  if (mounting.type === 'kickboard') panels.push(carcassPanel(ctx, 'kickboard', 'kickboard', 'kickboard', { width: input.width, height: mounting.height }));
  panels.push(...shelved.panels, ...fronts.panels);
  const notes = [...fronts.notes, ...shelved.plans.filter((s) => !s.ok).map((s) => `Shelf ${s.panel} sags more than the limit; keep its span under ${words.length(Math.floor(s.maxSpan.value))} or stiffen it.`)];
  if (!box.balance.balanced) notes.unshift(`The sides are ${box.balance.why}.`);
  return {
    ok: true,
    plan: {
      input,
      carcass: {
        id: input.id,
        name: input.name,
        width: input.width,
        height: input.height,
        depth: input.depth,
        material: input.material,
        mounting: mounting.type === 'wall' ? 'wall' : 'floor',
        plannedFrom: description(input),
      },
      panels,
      box,
      construction: explain(input.construction, constructionWhy(input.construction)),
      doors: fronts.doors,
      flap: fronts.flap,
      drawers: fronts.drawers,
      shelves: [...fronts.dividers, ...shelved.plans],
      pins: 'pins' in shelved ? shelved.pins : undefined,
      sections: fronts.sections,
      notes,
    },
  };
}
