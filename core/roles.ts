import { z } from 'zod';

/** The roles a membership can hold in one school; a person may hold several at once. */
export const ROLES = ['admin', 'coordinator', 'teacher', 'substitute', 'student'] as const;
export const RoleSchema = z.enum(ROLES);
export type Role = z.infer<typeof RoleSchema>;

/** Human labels, used by the web app and in e-mails. */
export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  coordinator: 'Coordinator',
  teacher: 'Teacher',
  substitute: 'Substitute teacher',
  student: 'Student',
};

/** The order in which a person's home is chosen when they hold several roles. */
export const HOME_ROLE_ORDER: readonly Role[] = ['teacher', 'coordinator', 'substitute', 'student', 'admin'];

/** The role whose home a person lands on first: the earliest in HOME_ROLE_ORDER they hold. */
export function defaultRole(roles: readonly Role[]): Role | undefined {
  return HOME_ROLE_ORDER.find((role) => roles.includes(role));
}
