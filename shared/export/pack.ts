import { checkJob } from '../checks/index';
import type { Finding, Severity } from '../checks/finding';
import type { Panel } from '../model/job-document';
import { carcassOrder } from '../model/panel-order';
import { cautionsFor } from './cautions';
import { coverSheet } from './cover-sheet';
import { notDrilled } from './drilling-programs';
import { DXF_LAYER_SCHEME } from './dxf-layers';
import { exportUnit, type ExportContext } from './export-context';
import { hardwareList, hardwareListCsv } from './hardware-list';
import { holeScheduleCsv } from './hole-schedule';
import { labelsPdf } from './labels';
import { PACK_FORMAT, type ManifestFile, type PackManifest } from './manifest';
import { packReadme, type PackFileNames } from './pack-readme';
import { safeSegment, UniqueNames } from './pack-paths';
import { jobDrilling, type PanelDrilling } from './panel-drilling';
import { layerOf } from './panel-dxf';
import { panelFiles, type ExportFile, type PanelFileOptions } from './panel-files';
import { drawingsPdf } from './pdf-document';
import { templateSheetCount } from './template-pdf';
import { utf8Bytes } from './utf8';

export interface PackInput extends PanelFileOptions {
  ctx: ExportContext;
  /** SHA-256 of some bytes as lower-case hex: a platform's (node:crypto on the server, SubtleCrypto in a browser). */
  sha256: (bytes: Uint8Array) => string | Promise<string>;
  /**
   * The findings the cover sheet and the manifest report; by default the checks of the job. A pack of part
   * of a job (a swap's retrofit) passes the findings of the whole job on its panels instead.
   */
  findings?: readonly Finding[];
  /**
   * The address a panel label's QR code opens (the bench page on that panel), where the pack is made by a
   * server that has one; labels made without it carry no code.
   */
  labelLink?: (panel: Panel) => string;
  /** Told after each file is made: how many are done, of how many, what the last one was and, for a panel's file, the panel's id. */
  onProgress?: (done: number, total: number, label: string, panel?: string) => void;
  /**
   * A panel file's bytes made elsewhere (another thread, from the pack's `panels`), by the file's path in
   * the zip; undefined to make it here. Hashed and told of as a file made here.
   */
  made?: (path: string) => Promise<Uint8Array> | undefined;
}

/** A file of the pack: its path in the zip and its bytes, made when asked for. */
export interface PackFile {
  path: string;
  compress: boolean;
  bytes: () => Promise<Uint8Array>;
}

/** A panel's files: what makes them anywhere (panelFiles with the pack's context and options) and their paths in order. */
export interface PackPanel {
  drilling: PanelDrilling;
  /** The start of the panel's file names in its folder. */
  base: string;
  paths: string[];
}

export interface Pack {
  /** The folder every file of the zip lies in: the job's name, made safe. */
  root: string;
  /**
   * Every file in the order to write them, manifest.json last. Ask for each file's bytes once, in this
   * order, and let them go once written: a pack of any size is then never in memory whole.
   */
  files: PackFile[];
  /** How many errors the checks found: a screen asks for a confirmation, the cover says so. */
  errors: number;
  /** Each panel's files, in the order of `files`, where they can be made apart from the rest (planPack's). */
  panels?: PackPanel[];
  /** Ends whatever makes files ahead of the zip writer; called when the zip is done or stopped. */
  close?: () => void;
}

const FIXED: PackFileNames = {
  cover: 'cover sheet.pdf',
  labels: 'panel labels.pdf',
  readme: 'README.txt',
  schedule: 'hole schedule.csv',
  hardware: 'hardware list.csv',
  manifest: 'manifest.json',
};

/**
 * Plans the bench pack of a job: a folder per carcass (and `no carcass`) with each panel's drilling maps
 * (SVG), DXF, drilling programs (G-code, when the input carries the shop's machine settings) and template
 * sheets (PDF), all drawn from the panel's one hole list; the cover sheet and the
 * panel labels (PDF, on the pack's paper); the README sheet (what the files are, the DXF layer names); the
 * hole schedule and hardware list (CSV); and manifest.json with the SHA-256 of every other file. A job
 * with error findings still gets its pack: the cover, the README and the manifest carry the findings and
 * each panel they concern says "has errors" in its files. Every name is made safe, so no name from the job
 * can leave its folder. Files are made one at a time as they are asked for.
 */
