import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { User, UserCreate } from '../../../../shared/schemas/user.schema';
import { apiRequest } from '../../../lib/api-client';
import { userKeys } from './user-keys';

/** Adds a person to the shop with a first password. */
export function createUser(body: UserCreate): Promise<User> {
  return apiRequest<User>('/users', { method: 'POST', body });
}

/** Create-user mutation. */
export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
