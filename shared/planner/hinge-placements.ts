import type { Placement } from '../model/job-document';
import type { HingeChoice } from './hinge-choice';
import type { HingeHeight } from './hinge-heights';

/** The cups on a door or flap: one hinge per planned height, at the chosen cup-boring distance. */
export function cupPlacements(choice: HingeChoice, hinges: readonly HingeHeight[]): Placement[] {
  return hinges.map((h, i) => ({
    id: `hinge-${i + 1}`,
    fitting: choice.hinge.id,
    x: choice.cupFromEdge.value,
    y: h.cup.value,
    face: 'A',
    rotation: 0,
    params: { boringDistance: choice.boringDistance.value },
  }));
}

/**
 * The mounting plates that meet those cups, on the panel the front hangs on, on the row at `x`; in a
 * divided carcass their ids carry the section's name, as one side carries the plates of several sections.
 */
export function platePlacements(choice: HingeChoice, hinges: readonly HingeHeight[], x: number, section = ''): Placement[] {
  return hinges.map((h, i) => ({ id: `${section ? `${section}-` : ''}plate-${i + 1}`, fitting: choice.plate.id, x, y: h.plate, face: 'A', rotation: 0 }));
}
