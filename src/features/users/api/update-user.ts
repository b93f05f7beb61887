import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { User, UserUpdate } from '../../../../shared/schemas/user.schema';
import { apiRequest } from '../../../lib/api-client';
import { userKeys } from './user-keys';

/** Changes a user's name, role or active flag. */
export function updateUser(id: string, body: UserUpdate): Promise<User> {
  return apiRequest<User>(`/users/${encodeURIComponent(id)}`, { method: 'PATCH', body });
}

/** Update-user mutation (role change, deactivate, reactivate). */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body: UserUpdate }) => updateUser(id, body),
    onSuccess: (user) => {
      queryClient.setQueryData(userKeys.detail(user.id), user);
      return queryClient.invalidateQueries({ queryKey: userKeys.lists() });
    },
  });
}
