import type { Catalog } from '../catalog/fitting';
import { copyPlacements } from '../layout/copy-placements';
import { isEdgeBore, type JobDocument, type Panel } from '../model/job-document';
import type { Fix, FixEdit } from './finding';

/** One edit on the panels of a job, or null when what it names is not there (the fix cannot be applied). */
function applyEdit(panels: Map<string, Panel>, catalog: Catalog, edit: FixEdit): boolean {
  switch (edit.kind) {
    case 'move-placement':
    case 'set-fitting': {
      const panel = panels.get(edit.panel);
      if (!panel?.placements.some((p) => p.id === edit.placement)) return false;
      const change = edit.kind === 'move-placement' ? { x: edit.x, y: edit.y } : { fitting: edit.fitting };
      panels.set(panel.id, { ...panel, placements: panel.placements.map((p) => (p.id === edit.placement ? { ...p, ...change } : p)) });
      return true;
    }
    case 'move-bore': {
      const panel = panels.get(edit.panel);
      const bore = panel?.bores.find((b) => b.id === edit.bore);
      if (!panel || !bore || isEdgeBore(bore)) return false;
      panels.set(panel.id, { ...panel, bores: panel.bores.map((b) => (b === bore ? { ...bore, x: edit.x, y: edit.y } : b)) });
      return true;
    }
    case 'copy-side': {
      const from = panels.get(edit.from);
      const to = panels.get(edit.to);
      if (!from || !to) return false;
      const purposes = new Set<string | undefined>(edit.purposes);
      const copied = (p: Panel['placements'][number]) => purposes.has(catalog.get(p.fitting)?.purpose);
      // Sides share one frame (design.md §3: x from the front edge, y from the bottom, face A inside), so the mirror image keeps the numbers.
      const kept = { ...to, placements: to.placements.filter((p) => !copied(p)) };
      panels.set(to.id, copyPlacements(from.placements.filter(copied), kept));
      return true;
    }
  }
}

/**
 * The job as it would be with a fix applied: every edit in turn on copies of the panels it names. Null
 * when an edit names a panel, placement or bore the job does not have, so such a fix is never offered.
 */
export function applyFix(job: JobDocument, catalog: Catalog, fix: Fix): JobDocument | null {
  const panels = new Map(job.panels.map((p) => [p.id, p]));
  for (const edit of fix.edits) if (!applyEdit(panels, catalog, edit)) return null;
  return { ...job, panels: job.panels.map((p) => panels.get(p.id) ?? p) };
}

/** The panels a fix changes. */
export function editedPanels(fix: Fix): string[] {
  return fix.edits.map((e) => (e.kind === 'copy-side' ? e.to : e.panel));
}
