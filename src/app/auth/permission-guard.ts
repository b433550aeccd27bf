import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { Permission } from '../../../shared/api/contract';
import { AuthStore } from './auth-store';

/**
 * Lets through only roles that hold the permission, sending anyone else to the jobs list. Runs under
 * the shell's authGuard, so the session is known. The server refuses them anyway; this spares them
 * a page of "not allowed".
 */
export function permissionGuard(permission: Permission): CanActivateFn {
  return () => inject(AuthStore).can(permission) || inject(Router).createUrlTree(['/jobs']);
}
