import { z } from 'zod';
import { idSchema, timestampSchema } from './id.schema';
import { listQuerySchema, queryBooleanSchema } from './list-query.schema';
import { roleSchema } from './role.schema';
import { textSchema } from './text.schema';

/** An e-mail address as stored: trimmed and lower-cased. */
export const emailSchema = textSchema().trim().toLowerCase().max(254).pipe(z.email());

/** Display name shown on screens and sheets. */
export const displayNameSchema = textSchema().trim().min(1).max(120);

/** UTF-8 byte length of a string (no TextEncoder: shared/ has no DOM or Node types). */
function utf8Length(text: string): number {
  let bytes = 0;
  for (const ch of text) {
    const cp = ch.codePointAt(0) ?? 0;
    bytes += cp < 0x80 ? 1 : cp < 0x800 ? 2 : cp < 0x10000 ? 3 : 4;
  }
  return bytes;
}

/**
 * A new password: 10 to 72 characters (bcrypt reads at most 72 bytes, so longer
 * ones are refused rather than silently cut).
 */
export const newPasswordSchema = textSchema()
  .min(10, 'Use at least 10 characters')
  .refine((p) => utf8Length(p) <= 72, 'Use at most 72 bytes');

/**
 * The acting user's own password, sent again with every user-administration write so a
 * session left open (or stolen) cannot create accounts, change roles or reset passwords.
 * Capped in length so a huge string never reaches bcrypt (which reads at most 72 bytes).
 */
export const currentPasswordSchema = textSchema().min(1, 'Enter your password').max(200);

/** A user as the API returns it. Never carries the password hash. */
export const userSchema = z.object({
  id: idSchema,
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  active: z.boolean(),
  lastSignInAt: timestampSchema.nullable(),
  organisation: z.object({ id: idSchema, name: z.string() }),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
  version: z.number().int(),
});
/** A user as the API returns it. */
export type User = z.infer<typeof userSchema>;

/** `POST /api/users` body (admin). */
export const userCreateSchema = z
  .object({
    email: emailSchema,
    displayName: displayNameSchema,
    role: roleSchema,
    password: newPasswordSchema,
    currentPassword: currentPasswordSchema,
  })
  .strict();
/** Parsed `POST /api/users` body. */
export type UserCreate = z.infer<typeof userCreateSchema>;

/** `PATCH /api/users/:id` body (admin). `version`, when sent, guards against stale edits. */
export const userUpdateSchema = z
  .object({
    displayName: displayNameSchema.optional(),
    role: roleSchema.optional(),
    active: z.boolean().optional(),
    version: z.number().int().min(1).optional(),
    currentPassword: currentPasswordSchema,
  })
  .strict();
/** Parsed `PATCH /api/users/:id` body. */
export type UserUpdate = z.infer<typeof userUpdateSchema>;

/** `POST /api/users/:id/reset-password` body (admin). */
export const passwordResetSchema = z
  .object({ password: newPasswordSchema, currentPassword: currentPasswordSchema })
  .strict();
/** Parsed password reset body. */
export type PasswordReset = z.infer<typeof passwordResetSchema>;

/** Sortable user list fields; the first is the default. */
export const USER_SORT_FIELDS = ['displayName', 'email', 'role', 'createdAt', 'lastSignInAt'] as const;

/** `GET /api/users` query: list params plus an optional role and active filter. */
export const userListQuerySchema = listQuerySchema(USER_SORT_FIELDS).extend({
  role: roleSchema.optional(),
  active: queryBooleanSchema.optional(),
});
/** Parsed user list query. */
export type UserListQuery = z.infer<typeof userListQuerySchema>;
