import type { RequestHandler } from 'express';

/**
 * A request is recorded as the session's last one at most this often: recording it changes the session,
 * and a changed session is written to the database, which every request would otherwise do. The idle
 * timeout may so end a session up to this much early, never late.
 */
export const SEEN_STEP_MS = 60_000;

/**
 * Ends a signed-in session that has been idle too long or lived too long since sign-in, by the
 * app's clock (injectable, so tests need not wait). The request then goes on as signed out.
 * The cookie's rolling maxAge lets the browser drop an idle session too; this check is the one
 * that counts.
 */
export function sessionTimeouts(limits: { idleMs: number; absoluteMs: number }, clock: () => Date): RequestHandler {
  return (req, _res, next) => {
    const session = req.session;
    if (!session?.passport?.user) return next();
    const now = clock().getTime();
    const signedInAt = session.signedInAt ?? 0;
    const lastSeenAt = session.lastSeenAt ?? signedInAt;
    if (now - signedInAt > limits.absoluteMs || now - lastSeenAt > limits.idleMs) {
      session.regenerate(next);
      return;
    }
    if (now - lastSeenAt >= SEEN_STEP_MS) session.lastSeenAt = now;
    next();
  };
}
