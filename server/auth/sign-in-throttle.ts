import { ipKeyGenerator } from 'express-rate-limit';
import type { Config } from '../config';
import type { Database } from '../db/client';
import { AppError } from '../http/app-error';
import * as repo from './sign-in-attempts.repository';

/**
 * Sign-in throttling (OWASP ASVS 5.0 V6.1.1 and V6.3.1: controls against password guessing and
 * credential stuffing that cannot be turned into a lockout of the account's owner). Attempts are
 * counted per client address and per address and account together, in the database:
 *
 * - the first `free` attempts of a key in a window are checked at once; after that each attempt must
 *   wait a delay that doubles from `baseDelayMs` up to `maxDelayMs` (slowing);
 * - from `refuseAfter` attempts on, the key is refused until its window ends (refusing);
 * - an address the account signed in from with its password in the last `usualAddressDays` is the
 *   owner's usual address: there it is only ever slowed, never refused, so however often a stranger
 *   tries an account, from elsewhere or from the same office, its owner gets in after at most
 *   `maxDelayMs`. A stranger's attempts from elsewhere do not slow the owner at all.
 *
 * Each attempt is counted before the password is checked (and uncounted when it was right), in a
 * transaction that locks its counters, so attempts sent in parallel cannot slip past the count.
 */
export type SignInThrottleLimits = Config['signInThrottle'];

interface KeyLimits {
  free: number;
  refuseAfter: number;
}

/** The delay before the attempt after `failures` counted attempts may be checked. */
export function delayAfter(failures: number, limits: Pick<SignInThrottleLimits, 'baseDelayMs' | 'maxDelayMs'>, key: KeyLimits): number {
  if (failures < key.free) return 0;
  return Math.min(limits.maxDelayMs, limits.baseDelayMs * 2 ** (failures - key.free));
}

const seconds = (ms: number) => Math.max(1, Math.ceil(ms / 1000));

function wait(ms: number): AppError {
  const s = seconds(ms);
  return new AppError(429, 'sign-in-wait', `Too many sign-in attempts in a short time. Wait ${s} second${s === 1 ? '' : 's'} and try again.`, {
    retryAfterSeconds: s,
  });
}

function refused(ms: number): AppError {
  const minutes = Math.max(1, Math.ceil(ms / 60_000));
  return new AppError(429, 'too-many-attempts', `Too many failed sign-ins from this address. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`, {
    retryAfterSeconds: seconds(ms),
  });
}

export interface SignInAttempt {
  db: Database;
  limits: SignInThrottleLimits;
  now: Date;
  /** The client's address as Express reads it (TRUST_PROXY decides whether a proxy's header counts). */
  ip: string;
  /** The address asked about, trimmed and lowercased. */
  email: string;
}

/**
 * Runs `check` (the password check) under the throttle: answers 429 instead when the address or the
 * pair must wait or is refused; on success the pair's count is cleared and the address becomes one of
 * the account's usual addresses.
 */
export async function throttledSignIn<T>(attempt: SignInAttempt, check: () => Promise<T>): Promise<T> {
  const { db, limits, now, email } = attempt;
  // IPv6 clients usually hold a whole /56 or /64: counting single addresses would count nothing.
  const address = ipKeyGenerator(attempt.ip);
  const keys = [
    { key: `address:${address}`, limits: limits.perAddress },
    { key: `pair:${address}|${email}`, limits: limits.perPair },
  ];
  const usual = await repo.isUsualAddress(db, email, address, new Date(now.getTime() - limits.usualAddressDays * 86_400_000));
  await db.transaction(async (tx) => {
    await repo.pruneAttempts(tx, new Date(now.getTime() - limits.windowMs));
    const rows = [];
    for (const { key, limits: keyLimits } of keys) {
      const row = await repo.lockAttempts(tx, key, now);
      if (row.windowStart.getTime() + limits.windowMs <= now.getTime()) Object.assign(row, { failures: 0, windowStart: now, nextAt: now });
      rows.push({ row, keyLimits });
    }
    // The longest of the keys' waits, so that whoever waits it is then let through.
    const refusedFor = Math.max(0, ...rows.filter(({ row, keyLimits }) => !usual && row.failures >= keyLimits.refuseAfter).map(({ row }) => row.windowStart.getTime() + limits.windowMs - now.getTime()));
    if (refusedFor > 0) throw refused(refusedFor);
    const waitFor = Math.max(0, ...rows.map(({ row }) => row.nextAt.getTime() - now.getTime()));
    if (waitFor > 0) throw wait(waitFor);
    for (const { row, keyLimits } of rows) {
      row.failures += 1;
      row.nextAt = new Date(now.getTime() + delayAfter(row.failures, limits, keyLimits));
      await repo.saveAttempts(tx, row);
    }
  });
  const result = await check();
  await db.transaction(async (tx) => {
    await repo.deleteAttempts(tx, keys[1].key);
    await repo.uncountAttempt(tx, keys[0].key);
    await repo.rememberAddress(tx, email, address, now);
  });
  return result;
}
