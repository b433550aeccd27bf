import {
  ApplicationConfig,
  inject,
  provideAppInitializer,
  provideBrowserGlobalErrorListeners,
} from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';
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
      // Icons are ligatures of the Material Symbols font shipped with the app (angular.json styles).
      inject(MatIconRegistry).setDefaultFontSetClass('material-symbols-outlined');
      // Asking who is signed in also sets the XSRF cookie before the first change is sent.
      return inject(AuthStore).restoreSession();
    }),
  ],
};
