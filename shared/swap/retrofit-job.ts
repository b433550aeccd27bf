import type { Catalog, Fitting } from '../catalog/fitting';
import type { Finding } from '../checks/finding';
import type { JobDocument, Panel, Placement } from '../model/job-document';
import { applySwap } from './check-swap';
import type { SwapReport } from './swap-report';
import { checkJob } from '../checks/index';

/** A job document reduced to what the bench must still drill, with the catalog that lays it out. */
export interface RetrofitJob {
  job: JobDocument;
  catalog: Catalog;
  /** The checks of the swapped job on these panels: what a cover sheet should say about them. */
  findings: Finding[];
}

/** The new fitting with only the holes still to drill: its body and the holes it reuses are there already. */
function holesStillToDrill(to: Fitting, id: string, holes: readonly string[]): Fitting {
  const keep = new Set(holes);
  return {
    ...to,
    id,
    name: `${to.name}, retrofit: ${holes.join(', ')}`,
    bores: to.bores.filter((b) => keep.has(b.id)),
    keepOuts: [],
    joins: to.joins.filter(([a, b]) => keep.has(a) && keep.has(b)),
  };
}

/**
 * The retrofit of a swap as a job document for the bench pack (shared/export/pack.ts): only the panels
 * drilled already whose verdict is `to-drill`, each with only its new holes. Each swapped placement keeps
 * its place and gets the new fitting cut down to the holes still to drill, so the drilling maps colour
 * them by purpose, the hole schedule names the fitting and the hardware list counts the fittings to fit.
 * A panel not drilled yet is left out: it gets the whole new plan in the job's own bench pack. A panel to
 * remake is left out too: it is made again from that pack. The panels keep their ids, names, sizes and
 * status, and lose their hang, which the pack has no use for.
 */
export function retrofitJob(job: JobDocument, catalog: Catalog, report: SwapReport): RetrofitJob {
  const to = catalog.get(report.to.id);
  if (!to) throw new Error(`retrofitJob: the catalog has no fitting "${report.to.id}"; pass the catalog the report was made with`);
  const fittings = new Map<string, Fitting>();
  const idFor = (holes: string[]) => {
    const key = holes.join(' ');
    for (const f of fittings.values()) if (f.bores.map((b) => b.id).join(' ') === key) return f.id;
    const id = `${to.id}-retrofit${fittings.size === 0 ? '' : `-${fittings.size + 1}`}`;
    fittings.set(id, holesStillToDrill(to, id, holes));
    return id;
  };
  const panels: Panel[] = [];
  for (const swap of report.panels.filter((p) => p.drilled && p.verdict === 'to-drill')) {
    const panel = job.panels.find((p) => p.id === swap.panel.id);
    if (!panel) continue;
    const placements: Placement[] = [];
    for (const placement of panel.placements.filter((p) => swap.placements.includes(p.id))) {
      const prefix = `${placement.id}/`;
      const holes = swap.new.filter((n) => n.bore.placement === placement.id).map((n) => n.bore.id.slice(prefix.length));
      if (holes.length > 0) placements.push({ ...placement, fitting: idFor(to.bores.map((b) => b.id).filter((id) => holes.includes(id))) });
    }
    const { hang: _hang, ...rest } = panel;
    panels.push({ ...rest, placements, bores: [] });
  }
  const ids = new Set(panels.map((p) => p.id));
  const carcasses = job.carcasses.filter((c) => panels.some((p) => p.carcass === c.id));
  const findings = checkJob(applySwap(job, report.from.id, report.to.id), catalog).filter((f) => ids.has(f.panel));
  const name = `${job.name}, retrofit ${report.from.id} to ${report.to.id}`.slice(0, 200);
  return { job: { ...job, name, carcasses, panels }, catalog: fittings, findings };
}
