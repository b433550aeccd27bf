import { asc, desc, eq, gt, lt, sql } from 'drizzle-orm';
import type { LiveEvent, LiveEventData, LiveEventKind, LiveMember, PresentMember } from '../../shared/api/live-contract';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { jobEvents, jobPresence, jobs, users } from '../db/schema';

/** The channel every server LISTENs on; a notification's payload is `jobId:eventId`, never the event itself. */
export const JOB_EVENTS_CHANNEL = 'borewright_job_events';

/** Events older than this are pruned: a browser away longer loads the job afresh anyway. */
const KEEP_EVENTS = '1 hour';
/** Every this many events, the old ones are pruned (by id, so no counter is kept anywhere). */
const PRUNE_EVERY = 200;
/** A presence row whose stream has not beaten for this long belongs to a server that went away. */
export const PRESENCE_TIMEOUT_S = 70;

export function liveMember(user: { id: number; name: string }): LiveMember {
  return { id: user.id, name: user.name };
}

/**
 * Writes an event into the job's log and notifies every server, in the caller's transaction: the
 * notification goes out only if the change commits, and after it. The job's row is locked first
 * (as every change to a job already does), so a job's events get their ids in the order they commit
 * and a stream reading "after the last id it sent" never skips one.
 */
export async function recordJobEvent<K extends LiveEventKind>(tx: Database, jobId: number, kind: K, data: LiveEventData[K]): Promise<number> {
  await tx.select({ id: jobs.id }).from(jobs).where(inOwnShop(jobs, eq(jobs.id, jobId))).for('no key update');
  const [{ id }] = await tx.insert(jobEvents).values({ jobId, kind, data: data as Record<string, unknown> }).returning({ id: jobEvents.id });
  await tx.execute(sql`select pg_notify(${JOB_EVENTS_CHANNEL}, ${`${jobId}:${id}`})`);
  if (id % PRUNE_EVERY === 0) await tx.delete(jobEvents).where(inOwnShop(jobEvents, lt(jobEvents.at, sql`now() - ${KEEP_EVENTS}::interval`)));
  return id;
}

/** The job's events after `afterId`, oldest first. */
export async function eventsAfter(db: Database, jobId: number, afterId: number): Promise<LiveEvent[]> {
  const rows = await db
    .select({ id: jobEvents.id, kind: jobEvents.kind, data: jobEvents.data })
    .from(jobEvents)
    .where(inOwnShop(jobEvents, eq(jobEvents.jobId, jobId), gt(jobEvents.id, afterId)))
    .orderBy(asc(jobEvents.id))
    .limit(500);
  return rows as LiveEvent[];
}

/** The job's newest event id, 0 when it has none: where a stream without Last-Event-ID starts. */
export async function lastEventId(db: Database, jobId: number): Promise<number> {
  const [row] = await db.select({ id: jobEvents.id }).from(jobEvents).where(inOwnShop(jobEvents, eq(jobEvents.jobId, jobId))).orderBy(desc(jobEvents.id)).limit(1);
  return row?.id ?? 0;
}

/** Everyone with the job open, one entry per member and panel, from streams that beat lately. */
async function presentMembers(tx: Database, jobId: number): Promise<PresentMember[]> {
  const rows = await tx
    .selectDistinct({ id: users.id, name: users.name, panelId: jobPresence.panelId })
    .from(jobPresence)
    .innerJoin(users, eq(users.id, jobPresence.userId))
    .where(inOwnShop(jobPresence, eq(jobPresence.jobId, jobId), gt(jobPresence.seenAt, sql`now() - ${`${PRESENCE_TIMEOUT_S} seconds`}::interval`)))
    .orderBy(asc(users.name), asc(jobPresence.panelId));
  return rows;
}

/** A stream opens: its presence row and a `presence` event naming everyone there now. */
export async function joinPresence(db: Database, stream: string, jobId: number, member: PresentMember): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.delete(jobPresence).where(inOwnShop(jobPresence, lt(jobPresence.seenAt, sql`now() - interval '1 hour'`)));
    await tx.insert(jobPresence).values({ stream, jobId, userId: member.id, panelId: member.panelId });
    await recordJobEvent(tx, jobId, 'presence', { change: 'joined', member, members: await presentMembers(tx, jobId) });
  });
}

/** A stream closes: its row goes, and a `presence` event names who is left. */
export async function leavePresence(db: Database, stream: string, jobId: number, member: PresentMember): Promise<void> {
  await db.transaction(async (tx) => {
    const gone = await tx.delete(jobPresence).where(inOwnShop(jobPresence, eq(jobPresence.stream, stream))).returning({ stream: jobPresence.stream });
    // A job deleted meanwhile took the row with it, and has no log to write to.
    if (gone.length > 0) await recordJobEvent(tx, jobId, 'presence', { change: 'left', member, members: await presentMembers(tx, jobId) });
  });
}

/** The stream's heartbeat: it is still there. */
export async function touchPresence(db: Database, stream: string): Promise<void> {
  await db.update(jobPresence).set({ seenAt: sql`now()` }).where(inOwnShop(jobPresence, eq(jobPresence.stream, stream)));
}
