import { expandedBoreId } from '../layout/expand-placement';
import type { PlacedFitting } from '../layout/panel-layout';
import type { DraftFinding, Fix } from './finding';
import { platesMeeting } from './hinge-pairs';
import { report, type PanelSite } from './panel-site';
import { formatNumber } from './wording';

/** The outer cups' centres sit 76 to 100 mm from a door's or flap's ends (trade-reference §2, common practice). */
export const CUP_FROM_END = { min: 76, max: 100 } as const;

/** Distances from the end tried for a fix, the middle of the range first. */
const TRIED = [88, 84, 92, 80, 96, 76, 100];

type End = 'bottom' | 'top';

interface Cup {
  placed: PlacedFitting;
  /** The cup's centre along the hinge edge. */
  y: number;
}

/**
 * The fixes that bring an outer cup within range of its end, each taking along the plates it meets on the
 * panels the front hangs on, so that the fix keeps the cup paired. Moves of whole pitches keep a plate on
 * its system holes: those come first.
 */
function moves(site: PanelSite, cup: Cup, fromEnd: (y: number) => number, end: End): Fix[] {
  const { panel } = site;
  const { placement } = cup.placed;
  const plates = platesMeeting(site.job, panel, placement);
  const pitch = site.system.pitch;
  const inRange = (y: number) => fromEnd(y) >= CUP_FROM_END.min && fromEnd(y) <= CUP_FROM_END.max;
  const onPitch = [-3, -2, -1, 1, 2, 3].map((k) => cup.y + k * pitch).filter(inRange);
  const tried = TRIED.map((d) => (end === 'bottom' ? d : panel.height - d));
  return [...new Set([...onPitch, ...tried])].map((y) => {
    const dy = y - cup.y;
    const along = plates.map(({ panel: side, plate }) => ({ kind: 'move-placement' as const, panel: side.id, placement: plate.id, x: plate.x, y: plate.y + dy }));
    const sides = [...new Set(plates.map((p) => p.panel.id))].join(', ');
    const taking = plates.length > 0 ? `, and its plate${plates.length > 1 ? 's' : ''} on ${sides} ${site.job.length(Math.abs(dy))} ${dy > 0 ? 'up' : 'down'} with it` : '';
    return {
      message: `Move hinge ${placement.id} so its cup sits ${site.job.length(fromEnd(y))} from the end${taking}.`,
      edits: [{ kind: 'move-placement' as const, panel: panel.id, placement: placement.id, x: placement.x, y: placement.y + dy }, ...along],
    };
  });
}

function finding(site: PanelSite, cup: Cup, end: End): DraftFinding | null {
  const { panel } = site;
  const fromEnd = end === 'bottom' ? (y: number) => y : (y: number) => panel.height - y;
  const distance = fromEnd(cup.y);
  if (distance >= CUP_FROM_END.min && distance <= CUP_FROM_END.max) return null;
  const where = end === 'bottom' ? 'the end at y = 0' : 'the far end';
  const id = cup.placed.placement.id;
  const message = `Hinge ${id}'s cup is ${site.job.length(distance)} from ${where} of ${panel.role} ${panel.id}; the outer cups sit 76 to 100 mm from the ends.`;
  const remedy = {
    candidates: () => [moves(site, cup, fromEnd, end)],
    advice: `Move the hinge and the plate it meets together so the cup sits 76 to 100 mm from ${where}; where no system hole for the plate allows that height, keep the nearest and check it against the hinge maker's data.`,
  };
  return report(site, 'hinge-end-distance', 'warning', message, [], remedy, [id]);
}

/**
 * hinge-end-distance: the outer cups of a door or flap, the lowest and the highest along its hinge edge,
 * sit 76 to 100 mm from its ends (trade-reference §2, common practice). A front with fewer than two hinges
 * is hinge-count's to report.
 */
export function checkHingeEndDistance(site: PanelSite): DraftFinding[] {
  if (site.panel.role !== 'door' && site.panel.role !== 'flap') return [];
  const cups: Cup[] = site.layout.placed.flatMap((placed) => {
    const { fitting } = placed;
    if (fitting.purpose !== 'hinge-cup') return [];
    const centre = placed.bores.find((b) => b.id === expandedBoreId(placed.placement.id, fitting.hinge.cupBore));
    return centre?.kind === 'face' ? [{ placed, y: centre.y }] : [];
  });
  if (cups.length < 2) return [];
  // Ties go by id, so that which of two cups at one height is the outer one does not depend on the document's order.
  const byHeight = [...cups].sort((a, b) => a.y - b.y || (a.placed.placement.id < b.placed.placement.id ? -1 : 1));
  const ends = [finding(site, byHeight[0], 'bottom'), finding(site, byHeight[byHeight.length - 1], 'top')];
  return ends.filter((f): f is DraftFinding => f !== null);
}