export function planPack(input: PackInput): Pack {
  const { ctx } = input;
  const { job, catalog } = ctx;
  const root = safeSegment(`${job.name} bench pack`, 'bench pack');
  const findings = input.findings ?? checkJob(job, catalog, { unit: exportUnit(ctx) });
  const drilling = jobDrilling(job, catalog, findings);
  const hardware = hardwareList(ctx, drilling);
  const producer = `${ctx.generator.name} ${ctx.generator.version}`;
  const tally = (severity: Severity) => findings.filter((f) => f.severity === severity).length;
  const pdfOptions = (title: string) => ({ fontBytes: input.fontBytes, deflate: input.deflate, title: `${job.name}: ${title}`, date: ctx.date, producer });

  const folders = new UniqueNames();
  Object.values(FIXED).forEach((name) => folders.take(name));
  const folderOf = new Map<string | undefined, { name: string; bases: UniqueNames }>();
  const panelEntries: { path: string; file: ExportFile; panel: string }[] = [];
  const packPanels: PackPanel[] = [];
  for (const d of drilling) {
    const carcass = job.carcasses.find((c) => c.id === d.panel.carcass);
    const key = carcass?.id;
    let folder = folderOf.get(key);
    if (!folder) {
      folder = { name: folders.take(carcass ? safeSegment(carcass.name, carcass.id) : 'no carcass'), bases: new UniqueNames() };
      folderOf.set(key, folder);
    }
    const base = folder.bases.take(safeSegment(d.panel.name, d.panel.id));
    const files = panelFiles(ctx, d, base, input);
    for (const file of files) panelEntries.push({ path: `${folder.name}/${file.name}`, file, panel: d.panel.id });
    packPanels.push({ drilling: d, base, paths: files.map((file) => `${root}/${folder.name}/${file.name}`) });
  }

  const fixed = (name: string, label: string, compress: boolean, produce: () => Promise<Uint8Array>) => ({ path: name, file: { name, label, compress, produce } });
  const entries: { path: string; file: ExportFile; panel?: string }[] = [
    fixed(FIXED.cover, 'cover sheet', false, () => {
      // The sheets to print, counted as the template files lay them out.
      const panels = drilling.map((d) => ({ drilling: d, sheets: templateSheetCount(ctx, d, input.paper) }));
      const pages = coverSheet({ ctx, paper: input.paper, findings, hardware, cautions: cautionsFor(job, catalog), panels, files: FIXED, programs: input.machine !== undefined });
      return drawingsPdf(pages, pdfOptions('cover sheet'));
    }),
    // A pack of no panels (a retrofit that needs none) has nothing to label.
    ...(job.panels.length === 0
      ? []
      : [
          fixed(FIXED.labels, 'panel labels', false, () =>
            labelsPdf({ ctx, panels: carcassOrder(job.carcasses, job.panels), paper: input.paper, ...(input.labelLink ? { link: input.labelLink } : {}) }, pdfOptions('panel labels')),
          ),
        ]),
    fixed(FIXED.readme, 'README', true, async () => {
      const programs = input.machine && { machine: input.machine, notDrilled: drilling.map((d) => ({ panel: d.panel, holes: notDrilled(d, input.machine!) })) };
      return utf8Bytes(packReadme(ctx, input.paper, FIXED, tally('error'), programs));
    }),
    fixed(FIXED.schedule, 'hole schedule', true, async () => utf8Bytes(holeScheduleCsv(ctx, drilling))),
    fixed(FIXED.hardware, 'hardware list', true, async () => utf8Bytes(hardwareListCsv(hardware))),
    ...panelEntries,
  ];

  const total = entries.length + 1;
  const recorded = new Map<string, ManifestFile>();
  const files: PackFile[] = entries.map(({ path, file, panel }) => ({
    path: `${root}/${path}`,
    compress: file.compress,
    bytes: async () => {
      const bytes = await (input.made?.(`${root}/${path}`) ?? file.produce());
      recorded.set(path, { path, bytes: bytes.length, sha256: await input.sha256(bytes) });
      input.onProgress?.(recorded.size, total, file.label, panel);
      return bytes;
    },
  }));

  files.push({
    path: `${root}/${FIXED.manifest}`,
    compress: true,
    bytes: async () => {
      if (recorded.size !== entries.length) throw new Error('manifest.json is written last: make every other file of the pack first');
      const manifest: PackManifest = {
        format: PACK_FORMAT,
        job: { name: job.name, ...(job.client ? { client: job.client } : {}), carcasses: job.carcasses.length, panels: job.panels.length },
        createdAt: ctx.date.toISOString(),
        generator: ctx.generator,
        paper: input.paper,
        findings: { error: tally('error'), warning: tally('warning'), note: tally('note') },
        findingList: findings.map(({ severity, code, panel, message }) => ({ severity, code, panel, message })),
        sheets: { cover: FIXED.cover, ...(job.panels.length > 0 ? { labels: FIXED.labels } : {}), readme: FIXED.readme, holeSchedule: FIXED.schedule, hardwareList: FIXED.hardware },
        dxfLayers: { ...DXF_LAYER_SCHEME, used: [...new Set(drilling.flatMap((d) => d.holes.map(layerOf)))].sort() },
        ...(input.machine ? { machine: input.machine } : {}),
        panels: drilling.map(({ panel, holes, errors, hand }) => ({
          id: panel.id,
          name: panel.name,
          ...(panel.carcass !== undefined ? { carcass: panel.carcass } : {}),
          status: panel.status,
          hasErrors: errors > 0,
          ...(hand ? { side: hand.hand } : {}),
          holes: holes.length,
          ...(input.machine ? { notDrilled: notDrilled({ holes }, input.machine) } : {}),
          files: panelEntries.filter((e) => e.panel === panel.id).map((e) => e.path),
        })),
        files: entries.map((e) => recorded.get(e.path) as ManifestFile),
      };
      const bytes = utf8Bytes(JSON.stringify(manifest, null, 2) + '\n');
      input.onProgress?.(total, total, 'manifest');
      return bytes;
    },
  });
  return { root, files, errors: tally('error'), panels: packPanels };
}
