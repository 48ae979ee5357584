import { Outlet } from 'react-router-dom';
import type { Role } from '@core/roles';
import { useSignedInMe } from '@/features/auth/components/me-context';
import { RequireRole } from '@/features/auth/components/require-role';

/** A section of the app for one role (teacher, student, ...). */
export function RoleLayout({ role }: { role: Role }) {
  const me = useSignedInMe();
  return (
    <RequireRole me={me} role={role}>
      <Outlet />
    </RequireRole>
  );
}
