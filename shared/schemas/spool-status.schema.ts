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

/** The shop stages in the order a spool moves through them (`on-hold` stands outside). */
const STAGE_SEQUENCE: readonly SpoolStatus[] = spoolStatusSchema.options.filter((s) => s !== 'on-hold');

/** The stage a revision change undoes (see `ShopStageUndone` in shared/engine/revision-diff). */
export type StageUndone = 'cut' | 'fit' | 'weld' | 'none';

/** Where a spool must go back to when a change undoes `undone`: before that stage was done. */
const RETURN_TO: Record<Exclude<StageUndone, 'none'>, SpoolStatus> = {
  cut: 'issued',
  fit: 'cut',
  weld: 'fitted',
};

/**
 * The status a spool returns to when a new revision issued over it undoes `undone`, or null
 * when the bay has not yet done that stage (nothing to rework). A spool on hold stays on hold
 * (it is flagged for rework all the same).
 */
export function reworkStatus(current: SpoolStatus, undone: StageUndone): SpoolStatus | null {
  if (undone === 'none') return null;
  const target = RETURN_TO[undone];
  if (current === 'on-hold') return 'on-hold';
  return STAGE_SEQUENCE.indexOf(current) > STAGE_SEQUENCE.indexOf(target) ? target : null;
}
