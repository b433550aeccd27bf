import {
  ApplicationConfig,
  inject,
  provideAppInitializer,
  provideBrowserGlobalErrorListeners,
} from '@angular/core';
import { provideRouter, withComponentInputBinding } from '@angular/router';
import { routes } from './app.routes';
import { AuthStore } from './auth/auth-store';
import { provideApiHttp } from './core/http';

export const appConfig: ApplicationConfig = {
  providers: [
    provideBrowserGlobalErrorListeners(),
    provideApiHttp(),
    provideRouter(routes, withComponentInputBinding()),
    provideAppInitializer(() => {
      // Asking who is signed in also sets the XSRF cookie before the first change is sent.
      return inject(AuthStore).restoreSession();
    }),
  ],
};
