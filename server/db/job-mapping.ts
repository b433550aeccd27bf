import type { PanelRecord } from '../../shared/api/contract';
import {
  JOB_FORMAT,
  hang,
  isEdgeBore,
  material,
  shopLimits,
  systemSettings,
  type Bore,
  type Carcass,
  type JobDocument,
  type Panel,
  type Placement,
} from '../../shared/model/job-document';
import type { bores, carcasses, jobs, panels, placements } from './schema';

/**
 * The only mapping between the database rows and the job document (design.md §3). Rows link by
 * database ids; the document links by the ids users gave (stored as `key`).
 */

export type JobRow = typeof jobs.$inferSelect;
export type CarcassRow = typeof carcasses.$inferSelect;
export type PanelRow = typeof panels.$inferSelect;
export type PlacementRow = typeof placements.$inferSelect;
export type BoreRow = typeof bores.$inferSelect;

/** Everything stored for one job. */
export type JobRows = {
  job: JobRow;
  carcasses: CarcassRow[];
  panels: PanelRow[];
  placements: PlacementRow[];
  bores: BoreRow[];
  /** The names of the members who marked a panel's status, by user id (the panel record says who). */
  people?: ReadonlyMap<number, string>;
};

/** Row fields the document determines; the repository adds the ids the database hands out. */
export type JobDraft = Pick<JobRow, 'name' | 'client' | 'notes' | 'system' | 'limits' | 'materials'>;
export type CarcassDraft = Omit<CarcassRow, 'id' | 'shopId' | 'jobId'>;
export type PanelDraft = Omit<PanelRow, 'id' | 'shopId' | 'jobId' | 'carcassId' | 'version' | 'updatedAt' | 'statusBy' | 'statusAt'>;
export type PlacementDraft = Omit<PlacementRow, 'id' | 'shopId' | 'panelId'>;
export type BoreDraft = Omit<BoreRow, 'id' | 'shopId' | 'panelId'>;

export type JobDocumentDraft = {
  job: JobDraft;
  carcasses: CarcassDraft[];
  panels: { panel: PanelDraft; carcassKey: string | null; placements: PlacementDraft[]; bores: BoreDraft[] }[];
};

/** A column the table's check constraint guarantees for this kind of row. */
function present<T>(value: T | null, column: string): T {
  if (value === null) throw new Error(`bore row without ${column}: the bores_kind_check constraint should have refused it`);
  return value;
}

/**
 * jsonb keeps object keys in its own order (shortest first); a document people read should list them as
 * the schema does. The value was validated when it was stored, so it is reordered, not parsed again.
 */
function inSchemaOrder<T extends object>(schema: { shape: Record<string, unknown> }, value: T): T {
  const ordered: Record<string, unknown> = {};
  for (const key of Object.keys(schema.shape)) if (key in value) ordered[key] = value[key as keyof T];
  return ordered as T;
}

const byId = <T extends { id: number }>(rows: readonly T[]) => [...rows].sort((a, b) => a.id - b.id);

/** Rows by their panel, in the order given (each panel's rows are put in order by `toPanel`, a few at a time). */
function groupByPanel<T extends { panelId: number }>(rows: readonly T[]): Map<number, T[]> {
  const groups = new Map<number, T[]>();
  for (const row of rows) {
    const group = groups.get(row.panelId);
    if (group) group.push(row);
    else groups.set(row.panelId, [row]);
  }
  return groups;
}

/** A carcass row as the document's carcass. */
export function toCarcass(row: CarcassRow): Carcass {
  const { key, name, width, height, depth, material, mounting, plannedFrom } = row;
  return { id: key, name, width, height, depth, material, mounting, ...(plannedFrom ? { plannedFrom } : {}) };
}

/** The document's carcass as a row to store; what the document leaves out is null in the row. */
export function carcassDraft({ id, plannedFrom, ...fields }: Carcass): CarcassDraft {
  return { key: id, ...fields, plannedFrom: plannedFrom ?? null };
}

/** A placement row as the document's placement; absent options stay absent. */
export function toPlacement(row: PlacementRow): Placement {
  return {
    id: row.key,
    fitting: row.fitting,
    x: row.x,
    y: row.y,
    face: row.face,
    rotation: row.rotation,
    ...(row.mirrored !== null && { mirrored: row.mirrored }),
    ...(row.params !== null && { params: row.params }),
  };
}

/** A bore row as the document's face or edge bore. */
export function toBore(row: BoreRow): Bore {
  // Each kind as one literal, not spread from a common part: a large job maps tens of thousands.
  return row.edge !== null
    ? { id: row.key, diameter: row.diameter, depth: row.depth, edge: row.edge, at: present(row.at, 'at'), z: present(row.z, 'z') }
    : { id: row.key, diameter: row.diameter, depth: row.depth, x: present(row.x, 'x'), y: present(row.y, 'y'), face: present(row.face, 'face') };
}

