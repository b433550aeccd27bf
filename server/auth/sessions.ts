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
    // Every answer renews the cookie: it lapses after idleMs without requests.
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: options.secure, maxAge: options.idleMs, path: '/' },
  });
}
