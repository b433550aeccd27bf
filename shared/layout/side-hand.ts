import type { JobDocument, Panel } from '../model/job-document';

/** Which side of its carcass a side panel is, as seen from the front. */
export type Hand = 'left' | 'right';

export interface SideHand {
  hand: Hand;
  /** How it was told, for whoever wonders. */
  why: string;
}

const HANDS: readonly Hand[] = ['left', 'right'];

/** The hand a name or id says with a word of its own (`Base unit, left side`, `c0-right`), if it says exactly one. */
function handInWords(value: string): Hand | undefined {
  const words = new Set(value.toLowerCase().split(/[^a-z]+/));
  const said = HANDS.filter((hand) => words.has(hand));
  return said.length === 1 ? said[0] : undefined;
}

/**
 * The hand of every side panel of a job that the document tells, as seen from the front, by the first rule
 * that says it:
 * 1. a carcass planned by the carcass planner keeps its sides as `<carcass id>-left` and `<carcass id>-right`
 *    (shared/planner/plan-parts.ts `partId`), which are the sides it puts its left and right parts on;
 * 2. the panel's name, else its id, says `left` or `right` as a word of its own (and not both);
 * 3. in a carcass of exactly two sides, one told by the rules above, the other is the other hand.
 * A side none of these tells is left out: the bench is told to mark it before drilling, never guessed for.
 * A carcass's two sides are mirror images, and handed parts mixed up are a common cause of scrap
 * (trade-reference §8a, common practice): hence the name on every template and label.
 */
export function sideHands(job: JobDocument): Map<string, SideHand> {
  const hands = new Map<string, SideHand>();
  const planned = new Set(job.carcasses.filter((c) => c.plannedFrom !== undefined).map((c) => c.id));
  const sides = job.panels.filter((p) => p.role === 'side');
  for (const panel of sides) {
    const carcass = panel.carcass;
    const byPlan = carcass !== undefined && planned.has(carcass) ? HANDS.find((hand) => panel.id === `${carcass}-${hand}`) : undefined;
    if (byPlan) {
      hands.set(panel.id, { hand: byPlan, why: `planned as the ${byPlan} side of its carcass` });
      continue;
    }
    const byName = handInWords(panel.name);
    if (byName) {
      hands.set(panel.id, { hand: byName, why: `its name says ${byName}` });
      continue;
    }
    const byId = handInWords(panel.id);
    if (byId) hands.set(panel.id, { hand: byId, why: `its id says ${byId}` });
  }
  for (const carcass of job.carcasses) {
    const pair = sides.filter((p) => p.carcass === carcass.id);
    if (pair.length !== 2) continue;
    const [told, untold] = hands.has(pair[0].id) ? [pair[0], pair[1]] : [pair[1], pair[0]];
    const hand = hands.get(told.id)?.hand;
    if (hand === undefined || hands.has(untold.id)) continue;
    const other: Hand = hand === 'left' ? 'right' : 'left';
    hands.set(untold.id, { hand: other, why: `the other side of its carcass is the ${hand} side` });
  }
  return hands;
}

/**
 * The hand of every door that hangs on sides of one told hand: a door's hinge edge (its x = 0) is on the side
 * it hangs on, so a door hung on the left side is hinged on the left as seen from the front.
 */
export function doorHands(job: JobDocument, sides: ReadonlyMap<string, SideHand>): Map<string, SideHand> {
  const hands = new Map<string, SideHand>();
  for (const door of job.panels.filter((p) => p.role === 'door')) {
    const told = new Set((door.hang?.on ?? []).flatMap((id) => sides.get(id)?.hand ?? []));
    if (told.size !== 1) continue;
    const [hand] = told;
    hands.set(door.id, { hand, why: `it hangs on the ${hand} side` });
  }
  return hands;
}

/** The hands of a job's sides and of the doors hung on them. */
export function panelHands(job: JobDocument): Map<string, SideHand> {
  const sides = sideHands(job);
  return new Map([...sides, ...doorHands(job, sides)]);
}

/**
 * A panel's hand as the bench reads it: `LEFT side (seen from the front)`, a word to mark a side when unknown,
 * `hinged on the LEFT (seen from the front)` for a door whose hand is known; nothing for other panels.
 */
export function handText(panel: Panel, hand: SideHand | undefined): string | undefined {
  if (panel.role === 'door') return hand ? `hinged on the ${hand.hand.toUpperCase()} (seen from the front)` : undefined;
  if (panel.role !== 'side') return undefined;
  return hand ? `${hand.hand.toUpperCase()} side (seen from the front)` : 'side not told left or right: mark it';
}
