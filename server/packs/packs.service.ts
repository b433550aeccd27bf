import { benchPanelPath } from '../../shared/api/label-contract';
import type { JobFindings } from '../../shared/api/pack-contract';
import { checkJob, checkPanel } from '../../shared/checks/index';
import { panelDrillingMaps } from '../../shared/export/drilling-map';
import type { ExportContext } from '../../shared/export/export-context';
import { mapViews } from '../../shared/export/map-view';
import { safeSegment } from '../../shared/export/pack-paths';
import type { Pack } from '../../shared/export/pack';
import type { PaperName } from '../../shared/export/paper';
import { panelDrilling } from '../../shared/export/panel-drilling';
import { drillingPrograms } from '../../shared/export/drilling-programs';
import { panelDxf } from '../../shared/export/panel-dxf';
import { drawingToSvg } from '../../shared/export/svg-render';
import { panelTemplates, templateSheetsPdf } from '../../shared/export/template-pdf';
import type { Face } from '../../shared/model/job-document';
import type { LengthUnit } from '../../shared/units/length-unit';
import { shopCatalog } from '../catalog/shop-catalog';
import type { Database } from '../db/client';
import { toJobDocument } from '../db/job-mapping';
import { GENERATOR, packTools, pdfTools, svgWindows } from '../export/export-platform';
import { AppError, notFound } from '../http/app-error';
import { loadJobRows } from '../jobs/jobs.repository';
import { findPanel } from '../panels/panels.repository';
import { shopMachineSettings } from '../settings/settings.service';
import type { PackOrder } from './pack-order';

/** A file to send back: its name for Content-Disposition, its type and its bytes. */
export interface DownloadFile {
  name: string;
  type: string;
  bytes: Uint8Array | string;
}

/**
 * The export context of a stored job: the job as a document, the shop's catalog (the built-in fittings and
 * the shop's own), now, each panel's stored version for the title blocks and the unit of whoever asked for
 * the files (drawings in inches for someone who reads them); with each panel's database id.
 */
async function jobContext(db: Database, jobId: number, date: Date, unit: LengthUnit): Promise<ExportContext & { panelIds: ReadonlyMap<string, number> }> {
  const rows = await loadJobRows(db, jobId);
  if (!rows) throw notFound(`Job ${jobId}`);
  const versions = new Map(rows.panels.map((p) => [p.key, p.version]));
  const panelIds = new Map(rows.panels.map((p) => [p.key, p.id]));
  return { job: toJobDocument(rows), catalog: await shopCatalog(db), date, generator: GENERATOR, panelVersion: (key) => versions.get(key), unit, panelIds };
}

/**
 * One stored panel with its job's export context and its holes laid out, with the errors the checks find
 * on it (its files then say "has errors") and, for a side, its hand.
 */
async function panelContext(db: Database, panelId: number, date: Date, unit: LengthUnit = 'mm') {
  const row = await findPanel(db, panelId);
  if (!row) throw notFound(`Panel ${panelId}`);
  const ctx = await jobContext(db, row.jobId, date, unit);
  const panel = ctx.job.panels.find((p) => p.id === row.key);
  if (!panel) throw notFound(`Panel ${panelId}`);
  const drilling = panelDrilling(ctx.job, ctx.catalog, panel, checkPanel(ctx.job, panel, ctx.catalog));
  return { ctx, panel, drilling, base: safeSegment(panel.name, panel.id) };
}

/** A panel's drilling map of one face as SVG, full size; face B only when the panel has face B holes. */
export async function drillingMapSvg(db: Database, panelId: number, face: Face, date: Date, unit: LengthUnit): Promise<DownloadFile> {
  const { ctx, panel, drilling, base } = await panelContext(db, panelId, date, unit);
  const index = mapViews(drilling).findIndex((view) => view.face === face);
  if (index < 0) throw new AppError(404, 'no-such-map', `Panel ${panelId} has no bores on face ${face}, so it has no drilling map of that face.`);
  const newWindow = await svgWindows();
  const svg = drawingToSvg(panelDrillingMaps(ctx, drilling)[index], newWindow());
  return { name: `${base} face ${face}.svg`, type: 'image/svg+xml', bytes: svg };
}

/** A panel's DXF file, in millimetres. */
export async function drillingDxf(db: Database, panelId: number, date: Date): Promise<DownloadFile> {
  const { ctx, drilling, base } = await panelContext(db, panelId, date);
  return { name: `${base}.dxf`, type: 'application/dxf', bytes: panelDxf(ctx, drilling) };
}

/**
 * A panel's drilling programs (G-code), one per face and edge with holes, by the shop's machine settings,
 * as a zip made when the stream reaches each file; 404 for a panel without holes.
 */
export async function drillingProgramsZip(db: Database, panelId: number, date: Date): Promise<{ pack: Pack; fileName: string }> {
  const { ctx, drilling, base } = await panelContext(db, panelId, date);
  const programs = drillingPrograms(ctx, drilling, base, await shopMachineSettings(db));
  if (programs.length === 0) throw new AppError(404, 'no-holes', `Panel ${panelId} has no holes, so it has no drilling program.`);
  const root = `${base} drilling programs`;
  const files = programs.map((p) => ({ path: `${root}/${p.name}`, compress: p.compress, bytes: p.produce }));
  return { pack: { root, files, errors: drilling.errors }, fileName: `${root}.zip` };
}

/** A panel's template sheets, to print at 100 % on the paper asked for. */
export async function templateSheets(db: Database, panelId: number, paper: PaperName, date: Date, unit: LengthUnit): Promise<DownloadFile> {
  const { ctx, panel, drilling, base } = await panelContext(db, panelId, date, unit);
  const bytes = await templateSheetsPdf(panelTemplates(ctx, drilling, paper), {
    ...(await pdfTools()),
    title: `${ctx.job.name}: ${panel.name}, template sheets`,
    date,
    producer: `${GENERATOR.name} ${GENERATOR.version}`,
  });
  return { name: `${base} templates ${paper === 'a4' ? 'A4' : 'US Letter'}.pdf`, type: 'application/pdf', bytes };
}

/**
 * What a job's bench pack is made from, for a pack worker (pack-pool.ts): the job as stored, the shop's
 * catalog and machine settings (its drilling programs follow them), each panel's version, and the address
 * each panel label's code opens (the bench page on that panel at `origin`). Its drawings, labels and hole
 * schedule follow `unit`; a pack sent by mail is in mm, as whoever opens it has not said what they read.
 */
export async function jobPackOrder(db: Database, jobId: number, paper: PaperName, date: Date, origin: string, unit: LengthUnit): Promise<PackOrder> {
  const ctx = await jobContext(db, jobId, date, unit);
  const panelVersions = Object.fromEntries(ctx.job.panels.map((p) => [p.id, ctx.panelVersion!(p.id)!]));
  const labelLinks = Object.fromEntries(ctx.job.panels.map((p) => [p.id, `${origin}${benchPanelPath(jobId, ctx.panelIds.get(p.id)!)}`]));
  return { job: ctx.job, catalog: ctx.catalog, date, paper, panelVersions, labelLinks, unit, machine: await shopMachineSettings(db) };
}

/** The checks' findings of a job, counted by severity, their messages in the reader's unit, for the job page. */
export async function jobFindings(db: Database, jobId: number, unit: LengthUnit): Promise<JobFindings> {
  const { job, catalog } = await jobContext(db, jobId, new Date(), unit);
  const findings = checkJob(job, catalog, { unit });
  const count = (severity: string) => findings.filter((f) => f.severity === severity).length;
  return { errors: count('error'), warnings: count('warning'), notes: count('note'), findings };
}
