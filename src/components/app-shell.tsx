import { NavLink, Outlet } from 'react-router-dom';
import { Logo } from './logo';

export interface NavItem {
  to: string;
  label: string;
}

/** The page frame: ink-navy header with navigation, content below. */
export function AppShell({ nav = [], accountMenu }: { nav?: NavItem[]; accountMenu?: React.ReactNode }) {
  return (
    <div className="flex min-h-full flex-col">
      <header className="bg-ink-900 text-ink-50 shadow-sm">
        <div className="mx-auto flex max-w-7xl items-center gap-6 px-4 py-3">
          <NavLink to="/" className="flex items-center gap-2 text-lg font-semibold tracking-wide">
            <Logo />
            <span>Slackwater</span>
          </NavLink>
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {nav.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.to === '/'}
                className={({ isActive }) =>
                  `rounded px-3 py-1.5 text-sm font-medium ${isActive ? 'bg-ink-700 text-white' : 'text-ink-100 hover:bg-ink-800'}`
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
          {accountMenu}
        </div>
      </header>
      <main className="mx-auto w-full max-w-7xl flex-1 px-4 py-6">
        <Outlet />
      </main>
      <footer className="border-t border-ink-100 py-3 text-center text-xs text-ink-500">
        Slackwater — decision support for storage dispatch. Qualified personnel decide dispatch.
      </footer>
    </div>
  );
}