/** One panel of the document from its row and its children's rows (in stored order). */
export function toPanel(row: PanelRow, carcassKey: string | undefined, placementRows: readonly PlacementRow[], boreRows: readonly BoreRow[]): Panel {
  return {
    id: row.key,
    name: row.name,
    role: row.role,
    ...(carcassKey !== undefined && { carcass: carcassKey }),
    width: row.width,
    height: row.height,
    thickness: row.thickness,
    material: row.material,
    status: row.status,
    ...(row.hang !== null && { hang: inSchemaOrder(hang, row.hang) }),
    ...(row.handleMass !== null && { handleMass: row.handleMass }),
    placements: byId(placementRows).map(toPlacement),
    bores: byId(boreRows).map(toBore),
  };
}

/**
 * A panel as the API returns it: the document's panel plus what the database keeps about it. `statusBy`
 * is the name of the member the row's status_by names, looked up by the caller.
 */
export function toPanelRecord(
  row: PanelRow,
  carcassKey: string | undefined,
  placementRows: readonly PlacementRow[],
  boreRows: readonly BoreRow[],
  statusBy: string | null = null,
): PanelRecord {
  return {
    ...toPanel(row, carcassKey, placementRows, boreRows),
    dbId: row.id,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    statusBy,
    statusAt: row.statusAt?.toISOString() ?? null,
  };
}

/** Each panel of the job made by `make` from its row and children, in stored order. */
function eachPanel<T>(rows: Omit<JobRows, 'job'>, make: (row: PanelRow, carcassKey: string | undefined, placements: PlacementRow[], bores: BoreRow[]) => T): T[] {
  const carcassKeys = new Map(rows.carcasses.map((c) => [c.id, c.key]));
  const placementsOf = groupByPanel(rows.placements);
  const boresOf = groupByPanel(rows.bores);
  return byId(rows.panels).map((p) =>
    make(p, p.carcassId === null ? undefined : carcassKeys.get(p.carcassId), placementsOf.get(p.id) ?? [], boresOf.get(p.id) ?? []),
  );
}

/** Each panel of the job as a panel record, in stored order. */
export function toPanelRecords(rows: Omit<JobRows, 'job'>): PanelRecord[] {
  return eachPanel(rows, (row, carcassKey, placementRows, boreRows) =>
    toPanelRecord(row, carcassKey, placementRows, boreRows, row.statusBy === null ? null : (rows.people?.get(row.statusBy) ?? null)),
  );
}

/** The stored job as a `borewright.job/1` document. */
export function toJobDocument(rows: JobRows): JobDocument {
  const { job } = rows;
  return {
    format: JOB_FORMAT,
    name: job.name,
    ...(job.client !== null && { client: job.client }),
    ...(job.notes !== null && { notes: job.notes }),
    system: inSchemaOrder(systemSettings, job.system),
    limits: inSchemaOrder(shopLimits, job.limits),
    materials: job.materials.map((m) => inSchemaOrder(material, m)),
    carcasses: byId(rows.carcasses).map(toCarcass),
    panels: eachPanel(rows, toPanel),
  };
}

/** A placement of the document as the fields of its row. */
export function placementDraft(p: Placement): PlacementDraft {
  return {
    key: p.id,
    fitting: p.fitting,
    x: p.x,
    y: p.y,
    face: p.face,
    rotation: p.rotation,
    mirrored: p.mirrored ?? null,
    params: p.params ?? null,
  };
}

/** A panel of the document as the fields of its row (its drilling and carcass link are stored apart). */
export function panelDraft(p: Panel): PanelDraft {
  return {
    key: p.id,
    name: p.name,
    role: p.role,
    width: p.width,
    height: p.height,
    thickness: p.thickness,
    material: p.material,
    status: p.status,
    hang: p.hang ?? null,
    handleMass: p.handleMass ?? null,
  };
}

/** A face or edge bore of the document as the fields of its row; the other kind's columns stay null. */
export function boreDraft(b: Bore): BoreDraft {
  const none = { x: null, y: null, face: null, edge: null, at: null, z: null };
  return isEdgeBore(b)
    ? { ...none, key: b.id, edge: b.edge, at: b.at, z: b.z, diameter: b.diameter, depth: b.depth }
    : { ...none, key: b.id, x: b.x, y: b.y, face: b.face, diameter: b.diameter, depth: b.depth };
}

/** A validated job document as rows to store, linked by the document's ids. */
export function fromJobDocument(doc: JobDocument): JobDocumentDraft {
  return {
    job: {
      name: doc.name,
      client: doc.client ?? null,
      notes: doc.notes ?? null,
      system: doc.system,
      limits: doc.limits,
      materials: doc.materials,
    },
    carcasses: doc.carcasses.map(carcassDraft),
    panels: doc.panels.map((p) => ({
      panel: panelDraft(p),
      carcassKey: p.carcass ?? null,
      placements: p.placements.map(placementDraft),
      bores: p.bores.map(boreDraft),
    })),
  };
}
