import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { signInBody } from '../../shared/api/contract';
import { AppError } from '../http/app-error';

/**
 * Failed sign-ins counted per account and per client address; either limit answers 429 until its
 * window passes. Successful sign-ins do not count. Counters live in memory: one server process
 * per data folder (the lock) keeps them whole.
 */
export function signInLimits(limits: { windowMs: number; perAccount: number; perAddress: number }): RequestHandler {
  const minutes = Math.ceil(limits.windowMs / 60_000);
  const common = {
    windowMs: limits.windowMs,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    handler: ((_req, _res, next) =>
      next(new AppError(429, 'too-many-attempts', `Too many failed sign-ins. Wait ${minutes} minutes and try again.`))) satisfies RequestHandler,
  };
  const account = (body: unknown) => signInBody.safeParse(body).data?.email;
  const perAddress = rateLimit({ ...common, limit: limits.perAddress, identifier: 'sign-in-address' });
  const perAccount = rateLimit({
    ...common,
    limit: limits.perAccount,
    identifier: 'sign-in-account',
    // A body without a valid address is refused by validation; it counts per address only.
    skip: (req) => account(req.body) === undefined,
    keyGenerator: (req) => `account:${account(req.body)}`,
  });
  return (req, res, next) => perAddress(req, res, (err?: unknown) => (err ? next(err) : perAccount(req, res, next)));
}
