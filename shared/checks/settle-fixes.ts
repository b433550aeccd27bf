import { applyFix, editedPanels } from './apply-fix';
import { findingKey, type DraftFinding, type Finding, type Fix } from './finding';
import { jobSite, otherSide, type JobSite } from './job-site';
import { draftPanel, type PanelDrafts } from './panel-checks';

/** A job's panels as the checks first see them, each checked once and only when asked for. */
export type DraftsOf = (panelId: string) => PanelDrafts;

export function draftsOf(site: JobSite): DraftsOf {
  const cache = new Map<string, PanelDrafts>();
  return (id) => {
    let drafts = cache.get(id);
    if (!drafts) {
      const panel = site.panels.get(id);
      drafts = panel ? draftPanel(site, panel) : { checkable: false, drafts: [] };
      cache.set(id, drafts);
    }
    return drafts;
  };
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
  const afterSite = jobSite(after, site.catalog);
  const key = findingKey(draft);
  for (const id of touched(afterSite, fix, draft.panel)) {
    const panel = afterSite.panels.get(id);
    if (!panel || !before(id).checkable) return false;
    const known = new Set(before(id).drafts.filter((f) => f.severity !== 'note').map(findingKey));
    const { checkable, drafts } = draftPanel(afterSite, panel);
    if (!checkable) return false;
    for (const f of drafts) {
      const k = findingKey(f);
      if (k === key || (f.severity !== 'note' && !known.has(k))) return false;
    }
  }
  return true;
}

/**
 * A finding as it is shown: of each group of candidate fixes, the first that passes (design.md §2: a fix
 * is offered only when applying it was checked to remove the finding without adding an error); when none
 * passes, the advice says so plainly.
 */
export function settleFixes(site: JobSite, before: DraftsOf, draft: DraftFinding): Finding {
  const { candidates, ...finding } = draft;
  const fixes: Fix[] = [];
  for (const group of candidates) {
    const fix = group.find((candidate) => passes(site, before, draft, candidate));
    if (fix && !fixes.some((f) => f.message === fix.message)) fixes.push(fix);
  }
  if (fixes.length > 0 || finding.advice === undefined) return { ...finding, fixes };
  return { ...finding, fixes, advice: `No automatic fix was found: ${lowerFirst(finding.advice)}` };
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}
