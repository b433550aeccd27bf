import type { Catalog } from '../../shared/catalog/fitting';
import type { MachineSettings } from '../../shared/export/machine-settings';
import type { PaperName } from '../../shared/export/paper';
import type { JobDocument } from '../../shared/model/job-document';
import type { LengthUnit } from '../../shared/units/length-unit';

/** What a pack is made from, as plain data that can be sent to a worker thread. */
export interface PackOrder {
  job: JobDocument;
  catalog: Catalog;
  date: Date;
  paper: PaperName;
  /** The unit the drawings, labels and hole schedule give lengths in. */
  unit: LengthUnit;
  /** Each panel's stored version, by the panel's document id, for the title blocks. */
  panelVersions: Record<string, number>;
  /** The address each panel's label code opens, by the panel's document id; none without a server address. */
  labelLinks?: Record<string, string>;
  /** The shop's machine settings, which the drilling programs follow; no programs without them. */
  machine?: MachineSettings;
}

/** A pack being made, as far as it has got: the panel whose files are being made, of how many. */
export interface PackProgress {
  panel: number;
  panels: number;
}

/** What a pack worker tells the thread that asked for the pack, in this order. */
export type PackMessage =
  | { type: 'planned'; root: string; errors: number }
  | { type: 'progress'; progress: PackProgress }
  | { type: 'chunk'; bytes: Uint8Array }
  | { type: 'end' };
