import { redirect, type LoaderFunctionArgs } from 'react-router';
import { meQueryOptions } from '../features/auth/api/get-me';
import { queryClient } from '../lib/query-client';
import { signInUrl } from './safe-next';

/** Guard for every signed-in route: no session → sign-in, coming back here afterwards. */
export async function requireUser({ request }: LoaderFunctionArgs) {
  const user = await queryClient.ensureQueryData(meQueryOptions());
  if (!user) {
    const url = new URL(request.url);
    throw redirect(signInUrl(url.pathname + url.search));
  }
  return null;
}
