/** What a service throws when a request cannot be served; the error handler turns it into the API's error shape. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly extra: { fields?: Record<string, string>; details?: string[] } = {},
  ) {
    super(message);
    this.name = 'AppError';
  }
}

/** 404 for a thing the URL names; `what` reads as the start of a sentence ("Job 12"). */
export function notFound(what: string): AppError {
  return new AppError(404, 'not-found', `${what} does not exist.`);
}

/** 400 for one field that is well-formed but does not fit the data (a material the job does not have). */
export function invalidField(field: string, message: string): AppError {
  return new AppError(400, 'invalid-input', `${field}: ${message}`, { fields: { [field]: message } });
}
