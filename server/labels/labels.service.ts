import { benchPanelPath, type LabelsFilter } from '../../shared/api/label-contract';
import { labelsPdf } from '../../shared/export/labels';
import { carcassOrder } from '../../shared/model/panel-order';
import { safeSegment } from '../../shared/export/pack-paths';
import { shopCatalog } from '../catalog/shop-catalog';
import type { Database } from '../db/client';
import { toJobDocument } from '../db/job-mapping';
import { GENERATOR, pdfTools } from '../export/export-platform';
import { AppError, invalidField, notFound } from '../http/app-error';
import { loadJobRows } from '../jobs/jobs.repository';
import type { DownloadFile } from '../packs/packs.service';

/**
 * A job's panel labels as A4 sheets: every panel, or those the filter names, carcass by carcass. Each QR
 * code opens the bench page on that panel at `origin`, the address the asking browser used to reach us.
 */
export async function jobLabels(db: Database, jobId: number, filter: LabelsFilter, origin: string, date: Date): Promise<DownloadFile> {
  const rows = await loadJobRows(db, jobId);
  if (!rows) throw notFound(`Job ${jobId}`);
  const job = toJobDocument(rows);
  const dbIds = new Map(rows.panels.map((p) => [p.key, p.id]));
  let panels = job.panels;
  if (filter.carcass !== undefined) {
    if (!job.carcasses.some((c) => c.id === filter.carcass)) throw invalidField('carcass', `this job has no carcass with id "${filter.carcass}"`);
    panels = panels.filter((p) => p.carcass === filter.carcass);
  }
  if (filter.panels) {
    const named = new Set(filter.panels);
    const strangers = filter.panels.filter((id) => !rows.panels.some((p) => p.id === id));
    if (strangers.length > 0) throw invalidField('panels', `this job has no panel ${strangers.slice(0, 5).join(', ')}${strangers.length > 5 ? ', …' : ''}`);
    panels = panels.filter((p) => named.has(dbIds.get(p.id)!));
  }
  if (panels.length === 0) {
    const why = job.panels.length === 0 ? 'this job has no panels yet' : 'no panel of this job matches the filter';
    throw new AppError(400, 'nothing-to-label', `There is nothing to label: ${why}.`);
  }
  const ctx = { job, catalog: await shopCatalog(db), date, generator: GENERATOR };
  const bytes = await labelsPdf(
    { ctx, panels: carcassOrder(job.carcasses, panels), link: (p) => `${origin}${benchPanelPath(jobId, dbIds.get(p.id)!)}` },
    { ...(await pdfTools()), title: `${job.name}: panel labels`, date, producer: `${GENERATOR.name} ${GENERATOR.version}` },
  );
  return { name: `${safeSegment(job.name, 'job')} labels.pdf`, type: 'application/pdf', bytes };
}
