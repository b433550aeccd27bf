import type { preferencesBody, User } from '../../shared/api/contract';
import type * as z from 'zod';
import type { Database } from '../db/client';
import type { ShopStatus } from '../db/schema/shops';
import { acrossShops } from '../db/shop-scope';
import { AppError } from '../http/app-error';
import { spendComparisonTime, verifyPassword } from './passwords';
import { findAccount, findAccountByEmail, updateUnits } from './users.repository';

type Account = User & { demo: boolean; active: boolean; shopId: number; shopStatus: ShopStatus | null };

const toUser = ({ id, email, name, role, units }: User): User => ({ id, email, name, role, units });

/** Why a sign-in was refused; the route turns it into the answer. */
export type SignInRefusal = 'bad-credentials' | 'demo-accounts-off' | 'account-deactivated' | 'shop-suspended';

/**
 * Checks an address and password. Unknown address and wrong password look alike to the caller,
 * in answer and in time. Demo accounts sign in only where the configuration allows them; a
 * deactivated member, or a member of a suspended shop, never does. Each is said only to whoever knows the
 * password, so none of them tells a stranger that the address has an account.
 */
export async function checkCredentials(
  db: Database,
  demoAccounts: boolean,
  email: string,
  password: string,
): Promise<{ user: User } | { refused: SignInRefusal }> {
  // Sign-in is where a shop is not known yet: the address finds the account in whichever shop it is.
  const account = await acrossShops(() => findAccountByEmail(db, email));
  if (!account) {
    await spendComparisonTime(password);
    return { refused: 'bad-credentials' };
  }
  if (!(await verifyPassword(password, account.passwordHash))) return { refused: 'bad-credentials' };
  if (!account.active) return { refused: 'account-deactivated' };
  if (account.shopStatus !== 'active') return { refused: 'shop-suspended' };
  if (account.demo && !demoAccounts) return { refused: 'demo-accounts-off' };
  return { user: toUser(account) };
}

/** Whether an account may be signed in at all: active, and not a demo account where those are off. */
export function mayUse(account: { active: boolean; demo: boolean }, demoAccounts: boolean): boolean {
  return account.active && (demoAccounts || !account.demo);
}

/**
 * The signed-in user of a session, or undefined when the account is gone or no longer allowed: a
 * deactivated member's session is refused here even if its row has not been deleted yet.
 */
export async function sessionUser(db: Database, demoAccounts: boolean, id: number): Promise<SessionUser | undefined> {
  // Read before the request has a shop: the session's account says which shop it is.
  return usableUser(await acrossShops(() => findAccount(db, id)), demoAccounts);
}

/** A signed-in user with the shop their account belongs to. */
export interface SessionUser {
  user: User;
  shopId: number;
}

/**
 * The user of an account just read, with its shop, or undefined when there is none or it is no longer
 * allowed: deactivated, a demo account where those are off, or its shop suspended by the operator.
 */
export function usableUser(account: Account | undefined, demoAccounts: boolean): SessionUser | undefined {
  return account && mayUse(account, demoAccounts) && account.shopStatus === 'active' ? { user: toUser(account), shopId: account.shopId } : undefined;
}

/** The error a refused sign-in answers with. */
export function refusal(reason: SignInRefusal): AppError {
  if (reason === 'demo-accounts-off') return new AppError(403, 'demo-accounts-off', 'Demo accounts are switched off on this server (NODE_ENV=production).');
  if (reason === 'shop-suspended') return new AppError(403, 'shop-suspended', "This shop's account is suspended. Contact the Borewright operator.");
  if (reason === 'account-deactivated') return new AppError(403, 'account-deactivated', 'This account has been deactivated. Ask an admin of your shop if you need it again.');
  return new AppError(401, 'bad-credentials', 'That e-mail address and password do not match an account.');
}

/** A user's own choices (their units); the user as they are now. */
export async function changePreferences(db: Database, id: number, preferences: z.output<typeof preferencesBody>): Promise<User> {
  const account = await updateUnits(db, id, preferences.units);
  if (!account) throw new AppError(401, 'unauthenticated', 'Sign in first.');
  return toUser(account);
}
