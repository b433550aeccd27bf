import type { z } from 'zod';
import type { User } from '../../shared/api/contract';
import type { acceptInvitationBody, InvitationAnswer } from '../../shared/api/team-contract';
import { recordActivity } from '../activity/activity.repository';
import { hashPassword } from '../auth/passwords';
import type { RouteContext } from '../http/route-context';
import type { Database } from '../db/client';
import { acrossShops } from '../db/shop-scope';
import { inShopOfLink, liveMailToken, useMailToken } from './mail-tokens';
import * as repo from './team.repository';
import { alreadyMember } from './team.service';

/**
 * What an invitation link grants, while it works: the address and the role. An unknown or withdrawn
 * link answers 404, a used or expired one 410, each saying so (mail-tokens.ts).
 */
export function invitationFor({ db, clock }: RouteContext, token: string): Promise<InvitationAnswer> {
  return inShopOfLink(db, 'invite', token, async () => {
    const invitation = await liveMailToken(db, 'invite', token, clock());
    if (await addressTaken(db, invitation.email)) throw alreadyMember(invitation.email);
    return { email: invitation.email, role: invitation.role!, expiresAt: invitation.expiresAt.toISOString() };
  });
}

/** An address is one account in one shop: one in use in any shop cannot join another. */
function addressTaken(db: Database, email: string): Promise<unknown> {
  return acrossShops(() => repo.findMemberByEmail(db, email));
}

/**
 * Makes the invited person a member with the invitation's address and role, the name and password
 * they chose, in one transaction with using the link up: a link accepted twice makes one member.
 */
export function acceptInvitation(context: RouteContext, token: string, body: z.output<typeof acceptInvitationBody>): Promise<User> {
  return inShopOfLink(context.db, 'invite', token, () => joinShop(context, token, body));
}

async function joinShop({ db, clock }: RouteContext, token: string, body: z.output<typeof acceptInvitationBody>): Promise<User> {
  const now = clock();
  // A dead link is told at once; hashing (a fifth of a second) comes after, and before the transaction, which stays short.
  await liveMailToken(db, 'invite', token, now);
  const passwordHash = await hashPassword(body.password);
  return db.transaction(async (tx) => {
    const invitation = await useMailToken(tx, 'invite', token, now);
    // Within the shop's transaction; an address taken in another shop since is refused by its unique index.
    if (await repo.findMemberByEmail(tx, invitation.email)) throw alreadyMember(invitation.email);
    const member = await repo.insertMember(tx, { email: invitation.email, name: body.name, role: invitation.role!, passwordHash });
    await repo.linkInvitation(tx, invitation.id, member.id);
    await recordActivity(tx, { userId: member.id, action: 'member.joined', details: { email: member.email, role: member.role, invitedBy: invitation.createdBy } });
    // A new member reads millimetres (the column's default) until they choose otherwise.
    return { id: member.id, email: member.email, name: member.name, role: member.role, units: 'mm' };
  });
}
