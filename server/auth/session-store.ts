import { eq, gt, lt, and } from 'drizzle-orm';
import { Store, type SessionData } from 'express-session';
import type { Database } from '../db/client';
import { sessions } from '../db/schema';

type Callback = (err?: unknown) => void;

/** Prune expired rows at most this often, on a write: no timer to stop at shutdown. */
const PRUNE_EVERY_MS = 60 * 60_000;

/**
 * express-session's store over the sessions table, for both engines. Expiry follows the session
 * cookie (rolling idle timeout); expired rows are never returned and are pruned now and then.
 */
export class DrizzleSessionStore extends Store {
  private lastPrune = 0;

  constructor(private readonly db: Database) {
    super();
  }

  private settle(work: Promise<unknown>, callback?: Callback): void {
    work.then(() => callback?.(), (err: unknown) => callback?.(err));
  }

  private static expiry(sess: SessionData): Date {
    const expires = sess.cookie?.expires;
    // A cookie without expiry lives for the browser session; keep the row a day.
    return expires ? new Date(expires) : new Date(Date.now() + 86_400_000);
  }

  override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
    this.db
      .select({ sess: sessions.sess })
      .from(sessions)
      .where(and(eq(sessions.sid, sid), gt(sessions.expire, new Date())))
      .then(([row]) => callback(null, (row?.sess as unknown as SessionData | undefined) ?? null), callback);
  }

  override set(sid: string, sess: SessionData, callback?: Callback): void {
    const row = { sid, sess: sess as unknown as Record<string, unknown>, expire: DrizzleSessionStore.expiry(sess) };
    this.settle(
      this.db
        .insert(sessions)
        .values(row)
        .onConflictDoUpdate({ target: sessions.sid, set: { sess: row.sess, expire: row.expire } })
        .then(() => this.pruneNowAndThen()),
      callback,
    );
  }

  /**
   * Called on every answer that left the session unchanged (the cookie rolls). A signed-in session's row
   * is written whenever its last request is recorded (session-timeouts.ts), with an expiry no earlier than
   * the idle timeout would end it, so only a session that is not signed in needs the write.
   */
  override touch(sid: string, sess: SessionData, callback?: Callback): void {
    if (sess.passport?.user !== undefined) {
      callback?.();
      return;
    }
    this.settle(this.db.update(sessions).set({ expire: DrizzleSessionStore.expiry(sess) }).where(eq(sessions.sid, sid)), callback);
  }

  override destroy(sid: string, callback?: Callback): void {
    this.settle(this.db.delete(sessions).where(eq(sessions.sid, sid)), callback);
  }

  /** Deletes every expired session. */
  async prune(): Promise<void> {
    await this.db.delete(sessions).where(lt(sessions.expire, new Date()));
  }

  private async pruneNowAndThen(): Promise<void> {
    const now = Date.now();
    if (now - this.lastPrune < PRUNE_EVERY_MS) return;
    this.lastPrune = now;
    await this.prune();
  }
}
