import type { Request, Response } from 'express';
import type { User } from '../../shared/api/contract';
import type { RouteContext } from '../http/route-context';
import { issueCsrfToken } from './csrf';
import { logIn } from './passport';

/** The XSRF cookie lives as long as an idle session, and is Secure where the session cookie is. */
export const csrfCookie = (config: RouteContext['config']) => ({ secure: config.secureCookies, maxAge: config.session.idleMs });

/**
 * Signs a member in on this request: a fresh session (passport regenerates it, against fixation),
 * the timeouts counted from now by the app's clock, and a fresh XSRF token for the new session.
 * Used by sign-in and by accepting an invitation.
 */
export async function startSession(req: Request, res: Response, user: User, { config, clock }: Pick<RouteContext, 'config' | 'clock'>): Promise<void> {
  await logIn(req, user);
  const now = clock().getTime();
  Object.assign(req.session, { signedInAt: now, lastSeenAt: now });
  issueCsrfToken(req, res, csrfCookie(config));
}
