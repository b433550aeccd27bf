import type { RequestHandler } from 'express';
import { can, type Permission } from '../../shared/api/contract';
import { AppError } from '../http/app-error';

const needs: Record<Permission, string> = {
  readJobs: 'read jobs',
  editJobs: 'change jobs',
  markPanels: 'mark panels',
  manageTeam: 'manage the team',
  manageCatalog: 'import or delete catalog fittings',
  manageShopSettings: "change the shop's machine settings",
};

/** 401 when signed out, 403 when the user's role lacks the permission (design.md §1, `permissions` in contract.ts). */
export function requirePermission(permission: Permission): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new AppError(401, 'unauthenticated', 'Sign in first.'));
    if (!can(req.user.role, permission)) {
      return next(new AppError(403, 'forbidden', `The ${req.user.role} role may not ${needs[permission]}.`));
    }
    next();
  };
}
