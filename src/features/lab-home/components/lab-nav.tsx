import { NavLink } from 'react-router-dom';
import { can, type Capability, type Role } from '#shared/auth/capabilities.ts';
import { cn } from '#src/lib/cn.ts';

/** Lab sections and the capability each needs. The server enforces; this only hides. */
export const LAB_SECTIONS: ReadonlyArray<{ to: string; label: string; capability: Capability; end?: boolean }> = [
  { to: '/lab', label: 'Overview', capability: 'lab.enter', end: true },
  { to: '/lab/runs', label: 'Runs', capability: 'runs.create' },
  { to: '/lab/check', label: 'File check', capability: 'runs.upload' },
  { to: '/lab/catalog', label: 'Catalog', capability: 'catalog.manage' },
  { to: '/lab/review', label: 'Review', capability: 'runs.review' },
  { to: '/lab/admin/users', label: 'Users', capability: 'users.manage' },
];

export function labSectionsFor(role: Role) {
  return LAB_SECTIONS.filter((s) => can(role, s.capability));
}

export function LabNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Lab" className="border-b border-rule bg-paper-sunk">
      <ul className="mx-auto flex max-w-page flex-wrap gap-x-1 px-gutter font-sans text-sm">
        {labSectionsFor(role).map((s) => (
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
