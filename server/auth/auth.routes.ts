import type { Router } from 'express';
import { preferencesBody, signInBody } from '../../shared/api/contract';
import { linkParams, passwordResetBody, passwordResetRequestBody } from '../../shared/api/team-contract';
import { AppError } from '../http/app-error';
import { jsonBody } from '../http/body';
import { linkOrigin } from '../http/request-origin';
import type { RouteContext } from '../http/route-context';
import { issueCsrfToken } from './csrf';
import { changePreferences } from './auth.service';
import { authenticateLocal } from './passport';
import { passwordResetFor, requestPasswordResetLater, resetPassword } from './password-reset.service';
import { mailRequestLimits } from './mail-request-limits';
import { throttledSignIn } from './sign-in-throttle';
import { csrfCookie, startSession } from './start-session';

/** Sign-in, sign-out, "who am I" and password reset by mail; /auth/me also hands the client its XSRF token. */
export function authRoutes(router: Router, context: RouteContext): void {
  const { config, authenticator } = context;
  const cookie = csrfCookie(config);
  const resetLimits = mailRequestLimits(context.db, context.clock, config.passwordResetLimits, {
    name: 'reset',
    address: (body) => passwordResetRequestBody.safeParse(body).data?.email,
    what: 'password reset requests',
  });

  router.get('/auth/me', (req, res) => {
    issueCsrfToken(req, res, cookie);
    if (!req.user) throw new AppError(401, 'unauthenticated', 'Not signed in.');
    res.json({ user: req.user });
  });

  // What the app asks on load: whoever is signed in, or null. Nobody signed in is an answer, not an
  // error, so the sign-in page loads without a 401 in the browser's console.
  router.get('/auth/session', (req, res) => {
    issueCsrfToken(req, res, cookie);
    res.json({ user: req.user ?? null, signUpOpen: config.signUpOpen });
  });

  // Every role chooses for themself how lengths read; nobody changes another's.
  router.patch('/auth/me/preferences', jsonBody, async (req, res) => {
    if (!req.user) throw new AppError(401, 'unauthenticated', 'Sign in first.');
    res.json({ user: await changePreferences(context.db, req.user.id, preferencesBody.parse(req.body)) });
  });

  router.post('/auth/sign-in', jsonBody, async (req, res) => {
    req.body = signInBody.parse(req.body);
    const attempt = { db: context.db, limits: config.signInThrottle, now: context.clock(), ip: req.ip ?? '', email: req.body.email };
    const user = await throttledSignIn(attempt, () => authenticateLocal(authenticator, req, res));
    await startSession(req, res, user, context);
    res.json({ user });
  });

  // The signed-in session is destroyed; a fresh, empty one with its own token takes its place, so the
  // sign-in page can send a new sign-in without reloading.
  router.post('/auth/sign-out', async (req, res) => {
    await context.liveStreams.endSession(req.sessionID);
    await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
    issueCsrfToken(req, res, cookie);
    res.status(204).end();
  });

  // The same 202 for every well-formed address, before anything is looked up: the answer says nothing
  // about who has an account, and the mail (if any) is sent after it has gone.
  router.post('/auth/password-reset', jsonBody, resetLimits, (req, res) => {
    const { email } = passwordResetRequestBody.parse(req.body);
    res.status(202).json({ message: 'If this address belongs to a member of the shop, a link to choose a new password is on its way to it.' });
    requestPasswordResetLater(context, email, linkOrigin(config), req.log);
  });

  // No sign-in: the link's token is the permission. 404 for an unknown link, 410 used or expired.
  router.get('/auth/password-reset/:token', async (req, res) => {
    res.json(await passwordResetFor(context, linkParams.parse(req.params).token));
  });

  router.post('/auth/password-reset/:token', jsonBody, async (req, res) => {
    const body = passwordResetBody.parse(req.body);
    await resetPassword(context, linkParams.parse(req.params).token, body, req.sessionID);
    res.status(204).end();
  });
}
