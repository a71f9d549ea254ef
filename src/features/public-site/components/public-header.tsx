import { Link, NavLink } from 'react-router-dom';
import { cn } from '#src/lib/cn.ts';

export const MAIN_NAV = [
  { to: '/reports', label: 'Reports' },
  { to: '/compare', label: 'Compare' },
  { to: '/methodology', label: 'Methodology' },
  { to: '/request', label: 'Request a test' },
  { to: '/subscribe', label: 'Subscribe' },
] as const;

export function PublicHeader() {
  return (
    <header className="bg-paper">
      <div className="mx-auto flex max-w-page flex-wrap items-end justify-between gap-x-8 gap-y-3 px-gutter pt-6 pb-3">
        <div>
          <Link to="/" className="text-2xl font-bold tracking-tight text-ink no-underline hover:text-ink">
            Benchlight
          </Link>
          <p className="font-sans text-xs text-ink-muted">Independent bench tests of light-therapy devices</p>
        </div>
        <Link to="/lab" className="font-sans text-sm font-semibold">
          Staff sign-in
        </Link>
      </div>
      <nav aria-label="Main" className="mx-auto max-w-page px-gutter">
        <ul className="flex flex-wrap gap-x-6 gap-y-1 font-sans text-sm">
          {MAIN_NAV.map((item) => (
            <li key={item.to}>
              <NavLink
                to={item.to}
                className={({ isActive }) =>
                  cn(
                    'inline-block border-b-3 py-2 font-semibold no-underline',
                    isActive ? 'border-signal text-ink' : 'border-transparent text-ink-soft hover:text-ink',
                  )
                }
              >
                {item.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <div aria-hidden="true" className="bl-scale mx-auto max-w-page" />
    </header>
  );
}
