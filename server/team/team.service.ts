import type { z } from 'zod';
import type { User } from '../../shared/api/contract';
import type { invitationBody, memberUpdateBody, PendingInvitation, TeamAnswer, TeamMember } from '../../shared/api/team-contract';
import { recordActivity } from '../activity/activity.repository';
import { deleteSessionsOf } from '../auth/sessions.repository';
import { AppError, notFound } from '../http/app-error';
import type { RouteContext } from '../http/route-context';
import { newMailToken } from './mail-tokens';
import * as repo from './team.repository';
import { invitationMail } from './team-mail';

const toMember = ({ createdAt, ...member }: repo.MemberRow): TeamMember => ({ ...member, createdAt: createdAt.toISOString() });

/** 409 naming the field, for an address that already has an account; a deactivated one is switched back on instead. */
export function alreadyMember(email: string, active = true): AppError {
  return active
    ? new AppError(409, 'already-member', `${email} is already a member of the shop.`, { fields: { email: 'is already a member of the shop' } })
    : new AppError(409, 'already-member', `${email} belongs to a deactivated member. Switch them back on in the members list instead.`, {
        fields: { email: 'belongs to a deactivated member: switch them back on instead' },
      });
}

/** Everyone with an account, and the invitations not accepted yet, each marked expired or not by the app's clock. */
export async function teamOverview(db: RouteContext['db'], now: Date): Promise<TeamAnswer> {
  const [members, invitations] = [await repo.listMembers(db), await repo.listOpenInvitations(db)];
  return {
    members: members.map(toMember),
    invitations: invitations.map(({ createdAt, expiresAt, role, ...invitation }) => ({
      ...invitation,
      // An invitation always carries the role it grants (inviteMember); only reset links have none.
      role: role!,
      createdAt: createdAt.toISOString(),
      expiresAt: expiresAt.toISOString(),
      expired: expiresAt.getTime() <= now.getTime(),
    })),
  };
}

/**
 * Invites someone by mail to join with a role. An address that already has an account is refused; an
 * earlier invitation to the same address is replaced, so only the newest link works. The mail goes
 * after the invitation is stored (the local catcher writes to the same database), and if it cannot
 * be sent the invitation is taken back, so no invitation exists that nobody received.
 */
export async function inviteMember(context: RouteContext, actor: User, body: z.output<typeof invitationBody>, origin: string): Promise<PendingInvitation> {
  const now = context.clock();
  const expiresAt = new Date(now.getTime() + context.config.mailLinks.invitationMs);
  const { token, tokenHash } = newMailToken();
  const row = await context.db.transaction(async (tx) => {
    const existing = await repo.findMemberByEmail(tx, body.email);
    if (existing) throw alreadyMember(body.email, existing.active);
    await repo.deleteOpenTokensFor(tx, 'invite', body.email);
    return repo.insertMailToken(tx, { purpose: 'invite', tokenHash, email: body.email, role: body.role, userId: null, createdBy: actor.id, createdAt: now, expiresAt });
  });
  const link = `${origin}/accept-invitation?token=${token}`;
  try {
    await context.mailer.send(invitationMail({ to: body.email, name: body.name, role: body.role, inviter: actor, link, expiresAt }));
  } catch (err) {
    await repo.deleteMailToken(context.db, row.id);
    throw new AppError(502, 'mail-failed', `The invitation could not be sent, so it was not kept: ${(err as Error).message}`);
  }
  await recordActivity(context.db, { userId: actor.id, action: 'invitation.sent', details: { email: body.email, role: body.role, expiresAt: expiresAt.toISOString() } });
  return {
    id: row.id,
    email: row.email,
    role: body.role,
    createdAt: now.toISOString(),
    expiresAt: expiresAt.toISOString(),
    expired: false,
    invitedBy: actor.name,
  };
}

/** Withdraws an invitation not yet accepted: its link then answers as unknown. */
export async function withdrawInvitation(db: RouteContext['db'], actor: User, id: number): Promise<void> {
  await db.transaction(async (tx) => {
    const invitation = await repo.findOpenInvitation(tx, id);
    if (!invitation) throw notFound(`Open invitation ${id}`);
    await repo.deleteMailToken(tx, id);
    await recordActivity(tx, { userId: actor.id, action: 'invitation.withdrawn', details: { email: invitation.email, role: invitation.role } });
  });
}

/**
 * Changes a member's role or whether they are active. The shop always keeps one active admin, and no
 * admin deactivates themselves. Deactivating ends every session of the member at once (their rows are
 * deleted; passport also refuses an inactive member on any session left, see auth.service.ts) and
 * withdraws their reset links.
 */
export async function changeMember(db: RouteContext['db'], actor: User, userId: number, body: z.output<typeof memberUpdateBody>): Promise<TeamMember> {
  return db.transaction(async (tx) => {
    const admins = await repo.lockActiveAdmins(tx);
    const member = await repo.findMember(tx, userId, true);
    if (!member) throw notFound(`Member ${userId}`);
    const role = body.role ?? member.role;
    const active = body.active ?? member.active;
    if (member.id === actor.id && !active) {
      throw new AppError(409, 'own-account', 'You cannot deactivate your own account. Another admin can, once there is one.', { fields: { active: 'cannot be switched off for yourself' } });
    }
    const losesAdmin = member.role === 'admin' && member.active && (role !== 'admin' || !active);
    if (losesAdmin && admins.every((id) => id === member.id)) {
      throw new AppError(409, 'last-admin', `${member.name} is the shop's only active admin. Make someone else an admin first, so the shop can still manage its team.`, {
        fields: { [body.active === false ? 'active' : 'role']: 'would leave the shop without an active admin' },
      });
    }
    await repo.updateMember(tx, member.id, { role, active });
    const who = { member: member.id, name: member.name };
    if (role !== member.role) await recordActivity(tx, { userId: actor.id, action: 'member.role-changed', details: { ...who, from: member.role, to: role } });
    if (active !== member.active) {
      if (!active) {
        const ended = await deleteSessionsOf(tx, member.id);
        await repo.deleteOpenResetsOf(tx, member.id);
        await recordActivity(tx, { userId: actor.id, action: 'member.deactivated', details: { ...who, sessionsEnded: ended } });
      } else {
        await recordActivity(tx, { userId: actor.id, action: 'member.reactivated', details: who });
      }
    }
    return toMember({ ...member, role, active });
  });
}
