import type { z } from 'zod';
import type { User } from '../../shared/api/contract';
import type { SignUpLinkAnswer, signUpBody } from '../../shared/api/sign-up-contract';
import { LINK_ERRORS, mailTokenShape } from '../../shared/api/team-contract';
import { hashPassword } from '../auth/passwords';
import { acrossShops, inShop } from '../db/shop-scope';
import { AppError } from '../http/app-error';
import type { RouteContext } from '../http/route-context';
import type { Logger } from '../logger';
import { createShopWithAdmin } from '../shops/shops.service';
import { hashMailToken, newMailToken } from '../team/mail-tokens';
import * as team from '../team/team.repository';
import { addressInUseMail, confirmShopMail } from './sign-up-mail';
import * as repo from './sign-ups.repository';

/**
 * Creating a shop (SIGNUP=open). The request answers 202 before anything is looked up; then a new address
 * is sent a single-use link and an address that already has an account is sent word of the attempt, so
 * neither the answer nor its timing tells a stranger who has an account. Following the link makes the
 * shop and its first admin. A sign-up waiting for its link belongs to no shop (`sign_ups`).
 */
export async function requestSignUp(context: RouteContext, body: z.output<typeof signUpBody>, origin: string): Promise<void> {
  const { db, clock, mailer, config } = context;
  // An address is unique across shops: the one look-up that must see every shop.
  const owner = await acrossShops(() => team.findMemberByEmail(db, body.email));
  if (owner) {
    // Sent as the owner's shop, as any mail to a member is (its outbox, where the local catcher keeps it).
    await inShop(owner.shopId, () => mailer.send(addressInUseMail({ to: owner.email, signInLink: `${origin}/sign-in`, resetLink: `${origin}/forgot-password` })));
    return;
  }
  const now = clock();
  const { token, tokenHash } = newMailToken();
  const passwordHash = await hashPassword(body.password);
  await db.transaction(async (tx) => {
    await repo.pruneSignUps(tx, now);
    await repo.deleteOpenSignUpsOf(tx, body.email);
    await repo.insertSignUp(tx, {
      tokenHash,
      email: body.email,
      shopName: body.shopName,
      name: body.name,
      passwordHash,
      createdAt: now,
      expiresAt: new Date(now.getTime() + config.mailLinks.signUpMs),
    });
  });
  const link = `${origin}/create-shop/confirm?token=${token}`;
  await mailer.send(confirmShopMail({ to: body.email, name: body.name, shopName: body.shopName, link, lifetimeMs: config.mailLinks.signUpMs }));
}

/** Runs a sign-up request after its answer has gone; a failure is logged, as nobody is waiting for it. */
export function requestSignUpLater(context: RouteContext, body: z.output<typeof signUpBody>, origin: string, log: Logger): void {
  requestSignUp(context, body, origin).catch((err: unknown) => log.error({ err }, 'a sign-up mail could not be sent'));
}

const minute = (at: Date) => `${at.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

/** Why a confirmation link does not work: 404 unknown, 410 used or expired, saying which. */
function problem(row: repo.SignUpRow | undefined): AppError {
  if (!row) return new AppError(404, LINK_ERRORS.unknown, 'This confirmation link is not valid: it was replaced by a newer one, or not copied whole. Create the shop again to get a new link.');
  if (row.usedAt) return new AppError(410, LINK_ERRORS.used, 'This confirmation link has already been used, and the shop was made then. Sign in with its e-mail address and password.');
  return new AppError(410, LINK_ERRORS.expired, `This confirmation link expired at ${minute(row.expiresAt)}. Create the shop again to get a new link.`);
}

async function find(context: RouteContext, token: string): Promise<repo.SignUpRow | undefined> {
  // Anything not shaped like our tokens cannot match one: unknown, without asking the database.
  return mailTokenShape.test(token) ? repo.findSignUp(context.db, hashMailToken(token)) : undefined;
}

/** What a link will make, while it works. */
export async function signUpFor(context: RouteContext, token: string): Promise<SignUpLinkAnswer> {
  const row = await find(context, token);
  if (!row || row.usedAt || row.expiresAt.getTime() <= context.clock().getTime()) throw problem(row);
  return { email: row.email, shopName: row.shopName, name: row.name, expiresAt: row.expiresAt.toISOString() };
}

/**
 * Follows a link: uses it up, makes the shop and its first admin and writes the shop's first activity
 * entry, all in one transaction. Returns the admin, to be signed in.
 */
export async function confirmSignUp(context: RouteContext, token: string): Promise<User> {
  const { db, clock } = context;
  const now = clock();
  const row = await find(context, token);
  if (!row || row.usedAt || row.expiresAt.getTime() <= now.getTime()) throw problem(row);
  // Taken meanwhile (an invitation accepted, a shop made by the operator): the address stays one account's.
  if (await acrossShops(() => team.findMemberByEmail(db, row.email))) {
    throw new AppError(409, 'email-taken', 'This e-mail address has been given to an account since the link was sent. Sign in with it, or ask for a new password.');
  }
  // Making a shop is the operator's privilege: the transaction opens as the tables' owner and enters the new shop once it exists.
  const admin = await acrossShops(() =>
    db.transaction(async (tx) => {
      const used = await repo.useSignUp(tx, row.tokenHash, now);
      if (!used) throw problem(await repo.findSignUp(tx, row.tokenHash));
      const created = await createShopWithAdmin(tx, { name: used.shopName, admin: { email: used.email, name: used.name, passwordHash: used.passwordHash }, via: 'sign-up' });
      await repo.setCreatedShop(tx, used.id, created.shopId);
      return created.admin;
    }),
  );
  return { id: admin.id, email: admin.email, name: admin.name, role: admin.role, units: 'mm' };
}
