import { createApp } from '../app';
import { loadConfig, type Config } from '../config';
import type { DatabaseHandle } from '../db/client';
import { createLogger, type Logger } from '../logger';
import { startMail, type Mailer } from '../mail/mailer';
import { PackPool } from '../packs/pack-pool';
import { openTestDatabase } from './test-database';

/** The demo template's shop: the seed makes the first shop of an empty database. */
export const DEMO_SHOP_ID = 1;

/** The session secret of every test app: tests sign pack links with it. */
export const TEST_SESSION_SECRET = 'a test secret that is long enough to sign cookies';

export interface TestApp {
  app: ReturnType<typeof createApp>;
  database: DatabaseHandle;
  /** Sends to a catcher of the test's own, which keeps messages in the test database's outbox (or the one given). */
  mailer: Mailer;
  /** Moves the app's clock forward, for session timeouts. */
  advance(ms: number): void;
  close(): Promise<void>;
}

/** The configuration a test run gets from an empty environment, with overrides. */
export function testConfig(overrides: Partial<Config> = {}): Config {
  return { ...loadConfig({ NODE_ENV: 'test' }), ...overrides };
}

/** createApp on an in-memory database from a template, with a clock only the test moves. */
export async function createTestApp(
  options: { template?: 'empty' | 'demo'; config?: Partial<Config>; clientDir?: string; logger?: Logger; mailer?: Mailer } = {},
): Promise<TestApp> {
  const database = await openTestDatabase(options.template ?? 'demo');
  const config = testConfig(options.config);
  const logger = options.logger ?? createLogger('silent');
  const mail = await startMail(config, database.db, logger);
  const packPool = new PackPool(logger, 1);
  // A clock that stands still unless the test moves it: a slow machine cannot make a session time out.
  const start = Date.now();
  let offset = 0;
  const app = createApp({
    db: database.db,
    config,
    sessionSecret: TEST_SESSION_SECRET,
    logger,
    mailer: options.mailer ?? mail.mailer,
    packPool,
    jobEvents: database.jobEvents,
    clock: () => new Date(start + offset),
    clientDir: options.clientDir,
  });
  return {
    app,
    database,
    mailer: options.mailer ?? mail.mailer,
    advance: (ms) => {
      offset += ms;
    },
    close: async () => {
      await packPool.close();
      await mail.close();
      await database.close();
    },
  };
}
