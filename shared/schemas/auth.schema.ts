import { z } from 'zod';
import { emailSchema, userSchema } from './user.schema';
import { textSchema } from './text.schema';

/**
 * `POST /api/auth/sign-in` body. The password is only length-checked here: the
 * policy applies when it is set, and sign-in must not reveal it.
 */
export const signInSchema = z
  .object({
    email: emailSchema,
    password: textSchema().min(1).max(200),
  })
  .strict();
/** Parsed sign-in body. */
export type SignIn = z.infer<typeof signInSchema>;

/** `POST /api/auth/sign-in` and `GET /api/auth/me` answer. */
export const sessionUserSchema = z.object({ user: userSchema });
/** Parsed sign-in / me answer. */
export type SessionUser = z.infer<typeof sessionUserSchema>;
