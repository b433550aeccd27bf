import bcrypt from 'bcryptjs';

/** About 180 ms per hash on this project's machines with the pure-JS bcrypt: slow for guessing, quick enough for sign-in. */
const COST = 11;

/** A bcrypt hash of the password. Length rules (8 to 72 bytes) are the caller's, by `password` in contract.ts. */
export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

/** Compares in constant time for a given hash. */
export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}

let decoy: Promise<string> | undefined;
/**
 * Spends the time of one comparison when no account matched, so that the answer's timing does
 * not tell a guesser which addresses have accounts.
 */
export async function spendComparisonTime(plain: string): Promise<void> {
  decoy ??= hashPassword('no account has this password');
  await verifyPassword(plain, await decoy);
}
