/** The roles of a shop's members (design.md §1), as plain data: the first page checks them without zod. */
export const ROLES = ['admin', 'designer', 'bench', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

/** What each role may do (design.md §1); the server enforces it, the client hides what is not allowed. */
export const permissions = {
  readJobs: ['admin', 'designer', 'bench', 'viewer'],
  editJobs: ['admin', 'designer'],
  markPanels: ['admin', 'designer', 'bench'],
  manageTeam: ['admin'],
  /** Import a shop's own fittings into the catalog and delete them (design.md §1: the admin does catalog imports). */
  manageCatalog: ['admin'],
  /** Set the shop's machine conventions, which every drilling program follows; everyone signed in reads them. */
  manageShopSettings: ['admin'],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof permissions;

export function can(userRole: Role | undefined, permission: Permission): boolean {
  return userRole !== undefined && (permissions[permission] as readonly Role[]).includes(userRole);
}
