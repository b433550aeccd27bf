import { Provider } from '@angular/core';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';

/** Providers for every spec (angular.json `test.providersFile`): dialogs and menus open and close at once. */
export default [{ provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }] satisfies Provider[];
