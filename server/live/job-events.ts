/**
 * Word that a job has a new event, from whichever server wrote it: the database's NOTIFY on
 * JOB_EVENTS_CHANNEL (recordJobEvent sends it in the writing transaction). The event itself is read
 * from the job's log (job-events.repository.ts), so a notification only needs the job's id.
 */
export interface JobEvents {
  /**
   * Calls `listener` whenever the job may have new events: on a notification for it, and after the
   * listening connection was lost and came back (notifications may have been missed meanwhile).
   * Starts listening on the first subscription. Returns the unsubscribe.
   */
  subscribe(jobId: number, listener: () => void): Promise<() => void>;
  close(): Promise<void>;
}

/** Starts listening; `onPayload` gets each notification's payload, `onResumed` each time listening resumes after a loss. */
export type ListenSource = (onPayload: (payload: string) => void, onResumed: () => void) => Promise<() => Promise<void>>;

/**
 * The one JobEvents: listeners by job over a listening source, which is what differs by engine
 * (server/db/client.ts): a dedicated pg client on PostgreSQL, PGlite's own listen in PGlite.
 */
export function jobEventsOver(source: ListenSource): JobEvents {
  const listeners = new Map<number, Set<() => void>>();
  let started: Promise<() => Promise<void>> | undefined;
  const notify = (jobId: number) => listeners.get(jobId)?.forEach((listener) => listener());
  return {
    async subscribe(jobId, listener) {
      // A start that failed (the database unreachable) is tried again by the next subscription.
      const starting = (started ??= source(
        (payload) => notify(Number(payload.split(':')[0])),
        () => [...listeners.keys()].forEach(notify),
      ).catch((err: unknown) => {
        if (started === starting) started = undefined;
        throw err;
      }));
      await starting;
      const set = listeners.get(jobId) ?? new Set();
      listeners.set(jobId, set.add(listener));
      return () => {
        set.delete(listener);
        if (set.size === 0 && listeners.get(jobId) === set) listeners.delete(jobId);
      };
    },
    async close() {
      listeners.clear();
      const stop = await started?.catch(() => undefined);
      started = undefined;
      await stop?.();
    },
  };
}
