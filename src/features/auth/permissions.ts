import type { Role } from '../../../shared/schemas/role.schema';

/**
 * What each role may do, for showing and hiding controls. The server enforces
 * the same rules on every route; this only keeps the screens honest.
 */
export const can = {
  manageJobs: (role: Role) => role === 'admin' || role === 'detailer',
  manageSpools: (role: Role) => role === 'admin' || role === 'detailer',
  editDesigns: (role: Role) => role === 'admin' || role === 'detailer',
  manageUsers: (role: Role) => role === 'admin',
};

/** Human name of a role, as the screens show it. */
export const roleLabels: Record<Role, string> = {
  admin: 'Admin',
  detailer: 'Detailer',
  fabricator: 'Fabricator',
  inspector: 'Inspector',
  viewer: 'Viewer',
};

/** What each role may do, in a few words, for role pickers. */
export const roleDuties: Record<Role, string> = {
  admin: 'users, jobs, everything',
  detailer: 'designs and issues revisions',
  fabricator: 'records shop progress',
  inspector: 'inspects and releases',
  viewer: 'read-only, e.g. the client',
};
