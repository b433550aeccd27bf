import type { Router } from 'express';
import { signInBody } from '../../shared/api/contract';
import { AppError } from '../http/app-error';
import { jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import { issueCsrfToken } from './csrf';
import { authenticateLocal, logIn } from './passport';
import { signInLimits } from './sign-in-limits';

/** Sign-in, sign-out and "who am I"; /auth/me also hands the client its XSRF token. */
export function authRoutes(router: Router, { config, clock, authenticator }: RouteContext): void {
  const cookie = { secure: config.secureCookies, maxAge: config.session.idleMs };

  router.get('/auth/me', (req, res) => {
    issueCsrfToken(req, res, cookie);
    if (!req.user) throw new AppError(401, 'unauthenticated', 'Not signed in.');
    res.json({ user: req.user });
  });

  router.post('/auth/sign-in', jsonBody, signInLimits(config.signInLimits), async (req, res) => {
    req.body = signInBody.parse(req.body);
    const user = await authenticateLocal(authenticator, req, res);
    await logIn(req, user);
    const now = clock().getTime();
    Object.assign(req.session, { signedInAt: now, lastSeenAt: now });
    issueCsrfToken(req, res, cookie);
    res.json({ user });
  });

  // The signed-in session is destroyed; a fresh, empty one with its own token takes its place, so the
  // sign-in page can send a new sign-in without reloading.
  router.post('/auth/sign-out', async (req, res) => {
    await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
    issueCsrfToken(req, res, cookie);
    res.status(204).end();
  });
}
