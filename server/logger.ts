import { pino, type Logger } from 'pino';

export type { Logger };

/** Structured JSON logs on stdout; the level comes from the configuration (silent under test). */
export function createLogger(level: string): Logger {
  return pino({
    level,
    // Sessions and CSRF tokens travel in these headers; they never belong in a log.
    redact: ['req.headers.cookie', 'req.headers["x-xsrf-token"]', 'res.headers["set-cookie"]'],
  });
}
