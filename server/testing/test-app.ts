import { createApp } from '../app';
import { loadConfig, type Config } from '../config';
import type { DatabaseHandle } from '../db/client';
import { createLogger } from '../logger';
import { openTestDatabase } from './test-database';

export interface TestApp {
  app: ReturnType<typeof createApp>;
  database: DatabaseHandle;
  /** Moves the app's clock forward, for session timeouts. */
  advance(ms: number): void;
  close(): Promise<void>;
}

/** The configuration a test run gets from an empty environment, with overrides. */
export function testConfig(overrides: Partial<Config> = {}): Config {
  return { ...loadConfig({ NODE_ENV: 'test' }), ...overrides };
}

/** createApp on an in-memory database from a template, with a clock only the test moves. */
export async function createTestApp(options: { template?: 'empty' | 'demo'; config?: Partial<Config>; clientDir?: string } = {}): Promise<TestApp> {
  const database = await openTestDatabase(options.template ?? 'demo');
  // A clock that stands still unless the test moves it: a slow machine cannot make a session time out.
  const start = Date.now();
  let offset = 0;
  const app = createApp({
    db: database.db,
    config: testConfig(options.config),
    sessionSecret: 'a test secret that is long enough to sign cookies',
    logger: createLogger('silent'),
    clock: () => new Date(start + offset),
    clientDir: options.clientDir,
  });
  return {
    app,
    database,
    advance: (ms) => {
      offset += ms;
    },
    close: () => database.close(),
  };
}
