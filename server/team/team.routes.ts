import type { Router } from 'express';
import { acceptInvitationBody, linkParams, invitationBody, invitationParams, memberParams, memberUpdateBody } from '../../shared/api/team-contract';
import { requirePermission } from '../auth/require-permission';
import { startSession } from '../auth/start-session';
import { jsonBody } from '../http/body';
import { linkOrigin } from '../http/request-origin';
import type { RouteContext } from '../http/route-context';
import { acceptInvitation, invitationFor } from './invitations.service';
import * as team from './team.service';

/** The team (admins only): members, roles, deactivation, invitations; and the public invitation links. */
export function teamRoutes(router: Router, context: RouteContext): void {
  const { db, clock } = context;

  router.get('/team', requirePermission('manageTeam'), async (_req, res) => {
    res.json(await team.teamOverview(db, clock()));
  });

  router.post('/team/invitations', requirePermission('manageTeam'), jsonBody, async (req, res) => {
    const body = invitationBody.parse(req.body);
    res.status(201).json(await team.inviteMember(context, req.user!, body, linkOrigin(context.config, req)));
  });

  router.delete('/team/invitations/:invitationId', requirePermission('manageTeam'), async (req, res) => {
    const { invitationId } = invitationParams.parse(req.params);
    await team.withdrawInvitation(db, req.user!, invitationId);
    res.status(204).end();
  });

  router.patch('/team/members/:userId', requirePermission('manageTeam'), jsonBody, async (req, res) => {
    const { userId } = memberParams.parse(req.params);
    res.json(await team.changeMember(db, req.user!, userId, memberUpdateBody.parse(req.body)));
  });

  // No sign-in: the link's token is the permission. 404 for an unknown or withdrawn link, 410 used or expired.
  router.get('/invitations/:token', async (req, res) => {
    res.json(await invitationFor(context, linkParams.parse(req.params).token));
  });

  router.post('/invitations/:token/accept', jsonBody, async (req, res) => {
    const body = acceptInvitationBody.parse(req.body);
    const user = await acceptInvitation(context, linkParams.parse(req.params).token, body);
    await startSession(req, res, user, context);
    res.status(201).json({ user });
  });
}
