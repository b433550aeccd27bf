import type { CanDeactivateFn } from '@angular/router';

/** A screen that may hold changes not yet saved. */
export interface LeavesSafely {
  confirmLeave(): Promise<boolean> | boolean;
}

/** Asks before leaving a screen with unsaved changes. */
export const unsavedChangesGuard: CanDeactivateFn<LeavesSafely> = (screen) => screen.confirmLeave();
