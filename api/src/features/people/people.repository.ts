import type { Db } from '../../db/knex';
import type { Role } from '@core/roles';

export interface MembershipRow {
  id: string;
  userId: string;
  roles: Role[];
  departmentId: string | null;
}

export async function findMembership(db: Db, schoolId: string, userId: string): Promise<MembershipRow | undefined> {
  return db('memberships')
    .where({ school_id: schoolId, user_id: userId })
    .first('id', 'user_id as userId', 'roles', 'department_id as departmentId');
}

/** Memberships of the school that hold the admin role, locked so two changes cannot both remove the last one. */
export async function lockAdmins(db: Db, schoolId: string): Promise<string[]> {
  const rows = await db('memberships')
    .where({ school_id: schoolId })
    .whereRaw("'admin' = ANY(roles)")
    .forUpdate()
    .select<{ user_id: string }[]>('user_id');
  return rows.map((row) => row.user_id);
}

export async function updateMembership(db: Db, id: string, changes: { roles?: Role[]; departmentId?: string | null }): Promise<void> {
  await db('memberships')
    .where({ id })
    .update({
      ...(changes.roles ? { roles: changes.roles } : {}),
      ...(changes.departmentId !== undefined ? { department_id: changes.departmentId } : {}),
      updated_at: db.fn.now(),
    });
}

/** Creates the user if new, then an invited membership and its invitation record; returns the user id. */
export async function insertInvitedMember(
  db: Db,
  member: {
    schoolId: string;
    email: string;
    name: string;
    roles: Role[];
    departmentId: string | null;
    classId: string | null;
    invitedBy: string;
  },
): Promise<string> {
  const [user] = await db('users')
    .insert({ email: member.email, name: member.name })
    .onConflict('email')
    .merge({ email: member.email }) // a no-op update, so RETURNING gives the existing id
    .returning('id');
  const userId = (user as { id: string }).id;
  await db('memberships').insert({
    user_id: userId,
    school_id: member.schoolId,
    roles: member.roles,
    department_id: member.departmentId,
    status: 'invited',
  });
  await db('invitations').insert({
    school_id: member.schoolId,
    user_id: userId,
    roles: member.roles,
    class_id: member.classId,
    invited_by: member.invitedBy,
  });
  return userId;
}

/** Existing members of the school among these addresses, with their roles. */
export async function membersByEmail(db: Db, schoolId: string, emails: string[]): Promise<Map<string, { userId: string; roles: Role[] }>> {
  if (emails.length === 0) return new Map();
  const rows = await db('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where('m.school_id', schoolId)
    .whereIn('u.email', emails)
    .select<{ email: string; userId: string; roles: Role[] }[]>('u.email', 'u.id as userId', 'm.roles');
  return new Map(rows.map((row) => [row.email, { userId: row.userId, roles: row.roles }]));
}

export async function classesByName(db: Db, schoolId: string): Promise<Map<string, string>> {
  const rows = await db('classes')
    .where({ school_id: schoolId })
    .whereNull('archived_at')
    .select<{ id: string; name: string }[]>('id', 'name');
  return new Map(rows.map((row) => [row.name.trim().toLowerCase(), row.id]));
}
