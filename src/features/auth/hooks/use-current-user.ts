import type { User } from '../../../../shared/schemas/user.schema';
import { useMe } from '../api/get-me';

/**
 * The signed-in user inside guarded routes. The guard loader has already
 * resolved the session, so this never returns null there.
 */
export function useCurrentUser(): User {
  const { data } = useMe();
  if (!data) throw new Error('useCurrentUser used outside a signed-in route');
  return data;
}
