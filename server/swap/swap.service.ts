import type { z } from 'zod';
import type { SwapAnswer, SwapApplied, swapApplyBody } from '../../shared/api/swap-contract';
import type { User } from '../../shared/api/contract';
import type { Catalog } from '../../shared/catalog/fitting';
import type { PaperName } from '../../shared/export/paper';
import { planPack, type Pack } from '../../shared/export/pack';
import type { JobDocument } from '../../shared/model/job-document';
import { checkSwap, panelsBackToPlanned } from '../../shared/swap/check-swap';
import { retrofitJob } from '../../shared/swap/retrofit-job';
import type { SwapReport } from '../../shared/swap/swap-report';
import { recordActivity } from '../activity/activity.repository';
import { shopCatalog } from '../catalog/shop-catalog';
import type { Database } from '../db/client';
import { toJobDocument, type JobRows } from '../db/job-mapping';
import { GENERATOR, packTools } from '../export/export-platform';
import { AppError, notFound } from '../http/app-error';
import { loadJobRows, touchJob } from '../jobs/jobs.repository';
import { writableJob } from '../jobs/writable-job';
import { updatePanelAtVersion } from '../panels/panels.repository';
import { swapPanelPlacements } from './swap.repository';

/** A stored job as a document, with the catalog the shop works with (its own fittings beside the built-in ones). */
async function jobAndCatalog(db: Database, jobId: number): Promise<{ rows: JobRows; job: JobDocument; catalog: Catalog }> {
  const rows = await loadJobRows(db, jobId);
  if (!rows) throw notFound(`Job ${jobId}`);
  return { rows, job: toJobDocument(rows), catalog: await shopCatalog(db) };
}

/** The swap check's report; a fitting the catalog does not know, or of another kind, answers 400 naming the field. */
function reportOf(job: JobDocument, catalog: Catalog, from: string, to: string): SwapReport {
  const result = checkSwap(job, catalog, from, to);
  if (!result.ok) throw new AppError(400, result.code, result.message, { fields: { [result.field]: result.message.replace(/^\w+: /, '') } });
  return result.report;
}

/** The versions of the job's panels by panel id: the client sends them back when it applies the swap. */
function versionsOf(rows: JobRows): Record<string, number> {
  return Object.fromEntries(rows.panels.map((p) => [p.key, p.version]));
}

/** What replacing fitting `from` by `to` does to the job's panels, and the versions it was worked out from. */
export async function swapReportFor(db: Database, jobId: number, from: string, to: string): Promise<SwapAnswer> {
  const { rows, job, catalog } = await jobAndCatalog(db, jobId);
  const report = reportOf(job, catalog, from, to);
  const affected = new Set(report.panels.map((p) => p.panel.id));
  return { report, versions: Object.fromEntries(Object.entries(versionsOf(rows)).filter(([key]) => affected.has(key))) };
}

/**
 * The retrofit pack: the bench pack (shared/export/pack.ts) of the job reduced to the drilled panels that
 * need only new holes, each with only those holes. Its cover reports the checks of the swapped job on them.
 */
export async function retrofitPack(db: Database, jobId: number, from: string, to: string, paper: PaperName, date: Date): Promise<{ pack: Pack; fileName: string }> {
  const { rows, job, catalog } = await jobAndCatalog(db, jobId);
  const report = reportOf(job, catalog, from, to);
  const retrofit = retrofitJob(job, catalog, report);
  const versions = new Map(rows.panels.map((p) => [p.key, p.version]));
  const ctx = { job: retrofit.job, catalog: retrofit.catalog, date, generator: GENERATOR, panelVersion: (key: string) => versions.get(key) };
  const pack = planPack({ ctx, paper, findings: retrofit.findings, ...(await packTools()) });
  return { pack, fileName: `${pack.root}.zip` };
}

/** Back to planned, and so without the mark of who drilled it and when: a planned panel has none. */
const PLANNED = { status: 'planned', statusBy: null, statusAt: null } as const;

function staleSwap(panel: string): AppError {
  return new AppError(
    409,
    'stale-version',
    `Panel "${panel}" changed since the swap check was made: run the check again and look at it before applying the swap.`,
    { fields: { versions: `${panel} is not at the version seen` } },
  );
}

/**
 * Applies a swap in one transaction: every placement of `from` gets `to`, each changed panel gets a new
 * version, the drilled panels that need new holes or a new board go back to planned (so the bench finds
 * them again; who marked them and when is cleared, as for any planned panel), and one activity entry for
 * the job records the counts. A job with no placement of `from` answers 409, as does a panel changed since
 * the versions the client saw; a fitting the catalog does not know, or of another kind, 400.
 */
export async function applySwapTo(db: Database, actor: User, jobId: number, body: z.output<typeof swapApplyBody>): Promise<SwapApplied> {
  return db.transaction(async (tx) => {
    await writableJob(tx, jobId);
    const { rows, job, catalog } = await jobAndCatalog(tx, jobId);
    const report = reportOf(job, catalog, body.from, body.to);
    if (report.panels.length === 0) {
      throw new AppError(409, 'nothing-to-swap', `The job has no placement of ${body.from} (any more): nothing to swap. Run the swap check again.`);
    }
    const byKey = new Map(rows.panels.map((p) => [p.key, p]));
    const backToPlanned = new Set(panelsBackToPlanned(report));
    let placements = 0;
    for (const { panel } of report.panels) {
      const row = byKey.get(panel.id)!;
      const seen = body.versions?.[panel.id];
      if (body.versions && seen !== row.version) throw staleSwap(panel.id);
      placements += await swapPanelPlacements(tx, row.id, body.from, body.to);
      if (!(await updatePanelAtVersion(tx, row.id, row.version, backToPlanned.has(panel.id) ? PLANNED : {}))) throw staleSwap(panel.id);
    }
    await touchJob(tx, jobId);
    const { summary } = report;
    await recordActivity(tx, {
      userId: actor.id,
      jobId,
      action: 'job.fitting-swapped',
      details: {
        from: body.from,
        to: body.to,
        panels: summary.panels,
        placements,
        fine: summary.fine,
        toDrill: summary.toDrill,
        toRemake: summary.toRemake,
        notDrilled: summary.notDrilled,
        reused: summary.reused,
        new: summary.new,
        clashing: summary.clashing,
        unused: summary.unused,
        backToPlanned: [...backToPlanned],
      },
    });
    return { from: body.from, to: body.to, panels: report.panels.length, placements, backToPlanned: [...backToPlanned] };
  });
}
