import type { Catalog, Fitting, FittingPurpose } from '../catalog/fitting';
import { checkJob } from '../checks/index';
import type { Finding } from '../checks/finding';
import { jobSite, type JobSite } from '../checks/job-site';
import type { PanelBore } from '../layout/bore';
import { panelBores } from '../layout/panel-layout';
import type { JobDocument, Panel } from '../model/job-document';
import { clashesOfNewHoles } from './clashes';
import { isDeepEnough, isSameHoleWithin } from './same-hole';
import type { PanelSwap, SwapReport, SwapResult, SwapSummary, SwapVerdict } from './swap-report';
import { swapNotes } from './swap-notes';
import { showsOnVisibleFace } from './visible-face';

/** A fitting's kind in words, for a refusal. */
const KIND: Record<FittingPurpose, string> = {
  construction: 'a construction fitting',
  'hinge-cup': 'a cup hinge',
  'mounting-plate': 'a mounting plate',
  'shelf-pin': 'a shelf pin',
  'lift-mechanism': 'a lift mechanism',
  runner: 'a drawer runner',
};

/**
 * The job with every placement of fitting `from` given fitting `to`, in the same place, turn and face,
 * with the same parameters. Nothing else changes: the plates a swapped hinge meets stay as they are
 * unless they are swapped too. Returns a new document; the one given is left alone.
 */
export function applySwap(job: JobDocument, from: string, to: string): JobDocument {
  return {
    ...job,
    panels: job.panels.map((panel) =>
      panel.placements.some((p) => p.fitting === from)
        ? { ...panel, placements: panel.placements.map((p) => (p.fitting === from ? { ...p, fitting: to } : p)) }
        : panel,
    ),
  };
}

function refuse(job: JobDocument, catalog: Catalog, from: string, to: string): Exclude<SwapResult, { ok: true }> | undefined {
  const used = job.panels.some((panel) => panel.placements.some((p) => p.fitting === from));
  const old = catalog.get(from);
  if (!old) {
    const why = used
      ? `the job places it, but the catalog does not know its holes; import the fitting first`
      : 'no fitting of the catalog has this id';
    return { ok: false, code: 'unknown-fitting', field: 'from', message: `from: "${from}": ${why}.` };
  }
  const replacement = catalog.get(to);
  if (!replacement) return { ok: false, code: 'unknown-fitting', field: 'to', message: `to: "${to}": no fitting of the catalog has this id.` };
  if (from === to) return { ok: false, code: 'same-fitting', field: 'to', message: `to: "${to}" is the fitting it would replace; choose another.` };
  if (old.purpose !== replacement.purpose) {
    return {
      ok: false,
      code: 'different-kind',
      field: 'to',
      message: `to: "${to}" is ${KIND[replacement.purpose]} and "${from}" ${KIND[old.purpose]}; a swap replaces a fitting by one of the same kind.`,
    };
  }
  return undefined;
}

/** Whether the swap leaves a panel fine, to drill or to remake (see `swapVerdict`). */
function verdictOf(panel: Pick<PanelSwap, 'new' | 'clashing' | 'unused'>): SwapVerdict {
  if (panel.clashing.length > 0 || panel.unused.some((u) => u.visible)) return 'to-remake';
  return panel.new.length > 0 ? 'to-drill' : 'fine';
}

