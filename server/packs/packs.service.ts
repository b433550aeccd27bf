import type { JobFindings } from '../../shared/api/pack-contract';
import { checkJob } from '../../shared/checks/index';
import { panelDrillingMaps } from '../../shared/export/drilling-map';
import type { ExportContext } from '../../shared/export/export-context';
import { mapViews } from '../../shared/export/map-view';
import { planPack, type Pack } from '../../shared/export/pack';
import { safeSegment } from '../../shared/export/pack-paths';
import { panelBores } from '../../shared/layout/panel-layout';
import type { PaperName } from '../../shared/export/paper';
import { panelDxf } from '../../shared/export/panel-dxf';
import { drawingToSvg } from '../../shared/export/svg-render';
import { templateSheetsPdf } from '../../shared/export/template-pdf';
import type { Face } from '../../shared/model/job-document';
import { shopCatalog } from '../catalog/shop-catalog';
import type { Database } from '../db/client';
import { toJobDocument } from '../db/job-mapping';
import { GENERATOR, packTools, pdfTools, svgWindows } from '../export/export-platform';
import { AppError, notFound } from '../http/app-error';
import { loadJobRows } from '../jobs/jobs.repository';
import { findPanel } from '../panels/panels.repository';

/** A file to send back: its name for Content-Disposition, its type and its bytes. */
export interface DownloadFile {
  name: string;
  type: string;
  bytes: Uint8Array | string;
}

/**
 * The export context of a stored job: the job as a document, the shop's catalog (the built-in fittings and
 * the shop's own), now, and each panel's stored version for the title blocks.
 */
async function jobContext(db: Database, jobId: number, date: Date): Promise<ExportContext> {
  const rows = await loadJobRows(db, jobId);
  if (!rows) throw notFound(`Job ${jobId}`);
  const versions = new Map(rows.panels.map((p) => [p.key, p.version]));
  return { job: toJobDocument(rows), catalog: await shopCatalog(db), date, generator: GENERATOR, panelVersion: (key) => versions.get(key) };
}

/** One stored panel with its job's export context and its bores laid out. */
async function panelContext(db: Database, panelId: number, date: Date) {
  const row = await findPanel(db, panelId);
  if (!row) throw notFound(`Panel ${panelId}`);
  const ctx = await jobContext(db, row.jobId, date);
  const panel = ctx.job.panels.find((p) => p.id === row.key);
  if (!panel) throw notFound(`Panel ${panelId}`);
  return { ctx, panel, bores: panelBores(panel, ctx.catalog, ctx.job.system), base: safeSegment(panel.name, panel.id) };
}

/** A panel's drilling map of one face as SVG, full size; face B only when the panel has face B bores. */
export async function drillingMapSvg(db: Database, panelId: number, face: Face, date: Date): Promise<DownloadFile> {
  const { ctx, panel, bores, base } = await panelContext(db, panelId, date);
  const index = mapViews(panel, bores).findIndex((view) => view.face === face);
  if (index < 0) throw new AppError(404, 'no-such-map', `Panel ${panelId} has no bores on face ${face}, so it has no drilling map of that face.`);
  const newWindow = await svgWindows();
  const svg = drawingToSvg(panelDrillingMaps(ctx, panel, bores)[index], newWindow());
  return { name: `${base} face ${face}.svg`, type: 'image/svg+xml', bytes: svg };
}

/** A panel's DXF file, in millimetres. */
export async function drillingDxf(db: Database, panelId: number, date: Date): Promise<DownloadFile> {
  const { ctx, panel, bores, base } = await panelContext(db, panelId, date);
  return { name: `${base}.dxf`, type: 'application/dxf', bytes: panelDxf(ctx, panel, bores) };
}

/** A panel's template sheets, to print at 100 % on the paper asked for. */
export async function templateSheets(db: Database, panelId: number, paper: PaperName, date: Date): Promise<DownloadFile> {
  const { ctx, panel, bores, base } = await panelContext(db, panelId, date);
  const bytes = await templateSheetsPdf(panelDrillingMaps(ctx, panel, bores), paper, {
    ...(await pdfTools()),
    title: `${ctx.job.name}: ${panel.name}, template sheets`,
    date,
    producer: `${GENERATOR.name} ${GENERATOR.version}`,
  });
  return { name: `${base} templates ${paper === 'a4' ? 'A4' : 'US Letter'}.pdf`, type: 'application/pdf', bytes };
}

/** A job's bench pack, planned: its files are made one at a time as the zip stream reaches them. */
export async function jobPack(db: Database, jobId: number, paper: PaperName, date: Date): Promise<{ pack: Pack; fileName: string; jobName: string }> {
  const ctx = await jobContext(db, jobId, date);
  const pack = planPack({ ctx, paper, ...(await packTools()) });
  return { pack, fileName: `${pack.root}.zip`, jobName: ctx.job.name };
}

/** The checks' findings of a job, counted by severity, for a screen that asks before packing a job with errors. */
export async function jobFindings(db: Database, jobId: number): Promise<JobFindings> {
  const { job, catalog } = await jobContext(db, jobId, new Date());
  const findings = checkJob(job, catalog);
  const count = (severity: string) => findings.filter((f) => f.severity === severity).length;
  return { errors: count('error'), warnings: count('warning'), notes: count('note'), findings };
}
