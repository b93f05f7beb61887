import type { User } from '../../../shared/schemas/user.schema';
import type { UserRow } from './user.entity';

/** The API shape of a user row; never includes the password hash. */
export function toUserDto(row: UserRow, organisation: { id: string; name: string }): User {
  return {
    id: row.id,
    email: row.email,
    displayName: row.displayName,
    role: row.role,
    active: row.active,
    lastSignInAt: row.lastSignInAt ? row.lastSignInAt.toISOString() : null,
    organisation: { id: organisation.id, name: organisation.name },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    version: row.version,
  };
}
