import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import type { Database } from '../db/client';
import * as repo from './request-counters.repository';

/** Prune a store's ended windows at most once in this many counted requests. */
const PRUNE_EVERY = 200;

/**
 * express-rate-limit's counts in the database (`request_counters`) instead of one process's memory, so
 * that every server on one database counts the same requests, and a restart forgets nothing. Windows are
 * judged by the app's clock, as sessions and mail links are (tests move it forward).
 */
export class DatabaseRateStore implements Store {
  /** The counts are shared between servers: express-rate-limit must not assume they are this process's. */
  readonly localKeys = false;
  private windowMs = 60_000;
  private counted = 0;

  /** `prefix` names the limit (`reset-address:`), so two limits never share a counter. */
  constructor(
    private readonly db: Database,
    private readonly clock: () => Date,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const now = this.clock();
    if (++this.counted % PRUNE_EVERY === 0) await repo.pruneCounters(this.db, this.prefix, new Date(now.getTime() - this.windowMs));
    const { hits, windowStart } = await repo.countRequest(this.db, this.prefix + key, now, this.windowMs);
    return { totalHits: hits, resetTime: new Date(windowStart.getTime() + this.windowMs) };
  }

  async decrement(key: string): Promise<void> {
    await repo.uncountRequest(this.db, this.prefix + key);
  }

  async resetKey(key: string): Promise<void> {
    await repo.deleteCounter(this.db, this.prefix + key);
  }
}
