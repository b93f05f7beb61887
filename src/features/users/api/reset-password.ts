import { useMutation } from '@tanstack/react-query';
import type { PasswordReset } from '../../../../shared/schemas/user.schema';
import { apiRequest } from '../../../lib/api-client';

/** Sets a new password for a user (admin). */
export function resetPassword(id: string, body: PasswordReset): Promise<void> {
  return apiRequest<void>(`/users/${encodeURIComponent(id)}/reset-password`, { method: 'POST', body });
}

/** Reset-password mutation; nothing cached changes. */
export function useResetPassword() {
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body: PasswordReset }) => resetPassword(id, body),
  });
}
