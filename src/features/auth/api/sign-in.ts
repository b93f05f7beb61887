import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionUser, SignIn } from '../../../../shared/schemas/auth.schema';
import type { User } from '../../../../shared/schemas/user.schema';
import { apiRequest } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

/** Signs in; the server sets the session cookie. */
export async function signIn(body: SignIn): Promise<User> {
  const res = await apiRequest<SessionUser>('/auth/sign-in', { method: 'POST', body, allowUnauthenticated: true });
  return res.user;
}

/** Sign-in mutation: drops anything cached for a previous user, then stores the new one. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
