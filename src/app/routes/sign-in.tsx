import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Wordmark } from '../../components/ui/LogoMark';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { SignInForm } from '../../features/auth/components/SignInForm';
import { queryClient } from '../../lib/query-client';
import { safeNext } from '../safe-next';

/** Already signed in: go straight where the user was heading. */
export async function loader({ request }: LoaderFunctionArgs) {
  const user = await queryClient.ensureQueryData(meQueryOptions());
  if (user) throw redirect(safeNext(new URL(request.url).searchParams.get('next')));
  return null;
}

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params.get('next'));
  return (
    <div className="flex min-h-screen flex-col bg-ink-900 md:flex-row">
      <section className="flex flex-1 flex-col justify-between gap-10 p-8 text-steel-100 md:p-12">
        <Wordmark inverted />
        <div className="max-w-md">
          <h1 className="text-4xl font-bold text-white md:text-5xl">From isometric to shipped spool.</h1>
          <p className="mt-4 text-steel-300">
            Lay spools out from real fitting dimensions, issue numbered sheets with every cut length, and keep the
            shop's records — cut, fitted, welded, inspected — in one place.
          </p>
        </div>
        <svg viewBox="0 0 240 24" aria-hidden="true" className="hidden h-6 w-60 text-ink-600 md:block">
          <path d="M0 12h100M140 12h100" stroke="currentColor" strokeWidth="8" />
          <path d="M112 4l8 6M112 10l8 6M112 16l8 6" stroke="#f9ac35" strokeWidth="3" strokeLinecap="round" />
        </svg>
      </section>
      <section className="flex flex-1 items-center justify-center bg-steel-100 p-6 md:p-12">
        <div className="w-full max-w-sm rounded-xl border border-steel-200 bg-white p-6 shadow-lg md:p-8">
          <h2 className="text-3xl font-bold text-ink-900">Sign in</h2>
          <p className="mb-6 mt-1 text-sm text-steel-600">Use the e-mail and password your shop's admin gave you.</p>
          <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
        </div>
      </section>
    </div>
  );
}
