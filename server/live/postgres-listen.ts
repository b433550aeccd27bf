import type pg from 'pg';
import { JOB_EVENTS_CHANNEL } from './job-events.repository';
import type { ListenSource } from './job-events';

/** How long to wait before connecting again after the listening connection was lost. */
const RECONNECT_MS = 1000;

/**
 * LISTEN on a pg client of its own, outside the pool: a pooled connection goes back to the pool
 * between queries, and would stop hearing. A lost connection is opened again, and listeners are told
 * to catch up from the log, as notifications sent meanwhile never arrive.
 */
export function postgresListen(Client: typeof pg.Client, url: string): ListenSource {
  return async (onPayload, onResumed) => {
    let client: pg.Client | undefined;
    let stopped = false;
    let retry: NodeJS.Timeout | undefined;
    const again = () => {
      if (!stopped) retry = setTimeout(() => void connect(true).catch(() => again()), RECONNECT_MS);
    };
    const connect = async (resumed: boolean): Promise<void> => {
      const next = new Client({ connectionString: url });
      next.on('notification', (n) => n.channel === JOB_EVENTS_CHANNEL && n.payload && onPayload(n.payload));
      const lost = () => {
        next.end().catch(() => undefined);
        if (client === next) {
          client = undefined;
          again();
        }
      };
      next.on('error', lost);
      next.on('end', lost);
      await next.connect();
      await next.query(`LISTEN ${JOB_EVENTS_CHANNEL}`);
      client = next;
      if (resumed) onResumed();
    };
    await connect(false);
    return async () => {
      stopped = true;
      clearTimeout(retry);
      await client?.end();
    };
  };
}
