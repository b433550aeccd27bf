import type { Router } from 'express';
import { signUpBody } from '../../shared/api/sign-up-contract';
import { linkParams } from '../../shared/api/team-contract';
import { mailRequestLimits } from '../auth/mail-request-limits';
import { startSession } from '../auth/start-session';
import { jsonBody } from '../http/body';
import { linkOrigin } from '../http/request-origin';
import type { RouteContext } from '../http/route-context';
import { confirmSignUp, requestSignUpLater, signUpFor } from './sign-up.service';

/**
 * Creating a shop, registered only with SIGNUP=open (otherwise every path here is the API's 404). Nobody
 * is signed in to any of them: the new shop comes from the mailed link, never from a body or a header.
 */
export function signUpRoutes(router: Router, context: RouteContext): void {
  const { config } = context;
  if (!config.signUpOpen) return;
  const limits = mailRequestLimits(context.db, context.clock, config.signUpLimits, {
    name: 'signup',
    address: (body) => signUpBody.shape.email.safeParse((body as { email?: unknown } | undefined)?.email).data,
    what: 'requests to create a shop',
  });

  // The same 202 for every well-formed request, before anything is looked up (sign-up.service.ts).
  router.post('/sign-up', jsonBody, limits, (req, res) => {
    const body = signUpBody.parse(req.body);
    res.status(202).json({ message: `Check your mail: a message is on its way to ${body.email} with what to do next.` });
    requestSignUpLater(context, body, linkOrigin(config), req.log);
  });

  // No sign-in: the link's token is the permission. 404 for an unknown link, 410 used or expired.
  router.get('/sign-up/:token', async (req, res) => {
    res.json(await signUpFor(context, linkParams.parse(req.params).token));
  });

  router.post('/sign-up/:token', async (req, res) => {
    const user = await confirmSignUp(context, linkParams.parse(req.params).token);
    await startSession(req, res, user, context);
    res.status(201).json({ user });
  });
}
