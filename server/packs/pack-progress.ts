import { setTimeout as delay } from 'node:timers/promises';
import { eq, lt, sql } from 'drizzle-orm';
import { PROGRESS_POLL_MS } from '../../shared/api/pack-contract';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { inShop, requireShop } from '../db/shop-scope';
import { packProgress } from '../db/schema';
import type { PackProgress } from './pack-order';

/**
 * The least time between two writes of one pack's row: half a client's poll, so each poll still finds a
 * newer panel, where a write for every panel cost the thread that answers requests some thirty writes a
 * second on a large job.
 */
export const PROGRESS_WRITE_MS = PROGRESS_POLL_MS / 2;

/**
 * How far each pack being made has got, by the ticket its download named: a row in the database, so a
 * poll answered by any server sees a pack made on another. A worker reports every panel; the row is
 * written one write at a time, at most every PROGRESS_WRITE_MS, with the newest report, so the panel
 * reached never goes back.
 */
export class PackProgressBoard {
  private readonly writing = new Map<string, { done: Promise<void>; stop: AbortController }>();

  constructor(
    private readonly db: Database,
    private readonly onError: (err: unknown) => void,
  ) {}

  /**
   * Follows a pack from its start, with no panel reached yet, until `finish`. The reports come from the
   * pack worker's messages, outside the request's scope, so they are written in the shop that started it.
   */
  async start(ticket: string, panels: number): Promise<(progress: PackProgress) => void> {
    const shopId = requireShop();
    // A server that stopped while making a pack left its row behind.
    await this.db.delete(packProgress).where(inOwnShop(packProgress, lt(packProgress.updatedAt, sql`now() - interval '1 hour'`)));
    await this.db
      .insert(packProgress)
      .values({ ticket, panel: 0, panels })
      .onConflictDoUpdate({ target: packProgress.ticket, set: { panel: 0, panels, updatedAt: sql`now()` } });
    let latest: PackProgress | undefined;
    let busy = false;
    let lastWrite = 0;
    const stop = new AbortController();
    const write = async (): Promise<void> => {
      while (latest) {
        // Reports that come during the pause are written as one, the newest; `finish` ends the pause.
        const pause = lastWrite + PROGRESS_WRITE_MS - Date.now();
        if (pause > 0) await delay(pause, undefined, { signal: stop.signal }).catch(() => undefined);
        if (stop.signal.aborted) return;
        const next = latest;
        latest = undefined;
        lastWrite = Date.now();
        await this.db.update(packProgress).set({ panel: next.panel, panels: next.panels, updatedAt: sql`now()` }).where(inOwnShop(packProgress, eq(packProgress.ticket, ticket)));
      }
    };
    return (progress) => {
      latest = progress;
      if (busy) return;
      busy = true;
      const done = inShop(shopId, write)
        .catch(this.onError)
        .finally(() => (busy = false));
      this.writing.set(ticket, { done, stop });
    };
  }

  /** The pack is done (or dropped): its row goes, after any write already on its way; a report still waiting is dropped. */
  async finish(ticket: string): Promise<void> {
    const writing = this.writing.get(ticket);
    writing?.stop.abort();
    await writing?.done;
    this.writing.delete(ticket);
    await this.db.delete(packProgress).where(inOwnShop(packProgress, eq(packProgress.ticket, ticket)));
  }

  /** How far the pack of `ticket` has got; undefined when no such pack is being made. */
  async get(ticket: string): Promise<PackProgress | undefined> {
    const [row] = await this.db.select({ panel: packProgress.panel, panels: packProgress.panels }).from(packProgress).where(inOwnShop(packProgress, eq(packProgress.ticket, ticket)));
    return row;
  }
}
