import type { Router } from 'express';
import { outboxAttachmentParams } from '../../shared/api/pack-contract';
import { requirePermission } from '../auth/require-permission';
import type { RouteContext } from '../http/route-context';
import * as outbox from './outbox.service';

/** The outbox of the local mail catcher, for admins; the people mail can be sent to, for those who send packs. */
export function mailRoutes(router: Router, { db }: RouteContext): void {
  router.get('/outbox', requirePermission('manageTeam'), async (_req, res) => {
    res.json({ messages: await outbox.outboxMessages(db) });
  });

  router.get('/outbox/:id/attachments/:index', requirePermission('manageTeam'), async (req, res) => {
    const { id, index } = outboxAttachmentParams.parse(req.params);
    const attachment = await outbox.outboxAttachment(db, id, index);
    res.attachment(attachment.name).type(attachment.contentType).send(attachment.content);
  });

  router.get('/mail/recipients', requirePermission('editJobs'), async (_req, res) => {
    res.json({ people: await outbox.mailRecipients(db) });
  });
}
