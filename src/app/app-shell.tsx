import { useId, useState } from 'react';
import { Link, NavLink, Outlet, useLocation, useMatches } from 'react-router';
import { useMeta } from '../lib/queries/get-meta';
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
  const menuId = useId();
  const [menuOpen, setMenuOpen] = useState(false);
  const closeMenu = () => setMenuOpen(false);
  // A new page closes the phone menu.
  const { pathname } = useLocation();
  // A route with `handle: { wide: true }` (the markup canvas) takes the whole width of a wide screen.
  const wide = useMatches().some((m) => (m.handle as { wide?: boolean } | undefined)?.wide === true);
  const [shownFor, setShownFor] = useState(pathname);
  if (shownFor !== pathname) {
    setShownFor(pathname);
    setMenuOpen(false);
  }
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:bg-panel focus:p-2"
      >
        Skip to content
      </a>
      <header
        className="border-b border-rule bg-panel/90 backdrop-blur print:hidden"
        onKeyDown={(e) => e.key === 'Escape' && closeMenu()}
      >
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-2 px-4 py-2">
          <NavLink to="/" className="mr-3 flex items-center gap-2" aria-label="Gridleak, the bench">
            <Logo />
            <span className="text-xl font-bold tracking-tight">Gridleak</span>
          </NavLink>
          {/* On a phone the header is one row: the logo, notifications and a menu that opens the links and account controls. */}
          <span className="flex-1 sm:hidden" />
          {signedIn && (
            <div className="sm:order-last">
              <NotificationsMenu />
            </div>
          )}
          <button
            type="button"
            className="inline-flex min-h-11 items-center rounded-lg border border-rule px-3 text-sm font-semibold sm:hidden"
            aria-expanded={menuOpen}
            aria-controls={menuId}
            onClick={() => setMenuOpen((open) => !open)}
          >
            Menu
          </button>
          <div
            id={menuId}
            className={`${menuOpen ? 'flex' : 'hidden'} w-full flex-col gap-2 pb-2 sm:flex sm:w-auto sm:flex-1 sm:flex-row sm:items-center sm:pb-0`}
          >
            <nav aria-label="Main" className="flex flex-col gap-1 sm:flex-1 sm:flex-row sm:items-center">
              {signedIn && (
                <>
                  <NavLink to="/" end className={navClass}>
                    Bench
                  </NavLink>
                  <NavLink to="/restorations/new" className={navClass}>
                    Take in a set
                  </NavLink>
                  <NavLink to="/calculators" className={navClass}>
                    Calculators
                  </NavLink>
                </>
              )}
            </nav>
            <div className="flex items-center gap-2">
              <ThemeToggle />
              <UserMenu />
            </div>
          </div>
        </div>
      </header>
      <main id="main" className={`mx-auto w-full flex-1 px-4 py-6 ${wide ? 'max-w-[120rem]' : 'max-w-6xl'}`}>
        <Outlet />
      </main>
      <footer className="border-t border-rule px-4 py-4 text-center text-xs text-ink-soft print:hidden">
        <p>
          Valve sets carry lethal voltages. Gridleak's figures are aids, not certification; follow local electrical
          codes and licensed practice.
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
