import { z } from 'zod';
import { carcass, displayName, material, panel, panelRole, panelStatus } from '../model/job-document';

/**
 * The HTTP API's bodies and answers, shared by the server (which validates what comes in) and the
 * client (which validates what comes back). Paths are listed in DEVELOPERS.md.
 */

export const role = z.enum(['admin', 'designer', 'bench', 'viewer']);
export type Role = z.output<typeof role>;

/** What each role may do (design.md §1); the server enforces it, the client hides what is not allowed. */
export const permissions = {
  readJobs: ['admin', 'designer', 'bench', 'viewer'],
  editJobs: ['admin', 'designer'],
  markPanels: ['admin', 'designer', 'bench'],
  manageTeam: ['admin'],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof permissions;

export function can(userRole: Role | undefined, permission: Permission): boolean {
  return userRole !== undefined && (permissions[permission] as readonly Role[]).includes(userRole);
}

/** UTF-8 length without TextEncoder, which shared/'s platform-free lib does not declare. */
export function utf8Length(text: string): number {
  let bytes = 0;
  for (const ch of text) {
    const code = ch.codePointAt(0) ?? 0;
    bytes += code < 0x80 ? 1 : code < 0x800 ? 2 : code < 0x10000 ? 3 : 4;
  }
  return bytes;
}

/** bcrypt reads at most 72 bytes of a password; we refuse longer ones rather than cut them silently. */
export const password = z
  .string()
  .refine((p) => utf8Length(p) >= 8, 'must be at least 8 bytes long')
  .refine((p) => utf8Length(p) <= 72, 'must be at most 72 bytes long (UTF-8)');

export const signInBody = z.object({
  email: z.string().trim().toLowerCase().email('must be an e-mail address').max(254),
  password: z.string().min(1, 'must not be empty').max(1024),
});

export const user = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role,
});
export type User = z.output<typeof user>;

export const jobSummary = z.object({
  id: z.number().int(),
  name: z.string(),
  client: z.string().nullable(),
  archived: z.boolean(),
  carcassCount: z.number().int(),
  panelCount: z.number().int(),
  updatedAt: z.string(),
});
export type JobSummary = z.output<typeof jobSummary>;

export const jobCreateBody = z.object({
  name: displayName,
  client: z.string().trim().max(200).optional(),
  notes: z.string().max(10_000).optional(),
});

export const jobUpdateBody = z
  .object({
    name: displayName.optional(),
    client: z.string().trim().max(200).nullable().optional(),
    notes: z.string().max(10_000).nullable().optional(),
    archived: z.boolean().optional(),
  })
  .refine((b) => Object.keys(b).length > 0, 'nothing to change');

/** A panel as the API returns it: the document's panel plus its database id, carcass id and version. */
export const panelRecord = panel.extend({
  dbId: z.number().int(),
  version: z.number().int(),
  updatedAt: z.string(),
});
export type PanelRecord = z.output<typeof panelRecord>;

export const jobDetail = z.object({
  job: jobSummary.extend({ notes: z.string().nullable() }),
  materials: z.array(material),
  carcasses: z.array(carcass),
  panels: z.array(panelRecord),
});
export type JobDetail = z.output<typeof jobDetail>;

export const carcassCreateBody = carcass.omit({ id: true }).extend({ id: carcass.shape.id.optional() });

/** Adding or editing a panel's board data; its drilling changes through the editor. */
export const panelFieldsBody = z.object({
  name: displayName,
  role: panelRole,
  carcass: z.string().max(64).nullable().optional(),
  width: panel.shape.width,
  height: panel.shape.height,
  thickness: panel.shape.thickness,
  material: panel.shape.material,
});

export const panelUpdateBody = panelFieldsBody.partial().extend({
  /** The version the client last saw; a stale one answers 409. */
  version: z.number().int().min(1),
});

export const panelStatusBody = z.object({ status: panelStatus, version: z.number().int().min(1) });

/** Every error answer of the API has this shape. */
export const apiError = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    /** Field messages by path, for 400s. */
    fields: z.record(z.string(), z.string()).optional(),
    /** Every problem of an uploaded document, one line each, led by its path. */
    details: z.array(z.string()).optional(),
  }),
});
export type ApiError = z.output<typeof apiError>;
