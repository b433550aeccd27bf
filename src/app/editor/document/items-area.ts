import { planBox, type Box } from '../../../../shared/layout/bore';
import type { PanelLayout } from '../../../../shared/layout/panel-layout';
import type { Panel } from '../../../../shared/model/job-document';
import { hitItems } from '../stage/hit-index';

/**
 * The area that holds some bores (by their ids, a fitting's bores as `placement/bore`) and placements, in mm:
 * what to show of a finding. A finding about whole placements (a keep-out, a plate without its hinge) shows
 * the placements. Undefined when none of them is on the panel.
 */
export function itemsArea(panel: Panel, layout: PanelLayout, bores: readonly string[], placements: readonly string[]): Box | undefined {
  const ids = new Set(bores);
  const boxes = layout.bores.filter((b) => ids.has(b.id)).map((b) => planBox(b, panel));
  if (boxes.length === 0) boxes.push(...hitItems(panel, layout).filter((h) => h.kind === 'placement' && placements.includes(h.id)).map((h) => h.box));
  if (boxes.length === 0) return undefined;
  return [
    Math.min(...boxes.map((b) => b[0])),
    Math.min(...boxes.map((b) => b[1])),
    Math.max(...boxes.map((b) => b[2])),
    Math.max(...boxes.map((b) => b[3])),
  ];
}
