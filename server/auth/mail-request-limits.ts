import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { MailRequestLimits } from '../config';
import type { Database } from '../db/client';
import { AppError } from '../http/app-error';
import { DatabaseRateStore } from './database-rate-store';

export interface MailRequestLimit {
  /** Names the counters (`reset` → `reset-address:…`, `reset-account:…`). */
  name: string;
  /** The address the request would mail, from its body; undefined when the body has none (it is refused later). */
  address: (body: unknown) => string | undefined;
  /** What the refusal says was asked for too often, e.g. "password reset requests". */
  what: string;
}

/**
 * Requests that mail an address typed by whoever asks (password reset, sign-up), counted per address asked
 * about and per client address, whether or not the address has an account (every such request answers
 * 202 alike, and so does the limit), so nobody fills a mailbox with our mail. The counts are kept in the
 * database (database-rate-store.ts), as sign-in's are: every server on one database counts together.
 */
export function mailRequestLimits(db: Database, clock: () => Date, limits: MailRequestLimits, limit: MailRequestLimit): RequestHandler {
  const minutes = Math.ceil(limits.windowMs / 60_000);
  const common = {
    windowMs: limits.windowMs,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    handler: ((_req, _res, next) => next(new AppError(429, 'too-many-attempts', `Too many ${limit.what}. Wait ${minutes} minutes and try again.`))) satisfies RequestHandler,
  };
  const perAddress = rateLimit({ ...common, limit: limits.perAddress, identifier: `${limit.name}-address`, store: new DatabaseRateStore(db, clock, `${limit.name}-address:`) });
  const perAccount = rateLimit({
    ...common,
    limit: limits.perAccount,
    identifier: `${limit.name}-account`,
    store: new DatabaseRateStore(db, clock, `${limit.name}-account:`),
    skip: (req) => limit.address(req.body) === undefined,
    keyGenerator: (req) => limit.address(req.body)!,
  });
  return (req, res, next) => perAddress(req, res, (err?: unknown) => (err ? next(err) : perAccount(req, res, next)));
}
