/** What a service throws when a request cannot be served; the error handler turns it into the API's error shape. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly extra: { fields?: Record<string, string>; details?: string[]; retryAfterSeconds?: number } = {},
  ) {
    super(message);
    this.name = 'AppError';
  }
}

/** 404 for a thing the URL names; `what` reads as the start of a sentence ("Job 12"). */
export function notFound(what: string): AppError {
  return new AppError(404, 'not-found', `${what} does not exist.`);
}

/**
 * 409 for a change made from a version of the thing (`this panel`, `this job`) that is no longer the
 * current one: someone else saved in between, and their change is never silently overwritten.
 */
export function staleVersion(what: string, current?: number): AppError {
  const now = current === undefined ? '' : ` (it is now at version ${current})`;
  return new AppError(
    409,
    'stale-version',
    `Someone else changed ${what} since you loaded it${now}. Reload it to see their change, then make yours again.`,
    { fields: { version: 'is not the current version' } },
  );
}

/** 400 for one field that is well-formed but does not fit the data (a material the job does not have). */
export function invalidField(field: string, message: string): AppError {
  return new AppError(400, 'invalid-input', `${field}: ${message}`, { fields: { [field]: message } });
}
