import { workerData } from 'node:worker_threads';
import type { ExportContext } from '../../shared/export/export-context';
import { panelFiles } from '../../shared/export/panel-files';
import { packTools } from './export-platform';
import type { PanelFilesSetup, PanelTask } from './files-ahead';

// A thread that makes panels' files for a pack being zipped by another thread (files-ahead.ts), from the
// same context and options as that thread would use.
const setup = workerData as PanelFilesSetup;
const { panelVersions, ...plain } = setup.ctx;
const ctx: ExportContext = { ...plain, panelVersion: (id) => panelVersions[id] };
const tools = packTools();

/** Every file of one panel, in the order panelFiles lists them. */
export default async function makePanelFiles({ drilling, base }: PanelTask): Promise<Uint8Array[]> {
  const options = { paper: setup.paper, ...(setup.machine ? { machine: setup.machine } : {}), ...(await tools) };
  const files: Uint8Array[] = [];
  for (const file of panelFiles(ctx, drilling, base, options)) files.push(await file.produce());
  return files;
}
