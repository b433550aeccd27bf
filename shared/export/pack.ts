import { checkJob } from '../checks/index';
import type { Finding, Severity } from '../checks/finding';
import { cautionsFor } from './cautions';
import { coverSheet } from './cover-sheet';
import { type ExportContext } from './export-context';
import { hardwareList, hardwareListCsv } from './hardware-list';
import { holeScheduleCsv } from './hole-schedule';
import { PACK_FORMAT, type ManifestFile, type PackManifest } from './manifest';
import { safeSegment, UniqueNames } from './pack-paths';
import { jobDrilling } from './panel-drilling';
import { panelFiles, type ExportFile, type PanelFileOptions } from './panel-files';
import { drawingsPdf } from './pdf-document';
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
  /** Told after each file is made: how many are done, of how many, and what the last one was. */
  onProgress?: (done: number, total: number, label: string) => void;
}

/** A file of the pack: its path in the zip and its bytes, made when asked for. */
export interface PackFile {
  path: string;
  compress: boolean;
  bytes: () => Promise<Uint8Array>;
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
}

const FIXED = { cover: 'cover sheet.pdf', schedule: 'hole schedule.csv', hardware: 'hardware list.csv', manifest: 'manifest.json' };

/**
 * Plans the bench pack of a job: a folder per carcass (and `no carcass`) with each panel's drilling maps
 * (SVG), DXF and template sheets (PDF); the cover sheet (PDF); the hole schedule and hardware list (CSV);
 * and manifest.json with the SHA-256 of every other file. Every name is made safe, so no name from the job
 * can leave its folder. Files are made one at a time as they are asked for.
 */
export function planPack(input: PackInput): Pack {
  const { ctx } = input;
  const { job, catalog } = ctx;
  const root = safeSegment(`${job.name} bench pack`, 'bench pack');
  const drilling = jobDrilling(job, catalog);
  const findings = input.findings ?? checkJob(job, catalog);
  const hardware = hardwareList(ctx);
  const producer = `${ctx.generator.name} ${ctx.generator.version}`;

  const folders = new UniqueNames();
  Object.values(FIXED).forEach((name) => folders.take(name));
  const folderOf = new Map<string | undefined, { name: string; bases: UniqueNames }>();
  const panelEntries: { path: string; file: ExportFile; panel: string }[] = [];
  for (const d of drilling) {
    const carcass = job.carcasses.find((c) => c.id === d.panel.carcass);
    const key = carcass?.id;
    let folder = folderOf.get(key);
    if (!folder) {
      folder = { name: folders.take(carcass ? safeSegment(carcass.name, carcass.id) : 'no carcass'), bases: new UniqueNames() };
      folderOf.set(key, folder);
    }
    const base = folder.bases.take(safeSegment(d.panel.name, d.panel.id));
    for (const file of panelFiles(ctx, d, base, input)) panelEntries.push({ path: `${folder.name}/${file.name}`, file, panel: d.panel.id });
  }

  const entries: { path: string; file: ExportFile }[] = [
    {
      path: FIXED.cover,
      file: {
        name: FIXED.cover,
        label: 'cover sheet',
        compress: false,
        produce: () => {
          const pages = coverSheet({ ctx, paper: input.paper, findings, hardware, cautions: cautionsFor(job, catalog), panels: drilling.map((d) => ({ panel: d.panel, bores: d.bores.length })) });
          return drawingsPdf(pages, { fontBytes: input.fontBytes, deflate: input.deflate, title: `${job.name}: cover sheet`, date: ctx.date, producer });
        },
      },
    },
    { path: FIXED.schedule, file: { name: FIXED.schedule, label: 'hole schedule', compress: true, produce: async () => utf8Bytes(holeScheduleCsv(ctx, drilling)) } },
    { path: FIXED.hardware, file: { name: FIXED.hardware, label: 'hardware list', compress: true, produce: async () => utf8Bytes(hardwareListCsv(hardware)) } },
    ...panelEntries,
  ];

  const total = entries.length + 1;
  const recorded = new Map<string, ManifestFile>();
  const files: PackFile[] = entries.map(({ path, file }) => ({
    path: `${root}/${path}`,
    compress: file.compress,
    bytes: async () => {
      const bytes = await file.produce();
      recorded.set(path, { path, bytes: bytes.length, sha256: await input.sha256(bytes) });
      input.onProgress?.(recorded.size, total, file.label);
      return bytes;
    },
  }));

  const tally = (severity: Severity) => findings.filter((f) => f.severity === severity).length;
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
        panels: drilling.map(({ panel }) => ({
          id: panel.id,
          name: panel.name,
          ...(panel.carcass !== undefined ? { carcass: panel.carcass } : {}),
          status: panel.status,
          files: panelEntries.filter((e) => e.panel === panel.id).map((e) => e.path),
        })),
        files: entries.map((e) => recorded.get(e.path) as ManifestFile),
      };
      const bytes = utf8Bytes(JSON.stringify(manifest, null, 2) + '\n');
      input.onProgress?.(total, total, 'manifest');
      return bytes;
    },
  });
  return { root, files, errors: tally('error') };
}
