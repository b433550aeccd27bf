import type { z } from 'zod';
import type { PasswordResetAnswer, passwordResetBody } from '../../shared/api/team-contract';
import { recordActivity } from '../activity/activity.repository';
import type { Logger } from '../logger';
import type { RouteContext } from '../http/route-context';
import { acrossShops, inShop } from '../db/shop-scope';
import { inShopOfLink, liveMailToken, newMailToken, useMailToken } from '../team/mail-tokens';
import * as team from '../team/team.repository';
import { passwordResetMail } from '../team/team-mail';
import { mayUse } from './auth.service';
import { hashPassword } from './passwords';
import { deleteSessionsOf } from './sessions.repository';

/**
 * Sends a reset link to a member who may sign in; does nothing for any other address. The route has
 * already answered 202 by the time this runs, the same for both, so neither the answer nor its timing
 * tells a stranger who has an account. A new link replaces the member's earlier unused ones.
 */
export async function requestPasswordReset(context: RouteContext, email: string, origin: string): Promise<void> {
  // Asked by someone not signed in: the address (unique across shops) finds the member and so the shop.
  const member = await acrossShops(() => team.findMemberByEmail(context.db, email));
  if (!member || !mayUse(member, context.config.demoAccounts)) return;
  await inShop(member.shopId, () => sendPasswordReset(context, member, origin));
}

async function sendPasswordReset(context: RouteContext, member: { id: number; email: string }, origin: string): Promise<void> {
  const now = context.clock();
  const lifetimeMs = context.config.mailLinks.passwordResetMs;
  const { token, tokenHash } = newMailToken();
  await context.db.transaction(async (tx) => {
    await team.deleteOpenResetsOf(tx, member.id);
    await team.insertMailToken(tx, {
      purpose: 'password-reset',
      tokenHash,
      email: member.email,
      role: null,
      userId: member.id,
      createdBy: null,
      createdAt: now,
      expiresAt: new Date(now.getTime() + lifetimeMs),
    });
  });
  await context.mailer.send(passwordResetMail({ to: member.email, link: `${origin}/reset-password?token=${token}`, lifetimeMs }));
}

/** Runs a reset request after its answer has gone; a failure is logged, as nobody is waiting for it. */
export function requestPasswordResetLater(context: RouteContext, email: string, origin: string, log: Logger): void {
  requestPasswordReset(context, email, origin).catch((err: unknown) => log.error({ err }, 'a password reset mail could not be sent'));
}

/** Whose password a reset link changes, while it works: 404 unknown, 410 used or expired, saying which. */
export function passwordResetFor({ db, clock }: RouteContext, token: string): Promise<PasswordResetAnswer> {
  return inShopOfLink(db, 'password-reset', token, async () => {
    const reset = await liveMailToken(db, 'password-reset', token, clock());
    return { email: reset.email, expiresAt: reset.expiresAt.toISOString() };
  });
}

/**
 * Sets the new password and uses the link up in one transaction, and ends every other session of the
 * member: whoever had the old password is signed out. The session of this request, if any, stays.
 */
export function resetPassword(context: RouteContext, token: string, body: z.output<typeof passwordResetBody>, sessionId: string | undefined): Promise<void> {
  return inShopOfLink(context.db, 'password-reset', token, () => resetPasswordInShop(context, token, body, sessionId));
}

async function resetPasswordInShop({ db, clock }: RouteContext, token: string, body: z.output<typeof passwordResetBody>, sessionId: string | undefined): Promise<void> {
  const now = clock();
  await liveMailToken(db, 'password-reset', token, now);
  const passwordHash = await hashPassword(body.password);
  await db.transaction(async (tx) => {
    const reset = await useMailToken(tx, 'password-reset', token, now);
    // Reset links are always for a member (requestPasswordReset), and go when the member is deactivated.
    const memberId = reset.userId!;
    await team.updateMember(tx, memberId, { passwordHash });
    await team.deleteOpenResetsOf(tx, memberId);
    const ended = await deleteSessionsOf(tx, memberId, sessionId);
    await recordActivity(tx, { userId: memberId, action: 'member.password-reset', details: { sessionsEnded: ended } });
  });
}
