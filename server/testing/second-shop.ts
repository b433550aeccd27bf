import type { PanelRecord } from '../../shared/api/contract';
import { shopHinge } from '../../shared/testing/shop-fitting';
import { DEFAULT_MACHINE_SETTINGS } from '../../shared/export/machine-settings';
import { hashPassword } from '../auth/passwords';
import { inShop } from '../db/shop-scope';
import { DEMO_PASSWORD } from '../demo/greyfield-people';
import { larchLaneKitchen } from '../demo/larch-lane-kitchen';
import { insertShop } from '../shops/shops.repository';
import { insertMember } from '../team/team.repository';
import { signedIn, type ApiClient } from './api-client';
import { minimalPng } from './sample-files';
import type { TestApp } from './test-app';

/** What a second shop holds, by the ids another shop's members must never reach. */
export interface SecondShop {
  shopId: number;
  admin: ApiClient;
  adminId: number;
  jobId: number;
  panel: PanelRecord;
  attachmentId: number;
  invitationId: number;
  fittingId: string;
  outboxId: number;
}

export const SECOND_SHOP_ADMIN = 'admin@second-shop.example';

/**
 * A second shop beside the demo shop (made as the operator makes one), with one row of every shop-owned
 * table: its admin, then through the API a job imported with its carcasses, panels, placements and bores
 * (and their activity), an attachment, an invitation (its mail token, and the mail in its outbox), a
 * fitting of its own that the demo shop also has an id for, and its machine settings.
 */
export async function addSecondShop(t: Pick<TestApp, 'app' | 'database'>): Promise<SecondShop> {
  const db = t.database.db;
  const shopId = await insertShop(db, 'Second Shop');
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const member = await inShop(shopId, () => insertMember(db, { email: SECOND_SHOP_ADMIN, name: 'Second Admin', role: 'admin', passwordHash }));
  const admin = await signedIn(t.app, SECOND_SHOP_ADMIN);
  const { body: job } = await admin.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(larchLaneKitchen)), 'kitchen.json').expect(201);
  const { body: detail } = await admin.get(`/api/jobs/${job.id}`).expect(200);
  const { body: attachment } = await admin.post(`/api/jobs/${job.id}/attachments`).attach('file', minimalPng(), 'site.png').expect(201);
  const { body: invitation } = await admin.post('/api/team/invitations').send({ email: 'invited@second-shop.example', role: 'viewer' }).expect(201);
  const fittingId = 'second-shop-hinge';
  await admin.post('/api/catalog/fittings').send(shopHinge(fittingId)).expect(201);
  await admin.put('/api/settings/machine').send(DEFAULT_MACHINE_SETTINGS).expect(200);
  const { body: outbox } = await admin.get('/api/outbox').expect(200);
  return {
    shopId,
    admin,
    adminId: member.id,
    jobId: job.id,
    panel: detail.panels[0],
    attachmentId: attachment.id,
    invitationId: invitation.id,
    fittingId,
    outboxId: outbox.messages[0].id,
  };
}
