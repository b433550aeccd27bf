import type { RequestHandler } from 'express';
import session from 'express-session';
import type { Database } from '../db/client';
import { DrizzleSessionStore } from './session-store';

export const SESSION_COOKIE = 'borewright.sid';

/** The session cookie: script cannot read it, other sites do not send it on their POSTs, HTTPS only in production. */
export function sessionMiddleware(db: Database, options: { secret: string; secure: boolean; idleMs: number }): RequestHandler {
  return session({
    name: SESSION_COOKIE,
    secret: options.secret,
    store: new DrizzleSessionStore(db),
    resave: false,
    saveUninitialized: false,
    // The cookie is sent again whenever the session changes, which a signed-in one does at least once a
    // minute of use (its last request, session-timeouts.ts): so it lapses after idleMs without requests, as
    // the session does, and an answer in between carries no cookie to sign.
    rolling: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: options.secure, maxAge: options.idleMs, path: '/' },
  });
}
