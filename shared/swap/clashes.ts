import { checkBoresOverlap } from '../checks/bores-overlap';
import { checkEdgeBoreClash } from '../checks/edge-bore-clash';
import { checkFacesClash } from '../checks/faces-clash';
import type { JobSite } from '../checks/job-site';
import { panelSite } from '../checks/panel-site';
import type { PanelBore } from '../layout/bore';
import type { Bore, Panel } from '../model/job-document';

/** The prefix that keeps an old hole apart from a new one of the same id while the checks look at both. */
const OLD = 'was:';

/** A clash of a new hole with an existing one, in the checks' words. */
export interface Clash {
  /** The new hole. */
  bore: string;
  /** The existing hole: by its id before the swap when the old fitting leaves it unused, else by its id after. */
  with: string;
  unused: boolean;
  code: 'bores-overlap' | 'faces-clash' | 'edge-bore-clash';
  message: string;
}

/** A drilled hole as a loose bore of the document: the holes are in the board whatever made them. */
function asLooseBore(bore: PanelBore): Bore {
  const { diameter, depth } = bore;
  const id = `${OLD}${bore.id}`;
  if (bore.kind === 'edge') return { id, edge: bore.edge, at: bore.at, z: bore.z, diameter, depth };
  return { id, x: bore.x, y: bore.y, face: bore.face, diameter, depth };
}

/** The checks' words about an old hole, with its id as the report gives it. */
function inOldWords(message: string): string {
  return message.replaceAll(`Bore ${OLD}`, 'Old bore ').replaceAll(`bore ${OLD}`, 'old bore ');
}

/**
 * The new holes that cannot be drilled because an existing hole is in the way. The panel after the swap
 * is laid out with the old fitting's unused holes added as loose bores (they are in the board whatever
 * made them), and the checks' own rules decide: bores-overlap (less than the minimum web between two holes
 * on a face, trade-reference §7), faces-clash (holes from both faces that meet inside the board) and
 * edge-bore-clash. A check's exemptions hold as they do everywhere: a fitting's own holes sit as its
 * maker spaced them, so a new hole never clashes with a hole its own fitting reuses.
 * Pairs of two new holes are left to the checks of the swapped job; pairs of two existing ones were there before.
 */
export function clashesOfNewHoles(job: JobSite, after: Panel, unused: readonly PanelBore[], newIds: ReadonlySet<string>): Clash[] {
  const combined: Panel = { ...after, bores: [...after.bores, ...unused.map(asLooseBore)] };
  const site = panelSite(job, combined);
  const findings = [...checkBoresOverlap(site), ...checkFacesClash(site), ...checkEdgeBoreClash(site)];
  const clashes: Clash[] = [];
  for (const f of findings) {
    if (f.bores.length !== 2) continue;
    const fresh = f.bores.filter((id) => newIds.has(id));
    if (fresh.length !== 1) continue;
    const other = f.bores.find((id) => !newIds.has(id))!;
    const unusedHole = other.startsWith(OLD);
    const code = f.code as Clash['code'];
    clashes.push({ bore: fresh[0], with: unusedHole ? other.slice(OLD.length) : other, unused: unusedHole, code, message: inOldWords(f.message) });
  }
  return clashes;
}
