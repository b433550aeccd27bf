import { createHash, randomBytes } from 'node:crypto';
import { and, eq, gt, isNull } from 'drizzle-orm';
import { LINK_ERRORS, mailTokenShape } from '../../shared/api/team-contract';
import type { Database } from '../db/client';
import { inOwnShop, ownShop } from '../db/own-shop';
import { acrossShops, inShop } from '../db/shop-scope';
import { mailTokens } from '../db/schema';
import type { MailTokenPurpose } from '../db/schema/mail-tokens';
import { AppError } from '../http/app-error';

/**
 * The single-use links sent by mail (invitations and password resets). The token is 32 random bytes
 * that only the mail carries; the database keeps its SHA-256, so a copy of the database opens no
 * account. A link is used up in the same transaction as what it grants.
 */

export type MailTokenRow = typeof mailTokens.$inferSelect;

/** A fresh token for a link, and the hash to store. */
export function newMailToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashMailToken(token) };
}

export function hashMailToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

const day = (at: Date) => at.toISOString().slice(0, 10);
const minute = (at: Date) => `${at.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

/** Why a link does not work, in the words of its purpose. */
const PROBLEMS: Record<MailTokenPurpose, { unknown: string; used: string; expired: (at: Date) => string }> = {
  invite: {
    unknown:
      'This invitation link is not valid: it was withdrawn, replaced by a newer invitation, or not copied whole. Ask an admin of your shop to invite you again.',
    used: 'This invitation has already been accepted. Sign in with the e-mail address and the password chosen then.',
    expired: (at) => `This invitation expired on ${day(at)}. Ask an admin of your shop to invite you again.`,
  },
  'password-reset': {
    unknown: 'This password reset link is not valid: it was replaced by a newer one, or not copied whole. Ask for a new link.',
    used: 'This password reset link has already been used. To change the password again, ask for a new link.',
    expired: (at) => `This password reset link expired at ${minute(at)}. Ask for a new link.`,
  },
};

function problem(purpose: MailTokenPurpose, row: MailTokenRow | undefined): AppError {
  const words = PROBLEMS[purpose];
  if (!row) return new AppError(404, LINK_ERRORS.unknown, words.unknown);
  if (row.usedAt) return new AppError(410, LINK_ERRORS.used, words.used);
  return new AppError(410, LINK_ERRORS.expired, words.expired(row.expiresAt));
}

/** The link's row by its token: in the scope's shop, or (only to find which shop a link is of) across shops. */
async function findByToken(db: Database, purpose: MailTokenPurpose, token: string, where: 'own shop' | 'across shops'): Promise<MailTokenRow | undefined> {
  // Anything not shaped like our tokens cannot match one: unknown, without asking the database.
  if (!mailTokenShape.test(token)) return undefined;
  const [row] = await db
    .select()
    .from(mailTokens)
    .where(and(eq(mailTokens.tokenHash, hashMailToken(token)), eq(mailTokens.purpose, purpose), where === 'own shop' ? ownShop(mailTokens) : undefined));
  return row;
}

/**
 * Runs `work` as the shop the link belongs to: a link is opened by someone not signed in, so its token
 * is the one thing that says which shop (found across shops, by its hash alone). With no such link,
 * `work` runs as no shop and finds nothing, answering as for any unknown link.
 */
export async function inShopOfLink<T>(db: Database, purpose: MailTokenPurpose, token: string, work: () => Promise<T>): Promise<T> {
  const row = await acrossShops(() => findByToken(db, purpose, token, 'across shops'));
  return inShop(row?.shopId ?? null, work);
}

/** The link's row while it still works; otherwise 404 (unknown or withdrawn) or 410 (used, expired), saying which. */
export async function liveMailToken(db: Database, purpose: MailTokenPurpose, token: string, now: Date): Promise<MailTokenRow> {
  const row = await findByToken(db, purpose, token, 'own shop');
  if (!row || row.usedAt || row.expiresAt.getTime() <= now.getTime()) throw problem(purpose, row);
  return row;
}

/**
 * Uses the link up: marks it used in the caller's transaction, in one statement that only a live
 * token passes, so two requests racing with the same link cannot both get through.
 */
export async function useMailToken(tx: Database, purpose: MailTokenPurpose, token: string, now: Date): Promise<MailTokenRow> {
  const [used] = mailTokenShape.test(token)
    ? await tx
        .update(mailTokens)
        .set({ usedAt: now })
        .where(
          inOwnShop(
            mailTokens,
            eq(mailTokens.tokenHash, hashMailToken(token)),
            eq(mailTokens.purpose, purpose),
            isNull(mailTokens.usedAt),
            gt(mailTokens.expiresAt, now),
          ),
        )
        .returning()
    : [];
  if (used) return used;
  throw problem(purpose, await findByToken(tx, purpose, token, 'own shop'));
}
