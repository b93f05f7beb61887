import { z } from 'zod';
import type { Role } from './role.schema';

/** Where a spool stands on the shop floor, in the order it normally moves. */
export const spoolStatusSchema = z.enum([
  'drafting',
  'issued',
  'cut',
  'fitted',
  'welded',
  'inspected',
  'released',
  'shipped',
  'on-hold',
]);
/** Spool status. */
export type SpoolStatus = z.infer<typeof spoolStatusSchema>;

/**
 * The status moves each non-admin role may make through `POST /api/spools/:id/status`.
 * Admins may set any status. Issuing a revision moves a drafting spool to `issued`.
 */
export const SPOOL_STATUS_MOVES: Readonly<
  Partial<Record<Role, ReadonlyArray<readonly [SpoolStatus, SpoolStatus]>>>
> = {
  fabricator: [
    ['issued', 'cut'],
    ['cut', 'fitted'],
    ['fitted', 'welded'],
  ],
  inspector: [
    ['welded', 'inspected'],
    ['inspected', 'released'],
  ],
};

/** Statuses `role` may move a spool to from `from` (every other status for admins). */
export function allowedSpoolStatusTargets(role: Role, from: SpoolStatus): SpoolStatus[] {
  if (role === 'admin') return spoolStatusSchema.options.filter((s) => s !== from);
  return (SPOOL_STATUS_MOVES[role] ?? []).filter(([f]) => f === from).map(([, to]) => to);
}

/** Roles that may call the status endpoint at all. */
export const SPOOL_STATUS_ROLES: readonly Role[] = ['admin', 'fabricator', 'inspector'];
