import type { Role } from '@core/roles';
import { defaultRole } from '@core/roles';

export interface ActorMembership {
  schoolId: string;
  schoolName: string;
  timeZone: string;
  locale: string;
  roles: Role[];
  departmentId: string | null;
}

/** Who is calling: the user, every school they belong to, and the one they are acting in. */
export interface Actor {
  userId: string;
  email: string;
  name: string;
  memberships: ActorMembership[];
  active: ActorMembership & { role: Role };
}

/** Picks the active membership and role from the session's choice, falling back to the first school. */
export function chooseActive(memberships: ActorMembership[], wanted: { schoolId?: string; role?: string }): Actor['active'] | undefined {
  const membership = memberships.find((m) => m.schoolId === wanted.schoolId) ?? memberships[0];
  if (!membership) return undefined;
  const role = membership.roles.find((r) => r === wanted.role) ?? defaultRole(membership.roles);
  return role ? { ...membership, role } : undefined;
}
