import type { Authenticator } from '../auth/passport';
import type { Config } from '../config';
import type { Database } from '../db/client';

/** What every feature's routes may use. */
export interface RouteContext {
  db: Database;
  config: Config;
  clock: () => Date;
  authenticator: Authenticator;
}
