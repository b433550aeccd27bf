import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, from, switchMap, throwError } from 'rxjs';
import { AuthStore } from '../auth/auth-store';
import { ApiProblem } from './api-problem';

/** Calls under /api/auth/ answer 401 as part of their job (not signed in, wrong password). */
const AUTH_PATH = '/api/auth/';

/**
 * Turns every failed API response into an {@link ApiProblem} with a readable message, and sends the
 * user to sign-in when the session has ended.
 */
export const errorInterceptor: HttpInterceptorFn = (request, next) => {
  const router = inject(Router);
  const auth = inject(AuthStore);
  return next(request).pipe(
    catchError((error: unknown) => {
      if (!(error instanceof HttpErrorResponse)) return throwError(() => error);
      if (error.status === 401 && !request.url.startsWith(AUTH_PATH)) {
        auth.forgetSession();
        void router.navigate(['/sign-in'], { queryParams: { returnUrl: router.url } });
      }
      return from(ApiProblem.fromResponse(error)).pipe(switchMap((problem) => throwError(() => problem)));
    }),
  );
};
