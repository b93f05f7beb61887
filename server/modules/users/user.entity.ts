import { EntitySchema } from 'typeorm';
import type { Role } from '../../../shared/schemas/role.schema';

/** A person who signs in to one shop. Table `app_user` (`user` is reserved in SQL). */
export interface UserRow {
  id: string;
  organisationId: string;
  /** Always stored lower-cased; unique within the organisation. */
  email: string;
  displayName: string;
  /** bcrypt hash; not selected unless asked for. */
  passwordHash: string;
  role: Role;
  active: boolean;
  lastSignInAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export const UserEntity = new EntitySchema<UserRow>({
  name: 'User',
  tableName: 'app_user',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    organisationId: { name: 'organisation_id', type: 'uuid' },
    email: { type: 'text' },
    displayName: { name: 'display_name', type: 'text' },
    passwordHash: { name: 'password_hash', type: 'text', select: false },
    role: { type: 'text' },
    active: { type: 'boolean', default: true },
    lastSignInAt: { name: 'last_sign_in_at', type: 'timestamptz', nullable: true },
    createdAt: { name: 'created_at', type: 'timestamptz', default: () => 'now()' },
    updatedAt: { name: 'updated_at', type: 'timestamptz', default: () => 'now()' },
    version: { type: 'integer', default: 1 },
  },
});
