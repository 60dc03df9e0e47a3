import { NavLink, Outlet } from 'react-router-dom';
import { Logo } from './logo';

export interface NavItem {
  to: string;
  label: string;
}

/**
 * The page frame: a skip link to the content (WCAG 2.4.1), the ink-navy header with the
 * navigation, content below. On a phone the navigation takes its own rows under the name
 * and the account menu, so no link is pushed off the screen.
 */
export function AppShell({ nav = [], accountMenu }: { nav?: NavItem[]; accountMenu?: React.ReactNode }) {
  return (
    <div className="flex min-h-full flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded bg-white px-4 py-2 font-semibold text-ink-900 shadow focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header className="bg-ink-900 text-ink-50 shadow-sm">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <NavLink to="/" className="flex items-center gap-2 text-lg font-semibold tracking-wide">
            <Logo />
            <span>Slackwater</span>
          </NavLink>
          <div className="ml-auto md:order-last">{accountMenu}</div>
          <nav aria-label="Main" className="-mx-1 flex w-full flex-wrap gap-1 md:mx-0 md:w-auto md:flex-1">
            {nav.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.to === '/'}
                className={({ isActive }) =>
                  `rounded px-3 py-1.5 text-sm font-medium whitespace-nowrap ${isActive ? 'bg-ink-700 text-white' : 'text-ink-100 hover:bg-ink-800'}`
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-7xl min-w-0 flex-1 px-4 py-6 focus:outline-none">
        <Outlet />
      </main>
      <footer className="border-t border-ink-100 px-4 py-3 text-center text-xs text-ink-500">
        Slackwater — decision support for storage dispatch. Qualified personnel decide dispatch.
      </footer>
    </div>
  );
}
