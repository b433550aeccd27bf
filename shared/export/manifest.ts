import type { Severity } from '../checks/finding';
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
  panels: { id: string; name: string; carcass?: string; status: string; files: string[] }[];
  files: ManifestFile[];
}
