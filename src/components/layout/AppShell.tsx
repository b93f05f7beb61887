import { Outlet } from 'react-router';
import { useCurrentUser } from '../../features/auth/hooks/use-current-user';
import { AppFooter } from './AppFooter';
import { AppHeader } from './AppHeader';

/** Frame of every signed-in page. */
export function AppShell() {
  const user = useCurrentUser();
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <AppHeader user={user} />
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 md:px-6">
        <Outlet />
      </main>
      <AppFooter />
    </div>
  );
}
