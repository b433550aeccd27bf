import type { Panel } from '../model/job-document';

/**
 * The drilling of a panel given to its opposite number across the carcass: the left side's to the right
 * side, a left-hung door's to a right-hung one.
 *
 * Convention: the frames of design.md §3 are tied to features that the carcass's mirror maps onto each
 * other: a side's x runs from its front edge, y from its bottom, face A is its inside face; a door's x
 * runs from its hinge edge and face A is its back. So the mirror image of a left side's drilling has the
 * same numbers in the right side's frame: the copy keeps every x, y, face, edge, z, rotation and
 * `mirrored` as they are, and the reflection lives in the world, not in the numbers. A handed fitting
 * (a lift mechanism, say) drills the same hole pattern in the frame; the bench fits its other-hand
 * version. The target keeps its own size and ids of panel, carcass and hang; its drilling is replaced.
 * To mirror within one panel's frame (one end of a bottom to the other) use `reflectDrilling`.
 */
export function drillingForOppositeSide(source: Panel, target: Panel): Panel {
  return {
    ...target,
    placements: source.placements.map((p) => ({ ...p, params: p.params && { ...p.params } })),
    bores: source.bores.map((b) => ({ ...b })),
  };
}
