import { Link, NavLink, Outlet } from 'react-router';
import { useMeta } from '../features/meta/api/get-meta';
import { Logo } from '../components/logo';
import { ThemeToggle } from '../components/theme-toggle';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { NotificationsMenu } from '../features/findings/components/notifications-menu';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `min-h-11 inline-flex items-center rounded-lg px-3 font-semibold ${isActive ? 'bg-glow-soft text-glow-strong' : 'text-ink-soft hover:bg-sunken'}`;

export function AppShell() {
  const meta = useMeta();
  const signedIn = Boolean(useMe().data);
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-panel focus:p-2">
        Skip to content
      </a>
      <header className="border-b border-rule bg-panel/90 backdrop-blur print:hidden">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-2 px-4 py-2">
          <NavLink to="/" className="mr-3 flex items-center gap-2" aria-label="Gridleak, the bench">
            <Logo />
            <span className="text-xl font-bold tracking-tight">Gridleak</span>
          </NavLink>
          {/* On a phone the links take a scrolling row of their own under the logo and the account controls. */}
          <nav aria-label="Main" className="order-last flex w-full items-center gap-1 overflow-x-auto whitespace-nowrap sm:order-none sm:w-auto sm:flex-1">
            {signedIn && (
              <NavLink to="/" end className={navClass}>
                Bench
              </NavLink>
            )}
            {signedIn && (
              <>
                <NavLink to="/restorations/new" className={navClass}>
                  Take in a set
                </NavLink>
                <NavLink to="/calculators" className={navClass}>
                  Calculators
                </NavLink>
              </>
            )}
          </nav>
          <span className="flex-1 sm:hidden" />
          {signedIn && <NotificationsMenu />}
          <ThemeToggle />
          <UserMenu />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6">
        <Outlet />
      </main>
      <footer className="border-t border-rule px-4 py-4 text-center text-xs text-ink-soft print:hidden">
        <p>
          Valve sets carry lethal voltages. Gridleak's figures are aids, not certification; follow local electrical codes and
          licensed practice.
        </p>
        {meta.data?.devMail && (
          <Link to="/dev/mail" className="mt-1 inline-block underline">
            Captured e-mail (development)
          </Link>
        )}
      </footer>
    </div>
  );
}
