import type { Authenticator } from '../auth/passport';
import type { Config } from '../config';
import type { Database } from '../db/client';
import type { LiveStreams } from '../live/live-streams';
import type { Mailer } from '../mail/mailer';
import type { PackPool } from '../packs/pack-pool';
import type { PackProgressBoard } from '../packs/pack-progress';

/** What every feature's routes may use. */
export interface RouteContext {
  db: Database;
  config: Config;
  clock: () => Date;
  authenticator: Authenticator;
  mailer: Mailer;
  /** Signs session cookies, and the pack links that work without signing in. */
  sessionSecret: string;
  /** The worker threads that make bench packs. */
  packPool: PackPool;
  /** How far each pack being made has got, by its download's ticket (kept in the database). */
  packProgress: PackProgressBoard;
  /** The live streams open on this server. */
  liveStreams: LiveStreams;
}
