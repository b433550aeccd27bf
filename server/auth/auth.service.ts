import type { User } from '../../shared/api/contract';
import type { Database } from '../db/client';
import { AppError } from '../http/app-error';
import { spendComparisonTime, verifyPassword } from './passwords';
import { findAccount, findAccountByEmail } from './users.repository';

type Account = User & { demo: boolean };

const toUser = ({ id, email, name, role }: Account): User => ({ id, email, name, role });

/** Why a sign-in was refused; the route turns it into the answer. */
export type SignInRefusal = 'bad-credentials' | 'demo-accounts-off';

/**
 * Checks an address and password. Unknown address and wrong password look alike to the caller,
 * in answer and in time. Demo accounts sign in only where the configuration allows them.
 */
export async function checkCredentials(
  db: Database,
  demoAccounts: boolean,
  email: string,
  password: string,
): Promise<{ user: User } | { refused: SignInRefusal }> {
  const account = await findAccountByEmail(db, email);
  if (!account) {
    await spendComparisonTime(password);
    return { refused: 'bad-credentials' };
  }
  if (!(await verifyPassword(password, account.passwordHash))) return { refused: 'bad-credentials' };
  if (account.demo && !demoAccounts) return { refused: 'demo-accounts-off' };
  return { user: toUser(account) };
}

/** The signed-in user of a session, or undefined when the account is gone or no longer allowed. */
export async function sessionUser(db: Database, demoAccounts: boolean, id: number): Promise<User | undefined> {
  const account = await findAccount(db, id);
  return account && (demoAccounts || !account.demo) ? toUser(account) : undefined;
}

/** The error a refused sign-in answers with. */
export function refusal(reason: SignInRefusal): AppError {
  return reason === 'demo-accounts-off'
    ? new AppError(403, 'demo-accounts-off', 'Demo accounts are switched off on this server (NODE_ENV=production).')
    : new AppError(401, 'bad-credentials', 'That e-mail address and password do not match an account.');
}
