import type { ErrorRequestHandler } from 'express';
import multer from 'multer';
import { ZodError } from 'zod';
import type { ApiError } from '../../shared/api/contract';
import { formatPath, listIssues } from '../../shared/model/validation-messages';
import { AppError } from './app-error';

/** Body parser errors carry a `type`; these are the ones a client can cause. */
const bodyErrors: Record<string, { status: number; code: string; message: string }> = {
  'entity.parse.failed': { status: 400, code: 'malformed-json', message: 'The request body is not valid JSON.' },
  'entity.too.large': { status: 413, code: 'too-large', message: 'The request body is too large.' },
  'encoding.unsupported': { status: 415, code: 'unsupported-media-type', message: 'The request body encoding is not supported.' },
  'charset.unsupported': { status: 415, code: 'unsupported-media-type', message: 'The request body charset is not supported; send UTF-8.' },
  'request.aborted': { status: 400, code: 'aborted', message: 'The request was aborted before its body arrived.' },
};

function toAppError(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) {
    const fields: Record<string, string> = {};
    for (const issue of listIssues(err)) fields[formatPath(issue.path) || '(body)'] ??= issue.message;
    const summary = Object.entries(fields).map(([path, message]) => `${path}: ${message}`);
    return new AppError(400, 'invalid-input', summary.join('; '), { fields });
  }
  // A file over its limit is answered by fileUpload (http/body.ts), which knows the limit to name.
  if (err instanceof multer.MulterError) {
    const field = err.field ?? 'file';
    return new AppError(400, 'invalid-upload', `${field}: ${err.message}`, { fields: { [field]: err.message } });
  }
  // Drizzle wraps the driver's error; its SQLSTATE is in `cause.code`. A unique key taken between our
  // check and our insert is a race with another user, not a server fault.
  if ((err as { cause?: { code?: unknown } } | null)?.cause?.code === '23505') {
    return new AppError(409, 'conflict', 'Someone made a conflicting change at the same moment. Reload and try again.');
  }
  const type = (err as { type?: unknown } | null)?.type;
  if (typeof type === 'string' && type in bodyErrors) {
    const { status, code, message } = bodyErrors[type];
    return new AppError(status, code, message);
  }
  return clientFault(err);
}

/**
 * Express's router, body-parser and the static files mark the errors a request causes with a 4xx
 * `status` (http-errors): a path whose percent-encoding does not decode, a body declared gzip,
 * deflate or br that does not inflate. They keep their status; their own words are for the log.
 */
function clientFault(err: unknown): AppError | undefined {
  const status = (err as { status?: unknown } | null)?.status;
  if (typeof status !== 'number' || status < 400 || status > 499) return undefined;
  if (err instanceof URIError) return new AppError(400, 'malformed-url', 'The address holds a malformed percent-encoding (a % not followed by the bytes of a character).');
  if (status === 400) return new AppError(400, 'malformed-body', 'The request body could not be read: it is not what its Content-Encoding and Content-Type headers say.');
  return new AppError(status, 'bad-request', `The request was refused (HTTP ${status}).`);
}

/**
 * The one error handler, registered last: a client's mistake answers with its status and the
 * fields it concerns; anything else is logged and answers 500 without a stack.
 */
export const errorHandler: ErrorRequestHandler = (err, req, res, next) => {
  if (res.headersSent) return next(err);
  const known = toAppError(err);
  const { retryAfterSeconds, ...extra } = known?.extra ?? {};
  if (retryAfterSeconds !== undefined) res.set('Retry-After', String(retryAfterSeconds));
  const body: ApiError = known
    ? { error: { code: known.code, message: known.message, ...extra } }
    : { error: { code: 'internal', message: 'Something went wrong on the server. The error is logged; please try again.' } };
  // A client's mistake is logged at warn by pino-http with its status; only our own faults are errors.
  if (!known) req.log.error({ err }, 'request failed');
  res.status(known?.status ?? 500).json(body);
};
