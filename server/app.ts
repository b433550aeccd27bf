import { fileURLToPath } from 'node:url';
import express, { type Express } from 'express';
import { pinoHttp } from 'pino-http';
import { createApiRouter } from './api-router';
import type { Config } from './config';
import type { Database } from './db/client';
import { clientApp } from './http/client-app';
import { errorHandler } from './http/error-handler';
import { loggedUrl } from './http/logged-url';
import { securityHeaders } from './http/security-headers';
import type { Logger } from './logger';
import type { Mailer } from './mail/mailer';
import type { JobEvents } from './live/job-events';
import type { LiveStreams } from './live/live-streams';
import type { PackPool } from './packs/pack-pool';

/** Where `ng build` puts the browser app. */
export const DEFAULT_CLIENT_DIR = fileURLToPath(new URL('../dist/borewright/browser', import.meta.url));

export interface AppDeps {
  db: Database;
  config: Config;
  /** Signs session cookies: SESSION_SECRET, or the one kept in the data folder (auth/session-secret.ts). */
  sessionSecret: string;
  logger: Logger;
  /** Where the features' mail goes: the local catcher or the SMTP_URL server (mail/mailer.ts). */
  mailer: Mailer;
  /** The worker threads that make bench packs; main.ts ends them at shutdown. A pool of its own when not given. */
  packPool?: PackPool;
  /** Word of each job's new events from any server (the database handle's). */
  jobEvents: JobEvents;
  /** The live streams open here; main.ts ends them at shutdown. Made from db and jobEvents when not given. */
  liveStreams?: LiveStreams;
  /** The time sessions are judged by; tests move it forward instead of waiting. */
  clock?: () => Date;
  clientDir?: string;
}

/** "true", a hop count, or Express's own words ("loopback", addresses). */
function trustProxySetting(value: string): boolean | number | string {
  if (value === 'true' || value === 'false') return value === 'true';
  return /^\d+$/.test(value) ? Number(value) : value;
}

/** The whole web server, without listening: main.ts listens, tests drive it with supertest. */
export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  if (deps.config.trustProxy) app.set('trust proxy', trustProxySetting(deps.config.trustProxy));
  app.use(
    pinoHttp({
      logger: deps.logger,
      // Method, path and status are enough to follow a request; headers stay out of the log.
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: loggedUrl(req.url) }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info'),
    }),
  );
  app.use(securityHeaders(deps.config));
  app.use('/api', createApiRouter(deps));
  app.use(clientApp(deps.clientDir ?? DEFAULT_CLIENT_DIR));
  app.use(errorHandler);
  return app;
}
