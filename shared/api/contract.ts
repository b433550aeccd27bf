import * as z from 'zod';
import { text } from '../model/well-formed-text';
import { lengthUnit } from './session-contract';
import { bore, carcass, displayName, material, panel, panelRole, panelStatus, placement, shopLimits, systemSettings } from '../model/job-document';

/**
 * The HTTP API's bodies and answers, shared by the server (which validates what comes in) and the
 * client (which validates what comes back). Paths are listed in DEVELOPERS.md.
 */
export * from './session-contract';

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

/** What a signed-in user changes about themself (PATCH /api/auth/me/preferences). */
export const preferencesBody = z.object({ units: lengthUnit });

export const jobSummary = z.object({
  id: z.number().int(),
  name: z.string(),
  client: z.string().nullable(),
  archived: z.boolean(),
  /** The version of the job's own fields; a change sends it back, and a stale one answers 409. */
  version: z.number().int(),
  carcassCount: z.number().int(),
  panelCount: z.number().int(),
  updatedAt: z.string(),
});
export type JobSummary = z.output<typeof jobSummary>;

export const jobCreateBody = z.object({
  name: displayName,
  client: text.trim().max(200).optional(),
  notes: text.max(10_000).optional(),
});

export const jobUpdateBody = z
  .object({
    name: displayName.optional(),
    client: text.trim().max(200).nullable().optional(),
    notes: text.max(10_000).nullable().optional(),
    archived: z.boolean().optional(),
    /** The version the client last saw; a stale one answers 409. */
    version: z.number().int().min(1),
  })
  .refine((b) => Object.keys(b).length > 1, 'nothing to change: send at least one field besides version');

/** A panel as the API returns it: the document's panel plus its database id, carcass id and version. */
export const panelRecord = panel.extend({
  dbId: z.number().int(),
  version: z.number().int(),
  updatedAt: z.string(),
  /**
   * Who marked the panel its current status and when (ISO 8601). Both null while it is planned; the name
   * is null too when the status came with an imported document or its member has since been removed.
   */
  statusBy: z.string().nullable(),
  statusAt: z.string().nullable(),
});
export type PanelRecord = z.output<typeof panelRecord>;

export const jobDetail = z.object({
  job: jobSummary.extend({ notes: z.string().nullable() }),
  materials: z.array(material),
  /** The job's own system and shop limits: the planner's preview plans with them, as the server does. */
  system: systemSettings,
  limits: shopLimits,
  carcasses: z.array(carcass),
  panels: z.array(panelRecord),
});
export type JobDetail = z.output<typeof jobDetail>;

export const carcassCreateBody = carcass.omit({ id: true, plannedFrom: true }).extend({ id: carcass.shape.id.optional() });

/** Adding or editing a panel's board data; its drilling changes through the editor. */
export const panelFieldsBody = z.object({
  name: displayName,
  role: panelRole,
  carcass: text.max(64).nullable().optional(),
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

/** A database id as it appears in a URL path or query: a positive whole number that fits an integer column. */
export const dbId = z
  .string()
  .regex(/^[1-9][0-9]{0,9}$/, 'must be a positive whole number')
  .transform(Number)
  .refine((n) => n <= 2_147_483_647, 'is too large');

export const jobParams = z.object({ jobId: dbId });
export const panelParams = z.object({ panelId: dbId });

/** The last event id a live stream's client saw (its Last-Event-ID header); 0 replays the whole log. */
export const liveEventId = z.string().regex(/^(0|[1-9][0-9]{0,14})$/, 'must be an event id').transform(Number);

/** GET /api/jobs/:jobId/events: the panel open in the editor, if any (see live-contract.ts). */
export const jobEventsQuery = z.object({ panel: dbId.optional(), lastEventId: liveEventId.optional() });

export const jobListQuery = z.object({
  archived: z
    .enum(['true', 'false'], 'must be "true" or "false"')
    .default('false')
    .transform((v) => v === 'true'),
});

/** DELETE carries the version it saw in the query, as a DELETE has no body. */
export const panelDeleteQuery = z.object({
  version: z
    .string('is required')
    .regex(/^[1-9][0-9]{0,9}$/, 'must be a positive whole number')
    .transform(Number),
});

export const activityQuery = z.object({ jobId: dbId.optional() });

export const jobList = z.object({ jobs: z.array(jobSummary) });

/** Saving a panel's drilling from the editor: the whole lists replace the stored ones. */
export const panelDrillingBody = z
  .object({
    version: z.number().int().min(1),
    placements: z.array(placement).max(5000),
    bores: z.array(bore).max(20000),
  })
  .superRefine((body, ctx) => {
    for (const list of ['placements', 'bores'] as const) {
      const seen = new Set<string>();
      body[list].forEach((item, i) => {
        if (seen.has(item.id)) ctx.addIssue({ code: 'custom', path: [list, i, 'id'], message: `duplicate id "${item.id}"` });
        seen.add(item.id);
      });
    }
  });

export const activityEntry = z.object({
  id: z.number().int(),
  at: z.string(),
  action: z.string(),
  jobId: z.number().int().nullable(),
  panelId: z.number().int().nullable(),
  user: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  details: z.record(z.string(), z.unknown()),
});
export type ActivityEntry = z.output<typeof activityEntry>;
export const activityList = z.object({ entries: z.array(activityEntry) });
