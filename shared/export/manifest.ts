import type { FindingCode, Severity } from '../checks/finding';
import type { NotDrilled } from './drilling-program';
import type { DXF_LAYER_SCHEME } from './dxf-layers';
import type { MachineSettings } from './machine-settings';
import type { Generator } from './export-context';
import type { PaperName } from './paper';

/** The pack's own format: readers check it before trusting the rest. */
export const PACK_FORMAT = 'borewright.pack/1' as const;

/** One file of the pack as the manifest records it. */
export interface ManifestFile {
  /** Relative to the folder that holds manifest.json, `/` between segments. */
  path: string;
  bytes: number;
  /** SHA-256 of the file's bytes, lower-case hex. */
  sha256: string;
}

/** manifest.json: what the pack is, what made it, and every other file with its SHA-256. */
export interface PackManifest {
  format: typeof PACK_FORMAT;
  job: { name: string; client?: string; carcasses: number; panels: number };
  createdAt: string;
  generator: Generator;
  paper: PaperName;
  findings: Record<Severity, number>;
  /** Every finding of the checks the pack was made with (a pack for a job with errors is still made). */
  findingList: { severity: Severity; code: FindingCode; panel: string; message: string }[];
  /** The files at the top of the pack, by what they are. */
  sheets: { cover: string; labels?: string; readme: string; holeSchedule: string; hardwareList: string };
  /** How the DXF files name their layers, and the layers this pack's files use. */
  dxfLayers: typeof DXF_LAYER_SCHEME & { used: string[] };
  /** The machine conventions the drilling programs follow, when the pack holds programs. */
  machine?: MachineSettings;
  /**
   * Each panel's files; `hasErrors` when its files say "has errors"; `side` for a carcass side whose hand the
   * job tells; `notDrilled`, when the pack holds programs, the holes they leave out and why.
   */
  panels: { id: string; name: string; carcass?: string; status: string; hasErrors: boolean; side?: 'left' | 'right'; holes: number; notDrilled?: NotDrilled[]; files: string[] }[];
  files: ManifestFile[];
}
