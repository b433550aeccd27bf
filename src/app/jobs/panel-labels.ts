import { PanelRole, PanelStatus } from '../../../shared/model/job-document';

/** The panel roles of design.md §2 as the shop says them. */
export const roleLabels: Record<PanelRole, string> = {
  side: 'Side',
  top: 'Top',
  bottom: 'Bottom',
  shelf: 'Shelf',
  back: 'Back',
  door: 'Door',
  flap: 'Flap',
  'drawer-front': 'Drawer front',
  kickboard: 'Kickboard',
  loose: 'Loose',
};

export const statusLabels: Record<PanelStatus, string> = {
  planned: 'Planned',
  drilled: 'Drilled',
  checked: 'Checked',
};
