import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { passwordResetRequestBody } from '../../shared/api/team-contract';
import { AppError } from '../http/app-error';

/**
 * Reset requests counted per address asked about and per client address, whether or not the address
 * has an account (every request answers 202 alike, and so does the limit), so nobody fills a member's
 * mailbox with reset mail. Counters live in memory, as sign-in's do (sign-in-limits.ts).
 */
export function passwordResetLimits(limits: { windowMs: number; perAccount: number; perAddress: number }): RequestHandler {
  const minutes = Math.ceil(limits.windowMs / 60_000);
  const common = {
    windowMs: limits.windowMs,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    handler: ((_req, _res, next) =>
      next(new AppError(429, 'too-many-attempts', `Too many password reset requests. Wait ${minutes} minutes and try again.`))) satisfies RequestHandler,
  };
  const account = (body: unknown) => passwordResetRequestBody.safeParse(body).data?.email;
  const perAddress = rateLimit({ ...common, limit: limits.perAddress, identifier: 'reset-address' });
  const perAccount = rateLimit({
    ...common,
    limit: limits.perAccount,
    identifier: 'reset-account',
    skip: (req) => account(req.body) === undefined,
    keyGenerator: (req) => `account:${account(req.body)}`,
  });
  return (req, res, next) => perAddress(req, res, (err?: unknown) => (err ? next(err) : perAccount(req, res, next)));
}
