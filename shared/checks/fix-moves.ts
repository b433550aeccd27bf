import type { Point } from '../grid/snap';
import type { PanelFaceBore } from '../layout/bore';
import type { Fix } from './finding';
import type { PanelSite } from './panel-site';

/** How many candidate positions a move proposes at most: each costs a check of the panels it touches. */
export const MAX_CANDIDATES = 8;

/** What a move acts on: the placement a face bore came from, or the loose bore itself. */
export function moverName(bore: PanelFaceBore): string {
  return bore.placement ? `placement ${bore.placement}` : `bore ${bore.id}`;
}

/**
 * The fix that brings a face bore's centre to `to`: a loose bore moves itself; a fitting's bore moves its
 * placement, whose anchor shifts by as much as the bore (every bore of a placement moves with its anchor).
 */
export function moveBoreTo(site: PanelSite, bore: PanelFaceBore, to: Point, why: string): Fix {
  const panel = site.panel.id;
  const placement = bore.placement === undefined ? undefined : site.panel.placements.find((p) => p.id === bore.placement);
  if (placement) {
    const x = placement.x + to.x - bore.x;
    const y = placement.y + to.y - bore.y;
    return {
      message: `Move placement ${placement.id} to x ${site.job.coordinate(x)}, y ${site.job.coordinate(y)}${why}.`,
      edits: [{ kind: 'move-placement', panel, placement: placement.id, x, y }],
    };
  }
  return {
    message: `Move bore ${bore.id} to x ${site.job.coordinate(to.x)}, y ${site.job.coordinate(to.y)}${why}.`,
    edits: [{ kind: 'move-bore', panel, bore: bore.id, x: to.x, y: to.y }],
  };
}

/**
 * Candidate moves of a face bore by whole pitches, so that what sat on the 32 mm grid stays on it: along
 * its row first (up or down, nearest first), then to the columns beside it.
 */
export function pitchMoves(site: PanelSite, bore: PanelFaceBore): Fix[] {
  const { pitch } = site.system;
  const steps: [number, number][] = [];
  for (let k = 1; k <= 3; k++) steps.push([0, k], [0, -k]);
  for (let k = 1; k <= 2; k++) steps.push([k, 0], [-k, 0]);
  return steps.slice(0, MAX_CANDIDATES).map(([i, j]) => {
    const way = j > 0 ? `${j === 1 ? 'one pitch' : `${j} pitches`} up` : j < 0 ? `${-j === 1 ? 'one pitch' : `${-j} pitches`} down` : `${Math.abs(i) === 1 ? 'one column' : `${Math.abs(i)} columns`} ${i > 0 ? 'back' : 'forward'}`;
    return moveBoreTo(site, bore, { x: bore.x + i * pitch, y: bore.y + j * pitch }, `, ${way}`);
  });
}
