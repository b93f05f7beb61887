import { ApiError } from '../../../lib/api-error';

/** Label of the field where an admin types their own password again before a user change. */
export const CURRENT_PASSWORD_LABEL = 'Your password';

/** Hint under that field: why a signed-in admin is asked again. */
export const CURRENT_PASSWORD_HINT = 'Your own sign-in password, asked again before any change to accounts.';

/**
 * The message for the "Your password" field when the server refused it (403
 * `reauthentication_failed`), or null for any other outcome.
 */
export function currentPasswordError(error: unknown): string | null {
  if (error instanceof ApiError && error.code === 'reauthentication_failed') {
    return 'That is not your password. Nothing was changed; type it again.';
  }
  return null;
}
