import { HttpErrorResponse } from '@angular/common/http';

/**
 * What went wrong with an API call, in words a user can act on. The error interceptor turns every
 * failed response into one, so stores and screens never read raw HTTP errors.
 */
export class ApiProblem extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    /** Field messages by path (`width`, `name`), for 400 answers. */
    readonly fields: Readonly<Record<string, string>> = {},
    /** Path-led lines, one per problem of an uploaded document. */
    readonly details: readonly string[] = [],
  ) {
    super(message);
    this.name = 'ApiProblem';
  }

  /** Reads the API's error answer; its schema loads on the first failure, not with the first page. */
  static async fromResponse(response: HttpErrorResponse): Promise<ApiProblem> {
    const { apiError } = await import('../../../shared/api/session-contract');
    const body = apiError.safeParse(response.error);
    if (body.success) {
      const { code, message, fields, details } = body.data.error;
      return new ApiProblem(response.status, code, message, fields, details);
    }
    return new ApiProblem(response.status, 'unreadable-answer', fallbackMessage(response.status));
  }
}

function fallbackMessage(status: number): string {
  if (status === 0) return 'The Borewright server cannot be reached. Check the connection and try again.';
  if (status === 401) return 'Your session has ended. Sign in again.';
  if (status === 403) return 'Your role does not allow this.';
  if (status === 404) return 'This was not found. It may have been deleted.';
  if (status === 429) return 'Too many requests in a short time. Wait a minute, then try again.';
  if (status >= 500) return `The server ran into a problem (status ${status}). Try again; if it keeps happening, tell your admin.`;
  return `The request failed (status ${status}).`;
}

/** One readable sentence for anything a request or its validation can throw. */
export function describeError(error: unknown): string {
  if (error instanceof ApiProblem) return error.message;
  // zod's errors by name (ZodError, and $ZodError from zod/mini), so that the first page carries no zod.
  if (error instanceof Error && /^\$?ZodError$/.test(error.name))
    return 'The server answered in a shape this page does not understand. Reload the page; if it persists, the app and server versions differ.';
  if (error instanceof Error && error.message !== '') return error.message;
  return 'Something went wrong. Try again.';
}

/**
 * True when the API refused a change because someone else saved the same record first; not for the other
 * 409s (a panel a door hangs on, a status step out of order), whose messages say what to do instead.
 */
export function isStaleVersion(error: unknown): boolean {
  return error instanceof ApiProblem && error.status === 409 && error.code === 'stale-version';
}
