import { NavLink, Outlet } from 'react-router-dom';
import { SessionNav } from '../../features/auth/components/session-nav';
import { useMe } from '../../lib/session';

const navLinkClass = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-3 py-2 font-medium ${isActive ? 'bg-ink text-paper' : 'text-ink hover:bg-paper-deep'}`;

// The team library's pages, shown to signed-in people.
const libraryLinks = [
  ['/presets', 'Presets'],
  ['/printers', 'Printers'],
  ['/materials', 'Materials'],
  ['/kits', 'Kit history'],
] as const;

/** The frame of every page: name and navigation on top, version at the bottom. */
export function AppLayout() {
  const { data: me } = useMe();
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b-4 border-kiln bg-paper">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-4 px-4 py-3">
          <NavLink to="/" className="flex items-center gap-2 text-xl font-bold tracking-tight text-ink">
            <img src="/favicon.svg" alt="" width={28} height={28} />
            Seamwright
          </NavLink>
          <nav aria-label="Main" className="flex flex-wrap gap-1">
            <NavLink to="/" end className={navLinkClass}>
              Home
            </NavLink>
            <NavLink to="/design" className={navLinkClass}>
              Design
            </NavLink>
            {me && (
              <NavLink to="/team" className={navLinkClass}>
                Team
              </NavLink>
            )}
            {me &&
              libraryLinks.map(([to, label]) => (
                <NavLink key={to} to={to} className={navLinkClass}>
                  {label}
                </NavLink>
              ))}
          </nav>
          <SessionNav />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-8">
        <Outlet />
      </main>
      <footer className="border-t border-paper-deep py-4 text-center text-sm text-ink-soft">
        Seamwright {__APP_VERSION__}
      </footer>
    </div>
  );
}
