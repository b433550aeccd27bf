import type { Test } from 'supertest';
import { signPackLink } from '../../server/packs/pack-links';
import type { ApiClient } from '../../server/testing/api-client';
import type { SecondShop } from '../../server/testing/second-shop';
import { DEMO_SHOP_ID, TEST_SESSION_SECRET } from '../../server/testing/test-app';

/**
 * The two-shop matrix (role-matrix.spec.ts): every route asked by the demo shop's people about the second
 * shop's things. A row whose request takes its ids from the fixture is sent with the second shop's job and
 * panel as the fixture; these rows name other ids, so here each names the second shop's own.
 */
export const OTHER_SHOP_REQUESTS: Record<string, (client: ApiClient, other: SecondShop) => Test> = {
  'DELETE /api/team/invitations/:invitationId': (c, o) => c.delete(`/api/team/invitations/${o.invitationId}`),
  'PATCH /api/team/members/:userId': (c, o) => c.patch(`/api/team/members/${o.adminId}`).send({ role: 'viewer' }),
  'GET /api/attachments/:attachmentId': (c, o) => c.get(`/api/attachments/${o.attachmentId}`),
  'DELETE /api/attachments/:attachmentId': (c, o) => c.delete(`/api/attachments/${o.attachmentId}`),
  'DELETE /api/catalog/fittings/:fittingId': (c, o) => c.delete(`/api/catalog/fittings/${o.fittingId}`),
  'GET /api/outbox/:id/attachments/:index': (c, o) => c.get(`/api/outbox/${o.outboxId}/attachments/0`),
  // A link signed for the demo shop naming the second shop's job: the link grants its own shop's jobs only.
  'GET /api/pack-links/:token': (c, o) => c.get(`/api/pack-links/${signPackLink(TEST_SESSION_SECRET, { shopId: DEMO_SHOP_ID, jobId: o.jobId, paper: 'a4', expiresAt: Date.now() + 60_000 })}`),
};

/** Path parameters that name no shop's row: a made-up ticket, or a mailed token (unknown here, 404 for all). */
const NOT_A_ROW = new Set([':ticket', ':token']);

/** Routes whose row (the fixture's job) is named in the query, not the path. */
const ROW_IN_QUERY = new Set(['GET /api/activity']);

/**
 * What an actor gets asking about another shop's row: whatever it got past the permission with (a success,
 * or a 409 about the row) becomes 404, as for a row that does not exist; a 401 or 403 comes before any
 * look-up, the same for every id, so it tells nothing about the row. Routes that name no row answer as in
 * the demo shop (a pack link is a row: its job).
 */
export function otherShopExpect(route: string, own: readonly number[]): number[] {
  const params = route.split('/').filter((part) => part.startsWith(':'));
  const namesRow = route === 'GET /api/pack-links/:token' || ROW_IN_QUERY.has(route) || params.some((p) => !NOT_A_ROW.has(p));
  return own.map((status) => (namesRow && status !== 401 && status !== 403 ? 404 : status));
}
