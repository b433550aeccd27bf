import { applyFix, editedPanels } from './apply-fix';
import { isSameHole, type PanelFaceBore } from '../layout/bore';
import { canShareHole } from './clear-hole';
import { findingKey, type DraftFinding, type Finding, type Fix, type FixEdit } from './finding';
import { jobSite, otherSide, type JobSite } from './job-site';
import { draftPanel, type PanelDrafts } from './panel-checks';
import type { PanelSite } from './panel-site';

/** A job's panels as the checks first see them, each checked once and only when asked for. */
export type DraftsOf = (panelId: string) => PanelDrafts | undefined;

export function draftsOf(site: JobSite): DraftsOf {
  const cache = new Map<string, PanelDrafts>();
  return (id) => {
    let drafts = cache.get(id);
    const panel = site.panels.get(id);
    if (!drafts && panel) {
      drafts = draftPanel(site, panel);
      cache.set(id, drafts);
    }
    return drafts;
  };
}

/**
 * Whether the holes a fix moves on a panel land clear of every other hole of that panel as it is now (the
 * minimum web, or a line-bored hole they may share) and inside it. Most candidates that fail, fail here;
 * this look at the spatial index spares them a whole check of the panel. Only a candidate that passes is
 * tried in full.
 */
function landsClear(site: PanelSite | undefined, fix: Fix): boolean {
  if (!site) return false;
  const { minWeb } = site.limits;
  for (const edit of fix.edits) {
    if ((edit.kind !== 'move-placement' && edit.kind !== 'move-bore') || edit.panel !== site.panel.id) continue;
    const moved = movedBores(site, edit);
    for (const bore of moved) {
      const r = bore.diameter / 2;
      if (bore.x - r < 0 || bore.y - r < 0 || bore.x + r > site.panel.width || bore.y + r > site.panel.height) return false;
      let clear = true;
      const reach = r + minWeb;
      site.index.search(bore.x - reach, bore.y - reach, bore.x + reach, bore.y + reach, (k) => {
        const other = site.faceBores[k];
        if (!clear || other.face !== bore.face || other.id === bore.id || (bore.placement !== undefined && other.placement === bore.placement)) return;
        if (isSameHole(bore, other) && canShareHole(bore, other)) return;
        if (Math.hypot(other.x - bore.x, other.y - bore.y) - r - other.diameter / 2 < minWeb) clear = false;
      });
      if (!clear) return false;
    }
  }
  return true;
}

/** The face bores a move edit puts somewhere else, where it puts them. */
function movedBores(site: PanelSite, edit: Extract<FixEdit, { kind: 'move-placement' | 'move-bore' }>): PanelFaceBore[] {
  if (edit.kind === 'move-bore') {
    const bore = site.faceBores.find((b) => b.id === edit.bore && b.placement === undefined);
    return bore ? [{ ...bore, x: edit.x, y: edit.y }] : [];
  }
  const placed = site.layout.placed.find((p) => p.placement.id === edit.placement);
  if (!placed) return [];
  const dx = edit.x - placed.placement.x;
  const dy = edit.y - placed.placement.y;
  return placed.bores.filter((b): b is PanelFaceBore => b.kind === 'face').map((b) => ({ ...b, x: b.x + dx, y: b.y + dy }));
}

/**
 * The panels whose findings a fix can change: those it edits and the panel of its finding, with every
 * panel tied to them: the panels a door or flap hangs on (its plates and mechanisms), the fronts hanging on
 * a panel (their cups), the other side of a carcass (the mirror).
 */
function touched(site: JobSite, fix: Fix, panel: string): Set<string> {
  const ids = new Set([panel, ...editedPanels(fix)]);
  for (const id of [...ids]) {
    const p = site.panels.get(id);
    if (!p) continue;
    for (const on of p.hang?.on ?? []) ids.add(on);
    for (const front of site.hungOn.get(id) ?? []) ids.add(front.id);
    const other = otherSide(site, p);
    if (other) ids.add(other.id);
  }
  return ids;
}

/**
 * Whether a fix, applied to a copy of the job, removes its finding and adds no error or warning on any
 * panel it touches. A panel that cannot be checked whole (no drillable size, a fitting missing from the
 * catalog) cannot vouch for a fix.
 */
function passes(site: JobSite, before: DraftsOf, draft: DraftFinding, fix: Fix): boolean {
  const after = applyFix(site.job, site.catalog, fix);
  if (!after) return false;
  const afterSite = jobSite(after, site.catalog, site.unit);
  const key = findingKey(draft);
  for (const id of touched(afterSite, fix, draft.panel)) {
    const panel = afterSite.panels.get(id);
    const was = before(id);
    if (!panel || !was?.checkable) return false;
    const known = new Set(was.drafts.filter((f) => f.severity !== 'note').map(findingKey));
    const { checkable, drafts } = draftPanel(afterSite, panel);
    if (!checkable) return false;
    for (const f of drafts) {
      const k = findingKey(f);
      if (k === key || (f.severity !== 'note' && !known.has(k))) return false;
    }
  }
  return true;
}

/** How many candidates the checks try in full on one panel in one run: a bound on the work a crowded panel can ask for. */
export const TRIALS_PER_PANEL = 24;

/** One run of the checks over a job: the panels as they are, and the full trials each panel has left. */
export interface CheckRun {
  site: JobSite;
  before: DraftsOf;
  trialsLeft: Map<string, number>;
}

export function checkRun(site: JobSite): CheckRun {
  return { site, before: draftsOf(site), trialsLeft: new Map() };
}

/**
 * A finding as it is shown: of each group of candidate fixes, the first that passes (design.md §2: a fix
 * is offered only when applying it was checked to remove the finding without adding an error); when none
 * passes, the advice says so plainly. A panel whose trials ran out says that its later findings' fixes wait
 * for the earlier ones.
 */
export function settleFixes(run: CheckRun, draft: DraftFinding): Finding {
  const { candidates, ...finding } = draft;
  const fixes: Fix[] = [];
  let tried = true;
  for (const group of candidates()) {
    const fix = group.find((candidate) => {
      if (!landsClear(run.before(draft.panel)?.site, candidate)) return false;
      const left = run.trialsLeft.get(draft.panel) ?? TRIALS_PER_PANEL;
      if (left <= 0) {
        tried = false;
        return false;
      }
      run.trialsLeft.set(draft.panel, left - 1);
      return passes(run.site, run.before, draft, candidate);
    });
    if (fix && !fixes.some((f) => f.message === fix.message)) fixes.push(fix);
  }
  if (fixes.length > 0 || finding.advice === undefined) return { ...finding, fixes };
  const why = tried ? 'No automatic fix was found' : 'Fixes are checked for the findings above first; once they are dealt with, this one gets its own';
  return { ...finding, fixes, advice: `${why}: ${lowerFirst(finding.advice)}` };
}

/** A finding as a check makes it, without trying its fixes: what live checks show while a panel changes. */
export function unsettled(draft: DraftFinding): Finding {
  const { candidates: _, ...finding } = draft;
  return { ...finding, fixes: [] };
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}
