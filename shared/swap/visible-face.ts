import type { PanelBore } from '../layout/bore';
import type { PanelRole } from '../model/job-document';

/**
 * The panels whose face B is an outer face, seen when the cabinet stands finished: face A of a door or
 * flap is its back (design.md §2), so face B is its front; the same for a drawer front and a kickboard.
 * A carcass part's face B is its outside, which shows only at the end of a run or under a wall unit, and
 * the job document does not say where a carcass stands: the swap check does not count it as visible.
 */
export const OUTER_FACE_B_ROLES: readonly PanelRole[] = ['door', 'flap', 'drawer-front', 'kickboard'];

/** What the screen and the command line say about visible faces, so that both say the same. */
export const VISIBLE_FACE_RULE =
  'Visible face: the front (face B) of a door, flap, drawer front or kickboard; a through hole in one of them shows there too. Edges and carcass parts are not counted.';

/**
 * Whether an unused hole would show on the finished piece: a face bore on an outer face B, or a through
 * bore of such a panel (it comes out on face B). Edge bores are not counted: an edge takes a plug or edging.
 */
export function showsOnVisibleFace(bore: PanelBore, role: PanelRole): boolean {
  if (!OUTER_FACE_B_ROLES.includes(role) || bore.kind === 'edge') return false;
  return bore.face === 'B' || bore.through;
}