/** One panel before and after: which holes of the new fitting are there, which are new, which clash, which old ones go unused. */
function comparePanel(site: JobSite, catalog: Catalog, before: Panel, after: Panel, from: string): PanelSwap {
  const { system } = site.job;
  const swapped = new Set(before.placements.filter((p) => p.fitting === from).map((p) => p.id));
  const existing = panelBores(before, catalog, system);
  const afterBores = panelBores(after, catalog, system);
  const ofSwapped = (b: PanelBore) => b.placement !== undefined && swapped.has(b.placement);

  const reused: PanelSwap['reused'] = [];
  const wanted: PanelSwap['new'] = [];
  const matched = new Set<string>();
  for (const bore of afterBores.filter(ofSwapped)) {
    const hole = existing.find((e) => isSameHoleWithin(e, bore));
    if (hole) matched.add(hole.id);
    if (hole && isDeepEnough(hole, bore)) reused.push({ bore, uses: hole.id });
    else wanted.push(hole ? { bore, deepens: hole.id } : { bore });
  }
  // A hole of the old fitting stays in use when anything after the swap drills it: the new fitting or another.
  const unusedBores = existing.filter((e) => ofSwapped(e) && !matched.has(e.id) && !afterBores.some((a) => isSameHoleWithin(e, a)));
  const unused = unusedBores.map((bore) => ({ bore, visible: showsOnVisibleFace(bore, before.role) }));

  // A hole to deepen stands where its old hole is: the two are one hole, never a clash.
  const clashes = clashesOfNewHoles(site, after, unusedBores, new Set(wanted.map((w) => w.bore.id)));
  const clashing: PanelSwap['clashing'] = [];
  for (const w of wanted) {
    const mine = clashes.filter((c) => c.bore === w.bore.id);
    if (mine.length === 0) continue;
    clashing.push({
      bore: w.bore,
      with: mine.map((c) => ({
        bore: (c.unused ? unusedBores : afterBores).find((b) => b.id === c.with)!,
        unused: c.unused,
        code: c.code,
        message: c.message,
      })),
    });
  }
  const drillable = wanted.filter((w) => !clashing.some((c) => c.bore.id === w.bore.id));
  const result = { reused, new: drillable, clashing, unused };
  const { id, name, role, carcass, width, height, thickness, status } = before;
  return {
    panel: { id, name, role, ...(carcass !== undefined ? { carcass } : {}), width, height, thickness, status },
    placements: [...swapped],
    verdict: verdictOf(result),
    drilled: status !== 'planned',
    ...result,
    existing,
  };
}

/** A finding as the checks would find it again: its code, panel, bores and placements (the words may change). */
function findingKey(f: Finding): string {
  return [f.code, f.panel, f.bores.join(' '), f.placements.join(' ')].join('\n');
}

function summarize(panels: readonly PanelSwap[]): SwapSummary {
  const drilled = panels.filter((p) => p.drilled);
  const count = (pick: (p: PanelSwap) => number) => panels.reduce((n, p) => n + pick(p), 0);
  return {
    panels: panels.length,
    placements: count((p) => p.placements.length),
    fine: drilled.filter((p) => p.verdict === 'fine').length,
    toDrill: drilled.filter((p) => p.verdict === 'to-drill').length,
    toRemake: drilled.filter((p) => p.verdict === 'to-remake').length,
    notDrilled: panels.length - drilled.length,
    reused: count((p) => p.reused.length),
    new: count((p) => p.new.length),
    clashing: count((p) => p.clashing.length),
    unused: count((p) => p.unused.length),
    unusedVisible: count((p) => p.unused.filter((u) => u.visible).length),
  };
}

const ref = (f: Fitting) => ({ id: f.id, name: f.name, purpose: f.purpose });

/**
 * The swap check: what giving every placement of fitting `from` fitting `to` does to the panels of a job.
 * For each panel that uses `from`, the panel is laid out before and after (shared/layout) and its holes
 * compared: reused as they are, new, new but clashing with an existing hole (by the checks' own rules),
 * and old ones left unused, with whether they show on a visible face. The whole job is checked before and
 * after, and what the checks find only after is reported with the notes a cabinetmaker needs.
 * Refused, with a message led by the field, when either fitting is not in the catalog, when they are the
 * same, or when `to` is of another kind than `from`.
 */
export function checkSwap(job: JobDocument, catalog: Catalog, from: string, to: string): SwapResult {
  const refusal = refuse(job, catalog, from, to);
  if (refusal) return refusal;
  const old = catalog.get(from)!;
  const replacement = catalog.get(to)!;
  const after = applySwap(job, from, to);
  const site = jobSite(after, catalog);
  const affected = job.panels.filter((p) => p.placements.some((pl) => pl.fitting === from));
  const panels = affected.map((panel) => comparePanel(site, catalog, panel, after.panels[job.panels.indexOf(panel)], from));

  const seen = new Set(checkJob(job, catalog).map(findingKey));
  const found = checkJob(after, catalog);
  const now = new Set(found.map(findingKey));
  const report: SwapReport = {
    from: ref(old),
    to: ref(replacement),
    summary: summarize(panels),
    panels,
    findings: { added: found.filter((f) => !seen.has(findingKey(f))), resolved: [...seen].filter((k) => !now.has(k)).length },
    notes: swapNotes(job, catalog, old, replacement, affected),
  };
  return { ok: true, report };
}

/**
 * The panels whose drilled status no longer holds once the swap is applied: drilled or checked, and
 * needing new holes or a new board. They go back to planned, so the bench finds them again.
 */
export function panelsBackToPlanned(report: SwapReport): string[] {
  return report.panels.filter((p) => p.drilled && p.verdict !== 'fine').map((p) => p.panel.id);
}
