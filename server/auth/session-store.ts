import { eq, lt } from 'drizzle-orm';
import type { Request } from 'express';
import { Store, type Session, type SessionData } from 'express-session';
import type { Database } from '../db/client';
import { sessions } from '../db/schema';
import { findSession } from './sessions.repository';

/** The account a session is signed in as, read with it. */
export type SessionAccount = NonNullable<Awaited<ReturnType<typeof findSession>>>['account'];

/** Where `get` hands the account to `createSession`: a symbol, so the session's JSON never carries it. */
const ACCOUNT = Symbol('account');

/**
 * The account read with each request's session, by request: passport's deserializer takes it from here
 * instead of asking the database a second time (passport.ts).
 */
const accounts = new WeakMap<object, SessionAccount>();

/** The account read with this request's session in this request, if it was signed in as one that exists. */
export function accountReadWithSession(req: Request): SessionAccount | undefined {
  return accounts.get(req);
}

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

  /** The session, with the account it is signed in as read in the same query (kept for `createSession`). */
  override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
    findSession(this.db, sid, new Date()).then((row) => {
      if (!row) return callback(null, null);
      const sess = row.sess as unknown as SessionData & { [ACCOUNT]?: SessionAccount };
      if (row.account) sess[ACCOUNT] = row.account;
      callback(null, sess);
    }, callback);
  }

  /** express-session makes the request's session here: the account read with it is kept by request. */
  override createSession(req: Request, sess: SessionData & { [ACCOUNT]?: SessionAccount }): Session & SessionData {
    const account = sess[ACCOUNT];
    delete sess[ACCOUNT];
    if (account) accounts.set(req, account);
    return super.createSession(req, sess);
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
