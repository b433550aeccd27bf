import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { AuthStore } from './auth-store';

/** Lets signed-in users through and sends everyone else to sign-in, remembering where they were going. */
export const authGuard: CanActivateFn = async (_route, state) => {
  const auth = inject(AuthStore);
  const router = inject(Router);
  const user = await auth.restoreSession();
  return user !== null || router.createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } });
};
