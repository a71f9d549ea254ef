import { NavLink } from 'react-router-dom';
import { cn } from '#src/lib/cn.ts';

export interface LabNavItem {
  to: string;
  label: string;
  end: boolean;
}

/** The lab's sections a role may use (the list comes from src/app/lab-sections.ts). */
export function LabNav({ items }: { items: readonly LabNavItem[] }) {
  return (
    <nav aria-label="Lab" className="border-b border-rule bg-paper-sunk">
      <ul className="mx-auto flex max-w-page flex-wrap gap-x-1 px-gutter font-sans text-sm">
        {items.map((s) => (
          <li key={s.to}>
            <NavLink
              to={s.to}
              end={s.end}
              className={({ isActive }) =>
                cn(
                  'inline-block border-b-3 px-3 py-2.5 font-semibold no-underline',
                  isActive ? 'border-signal text-ink' : 'border-transparent text-ink-soft hover:text-ink',
                )
              }
            >
              {s.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
