import type { PanelRole } from '../../../shared/model/job-document';

/** How a panel's numbers are read (design.md §3, frames by role): the edge x runs from, and the whole sentence. */
export interface PanelFrame {
  /** The edge at x = 0, named as the trade names it. */
  reference: string;
  /** Where x and y run, said once on screen beside the panel's size. */
  words: string;
}

/** The frame of a panel of this role: a door's or flap's x runs from its hinge edge, a carcass part's from its front edge. */
export function panelFrame(role: PanelRole): PanelFrame {
  switch (role) {
    case 'door':
      return { reference: 'Hinge edge', words: 'x from the hinge edge to the opening edge, y from the bottom' };
    case 'flap':
      return { reference: 'Hinge edge', words: 'x from the hinge edge to the free edge, y from the lower edge' };
    case 'side':
      return { reference: 'Front edge', words: 'x from the front edge to the back, y from the bottom up' };
    case 'top':
    case 'bottom':
    case 'shelf':
      return { reference: 'Front edge', words: 'x from the front edge to the back, y along its length' };
    default:
      return { reference: 'Reference edge', words: 'x from the reference edge, y from the lower edge' };
  }
}
