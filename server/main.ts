import { existsSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import path from 'node:path';
import { resolveSessionSecret } from './auth/session-secret';
import { ConfigError, loadConfig } from './config';
import { databaseTarget, openDatabase } from './db/client';
import { acquireDataLock, DataFolderLockedError } from './db/data-lock';
import { createLogger } from './logger';
import { LiveStreams } from './live/live-streams';
import { PackPool } from './packs/pack-pool';
import { refreshJobStatistics } from './db/planner-statistics';

/** Requests still running get this long after SIGTERM before their connections are cut. */
const DRAIN_MS = 10_000;

function fail(message: string): never {
  console.error(`\n${message}\n`);
  process.exit(1);
}

function listen(server: Server, port: number, host: string): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
}

async function main(): Promise<void> {
  const started = performance.now();
  let config;
  try {
    config = loadConfig(process.env);
  } catch (err) {
    if (err instanceof ConfigError) fail(err.message);
    throw err;
  }
  const logger = createLogger(config.logLevel);
  const target = databaseTarget(config);

  let lock;
  try {
    lock = target.engine === 'pglite' ? acquireDataLock(config.dataDir) : undefined;
  } catch (err) {
    if (err instanceof DataFolderLockedError) fail(`Borewright cannot start: ${err.message}`);
    throw err;
  }
  const sessionSecret = resolveSessionSecret(config.sessionSecret, config.dataDir);
  // The database opens while the rest of the server loads: PGlite compiles its WebAssembly and reads its
  // files meanwhile, which took as long as loading every route.
  const opening = openDatabase(target);
  const [{ createApp, DEFAULT_CLIENT_DIR }, { DEMO_PASSWORD, DEMO_PEOPLE }, { seedDemoShop }, { startMail }] = await Promise.all([
    import('./app'),
    import('./demo/greyfield-people'),
    import('./demo/seed-demo'),
    import('./mail/mailer'),
  ]);
  const database = await opening;
  await database.migrate();
  const seeded = config.demoAccounts && (await seedDemoShop(database.db));

  const mail = await startMail(config, database.db, logger);
  const packPool = new PackPool(logger);
  const liveStreams = new LiveStreams(database.db, database.jobEvents);
  const server = createServer(
    createApp({ db: database.db, config, sessionSecret, logger, mailer: mail.mailer, packPool, jobEvents: database.jobEvents, liveStreams }),
  );
  await listen(server, config.port, config.host).catch((err: NodeJS.ErrnoException) =>
    fail(`Borewright cannot listen on ${config.host}:${config.port}: ${err.code === 'EADDRINUSE' ? 'the port is taken (set PORT)' : err.message}`),
  );

  // Whatever was written since the last start without a bulk load's refresh (planner-statistics.ts); a
  // failure here costs speed, not service, so it is logged and the server goes on.
  refreshJobStatistics(database.db).catch((err: unknown) => logger.warn({ err }, 'refreshing the planner statistics failed'));

  const where = target.engine === 'pglite' ? `PGlite in ${path.resolve(config.dataDir)}` : 'PostgreSQL (DATABASE_URL)';
  const lines = [
    '',
    `Borewright is running at http://${config.host.includes(':') ? `[${config.host}]` : config.host}:${config.port}/`,
    `  data: ${where}${seeded ? ', demo shop created' : ''}`,
    `  mail: ${mail.describe}`,
    ...(config.signUpOpen ? ['  sign-up: open (SIGNUP=open): visitors may create shops from the sign-in page'] : []),
    `  ready in ${Math.round(performance.now() - started)} ms`,
  ];
  if (!existsSync(path.join(DEFAULT_CLIENT_DIR, 'index.html'))) {
    lines.push(`  the web app is not built (${DEFAULT_CLIENT_DIR} is missing): run "npm run build"; the API works meanwhile`);
  }
  if (config.demoAccounts) {
    lines.push(`  demo accounts (password "${DEMO_PASSWORD}"):`, ...DEMO_PEOPLE.map((p) => `    ${p.role.padEnd(9)} ${p.email}`));
  }
  console.log(`${lines.join('\n')}\n`);

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) {
      console.error(`${signal} again: stopping now.`);
      process.exit(1);
    }
    stopping = true;
    logger.info({ signal }, 'stopping: no new connections, finishing requests');
    setTimeout(() => server.closeAllConnections(), DRAIN_MS).unref();
    // Live streams never finish by themselves: end them (each leaves its presence) so the close can.
    const streamsEnded = liveStreams.close();
    server.close(() => {
      streamsEnded
        .then(() => packPool.close())
        .then(() => mail.close())
        .then(() => database.close())
        .then(() => {
          lock?.release();
          logger.info('stopped cleanly');
          process.exit(0);
        })
        .catch((err: unknown) => {
          logger.error({ err }, 'ending the pack workers, the mail catcher or the database failed');
          process.exit(1);
        });
    });
    server.closeIdleConnections();
  };
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('SIGINT', () => stop('SIGINT'));
}

await main();
