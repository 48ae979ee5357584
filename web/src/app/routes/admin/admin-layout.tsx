import { NavLink, Outlet } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { RequireRole } from '@/features/auth/components/require-role';

const LINKS = [
  { to: paths.admin.people, label: 'People', end: true },
  { to: paths.admin.invite, label: 'Invite', end: true },
  { to: paths.admin.roster, label: 'Roster import', end: true },
  { to: paths.admin.classes, label: 'Classes', end: false },
  { to: paths.admin.departments, label: 'Departments', end: true },
  { to: paths.admin.school, label: 'School', end: true },
];

/** The admin section: only for the admin role, with its own navigation between the admin pages. */
export default function AdminLayoutRoute() {
  const me = useSignedInMe();
  return (
    <RequireRole me={me} role="admin">
      <nav aria-label="Administration" className="mb-8 border-b border-line">
        <ul className="flex flex-wrap gap-x-1">
          {LINKS.map((link) => (
            <li key={link.to}>
              <NavLink
                to={link.to}
                end={link.end}
                className={({ isActive }) =>
                  cn(
                    'inline-flex min-h-11 items-center border-b-4 px-3 font-bold whitespace-nowrap no-underline',
                    isActive ? 'border-copper text-ink' : 'border-transparent text-ink-muted hover:text-ink',
                  )
                }
              >
                {link.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <Outlet />
    </RequireRole>
  );
}
