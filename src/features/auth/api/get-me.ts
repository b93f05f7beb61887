import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionUser, } from '../../../../shared/schemas/auth.schema';
import type { User } from '../../../../shared/schemas/user.schema';
import { apiRequest } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { authKeys } from './auth-keys';

/** The signed-in user, or null when nobody is signed in (401 is an answer here, not an error). */
export async function getMe(signal?: AbortSignal): Promise<User | null> {
  try {
    const res = await apiRequest<SessionUser>('/auth/me', { signal, allowUnauthenticated: true });
    return res.user;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

/** Shared by the route guard (ensureQueryData) and components. */
export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

/** The current session's user (null when signed out). */
export function useMe() {
  return useQuery(meQueryOptions());
}
