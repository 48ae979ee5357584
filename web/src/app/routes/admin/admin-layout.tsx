import { Outlet } from 'react-router-dom';
import { TabNav, type TabLink } from '@/components/ui/tab-nav';
import { paths } from '@/config/paths';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { RequireRole } from '@/features/auth/components/require-role';

const LINKS: TabLink[] = [
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
      <TabNav label="Administration" links={LINKS} className="mb-8 border-b border-line" />
      <Outlet />
    </RequireRole>
  );
}
