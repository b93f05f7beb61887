import { NavLink, useNavigate } from 'react-router';
import type { User } from '../../../shared/schemas/user.schema';
import { useSignOut } from '../../features/auth/api/sign-out';
import { can, roleLabels } from '../../features/auth/permissions';
import { cn } from '../../lib/cn';
import { Wordmark } from '../ui/LogoMark';

const navLink = ({ isActive }: { isActive: boolean }) =>
  cn(
    'inline-flex min-h-11 items-center rounded-md px-3 text-sm font-semibold uppercase tracking-wide',
    isActive ? 'bg-ink-700 text-spark-300' : 'text-steel-200 hover:bg-ink-800 hover:text-white',
  );

/** The dark top bar: name, navigation for the role, who is signed in, sign-out. */
export function AppHeader({ user }: { user: User }) {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <header className="bg-ink-900 text-steel-50 shadow-md">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2 md:px-6">
        <NavLink to="/" aria-label="Tackline — jobs" className="rounded-md">
          <Wordmark inverted />
        </NavLink>
        <nav aria-label="Main" className="flex items-center gap-1">
          <NavLink to="/" end className={navLink}>
            Jobs
          </NavLink>
          {can.manageUsers(user.role) ? (
            <NavLink to="/users" className={navLink}>
              Users
            </NavLink>
          ) : null}
        </nav>
        <div className="ml-auto flex items-center gap-3">
          <div className="text-right leading-tight">
            <p className="text-sm font-semibold" data-testid="signed-in-name">
              {user.displayName}
            </p>
            <p className="text-xs text-steel-300">
              {roleLabels[user.role]} · {user.organisation.name}
            </p>
          </div>
          <button
            type="button"
            className="inline-flex min-h-11 items-center rounded-md border border-ink-600 px-3 text-sm font-semibold text-steel-100 hover:border-spark-400 hover:text-spark-300 disabled:opacity-50"
            disabled={signOut.isPending}
            onClick={() =>
              signOut.mutate(undefined, { onSettled: () => navigate('/sign-in', { replace: true }) })
            }
          >
            Sign out
          </button>
        </div>
      </div>
    </header>
  );
}
