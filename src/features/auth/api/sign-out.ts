import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

/** Ends the session on the server. */
export async function signOut(): Promise<void> {
  await apiRequest<void>('/auth/sign-out', { method: 'POST', allowUnauthenticated: true });
}

/** Sign-out mutation: forgets every cached record so the next user sees none of them. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSettled: () => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
