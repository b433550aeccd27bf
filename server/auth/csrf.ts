import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { AppError } from '../http/app-error';

/** Angular's HttpClient reads this cookie and echoes it in the header below on every mutating request. */
export const XSRF_COOKIE = 'XSRF-TOKEN';
export const XSRF_HEADER = 'X-XSRF-TOKEN';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Sets the XSRF-TOKEN cookie to the session's token, making one when the session has none (a new
 * session after sign-in has none, so the client gets a fresh token then).
 */
export function issueCsrfToken(req: Request, res: Response, cookie: { secure: boolean; maxAge: number }): void {
  req.session.csrfToken ??= randomBytes(32).toString('base64url');
  // Readable by the page's script on purpose: that is how the client learns it. SameSite keeps other sites from sending it.
  res.cookie(XSRF_COOKIE, req.session.csrfToken, { httpOnly: false, sameSite: 'lax', secure: cookie.secure, maxAge: cookie.maxAge, path: '/' });
}

function matches(expected: string, got: string): boolean {
  const a = Buffer.from(expected);
  const b = Buffer.from(got);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** Refuses every mutating request whose X-XSRF-TOKEN header does not match its session's token. */
export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const expected = req.session?.csrfToken;
  const got = req.get(XSRF_HEADER);
  if (expected && got && matches(expected, got)) return next();
  next(
    new AppError(403, 'csrf', 'This request lacks a valid X-XSRF-TOKEN header. Reload the page (GET /api/auth/me sets the XSRF-TOKEN cookie) and try again.'),
  );
};
