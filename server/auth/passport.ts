import type { Request, Response } from 'express';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { User } from '../../shared/api/contract';
import type { Database } from '../db/client';
import { checkCredentials, refusal, sessionUser, usableUser, type SessionUser, type SignInRefusal } from './auth.service';
import { setRequestShop } from './request-shop';
import { accountReadWithSession } from './session-store';

export type Authenticator = passport.Authenticator;

/**
 * An authenticator of our own per app (not passport's global one), so two apps in one process
 * (tests) never share strategies. Sessions carry the user id; the user is read fresh each request, with the
 * session itself.
 */
export function createAuthenticator(db: Database, demoAccounts: boolean): Authenticator {
  const authenticator = new passport.Authenticator();
  authenticator.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      checkCredentials(db, demoAccounts, email, password).then(
        (result) => ('user' in result ? done(null, result.user) : done(null, false, { message: result.refused })),
        done,
      );
    }),
  );
  authenticator.serializeUser<number>((user, done) => done(null, user.id));
  // passport hands the request to a three-argument deserializer: the account's shop is the request's.
  authenticator.deserializeUser<number>((req: Request, id: number, done: (err: unknown, user?: User | false) => void) => {
    const settle = (found: SessionUser | undefined) => {
      if (found) setRequestShop(req, found.shopId);
      done(null, found?.user ?? false);
    };
    // Read with the session in this request (session-store.ts), so as fresh as a query of its own.
    const account = accountReadWithSession(req);
    if (account?.id === id) return settle(usableUser(account, demoAccounts));
    sessionUser(db, demoAccounts, id).then(settle, done);
  });
  return authenticator;
}

/** Runs the local strategy on the request's (validated) body; rejects with the refusal's AppError. */
export function authenticateLocal(authenticator: Authenticator, req: Request, res: Response): Promise<User> {
  return new Promise((resolve, reject) => {
    const done = (err: unknown, user: User | false, info?: { message?: string }) => {
      if (err) reject(err);
      else if (user) resolve(user);
      else reject(refusal((info?.message as SignInRefusal | undefined) ?? 'bad-credentials'));
    };
    authenticator.authenticate('local', { session: false }, done)(req, res, reject);
  });
}

/** passport's req.login: regenerates the session (against fixation) and stores the user id in it. */
export function logIn(req: Request, user: User): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}
