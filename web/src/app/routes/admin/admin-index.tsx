import { Navigate } from 'react-router-dom';
import { paths } from '@/config/paths';

/** /admin on its own opens the people list, the admin's home. */
export default function AdminIndexRoute() {
  return <Navigate to={paths.admin.people} replace />;
}
