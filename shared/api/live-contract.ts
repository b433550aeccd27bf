/**
 * The live stream of one job (GET /api/jobs/:jobId/events, server-sent events): what each event
 * carries. Every event has an id that only grows; a client that reconnects sends the last one it saw
 * (Last-Event-ID) and is given the events after it.
 */

/** Who did it, as the event names them. */
export interface LiveMember {
  id: number;
  name: string;
}

/** One stream open on the job: a member on the job page or the bench (panelId null), or in a panel's editor. */
export interface PresentMember extends LiveMember {
  panelId: number | null;
}

export interface LiveEventData {
  /** Someone opened or closed the job or a panel; `members` is everyone there afterwards. */
  presence: { change: 'joined' | 'left'; member: PresentMember; members: PresentMember[] };
  /** A panel's fields or drilling were saved: its new version (and status, unchanged). */
  'panel-saved': { panelId: number; version: number; status: string; by: LiveMember };
  /** A panel was marked planned, drilled or checked at the bench. */
  'panel-marked': { panelId: number; version: number; status: string; by: LiveMember };
  'panel-added': { panelId: number; version: number; by: LiveMember };
  'panel-deleted': { panelId: number; by: LiveMember };
  /** A carcass was planned, or planned again: the panels it wrote. */
  'job-planned': { carcass: string; panelIds: number[]; by: LiveMember };
  /** The job's own fields, or its carcasses, changed: the job's version. */
  'job-changed': { version: number; by: LiveMember };
}

export type LiveEventKind = keyof LiveEventData;

export const LIVE_EVENT_KINDS: readonly LiveEventKind[] = ['presence', 'panel-saved', 'panel-marked', 'panel-added', 'panel-deleted', 'job-planned', 'job-changed'];

export type LiveEvent = { [K in LiveEventKind]: { id: number; kind: K; data: LiveEventData[K] } }[LiveEventKind];
