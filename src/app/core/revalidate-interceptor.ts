import { HttpErrorResponse, HttpInterceptorFn, HttpResponse } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { catchError, of, tap, throwError } from 'rxjs';

/** How many answers are kept, the most recently used ones. */
const KEPT = 16;

/** The last JSON answer with an entity tag of each GET address, in memory only (the API answers no-store). */
@Injectable({ providedIn: 'root' })
export class RevalidationCache {
  private readonly kept = new Map<string, { etag: string; body: unknown }>();

  get(url: string): { etag: string; body: unknown } | undefined {
    const hit = this.kept.get(url);
    if (hit) {
      this.kept.delete(url);
      this.kept.set(url, hit);
    }
    return hit;
  }

  keep(url: string, etag: string, body: unknown): void {
    this.kept.delete(url);
    this.kept.set(url, { etag, body });
    if (this.kept.size > KEPT) this.kept.delete(this.kept.keys().next().value!);
  }
}

/**
 * Asks again with If-None-Match for a GET whose last answer carried an entity tag (a job), and gives the
 * kept answer when the server says 304 Not Modified: an unchanged job is not sent again. The server tags
 * a job by its stored version, so a change always brings the new job.
 */
export const revalidateInterceptor: HttpInterceptorFn = (request, next) => {
  if (request.method !== 'GET' || request.responseType !== 'json') return next(request);
  const cache = inject(RevalidationCache);
  const url = request.urlWithParams;
  const kept = cache.get(url);
  const sent = kept ? request.clone({ setHeaders: { 'If-None-Match': kept.etag } }) : request;
  return next(sent).pipe(
    tap((event) => {
      const etag = event instanceof HttpResponse ? event.headers.get('ETag') : null;
      if (etag && event instanceof HttpResponse) cache.keep(url, etag, event.body);
    }),
    catchError((error: unknown) =>
      kept && error instanceof HttpErrorResponse && error.status === 304
        ? of(new HttpResponse({ body: kept.body, headers: error.headers, status: 200, statusText: 'OK', url: error.url ?? url }))
        : throwError(() => error),
    ),
  );
};
